package org.tautline.analysis.specimen;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.TreeMap;

import org.hipparchus.linear.Array2DRowRealMatrix;
import org.hipparchus.linear.ArrayRealVector;
import org.hipparchus.linear.RealMatrix;
import org.hipparchus.linear.RealVector;
import org.hipparchus.optim.nonlinear.vector.leastsquares.LeastSquaresBuilder;
import org.hipparchus.optim.nonlinear.vector.leastsquares.LeastSquaresOptimizer;
import org.hipparchus.optim.nonlinear.vector.leastsquares.LevenbergMarquardtOptimizer;
import org.hipparchus.util.Pair;
import org.tautline.analysis.AnalysisException;
import org.tautline.analysis.modal.FittedMode;

/**
 * Compares measured modal constants with the point-force pattern of a string and locates the shaker and sensor.
 *
 * <p>With mass-normalised modes phi_n = sqrt(2/(mu L)) sin(n pi x/L), a point force at x_f and a
 * response at x_s give modal constants A_n = (2/(mu L)) sin(n pi x_f/L) sin(n pi x_s/L) (the modal
 * expansion of the string's receptance, e.g. D. J. Ewins, Modal Testing, 2nd ed. 2000, from memory).
 * A sensor whose axis is at angle theta to the drive sees cos(theta) of it; for a split doublet with
 * principal axes at psi, the two polarisations contribute cos(psi) cos(psi - theta) and
 * sin(psi) sin(psi - theta), which sum to cos(theta) whatever psi, so the polarisations of a doublet
 * are summed. The real part of each modal constant is used, sign included. One common scale (sensor
 * calibration and polarity) is fitted by weighted least squares. The positions are then fitted with
 * the scale: a grid over the span ({@value #GRID_STEPS} steps per axis) followed by
 * Levenberg-Marquardt; covariance scaled by the reduced chi-square when it exceeds 1 (common
 * practice). A position is flagged when it differs from the stated one by more than the tolerance,
 * default 1 % of L (our choice: a stinger placed to a few millimetres on a metre span).
 */
public final class ParticipationPattern {
    private static final int GRID_STEPS = 200;
    private final double toleranceFractionOfLength;

    /** A comparison with the default tolerance of 1 % of the span. */
    public ParticipationPattern() {
        this(0.01);
    }

    private ParticipationPattern(double tolerance) {
        this.toleranceFractionOfLength = tolerance;
    }

    /**
     * Sets how far a fitted position may lie from the stated one before it is flagged.
     *
     * @param fractionOfLength 0..0.5 of L, default 0.01
     * @return a new comparison
     */
    public ParticipationPattern withPositionTolerance(double fractionOfLength) {
        if (!(fractionOfLength > 0 && fractionOfLength < 0.5)) {
            throw new AnalysisException("position tolerance must lie between 0 and 0.5 of the span, got " + fractionOfLength);
        }
        return new ParticipationPattern(fractionOfLength);
    }

    /**
     * The expected modal constant of harmonic n at the stated setup.
     *
     * @param specimen the specimen
     * @param harmonic n, 1 or more
     * @return (2/(mu L)) sin(n pi x_f/L) sin(n pi x_s/L) cos(theta), 1/kg
     */
    public static double expectedModalConstant(Specimen specimen, int harmonic) {
        if (harmonic < 1) {
            throw new AnalysisException("harmonic must be 1 or more, got " + harmonic);
        }
        return 2 / (specimen.linearDensityKgPerM() * specimen.lengthM()) * specimen.forcingShape(harmonic)
                * specimen.sensorShape(harmonic) * Math.cos(specimen.sensorAngleRad());
    }

    /**
     * Fits the pattern.
     *
     * @param specimen the specimen with the stated positions
     * @param assignment the harmonic numbering of the modes
     * @param modes the fitted modes that were numbered
     * @return the comparison and the implied positions
     */
    public PatternFit fit(Specimen specimen, HarmonicAssignment assignment, List<FittedMode> modes) {
        double cos = Math.cos(specimen.sensorAngleRad());
        if (Math.abs(cos) < 1e-3) {
            throw new AnalysisException("sensor axis is across the drive (angle " + specimen.sensorAngleRad()
                    + " rad): the pattern of modal constants carries no position information");
        }
        TreeMap<Integer, double[]> byHarmonic = new TreeMap<>();
        for (AssignedMode m : assignment.modes()) {
            if (m.modeIndex() >= modes.size()) {
                throw new AnalysisException("mode index " + m.modeIndex() + " is not in the list of " + modes.size()
                        + " fitted modes");
            }
            FittedMode f = modes.get(m.modeIndex());
            double[] acc = byHarmonic.computeIfAbsent(m.harmonic(), k -> new double[2]);
            acc[0] += f.mode().modalConstant().getReal();
            double s = f.modalConstantStd() == null ? 0 : f.modalConstantStd().getReal();
            acc[1] += Double.isFinite(s) ? s * s : 0;
        }
        int count = byHarmonic.size();
        if (count < 3) {
            throw new AnalysisException("the participation pattern needs at least 3 numbered harmonics to fit a scale "
                    + "and two positions, got " + count);
        }
        int[] n = new int[count];
        double[] a = new double[count];
        double[] sigma = new double[count];
        double largest = byHarmonic.values().stream().mapToDouble(v -> Math.abs(v[0])).max().orElse(0);
        int k = 0;
        for (var e : byHarmonic.entrySet()) {
            n[k] = e.getKey();
            a[k] = e.getValue()[0];
            sigma[k] = Math.max(Math.sqrt(e.getValue()[1]), 1e-6 * largest);
            k++;
        }
        double unit = 2 / (specimen.linearDensityKgPerM() * specimen.lengthM()) * cos;
        double uStated = specimen.forcingPositionM() / specimen.lengthM();
        double vStated = specimen.sensorPositionM() / specimen.lengthM();
        double[] stated = scaleAndChi2(n, a, sigma, unit, uStated, vStated);
        double[] grid = gridSearch(n, a, sigma, unit);
        double[] best = nearestEquivalent(grid[0], grid[1], uStated, vStated);
        double[] refined = refine(n, a, sigma, unit, best[0], best[1], grid[2] != 0 ? grid[2] : 1);
        double length = specimen.lengthM();
        List<ParticipationEntry> entries = new ArrayList<>();
        for (int i = 0; i < count; i++) {
            entries.add(new ParticipationEntry(n[i], a[i], sigma[i], expectedModalConstant(specimen, n[i])));
        }
        double xf = refined[0] * length;
        double xs = refined[1] * length;
        double tol = toleranceFractionOfLength * length;
        boolean forcingOff = Math.abs(xf - specimen.forcingPositionM()) > tol;
        boolean sensorOff = Math.abs(xs - specimen.sensorPositionM()) > tol;
        List<String> findings = new ArrayList<>();
        if (forcingOff) {
            findings.add(String.format(Locale.ROOT, "forcing point: the modal constants put the shaker at %.4f m, "
                    + "the setup states %.4f m (tolerance %.4f m)", xf, specimen.forcingPositionM(), tol));
        }
        if (sensorOff) {
            findings.add(String.format(Locale.ROOT, "sensor: the modal constants put the sensor at %.4f m, "
                    + "the setup states %.4f m (tolerance %.4f m)", xs, specimen.sensorPositionM(), tol));
        }
        if (refined[2] < 0) {
            findings.add("the modal constants carry an overall negative sign: check the sensor polarity");
        }
        findings.add("each position is known only up to its mirror image about mid-span (x or L - x), and the stinger"
                + " and sensor positions may be swapped");
        return new PatternFit(entries, stated[0], stated[1], xf, refined[3] * length, xs, refined[4] * length,
                refined[2], refined[5], specimen.linearDensityKgPerM() / Math.abs(refined[2]), forcingOff, sensorOff,
                findings);
    }

    private static double[] scaleAndChi2(int[] n, double[] a, double[] sigma, double unit, double u, double v) {
        double num = 0;
        double den = 0;
        for (int i = 0; i < n.length; i++) {
            double e = unit * Math.sin(n[i] * Math.PI * u) * Math.sin(n[i] * Math.PI * v);
            double w = 1 / (sigma[i] * sigma[i]);
            num += w * a[i] * e;
            den += w * e * e;
        }
        double scale = den > 0 ? num / den : 0;
        double chi2 = 0;
        for (int i = 0; i < n.length; i++) {
            double e = unit * Math.sin(n[i] * Math.PI * u) * Math.sin(n[i] * Math.PI * v);
            double r = (a[i] - scale * e) / sigma[i];
            chi2 += r * r;
        }
        return new double[] {scale, n.length > 1 ? chi2 / (n.length - 1) : Double.NaN, chi2};
    }

    private static double[] gridSearch(int[] n, double[] a, double[] sigma, double unit) {
        double[] best = {0.5, 0.5, 0, Double.POSITIVE_INFINITY};
        for (int i = 1; i < GRID_STEPS; i++) {
            for (int j = i; j < GRID_STEPS; j++) {
                double u = (double) i / GRID_STEPS;
                double v = (double) j / GRID_STEPS;
                double[] sc = scaleAndChi2(n, a, sigma, unit, u, v);
                if (sc[2] < best[3]) {
                    best = new double[] {u, v, sc[0], sc[2]};
                }
            }
        }
        return best;
    }

    private static double[] nearestEquivalent(double u, double v, double uStated, double vStated) {
        double[][] options = {{u, v}, {1 - u, 1 - v}, {v, u}, {1 - v, 1 - u}};
        double[] best = options[0];
        double bestDistance = Double.POSITIVE_INFINITY;
        for (double[] o : options) {
            double d = Math.hypot(o[0] - uStated, o[1] - vStated);
            if (d < bestDistance) {
                bestDistance = d;
                best = o;
            }
        }
        return best;
    }

    private static double[] refine(int[] n, double[] a, double[] sigma, double unit, double u0, double v0, double s0) {
        double[] target = new double[n.length];
        for (int i = 0; i < n.length; i++) {
            target[i] = a[i] / sigma[i];
        }
        LeastSquaresBuilder builder = new LeastSquaresBuilder().start(new double[] {u0, v0, s0}).target(target)
                .maxEvaluations(2000).maxIterations(500).model(p -> model(p, n, sigma, unit));
        LeastSquaresOptimizer.Optimum optimum = new LevenbergMarquardtOptimizer().optimize(builder.build());
        RealVector p = optimum.getPoint();
        int dof = n.length - 3;
        double chi2 = optimum.getChiSquare();
        double inflate = dof > 0 ? Math.max(1, chi2 / dof) : 1;
        RealMatrix cov = optimum.getCovariances(1e-14);
        return new double[] {p.getEntry(0), p.getEntry(1), p.getEntry(2), Math.sqrt(inflate * cov.getEntry(0, 0)),
            Math.sqrt(inflate * cov.getEntry(1, 1)), dof > 0 ? chi2 / dof : Double.NaN};
    }

    private static Pair<RealVector, RealMatrix> model(RealVector p, int[] n, double[] sigma, double unit) {
        double u = p.getEntry(0);
        double v = p.getEntry(1);
        double s = p.getEntry(2);
        double[] value = new double[n.length];
        double[][] jac = new double[n.length][3];
        for (int i = 0; i < n.length; i++) {
            double ku = n[i] * Math.PI;
            double su = Math.sin(ku * u);
            double sv = Math.sin(ku * v);
            double w = unit / sigma[i];
            value[i] = w * s * su * sv;
            jac[i][0] = w * s * ku * Math.cos(ku * u) * sv;
            jac[i][1] = w * s * su * ku * Math.cos(ku * v);
            jac[i][2] = w * su * sv;
        }
        return new Pair<>(new ArrayRealVector(value, false), new Array2DRowRealMatrix(jac, false));
    }
}
