package org.tautline.app.qualify;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Optional;

import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.tautline.analysis.modal.ModalSynthesis;
import org.tautline.analysis.modal.Mode;
import org.tautline.analysis.specimen.EndCondition;
import org.tautline.analysis.verdict.Outcome;
import org.tautline.driver.sim.SimulatedSpecimen;
import org.tautline.driver.sim.TrueMode;
import org.tautline.driver.sweep.SweepListener;

/** The whole demo qualification, sweep to verdict, judged against the simulated truth. */
class DemoQualificationTest {
    private static DemoOutcome outcome;

    @BeforeAll
    static void runTheDemoOnce() {
        outcome = DemoRun.run(SweepListener.NONE, () -> false);
    }

    @Test
    void findsTheFirstSixHarmonicsWithinOneTenthOfAPercent() {
        for (int n = 1; n <= 6; n++) {
            int harmonic = n;
            Optional<IdentifiedMode> found = outcome.result().modes().stream().filter(m -> m.harmonic() == harmonic)
                    .max((a, b) -> Double.compare(a.mode().modalConstant().norm(), b.mode().modalConstant().norm()));
            assertTrue(found.isPresent(), "harmonic " + n + " was found; modes: " + outcome.result().modes());
            TrueMode truth = TruthComparison.nearest(outcome.truth(), found.get().mode()).orElseThrow();
            assertEquals(n, truth.harmonic(), "harmonic " + n + " is matched to the true harmonic " + n);
            double error = TruthComparison.frequencyError(found.get().mode(), truth);
            assertTrue(Math.abs(error) < 1e-3, "harmonic " + n + ": " + found.get().mode().frequencyHz() + " Hz vs true "
                    + truth.mode().frequencyHz() + " Hz (error " + 100 * error + " %)");
        }
    }

    @Test
    void theTrueFundamentalIsFletchersPinnedStiffStringValue() {
        // Source: H. Fletcher, JASA 36:203, 1964: f1 = f0 sqrt(1 + B), f0 by Mersenne, B = pi^2 EI/(T L^2).
        SimulatedSpecimen s = outcome.truth().config().specimen();
        double f0 = Math.sqrt(s.tensionN() / s.linearDensityKgPerM()) / (2 * s.lengthM());
        double b = Math.PI * Math.PI * s.bendingStiffnessNm2() / (s.tensionN() * s.lengthM() * s.lengthM());
        double fletcher = f0 * Math.sqrt(1 + b);
        double simulated = outcome.truth().modes().stream().filter(t -> t.harmonic() == 1 && t.polarisation() == 1)
                .findFirst().orElseThrow().mode().frequencyHz();
        assertEquals(fletcher, simulated, 1e-9 * fletcher, "Fletcher 1964 pinned stiff-string f1");
        assertEquals(EndCondition.PINNED, s.ends());
    }

    @Test
    void readsTheTensionBackByMersennesLawWithinItsUncertainty() {
        // Source: Mersenne's law T = 4 mu L^2 f1^2 (checks.md); the stiffness raises f1 by sqrt(1 + B),
        // about 6e-5 here, far inside the stated uncertainty.
        TensionEstimate tension = outcome.result().tension().orElseThrow();
        double trueTension = outcome.truth().config().specimen().tensionN();
        assertTrue(Math.abs(tension.tensionN() - trueTension) < 2 * tension.tensionStdN(),
                "tension " + tension.tensionN() + " +/- " + tension.tensionStdN() + " N vs true " + trueTension + " N");
        assertTrue(Math.abs(tension.tensionN() / trueTension - 1) < 0.005, "within 0.5 % of the truth");
    }

    @Test
    void passesTheDemoSpecification() {
        assertEquals(Outcome.PASS, outcome.result().verdict().outcome(), outcome.result().verdict().reasons().toString());
        assertEquals(3, outcome.result().verdict().results().size());
    }

    @Test
    void spendsThePlannedRigTime() {
        double planned = DemoScenario.plan().plannedRigTimeS(outcome.truth().config().sampleRateHz());
        assertEquals(planned, outcome.result().sweep().rigTimeS(), 1e-6 * planned, "rig time follows the plan");
        assertTrue(outcome.result().sweep().completed());
    }

    @Test
    void theFittedModelFollowsTheMeasuredFrfNearTheFirstSixModes() {
        List<Mode> modes = outcome.result().modes().stream().map(IdentifiedMode::mode).toList();
        double residual = ModalSynthesis.normalisedResidual(outcome.result().receptance(), modes);
        assertTrue(residual < 0.3, "normalised residual of the synthesized model " + residual);
    }

    @Test
    void theStatedSpecimenDiffersFromTheTruthOnlyWhereTheDemoSaysSo() {
        SpecimenDescription stated = outcome.result().specimen();
        SimulatedSpecimen truth = outcome.truth().config().specimen();
        assertEquals(stated.lengthM(), truth.lengthM(), 0.0);
        assertEquals(stated.linearDensityKgPerM(), truth.linearDensityKgPerM(), 0.0);
        assertEquals(stated.forcingPositionM(), outcome.truth().config().sensors().forcingPositionM(), 0.0);
        assertEquals(stated.sensorPositionM(), outcome.truth().config().sensors().sensorPositionM(), 0.0);
        assertEquals(150.0, stated.nominalTensionN(), 0.0);
        assertEquals(DemoScenario.TRUE_TENSION_N, truth.tensionN(), 0.0, "the demo wire is slacker than stated");
    }
}
