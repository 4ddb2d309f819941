package org.tautline.driver.sim;

/**
 * Modal damping of the simulated specimen as a function of frequency.
 *
 * <p>zeta(f) = constantRatio + airRatioAtReference (referenceHz / f) + internalRatioAtReference (f / referenceHz):
 * a frequency-independent part, an air (viscous drag) part that falls with frequency and an internal
 * (material) loss part that rises with frequency. The shape follows the usual decomposition of string
 * damping into air, internal-friction and support losses (N. H. Fletcher and T. D. Rossing, The Physics
 * of Musical Instruments, 2nd ed., Springer 1998, section 2.17, from memory); the coefficients are
 * inputs, not material data.
 *
 * @param constantRatio frequency-independent damping ratio, dimensionless
 * @param airRatioAtReference air damping ratio at {@code referenceHz}, dimensionless, falls as 1/f
 * @param internalRatioAtReference internal-loss damping ratio at {@code referenceHz}, dimensionless, rises as f
 * @param referenceHz reference frequency for the two frequency-dependent parts, Hz
 */
public record DampingModel(double constantRatio, double airRatioAtReference, double internalRatioAtReference,
                           double referenceHz) {
    private static final String WHERE = "DampingModel";

    /** Checks that every ratio is zero or positive and the reference frequency positive. */
    public DampingModel {
        Checks.nonNegative(WHERE, "constantRatio", constantRatio, "");
        Checks.nonNegative(WHERE, "airRatioAtReference", airRatioAtReference, "");
        Checks.nonNegative(WHERE, "internalRatioAtReference", internalRatioAtReference, "");
        Checks.positive(WHERE, "referenceHz", referenceHz, "Hz");
    }

    /**
     * Damping with separate reference frequencies for the air and the internal parts.
     *
     * @param constantRatio frequency-independent ratio
     * @param airRatio air ratio at {@code airReferenceHz}
     * @param airReferenceHz where the air part equals {@code airRatio}, Hz
     * @param internalRatio internal-loss ratio at {@code internalReferenceHz}
     * @param internalReferenceHz where the internal part equals {@code internalRatio}, Hz
     * @return the model, expressed on the air reference frequency
     */
    public static DampingModel of(double constantRatio, double airRatio, double airReferenceHz, double internalRatio,
                                  double internalReferenceHz) {
        Checks.positive(WHERE, "airReferenceHz", airReferenceHz, "Hz");
        Checks.positive(WHERE, "internalReferenceHz", internalReferenceHz, "Hz");
        return new DampingModel(constantRatio, airRatio, internalRatio * airReferenceHz / internalReferenceHz,
                airReferenceHz);
    }

    /**
     * The damping ratio at one frequency.
     *
     * @param frequencyHz frequency, Hz, positive
     * @return zeta(f), dimensionless
     */
    public double dampingRatioAt(double frequencyHz) {
        Checks.positive(WHERE, "frequencyHz", frequencyHz, "Hz");
        return constantRatio + airRatioAtReference * (referenceHz / frequencyHz)
                + internalRatioAtReference * (frequencyHz / referenceHz);
    }
}
