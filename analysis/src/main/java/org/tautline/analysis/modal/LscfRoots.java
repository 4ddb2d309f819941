package org.tautline.analysis.modal;

import java.util.ArrayList;
import java.util.List;

import org.hipparchus.complex.Complex;
import org.hipparchus.exception.MathRuntimeException;
import org.hipparchus.linear.MatrixUtils;
import org.hipparchus.linear.SchurTransformer;
import org.hipparchus.util.Precision;
import org.tautline.analysis.AnalysisException;

/**
 * Roots of a real monic polynomial as the eigenvalues of its balanced companion matrix.
 *
 * <p>The companion matrix is balanced by powers of two before the real Schur decomposition
 * (B. N. Parlett and C. Reinsch, "Balancing a matrix for calculation of eigenvalues and
 * eigenvectors", Numerische Mathematik 13:293-304, 1969, from memory), which is how general
 * polynomial-root routines keep the roots accurate when the coefficients span many decades
 * (A. Edelman and H. Murakami, "Polynomial roots from companion matrix eigenvalues", Mathematics of
 * Computation 64:763-776, 1995, from memory). The eigenvalues are read off the 1 x 1 and 2 x 2
 * diagonal blocks of the quasi-triangular Schur factor computed by Hipparchus.
 *
 * <p>The shifted QR iteration behind the Schur factor can stall on a companion matrix (its
 * iteration limit per eigenvalue is reached; a known weakness of the double-shift iteration on
 * matrices with many eigenvalues of nearly one modulus, G. H. Golub and C. F. Van Loan, Matrix
 * Computations, 4th ed. 2013, sec. 7.5, from memory). The roots are then sought again from the
 * reversed polynomial x^n p(1/x), whose roots are the reciprocals and whose companion matrix the
 * iteration meets with other shifts, and last from the companion matrix without balancing. Only
 * when all three stall is the failure reported.
 */
final class LscfRoots {
    private static final double RADIX = 2;

    private LscfRoots() {
    }

    /**
     * The roots of x^n + c_{n-1} x^{n-1} + ... + c_0.
     *
     * @param lowerCoefficients c_0 .. c_{n-1} (the leading coefficient 1 is implied), n at least 1
     * @return the n roots, complex ones in conjugate pairs
     * @throws AnalysisException when the eigenvalue iteration stalls on every form of the companion matrix
     */
    static List<Complex> ofMonic(double[] lowerCoefficients) {
        int n = lowerCoefficients.length;
        try {
            return eigenvalues(companion(lowerCoefficients), true);
        } catch (MathRuntimeException balancedFailed) {
            // Fall through to the reversed polynomial, then to the unbalanced matrix.
        }
        double constant = lowerCoefficients[0];
        if (constant != 0 && Double.isFinite(1 / constant)) {
            double[] reversed = new double[n];
            reversed[0] = 1 / constant;
            for (int k = 1; k < n; k++) {
                reversed[k] = lowerCoefficients[n - k] / constant;
            }
            try {
                List<Complex> inverted = new ArrayList<>(n);
                for (Complex r : eigenvalues(companion(reversed), true)) {
                    inverted.add(Complex.ONE.divide(r));
                }
                return inverted;
            } catch (MathRuntimeException reversedFailed) {
                // Fall through to the unbalanced matrix.
            }
        }
        try {
            return eigenvalues(companion(lowerCoefficients), false);
        } catch (MathRuntimeException e) {
            throw new AnalysisException("the roots of a polynomial of degree " + n + " could not be computed: the "
                    + "eigenvalue iteration did not converge (" + e.getMessage() + ")", e);
        }
    }

    /** The companion matrix of x^n + c_{n-1} x^{n-1} + ... + c_0, first row -c_{n-1} .. -c_0. */
    private static double[][] companion(double[] lowerCoefficients) {
        int n = lowerCoefficients.length;
        double[][] a = new double[n][n];
        for (int j = 0; j < n; j++) {
            a[0][j] = -lowerCoefficients[n - 1 - j];
        }
        for (int i = 1; i < n; i++) {
            a[i][i - 1] = 1;
        }
        return a;
    }

    private static List<Complex> eigenvalues(double[][] a, boolean balanced) {
        int n = a.length;
        if (balanced) {
            balance(a);
        }
        double[][] t = new SchurTransformer(MatrixUtils.createRealMatrix(a)).getT().getData();
        List<Complex> roots = new ArrayList<>(n);
        int i = 0;
        while (i < n) {
            if (i == n - 1 || negligible(t, i + 1)) {
                roots.add(new Complex(t[i][i]));
                i++;
            } else {
                double mean = 0.5 * (t[i][i] + t[i + 1][i + 1]);
                double half = 0.5 * (t[i][i] - t[i + 1][i + 1]);
                double disc = half * half + t[i + 1][i] * t[i][i + 1];
                if (disc < 0) {
                    double root = Math.sqrt(-disc);
                    roots.add(new Complex(mean, root));
                    roots.add(new Complex(mean, -root));
                } else {
                    double root = Math.sqrt(disc);
                    roots.add(new Complex(mean + root));
                    roots.add(new Complex(mean - root));
                }
                i += 2;
            }
        }
        return roots;
    }

    private static boolean negligible(double[][] t, int row) {
        double scale = Math.abs(t[row - 1][row - 1]) + Math.abs(t[row][row]);
        return Math.abs(t[row][row - 1]) <= Precision.EPSILON * scale;
    }

    /** Parlett-Reinsch balancing in place, scaling by powers of the radix so no rounding occurs. */
    private static void balance(double[][] a) {
        int n = a.length;
        boolean done = false;
        while (!done) {
            done = true;
            for (int i = 0; i < n; i++) {
                double c = 0;
                double r = 0;
                for (int j = 0; j < n; j++) {
                    if (j != i) {
                        c += Math.abs(a[j][i]);
                        r += Math.abs(a[i][j]);
                    }
                }
                if (c == 0 || r == 0) {
                    continue;
                }
                double g = r / RADIX;
                double f = 1;
                double s = c + r;
                while (c < g) {
                    f *= RADIX;
                    c *= RADIX * RADIX;
                }
                g = r * RADIX;
                while (c > g) {
                    f /= RADIX;
                    c /= RADIX * RADIX;
                }
                if ((c + r) / f < 0.95 * s) {
                    done = false;
                    for (int j = 0; j < n; j++) {
                        a[i][j] /= f;
                        a[j][i] *= f;
                    }
                }
            }
        }
    }
}
