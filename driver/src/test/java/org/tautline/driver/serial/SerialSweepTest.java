package org.tautline.driver.serial;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.Timeout;
import org.tautline.analysis.frf.Frf;
import org.tautline.driver.sim.SimulatedRig;
import org.tautline.driver.sim.SimulationConfig;
import org.tautline.driver.sim.SimulationConfigs;
import org.tautline.driver.spi.Rig;
import org.tautline.driver.sweep.SafetyLimits;
import org.tautline.driver.sweep.SweepControl;
import org.tautline.driver.sweep.SweepEngine;
import org.tautline.driver.sweep.SweepEventListener;
import org.tautline.driver.sweep.SweepJournal;
import org.tautline.driver.sweep.SweepPlan;
import org.tautline.driver.sweep.SweepResult;

@Timeout(value = 120)
class SerialSweepTest {
    static final SimulationConfig CONFIG = SimulationConfigs.demoWire();

    /** 40 steps across the first mode of the demo wire (about 250 Hz), short settle, 8 cycles each. */
    static SweepPlan plan() {
        return SweepPlan.uniform(235, 265, 40, 60, 0.0, 8, SimulationConfigs.DEMO_DRIVE_V, 0.02, 3, wideLimits());
    }

    /** Limits far above what these sweeps reach: the serial tests are about the link. */
    static SafetyLimits wideLimits() {
        return new SafetyLimits(5.0, 10.0, 0.01, 0.01);
    }

    /**
     * @param rig the rig
     * @param plan the plan
     * @param listener progress
     * @return the sweep, run with no journal and no stop
     */
    static SweepResult sweep(Rig rig, SweepPlan plan, SweepEventListener listener) {
        return new SweepEngine(rig).run(plan, listener, SweepControl.none(), SweepJournal.NONE);
    }

    static SweepResult inProcess() {
        try (SimulatedRig rig = new SimulatedRig(CONFIG)) {
            return sweep(rig, plan(), SweepEventListener.NONE);
        }
    }

    @Test
    void float64SweepOverThePtyEqualsTheInProcessSweepExactly() {
        SweepResult reference = inProcess();
        try (VirtualRigServer server = VirtualRigServer.startOnPty(CONFIG, 921600);
             SerialRig rig = SerialRig.open(server.hostPath(),
                     SerialLinkSettings.defaults().withFormat(SampleFormat.FLOAT64_LE))) {
            SweepResult serial = sweep(rig, plan(), SweepEventListener.NONE);
            assertTrue(serial.completed());
            Frf a = reference.toFrf();
            Frf b = serial.toFrf();
            assertEquals(a.size(), b.size());
            for (int i = 0; i < a.size(); i++) {
                assertEquals(a.frequencyHz(i), b.frequencyHz(i), 0.0);
                assertEquals(0.0, a.value(i).subtract(b.value(i)).norm(), 0.0, "line " + i);
            }
            assertFalse(server.outputEnabled());
            assertNull(rig.fault());
        }
    }

    @Test
    void float32SweepOverThePtyMatchesTheInProcessSweepToTheNoiseLevel() {
        Frf a = inProcess().toFrf();
        try (VirtualRigServer server = VirtualRigServer.startOnPty(CONFIG, 921600);
             SerialRig rig = SerialRig.open(server.hostPath())) {
            Frf b = sweep(rig, plan(), SweepEventListener.NONE).toFrf();
            assertEquals(a.size(), b.size());
            double[] variance = a.variance().orElseThrow();
            for (int i = 0; i < a.size(); i++) {
                // Rounding to binary32 (relative 2^-24, IEEE 754-2008) is far below each line's own
                // random error, the standard deviation sqrt(variance) from the sine fits.
                double difference = a.value(i).subtract(b.value(i)).norm();
                double noise = Math.sqrt(variance[i]);
                assertTrue(difference < 0.01 * noise, "line " + i + ": float32 link changed the FRF by " + difference
                        + ", noise level " + noise);
                assertTrue(difference < 1e-6 * a.value(i).norm(), "line " + i + " relative change " + difference);
            }
        }
    }
}
