package org.tautline.analysis.format;

import org.tautline.analysis.AnalysisException;

/**
 * A value and its standard uncertainty rounded together, as text (GUM, JCGM 100:2008, 7.2.6): the uncertainty to two
 * significant digits, the value to the same decimal place, both scaled by one power of ten.
 *
 * @param value the value's digits, for example {@code "614"}
 * @param uncertainty the uncertainty's digits, for example {@code "61"}
 * @param exponent the power of ten both are multiplied by, a multiple of three; 0 when written in full
 */
public record Rounded(String value, String uncertainty, int exponent) {
    /** Checks that the digits are given and the exponent is one of engineering notation. */
    public Rounded {
        if (value == null || uncertainty == null || value.isBlank() || uncertainty.isBlank()) {
            throw new AnalysisException("a rounded value needs the digits of the value and of the uncertainty");
        }
        if (exponent % 3 != 0) {
            throw new AnalysisException("engineering notation uses powers of ten that are multiples of 3, got "
                    + exponent);
        }
    }
}
