package org.tautline.app.qualify;

import java.util.Optional;
import java.util.function.BooleanSupplier;

import org.tautline.analysis.specimen.LinearityResult;
import org.tautline.analysis.specimen.Specimen;
import org.tautline.analysis.verdict.Specification;
import org.tautline.driver.sim.SimulatedRig;
import org.tautline.driver.sim.SimulationConfig;
import org.tautline.driver.sim.SimulationTruth;
import org.tautline.driver.sweep.SteppedSinePlan;
import org.tautline.driver.sweep.SteppedSineRunner;
import org.tautline.driver.sweep.SweepListener;
import org.tautline.driver.sweep.SweepRecord;

/** Runs a qualification on the simulated rig: the demo, or any simulated specimen. */
public final class DemoRun {
    private DemoRun() {
    }

    /**
     * Sweeps the demo wire and analyses it.
     *
     * @param listener progress after every step (called on the calling thread)
     * @param cancelRequested polled during the sweep; true ramps the drive down and stops
     * @return the result and the simulated truth
     */
    public static DemoOutcome run(SweepListener listener, BooleanSupplier cancelRequested) {
        return run(DemoScenario.simulation(), DemoScenario.specimen(), DemoScenario.plan(), DemoScenario.specification(),
                listener, cancelRequested);
    }

    /**
     * Sweeps a simulated specimen, qualifies it against what was stated about it, then checks the
     * fundamental at a second, higher level (see {@link LevelCheck}).
     *
     * @param simulation the specimen as it really is, with the rig
     * @param stated what the technician states about the specimen
     * @param plan the sweep
     * @param specification the limits
     * @param listener progress after every step
     * @param cancelRequested polled during the sweep
     * @return the result and the simulated truth
     */
    public static DemoOutcome run(SimulationConfig simulation, Specimen stated, SteppedSinePlan plan,
                                  Specification specification, SweepListener listener, BooleanSupplier cancelRequested) {
        long startNs = System.nanoTime();
        try (SimulatedRig rig = new SimulatedRig(simulation)) {
            SimulationTruth truth = rig.truth();
            SweepRecord sweep = new SteppedSineRunner(rig).run(plan, listener, cancelRequested);
            QualificationResult result = Qualification.analyse(stated, sweep, specification, startNs);
            if (sweep.completed()) {
                Optional<LinearityResult> linearity = LevelCheck.run(rig, result, plan, SweepListener.NONE, cancelRequested);
                if (linearity.isPresent()) {
                    result = Qualification.withLinearity(result, linearity.get(), Optional.of(specification));
                }
            }
            return new DemoOutcome(result, truth);
        }
    }
}
