package org.tautline.app.ui.results;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.tautline.analysis.modal.FittedMode;
import org.tautline.analysis.modal.Pole;
import org.tautline.analysis.qualify.QualifiedMode;
import org.tautline.app.qualify.QualificationResult;

/** Refitting with a hand-edited pole choice runs the real fit and everything downstream of it. */
class RefitTest {
    private static QualificationResult original;

    @BeforeAll
    static void qualify() {
        original = SyntheticWire.qualified();
    }

    @Test
    void automaticFitFindsTheWiresHarmonics() {
        // Check values: Fletcher's stiff-string frequencies and the Mersenne/Fletcher tension (see SyntheticWire).
        assertEquals(SyntheticWire.MODES_IN_BAND, original.modes().size(), original.modes().toString());
        for (QualifiedMode m : original.modes()) {
            assertEquals(SyntheticWire.frequencyHz(m.harmonic()), m.mode().frequencyHz(),
                    1e-3 * m.mode().frequencyHz(), "harmonic " + m.harmonic());
        }
        assertEquals(SyntheticWire.TENSION_N, original.tension().orElseThrow().tensionN(), 0.01 * SyntheticWire.TENSION_N);
    }

    @Test
    void droppingAModeRemovesItAndItsHarmonic() {
        PoleChoice choice = PoleChoice.of(original.modal().chart(), original.modal().selection());
        Pole second = poleNear(choice.poles(), SyntheticWire.frequencyHz(2));
        PoleChoice dropped = choice.toggle(second);
        QualificationResult refit = Refit.run(original, dropped.selection());
        assertEquals(SyntheticWire.MODES_IN_BAND - 1, refit.modes().size(), refit.modes().toString());
        assertFalse(refit.modes().stream().anyMatch(m -> m.harmonic() == 2), refit.modes().toString());
        assertTrue(refit.harmonics().absent().stream().anyMatch(a -> a.harmonic() == 2), refit.harmonics().toString());
        // The other harmonics still carry the tension (Fletcher's formula, from memory).
        assertEquals(SyntheticWire.TENSION_N, refit.tension().orElseThrow().tensionN(), 0.01 * SyntheticWire.TENSION_N);
        assertTrue(refit.verdict().isPresent(), "the refit is judged against the same limits");
        assertEquals(original.verdict().orElseThrow().results().size(), refit.verdict().orElseThrow().results().size());
        assertEquals(original.assessment().request().specification(), refit.assessment().request().specification(),
                "judged against the same specification, its name and revision kept for the exported spec.json");
    }

    @Test
    void reAddingTheDroppedPoleRestoresTheOriginalEstimate() {
        PoleChoice choice = PoleChoice.of(original.modal().chart(), original.modal().selection());
        Pole second = poleNear(choice.poles(), SyntheticWire.frequencyHz(2));
        PoleChoice again = choice.toggle(second).toggle(second);
        QualificationResult refit = Refit.run(original, again.selection());
        assertEquals(original.modes().size(), refit.modes().size());
        for (int i = 0; i < original.modes().size(); i++) {
            FittedMode a = original.modes().get(i).fitted();
            FittedMode b = refit.modes().get(i).fitted();
            assertEquals(a.mode().frequencyHz(), b.mode().frequencyHz(), 0.1 * a.frequencyStdHz() + 1e-9, "mode " + i);
            assertEquals(a.mode().dampingRatio(), b.mode().dampingRatio(), 0.1 * a.dampingRatioStd() + 1e-12, "mode " + i);
            assertEquals(a.mode().modalConstant().getReal(), b.mode().modalConstant().getReal(),
                    0.1 * a.modalConstantStd().getReal() + 1e-9, "mode " + i);
        }
        assertEquals(original.tension().orElseThrow().tensionN(), refit.tension().orElseThrow().tensionN(),
                0.1 * original.tension().orElseThrow().tensionStdN());
    }

    static Pole poleNear(List<Pole> poles, double frequencyHz) {
        return poles.stream().min((a, b) -> Double.compare(Math.abs(a.frequencyHz() - frequencyHz),
                Math.abs(b.frequencyHz() - frequencyHz))).orElseThrow();
    }
}
