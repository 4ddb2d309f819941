package org.tautline.driver.sim;

/**
 * The electrodynamic shaker of the simulated rig, driven by a voltage source.
 *
 * <p>Lumped model of a moving-coil exciter (M. A. Tomlinson, "Electrodynamic shakers", in C. M. Harris
 * and A. G. Piersol, Harris' Shock and Vibration Handbook, 5th ed., McGraw-Hill 2002, ch. 25, from
 * memory): armature mass on a suspension spring and damper; coil current
 * i = (V - Bl v)/R with the back-EMF Bl v (coil inductance neglected); coil force Bl g(i). The static
 * nonlinearity g(i) = i + a2 i^2 + a3 i^3 is scaled so that a sine of the reference current
 * i_ref = maxDriveV / R has second and third harmonics of {@code secondHarmonicDistortion} and
 * {@code thirdHarmonicDistortion} relative to the linear part Bl i (the coil force's fundamental is
 * larger by the cubic term's share, 3/4 a3 i^2); at lower currents they fall like a real weak nonlinearity
 * (second harmonic proportional to i, third to i^2).
 *
 * @param movingMassKg armature (and force-sensor) moving mass, kg
 * @param suspensionStiffnessNPerM suspension stiffness, N/m (0 allowed)
 * @param suspensionDampingNsPerM mechanical suspension damping, N s/m
 * @param forceConstantNPerA force constant Bl, N/A
 * @param coilResistanceOhm coil resistance R, ohm
 * @param secondHarmonicDistortion relative second harmonic of the coil force at the reference current, 0..0.2
 * @param thirdHarmonicDistortion relative third harmonic of the coil force at the reference current, 0..0.2
 */
public record ShakerModel(double movingMassKg, double suspensionStiffnessNPerM, double suspensionDampingNsPerM,
                          double forceConstantNPerA, double coilResistanceOhm, double secondHarmonicDistortion,
                          double thirdHarmonicDistortion) {
    private static final String WHERE = "ShakerModel";

    /** Checks every field; see the record components for the expected ranges. */
    public ShakerModel {
        Checks.positive(WHERE, "movingMassKg", movingMassKg, "kg");
        Checks.nonNegative(WHERE, "suspensionStiffnessNPerM", suspensionStiffnessNPerM, "N/m");
        Checks.nonNegative(WHERE, "suspensionDampingNsPerM", suspensionDampingNsPerM, "N s/m");
        Checks.positive(WHERE, "forceConstantNPerA", forceConstantNPerA, "N/A");
        Checks.positive(WHERE, "coilResistanceOhm", coilResistanceOhm, "ohm");
        Checks.range(WHERE, "secondHarmonicDistortion", secondHarmonicDistortion, 0.0, 0.2, "");
        Checks.range(WHERE, "thirdHarmonicDistortion", thirdHarmonicDistortion, 0.0, 0.2, "");
    }

    /** @return the back-EMF damping Bl^2/R, N s/m, that adds to the suspension damping under voltage drive */
    public double backEmfDampingNsPerM() {
        return forceConstantNPerA * forceConstantNPerA / coilResistanceOhm;
    }

    /** @return a copy with both distortion figures zero */
    public ShakerModel withoutDistortion() {
        return new ShakerModel(movingMassKg, suspensionStiffnessNPerM, suspensionDampingNsPerM, forceConstantNPerA,
                coilResistanceOhm, 0.0, 0.0);
    }
}
