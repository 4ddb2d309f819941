package org.tautline.app.ui;

import java.awt.Color;

/**
 * Plot colours of the workbench, chosen to stay distinct under the common colour-vision deficiencies.
 *
 * <p>Values from M. Okabe and K. Ito, "Color Universal Design: how to make figures and
 * presentations that are friendly to colorblind people", 2008 (a general-purpose palette).
 */
public final class Palette {
    /** Measured data: blue. */
    public static final Color MEASURED = new Color(0x00, 0x72, 0xB2);
    /** The fitted model: vermilion. */
    public static final Color FIT = new Color(0xD5, 0x5E, 0x00);
    /** A second measured quantity (coherence, quality) and markers for identified modes: bluish green. */
    public static final Color SECOND = new Color(0x00, 0x9E, 0x73);
    /** Poles that agree in frequency only: orange. */
    public static final Color FREQUENCY_ONLY = new Color(0xE6, 0x9F, 0x00);
    /** Poles that agree in frequency and damping or better: blue. */
    public static final Color AGREEING = MEASURED;
    /** Poles that agree with nothing in the order below: grey. */
    public static final Color LONE = new Color(0x99, 0x99, 0x99);
    /** Pass. */
    public static final Color PASS = SECOND;
    /** Fail. */
    public static final Color FAIL = FIT;
    /** Not determinable. */
    public static final Color UNDETERMINED = FREQUENCY_ONLY;

    private Palette() {
    }
}
