package org.tautline.analysis.specimen;

/**
 * The harmonic a fitted mode was numbered as.
 *
 * @param modeIndex index of the mode in the list given to the numbering
 * @param frequencyHz the mode's natural frequency, Hz
 * @param harmonic harmonic number n, 1 or more
 * @param polarisation 0 for a single peak, 1 for the lower and 2 for the upper mode of a split doublet
 */
public record AssignedMode(int modeIndex, double frequencyHz, int harmonic, int polarisation) {
}
