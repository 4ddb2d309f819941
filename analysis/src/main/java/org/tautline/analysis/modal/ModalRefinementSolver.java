package org.tautline.analysis.modal;

import org.hipparchus.exception.MathIllegalArgumentException;
import org.hipparchus.linear.Array2DRowRealMatrix;
import org.hipparchus.linear.ArrayRealVector;
import org.hipparchus.linear.CholeskyDecomposition;
import org.hipparchus.linear.DecompositionSolver;

/**
 * A Levenberg-Marquardt minimiser of the whitened modal residual, each step solved from the column-scaled normal
 * equations.
 *
 * <p>Each step minimises ||J d - r||^2 + lambda sum_j ||J_j||^2 d_j^2, Marquardt's damping scaled by the column
 * norms of J (D. W. Marquardt, "An algorithm for least-squares estimation of nonlinear parameters", SIAM J. Appl.
 * Math. 11:431-441, 1963, from memory): with D the column norms and A = D^-1 J^T J D^-1 (unit diagonal), the step is
 * d = D^-1 y with (A + lambda I) y = D^-1 J^T r, solved by Cholesky (Hipparchus). A and the gradient are formed once
 * per iteration, row by row of J, which the compiler can vectorise; each trial lambda then solves only a p x p system.
 * The gradient J^T r is exact, so the point the iteration stops at is the least-squares one whatever the rounding of A:
 * squaring the condition number of J costs at most some accepted steps, and a step that rounding spoils raises the cost,
 * is refused and raises lambda. The standard errors at the solution are computed apart, from a Householder QR of J
 * ({@link ModalRefinement}), where the accuracy matters. lambda falls tenfold after a step that lowers the cost and
 * rises tenfold after one that does not. The minimiser stops when an accepted step lowers the cost by less than
 * {@link #RELATIVE_COST} of it or moves no scaled parameter by more than {@link #STEP}. A QR of the 8000 x 80 Jacobian
 * of a 24-mode fit of 4000 lines at every iteration took four fifths of such a fit; the normal equations take a
 * fraction of that.
 */
final class ModalRefinementSolver {
    /** Relative cost decrease below which an accepted step ends the iteration. */
    static final double RELATIVE_COST = 1e-10;
    /** Largest change of a scaled parameter (all of order one) below which a step ends the iteration. */
    static final double STEP = 1e-10;
    private static final double START_DAMPING = 1e-3;
    private static final double MAX_DAMPING = 1e16;
    /** Smallest Cholesky pivot of the unit-diagonal damped matrix accepted: below it the step is taken as singular. */
    private static final double SMALLEST_PIVOT = 1e-14;

    /**
     * Where the minimiser stopped.
     *
     * @param point the scaled parameters
     * @param cost the sum of squared whitened residuals there
     * @param iterations the Jacobian evaluations used
     * @param converged false when maxIterations ran out first
     */
    record Outcome(double[] point, double cost, int iterations, boolean converged) {
    }

    private ModalRefinementSolver() {
    }

    /**
     * Minimises ||target - model(p)||^2 from the model's start.
     *
     * @param model the whitened model
     * @param target the whitened stacked measurements, 2m values
     * @param maxIterations Jacobian evaluations allowed, at least 1
     * @return the outcome
     */
    static Outcome minimise(ModalRefinementModel model, double[] target, int maxIterations) {
        int p = model.parameterCount();
        int rows = target.length;
        double[] point = model.start();
        double[] values = new double[rows];
        Normal normal = Normal.of(model, point, target, values);
        double cost = cost(target, values);
        double lambda = START_DAMPING;
        int iterations = 1;
        while (true) {
            double[] d = normal.step(lambda);
            double largest = 0;
            double[] trial = point.clone();
            if (d != null) {
                for (int j = 0; j < p; j++) {
                    trial[j] += d[j];
                    largest = Math.max(largest, Math.abs(d[j]));
                }
            }
            if (d == null || !Double.isFinite(largest)) {
                lambda *= 10;
            } else {
                double[] trialValues = new double[rows];
                double trialCost = cost(target, model.values(trial, trialValues));
                if (trialCost < cost) {
                    double drop = cost - trialCost;
                    point = trial;
                    cost = trialCost;
                    values = trialValues;
                    lambda = Math.max(lambda / 10, 1e-12);
                    if (drop <= RELATIVE_COST * (cost + drop) || largest <= STEP) {
                        return new Outcome(point, cost, iterations, true);
                    }
                    if (iterations >= maxIterations) {
                        return new Outcome(point, cost, iterations, false);
                    }
                    normal = Normal.of(model, point, target, values);
                    iterations++;
                    continue;
                }
                if (largest <= STEP) {
                    return new Outcome(point, cost, iterations, true);
                }
                lambda *= 10;
            }
            if (lambda > MAX_DAMPING) {
                return new Outcome(point, cost, iterations, true);
            }
        }
    }

    /**
     * The column-scaled normal equations of one iteration.
     *
     * @param matrix A = D^-1 J^T J D^-1, unit diagonal (upper triangle and diagonal filled, then mirrored)
     * @param gradient D^-1 J^T r
     * @param scale the column norms D (1 for a zero column)
     */
    private record Normal(double[][] matrix, double[] gradient, double[] scale) {
        /** The equations at a point, filling the model's values there. */
        static Normal of(ModalRefinementModel model, double[] point, double[] target, double[] values) {
            int p = point.length;
            double[][] a = new double[p][p];
            double[] g = new double[p];
            model.normalEquations(point, target, values, a, g);
            double[] scale = new double[p];
            for (int j = 0; j < p; j++) {
                scale[j] = a[j][j] > 0 ? Math.sqrt(a[j][j]) : 1;
            }
            for (int j = 0; j < p; j++) {
                g[j] /= scale[j];
                for (int l = j; l < p; l++) {
                    a[j][l] /= scale[j] * scale[l];
                    a[l][j] = a[j][l];
                }
            }
            return new Normal(a, g, scale);
        }

        /** The step for a damping, or null when the damped matrix is singular to working accuracy. */
        double[] step(double lambda) {
            int p = gradient.length;
            double[][] damped = new double[p][];
            for (int j = 0; j < p; j++) {
                damped[j] = matrix[j].clone();
                damped[j][j] += lambda * Math.max(matrix[j][j], Double.MIN_NORMAL);
            }
            DecompositionSolver solver;
            try {
                solver = new CholeskyDecomposition(new Array2DRowRealMatrix(damped, false),
                        CholeskyDecomposition.DEFAULT_RELATIVE_SYMMETRY_THRESHOLD, SMALLEST_PIVOT).getSolver();
            } catch (MathIllegalArgumentException e) {
                return null;
            }
            double[] y = solver.solve(new ArrayRealVector(gradient, false)).toArray();
            for (int j = 0; j < p; j++) {
                y[j] /= scale[j];
            }
            return y;
        }
    }

    private static double cost(double[] target, double[] values) {
        double sum = 0;
        for (int i = 0; i < target.length; i++) {
            double e = target[i] - values[i];
            sum += e * e;
        }
        return sum;
    }
}
