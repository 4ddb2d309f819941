package org.tautline.app.ui.results;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.tautline.analysis.modal.Pole;
import org.tautline.analysis.verdict.LimitResult;
import org.tautline.analysis.verdict.Outcome;
import org.tautline.app.qualify.DemoRun;
import org.tautline.app.qualify.QualificationResult;
import org.tautline.driver.sweep.SweepControl;
import org.tautline.driver.sweep.SweepEventListener;

/**
 * Dropping one member of a doublet by hand still gives a judged result instead of stopping the refit: figures
 * that lost their standard errors are not determinable.
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
        // One pole cannot stand for both polarisations of a doublet: the joint refinement does not converge, so the
        // refit keeps the LSCF/LSFD estimates, says so, and gives no figure an uncertainty it does not have.
        assertEquals(demo.modes().size() - 1, refit.modes().size(), refit.modes().toString());
        assertTrue(refit.modal().warnings().stream().anyMatch(w -> w.contains("refinement")), refit.modal().warnings().toString());
        assertTrue(refit.tension().isEmpty(), "no tension without standard errors to weight the harmonics");
        LimitResult tension = refit.verdict().orElseThrow().results().stream()
                .filter(r -> r.limit().figureKey().equals("tensionN")).findFirst().orElseThrow();
        // A figure that was not measured is not determinable (the guard-band rule, README).
        assertEquals(Outcome.NOT_DETERMINABLE, tension.outcome());
        assertEquals(Outcome.NOT_DETERMINABLE, refit.verdict().orElseThrow().outcome());
    }
}
