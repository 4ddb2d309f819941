package org.tautline.analysis.modal;

import org.hipparchus.linear.Array2DRowRealMatrix;
import org.hipparchus.linear.RealMatrix;
import org.hipparchus.linear.SingularValueDecomposition;

/**
 * A real linear least-squares solve by Householder QR followed by an SVD of the small triangular factor.
 *
 * <p>Columns are first scaled to unit norm, the tall m x p system is reduced by Householder reflections
 * to R (p x p) and Q^T b without forming Q (G. H. Golub and C. F. Van Loan, Matrix Computations, 4th ed.,
 * Johns Hopkins University Press, 2013, section 5.3, from memory), and R is decomposed by Hipparchus'
 * SVD so that a rank-deficient system (two poles too close to separate, a column with no effect) is
 * detected from its condition number rather than solved into noise. The same factor gives
 * (A^T A)^-1 = D^-1 V S^-2 V^T D^-1 (D the column norms) for standard errors.
 */
final class LsfdLeastSquares {
    /** Largest condition number of the column-scaled system accepted as full rank. */
    static final double MAX_CONDITION = 1e12;

    private final double[] solution;
    private final double[][] inverseNormal;
    private final double conditionNumber;
    private final double residualSumOfSquares;

    private LsfdLeastSquares(double[] solution, double[][] inverseNormal, double conditionNumber,
                             double residualSumOfSquares) {
        this.solution = solution;
        this.inverseNormal = inverseNormal;
        this.conditionNumber = conditionNumber;
        this.residualSumOfSquares = residualSumOfSquares;
    }

    /**
     * Solves min ||A x - b||; A is given by columns and is overwritten.
     *
     * @param columns p columns of length m (m at least p), overwritten
     * @param rhs the m right-hand side values, or null to compute only the factor (solution then zero)
     * @return the solution, (A^T A)^-1, the condition number of the column-scaled A and the residual sum of squares
     */
    static LsfdLeastSquares solve(double[][] columns, double[] rhs) {
        int p = columns.length;
        int m = columns[0].length;
        double[] scale = new double[p];
        double[] b = rhs == null ? new double[m] : rhs.clone();
        double[][] r = triangularise(columns, b, scale);
        double residual = 0;
        for (int i = p; i < m; i++) {
            residual += b[i] * b[i];
        }
        RealMatrix rMatrix = new Array2DRowRealMatrix(r, false);
        SingularValueDecomposition svd = new SingularValueDecomposition(rMatrix);
        double[] s = svd.getSingularValues();
        double condition = s[p - 1] > 0 ? s[0] / s[p - 1] : Double.POSITIVE_INFINITY;
        double[] x = new double[p];
        double[][] inverse = new double[p][p];
        if (condition <= MAX_CONDITION) {
            RealMatrix u = svd.getU();
            RealMatrix vMatrix = svd.getV();
            double[] qtb = new double[p];
            System.arraycopy(b, 0, qtb, 0, p);
            for (int k = 0; k < p; k++) {
                double c = 0;
                for (int i = 0; i < p; i++) {
                    c += u.getEntry(i, k) * qtb[i];
                }
                c /= s[k];
                for (int j = 0; j < p; j++) {
                    x[j] += vMatrix.getEntry(j, k) * c;
                }
            }
            for (int i = 0; i < p; i++) {
                x[i] /= scale[i];
                for (int j = 0; j < p; j++) {
                    double sum = 0;
                    for (int k = 0; k < p; k++) {
                        sum += vMatrix.getEntry(i, k) * vMatrix.getEntry(j, k) / (s[k] * s[k]);
                    }
                    inverse[i][j] = sum / (scale[i] * scale[j]);
                }
            }
        }
        return new LsfdLeastSquares(x, inverse, condition, residual);
    }

    /** Householder QR of the column-scaled A in place: fills scale, applies Q^T to b, returns R by rows. */
    private static double[][] triangularise(double[][] columns, double[] b, double[] scale) {
        int p = columns.length;
        int m = columns[0].length;
        for (int j = 0; j < p; j++) {
            double norm = norm(columns[j], 0);
            scale[j] = norm > 0 ? norm : 1;
            for (int i = 0; i < m; i++) {
                columns[j][i] /= scale[j];
            }
        }
        double[][] r = new double[p][p];
        for (int k = 0; k < p; k++) {
            double[] v = columns[k];
            double alpha = norm(v, k);
            if (v[k] > 0) {
                alpha = -alpha;
            }
            double vk = v[k] - alpha;
            // ||v||^2 after v_k is replaced: alpha^2 - v_k^2 + (v_k - alpha)^2 = 2 alpha (alpha - v_k).
            double vnorm2 = 2 * alpha * (alpha - v[k]);
            v[k] = vk;
            if (vnorm2 > 0) {
                for (int j = k + 1; j < p; j++) {
                    reflect(v, columns[j], k, vnorm2);
                }
                reflect(v, b, k, vnorm2);
            }
            r[k][k] = alpha;
            for (int j = k + 1; j < p; j++) {
                r[k][j] = columns[j][k];
            }
        }
        return r;
    }

    private static void reflect(double[] v, double[] target, int k, double vnorm2) {
        double f = 2 * dot(v, target, k) / vnorm2;
        for (int i = k; i < v.length; i++) {
            target[i] -= f * v[i];
        }
    }

    /** sum v_i t_i from i = from, in four partial sums (independent additions the processor can overlap). */
    private static double dot(double[] v, double[] t, int from) {
        double s0 = 0;
        double s1 = 0;
        double s2 = 0;
        double s3 = 0;
        int i = from;
        for (; i + 3 < v.length; i += 4) {
            s0 += v[i] * t[i];
            s1 += v[i + 1] * t[i + 1];
            s2 += v[i + 2] * t[i + 2];
            s3 += v[i + 3] * t[i + 3];
        }
        for (; i < v.length; i++) {
            s0 += v[i] * t[i];
        }
        return (s0 + s1) + (s2 + s3);
    }

    /** The 2-norm from an index on; rescaled only when the plain sum of squares over- or underflows. */
    private static double norm(double[] v, int from) {
        double plain = dot(v, v, from);
        if (plain > Double.MIN_NORMAL && plain < Double.MAX_VALUE) {
            return Math.sqrt(plain);
        }
        double big = 0;
        for (int i = from; i < v.length; i++) {
            big = Math.max(big, Math.abs(v[i]));
        }
        if (big == 0) {
            return 0;
        }
        double sum = 0;
        for (int i = from; i < v.length; i++) {
            double t = v[i] / big;
            sum += t * t;
        }
        return big * Math.sqrt(sum);
    }

    /** @return true when the condition number is at most {@link #MAX_CONDITION} */
    boolean fullRank() {
        return conditionNumber <= MAX_CONDITION;
    }

    /** @return the least-squares solution (zero when not of full rank) */
    double[] solution() {
        return solution.clone();
    }

    /** @return (A^T A)^-1 (zero when not of full rank) */
    double[][] inverseNormal() {
        double[][] copy = new double[inverseNormal.length][];
        for (int i = 0; i < copy.length; i++) {
            copy[i] = inverseNormal[i].clone();
        }
        return copy;
    }

    /** @return the 2-norm condition number of A after scaling its columns to unit norm */
    double conditionNumber() {
        return conditionNumber;
    }

    /** @return ||A x - b||^2 at the solution */
    double residualSumOfSquares() {
        return residualSumOfSquares;
    }
}
