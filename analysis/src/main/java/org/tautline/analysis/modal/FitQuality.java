package org.tautline.analysis.modal;

import java.util.ArrayList;
import java.util.List;

import org.hipparchus.complex.Complex;
import org.tautline.analysis.AnalysisException;
import org.tautline.analysis.frf.Frf;
import org.tautline.analysis.frf.FrfQuantity;

/**
 * How well a modal model reproduces a measured FRF, overall and in a band around each mode.
 *
 * <p>Both figures are computed on the receptance. The normalised residual is
 * ||H - H_m|| / ||H|| (Euclidean over lines; 0 is a perfect fit, 1 what a zero model scores). The
 * correlation is |sum H conj(H_m)|^2 / (sum |H|^2 sum |H_m|^2), the squared cosine between the measured
 * and modelled lines as complex vectors: 1 when they are proportional, whatever the scale, 0 when
 * orthogonal. It has the form of the modal assurance criterion of R. J. Allemang and D. L. Brown, Proc.
 * IMAC-I, 1982 (from memory), applied to FRF lines instead of mode shapes; reading it beside the
 * residual separates a wrong shape (low correlation) from a wrong scale (high correlation, high residual).
 *
 * @param normalisedResidual ||H - H_m|| / ||H|| over every line
 * @param correlation the correlation over every line, 0..1
 * @param bands one band per mode, in the order of the modes
 */
public record FitQuality(double normalisedResidual, double correlation, List<ModeBand> bands) {

    /** Copies the list. */
    public FitQuality {
        bands = List.copyOf(bands);
    }

    /**
     * The fit figures in the band f_n +- halfPowerBandwidths * 2 zeta f_n around one mode.
     *
     * @param modeIndex index of the mode in the model
     * @param fromHz lower edge of the band, Hz
     * @param toHz upper edge of the band, Hz
     * @param lines number of measured lines in the band
     * @param normalisedResidual ||H - H_m|| / ||H|| in the band, NaN when the band holds no line
     * @param correlation the correlation in the band, NaN when the band holds no line
     */
    public record ModeBand(int modeIndex, double fromHz, double toHz, int lines, double normalisedResidual,
                           double correlation) {
    }

    /**
     * Measures a model against a measured FRF.
     *
     * @param measured the measured FRF, any quantity (compared as receptance), not zero at every line
     * @param modes the model's modes, at least one
     * @param residualTerms the model's residual terms (use {@link ResidualTerms#NONE} for none)
     * @param halfPowerBandwidths half-width of each mode's band in half-power bandwidths 2 zeta f_n, positive (3 is usual)
     * @return the figures
     */
    public static FitQuality of(Frf measured, List<Mode> modes, ResidualTerms residualTerms, double halfPowerBandwidths) {
        if (measured == null) {
            throw new AnalysisException("fit quality needs a measured FRF, got none");
        }
        if (modes == null || modes.isEmpty()) {
            throw new AnalysisException("fit quality needs at least one mode, got none");
        }
        if (residualTerms == null) {
            throw new AnalysisException("fit quality needs residual terms; use ResidualTerms.NONE for none");
        }
        if (!(halfPowerBandwidths > 0) || Double.isInfinite(halfPowerBandwidths)) {
            throw new AnalysisException("fit quality band half-width must be a positive number of half-power bandwidths, got "
                    + halfPowerBandwidths);
        }
        Frf h = measured.toQuantity(FrfQuantity.RECEPTANCE);
        int n = h.size();
        Complex[] data = new Complex[n];
        Complex[] model = new Complex[n];
        for (int i = 0; i < n; i++) {
            double f = h.frequencyHz(i);
            data[i] = h.value(i);
            Complex sum = residualTerms.receptanceAt(f);
            for (Mode mode : modes) {
                sum = sum.add(mode.receptanceAt(f));
            }
            model[i] = sum;
        }
        double[] overall = figures(data, model, 0, Double.POSITIVE_INFINITY, h);
        if (!(overall[1] > 0)) {
            throw new AnalysisException("fit quality needs a measured FRF that is not zero at every line, got " + measured);
        }
        List<ModeBand> bands = new ArrayList<>();
        for (int r = 0; r < modes.size(); r++) {
            Mode mode = modes.get(r);
            double half = halfPowerBandwidths * 2 * mode.dampingRatio() * mode.frequencyHz();
            double from = mode.frequencyHz() - half;
            double to = mode.frequencyHz() + half;
            double[] band = figures(data, model, from, to, h);
            bands.add(new ModeBand(r, from, to, (int) band[4], band[0], band[3]));
        }
        return new FitQuality(overall[0], overall[3], bands);
    }

    /** @return residual, reference power, model power, correlation, line count */
    private static double[] figures(Complex[] data, Complex[] model, double fromHz, double toHz, Frf h) {
        double residual = 0;
        double reference = 0;
        double modelPower = 0;
        double crossRe = 0;
        double crossIm = 0;
        int lines = 0;
        for (int i = 0; i < data.length; i++) {
            double f = h.frequencyHz(i);
            if (f < fromHz || f > toHz) {
                continue;
            }
            lines++;
            Complex d = data[i];
            Complex m = model[i];
            residual += square(d.subtract(m).norm());
            reference += square(d.norm());
            modelPower += square(m.norm());
            Complex cross = d.multiply(m.conjugate());
            crossRe += cross.getReal();
            crossIm += cross.getImaginary();
        }
        if (lines == 0) {
            return new double[] {Double.NaN, 0, 0, Double.NaN, 0};
        }
        double correlation = (crossRe * crossRe + crossIm * crossIm) / (reference * modelPower);
        return new double[] {Math.sqrt(residual / reference), reference, modelPower, correlation, lines};
    }

    /**
     * Rejects data that cannot support a fit: fewer real values than unknowns, no response, a flat response.
     *
     * @param what the estimator, for messages
     * @param lines number of complex lines (two real values each)
     * @param unknowns number of real unknowns
     * @param peakMagnitude largest |H| of the lines
     * @param minimumMagnitude smallest |H| of the lines
     */
    static void requireFittable(String what, int lines, int unknowns, double peakMagnitude, double minimumMagnitude) {
        if (2 * lines < unknowns) {
            throw new AnalysisException(what + " has " + unknowns + " real unknowns but only " + lines + " lines ("
                    + 2 * lines + " real values); widen the band, drop residual terms or fit fewer modes");
        }
        if (!(peakMagnitude > 0)) {
            throw new AnalysisException(what + " cannot fit a response that is zero at every one of its " + lines + " lines");
        }
        if (lines > 1 && peakMagnitude - minimumMagnitude <= FLAT * peakMagnitude) {
            throw new AnalysisException(what + " cannot fit a flat response: |H| stays within " + FLAT
                    + " of its peak " + peakMagnitude + " across all " + lines + " lines, so there is no resonance to fit");
        }
    }

    /** Relative spread of |H| below which a response counts as flat. */
    static final double FLAT = 1e-6;

    private static double square(double x) {
        return x * x;
    }
}
