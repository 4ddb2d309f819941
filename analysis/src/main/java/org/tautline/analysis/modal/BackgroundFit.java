package org.tautline.analysis.modal;

import java.util.List;
import java.util.Optional;

import org.hipparchus.complex.Complex;
import org.tautline.analysis.frf.Frf;

/**
 * A band with no mode: whether the residual terms alone explain it.
 *
 * <p>The model is UR - LR/w^2 (Ewins, Modal Testing, 2nd ed. 2000, ch. 4, from memory), fitted by weighted linear
 * least squares (weights 1/variance of each line's noise) separately to the real and imaginary parts, whose basis
 * functions 1 and -1/w^2 are real; {@link FitCheck} then judges its residual.
 */
final class BackgroundFit {
    private BackgroundFit() {
    }

    /**
     * Why the background alone does not explain the band, or empty when it does.
     *
     * @param h the measured receptance
     * @param noise the noise variance of each line
     * @param lowHz lower edge of the band, Hz
     * @param highHz upper edge, Hz
     * @param noiseEstimated true when the noise was estimated from the data
     * @return one plain sentence, or empty
     */
    static Optional<String> unexplained(Frf h, double[] noise, double lowHz, double highHz, boolean noiseEstimated) {
        return FitCheck.unexplained(h, noise, lowHz, highHz, List.of(), fit(h, noise, lowHz, highHz), noiseEstimated);
    }

    /** UR and LR by weighted least squares over the band. */
    static ResidualTerms fit(Frf h, double[] noise, double lowHz, double highHz) {
        double s11 = 0;
        double s12 = 0;
        double s22 = 0;
        double[] b1 = new double[2];
        double[] b2 = new double[2];
        double wLow = 2 * Math.PI * Math.max(lowHz, h.frequencyHz(0));
        for (int k = 0; k < h.size(); k++) {
            double f = h.frequencyHz(k);
            if (f < lowHz || f > highHz) {
                continue;
            }
            double w = 2 * Math.PI * f;
            double g = -(wLow * wLow) / (w * w);
            double weight = 1 / noise[k];
            s11 += weight;
            s12 += weight * g;
            s22 += weight * g * g;
            double[] parts = {h.value(k).getReal(), h.value(k).getImaginary()};
            for (int c = 0; c < 2; c++) {
                b1[c] += weight * parts[c];
                b2[c] += weight * g * parts[c];
            }
        }
        double det = s11 * s22 - s12 * s12;
        if (!(Math.abs(det) > 1e-12 * s11 * s22)) {
            double[] mean = {s11 > 0 ? b1[0] / s11 : 0, s11 > 0 ? b1[1] / s11 : 0};
            return new ResidualTerms(new Complex(mean[0], mean[1]), Complex.ZERO);
        }
        double[] ur = new double[2];
        double[] lr = new double[2];
        for (int c = 0; c < 2; c++) {
            ur[c] = (s22 * b1[c] - s12 * b2[c]) / det;
            lr[c] = (s11 * b2[c] - s12 * b1[c]) / det * wLow * wLow;
        }
        return new ResidualTerms(new Complex(ur[0], ur[1]), new Complex(lr[0], lr[1]));
    }
}
