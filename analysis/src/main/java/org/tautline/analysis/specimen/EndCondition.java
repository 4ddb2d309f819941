package org.tautline.analysis.specimen;

/** How the ends of a specimen are held. */
public enum EndCondition {
    /** Ends free to rotate, no end moment (knife edges, bridges): mode shapes sin(n pi x/L). */
    PINNED,
    /** Ends held in rotation (clamps): bending stiffness raises the frequencies more than pinned ends. */
    CLAMPED
}
