package org.tautline.app.ui.results;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.tautline.analysis.qualify.QualifiedMode;

import org.junit.jupiter.api.Test;
import org.tautline.analysis.modal.Pole;
import org.tautline.analysis.qualify.QualifiedMode;
import org.tautline.analysis.verdict.Outcome;
import org.tautline.app.qualify.DemoRun;
import org.tautline.app.qualify.QualificationResult;
import org.tautline.driver.sweep.SweepControl;
import org.tautline.driver.sweep.SweepEventListener;

/**
 * Dropping one member of a doublet by hand still gives a judged result: the fit puts back the mode the data show and
 * says so.
 */
class DoubletRefitTest {

    @Test
    void droppingOnePolarisationOfTheFundamentalGivesAResultThatSaysWhatItLacks() {
        QualificationResult demo = DemoRun.run(SweepEventListener.NONE, SweepControl.none()).result();
        long fundamentals = demo.modes().stream().filter(m -> m.harmonic() == 1).count();
        assertEquals(2, fundamentals, "the demo wire's fundamental is a doublet: " + demo.modes());
        double weaker = demo.modes().stream().filter(m -> m.harmonic() == 1)
                .min((a, b) -> Double.compare(a.mode().modalConstant().norm(), b.mode().modalConstant().norm()))
                .orElseThrow().mode().frequencyHz();
        PoleChoice choice = PoleChoice.of(demo.modal().chart(), demo.modal().selection());
        Pole pole = RefitTest.poleNear(choice.poles(), weaker);
        QualificationResult refit = Refit.run(demo, choice.toggle(pole).selection());
        // One pole cannot stand for both polarisations of a doublet: the residual the dropped one leaves stands far above
        // the noise, so the fit's search for missing modes puts it back and says so, rather than fitting the data with
        // a mode too few (a hand edit cannot make the model poorer than the data require).
        assertEquals(demo.modes().size(), refit.modes().size(), refit.modes().toString());
        assertTrue(refit.modal().warnings().stream().anyMatch(w -> w.contains("added because the fit left a residual far"
                + " above the noise")), refit.modal().warnings().toString());
        QualifiedMode restored = refit.modes().stream().filter(m -> m.harmonic() == 1)
                .min((a, b) -> Double.compare(Math.abs(a.mode().frequencyHz() - weaker),
                        Math.abs(b.mode().frequencyHz() - weaker))).orElseThrow();
        assertEquals(weaker, restored.mode().frequencyHz(), 3 * restored.fitted().frequencyStdHz() + 0.01,
                "the restored polarisation is where the automatic fit had it");
        assertTrue(refit.verdict().orElseThrow().outcome() != Outcome.FAIL, refit.verdict().toString());
    }
}
