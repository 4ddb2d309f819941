package org.tautline.analysis.specimen;

import org.tautline.analysis.AnalysisException;

/**
 * Weighted least-squares straight line y = a + b x with the covariance of (a, b).
 *
 * <p>Normal equations of the weighted fit, weights 1/sigma_i^2 (e.g. W. H. Press et al., Numerical
 * Recipes, 3rd ed. 2007, section 15.2, "Fitting data to a straight line"). The covariance is that
 * implied by the stated sigmas; {@link #chiSquare()} lets the caller judge whether they were right.
 */
final class WeightedLine {
    private final double intercept;
    private final double slope;
    private final double varianceIntercept;
    private final double varianceSlope;
    private final double covariance;
    private final double chiSquare;
    private final int points;

    private WeightedLine(double intercept, double slope, double varA, double varB, double cov, double chi2, int points) {
        this.intercept = intercept;
        this.slope = slope;
        this.varianceIntercept = varA;
        this.varianceSlope = varB;
        this.covariance = cov;
        this.chiSquare = chi2;
        this.points = points;
    }

    /**
     * Fits the line.
     *
     * @param x abscissae, at least two distinct
     * @param y ordinates
     * @param sigma standard errors of y, positive
     * @return the fit
     */
    static WeightedLine fit(double[] x, double[] y, double[] sigma) {
        double s = 0;
        double sx = 0;
        double sy = 0;
        double sxx = 0;
        double sxy = 0;
        for (int i = 0; i < x.length; i++) {
            if (!(sigma[i] > 0)) {
                throw new AnalysisException("standard error " + i + " must be positive, got " + sigma[i]);
            }
            double w = 1.0 / (sigma[i] * sigma[i]);
            s += w;
            sx += w * x[i];
            sy += w * y[i];
            sxx += w * x[i] * x[i];
            sxy += w * x[i] * y[i];
        }
        double delta = s * sxx - sx * sx;
        if (!(delta > 1e-12 * s * sxx)) {
            throw new AnalysisException("a straight-line fit needs at least two distinct abscissae, got " + x.length
                    + " points");
        }
        double a = (sxx * sy - sx * sxy) / delta;
        double b = (s * sxy - sx * sy) / delta;
        double chi2 = 0;
        for (int i = 0; i < x.length; i++) {
            double r = (y[i] - a - b * x[i]) / sigma[i];
            chi2 += r * r;
        }
        return new WeightedLine(a, b, sxx / delta, s / delta, -sx / delta, chi2, x.length);
    }

    double intercept() {
        return intercept;
    }

    double slope() {
        return slope;
    }

    double varianceIntercept() {
        return varianceIntercept;
    }

    double varianceSlope() {
        return varianceSlope;
    }

    double covariance() {
        return covariance;
    }

    double chiSquare() {
        return chiSquare;
    }

    int degreesOfFreedom() {
        return points - 2;
    }
}
