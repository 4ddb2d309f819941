package org.tautline.analysis.modal;

import org.tautline.analysis.AnalysisException;
import org.tautline.analysis.frf.Frf;
import org.tautline.analysis.frf.FrfQuantity;

/**
 * The half-power bandwidth of one isolated resonance peak of a receptance.
 *
 * <p>Source: D. J. Ewins, Modal Testing: Theory, Practice and Application, 2nd ed., Research
 * Studies Press, 2000, section 4.3 (from memory): with f_r the frequency of the peak of |H| and
 * f_1 &lt; f_r &lt; f_2 the frequencies where |H| has fallen to |H|_peak/sqrt(2) (-3 dB),
 * zeta ~ (f_2 - f_1)/(2 f_r). The estimate is biased high for heavier damping because the
 * receptance peak sits at f_n sqrt(1 - 2 zeta^2) and the band is not symmetric: for viscous
 * receptance the estimate/true ratio is about 1.0002 at zeta 0.01, 1.005 at 0.05, 1.021 at 0.1
 * and 1.091 at 0.2 (computed from the exact SDOF receptance). It is sensitive to how many lines
 * fall in the band and to noise at the peak; neighbouring modes shift the crossings.
 *
 * <p>Two refinements make it usable on sparse stepped-sine lines. The peak is refined from the
 * highest line and its two neighbours by a parabola in f^2 through 1/|H|^2, which is exact for a
 * single viscous mode since (w_n^2 - w^2)^2 + (2 zeta w_n w)^2 is quadratic in w^2 (a consequence of
 * the SDOF receptance, Ewins ch. 2). Each -3 dB crossing is found by linear interpolation of
 * 1/|H|^2 between the two lines that bracket it, which is smoother across a line interval than |H|;
 * because 1/|H|^2 is convex there, sparse lines narrow the band (about 3 % low with four lines in it).
 * The search for a crossing stops, unresolved, at the end of the record or at a line higher than the peak.
 *
 * @param peakLine index of the highest line of the peak
 * @param peakFrequencyHz refined frequency of the peak of |H|, Hz
 * @param peakMagnitude refined peak magnitude |H|, in the FRF's units
 * @param lowerFrequencyHz the -3 dB crossing below the peak, Hz, or NaN when not resolved
 * @param upperFrequencyHz the -3 dB crossing above the peak, Hz, or NaN when not resolved
 */
public record HalfPower(int peakLine, double peakFrequencyHz, double peakMagnitude, double lowerFrequencyHz,
                        double upperFrequencyHz) {

    /**
     * Measures the half-power band of the peak at a given line of a receptance, mobility or accelerance FRF.
     *
     * <p>The FRF is converted to receptance first, so the bias figures above apply.
     *
     * @param frf the FRF, at least 3 lines
     * @param peakLine index of a local maximum of |H| of the receptance, not the first or last line
     * @return the half-power band
     */
    public static HalfPower of(Frf frf, int peakLine) {
        if (frf == null) {
            throw new AnalysisException("half-power bandwidth needs an FRF, got none");
        }
        Frf h = frf.toQuantity(FrfQuantity.RECEPTANCE);
        double[] magnitude = new double[h.size()];
        for (int i = 0; i < magnitude.length; i++) {
            magnitude[i] = h.magnitude(i);
        }
        return of(h.frequenciesHz(), magnitude, peakLine);
    }

    /**
     * Measures the half-power band of the highest line of the receptance.
     *
     * @param frf the FRF, at least 3 lines, whose receptance is highest inside the record
     * @return the half-power band
     */
    public static HalfPower ofHighestPeak(Frf frf) {
        if (frf == null) {
            throw new AnalysisException("half-power bandwidth needs an FRF, got none");
        }
        Frf h = frf.toQuantity(FrfQuantity.RECEPTANCE);
        int best = 0;
        for (int i = 1; i < h.size(); i++) {
            if (h.magnitude(i) > h.magnitude(best)) {
                best = i;
            }
        }
        return of(frf, best);
    }

    static HalfPower of(double[] frequencyHz, double[] magnitude, int peakLine) {
        int n = magnitude.length;
        if (n < 3) {
            throw new AnalysisException("half-power bandwidth needs at least 3 frequency lines, got " + n);
        }
        if (peakLine < 1 || peakLine > n - 2) {
            throw new AnalysisException("half-power peak line must have a line on each side (1.." + (n - 2)
                    + "), got " + peakLine + " at " + frequencyHz[Math.max(0, Math.min(n - 1, peakLine))] + " Hz");
        }
        double peak = magnitude[peakLine];
        if (!(peak > 0) || magnitude[peakLine - 1] > peak || magnitude[peakLine + 1] > peak) {
            throw new AnalysisException("half-power peak line " + peakLine + " (" + frequencyHz[peakLine]
                    + " Hz) must be a non-zero local maximum of |H|, got " + magnitude[peakLine - 1] + ", " + peak
                    + ", " + magnitude[peakLine + 1]);
        }
        double[] refined = refinePeak(frequencyHz, magnitude, peakLine);
        double peakHz = refined[0];
        double peakMagnitude = refined[1];
        double level = 2.0 / (peakMagnitude * peakMagnitude);
        double lower = crossing(frequencyHz, magnitude, peakLine, -1, level, peak);
        double upper = crossing(frequencyHz, magnitude, peakLine, +1, level, peak);
        return new HalfPower(peakLine, peakHz, peakMagnitude, lower, upper);
    }

    /** Vertex of the parabola in u = f^2 through 1/|H|^2 at the three lines; the line itself when not a minimum. */
    private static double[] refinePeak(double[] f, double[] magnitude, int i) {
        double u0 = f[i - 1] * f[i - 1];
        double u1 = f[i] * f[i];
        double u2 = f[i + 1] * f[i + 1];
        double g0 = inversePower(magnitude[i - 1]);
        double g1 = inversePower(magnitude[i]);
        double g2 = inversePower(magnitude[i + 1]);
        double d01 = (g1 - g0) / (u1 - u0);
        double d12 = (g2 - g1) / (u2 - u1);
        double curvature = (d12 - d01) / (u2 - u0);
        if (!(curvature > 0) || !Double.isFinite(g0) || !Double.isFinite(g2)) {
            return new double[] {f[i], magnitude[i]};
        }
        // g(u) = g1 + d01 (u - u1) + curvature (u - u1)(u - u0); its vertex:
        double vertex = (u0 + u1) / 2 - d01 / (2 * curvature);
        if (!(vertex > u0 && vertex < u2)) {
            return new double[] {f[i], magnitude[i]};
        }
        double gMin = g1 + d01 * (vertex - u1) + curvature * (vertex - u1) * (vertex - u0);
        if (!(gMin > 0) || gMin > g1) {
            return new double[] {f[i], magnitude[i]};
        }
        return new double[] {Math.sqrt(vertex), 1 / Math.sqrt(gMin)};
    }

    private static double crossing(double[] f, double[] magnitude, int peakLine, int step, double level, double peak) {
        for (int j = peakLine + step; j >= 0 && j < f.length; j += step) {
            if (magnitude[j] > peak) {
                return Double.NaN;
            }
            double g = inversePower(magnitude[j]);
            if (g >= level) {
                int k = j - step;
                double gk = inversePower(magnitude[k]);
                if (Double.isInfinite(g)) {
                    return f[k];
                }
                double t = (level - gk) / (g - gk);
                return f[k] + t * (f[j] - f[k]);
            }
        }
        return Double.NaN;
    }

    private static double inversePower(double magnitude) {
        return 1.0 / (magnitude * magnitude);
    }

    /** @return true when the crossing below the peak was found */
    public boolean lowerResolved() {
        return !Double.isNaN(lowerFrequencyHz);
    }

    /** @return true when the crossing above the peak was found */
    public boolean upperResolved() {
        return !Double.isNaN(upperFrequencyHz);
    }

    /** @return true when both crossings were found */
    public boolean resolved() {
        return lowerResolved() && upperResolved();
    }

    /** @return the half-power bandwidth f_2 - f_1, Hz, or NaN when not resolved */
    public double bandwidthHz() {
        return upperFrequencyHz - lowerFrequencyHz;
    }

    /** @return Ewins' estimate zeta ~ (f_2 - f_1)/(2 f_r), or NaN when not resolved */
    public double dampingRatio() {
        return bandwidthHz() / (2 * peakFrequencyHz);
    }
}
