package org.tautline.analysis.modal;

import org.hipparchus.complex.Complex;
import org.hipparchus.linear.Array2DRowRealMatrix;
import org.hipparchus.linear.ArrayRealVector;
import org.hipparchus.linear.RealMatrix;
import org.hipparchus.linear.RealVector;
import org.hipparchus.optim.nonlinear.vector.leastsquares.LeastSquaresBuilder;
import org.hipparchus.optim.nonlinear.vector.leastsquares.LeastSquaresOptimizer;
import org.hipparchus.optim.nonlinear.vector.leastsquares.LevenbergMarquardtOptimizer;
import org.hipparchus.util.Pair;

/**
 * Local least-squares fit of one viscous mode plus a constant residual to a few receptance lines.
 *
 * <p>Model: H(w) = A/(w_n^2 - w^2 + 2 j zeta w_n w) + R, with A and R complex; R stands for the
 * nearly constant contribution of the other modes across the band (Ewins 2000, section 4.3, from
 * memory). The complex residuals are minimised in the Euclidean norm by Levenberg-Marquardt
 * (J. J. More, "The Levenberg-Marquardt algorithm: implementation and theory", in G. A. Watson (ed.),
 * Numerical Analysis, Springer LNM 630, 1978, from memory; as implemented by Hipparchus), in variables scaled by the
 * peak so that every unknown is of order one. With fewer than four lines R is left out.
 */
final class SdofFit {
    private SdofFit() {
    }

    /**
     * Fits the lines first..last.
     *
     * @return the mode, or null when the fit does not converge or lands outside the fitted band
     */
    static Mode fit(double[] frequencyHz, Complex[] h, int first, int last, int peakLine, double startHz,
                    double startDampingRatio) {
        int m = last - first + 1;
        boolean withResidual = m >= 4;
        int unknowns = withResidual ? 6 : 4;
        double[] x = new double[m];
        Complex scale = h[peakLine];
        double[] target = new double[2 * m];
        for (int k = 0; k < m; k++) {
            x[k] = frequencyHz[first + k] / startHz;
            Complex v = h[first + k].divide(scale);
            target[2 * k] = v.getReal();
            target[2 * k + 1] = v.getImaginary();
        }
        double xp = frequencyHz[peakLine] / startHz;
        Complex a0 = new Complex(1 - xp * xp, 2 * startDampingRatio * xp);
        double[] start = new double[unknowns];
        start[0] = 1;
        start[1] = startDampingRatio;
        start[2] = a0.getReal();
        start[3] = a0.getImaginary();
        LeastSquaresBuilder builder = new LeastSquaresBuilder()
                .start(start)
                .target(target)
                .model(point -> evaluate(point, x, withResidual))
                .lazyEvaluation(false)
                .maxEvaluations(2000)
                .maxIterations(2000);
        double[] p;
        try {
            LeastSquaresOptimizer.Optimum optimum = new LevenbergMarquardtOptimizer().optimize(builder.build());
            p = optimum.getPoint().toArray();
        } catch (RuntimeException e) {
            return null;
        }
        double xn = p[0];
        double zeta = p[1];
        if (!(xn >= x[0] && xn <= x[m - 1]) || !(zeta > 0 && zeta < 0.5)) {
            return null;
        }
        double wc = 2 * Math.PI * startHz;
        Complex modalConstant = new Complex(p[2], p[3]).multiply(scale).multiply(wc * wc);
        if (modalConstant.isNaN() || modalConstant.isInfinite()) {
            return null;
        }
        return new Mode(xn * startHz, zeta, modalConstant);
    }

    private static Pair<RealVector, RealMatrix> evaluate(RealVector point, double[] x, boolean withResidual) {
        double xn = point.getEntry(0);
        double zeta = point.getEntry(1);
        Complex a = new Complex(point.getEntry(2), point.getEntry(3));
        Complex r = withResidual ? new Complex(point.getEntry(4), point.getEntry(5)) : Complex.ZERO;
        int m = x.length;
        double[] value = new double[2 * m];
        double[][] jacobian = new double[2 * m][point.getDimension()];
        for (int k = 0; k < m; k++) {
            Complex d = new Complex(xn * xn - x[k] * x[k], 2 * zeta * xn * x[k]);
            Complex inverse = d.reciprocal();
            Complex model = a.multiply(inverse).add(r);
            Complex common = a.multiply(inverse).multiply(inverse).negate();
            Complex dXn = common.multiply(new Complex(2 * xn, 2 * zeta * x[k]));
            Complex dZeta = common.multiply(new Complex(0, 2 * xn * x[k]));
            Complex dAim = inverse.multiply(Complex.I);
            value[2 * k] = model.getReal();
            value[2 * k + 1] = model.getImaginary();
            fill(jacobian, k, 0, dXn);
            fill(jacobian, k, 1, dZeta);
            fill(jacobian, k, 2, inverse);
            fill(jacobian, k, 3, dAim);
            if (withResidual) {
                fill(jacobian, k, 4, Complex.ONE);
                fill(jacobian, k, 5, Complex.I);
            }
        }
        return new Pair<>(new ArrayRealVector(value, false), new Array2DRowRealMatrix(jacobian, false));
    }

    private static void fill(double[][] jacobian, int line, int column, Complex derivative) {
        jacobian[2 * line][column] = derivative.getReal();
        jacobian[2 * line + 1][column] = derivative.getImaginary();
    }
}
