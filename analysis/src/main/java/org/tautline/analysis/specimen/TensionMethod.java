package org.tautline.analysis.specimen;

/** How a tension estimate was obtained. */
public enum TensionMethod {
    /** Pinned ends: weighted straight line of (f_n/n)^2 against n^2 (Fletcher 1964), T and EI both fitted. */
    PINNED_LINE_FIT("straight-line fit of the harmonic series (pinned ends)"),
    /** Clamped ends: nonlinear least squares of the exact clamped beam-string roots, T and EI both fitted. */
    CLAMPED_EXACT_FIT("fit of the exact clamped-end frequencies"),
    /** One harmonic only: T from it with the specimen's stated EI (zero: Mersenne's law). */
    SINGLE_HARMONIC("from one harmonic with the stated bending stiffness");

    private final String label;

    TensionMethod(String label) {
        this.label = label;
    }

    /** @return how the tension was obtained, in words for people */
    public String label() {
        return label;
    }
}
