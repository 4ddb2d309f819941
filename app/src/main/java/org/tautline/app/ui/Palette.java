package org.tautline.app.ui;

import java.awt.Color;

/**
 * Plot colours chosen to stay distinct under the common colour-vision deficiencies.
 *
 * <p>Values from M. Okabe and K. Ito, "Color Universal Design: how to make figures and
 * presentations that are friendly to colorblind people", 2008 (a general-purpose palette).
 */
final class Palette {
    /** Measured data. */
    static final Color MEASURED = new Color(0x00, 0x72, 0xB2);
    /** The fitted model. */
    static final Color FIT = new Color(0xD5, 0x5E, 0x00);
    /** Markers for identified modes. */
    static final Color MODE_MARK = new Color(0x00, 0x9E, 0x73);
    /** Pass. */
    static final Color PASS = new Color(0x00, 0x9E, 0x73);
    /** Fail. */
    static final Color FAIL = new Color(0xD5, 0x5E, 0x00);
    /** Not determinable. */
    static final Color UNDETERMINED = new Color(0xE6, 0x9F, 0x00);

    private Palette() {
    }
}
