package org.tautline.analysis.modal;

import java.util.ArrayList;
import java.util.List;
import java.util.Random;

import org.hipparchus.complex.Complex;
import org.tautline.analysis.frf.Frf;
import org.tautline.analysis.frf.FrfQuantity;

/** Test models and FRFs for the LSFD, refinement, bound and fit-quality tests. */
final class LsfdTestData {
    /** Residual terms used with the multi-mode models: UR m/N and LR m rad^2/(N s^2). */
    static final ResidualTerms RESIDUALS = new ResidualTerms(new Complex(1.5e-5, 2e-7), new Complex(0.4, 0.01));

    private LsfdTestData() {
    }

    /** Uniform lines from..to Hz. */
    static double[] lines(double fromHz, double toHz, int count) {
        double[] f = new double[count];
        for (int i = 0; i < count; i++) {
            f[i] = fromHz + (toHz - fromHz) * i / (count - 1);
        }
        return f;
    }

    /**
     * Modes of a string forced at 0.13 L and sensed at 0.29 L, mu L = 0.05 kg, with the point-force modal
     * constants A_n = (2/(mu L)) sin(n pi x_f/L) sin(n pi x_r/L) of checks.md [seen].
     *
     * @param count 1, 3 or 8; the 8-mode set has a pair 120/122.4 Hz split by one half-power bandwidth 2 zeta f
     * @param complex true to rotate mode n's constant by 0.15 n rad
     */
    static List<Mode> modes(int count, boolean complex) {
        double[] f;
        switch (count) {
            case 1:
                f = new double[] {80};
                break;
            case 3:
                f = new double[] {40, 80, 120};
                break;
            case 8:
                f = new double[] {40, 80, 120, 120 * 1.02, 160, 200, 240, 280};
                break;
            default:
                throw new IllegalArgumentException("1, 3 or 8 modes, got " + count);
        }
        List<Mode> modes = new ArrayList<>();
        for (int i = 0; i < f.length; i++) {
            int n = i + 1;
            double a = 2 / 0.05 * Math.sin(n * Math.PI * 0.13) * Math.sin(n * Math.PI * 0.29);
            Complex constant = complex ? ComplexPolar.of(a, 0.15 * n) : new Complex(a);
            modes.add(new Mode(f[i], 0.01, constant));
        }
        return modes;
    }

    /** The receptance of the modes plus residual terms, built with ModalSynthesis. */
    static Frf receptance(List<Mode> modes, ResidualTerms residuals, double[] f) {
        Frf h = ModalSynthesis.receptance(modes, f);
        double[] re = h.realParts();
        double[] im = h.imaginaryParts();
        for (int i = 0; i < f.length; i++) {
            Complex r = residuals.receptanceAt(f[i]);
            re[i] += r.getReal();
            im[i] += r.getImaginary();
        }
        return Frf.of(f, re, im, FrfQuantity.RECEPTANCE);
    }

    /** Adds circular complex Gaussian noise of variance E|e|^2 = variance (each part variance/2). */
    static Frf noisy(Frf clean, double variance, Random random, boolean attachVariance) {
        int n = clean.size();
        double[] re = clean.realParts();
        double[] im = clean.imaginaryParts();
        double s = Math.sqrt(variance / 2);
        for (int i = 0; i < n; i++) {
            re[i] += s * random.nextGaussian();
            im[i] += s * random.nextGaussian();
        }
        Frf h = Frf.of(clean.frequenciesHz(), re, im, clean.quantity());
        if (attachVariance) {
            double[] v = new double[n];
            java.util.Arrays.fill(v, variance);
            h = h.withVariance(v);
        }
        return h;
    }

    static List<Pole> poles(List<Mode> modes) {
        List<Pole> poles = new ArrayList<>();
        for (Mode m : modes) {
            poles.add(Pole.of(m.frequencyHz(), m.dampingRatio()));
        }
        return poles;
    }

    /** ||a - b|| / ||b|| over the modal constants. */
    static double relativeModalConstantError(List<Mode> fitted, List<Mode> truth) {
        double num = 0;
        double den = 0;
        for (int i = 0; i < truth.size(); i++) {
            num += Math.pow(fitted.get(i).modalConstant().subtract(truth.get(i).modalConstant()).norm(), 2);
            den += Math.pow(truth.get(i).modalConstant().norm(), 2);
        }
        return Math.sqrt(num / den);
    }

    /** |a - b| / |b| for complex numbers. */
    static double relative(Complex a, Complex b) {
        return a.subtract(b).norm() / b.norm();
    }

    /** Polar construction kept here so the tests read plainly. */
    static final class ComplexPolar {
        private ComplexPolar() {
        }

        static Complex of(double magnitude, double angleRad) {
            return new Complex(magnitude * Math.cos(angleRad), magnitude * Math.sin(angleRad));
        }
    }
}
