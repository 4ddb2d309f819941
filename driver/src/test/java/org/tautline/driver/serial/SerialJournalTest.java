package org.tautline.driver.serial;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Clock;
import java.time.Instant;
import java.time.ZoneOffset;
import java.util.List;
import java.util.Map;
import java.util.function.Consumer;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.Timeout;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.EnumSource;
import org.tautline.driver.journal.JournalReader;
import org.tautline.driver.journal.JournaledSweep;
import org.tautline.driver.sim.SimulatedRig;
import org.tautline.driver.spi.RigDrivers;
import org.tautline.driver.sweep.SafetyLimits;
import org.tautline.driver.sweep.SweepControl;
import org.tautline.driver.sweep.SweepEngine;
import org.tautline.driver.sweep.SweepEventListener;
import org.tautline.driver.sweep.SweepJournal;
import org.tautline.driver.sweep.SweepPlan;
import org.tautline.driver.sweep.SweepPoint;
import org.tautline.driver.sweep.SweepResult;
import org.tautline.driver.sweep.SweepStatus;

/**
 * Journaled sweeps through the {@code serial} driver: a fault that ends the session keeps every completed step and
 * the sweep resumes to the uninterrupted result on a re-pointed link, as a technician replugs a cable; link faults
 * the host recovers from never end a sweep.
 */
@Timeout(value = 120)
class SerialJournalTest {
    private static final int FAULT_AFTER_STEP = 6;
    private static final Clock CLOCK = Clock.fixed(Instant.parse("2025-03-01T09:30:00Z"), ZoneOffset.UTC);

    /** Faults that end a session, injected between two steps. */
    enum SessionFault {
        DEVICE_RESET(VirtualRigServer::reset),
        AMPLIFIER_FAULT(VirtualRigServer::amplifierFault),
        PORT_GONE(VirtualRigServer::disappear),
        LONG_STALL(s -> s.stall(3000));

        final Consumer<VirtualRigServer> inject;

        SessionFault(Consumer<VirtualRigServer> inject) {
            this.inject = inject;
        }
    }

    /**
     * 16 steps across the demo wire's fundamental; 400 settle cycles (about 9 time constants) so that a resumed rig,
     * which starts at rest, and a step measured again both reach what an uninterrupted sweep measures.
     */
    private static SweepPlan plan() {
        return SweepPlan.uniform(240, 260, 16, 400, 0.0, 8, 1.0, 0.02, 3, new SafetyLimits(5.0, 10.0, 0.01, 0.01));
    }

    private static SweepResult uninterrupted() {
        try (SimulatedRig rig = new SimulatedRig(RigScript.CONFIG)) {
            return new SweepEngine(rig).run(plan(), SweepEventListener.NONE, SweepControl.none(), SweepJournal.NONE);
        }
    }

    private static void assertClose(SweepResult reference, SweepResult got, String what) {
        assertTrue(got.completed(), what + ": " + got.reason());
        List<SweepPoint> points = got.points();
        assertEquals(reference.points().size(), points.size());
        for (int i = 0; i < points.size(); i++) {
            SweepPoint want = reference.points().get(i);
            assertEquals(want.frequencyHz(), points.get(i).frequencyHz(), 0.0, what + ", step " + i);
            double relative = points.get(i).response().subtract(want.response()).norm() / want.response().norm();
            assertTrue(relative < 1e-3, what + ", step " + i + ": FRF differs by " + relative + " relative");
        }
    }

    @TempDir
    Path dir;

    @ParameterizedTest
    @EnumSource(SessionFault.class)
    void aSessionFaultKeepsTheCompletedStepsAndTheSweepResumesOnANewLink(SessionFault fault) throws IOException {
        SweepResult reference = uninterrupted();
        Path link = dir.resolve("rig-port");
        Path journal = dir.resolve("journal");
        Map<String, String> options = Map.of("port", link.toString(), "baud", "921600", "timeoutMs", "800");
        RigDrivers drivers = RigDrivers.standard();
        try (VirtualRigServer first = VirtualRigServer.startOnPty(RigScript.CONFIG, 921600)) {
            Files.createSymbolicLink(link, Path.of(first.hostPath()));
            SweepResult stopped = JournaledSweep.run(drivers, "serial", options, plan(), journal, false, e -> {
                if (e.completed() && e.stepNumber() == FAULT_AFTER_STEP) {
                    fault.inject.accept(first);
                }
            }, SweepControl.none(), CLOCK);
            assertEquals(SweepStatus.FAULT, stopped.status(), stopped.reason());
            assertTrue(stopped.reason().contains(link.toString()), stopped.reason());
            assertFalse(first.outputEnabled(), "the device's output is off after the fault");
            assertEquals(FAULT_AFTER_STEP, JournalReader.read(journal).steps().size(), "every completed step journaled");
        }
        try (VirtualRigServer second = VirtualRigServer.startOnPty(RigScript.CONFIG, 921600)) {
            Files.delete(link);
            Files.createSymbolicLink(link, Path.of(second.hostPath()));
            SweepResult resumed = JournaledSweep.resume(drivers, journal, Map.of(), notice -> { },
                    SweepEventListener.NONE, SweepControl.none(), CLOCK);
            assertClose(reference, resumed, fault.toString());
            assertFalse(second.outputEnabled());
        }
    }

    @Test
    void linkFaultsTheHostRecoversFromNeverEndASweep() {
        SweepResult reference = uninterrupted();
        FaultSchedule schedule = new FaultSchedule(List.of());
        long seed = 7;
        for (InjectedFault f : List.of(InjectedFault.DROP_BYTES, InjectedFault.CORRUPT_BLOCK, InjectedFault.LOSE_BLOCK,
                InjectedFault.STALL)) {
            schedule = schedule.and(FaultSchedule.spread(f, f.defaultParameter(), 25, 20, 40, seed++));
        }
        SerialLinkSettings settings = SerialLinkSettings.defaults().withBlockTimeoutMs(100).withReplyTimeoutMs(2000);
        try (VirtualRigServer server = VirtualRigServer.startOnPty(RigScript.CONFIG, 921600);
             SerialRig rig = SerialRig.open(server.hostPath(), settings)) {
            server.schedule(schedule);
            SweepResult result = new SweepEngine(rig).run(plan(), SweepEventListener.NONE, SweepControl.none(),
                    SweepJournal.NONE);
            assertClose(reference, result, "a sweep with " + (schedule.entries().size() - server.pendingFaults())
                    + " link faults");
            assertEquals(null, rig.fault());
            System.out.printf("sweep with link faults: %d injected, %d blocks recovered by re-requests%n",
                    schedule.entries().size() - server.pendingFaults(), rig.blocksRecovered());
        }
    }
}
