package org.tautline.analysis.modal;

import java.util.Optional;

import org.hipparchus.complex.Complex;
import org.tautline.analysis.AnalysisException;
import org.tautline.analysis.frf.Frf;
import org.tautline.analysis.frf.FrfQuantity;

/**
 * The receptance lines of an FRF inside a band, with their least-squares weights.
 *
 * <p>Weights: explicit relative weights when given; otherwise 1/variance when the FRF carries its
 * per-line variance E|H_est - H|^2 (then {@link #absolute()} is true and the weights are inverse
 * variances of the receptance); otherwise 1 at every line.
 */
final class LsfdLines {
    private final double[] angularFrequencyRadPerS;
    private final double[] real;
    private final double[] imag;
    private final double[] weight;
    private final boolean absolute;

    private LsfdLines(double[] w, double[] real, double[] imag, double[] weight, boolean absolute) {
        this.angularFrequencyRadPerS = w;
        this.real = real;
        this.imag = imag;
        this.weight = weight;
        this.absolute = absolute;
    }

    /**
     * Selects the lines.
     *
     * @param what the name of the estimator, for messages
     * @param frf the FRF in any quantity
     * @param fromHz lowest frequency kept, Hz (inclusive)
     * @param toHz highest frequency kept, Hz (inclusive)
     * @param weights one relative weight per FRF line (all lines, not only the band), or null
     * @return the lines
     */
    static LsfdLines select(String what, Frf frf, double fromHz, double toHz, double[] weights) {
        if (frf == null) {
            throw new AnalysisException(what + " needs an FRF, got none");
        }
        if (weights != null && weights.length != frf.size()) {
            throw new AnalysisException(what + " weights must have one value per FRF line (" + frf.size() + "), got "
                    + weights.length);
        }
        Frf h = frf.toQuantity(FrfQuantity.RECEPTANCE);
        Optional<double[]> variance = weights == null ? h.variance() : Optional.empty();
        int count = 0;
        for (int i = 0; i < h.size(); i++) {
            if (inBand(h.frequencyHz(i), fromHz, toHz)) {
                count++;
            }
        }
        if (count == 0) {
            throw new AnalysisException(what + " band " + fromHz + ".." + toHz + " Hz holds no line of " + frf);
        }
        double[] w = new double[count];
        double[] re = new double[count];
        double[] im = new double[count];
        double[] wt = new double[count];
        int k = 0;
        for (int i = 0; i < h.size(); i++) {
            double f = h.frequencyHz(i);
            if (!inBand(f, fromHz, toHz)) {
                continue;
            }
            w[k] = 2 * Math.PI * f;
            Complex v = h.value(i);
            re[k] = v.getReal();
            im[k] = v.getImaginary();
            if (weights != null) {
                if (!(weights[i] >= 0) || Double.isInfinite(weights[i])) {
                    throw new AnalysisException(what + " weight at line " + i + " (" + f
                            + " Hz) must be zero or positive and finite, got " + weights[i]);
                }
                wt[k] = weights[i];
            } else if (variance.isPresent()) {
                double s2 = variance.get()[i];
                if (!(s2 > 0)) {
                    throw new AnalysisException(what + " weights lines by 1/variance, but the variance at line " + i
                            + " (" + f + " Hz) is " + s2 + "; give explicit weights instead");
                }
                wt[k] = 1 / s2;
            } else {
                wt[k] = 1;
            }
            k++;
        }
        return new LsfdLines(w, re, im, wt, weights == null && variance.isPresent());
    }

    private static boolean inBand(double f, double fromHz, double toHz) {
        return f >= fromHz && f <= toHz;
    }

    int size() {
        return angularFrequencyRadPerS.length;
    }

    double angularFrequency(int k) {
        return angularFrequencyRadPerS[k];
    }

    double real(int k) {
        return real[k];
    }

    double imag(int k) {
        return imag[k];
    }

    double weight(int k) {
        return weight[k];
    }

    /** @return true when the weights are inverse variances (E|e|^2) rather than relative */
    boolean absolute() {
        return absolute;
    }

    /** @return the largest |H| of the lines */
    double peakMagnitude() {
        double peak = 0;
        for (int k = 0; k < size(); k++) {
            peak = Math.max(peak, Math.hypot(real[k], imag[k]));
        }
        return peak;
    }

    /** @return the smallest |H| of the lines */
    double minimumMagnitude() {
        double low = Double.POSITIVE_INFINITY;
        for (int k = 0; k < size(); k++) {
            low = Math.min(low, Math.hypot(real[k], imag[k]));
        }
        return low;
    }
}
