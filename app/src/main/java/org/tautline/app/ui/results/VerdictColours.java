package org.tautline.app.ui.results;

import java.awt.Color;
import java.util.Optional;

import org.tautline.analysis.verdict.Outcome;

/**
 * The colours of the verdict banner: a band of its own colour with text that contrasts with it, so it reads the same in
 * the light and the dark look. Each pair has a contrast ratio of at least 4.5 to 1 (W3C, Web Content Accessibility
 * Guidelines 2.1, success criterion 1.4.3), and the outcome is always written in words as well. Free of Swing.
 *
 * @param background the band
 * @param text the writing on it
 */
record VerdictColours(Color background, Color text) {
    /** Pass: a dark bluish green with white writing. */
    static final VerdictColours PASS = new VerdictColours(new Color(0x0B, 0x6E, 0x4F), Color.WHITE);
    /** Fail: a dark red with white writing. */
    static final VerdictColours FAIL = new VerdictColours(new Color(0xB3, 0x26, 0x1E), Color.WHITE);
    /** Not determinable: amber with black writing. */
    static final VerdictColours UNDETERMINED = new VerdictColours(new Color(0xF2, 0xB7, 0x05), Color.BLACK);
    /** No verdict (no specification): slate with white writing. */
    static final VerdictColours NONE = new VerdictColours(new Color(0x4A, 0x55, 0x68), Color.WHITE);
    /** A result that is not current: grey with white writing, whatever its outcome. */
    static final VerdictColours STALE = new VerdictColours(new Color(0x60, 0x60, 0x60), Color.WHITE);

    /**
     * @param outcome the verdict's outcome, empty without a verdict
     * @return its colours
     */
    static VerdictColours of(Optional<Outcome> outcome) {
        return outcome.map(o -> switch (o) {
            case PASS -> PASS;
            case FAIL -> FAIL;
            case NOT_DETERMINABLE -> UNDETERMINED;
        }).orElse(NONE);
    }

    /** @return the contrast ratio of the text on the background, (L1 + 0.05) / (L2 + 0.05), 1 to 21 */
    double contrastRatio() {
        double a = luminance(background);
        double b = luminance(text);
        return (Math.max(a, b) + 0.05) / (Math.min(a, b) + 0.05);
    }

    /** Relative luminance of an sRGB colour (WCAG 2.1, definition of relative luminance). */
    static double luminance(Color c) {
        return 0.2126 * linear(c.getRed()) + 0.7152 * linear(c.getGreen()) + 0.0722 * linear(c.getBlue());
    }

    private static double linear(int channel) {
        double v = channel / 255.0;
        return v <= 0.03928 ? v / 12.92 : Math.pow((v + 0.055) / 1.055, 2.4);
    }
}
