package org.tautline.analysis.specimen;

/**
 * The frequency shift of one harmonic between two runs.
 *
 * @param harmonic harmonic number n
 * @param firstFrequencyHz natural frequency in the first run, Hz
 * @param secondFrequencyHz natural frequency in the second run, Hz
 * @param relativeShift (f2 - f1)/f1
 * @param relativeShiftStd standard error of the relative shift, from the two frequency standard errors
 * @param predictedRelativeShift Kirchhoff-Carrier backbone prediction, {@code NaN} when EA is unknown
 * @param significant whether the shift exceeds both its uncertainty (k sigma) and the tolerance
 */
public record HarmonicShift(int harmonic, double firstFrequencyHz, double secondFrequencyHz, double relativeShift,
                            double relativeShiftStd, double predictedRelativeShift, boolean significant) {
}
