package org.tautline.analysis.modal;

/**
 * A Levenberg-Marquardt minimiser of the whitened modal residual, each step solved by QR of the damped system.
 *
 * <p>Each step minimises ||J d - r||^2 + lambda sum_j ||J_j||^2 d_j^2, Marquardt's damping scaled by the column
 * norms of J (D. W. Marquardt, "An algorithm for least-squares estimation of nonlinear parameters", SIAM J. Appl.
 * Math. 11:431-441, 1963, from memory). J and r are reduced once per iteration by Householder QR to the p x p
 * triangle R and Q^T r ({@link LsfdLeastSquares#reduce}); each trial lambda then solves only the 2p x p system of R
 * stacked on the damping rows. No normal equations are formed, so close modes keep their accuracy. lambda falls tenfold after a step that lowers the cost and rises tenfold after one that does
 * not. The minimiser stops when an accepted step lowers the cost by less than {@link #RELATIVE_COST} of it or
 * moves no scaled parameter by more than {@link #STEP}. The model works on columns throughout, which keeps the
 * 8000 x 34 Jacobian of a 10-mode fit of 4000 lines in cache-friendly arrays; this replaced a general-purpose
 * optimiser whose row-wise QR took two thirds of a whole modal fit.
 */
final class ModalRefinementSolver {
    /** Relative cost decrease below which an accepted step ends the iteration. */
    static final double RELATIVE_COST = 1e-10;
    /** Largest change of a scaled parameter (all of order one) below which a step ends the iteration. */
    static final double STEP = 1e-10;
    private static final double START_DAMPING = 1e-3;
    private static final double MAX_DAMPING = 1e16;

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
        double[][] columns = model.jacobianColumns(point, values);
        double cost = cost(target, values);
        double lambda = START_DAMPING;
        int iterations = 1;
        double[][] reduced = reduced(columns, target, values);
        while (true) {
            double[][] damped = new double[p][2 * p];
            for (int j = 0; j < p; j++) {
                System.arraycopy(reduced[j], 0, damped[j], 0, p);
                double norm = 0;
                for (int i = 0; i < p; i++) {
                    norm += reduced[j][i] * reduced[j][i];
                }
                damped[j][p + j] = Math.sqrt(lambda * norm);
            }
            double[] residual = new double[2 * p];
            System.arraycopy(reduced[p], 0, residual, 0, p);
            LsfdLeastSquares step = LsfdLeastSquares.solve(damped, residual);
            double[] d = step.solution();
            double largest = 0;
            double[] trial = point.clone();
            for (int j = 0; j < p; j++) {
                trial[j] += d[j];
                largest = Math.max(largest, Math.abs(d[j]));
            }
            if (!step.fullRank() || !Double.isFinite(largest)) {
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
                    reduced = reduced(model.jacobianColumns(point, values), target, values);
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

    /** R and Q^T r of the Jacobian and the residual r = target - values, see {@link LsfdLeastSquares#reduce}. */
    private static double[][] reduced(double[][] columns, double[] target, double[] values) {
        double[] residual = new double[target.length];
        for (int i = 0; i < target.length; i++) {
            residual[i] = target[i] - values[i];
        }
        return LsfdLeastSquares.reduce(columns, residual);
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
