package org.tautline.driver.sim;

import org.tautline.analysis.specimen.EndCondition;
import org.tautline.driver.RigException;

/**
 * The specimen the simulated rig vibrates: a tensioned string with bending stiffness, two transverse
 * polarisations and optional geometric (tension-modulation) nonlinearity.
 *
 * <p>Natural frequencies follow Fletcher's stiff-string formula (H. Fletcher, J. Acoust. Soc. Am.
 * 36(1):203-209, 1964) through {@link org.tautline.analysis.specimen.StringPhysics}. Mode shapes are
 * the mass-normalised pinned shapes sqrt(2/(mu L)) sin(n pi x/L); for {@link EndCondition#CLAMPED}
 * ends the same shapes are used as an approximation (the true clamped shapes differ only in thin
 * boundary layers near the ends while the wire is slender). The second polarisation's frequencies are
 * those of the first times (1 + polarisationSplit). The geometric nonlinearity is the
 * Kirchhoff-Carrier model, mu w_tt = [T + EA/(2L) int w_x^2 dx] w_xx (G. F. Carrier, Q. Appl. Math.
 * 3:157-165, 1945, from memory).
 *
 * @param lengthM vibrating length L, m
 * @param linearDensityKgPerM mass per unit length mu, kg/m
 * @param tensionN static tension T, N
 * @param bendingStiffnessNm2 bending stiffness EI, N m^2 (0 for an ideal string)
 * @param ends end condition
 * @param modeCount harmonics simulated per polarisation, 1..60
 * @param damping modal damping model
 * @param polarisationSplit relative frequency split of polarisation 2 over polarisation 1, 0..0.1
 * @param polarisationAngleRad angle of principal axis 1 from the drive direction, rad
 * @param geometricNonlinearity true to simulate tension modulation by large amplitudes
 * @param axialStiffnessN axial stiffness EA, N (used when {@code geometricNonlinearity} is on)
 */
public record SimulatedSpecimen(double lengthM, double linearDensityKgPerM, double tensionN,
                                double bendingStiffnessNm2, EndCondition ends, int modeCount, DampingModel damping,
                                double polarisationSplit, double polarisationAngleRad, boolean geometricNonlinearity,
                                double axialStiffnessN) {
    private static final String WHERE = "SimulatedSpecimen";

    /** Checks every field; see the record components for the expected ranges. */
    public SimulatedSpecimen {
        Checks.positive(WHERE, "lengthM", lengthM, "m");
        Checks.positive(WHERE, "linearDensityKgPerM", linearDensityKgPerM, "kg/m");
        Checks.positive(WHERE, "tensionN", tensionN, "N");
        Checks.nonNegative(WHERE, "bendingStiffnessNm2", bendingStiffnessNm2, "N m^2");
        Checks.present(WHERE, "ends", ends);
        Checks.intRange(WHERE, "modeCount", modeCount, 1, 60);
        Checks.present(WHERE, "damping", damping);
        Checks.range(WHERE, "polarisationSplit", polarisationSplit, 0.0, 0.1, "");
        Checks.finite(WHERE, "polarisationAngleRad", polarisationAngleRad, "rad");
        Checks.nonNegative(WHERE, "axialStiffnessN", axialStiffnessN, "N");
        if (geometricNonlinearity && !(axialStiffnessN > 0)) {
            throw new RigException(WHERE + ".axialStiffnessN must be positive when geometricNonlinearity is on, got "
                    + axialStiffnessN);
        }
    }

    /** @param on true to simulate tension modulation, false for a linear specimen @return a copy with that setting */
    public SimulatedSpecimen withGeometricNonlinearity(boolean on) {
        return new SimulatedSpecimen(lengthM, linearDensityKgPerM, tensionN, bendingStiffnessNm2, ends, modeCount,
                damping, polarisationSplit, polarisationAngleRad, on, axialStiffnessN);
    }

    /** @param newTensionN tension, N @return a copy with that tension */
    public SimulatedSpecimen withTensionN(double newTensionN) {
        return new SimulatedSpecimen(lengthM, linearDensityKgPerM, newTensionN, bendingStiffnessNm2, ends, modeCount,
                damping, polarisationSplit, polarisationAngleRad, geometricNonlinearity, axialStiffnessN);
    }

    /** @param count harmonics per polarisation @return a copy with that many modes */
    public SimulatedSpecimen withModeCount(int count) {
        return new SimulatedSpecimen(lengthM, linearDensityKgPerM, tensionN, bendingStiffnessNm2, ends, count,
                damping, polarisationSplit, polarisationAngleRad, geometricNonlinearity, axialStiffnessN);
    }
}
