package org.tautline.app.bench;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.hipparchus.complex.Complex;
import org.junit.jupiter.api.Test;
import org.tautline.analysis.modal.FittedMode;
import org.tautline.analysis.modal.Mode;

/** The suite's score counts missed and spurious modes as its rules say, on hand-made fitted lists. */
class ModalCaseScoreTest {

    private static Mode mode(double frequencyHz, double dampingRatio) {
        return new Mode(frequencyHz, dampingRatio, Complex.ONE);
    }

    /** A bound with the given standard errors for a true mode. */
    private static FittedMode bound(Mode m, double frequencyStdHz, double dampingRatioStd) {
        return new FittedMode(m, frequencyStdHz, dampingRatioStd, Complex.ZERO);
    }

    @Test
    void aDoubletFittedAsOneModeIsOneMissed() {
        // Half-power bandwidth 2 zeta f = 2 Hz at 100 Hz; the partner 0.5 bandwidth higher.
        Mode a = mode(100, 0.01);
        Mode b = mode(101, 0.01);
        List<FittedMode> bounds = List.of(bound(a, 0.01, 1e-4), bound(b, 0.01, 1e-4));
        ModalCaseScore s = ModalCaseScore.of(List.of(a, b), bounds, List.of(mode(100.5, 0.015)));
        assertEquals(2, s.determinable(), "1e-4 is 1 % of 0.01: both determinable");
        assertEquals(1, s.missedDeterminable(), "one fitted mode stands for one of the two");
        assertEquals(0, s.spuriousDeterminable());
        assertEquals(1, s.matchedDeterminable());
        assertEquals(50, s.frequencyErrorPerBound(), 1e-9, "0.5 Hz off over a bound of 0.01 Hz");

        // A doublet 5 bandwidths apart fitted as its stronger mode alone: again one missed, nothing spurious.
        Mode c = mode(110, 0.01);
        ModalCaseScore wide = ModalCaseScore.of(List.of(a, c), List.of(bound(a, 0.01, 1e-4), bound(c, 0.01, 1e-4)),
                List.of(mode(100.02, 0.0101)));
        assertEquals(1, wide.missedDeterminable());
        assertEquals(0, wide.spuriousDeterminable());
        assertEquals(2.0, wide.frequencyErrorPerBound(), 1e-9);
        assertEquals(1.0, wide.dampingErrorPerBound(), 1e-9);
    }

    @Test
    void sortsMissedAndSpuriousModesByWhetherTheBoundCanDetermineThem() {
        Mode strong = mode(100, 0.01);
        Mode weak = mode(200, 0.01);
        // The weak mode's damping bound is 20 % of its value: not determinable (limit 5 %).
        List<FittedMode> bounds = List.of(bound(strong, 0.02, 2e-4), bound(weak, 0.5, 2e-3));
        // 209 Hz is 2.25 bandwidths (4 Hz each) from the weak mode: not a match, but within its neighbourhood of 3.
        List<Mode> fitted = List.of(mode(100.04, 0.0097), mode(209, 0.01), mode(300, 0.01));
        ModalCaseScore s = ModalCaseScore.of(List.of(strong, weak), bounds, fitted);
        assertEquals(2, s.modes());
        assertEquals(1, s.determinable());
        assertEquals(0, s.missedDeterminable());
        assertEquals(1, s.missedOther(), "the weak mode was not found within a bandwidth");
        assertEquals(1, s.spuriousOther(), "209 Hz is put down to the weak mode");
        assertEquals(1, s.spuriousDeterminable(), "300 Hz is near nothing");
        assertEquals(List.of(209.0, 300.0), s.spuriousHz());
        assertEquals(2.0, s.frequencyErrorPerBound(), 1e-9, "0.04 Hz over 0.02 Hz");
        assertEquals(1.5, s.dampingErrorPerBound(), 1e-9, "3e-4 over 2e-4");
        assertTrue(s.truth().get(0).found() && s.truth().get(0).determinable());
        assertFalse(s.truth().get(1).found() || s.truth().get(1).determinable());
        assertTrue(Double.isNaN(s.truth().get(1).fittedFrequencyHz()));
    }

    @Test
    void withoutABoundNoModeIsDeterminableAndAFailedFitMissesEverything() {
        Mode a = mode(100, 0.01);
        Mode b = mode(200, 0.01);
        ModalCaseScore noBound = ModalCaseScore.of(List.of(a, b), null, List.of(mode(100, 0.01), mode(150, 0.01)));
        assertEquals(0, noBound.determinable());
        assertEquals(1, noBound.missedOther());
        assertEquals(0, noBound.missedDeterminable());
        assertEquals(1, noBound.spuriousDeterminable(), "150 Hz is 12.5 bandwidths from the nearest mode");
        assertTrue(Double.isNaN(noBound.frequencyErrorPerBound()));

        ModalCaseScore failed = ModalCaseScore.of(List.of(a, b), List.of(bound(a, 0.01, 1e-4), bound(b, 0.01, 1e-4)),
                List.of());
        assertEquals(2, failed.missedDeterminable());
        assertEquals(0, failed.fitted());
        assertEquals(0, failed.spuriousDeterminable() + failed.spuriousOther());
    }
}
