package org.tautline.app.qualify;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Optional;

import org.junit.jupiter.api.Test;
import org.tautline.analysis.qualify.Qualifier;
import org.tautline.analysis.specimen.EndCondition;
import org.tautline.analysis.specimen.PatternFit;
import org.tautline.analysis.specimen.Specimen;
import org.tautline.analysis.specimen.StringPhysics;
import org.tautline.analysis.specimen.TensionEstimate;
import org.tautline.driver.sim.SimulatedSpecimen;
import org.tautline.driver.sim.SimulationConfig;
import org.tautline.driver.sim.SimulationConfigs;
import org.tautline.driver.sweep.SweepPlan;
import org.tautline.driver.sweep.SweepControl;
import org.tautline.driver.sweep.SweepEventListener;

/** The physics read back from sweeps of the simulated rig, against the simulation's truth. */
class SimulatedPhysicsTest {

    @Test
    void readsTheTensionOfAStiffWireFromItsHarmonicSeriesWhereMersenneFromF1Misses() {
        // A 1.2 mm music wire on a 0.4 m span at 120 N (invented test case): Fletcher's B = pi^2 EI/(T L^2) ~ 0.0105,
        // so f1 sits sqrt(1 + B) ~ 0.5 % above Mersenne's and Mersenne's tension from f1 reads ~1 % high.
        double mu = StringPhysics.linearDensityKgPerM(7850, 1.2e-3);
        double ei = StringPhysics.bendingStiffnessNm2(200e9, 1.2e-3);
        double tension = 120.0;
        SimulationConfig demo = SimulationConfigs.demoWire();
        SimulatedSpecimen wire = new SimulatedSpecimen(0.4, mu, tension, ei, EndCondition.PINNED, 16,
                demo.specimen().damping(), 0.0, 0.0, true, 200e9 * Math.PI * 1.44e-6 / 4);
        SimulationConfig simulation = new SimulationConfig(wire, demo.shaker(),
                demo.sensors().withForcingPositionM(0.05).withSensorPositionM(0.29), demo.sampleRateHz(), 7L, demo.maxDriveV());
        Specimen stated = new Specimen("STIFF-1", 0.4, mu, 0.005 * mu, ei, 0.1 * ei, EndCondition.PINNED, 0.05, 0.29,
                tension, 0.0, 0.0, 0.0, Optional.empty());
        // Half a volt: at 1 V this stiffer wire loads the shaker so that the force near 190 Hz reaches the force
        // sensor's 5 N full scale; the limit at 4.5 N would stop such a sweep before the sensor clips.
        SweepPlan plan = SweepPlan.uniform(120, 1150, 1100, 250, 0.02, 100, 0.5, 0.2, 3,
                new org.tautline.driver.sweep.SafetyLimits(5.0, 4.5, 1e-2, 1e-2));
        QualificationResult r = DemoRun.run(simulation, stated, plan, DemoScenario.specification(), SweepEventListener.NONE,
                SweepControl.none()).result();

        TensionEstimate t = r.tension().orElseThrow();
        assertTrue(Math.abs(t.tensionN() / tension - 1) < 0.005,
                "tension from the harmonic series (Fletcher 1964 line fit): " + t.tensionN() + " N vs true " + tension + " N");
        double f1 = Qualifier.dominant(r.modes(), 1).orElseThrow().mode().frequencyHz();
        double mersenne = StringPhysics.mersenneTensionN(f1, 1, 0.4, mu);
        assertTrue(Math.abs(mersenne / tension - 1) > 0.005,
                "Mersenne's law from f1 alone misses by more than 0.5 %: " + mersenne + " N");
        assertTrue(Math.abs(mersenne / tension - 1) > 2 * Math.abs(t.tensionN() / tension - 1),
                "the series fit beats Mersenne from f1 by a wide margin");
        assertEquals(ei, t.bendingStiffnessNm2(), 0.05 * ei, "EI from the slope of (f_n/n)^2 against n^2 (Fletcher 1964)");
    }

    @Test
    void theLevelShiftOfAWireDrivenAlongAPrincipalAxisIsTheKirchhoffCarrierBackbones() {
        // The demo wire with its principal axis turned onto the drive (invented test case): only one polarisation moves,
        // in the drive's plane, as the one-mode backbone assumes. Source: G. F. Carrier, Q. Appl. Math. 3:157 (1945),
        // one-mode backbone w/w0 = 1 + (3/32)(EA/T0)(k a)^2 (checks.md; from memory). Measured from the demo wire so
        // turned: 1.616e-5 +/- 0.08e-5 against 1.624e-5 predicted; turned 25 degrees, as built, 21 % above it.
        SimulationConfig demo = SimulationConfigs.demoWire();
        SimulatedSpecimen built = demo.specimen();
        SimulatedSpecimen alongTheDrive = new SimulatedSpecimen(built.lengthM(), built.linearDensityKgPerM(),
                built.tensionN(), built.bendingStiffnessNm2(), built.ends(), built.modeCount(), built.damping(),
                built.polarisationSplit(), 0.0, true, built.axialStiffnessN());
        QualificationResult r = DemoRun.run(demo.withSpecimen(alongTheDrive), DemoScenario.specimen(),
                DemoLotTest.shortPlan(), DemoLotTest.specification(), SweepEventListener.NONE, SweepControl.none())
                .result();

        org.tautline.analysis.specimen.LinearityResult linearity = r.linearity().orElseThrow();
        org.tautline.analysis.specimen.HarmonicShift shift = linearity.shifts().get(0);
        assertTrue(shift.predictedRelativeShift() > 1e-5, "the check's levels stretch the wire measurably: " + shift);
        assertEquals(shift.predictedRelativeShift(), shift.relativeShift(), 3 * shift.relativeShiftStd()
                + 0.03 * shift.predictedRelativeShift(), "measured shift of f1 against the Kirchhoff-Carrier backbone");
        assertTrue(linearity.findings().stream().noneMatch(f -> f.contains("second polarisation")),
                "no second polarisation is excited: " + linearity.findings());
    }

    @Test
    void flagsAStingerThatIsNotWhereTheSetupSays() {
        // The stinger really sits at 0.10 m, 5 % of the span from the stated 0.07 m.
        SimulationConfig demo = DemoScenario.simulation();
        SimulationConfig misplaced = demo.withSensors(demo.sensors().withForcingPositionM(0.10));
        QualificationResult r = DemoRun.run(misplaced, DemoScenario.specimen(), DemoScenario.plan(),
                DemoScenario.specification(), SweepEventListener.NONE, SweepControl.none()).result();
        PatternFit pattern = r.participation().orElseThrow();
        assertTrue(pattern.forcingMismatch(), "the misplaced stinger is flagged: " + pattern.findings());
        // Point-force modal constants (2/(mu L)) sin(n pi x_f/L) sin(n pi x_s/L) (checks.md) locate the real stinger.
        assertEquals(0.10, pattern.forcingPositionM(), 0.01 * 0.6, "x_f read from the modal constants");
    }
}
