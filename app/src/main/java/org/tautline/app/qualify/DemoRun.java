package org.tautline.app.qualify;

import java.util.function.BooleanSupplier;

import org.tautline.driver.sim.SimulatedRig;
import org.tautline.driver.sim.SimulationTruth;
import org.tautline.driver.sweep.SteppedSineRunner;
import org.tautline.driver.sweep.SweepListener;
import org.tautline.driver.sweep.SweepRecord;

/** Runs the demo qualification on the simulated rig. */
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
        long startNs = System.nanoTime();
        try (SimulatedRig rig = new SimulatedRig(DemoScenario.simulation())) {
            SimulationTruth truth = rig.truth();
            SweepRecord sweep = new SteppedSineRunner(rig).run(DemoScenario.plan(), listener, cancelRequested);
            QualificationResult result = Qualification.analyse(DemoScenario.specimen(), sweep,
                    DemoScenario.specification(), startNs);
            return new DemoOutcome(result, truth);
        }
    }
}
