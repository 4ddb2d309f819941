package org.tautline.analysis.specimen;

/**
 * A harmonic with no fitted mode, and why.
 *
 * @param harmonic harmonic number n
 * @param expectedFrequencyHz where the numbering model puts it, Hz
 * @param reason the reason
 * @param explanation the reason in words with the numbers behind it, for reports
 */
public record AbsentHarmonic(int harmonic, double expectedFrequencyHz, AbsenceReason reason, String explanation) {
}
