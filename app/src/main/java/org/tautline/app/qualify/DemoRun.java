package org.tautline.app.qualify;

import java.util.Optional;

import org.tautline.analysis.specimen.Specimen;
import org.tautline.analysis.verdict.Specification;
import org.tautline.driver.sim.SimulatedRig;
import org.tautline.driver.sim.SimulationConfig;
import org.tautline.driver.sim.SimulationTruth;
import org.tautline.driver.spi.Rig;
import org.tautline.driver.sweep.SweepControl;
import org.tautline.driver.sweep.SweepEngine;
import org.tautline.driver.sweep.SweepEventListener;
import org.tautline.driver.sweep.SweepJournal;
import org.tautline.driver.sweep.SweepPlan;
import org.tautline.driver.sweep.SweepResult;

/** Runs a qualification on the simulated rig: the demo, or any simulated specimen. */
public final class DemoRun {
    private DemoRun() {
    }

    /**
     * Sweeps the demo wire and analyses it.
     *
     * @param listener progress events (called on the calling thread)
     * @param control stop requests; a stop ramps the drive down and ends the run
     * @return the result and the simulated truth
     */
    public static DemoOutcome run(SweepEventListener listener, SweepControl control) {
        return run(DemoScenario.simulation(), DemoScenario.specimen(), DemoScenario.plan(), DemoScenario.specification(),
                listener, control);
    }

    /**
     * Sweeps a simulated specimen, qualifies it against what was stated about it, then checks the
     * fundamental at a second, higher level (see {@link LevelCheck}).
     *
     * @param simulation the specimen as it really is, with the rig
     * @param stated what the technician states about the specimen
     * @param plan the sweep
     * @param specification the limits
     * @param listener progress events of the main sweep
     * @param control stop requests, for the main sweep and the level check
     * @return the result and the simulated truth
     * @throws SweepStoppedException when the sweep ended before its end (a stop, a safety limit): nothing is qualified
     */
    public static DemoOutcome run(SimulationConfig simulation, Specimen stated, SweepPlan plan,
                                  Specification specification, SweepEventListener listener, SweepControl control) {
        try (SimulatedRig rig = new SimulatedRig(simulation)) {
            return run(rig, rig.truth(), stated, plan, specification, listener, control);
        }
    }

    /**
     * Sweeps a specimen on a connected rig that simulates it, qualifies it, then runs the level check.
     *
     * @param rig the rig (left open)
     * @param truth the specimen as the rig simulates it
     * @param stated what the technician states about the specimen
     * @param plan the sweep
     * @param specification the limits
     * @param listener progress events of the main sweep
     * @param control stop requests, for the main sweep and the level check
     * @return the result and the simulated truth
     * @throws SweepStoppedException when the sweep ended before its end (a stop, a safety limit): nothing is qualified
     */
    public static DemoOutcome run(Rig rig, SimulationTruth truth, Specimen stated, SweepPlan plan,
                                  Specification specification, SweepEventListener listener, SweepControl control) {
        long startNs = System.nanoTime();
        SweepResult sweep = new SweepEngine(rig).run(plan, listener, control, SweepJournal.NONE);
        if (!sweep.completed()) {
            throw new SweepStoppedException(sweep);
        }
        QualificationResult result = RigQualification.of(rig, sweep, stated, Optional.of(specification), control,
                notice -> { }, startNs);
        return new DemoOutcome(result, truth);
    }
}
