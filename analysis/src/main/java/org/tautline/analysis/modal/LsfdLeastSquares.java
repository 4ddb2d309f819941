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
        double[][] r = triangularise(columns, b, scale, null);
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

    /**
     * A Householder factor of a system min ||A x - b|| kept so that columns can be tried beside A: Q^T applied to a new
     * column costs 4 m p operations, against 2 m p^2 for a new factor. With the new columns E, the least-squares
     * residual of [A E] is that of the rows of Q^T E and Q^T b below p (Golub and Van Loan, sec. 5.3, as above).
     */
    static final class Factor {
        private final double[][] reflectors;
        private final double[] reflectorNorms;
        private final double[] qtb;
        private final int p;

        private Factor(double[][] reflectors, double[] reflectorNorms, double[] qtb) {
            this.reflectors = reflectors;
            this.reflectorNorms = reflectorNorms;
            this.qtb = qtb;
            this.p = reflectors.length;
        }

        /** @return min ||A x - b||^2 */
        double residual() {
            return dot(qtb, qtb, p);
        }

        /**
         * @param extra two columns of m values (not changed)
         * @return min ||A x + E y - b||^2 over x and y
         */
        double residualWith(double[][] extra) {
            double[] e1 = transformed(extra[0]);
            double[] e2 = transformed(extra[1]);
            double n11 = dot(e1, e1, p);
            double n12 = dot(e1, e2, p);
            double n22 = dot(e2, e2, p);
            double g1 = dot(e1, qtb, p);
            double g2 = dot(e2, qtb, p);
            double bb = residual();
            double det = n11 * n22 - n12 * n12;
            if (!(det > 1e-12 * n11 * n22)) {
                return n11 > 0 ? bb - g1 * g1 / n11 : bb;
            }
            return Math.max(0, bb - (n22 * g1 * g1 - 2 * n12 * g1 * g2 + n11 * g2 * g2) / det);
        }

        private double[] transformed(double[] column) {
            double[] c = column.clone();
            for (int k = 0; k < p; k++) {
                if (reflectorNorms[k] > 0) {
                    reflect(reflectors[k], c, k, reflectorNorms[k]);
                }
            }
            return c;
        }
    }

    /**
     * Factors min ||A x - b|| so that columns can be tried beside A ({@link Factor#residualWith}).
     *
     * @param columns p columns of length m (m above p), overwritten
     * @param rhs the m right-hand side values (not changed)
     * @return the factor
     */
    static Factor factor(double[][] columns, double[] rhs) {
        double[] b = rhs.clone();
        double[] norms = new double[columns.length];
        triangularise(columns, b, new double[columns.length], norms);
        return new Factor(columns, norms, b);
    }

    /**
     * Householder QR of the column-scaled A in place: fills scale, applies Q^T to b, returns R by rows; column k keeps
     * its reflector v_k from row k on, and ||v_k||^2 goes to {@code reflectorNorms} when given.
     */
    private static double[][] triangularise(double[][] columns, double[] b, double[] scale, double[] reflectorNorms) {
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
            if (reflectorNorms != null) {
                reflectorNorms[k] = vnorm2;
            }
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
