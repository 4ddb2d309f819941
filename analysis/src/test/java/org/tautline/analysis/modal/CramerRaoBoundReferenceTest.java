package org.tautline.analysis.modal;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;

import org.hipparchus.analysis.UnivariateVectorFunction;
import org.hipparchus.analysis.differentiation.DSFactory;
import org.hipparchus.analysis.differentiation.DerivativeStructure;
import org.hipparchus.analysis.differentiation.FiniteDifferencesDifferentiator;
import org.hipparchus.analysis.differentiation.UnivariateDifferentiableVectorFunction;
import org.hipparchus.complex.Complex;
import org.hipparchus.linear.Array2DRowRealMatrix;
import org.hipparchus.linear.LUDecomposition;
import org.hipparchus.linear.RealMatrix;
import org.junit.jupiter.api.Test;

/**
 * {@link CramerRaoBound} against a reference built here from general-purpose parts only.
 *
 * <p>The reference writes the receptance out from the textbook modal sum, H(w) = sum_r A_r/(w_r^2 - w^2
 * + 2 j zeta_r w_r w) + UR - LR/w^2, w_r = 2 pi f_r (D. J. Ewins, Modal Testing: Theory, Practice and Application,
 * 2nd ed., Research Studies Press, 2000, ch. 2 and 4, from memory), differentiates it numerically with Hipparchus 4.0.2's
 * {@link FiniteDifferencesDifferentiator} (7-point central stencil) in the physical parameters f_r (Hz), zeta_r,
 * Re A_r, Im A_r, UR and LR, assembles the Fisher information of a complex Gaussian mean with known covariance
 * diag(s_k^2), F = 2 Re(J^H diag(1/s_k^2) J) (S. M. Kay, Fundamentals of Statistical Signal Processing: Estimation
 * Theory, Prentice Hall, 1993, ch. 15, the complex-data form of the ch. 3 bound, from memory), inverts it with
 * Hipparchus's {@link LUDecomposition} and takes the square roots of the diagonal (Kay 1993, ch. 3). Nothing of the
 * project's own model, Jacobian or solver is used. Tolerance: 1e-6 relative; the two agree to about 2e-10 (the
 * stencil's truncation error, about h^6 of the bandwidth-scaled step h = 1e-3, and round-off), and any slip in a
 * derivative, a weight or the factor 2 would show at 1e-2 or more.
 */
class CramerRaoBoundReferenceTest {
    /** Relative agreement asked of each standard error. */
    private static final double TOLERANCE = 1e-6;
    /** Finite-difference step in units of each parameter's own scale (see {@link #scales}). */
    private static final double STEP = 1e-3;

    /** The mode's parameters and which of them are free, as the reference sees them. */
    private record Problem(List<Mode> modes, Complex upper, Complex lower, boolean realModes, boolean residuals,
                           double[] frequencyHz, double[] variance) {
        int perMode() {
            return realModes ? 3 : 4;
        }

        int count() {
            return modes.size() * perMode() + (residuals ? 4 : 0);
        }

        double[] parameters() {
            double[] p = new double[count()];
            int c = 0;
            for (Mode m : modes) {
                p[c++] = m.frequencyHz();
                p[c++] = m.dampingRatio();
                p[c++] = m.modalConstant().getReal();
                if (!realModes) {
                    p[c++] = m.modalConstant().getImaginary();
                }
            }
            if (residuals) {
                p[c++] = upper.getReal();
                p[c++] = upper.getImaginary();
                p[c++] = lower.getReal();
                p[c] = lower.getImaginary();
            }
            return p;
        }

        /** Real and imaginary parts of the textbook receptance at every line, stacked, for parameters p. */
        double[] stacked(double[] p) {
            double[] out = new double[2 * frequencyHz.length];
            for (int k = 0; k < frequencyHz.length; k++) {
                double w = 2 * Math.PI * frequencyHz[k];
                Complex h = Complex.ZERO;
                int c = 0;
                for (int r = 0; r < modes.size(); r++) {
                    double wr = 2 * Math.PI * p[c];
                    double zeta = p[c + 1];
                    Complex a = new Complex(p[c + 2], realModes ? 0 : p[c + 3]);
                    h = h.add(a.divide(new Complex(wr * wr - w * w, 2 * zeta * wr * w)));
                    c += perMode();
                }
                if (residuals) {
                    Complex ur = new Complex(p[c], p[c + 1]);
                    Complex lr = new Complex(p[c + 2], p[c + 3]);
                    h = h.add(ur).subtract(lr.divide(w * w));
                }
                out[2 * k] = h.getReal();
                out[2 * k + 1] = h.getImaginary();
            }
            return out;
        }

        /** Each parameter's own scale: half a bandwidth for f, zeta itself, |A|, and the response size for UR, LR. */
        double[] scales() {
            double[] s = new double[count()];
            int c = 0;
            double size = 0;
            for (Mode m : modes) {
                s[c++] = m.dampingRatio() * m.frequencyHz();
                s[c++] = m.dampingRatio();
                s[c++] = m.modalConstant().norm();
                if (!realModes) {
                    s[c++] = m.modalConstant().norm();
                }
                size = Math.max(size, m.modalConstant().norm() / Math.pow(m.angularFrequencyRadPerS(), 2));
            }
            if (residuals) {
                double wLow = 2 * Math.PI * frequencyHz[0];
                s[c++] = size;
                s[c++] = size;
                s[c++] = size * wLow * wLow;
                s[c] = size * wLow * wLow;
            }
            return s;
        }
    }

    /** The reference standard errors of every parameter, in the order of {@link Problem#parameters()}. */
    private static double[] referenceStd(Problem problem) {
        double[] p0 = problem.parameters();
        double[] scale = problem.scales();
        int n = p0.length;
        int values = 2 * problem.frequencyHz().length;
        double[][] jacobian = new double[n][];
        FiniteDifferencesDifferentiator differentiator = new FiniteDifferencesDifferentiator(7, STEP);
        DSFactory factory = new DSFactory(1, 1);
        for (int i = 0; i < n; i++) {
            final int index = i;
            // The response as a function of parameter i alone, in units of its scale, around the true value.
            UnivariateVectorFunction along = t -> {
                double[] p = p0.clone();
                p[index] = p0[index] + t * scale[index];
                return problem.stacked(p);
            };
            UnivariateDifferentiableVectorFunction d = differentiator.differentiate(along);
            DerivativeStructure[] at = d.value(factory.variable(0, 0.0));
            jacobian[i] = new double[values];
            for (int v = 0; v < values; v++) {
                jacobian[i][v] = at[v].getPartialDerivative(1);
            }
        }
        // Fisher information in the scaled parameters t_i = (theta_i - theta0_i)/scale_i (Kay 1993, ch. 15, from
        // memory): F = 2 Re(J^H C^-1 J) = 2 sum_k (Re J_ki Re J_kj + Im J_ki Im J_kj)/s_k^2.
        double[][] fisher = new double[n][n];
        double[] variance = problem.variance();
        for (int i = 0; i < n; i++) {
            for (int j = 0; j < n; j++) {
                double sum = 0;
                for (int k = 0; k < variance.length; k++) {
                    sum += (jacobian[i][2 * k] * jacobian[j][2 * k] + jacobian[i][2 * k + 1] * jacobian[j][2 * k + 1])
                            / variance[k];
                }
                fisher[i][j] = 2 * sum;
            }
        }
        RealMatrix inverse = new LUDecomposition(new Array2DRowRealMatrix(fisher, false)).getSolver().getInverse();
        double[] std = new double[n];
        for (int i = 0; i < n; i++) {
            std[i] = scale[i] * Math.sqrt(inverse.getEntry(i, i));
        }
        return std;
    }

    private static void assertAgrees(Problem problem, List<FittedMode> bound, String label) {
        double[] reference = referenceStd(problem);
        int c = 0;
        for (int r = 0; r < problem.modes().size(); r++) {
            FittedMode b = bound.get(r);
            String mode = label + ", mode " + (r + 1) + " at " + problem.modes().get(r).frequencyHz() + " Hz";
            String source = " against the finite-difference Fisher information (Kay 1993 ch. 3/15, from memory)";
            assertRelative(reference[c++], b.frequencyStdHz(), mode + ": std of f" + source);
            assertRelative(reference[c++], b.dampingRatioStd(), mode + ": std of zeta" + source);
            assertRelative(reference[c++], b.modalConstantStd().getReal(), mode + ": std of Re A" + source);
            if (!problem.realModes()) {
                assertRelative(reference[c++], b.modalConstantStd().getImaginary(), mode + ": std of Im A" + source);
            } else {
                assertEquals(0.0, b.modalConstantStd().getImaginary(), 0.0, mode + ": a real mode has no Im A to bound");
            }
        }
    }

    private static void assertRelative(double expected, double actual, String message) {
        assertEquals(expected, actual, TOLERANCE * Math.abs(expected), message + " (relative tolerance " + TOLERANCE + ")");
    }

    private static double[] lines(double fromHz, double toHz, int count) {
        double[] f = new double[count];
        for (int i = 0; i < count; i++) {
            f[i] = fromHz + (toHz - fromHz) * i / (count - 1);
        }
        return f;
    }

    /** A noise variance that grows as w^4 across the lines, as accelerometer noise does read as receptance. */
    private static double[] growingVariance(double[] frequencyHz, double atFirstLine) {
        double[] v = new double[frequencyHz.length];
        for (int k = 0; k < v.length; k++) {
            v[k] = atFirstLine * Math.pow(frequencyHz[0] / frequencyHz[k], 4);
        }
        return v;
    }

    private static double peak(Mode m) {
        return m.modalConstant().norm() / (2 * m.dampingRatio() * Math.pow(m.angularFrequencyRadPerS(), 2));
    }

    @Test
    void isolatedModeWithRealAndComplexModalConstants() {
        // 250 Hz, zeta 0.004: half-power bandwidth 2 Hz, about 15 lines in it; peak 40 dB above the noise.
        double[] f = lines(230, 270, 301);
        for (boolean real : new boolean[] {true, false}) {
            Mode mode = new Mode(250, 0.004, real ? new Complex(1.8e3) : new Complex(1.5e3, -0.7e3));
            double[] variance = growingVariance(f, Math.pow(peak(mode) / 100, 2));
            Problem problem = new Problem(List.of(mode), Complex.ZERO, Complex.ZERO, real, false, f, variance);
            List<FittedMode> bound = CramerRaoBound.of(List.of(mode), f, variance, real);
            assertAgrees(problem, bound, "isolated mode, " + (real ? "real" : "complex") + " modal constant");
        }
    }

    @Test
    void closeDoubletOneBandwidthApartWithRealAndComplexModalConstants() {
        // Two polarisations of one harmonic: 180 Hz, zeta 0.002 (half-power bandwidth 0.72 Hz), the second one
        // half-power bandwidth higher, damping 10 % higher; 0.02 Hz lines, peak 35 dB above the noise.
        double f1 = 180;
        double zeta = 0.002;
        double f2 = f1 + 2 * zeta * f1;
        double[] f = lines(175, 186, 551);
        List<List<Mode>> forms = List.of(
                List.of(new Mode(f1, zeta, new Complex(1.2e3)), new Mode(f2, 1.1 * zeta, new Complex(0.6e3))),
                List.of(new Mode(f1, zeta, new Complex(1.2e3, 0.3e3)), new Mode(f2, 1.1 * zeta, new Complex(0.5e3, -0.4e3))));
        for (int i = 0; i < forms.size(); i++) {
            boolean real = i == 0;
            List<Mode> modes = forms.get(i);
            double[] variance = growingVariance(f, Math.pow(peak(modes.get(1)) / Math.pow(10, 35 / 20.0), 2));
            Problem problem = new Problem(modes, Complex.ZERO, Complex.ZERO, real, false, f, variance);
            List<FittedMode> bound = CramerRaoBound.of(modes, f, variance, real);
            assertAgrees(problem, bound, "doublet 1 bandwidth apart, " + (real ? "real" : "complex") + " modal constants");
        }
    }

    @Test
    void doubletWithResidualTermsAsTheBenchmarkFitsIt() {
        // Real modes with free UR and LR (Ewins 2000, ch. 4, from memory): the parameters the default fit has.
        double zeta = 0.001;
        Mode a = new Mode(300, zeta, new Complex(2.0e3));
        Mode b = new Mode(300 * (1 + 2 * zeta), 0.9 * zeta, new Complex(-0.8e3));
        List<Mode> modes = List.of(a, b);
        double[] f = lines(290, 312, 1101);
        Complex upper = new Complex(2e-6, 1e-8);
        Complex lower = new Complex(3.0, -0.01);
        double[] variance = growingVariance(f, Math.pow(peak(b) / 300, 2));
        Problem problem = new Problem(modes, upper, lower, true, true, f, variance);
        ModalRefinementOptions free = ModalRefinementOptions.of(
                LsfdOptions.defaults().withRealModes(true).withUpperResidual(true).withLowerResidual(true));
        List<FittedMode> bound = CramerRaoBound.of(modes, new ResidualTerms(upper, lower), f, variance, free);
        assertAgrees(problem, bound, "doublet 2 bandwidths apart with UR and LR free");
    }
}
