package org.tautline.analysis.modal;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

import org.hipparchus.complex.Complex;
import org.tautline.analysis.AnalysisException;
import org.tautline.analysis.frf.Frf;
import org.tautline.analysis.frf.FrfQuantity;

/**
 * Finds the resonance peaks of an FRF and estimates one mode per peak, with no settings to tune.
 *
 * <p>Method: peak picking with the half-power bandwidth (D. J. Ewins, Modal Testing: Theory, Practice
 * and Application, 2nd ed., Research Studies Press, 2000, section 4.3, from memory), refined per peak
 * by a local least-squares single-mode fit. It treats each peak as an isolated single-degree-of-
 * freedom system, so it is biased when modes are close (overlapping half-power bands) or heavily
 * damped: the half-power estimate of zeta reads high by about 2 % at zeta 0.1 (see {@link HalfPower}).
 * It is the first, simple estimator; a multi-mode estimator supersedes it where modes interact.
 *
 * <ol>
 *   <li>The FRF is converted to receptance.</li>
 *   <li>Noise: the standard deviation s of complex noise per line is estimated robustly from the
 *       median of |H_{i-1} - 2 H_i + H_{i+1}|: for white circular complex noise of variance s^2 the
 *       second difference has variance 6 s^2 and its magnitude is Rayleigh distributed with median
 *       s sqrt(6 ln 2). Smooth structure adds little to second differences except at the few lines
 *       of each sharp peak, which the median ignores.</li>
 *   <li>Peaks: a local maximum of |H| is a resonance when its prominence (its height above the
 *       higher of the two lowest points between it and the nearest higher line on each side, or the
 *       record end) exceeds 6 s, which white noise of that level reaches with probability
 *       about e^-36 per line, and exceeds 1 dB of the peak height, so that ripple on the flank of a
 *       larger peak does not count. Two peaks are thereby always separated by a dip.</li>
 *   <li>Per peak: the half-power band ({@link HalfPower}), then a Levenberg-Marquardt fit of
 *       A/(w_n^2 - w^2 + 2 j zeta w_n w) + R over the lines within two half-power half-widths of
 *       the peak (at least two lines each side, never past the lowest point towards a neighbouring
 *       peak). The fit uses the phase as well as the magnitude, so it stays accurate with only about
 *       four lines in the half-power band, where the highest line can miss the resonance by half a
 *       line spacing.</li>
 *   <li>If the fit is not possible or lands outside its band, the mode comes from the half-power
 *       band: f_n the centre of the band (or the refined peak), zeta = (f_2 - f_1)/(2 f_r), and the
 *       modal constant from the peak value, A = 2 j zeta w_n^2 H(w_n), since H(w_n) = A/(2 j zeta w_n^2)
 *       for a viscous mode.</li>
 * </ol>
 */
public final class PeakPicking {
    /** Fewest lines the method works with. */
    public static final int MINIMUM_LINES = 5;
    /** Prominence threshold in noise standard deviations. */
    static final double NOISE_FACTOR = 6.0;
    /** Prominence threshold relative to the peak height: 1 dB. */
    static final double RELATIVE_PROMINENCE = 1.0 - Math.pow(10.0, -1.0 / 20.0);

    private PeakPicking() {
    }

    /**
     * Finds the resonances of an FRF and estimates a mode for each.
     *
     * @param frf the FRF (any quantity), at least {@value #MINIMUM_LINES} lines
     * @return one estimate per resonance in increasing frequency; empty when there is none
     */
    public static List<PeakEstimate> estimate(Frf frf) {
        if (frf == null) {
            throw new AnalysisException("peak picking needs an FRF, got none");
        }
        if (frf.size() < MINIMUM_LINES) {
            throw new AnalysisException("peak picking needs at least " + MINIMUM_LINES + " frequency lines, got "
                    + frf.size() + " (" + frf + ")");
        }
        Frf receptance = frf.toQuantity(FrfQuantity.RECEPTANCE);
        int n = receptance.size();
        double[] f = receptance.frequenciesHz();
        Complex[] h = new Complex[n];
        double[] magnitude = new double[n];
        for (int i = 0; i < n; i++) {
            h[i] = receptance.value(i);
            magnitude[i] = receptance.magnitude(i);
        }
        double noise = noiseStandardDeviation(h);
        List<Integer> peaks = new ArrayList<>();
        for (int i = 1; i < n - 1; i++) {
            if (magnitude[i] > magnitude[i - 1] && magnitude[i] >= magnitude[i + 1]) {
                double prominence = magnitude[i] - Math.max(base(magnitude, i, -1), base(magnitude, i, +1));
                if (prominence > NOISE_FACTOR * noise && prominence > RELATIVE_PROMINENCE * magnitude[i]) {
                    peaks.add(i);
                }
            }
        }
        List<PeakEstimate> estimates = new ArrayList<>();
        for (int p = 0; p < peaks.size(); p++) {
            int peak = peaks.get(p);
            int lowValley = p == 0 ? 0 : lowestBetween(magnitude, peaks.get(p - 1), peak);
            int highValley = p == peaks.size() - 1 ? n - 1 : lowestBetween(magnitude, peak, peaks.get(p + 1));
            estimates.add(estimatePeak(f, h, magnitude, peak, lowValley, highValley));
        }
        return List.copyOf(estimates);
    }

    /**
     * The modes of a list of estimates.
     *
     * @param estimates peak estimates
     * @return their modes, in the same order
     */
    public static List<Mode> modes(List<PeakEstimate> estimates) {
        return estimates.stream().map(PeakEstimate::mode).toList();
    }

    private static PeakEstimate estimatePeak(double[] f, Complex[] h, double[] magnitude, int peak, int lowValley,
                                             int highValley) {
        HalfPower band = HalfPower.of(f, magnitude, peak);
        double halfWidthHz;
        double centreHz;
        if (band.resolved()) {
            halfWidthHz = band.bandwidthHz() / 2;
            centreHz = (band.lowerFrequencyHz() + band.upperFrequencyHz()) / 2;
        } else if (band.lowerResolved()) {
            halfWidthHz = band.peakFrequencyHz() - band.lowerFrequencyHz();
            centreHz = band.peakFrequencyHz();
        } else if (band.upperResolved()) {
            halfWidthHz = band.upperFrequencyHz() - band.peakFrequencyHz();
            centreHz = band.peakFrequencyHz();
        } else {
            halfWidthHz = (f[peak + 1] - f[peak - 1]) / 2;
            centreHz = band.peakFrequencyHz();
        }
        if (!(halfWidthHz > 0) || !(centreHz > 0)) {
            // A half-power point interpolated past the peak (a flank of a larger peak): the lines' own spacing.
            halfWidthHz = (f[peak + 1] - f[peak - 1]) / 2;
            centreHz = f[peak];
        }
        int first = peak;
        while (first - 1 >= lowValley && (peak - first < 2 || f[first - 1] >= centreHz - 2 * halfWidthHz)) {
            first--;
        }
        int last = peak;
        while (last + 1 <= highValley && (last - peak < 2 || f[last + 1] <= centreHz + 2 * halfWidthHz)) {
            last++;
        }
        double startZeta = halfWidthHz / centreHz;
        Mode fitted = last - first + 1 >= 3 ? SdofFit.fit(f, h, first, last, peak, centreHz, startZeta) : null;
        if (fitted != null) {
            return new PeakEstimate(fitted, peak, band, first, last, true);
        }
        double wn = 2 * Math.PI * centreHz;
        Complex modalConstant = h[peak].multiply(new Complex(0, 2 * startZeta * wn * wn));
        return new PeakEstimate(new Mode(centreHz, startZeta, modalConstant), peak, band, first, last, false);
    }

    /** Lowest |H| from the peak towards the nearest higher line (exclusive) or the record end. */
    private static double base(double[] magnitude, int peak, int step) {
        double lowest = magnitude[peak];
        for (int j = peak + step; j >= 0 && j < magnitude.length; j += step) {
            if (magnitude[j] > magnitude[peak]) {
                break;
            }
            lowest = Math.min(lowest, magnitude[j]);
        }
        return lowest;
    }

    private static int lowestBetween(double[] magnitude, int from, int to) {
        int lowest = from;
        for (int j = from + 1; j <= to; j++) {
            if (magnitude[j] < magnitude[lowest]) {
                lowest = j;
            }
        }
        return lowest;
    }

    /** Robust standard deviation of white circular complex noise per line, from second differences. */
    static double noiseStandardDeviation(Complex[] h) {
        int n = h.length;
        double[] d = new double[n - 2];
        for (int i = 1; i < n - 1; i++) {
            d[i - 1] = h[i - 1].subtract(h[i].multiply(2)).add(h[i + 1]).norm();
        }
        Arrays.sort(d);
        int m = d.length;
        double median = (m % 2 == 1) ? d[m / 2] : (d[m / 2 - 1] + d[m / 2]) / 2;
        return median / Math.sqrt(6 * Math.log(2));
    }
}
