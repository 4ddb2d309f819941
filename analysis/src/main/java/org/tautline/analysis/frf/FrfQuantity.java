package org.tautline.analysis.frf;

/**
 * What an FRF relates: the response quantity per unit force.
 *
 * <p>With e^{j w t} time dependence, mobility = j w receptance and accelerance = -w^2 receptance
 * (common practice; see D. J. Ewins, Modal Testing, 2nd ed. 2000, ch. 2).
 */
public enum FrfQuantity {
    /** Displacement per force, m/N. */
    RECEPTANCE("m/N", 0),
    /** Velocity per force, m/(N s). */
    MOBILITY("m/(N s)", 1),
    /** Acceleration per force, m/(N s^2). */
    ACCELERANCE("m/(N s^2)", 2);

    private final String siUnits;
    private final int derivativeOrder;

    FrfQuantity(String siUnits, int derivativeOrder) {
        this.siUnits = siUnits;
        this.derivativeOrder = derivativeOrder;
    }

    /** @return the SI units of this quantity, for example {@code m/N} */
    public String siUnits() {
        return siUnits;
    }

    /** @return what the quantity is called for people: "receptance", "mobility" or "accelerance" */
    public String label() {
        return switch (this) {
            case RECEPTANCE -> "receptance";
            case MOBILITY -> "mobility";
            case ACCELERANCE -> "accelerance";
        };
    }

    /** @return how many time derivatives of displacement the response is: 0, 1 or 2 */
    public int derivativeOrder() {
        return derivativeOrder;
    }

    /**
     * The quantity whose response is the given physical quantity.
     *
     * @param responseQuantity "displacement", "velocity" or "acceleration" (case-insensitive)
     * @return the matching FRF quantity
     * @throws IllegalArgumentException for any other name
     */
    public static FrfQuantity forResponse(String responseQuantity) {
        switch (responseQuantity.toLowerCase(java.util.Locale.ROOT)) {
            case "displacement":
                return RECEPTANCE;
            case "velocity":
                return MOBILITY;
            case "acceleration":
                return ACCELERANCE;
            default:
                throw new IllegalArgumentException("response quantity must be displacement, velocity or acceleration, got '"
                        + responseQuantity + "'");
        }
    }
}
