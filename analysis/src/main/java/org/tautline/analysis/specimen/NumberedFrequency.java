package org.tautline.analysis.specimen;

import org.tautline.analysis.AnalysisException;

/**
 * A measured natural frequency with its harmonic number and standard error.
 *
 * @param harmonic harmonic number n, 1 or more
 * @param frequencyHz natural frequency, Hz
 * @param frequencyStdHz standard error of the frequency, Hz, positive
 */
public record NumberedFrequency(int harmonic, double frequencyHz, double frequencyStdHz) {

    /** Checks the values. */
    public NumberedFrequency {
        if (harmonic < 1) {
            throw new AnalysisException("harmonic must be 1 or more, got " + harmonic);
        }
        if (!(frequencyHz > 0) || Double.isInfinite(frequencyHz)) {
            throw new AnalysisException("frequencyHz of harmonic " + harmonic + " must be positive and finite, got "
                    + frequencyHz);
        }
        if (!(frequencyStdHz > 0) || Double.isInfinite(frequencyStdHz)) {
            throw new AnalysisException("frequencyStdHz of harmonic " + harmonic + " must be positive and finite, got "
                    + frequencyStdHz);
        }
    }
}
