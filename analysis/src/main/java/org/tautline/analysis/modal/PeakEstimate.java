package org.tautline.analysis.modal;

/**
 * One resonance found by {@link PeakPicking}, with what the estimate rests on.
 *
 * @param mode the estimated mode: natural frequency, damping ratio, complex modal constant
 * @param peakLine index of the highest line of the peak
 * @param halfPower the half-power band of the peak (Ewins), possibly unresolved on one side
 * @param firstFitLine first line of the local single-mode fit
 * @param lastFitLine last line of the local single-mode fit (inclusive)
 * @param fitted true when the mode comes from the local least-squares single-mode fit; false when
 *               the fit was not possible or not credible and the mode comes from the half-power band
 *               and the peak value alone
 */
public record PeakEstimate(Mode mode, int peakLine, HalfPower halfPower, int firstFitLine, int lastFitLine,
                           boolean fitted) {
}
