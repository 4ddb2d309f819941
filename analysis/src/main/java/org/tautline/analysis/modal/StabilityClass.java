package org.tautline.analysis.modal;

/**
 * How well a pole of one model order agrees with the poles of the previous order of a stabilisation chart.
 *
 * <p>The classes are nested: each one adds a criterion to the one before. The thresholds are
 * the usual ones, 1 % in natural frequency and 5 % in damping ratio (common practice; the same
 * figures are quoted with the LSCF method by Peeters et al., Shock and Vibration 11:395, 2004,
 * from memory), and 5 % for the modal constant (our choice, matching the damping figure).
 */
public enum StabilityClass {
    /** No pole of the previous order lies within 1 % in frequency (and every pole of the first order). */
    NEW("new"),
    /** The nearest pole of the previous order lies within 1 % in frequency. */
    FREQUENCY("stable in frequency"),
    /** As FREQUENCY, and the damping ratios agree within 5 % of the previous one. */
    DAMPING("stable in frequency and damping"),
    /** As DAMPING, and the modal constants agree within 5 % (only with a residue estimator). */
    STABLE("stable");

    private final String label;

    StabilityClass(String label) {
        this.label = label;
    }

    /**
     * Whether this class meets at least another one.
     *
     * @param other the class to compare with
     * @return true when this class is the same as or stricter than {@code other}
     */
    public boolean atLeast(StabilityClass other) {
        return compareTo(other) >= 0;
    }

    /** @return the class in words for people, for legends */
    public String label() {
        return label;
    }
}
