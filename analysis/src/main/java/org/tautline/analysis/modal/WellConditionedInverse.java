package org.tautline.analysis.modal;

import org.hipparchus.linear.Array2DRowRealMatrix;
import org.hipparchus.linear.EigenDecompositionSymmetric;

/**
 * (J^T J)^-1 of a refined model from its normal equations, when they are well enough conditioned to give it accurately.
 *
 * <p>With D the column norms of J and A = D^-1 J^T J D^-1, the eigen-decomposition A = V L V^T (Hipparchus 4.0.2,
 * {@link EigenDecompositionSymmetric}) gives the condition number of A, the square of J's, and the inverse
 * (J^T J)^-1 = D^-1 V L^-1 V^T D^-1. Forming A squares the condition number, so a relative rounding of about
 * cond(J)^2 eps enters the inverse (G. H. Golub and C. F. Van Loan, Matrix Computations, 4th ed. 2013, sec. 5.3.7,
 * from memory): at cond(J) &lt;= {@value #MAX_CONDITION} that is below 1e-5 of each standard error. A model worse
 * conditioned than that (close modes that nearly merge) is left to the QR and SVD of J itself.
 */
final class WellConditionedInverse {
    /** Largest condition number of the column-scaled Jacobian whose inverse is taken from the normal equations. */
    static final double MAX_CONDITION = 1e5;

    private WellConditionedInverse() {
    }

    /**
     * @param model the whitened model
     * @param point the scaled parameters at the solution
     * @param target the whitened stacked measurements
     * @return (J^T J)^-1 in the scaled parameters, or null when J's condition number exceeds {@value #MAX_CONDITION}
     */
    static double[][] of(ModalRefinementModel model, double[] point, double[] target) {
        int p = point.length;
        double[][] a = new double[p][p];
        model.normalEquations(point, target, new double[target.length], a, new double[p]);
        double[] scale = new double[p];
        for (int j = 0; j < p; j++) {
            if (!(a[j][j] > 0)) {
                return null;
            }
            scale[j] = Math.sqrt(a[j][j]);
        }
        for (int j = 0; j < p; j++) {
            for (int l = j; l < p; l++) {
                a[j][l] /= scale[j] * scale[l];
                a[l][j] = a[j][l];
            }
        }
        EigenDecompositionSymmetric eigen = new EigenDecompositionSymmetric(new Array2DRowRealMatrix(a, false));
        double[] values = eigen.getEigenvalues();
        double largest = Double.NEGATIVE_INFINITY;
        double smallest = Double.POSITIVE_INFINITY;
        for (double v : values) {
            largest = Math.max(largest, v);
            smallest = Math.min(smallest, v);
        }
        if (!(smallest > 0) || largest / smallest > MAX_CONDITION * MAX_CONDITION) {
            return null;
        }
        double[][] v = eigen.getV().getData();
        double[][] inverse = new double[p][p];
        for (int i = 0; i < p; i++) {
            for (int j = i; j < p; j++) {
                double sum = 0;
                for (int k = 0; k < p; k++) {
                    sum += v[i][k] * v[j][k] / values[k];
                }
                inverse[i][j] = sum / (scale[i] * scale[j]);
                inverse[j][i] = inverse[i][j];
            }
        }
        return inverse;
    }
}
