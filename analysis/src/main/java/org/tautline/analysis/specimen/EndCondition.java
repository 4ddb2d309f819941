package org.tautline.analysis.specimen;

/** How the ends of a specimen are held. */
public enum EndCondition {
    /** Ends free to rotate, no end moment (knife edges, bridges): mode shapes sin(n pi x/L). */
    PINNED("pinned"),
    /** Ends held in rotation (clamps): bending stiffness raises the frequencies more than pinned ends. */
    CLAMPED("clamped");

    private final String label;

    EndCondition(String label) {
        this.label = label;
    }

    /** @return the end condition in words for people: "pinned" or "clamped" */
    public String label() {
        return label;
    }
}
