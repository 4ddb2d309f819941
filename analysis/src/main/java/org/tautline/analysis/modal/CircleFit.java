package org.tautline.analysis.modal;

import org.hipparchus.complex.Complex;
import org.tautline.analysis.AnalysisException;
import org.tautline.analysis.frf.Frf;
import org.tautline.analysis.frf.FrfQuantity;

/**
 * A circle fit of one isolated mode: natural frequency, damping and modal constant from the mobility circle.
 *
 * <p>Source: C. C. Kennedy and C. D. P. Pancu, "Use of vectors in vibration measurement and analysis",
 * J. Aeronaut. Sci. 14:603-625, 1947, and D. J. Ewins, Modal Testing, 2nd ed. 2000, section 4.3 (both from
 * memory). The quantity is the MOBILITY: for a viscous mode Y = j w A/D, D = w_n^2 - w^2 + 2 j zeta w_n w,
 * traces an exact circle of diameter |A|/(2 zeta w_n); a constant from other modes only moves its centre.
 * With u = (w_n^2 - w^2)/(2 zeta w_n w) one finds Y - centre = (|A|/(4 zeta w_n)) e^{j(arg A + 2 atan u)}, so the
 * angle of a point around the centre, measured from the resonance radius, is theta = 2 atan u.
 *
 * <p>Steps: (1) the algebraic least-squares circle of I. Kasa, IEEE Trans. Instrum. Meas. IM-25:8-14, 1976
 * (from memory), exact for points on a circle; (2) the natural frequency at the maximum angular spacing rate
 * d theta/d ln f, located by a parabola through the largest finite-difference rate and its neighbours; the
 * resonance radius by interpolating theta linearly in ln f there; (3) damping from pairs of points a above and
 * b below resonance, at angles t_a, t_b from the resonance radius. The viscous form used for the damping ratio,
 * derived from theta = 2 atan u above, is zeta = (w_a^2 - w_b^2)/(2 w_r (w_a tan(t_a/2) + w_b tan(t_b/2)));
 * Ewins' loss factor eta = (w_a^2 - w_b^2)/(w_r^2 (tan(t_a/2) + tan(t_b/2))) is reported beside it, and
 * eta ~ 2 zeta for light damping and points close to resonance; (4) A = 2 zeta w_r (2 radius) e^{j phi_r},
 * phi_r the angle of the resonance radius.
 *
 * <p>Exactness: the angular rate d theta/d ln f of a viscous mobility circle is an even function of
 * ln(f/f_n), so on lines uniform in ln f with f_n on a line or midway between two lines the parabola's vertex is
 * exactly f_n; the damping pair formula is exact for any pair once f_r and the resonance radius are.
 * Elsewhere f_r is an interpolation, good to a small fraction of the line spacing. Pairs whose angles from
 * the resonance radius both lie within 90 degrees are averaged.
 *
 * @param centre centre of the mobility circle, m/(N s)
 * @param radius radius of the circle, m/(N s)
 * @param naturalFrequencyHz f_r, Hz
 * @param dampingRatio zeta from the viscous pair formula, averaged over pairs
 * @param lossFactor Ewins' eta from the same pairs, averaged
 * @param modalConstant A in the receptance form A/D, 1/kg
 * @param linesUsed number of lines in the band
 * @param pairsUsed number of point pairs averaged for the damping
 */
public record CircleFit(Complex centre, double radius, double naturalFrequencyHz, double dampingRatio, double lossFactor,
                        Complex modalConstant, int linesUsed, int pairsUsed) {

    /**
     * Fits the circle of the lines in a band around one isolated peak.
     *
     * @param frf the FRF, any quantity (converted to mobility)
     * @param fromHz lowest line used, Hz
     * @param toHz highest line used, Hz
     * @return the circle and the modal parameters read from it
     */
    public static CircleFit of(Frf frf, double fromHz, double toHz) {
        if (frf == null) {
            throw new AnalysisException("a circle fit needs an FRF, got none");
        }
        LsfdOptions.checkBand(fromHz, toHz);
        Frf y = frf.toQuantity(FrfQuantity.MOBILITY);
        int n = 0;
        for (int i = 0; i < y.size(); i++) {
            if (y.frequencyHz(i) >= fromHz && y.frequencyHz(i) <= toHz) {
                n++;
            }
        }
        if (n < 5) {
            throw new AnalysisException("a circle fit needs at least 5 lines around the peak, got " + n + " in "
                    + fromHz + ".." + toHz + " Hz");
        }
        double[] f = new double[n];
        Complex[] v = new Complex[n];
        int k = 0;
        for (int i = 0; i < y.size(); i++) {
            if (y.frequencyHz(i) >= fromHz && y.frequencyHz(i) <= toHz) {
                f[k] = y.frequencyHz(i);
                v[k++] = y.value(i);
            }
        }
        Complex centre = kasaCentre(v);
        double radius = 0;
        for (Complex p : v) {
            radius += p.subtract(centre).norm();
        }
        radius /= n;
        double[] theta = new double[n];
        for (int i = 0; i < n; i++) {
            theta[i] = v[i].subtract(centre).getArgument();
            if (i > 0) {
                while (theta[i] > theta[i - 1]) {
                    theta[i] -= 2 * Math.PI;
                }
                if (theta[i - 1] - theta[i] > Math.PI) {
                    throw new AnalysisException("a circle fit needs points that turn steadily one way round the circle, "
                            + "but lines " + (i - 1) + " and " + i + " (" + f[i - 1] + ", " + f[i]
                            + " Hz) are more than half a turn apart; use a band holding one mode with finer lines");
                }
            }
        }
        int j = maxRate(f, theta);
        if (j == 0 || j == n - 2) {
            throw new AnalysisException("the maximum angular spacing lies at the edge of the band " + f[0] + ".."
                    + f[n - 1] + " Hz; centre the band on the peak");
        }
        double xr = vertex(mid(f, j - 1), rate(f, theta, j - 1), mid(f, j), rate(f, theta, j), mid(f, j + 1),
                rate(f, theta, j + 1));
        double fr = Math.exp(xr);
        int below = 0;
        while (below + 1 < n && f[below + 1] <= fr) {
            below++;
        }
        if (below == n - 1) {
            throw new AnalysisException("a circle fit found resonance at the last line " + fr + " Hz; centre the band on the peak");
        }
        double t = (xr - Math.log(f[below])) / (Math.log(f[below + 1]) - Math.log(f[below]));
        double phi = theta[below] + t * (theta[below + 1] - theta[below]);
        double wr = 2 * Math.PI * fr;
        double zetaSum = 0;
        double etaSum = 0;
        int pairs = 0;
        // A line within 1e-9 of f_r is the resonance point itself and pairs with nothing.
        int firstBelow = f[below] < fr * (1 - 1e-9) ? below : below - 1;
        int firstAbove = f[below + 1] > fr * (1 + 1e-9) ? below + 1 : below + 2;
        for (int b = firstBelow, a = firstAbove; b >= 0 && a < n; b--, a++) {
            double tb = theta[b] - phi;
            double ta = phi - theta[a];
            if (!(tb > 0 && tb <= Math.PI / 2 && ta > 0 && ta <= Math.PI / 2)) {
                break;
            }
            double wa = 2 * Math.PI * f[a];
            double wb = 2 * Math.PI * f[b];
            double tanA = Math.tan(ta / 2);
            double tanB = Math.tan(tb / 2);
            zetaSum += (wa * wa - wb * wb) / (2 * wr * (wa * tanA + wb * tanB));
            etaSum += (wa * wa - wb * wb) / (wr * wr * (tanA + tanB));
            pairs++;
        }
        if (pairs == 0) {
            throw new AnalysisException("a circle fit needs a line on each side of resonance within 90 degrees of it, "
                    + "found none around " + fr + " Hz; use finer lines");
        }
        double zeta = zetaSum / pairs;
        Complex a = Complex.valueOf(Math.cos(phi), Math.sin(phi)).multiply(4 * zeta * wr * radius);
        return new CircleFit(centre, radius, fr, zeta, etaSum / pairs, a, n, pairs);
    }

    /** Kasa: minimise sum (x^2 + y^2 + D x + E y + F)^2, on coordinates shifted to the mean and scaled. */
    private static Complex kasaCentre(Complex[] v) {
        int n = v.length;
        Complex mean = Complex.ZERO;
        for (Complex p : v) {
            mean = mean.add(p);
        }
        mean = mean.divide(n);
        double s = 0;
        for (Complex p : v) {
            s = Math.max(s, p.subtract(mean).norm());
        }
        if (!(s > 0)) {
            throw new AnalysisException("a circle fit needs points that differ, but every line has the value " + mean);
        }
        double[][] columns = new double[3][n];
        double[] rhs = new double[n];
        for (int i = 0; i < n; i++) {
            Complex q = v[i].subtract(mean).divide(s);
            columns[0][i] = q.getReal();
            columns[1][i] = q.getImaginary();
            columns[2][i] = 1;
            rhs[i] = -(q.getReal() * q.getReal() + q.getImaginary() * q.getImaginary());
        }
        LsfdLeastSquares solve = LsfdLeastSquares.solve(columns, rhs);
        if (!solve.fullRank()) {
            throw new AnalysisException("a circle fit needs points that span a circle, but the " + n
                    + " points lie on a line");
        }
        double[] x = solve.solution();
        return new Complex(-x[0] / 2, -x[1] / 2).multiply(s).add(mean);
    }

    private static int maxRate(double[] f, double[] theta) {
        int best = 0;
        for (int i = 1; i < f.length - 1; i++) {
            if (rate(f, theta, i) > rate(f, theta, best)) {
                best = i;
            }
        }
        return best;
    }

    private static double rate(double[] f, double[] theta, int i) {
        return (theta[i] - theta[i + 1]) / (Math.log(f[i + 1]) - Math.log(f[i]));
    }

    private static double mid(double[] f, int i) {
        return 0.5 * (Math.log(f[i]) + Math.log(f[i + 1]));
    }

    /** Abscissa of the vertex of the parabola through three points. */
    private static double vertex(double x0, double y0, double x1, double y1, double x2, double y2) {
        double d01 = (y1 - y0) / (x1 - x0);
        double d12 = (y2 - y1) / (x2 - x1);
        double curvature = (d12 - d01) / (x2 - x0);
        if (!(curvature < 0)) {
            return x1;
        }
        return 0.5 * (x0 + x1) - d01 / (2 * curvature);
    }
}
