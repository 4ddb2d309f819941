package org.tautline.analysis.specimen;

import org.tautline.analysis.AnalysisException;

/**
 * Natural frequencies of an axially moving string or belt.
 *
 * <p>C. D. Mote, Jr., "A study of band saw vibrations", J. Franklin Inst. 279(6):430-444, 1965, and
 * the moving-threadline literature after it (from memory): a flexible string moving at speed v between
 * fixed supports has f_n = n/(2L) c (1 - v^2/c^2), c = sqrt(T/mu). The speed lowers every frequency by
 * the same factor. For a stiff moving string the same factor is applied to the stiff static
 * frequency, an approximation valid while v is well below c.
 */
public final class MovingBelt {
    private MovingBelt() {
    }

    /**
     * The factor by which axial motion lowers the natural frequencies, 1 - v^2/c^2.
     *
     * @param speedMPerS belt speed v, m/s, 0 or more
     * @param tensionN tension T, N
     * @param linearDensityKgPerM mu, kg/m
     * @return 1 - v^2 mu/T
     */
    public static double frequencyFactor(double speedMPerS, double tensionN, double linearDensityKgPerM) {
        if (!(speedMPerS >= 0) || Double.isInfinite(speedMPerS)) {
            throw new AnalysisException("belt speed must be zero or a positive finite number of m/s, got " + speedMPerS);
        }
        if (!(tensionN > 0) || !(linearDensityKgPerM > 0)) {
            throw new AnalysisException("tension and linear density must be positive, got " + tensionN + " N and "
                    + linearDensityKgPerM + " kg/m");
        }
        double c2 = tensionN / linearDensityKgPerM;
        if (!(speedMPerS * speedMPerS < c2)) {
            throw new AnalysisException("belt speed " + speedMPerS + " m/s must be below the wave speed "
                    + Math.sqrt(c2) + " m/s");
        }
        return 1.0 - speedMPerS * speedMPerS / c2;
    }

    /**
     * Natural frequency of harmonic n of a flexible moving string, n/(2L) c (1 - v^2/c^2).
     *
     * @param harmonic n, 1 or more
     * @param lengthM L, m
     * @param tensionN T, N
     * @param linearDensityKgPerM mu, kg/m
     * @param speedMPerS v, m/s
     * @return f_n, Hz
     */
    public static double frequencyHz(int harmonic, double lengthM, double tensionN, double linearDensityKgPerM,
                                     double speedMPerS) {
        double f1 = StringPhysics.mersenneFundamentalHz(lengthM, tensionN, linearDensityKgPerM);
        if (harmonic < 1) {
            throw new AnalysisException("harmonic must be 1 or more, got " + harmonic);
        }
        return harmonic * f1 * frequencyFactor(speedMPerS, tensionN, linearDensityKgPerM);
    }

    /**
     * Tension of a flexible moving string from one measured harmonic, the exact inverse of Mote's formula.
     *
     * <p>With s = 2 L f_n/n the measured frequency gives c - v^2/c = s, so c = (s + sqrt(s^2 + 4 v^2))/2
     * and T = mu c^2.
     *
     * @param frequencyHz measured f_n, Hz
     * @param harmonic n
     * @param lengthM L, m
     * @param linearDensityKgPerM mu, kg/m
     * @param speedMPerS v, m/s
     * @return T, N
     */
    public static double tensionN(double frequencyHz, int harmonic, double lengthM, double linearDensityKgPerM,
                                  double speedMPerS) {
        double staticTension = StringPhysics.mersenneTensionN(frequencyHz, harmonic, lengthM, linearDensityKgPerM);
        double s = Math.sqrt(staticTension / linearDensityKgPerM);
        double c = 0.5 * (s + Math.sqrt(s * s + 4.0 * speedMPerS * speedMPerS));
        return linearDensityKgPerM * c * c;
    }
}
