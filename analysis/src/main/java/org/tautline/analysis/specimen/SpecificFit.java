package org.tautline.analysis.specimen;

import java.util.List;
import java.util.function.DoubleUnaryOperator;

import org.hipparchus.exception.MathIllegalStateException;
import org.hipparchus.linear.Array2DRowRealMatrix;
import org.hipparchus.linear.ArrayRealVector;
import org.hipparchus.linear.RealMatrix;
import org.hipparchus.linear.RealVector;
import org.hipparchus.optim.nonlinear.vector.leastsquares.LeastSquaresBuilder;
import org.hipparchus.optim.nonlinear.vector.leastsquares.LeastSquaresOptimizer;
import org.hipparchus.optim.nonlinear.vector.leastsquares.LevenbergMarquardtOptimizer;
import org.hipparchus.util.Pair;
import org.tautline.analysis.AnalysisException;

/**
 * Fit of the specific tension tau = T/mu and specific bending stiffness eta = EI/mu to a harmonic series.
 *
 * <p>Frequencies of a string depend on T and EI only through T/mu and EI/mu, so the fit is made in
 * those and the density's uncertainty is added afterwards. Pinned ends: (f_n/n)^2 = tau/(4 L^2) +
 * pi^2 eta n^2/(4 L^4), a weighted straight line in n^2 (Fletcher 1964). Other models: weighted
 * nonlinear least squares by Levenberg-Marquardt (Hipparchus {@link LevenbergMarquardtOptimizer}),
 * in parameters scaled by a starting guess, Jacobian by central differences. A frequency factor that
 * depends on tau (a moving belt, Mote 1965) multiplies every model frequency; the line fit takes it
 * as a fixed number from the caller's previous pass. When the reduced
 * chi-square exceeds 1 the covariance is scaled by it (the stated errors understate the scatter:
 * common practice).
 */
final class SpecificFit {
    /** A model frequency f_n(tau, eta) for one harmonic. */
    interface Model {
        double frequencyHz(int harmonic, double tau, double eta);
    }

    final double tau;
    final double eta;
    final double varTau;
    final double varEta;
    final double covTauEta;
    final double reducedChiSquare;

    private SpecificFit(double tau, double eta, double varTau, double varEta, double cov, double reducedChi2) {
        this.tau = tau;
        this.eta = eta;
        this.varTau = varTau;
        this.varEta = varEta;
        this.covTauEta = cov;
        this.reducedChiSquare = reducedChi2;
    }

    static SpecificFit pinnedLine(List<NumberedFrequency> series, double lengthM, double factor) {
        int m = series.size();
        double[] x = new double[m];
        double[] y = new double[m];
        double[] s = new double[m];
        for (int i = 0; i < m; i++) {
            NumberedFrequency p = series.get(i);
            double f = p.frequencyHz() / factor;
            double sf = p.frequencyStdHz() / factor;
            x[i] = (double) p.harmonic() * p.harmonic();
            y[i] = f * f / x[i];
            s[i] = 2 * f * sf / x[i];
        }
        WeightedLine line = WeightedLine.fit(x, y, s);
        double scale = line.degreesOfFreedom() > 0 ? Math.max(1, line.chiSquare() / line.degreesOfFreedom()) : 1;
        double l2 = lengthM * lengthM;
        double ka = 4 * l2;
        double kb = 4 * l2 * l2 / (Math.PI * Math.PI);
        return new SpecificFit(ka * line.intercept(), kb * line.slope(), scale * ka * ka * line.varianceIntercept(),
                scale * kb * kb * line.varianceSlope(), scale * ka * kb * line.covariance(),
                line.degreesOfFreedom() > 0 ? line.chiSquare() / line.degreesOfFreedom() : Double.NaN);
    }

    static SpecificFit nonlinear(List<NumberedFrequency> series, Model model, double tauStart, double etaStart,
                                 DoubleUnaryOperator correction) {
        int m = series.size();
        double[] target = new double[m];
        for (int i = 0; i < m; i++) {
            NumberedFrequency p = series.get(i);
            target[i] = p.frequencyHz() / p.frequencyStdHz();
        }
        double[] scale = {tauStart, etaStart};
        LeastSquaresBuilder builder = new LeastSquaresBuilder()
                .start(new double[] {1, 1})
                .target(target)
                .maxEvaluations(2000)
                .maxIterations(500)
                .parameterValidator(p -> new ArrayRealVector(new double[] {Math.max(p.getEntry(0), 1e-9),
                        Math.max(p.getEntry(1), 1e-9)}))
                .model(point -> evaluate(point, scale, series, model, correction));
        LeastSquaresOptimizer.Optimum optimum;
        try {
            optimum = new LevenbergMarquardtOptimizer().optimize(builder.build());
        } catch (MathIllegalStateException e) {
            throw new AnalysisException("the stiff-string fit to " + m + " harmonics did not converge: "
                    + e.getMessage(), e);
        }
        RealVector p = optimum.getPoint();
        RealMatrix cov = optimum.getCovariances(1e-14);
        int dof = m - 2;
        double chi2 = optimum.getChiSquare();
        double inflate = dof > 0 ? Math.max(1, chi2 / dof) : 1;
        return new SpecificFit(p.getEntry(0) * scale[0], p.getEntry(1) * scale[1],
                inflate * cov.getEntry(0, 0) * scale[0] * scale[0], inflate * cov.getEntry(1, 1) * scale[1] * scale[1],
                inflate * cov.getEntry(0, 1) * scale[0] * scale[1], dof > 0 ? chi2 / dof : Double.NaN);
    }

    private static Pair<RealVector, RealMatrix> evaluate(RealVector point, double[] scale,
                                                         List<NumberedFrequency> series, Model model,
                                                         DoubleUnaryOperator correction) {
        int m = series.size();
        double[] value = new double[m];
        double[][] jacobian = new double[m][2];
        double p0 = point.getEntry(0);
        double p1 = point.getEntry(1);
        for (int i = 0; i < m; i++) {
            NumberedFrequency s = series.get(i);
            int n = s.harmonic();
            double tau = p0 * scale[0];
            double eta = p1 * scale[1];
            double factor = correction.applyAsDouble(tau);
            double w = 1 / s.frequencyStdHz();
            value[i] = w * factor * model.frequencyHz(n, tau, eta);
            double h0 = 1e-6 * p0;
            double h1 = 1e-6 * p1;
            jacobian[i][0] = w * (correction.applyAsDouble((p0 + h0) * scale[0]) * model.frequencyHz(n, (p0 + h0) * scale[0], eta)
                    - correction.applyAsDouble((p0 - h0) * scale[0]) * model.frequencyHz(n, (p0 - h0) * scale[0], eta))
                    / (2 * h0);
            jacobian[i][1] = w * factor * (model.frequencyHz(n, tau, (p1 + h1) * scale[1])
                    - model.frequencyHz(n, tau, (p1 - h1) * scale[1])) / (2 * h1);
        }
        return new Pair<>(new ArrayRealVector(value, false), new Array2DRowRealMatrix(jacobian, false));
    }
}
