package org.tautline.driver.serial;

import java.util.ArrayList;
import java.util.List;

import org.tautline.driver.sim.SimulatedRig;
import org.tautline.driver.sim.SimulationConfig;
import org.tautline.driver.sim.SimulationConfigs;
import org.tautline.driver.spi.Rig;
import org.tautline.driver.spi.SampleBlock;

/**
 * Test helper: a stepped sine written as rig calls, so that the same calls on the in-process simulated rig and on
 * the serial rig (the virtual rig behind a pty) can be compared sample by sample, whatever the sweep engine does.
 */
final class RigScript {
    /** The specimen every serial test simulates. */
    static final SimulationConfig CONFIG = SimulationConfigs.demoWire();
    /** Peak drive, V. */
    static final double DRIVE_V = SimulationConfigs.DEMO_DRIVE_V;

    private RigScript() {
    }

    /**
     * Ramps up at the first frequency, then for each step sets the sine, reads a settle span in chunks of at most
     * 4096 samples and keeps one measuring read; ramps down and switches off.
     *
     * @param rig the rig
     * @param fromHz first frequency
     * @param toHz last frequency
     * @param steps step count, 2 or more
     * @param settleSamples samples read and dropped after each frequency change
     * @param measureSamples samples kept per step
     * @return the kept reads, one per step
     */
    static List<SampleBlock> steppedSine(Rig rig, double fromHz, double toHz, int steps, int settleSamples,
                                         int measureSamples) {
        List<SampleBlock> kept = new ArrayList<>();
        rig.exciter().setSine(fromHz, 0.0);
        rig.exciter().setOutputEnabled(true);
        rig.exciter().rampTo(DRIVE_V, 0.02);
        for (int i = 0; i < steps; i++) {
            rig.exciter().setSine(fromHz + (toHz - fromHz) * i / (steps - 1), DRIVE_V);
            for (int left = settleSamples; left > 0; left -= 4096) {
                rig.acquisition().read(Math.min(4096, left));
            }
            kept.add(rig.acquisition().read(measureSamples));
        }
        rig.exciter().rampTo(0.0, 0.02);
        rig.exciter().setOutputEnabled(false);
        return kept;
    }

    /** @return the same script on the in-process simulated rig */
    static List<SampleBlock> inProcess(double fromHz, double toHz, int steps, int settleSamples, int measureSamples) {
        try (SimulatedRig rig = new SimulatedRig(CONFIG)) {
            return steppedSine(rig, fromHz, toHz, steps, settleSamples, measureSamples);
        }
    }
}
