package org.tautline.analysis.frf;

import org.tautline.analysis.AnalysisException;
import org.tautline.analysis.signal.CrossSpectra;

/**
 * H1 and H2 FRF estimates and the coherence from averaged auto and cross spectra.
 *
 * <p>With x the force and y the response, G_xy = c conj(X) Y averaged (see {@link CrossSpectra}):
 * H1 = G_xy / G_xx, H2 = G_yy / G_yx and coherence = |G_xy|^2 / (G_xx G_yy) = H1 / H2
 * (J. S. Bendat and A. G. Piersol, Random Data, 4th ed., Wiley 2010, ch. 6 and 9, from memory;
 * Harris and Piersol, Shock and Vibration Handbook, ch. 21). Noise on the response only leaves H1
 * unbiased and biases H2 high; noise on the force only biases H1 low and leaves H2 unbiased.
 *
 * <p>The DC line is dropped, so the FRF lines are k fs / N for k = 1..N/2. Each FRF carries the
 * coherence and the per-line variance E|H_est - H|^2 = |H|^2 (1 - g2) / (g2 n_e) of
 * {@link FrfRandomError#variance(double, double, double)}, with n_e the equivalent number of
 * independent averages {@link CrossSpectra#effectiveAverageCount()} (the segment count corrected
 * for overlap after Welch 1967). With one average the coherence is 1 and the variance 0, which says
 * nothing: average 20 segments or more for a useful error figure.
 */
public final class FrfEstimator {
    private FrfEstimator() {
    }

    /**
     * The H1 estimate G_xy / G_xx, best when the noise is on the response.
     *
     * @param spectra averaged spectra
     * @param force position of the force channel in the estimate
     * @param response position of the response channel in the estimate
     * @param quantity what the response channel measures per force (receptance for displacement, ...)
     * @return the FRF over lines 1..N/2 with coherence and variance
     * @throws AnalysisException if the force auto spectrum or the coherence is zero at a line
     */
    public static Frf h1(CrossSpectra spectra, int force, int response, FrfQuantity quantity) {
        return estimate(spectra, force, response, quantity, false);
    }

    /**
     * The H2 estimate G_yy / G_yx, best when the noise is on the force.
     *
     * @param spectra averaged spectra
     * @param force position of the force channel in the estimate
     * @param response position of the response channel in the estimate
     * @param quantity what the response channel measures per force
     * @return the FRF over lines 1..N/2 with coherence and variance
     * @throws AnalysisException if the cross spectrum or the coherence is zero at a line
     */
    public static Frf h2(CrossSpectra spectra, int force, int response, FrfQuantity quantity) {
        return estimate(spectra, force, response, quantity, true);
    }

    /**
     * The coherence |G_xy|^2 / (G_xx G_yy) on the FRF lines 1..N/2.
     *
     * <p>Lines where either auto spectrum is zero get coherence 0; rounding above 1 is clipped to 1.
     *
     * @param spectra averaged spectra
     * @param force position of the force channel
     * @param response position of the response channel
     * @return one value in 0..1 per FRF line
     */
    public static double[] coherence(CrossSpectra spectra, int force, int response) {
        checkPair(spectra, force, response);
        double[] gxx = spectra.auto(force);
        double[] gyy = spectra.auto(response);
        double[] re = spectra.crossReal(force, response);
        double[] im = spectra.crossImag(force, response);
        double[] g2 = new double[gxx.length - 1];
        for (int k = 1; k < gxx.length; k++) {
            double denominator = gxx[k] * gyy[k];
            g2[k - 1] = denominator > 0 ? Math.min(1.0, (re[k] * re[k] + im[k] * im[k]) / denominator) : 0.0;
        }
        return g2;
    }

    private static Frf estimate(CrossSpectra spectra, int force, int response, FrfQuantity quantity, boolean h2) {
        double[] g2 = coherence(spectra, force, response);
        double[] f = spectra.frequenciesHz();
        double[] gxx = spectra.auto(force);
        double[] gyy = spectra.auto(response);
        double[] re = spectra.crossReal(force, response);
        double[] im = spectra.crossImag(force, response);
        double averages = spectra.effectiveAverageCount();
        int lines = g2.length;
        double[] freq = new double[lines];
        double[] hr = new double[lines];
        double[] hi = new double[lines];
        double[] variance = new double[lines];
        String name = h2 ? "H2" : "H1";
        for (int k = 1; k <= lines; k++) {
            int line = k - 1;
            freq[line] = f[k];
            double crossSquared = re[k] * re[k] + im[k] * im[k];
            if (h2) {
                // H2 = G_yy / conj(G_xy) = G_yy G_xy / |G_xy|^2
                if (!(crossSquared > 0)) {
                    throw undefined(name, spectra, k, f[k], "the cross spectrum is zero");
                }
                hr[line] = gyy[k] * re[k] / crossSquared;
                hi[line] = gyy[k] * im[k] / crossSquared;
            } else {
                if (!(gxx[k] > 0)) {
                    throw undefined(name, spectra, k, f[k], "the force auto spectrum is zero");
                }
                hr[line] = re[k] / gxx[k];
                hi[line] = im[k] / gxx[k];
            }
            if (!(g2[line] > 0)) {
                throw undefined(name + " random error", spectra, k, f[k], "the coherence is zero");
            }
            variance[line] = FrfRandomError.variance(hr[line] * hr[line] + hi[line] * hi[line], g2[line], averages);
        }
        return Frf.of(freq, hr, hi, quantity).withCoherence(g2).withVariance(variance);
    }

    private static AnalysisException undefined(String what, CrossSpectra spectra, int line, double frequencyHz, String why) {
        return new AnalysisException(what + " is undefined at line " + line + " (" + frequencyHz + " Hz) of channels "
                + spectra.channelNames() + ": " + why + "; expected signal on both channels at every line up to fs/2");
    }

    private static void checkPair(CrossSpectra spectra, int force, int response) {
        if (spectra == null) {
            throw new AnalysisException("FRF estimate needs averaged spectra, got none");
        }
        if (force == response) {
            throw new AnalysisException("force and response must be different channels, both are position " + force + " of "
                    + spectra.channelNames());
        }
        for (int position : new int[] {force, response}) {
            if (position < 0 || position >= spectra.channelCount()) {
                throw new AnalysisException("channel position " + position + " is not in the estimate: expected 0.."
                        + (spectra.channelCount() - 1) + " for the channels " + spectra.channelNames());
            }
        }
    }
}
