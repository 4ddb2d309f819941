package org.tautline.driver.serial;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.time.Clock;
import java.time.Instant;
import java.time.ZoneOffset;
import java.util.EnumMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.tautline.driver.journal.JournalContents;
import org.tautline.driver.journal.JournalHeader;
import org.tautline.driver.journal.JournalReader;
import org.tautline.driver.journal.JournalWriter;
import org.tautline.driver.journal.JournaledSweep;
import org.tautline.driver.spi.RigDrivers;
import org.tautline.driver.sweep.SafetyLimits;
import org.tautline.driver.sweep.SweepControl;
import org.tautline.driver.sweep.SweepEngine;
import org.tautline.driver.sweep.SweepEventListener;
import org.tautline.driver.sweep.SweepPlan;
import org.tautline.driver.sweep.SweepResult;
import org.tautline.driver.sweep.SweepStatus;

/**
 * The whole chain under injected faults: a journaled sweep through the {@code serial} driver with 200 faults of each
 * kind the host recovers from (bytes dropped, a block corrupted, a block lost, a short stall, a block the device no
 * longer keeps for a re-request) at seeded moments, and then faults that end the session, each followed by a resume
 * on the port the rig answers on then (a new one after the port disappeared): 200 of each kind. No completed step is
 * ever lost, none is recorded twice, and the sweep always goes on.
 */
class SweepSoakTest {
    private static final Clock CLOCK = Clock.fixed(Instant.parse("2025-03-01T09:30:00Z"), ZoneOffset.UTC);
    private static final int FAULTS_PER_KIND = 200;

    @TempDir
    Path dir;

    /**
     * Short steps across the fundamental: 20 settle cycles and 8 fitted cycles in 1024-sample blocks, so a step is a
     * handful of items (its two reads' blocks and status lines, its drive command and status).
     */
    private static SweepPlan plan(int steps) {
        return SweepPlan.uniform(235, 265, steps, 20, 0.0, 8, 1.0, 0.02, 1, new SafetyLimits(5.0, 10.0, 0.01, 0.01));
    }

    private static Map<String, String> options(String port) {
        return Map.of("port", port, "baud", "921600", "timeoutMs", "800");
    }

    @Test
    void twoHundredFaultsOfEachRecoverableKindNeverEndASweepNorLoseAStep() {
        Map<InjectedFault, Integer> kinds = new EnumMap<>(InjectedFault.class);
        kinds.put(InjectedFault.DROP_BYTES, 7);
        kinds.put(InjectedFault.CORRUPT_BLOCK, 0);
        kinds.put(InjectedFault.LOSE_BLOCK, 0);
        kinds.put(InjectedFault.STALL, 30);
        kinds.put(InjectedFault.FORGET_HISTORY, 0);
        // One fault of each kind every 80 items on average, one of any kind every 16: most steps see none, some one,
        // a few more; a step that loses samples is measured again (at most three times) and never recorded twice.
        FaultSchedule schedule = new FaultSchedule(List.of());
        long seed = 2026_12_04L;
        for (Map.Entry<InjectedFault, Integer> k : kinds.entrySet()) {
            schedule = schedule.and(FaultSchedule.spread(k.getKey(), k.getValue(), FAULTS_PER_KIND, 5, 80, seed++));
        }
        Path journal = dir.resolve("journal");
        SweepResult result;
        FaultSchedule faults = schedule;
        SerialLinkSettings quick = SerialLinkSettings.defaults().withReplyTimeoutMs(800).withBlockTimeoutMs(40);
        SweepPlan plan = plan(4000);
        try (VirtualRigServer server = VirtualRigServer.startOnPty(RigScript.CONFIG, 921600);
             SerialRig rig = SerialRig.open(server.hostPath(), quick);
             JournalWriter writer = JournalWriter.create(journal, new JournalHeader(JournalHeader.FORMAT_VERSION,
                     CLOCK.instant(), "serial", options(server.hostPath()), rig.identity(),
                     rig.acquisition().sampleRateHz(), rig.acquisition().channels(), plan, ""), CLOCK)) {
            boolean[] installed = {false};
            // The faults start with the sweep's first step, once the link is set up (opening is not the sweep).
            result = new SweepEngine(rig).run(plan, e -> {
                if (!installed[0]) {
                    server.schedule(faults);
                    installed[0] = true;
                } else if (e.completed() && server.pendingFaults() == 0) {
                    throw new IllegalStateException("every fault injected");
                }
            }, SweepControl.none(), writer);
            for (InjectedFault f : kinds.keySet()) {
                assertEquals(FAULTS_PER_KIND, server.injected(f), f.label() + " faults injected during the sweep");
            }
            assertTrue(!server.outputEnabled(), "the output is off");
        }
        // The listener ends the sweep, by a fault of its own, once every fault has been injected.
        assertEquals(SweepStatus.FAULT, result.status(), result.reason());
        assertTrue(result.reason().endsWith("every fault injected"), "no link fault ended the sweep: " + result.reason());
        JournalContents contents = JournalReader.read(journal);
        assertEquals(result.steps().size(), contents.steps().size(), "every completed step is journaled");
        assertEquals(result.steps(), contents.completedSteps(), "journaled as measured, each once, in order");
        double[] planned = plan.coarseFrequenciesHz();
        for (int i = 0; i < contents.steps().size(); i++) {
            assertEquals(planned[i], contents.steps().get(i).frequencyHz(), 0.0, "step " + i + " is the planned one");
        }
        System.out.printf("soak: %d faults injected over %d steps, %s%n", FAULTS_PER_KIND * kinds.size(),
                contents.steps().size(), result.warnings());
    }

    @Test
    void twoHundredFaultsOfEachKindThatEndsTheSessionLoseNoStepAndTheSweepResumes() {
        List<InjectedFault> kinds = List.of(InjectedFault.RESET, InjectedFault.AMPLIFIER_FAULT, InjectedFault.DISAPPEAR);
        Map<InjectedFault, Integer> injected = new EnumMap<>(InjectedFault.class);
        int[] endedOtherwise = {0};
        int steps = 0;
        VirtualRigServer[] server = {VirtualRigServer.startOnPty(RigScript.CONFIG, 921600)};
        try {
            // Twenty sweeps of thirty sessions each: a resume takes over every recorded step, so one journal of all
            // 600 sessions would make the soak quadratic in time for nothing more.
            for (int sweep = 0; sweep < 20; sweep++) {
                steps += faultedSweep(dir.resolve("journal-" + sweep), kinds, 10, server, injected, endedOtherwise);
            }
        } finally {
            server[0].close();
        }
        for (InjectedFault f : kinds) {
            assertEquals(FAULTS_PER_KIND, injected.get(f), f.label() + " faults injected");
        }
        System.out.printf("soak: %d sessions ended by a fault (%d of each kind), %d ended before their fault struck,"
                + " %d steps, all kept%n", kinds.size() * FAULTS_PER_KIND, FAULTS_PER_KIND, endedOtherwise[0], steps);
    }

    /**
     * One journaled sweep through a number of faults of each kind, each ending a session that the next resumes.
     * On a busy machine a session may end by a fault of the host's own (a reply that came too late) before the
     * scheduled fault struck: that session must lose nothing either, and the fault still pending strikes in the next.
     *
     * @param endedOtherwise counts sessions that ended before their scheduled fault struck
     * @return the steps the journal holds at the end
     */
    private int faultedSweep(Path journal, List<InjectedFault> kinds, int perKind, VirtualRigServer[] server,
                             Map<InjectedFault, Integer> injected, int[] endedOtherwise) {
        int faults = kinds.size() * perKind;
        // About three steps a session, the fault striking in the third or fourth; the plan is longer than the soak.
        SweepPlan plan = plan(10 * faults);
        RigDrivers drivers = RigDrivers.standard();
        int kept = 0;
        int struck = 0;
        int otherwise = 0;
        for (int session = 0; ; session++) {
            InjectedFault fault = struck < faults ? kinds.get(struck % kinds.size()) : null;
            if (fault != null && server[0].pendingFaults() == 0) {
                server[0].schedule(FaultSchedule.at(fault, 40 + 7L * (struck % 5)));
            }
            long before = fault != null ? server[0].injected(fault) : 0;
            // The last session, with no fault, is stopped after a few steps: this sweep's share of the soak is over.
            SweepControl control = new SweepControl();
            int stopAfter = kept + 5;
            SweepEventListener listener = fault != null ? SweepEventListener.NONE : e -> {
                if (e.completed() && e.stepNumber() > stopAfter) {
                    control.requestStop("the soak is over");
                }
            };
            // A port that disappeared comes back under a new name; the others stay where they were.
            SweepResult result = session == 0
                    ? JournaledSweep.run(drivers, "serial", options(server[0].hostPath()), plan, journal, false,
                            listener, control, CLOCK)
                    : JournaledSweep.resume(drivers, journal, Map.of("port", server[0].hostPath()), n -> { },
                            listener, control, CLOCK);
            assertTrue(!server[0].outputEnabled(), "the output is off after session " + (session + 1));
            JournalContents contents = JournalReader.read(journal);
            assertTrue(contents.steps().size() >= kept, "no completed step is ever lost");
            assertEquals(result.steps(), contents.completedSteps(), "the journal holds exactly the completed steps");
            kept = contents.steps().size();
            if (fault == null) {
                assertEquals(SweepStatus.CANCELLED, result.status(), "the last session ran until stopped: "
                        + result.reason());
                break;
            }
            assertEquals(SweepStatus.FAULT, result.status(), fault.label() + ": " + result.reason());
            assertEquals(Optional.of(SweepStatus.FAULT), contents.lastStatus());
            int strikes = (int) (server[0].injected(fault) - before);
            if (strikes == 0) {
                // Ended by the host before the fault struck; the fault stays scheduled for the next session.
                otherwise++;
                assertTrue(otherwise <= faults, "sessions keep ending before their fault strikes: " + result.reason());
                continue;
            }
            assertEquals(1, strikes, fault.label() + " struck once in the session");
            injected.merge(fault, strikes, Integer::sum);
            struck++;
            if (fault == InjectedFault.DISAPPEAR) {
                server[0].close();
                server[0] = VirtualRigServer.startOnPty(RigScript.CONFIG, 921600);
            }
        }
        endedOtherwise[0] += otherwise;
        return kept;
    }
}
