package org.tautline.analysis.specimen;

import org.tautline.analysis.AnalysisException;

/**
 * Closed-form physics of a taut string with some bending stiffness.
 *
 * <p>Sources:
 * <ul>
 *   <li>Mersenne's laws: f_n = n/(2L) sqrt(T/mu) for an ideal flexible string with fixed ends.</li>
 *   <li>Stiff string: H. Fletcher, "Normal vibration frequencies of a stiff piano string",
 *       J. Acoust. Soc. Am. 36(1):203-209, 1964. Inharmonicity B = pi^3 E d^4/(64 T L^2)
 *       = pi^2 EI/(T L^2); pinned ends f_n = n f0 sqrt(1 + B n^2); clamped ends, approximately,
 *       f_n = n f0 sqrt(1 + B n^2) (1 + 2 sqrt(B)/pi + 4 B/pi^2).</li>
 *   <li>Mass-normalised mode shapes of a pinned string: phi_n(x) = sqrt(2/(mu L)) sin(n pi x/L).</li>
 * </ul>
 * All quantities are SI.
 */
public final class StringPhysics {
    private StringPhysics() {
    }

    /**
     * Linear density of a solid round wire.
     *
     * @param densityKgPerM3 material density, kg/m^3
     * @param diameterM wire diameter, m
     * @return mass per unit length, kg/m
     */
    public static double linearDensityKgPerM(double densityKgPerM3, double diameterM) {
        requirePositive("densityKgPerM3", densityKgPerM3);
        requirePositive("diameterM", diameterM);
        return densityKgPerM3 * Math.PI * diameterM * diameterM / 4.0;
    }

    /**
     * Bending stiffness EI of a solid round section, I = pi d^4/64.
     *
     * @param youngsModulusPa Young's modulus E, Pa
     * @param diameterM wire diameter, m
     * @return EI, N m^2
     */
    public static double bendingStiffnessNm2(double youngsModulusPa, double diameterM) {
        requirePositive("youngsModulusPa", youngsModulusPa);
        requirePositive("diameterM", diameterM);
        return youngsModulusPa * Math.PI * Math.pow(diameterM, 4) / 64.0;
    }

    /**
     * Fundamental of the ideal flexible string by Mersenne's law, f0 = sqrt(T/mu)/(2L).
     *
     * @param lengthM vibrating length L, m
     * @param tensionN tension T, N
     * @param linearDensityKgPerM mass per unit length mu, kg/m
     * @return f0, Hz
     */
    public static double mersenneFundamentalHz(double lengthM, double tensionN, double linearDensityKgPerM) {
        requirePositive("lengthM", lengthM);
        requirePositive("tensionN", tensionN);
        requirePositive("linearDensityKgPerM", linearDensityKgPerM);
        return Math.sqrt(tensionN / linearDensityKgPerM) / (2.0 * lengthM);
    }

    /**
     * Tension from the n-th natural frequency by Mersenne's law, T = 4 mu L^2 (f_n/n)^2.
     *
     * @param frequencyHz measured natural frequency of harmonic n, Hz
     * @param harmonic harmonic number n, 1 or more
     * @param lengthM vibrating length L, m
     * @param linearDensityKgPerM mass per unit length mu, kg/m
     * @return tension, N
     */
    public static double mersenneTensionN(double frequencyHz, int harmonic, double lengthM, double linearDensityKgPerM) {
        requirePositive("frequencyHz", frequencyHz);
        requirePositive("lengthM", lengthM);
        requirePositive("linearDensityKgPerM", linearDensityKgPerM);
        if (harmonic < 1) {
            throw new AnalysisException("harmonic must be 1 or more, got " + harmonic);
        }
        double perHarmonic = frequencyHz / harmonic;
        return 4.0 * linearDensityKgPerM * lengthM * lengthM * perHarmonic * perHarmonic;
    }

    /**
     * Fletcher's inharmonicity coefficient B = pi^2 EI/(T L^2) (= pi^3 E d^4/(64 T L^2) for a round wire).
     *
     * @param bendingStiffnessNm2 EI, N m^2 (zero for an ideal string)
     * @param tensionN tension T, N
     * @param lengthM vibrating length L, m
     * @return B, dimensionless
     */
    public static double inharmonicity(double bendingStiffnessNm2, double tensionN, double lengthM) {
        requireNonNegative("bendingStiffnessNm2", bendingStiffnessNm2);
        requirePositive("tensionN", tensionN);
        requirePositive("lengthM", lengthM);
        return Math.PI * Math.PI * bendingStiffnessNm2 / (tensionN * lengthM * lengthM);
    }

    /**
     * Natural frequency of harmonic n of a stiff string (Fletcher 1964).
     *
     * <p>Pinned ends: exact, f_n = n f0 sqrt(1 + B n^2). Clamped ends: Fletcher's approximation
     * f_n = n f0 sqrt(1 + B n^2)(1 + 2 sqrt(B)/pi + 4B/pi^2), good while B n^2 is small.
     *
     * @param harmonic n, 1 or more
     * @param mersenneFundamentalHz f0 of the same string without stiffness, Hz
     * @param inharmonicityB B, dimensionless
     * @param ends end condition
     * @return f_n, Hz
     */
    public static double stiffStringFrequencyHz(int harmonic, double mersenneFundamentalHz, double inharmonicityB,
                                                EndCondition ends) {
        if (harmonic < 1) {
            throw new AnalysisException("harmonic must be 1 or more, got " + harmonic);
        }
        requirePositive("mersenneFundamentalHz", mersenneFundamentalHz);
        requireNonNegative("inharmonicityB", inharmonicityB);
        double pinned = harmonic * mersenneFundamentalHz * Math.sqrt(1.0 + inharmonicityB * harmonic * harmonic);
        if (ends == EndCondition.PINNED) {
            return pinned;
        }
        double sqrtB = Math.sqrt(inharmonicityB);
        return pinned * (1.0 + 2.0 * sqrtB / Math.PI + 4.0 * inharmonicityB / (Math.PI * Math.PI));
    }

    /**
     * Mass-normalised pinned mode shape phi_n(x) = sqrt(2/(mu L)) sin(n pi x/L).
     *
     * @param harmonic n, 1 or more
     * @param positionM position along the span, 0..L, m
     * @param lengthM vibrating length L, m
     * @param linearDensityKgPerM mu, kg/m
     * @return phi_n(x), 1/sqrt(kg)
     */
    public static double modeShape(int harmonic, double positionM, double lengthM, double linearDensityKgPerM) {
        requirePositive("lengthM", lengthM);
        requirePositive("linearDensityKgPerM", linearDensityKgPerM);
        if (positionM < 0 || positionM > lengthM) {
            throw new AnalysisException("position must lie on the span 0.." + lengthM + " m, got " + positionM + " m");
        }
        return Math.sqrt(2.0 / (linearDensityKgPerM * lengthM)) * Math.sin(harmonic * Math.PI * positionM / lengthM);
    }

    private static void requirePositive(String name, double value) {
        if (!(value > 0) || Double.isInfinite(value)) {
            throw new AnalysisException(name + " must be a positive finite number, got " + value);
        }
    }

    private static void requireNonNegative(String name, double value) {
        if (!(value >= 0) || Double.isInfinite(value)) {
            throw new AnalysisException(name + " must be zero or a positive finite number, got " + value);
        }
    }
}
