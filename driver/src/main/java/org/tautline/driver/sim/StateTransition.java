package org.tautline.driver.sim;

import org.tautline.driver.RigException;

/**
 * Small dense-matrix helpers for the integrator: a 2x2 matrix exponential and a small inverse.
 *
 * <p>The exponential uses scaling and squaring with a Taylor series (C. Moler and C. Van Loan,
 * "Nineteen dubious ways to compute the exponential of a matrix, twenty-five years later", SIAM
 * Review 45(1):3-49, 2003); the inverse is Gauss-Jordan elimination with partial pivoting.
 */
final class StateTransition {
    private StateTransition() {
    }

    /**
     * State-transition matrix of m x'' + c x' + k x = 0 over one step, for any damping (under-, over-, critical).
     *
     * @param massKg m, kg
     * @param stiffnessNPerM k, N/m
     * @param dampingNsPerM c, N s/m
     * @param stepS step, s
     * @return {{x11, x12}, {x21, x22}} mapping (x, v) at t to (x, v) at t + step
     */
    static double[][] oscillator(double massKg, double stiffnessNPerM, double dampingNsPerM, double stepS) {
        double[][] a = {{0.0, stepS}, {-stiffnessNPerM / massKg * stepS, -dampingNsPerM / massKg * stepS}};
        double norm = Math.max(Math.abs(a[0][0]) + Math.abs(a[0][1]), Math.abs(a[1][0]) + Math.abs(a[1][1]));
        int squarings = norm > 0.125 ? (int) Math.ceil(Math.log(norm / 0.125) / Math.log(2.0)) : 0;
        double scale = Math.scalb(1.0, -squarings);
        double[][] x = {{a[0][0] * scale, a[0][1] * scale}, {a[1][0] * scale, a[1][1] * scale}};
        double[][] sum = {{1.0, 0.0}, {0.0, 1.0}};
        double[][] term = {{1.0, 0.0}, {0.0, 1.0}};
        for (int k = 1; k <= 18; k++) {
            term = multiply(term, x);
            for (int r = 0; r < 2; r++) {
                for (int c = 0; c < 2; c++) {
                    term[r][c] /= k;
                    sum[r][c] += term[r][c];
                }
            }
        }
        for (int s = 0; s < squarings; s++) {
            sum = multiply(sum, sum);
        }
        return sum;
    }

    private static double[][] multiply(double[][] p, double[][] q) {
        return new double[][] {
            {p[0][0] * q[0][0] + p[0][1] * q[1][0], p[0][0] * q[0][1] + p[0][1] * q[1][1]},
            {p[1][0] * q[0][0] + p[1][1] * q[1][0], p[1][0] * q[0][1] + p[1][1] * q[1][1]}
        };
    }

    /**
     * Inverse of a small square matrix.
     *
     * @param matrix the matrix, not changed
     * @return its inverse
     */
    static double[][] inverse(double[][] matrix) {
        int size = matrix.length;
        double[][] work = new double[size][2 * size];
        for (int r = 0; r < size; r++) {
            System.arraycopy(matrix[r], 0, work[r], 0, size);
            work[r][size + r] = 1.0;
        }
        for (int col = 0; col < size; col++) {
            int pivot = col;
            for (int r = col + 1; r < size; r++) {
                if (Math.abs(work[r][col]) > Math.abs(work[pivot][col])) {
                    pivot = r;
                }
            }
            if (!(Math.abs(work[pivot][col]) > 0)) {
                throw new RigException("constraint matrix of the simulated rig is singular at column " + col
                        + "; check that the stinger and the accelerometer are not at the same point");
            }
            double[] swap = work[col];
            work[col] = work[pivot];
            work[pivot] = swap;
            double p = work[col][col];
            for (int c = 0; c < 2 * size; c++) {
                work[col][c] /= p;
            }
            for (int r = 0; r < size; r++) {
                if (r != col) {
                    double f = work[r][col];
                    for (int c = 0; c < 2 * size; c++) {
                        work[r][c] -= f * work[col][c];
                    }
                }
            }
        }
        double[][] result = new double[size][size];
        for (int r = 0; r < size; r++) {
            System.arraycopy(work[r], size, result[r], 0, size);
        }
        return result;
    }
}
