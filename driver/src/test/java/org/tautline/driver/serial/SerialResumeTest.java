package org.tautline.driver.serial;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Clock;
import java.util.List;
import java.util.Map;
import java.util.function.Consumer;

import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.EnumSource;
import org.tautline.driver.RigLinkException;
import org.tautline.driver.RigLinkException.Kind;
import org.tautline.driver.journal.JournalReader;
import org.tautline.driver.journal.JournaledSweep;
import org.tautline.driver.sim.SimulatedRig;
import org.tautline.driver.spi.RigDrivers;
import org.tautline.driver.sweep.SweepControl;
import org.tautline.driver.sweep.SweepEventListener;
import org.tautline.driver.sweep.SweepPlan;
import org.tautline.driver.sweep.SweepStatus;
import org.tautline.driver.sweep.SweepPoint;
import org.tautline.driver.sweep.SweepResult;

/**
 * A journaled sweep over the pty is stopped by each link fault, then resumed through the serial
 * driver to the same result as an uninterrupted sweep; the rig is reached through a link that is
 * re-pointed when the old port has gone, as a technician replugs a cable.
 */
class SerialResumeTest {
    private static final int FAULT_AFTER_STEP = 6;

    enum LinkFault {
        CRC(Kind.CRC, s -> s.corruptBlock(2)),
        SEQUENCE_GAP(Kind.SEQUENCE_GAP, s -> s.loseBlock(2)),
        TIMEOUT(Kind.TIMEOUT, s -> s.stall(3000)),
        DEVICE_RESET(Kind.DEVICE_RESET, VirtualRigServer::reset),
        PORT_GONE(Kind.PORT_GONE, VirtualRigServer::disappear);

        final Kind kind;
        final Consumer<VirtualRigServer> inject;

        LinkFault(Kind kind, Consumer<VirtualRigServer> inject) {
            this.kind = kind;
            this.inject = inject;
        }
    }

    /** 16 steps across the demo wire's fundamental; 400 settle cycles (about 9 time constants) so a resumed rig at rest matches. */
    private static SweepPlan plan() {
        return SweepPlan.uniform(240, 260, 16, 400, 0.0, 8, 1.0, 0.02, 3, SerialSweepTest.wideLimits());
    }

    private static SweepResult uninterrupted() {
        try (SimulatedRig rig = new SimulatedRig(SerialSweepTest.CONFIG)) {
            return SerialSweepTest.sweep(rig, plan(), SweepEventListener.NONE);
        }
    }

    @TempDir
    Path dir;

    @ParameterizedTest
    @EnumSource(LinkFault.class)
    void aFaultedSweepResumesToTheUninterruptedResult(LinkFault fault) throws IOException {
        SweepResult reference = uninterrupted();
        Path link = dir.resolve("rig-port");
        Path journal = dir.resolve("journal");
        Map<String, String> options = Map.of("port", link.toString(), "baud", "921600", "timeoutMs", "400");
        RigDrivers drivers = RigDrivers.standard();
        VirtualRigServer first = VirtualRigServer.startOnPty(SerialSweepTest.CONFIG, 921600);
        try {
            Files.createSymbolicLink(link, Path.of(first.hostPath()));
            SweepResult stopped = JournaledSweep.run(drivers, "serial", options, plan(), journal, false, p -> {
                if (p.completed() && p.stepNumber() == FAULT_AFTER_STEP) {
                    fault.inject.accept(first);
                }
            }, SweepControl.none(), Clock.systemUTC());
            assertEquals(SweepStatus.FAULT, stopped.status(), stopped.reason());
            assertTrue(stopped.reason().contains(link.toString()), fault + ": " + stopped.reason());
            assertFalse(first.outputEnabled(), "the device's output is off after the fault");
            assertEquals(FAULT_AFTER_STEP, JournalReader.read(journal).steps().size(), "every completed step journaled");
        } finally {
            first.close();
        }
        // The old link is gone (or the device forgot its state): a fresh virtual rig on a new pty, the same link name.
        try (VirtualRigServer second = VirtualRigServer.startOnPty(SerialSweepTest.CONFIG, 921600)) {
            Files.delete(link);
            Files.createSymbolicLink(link, Path.of(second.hostPath()));
            SweepResult resumed = JournaledSweep.resume(drivers, journal, Map.of(), notice -> { },
                    SweepEventListener.NONE, SweepControl.none(), Clock.systemUTC());
            assertTrue(resumed.completed());
            List<SweepPoint> got = resumed.points();
            assertEquals(reference.points().size(), got.size());
            for (int i = 0; i < got.size(); i++) {
                SweepPoint want = reference.points().get(i);
                assertEquals(want.frequencyHz(), got.get(i).frequencyHz(), 0.0, "step " + i);
                double relative = got.get(i).response().subtract(want.response()).norm() / want.response().norm();
                assertTrue(relative < 1e-3, fault + ", step " + i + ": FRF differs by " + relative + " relative");
            }
        }
    }
}
