package org.tautline.analysis.specimen;

/** Why a harmonic expected in the measured band has no fitted mode. */
public enum AbsenceReason {
    /** Its expected frequency lies outside the measured band. */
    OUTSIDE_BAND,
    /** The shaker drives it at a node: |sin(n pi x_f/L)| is below the node threshold. */
    NODE_AT_FORCING_POINT,
    /** The sensor sits at a node: |sin(n pi x_s/L)| is below the node threshold. */
    NODE_AT_SENSOR,
    /** Neither point is at a node, so the mode was too weak to be found above the noise. */
    BELOW_NOISE
}
