package org.tautline.analysis.specimen;

import org.tautline.analysis.AnalysisException;

/**
 * Practical tension of a cable with bending stiffness from its first natural frequency.
 *
 * <p>H. Zui, T. Shinke and Y. Namita, "Practical formulas for estimation of cable tension by vibration
 * method", J. Struct. Eng. 122(6):651-656, 1996 (from memory; verify against the paper before relying
 * on it). With C = sqrt(EI/(mu L^4)) and xi = L sqrt(T/EI), T = 4 mu (f1 L)^2 F, where
 * F = 1 - 2.20 C/f1 - 0.550 (C/f1)^2 for xi >= 17, F = 0.865 - 11.6 (C/f1)^2 for 6 <= xi < 17 and
 * F = 0.828 - 10.5 (C/f1)^2 for xi < 6. The formulas are fits for cables with fixed (clamped) ends and
 * negligible sag. xi depends on the unknown tension, so the branch is chosen with the tension of the
 * previous pass, starting from Mersenne's law, until it no longer changes.
 */
public final class ZuiCableFormula {
    private static final int MAX_PASSES = 10;

    private ZuiCableFormula() {
    }

    /**
     * Tension from the first natural frequency of a clamped cable.
     *
     * @param firstFrequencyHz f1, Hz
     * @param lengthM L, m
     * @param linearDensityKgPerM mu, kg/m
     * @param bendingStiffnessNm2 EI, N m^2, positive
     * @return T, N
     */
    public static double tensionN(double firstFrequencyHz, double lengthM, double linearDensityKgPerM,
                                  double bendingStiffnessNm2) {
        if (!(bendingStiffnessNm2 > 0) || Double.isInfinite(bendingStiffnessNm2)) {
            throw new AnalysisException("bendingStiffnessNm2 must be a positive finite number for the Zui formula, got "
                    + bendingStiffnessNm2);
        }
        double mersenne = StringPhysics.mersenneTensionN(firstFrequencyHz, 1, lengthM, linearDensityKgPerM);
        double c = Math.sqrt(bendingStiffnessNm2 / (linearDensityKgPerM * Math.pow(lengthM, 4)));
        double ratio = c / firstFrequencyHz;
        double tension = mersenne;
        int branch = -1;
        for (int pass = 0; pass < MAX_PASSES; pass++) {
            double xi = tension > 0 ? lengthM * Math.sqrt(tension / bendingStiffnessNm2) : 0.0;
            int next = xi >= 17 ? 0 : xi >= 6 ? 1 : 2;
            if (next == branch) {
                break;
            }
            branch = next;
            tension = mersenne * factor(branch, ratio);
        }
        return tension;
    }

    private static double factor(int branch, double ratio) {
        return switch (branch) {
            case 0 -> 1.0 - 2.20 * ratio - 0.550 * ratio * ratio;
            case 1 -> 0.865 - 11.6 * ratio * ratio;
            default -> 0.828 - 10.5 * ratio * ratio;
        };
    }
}
