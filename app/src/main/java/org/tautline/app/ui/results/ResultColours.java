package org.tautline.app.ui.results;

import java.awt.Color;

/**
 * Plot colours of the results views, chosen to stay distinct under the common colour-vision deficiencies.
 *
 * <p>Values from M. Okabe and K. Ito, "Color Universal Design: how to make figures and
 * presentations that are friendly to colorblind people", 2008 (a general-purpose palette), the same
 * values as the workbench's own palette.
 */
final class ResultColours {
    /** Measured data: blue. */
    static final Color MEASURED = new Color(0x00, 0x72, 0xB2);
    /** The fitted model: vermilion. */
    static final Color FIT = new Color(0xD5, 0x5E, 0x00);
    /** A second measured quantity (coherence, quality): bluish green. */
    static final Color SECOND = new Color(0x00, 0x9E, 0x73);
    /** Poles that agree in frequency only: orange. */
    static final Color FREQUENCY_ONLY = new Color(0xE6, 0x9F, 0x00);
    /** Poles that agree in frequency and damping or better: blue. */
    static final Color AGREEING = new Color(0x00, 0x72, 0xB2);
    /** Poles that agree with nothing in the order below: grey. */
    static final Color LONE = new Color(0x99, 0x99, 0x99);
    /** Chosen poles: black. */
    static final Color CHOSEN = Color.BLACK;
    /** Pass. */
    static final Color PASS = new Color(0x00, 0x9E, 0x73);
    /** Fail. */
    static final Color FAIL = new Color(0xD5, 0x5E, 0x00);
    /** Not determinable. */
    static final Color UNDETERMINED = new Color(0xE6, 0x9F, 0x00);
    /** Grid lines. */
    static final Color GRID = new Color(0xDD, 0xDD, 0xDD);

    private ResultColours() {
    }
}
