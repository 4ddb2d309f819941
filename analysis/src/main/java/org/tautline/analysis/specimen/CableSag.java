package org.tautline.analysis.specimen;

import org.hipparchus.analysis.solvers.BracketingNthOrderBrentSolver;
import org.tautline.analysis.AnalysisException;

/**
 * Sag of a long heavy span and its effect on the first symmetric in-plane mode.
 *
 * <p>H. M. Irvine and T. K. Caughey, "The linear theory of free vibrations of a suspended cable",
 * Proc. R. Soc. Lond. A 341:299-315, 1974; H. M. Irvine, Cable Structures, MIT Press, 1981 (from
 * memory). The sag parameter is lambda^2 = (m g L cos(theta)/H)^2 L/(H L_e/EA), with H the tension
 * component along the chord, theta the chord's inclination and L_e = L (1 + 8 (d/L)^2) the
 * effective length to second order in the sag-to-span ratio d/L, d = m g L^2 cos(theta)/(8 H). The
 * symmetric in-plane modes satisfy tan(w/2) = w/2 - (4/lambda^2)(w/2)^3, w = omega L/sqrt(H/m):
 * w = pi for a taut string, 2 pi at the crossover lambda^2 = 4 pi^2. Antisymmetric modes are
 * unaffected.
 *
 * <p>Warning threshold {@value #WARNING_LAMBDA_SQUARED}: at lambda^2 = 0.1 the first symmetric
 * in-plane frequency is raised by about 0.4 % over the taut string (computed from the equation
 * above), i.e. a tension read with Mersenne's law is about 0.8 % high. That is comparable with the
 * accuracy a tension qualification asks for; the value is our choice.
 */
public final class CableSag {
    /** Sag parameter above which the tension estimate warns. */
    public static final double WARNING_LAMBDA_SQUARED = 0.1;
    /** Standard gravity, m/s^2 (CGPM 1901). */
    public static final double STANDARD_GRAVITY = 9.80665;

    private CableSag() {
    }

    /**
     * Irvine's sag parameter lambda^2.
     *
     * @param linearDensityKgPerM m, kg/m
     * @param lengthM chord length L, m
     * @param inclinationRad inclination of the chord to the horizontal, rad
     * @param tensionN tension H along the chord, N
     * @param axialStiffnessN EA, N, positive
     * @return lambda^2, dimensionless
     */
    public static double lambdaSquared(double linearDensityKgPerM, double lengthM, double inclinationRad,
                                       double tensionN, double axialStiffnessN) {
        if (!(linearDensityKgPerM > 0) || !(lengthM > 0) || !(tensionN > 0) || !(axialStiffnessN > 0)) {
            throw new AnalysisException("sag parameter needs positive mu, L, H and EA, got " + linearDensityKgPerM
                    + " kg/m, " + lengthM + " m, " + tensionN + " N, " + axialStiffnessN + " N");
        }
        double weightTerm = linearDensityKgPerM * STANDARD_GRAVITY * lengthM * Math.cos(inclinationRad) / tensionN;
        double sagRatio = weightTerm / 8.0;
        double effectiveLengthM = lengthM * (1.0 + 8.0 * sagRatio * sagRatio);
        return weightTerm * weightTerm * lengthM / (tensionN * effectiveLengthM / axialStiffnessN);
    }

    /**
     * The first symmetric in-plane natural frequency, non-dimensional, divided by pi.
     *
     * <p>Solves sin z - cos z (z - (4/lambda^2) z^3) = 0 for z = w/2 in (pi/2, 3 pi/2), the tan form
     * multiplied by cos z so that it has no poles; the left side is +1 and -1 at the ends.
     *
     * @param lambdaSquared Irvine's lambda^2, positive
     * @return w/pi, 1 for a taut string, 2 at lambda^2 = 4 pi^2
     */
    public static double firstSymmetricFrequencyRatio(double lambdaSquared) {
        if (!(lambdaSquared > 0) || Double.isInfinite(lambdaSquared)) {
            throw new AnalysisException("lambda^2 must be a positive finite number, got " + lambdaSquared);
        }
        double k = 4.0 / lambdaSquared;
        BracketingNthOrderBrentSolver solver = new BracketingNthOrderBrentSolver(1e-14, 1e-15, 1e-300, 5);
        double z = solver.solve(500, x -> Math.sin(x) - Math.cos(x) * (x - k * x * x * x),
                Math.PI / 2, 1.5 * Math.PI);
        return 2.0 * z / Math.PI;
    }
}
