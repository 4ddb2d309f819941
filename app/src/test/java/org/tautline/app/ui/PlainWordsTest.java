package org.tautline.app.ui;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

/** Messages from the analysis reach the workbench's screens in its own words. */
class PlainWordsTest {
    @Test
    void namesFiguresConstantsAndEstimatorsForPeople() {
        assertEquals("fundamental frequency = 225.6 ± 0.05 Hz (k = 2) meets 215 .. 245 Hz",
                PlainWords.of("f1Hz = 225.6 +/- 0.05 Hz (k = 2) meets 215 .. 245 Hz"));
        assertEquals("the joint refinement failed (x); the modes are the estimates of the frequency-domain pole search"
                + " and modal-constant fit", PlainWords.of("the joint refinement failed (x); the modes are the LSCF/LSFD"
                + " estimates"));
        assertEquals("fitted bending stiffness is negative (-1e-4 ± 2e-5 N m²)",
                PlainWords.of("fitted bending stiffness is negative (-1e-4 +- 2e-5 N m^2)"));
        assertEquals("the verdict is not determinable, by straight-line fit of the harmonic series (pinned ends)",
                PlainWords.of("the verdict is NOT_DETERMINABLE, by PINNED_LINE_FIT"));
        assertEquals("start closer or allow more iterations", PlainWords.of("start closer or raise maxIterations"));
        assertEquals("shift of f1 between test levels is fail", PlainWords.of("linearityShift1 is FAIL"));
        // Words that are neither keys nor constants stay as they are.
        assertEquals("the Tautline simulated rig, seed 1, FRF H1", PlainWords.of("the Tautline simulated rig, seed 1, FRF H1"));
    }
}
