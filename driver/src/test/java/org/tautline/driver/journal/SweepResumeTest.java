package org.tautline.driver.journal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Map;
import java.util.Optional;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.tautline.driver.RigException;
import org.tautline.driver.sim.SimulatedRigDriver;
import org.tautline.driver.spi.Rig;
import org.tautline.driver.spi.RigDriver;
import org.tautline.driver.spi.RigDrivers;
import org.tautline.driver.spi.RigOption;
import org.tautline.driver.sweep.SweepControl;
import org.tautline.driver.sweep.SweepEngine;
import org.tautline.driver.sweep.SweepEvent;
import org.tautline.driver.sweep.SweepEventListener;
import org.tautline.driver.sweep.SweepJournal;
import org.tautline.driver.sweep.SweepPlan;
import org.tautline.driver.sweep.SweepPoint;
import org.tautline.driver.sweep.SweepResult;
import org.tautline.driver.sweep.SweepStatus;

/** An interrupted sweep (stop, rig fault, cut journal) resumed from its journal equals an uninterrupted sweep. */
class SweepResumeTest {
    private static final RigDrivers DRIVERS = RigDrivers.load(List.of());

    static SweepResult uninterrupted(SweepPlan plan) {
        try (Rig rig = JournalFixtures.cleanRig()) {
            return new SweepEngine(rig).run(plan, SweepEventListener.NONE, SweepControl.none(), SweepJournal.NONE);
        }
    }

    /** A listener that asks for a stop once a number of steps have completed. */
    static SweepEventListener stopAfter(int steps, SweepControl control) {
        return e -> {
            if (e.completed() && e.stepNumber() >= steps) {
                control.requestStop("stopped by the test");
            }
        };
    }

    /**
     * Same steps in the same order and rig times; FRF values equal to 2e-5 relative. The simulated rig's
     * state carries over between steps, and a resumed sweep starts from rest, so only the settled part
     * is shared: the leftover transient is below 2e-6 (see {@link JournalFixtures#PLAN}) and the 24-bit
     * ADC's quantisation differs between the two histories at about 1e-6 (measured on this plan);
     * the tolerance is ten times the larger.
     */
    static void assertSameSweep(SweepResult expected, SweepResult actual) {
        assertTrue(actual.completed(), "the resumed sweep is complete: " + actual.reason());
        assertEquals(expected.points().size(), actual.points().size());
        for (int i = 0; i < expected.points().size(); i++) {
            SweepPoint e = expected.points().get(i);
            SweepPoint a = actual.points().get(i);
            assertEquals(e.frequencyHz(), a.frequencyHz(), 0.0, "frequency of step " + i);
            assertEquals(e.rigTimeS(), a.rigTimeS(), 1e-9, "rig time of step " + i);
            assertEquals(0.0, e.response().subtract(a.response()).norm() / e.response().norm(), 2e-5, "FRF at step " + i);
        }
        assertEquals(expected.rigTimeS(), actual.rigTimeS(), 1e-9, "the sweep's rig time");
    }

    @Test
    void aStoppedSweepResumedEqualsAnUninterruptedOne(@TempDir Path dir) {
        Path file = JournalFixtures.journal(dir);
        SweepControl control = new SweepControl();
        SweepResult first = JournaledSweep.run(DRIVERS, "sim", Map.of("scenario", "demo-wire-clean"), JournalFixtures.PLAN,
                file, false, stopAfter(5, control), control, JournalFixtures.CLOCK);
        assertFalse(first.completed());
        assertEquals(5, first.points().size());
        assertEquals(Optional.of(SweepStatus.CANCELLED), JournalReader.read(file).lastStatus());

        List<String> notices = new ArrayList<>();
        List<SweepEvent> progress = new ArrayList<>();
        SweepResult resumed = JournaledSweep.resume(DRIVERS, file, Map.of(), notices::add, e -> {
            if (e.completed()) {
                progress.add(e);
            }
        }, SweepControl.none(), JournalFixtures.CLOCK);
        assertSameSweep(uninterrupted(JournalFixtures.PLAN), resumed);
        assertEquals(first.points(), resumed.points().subList(0, 5), "the recorded steps are kept as they were");
        assertEquals(13, progress.size(), "the 5 recorded steps are reported, then the 8 new ones");
        assertEquals(6, progress.get(5).stepNumber(), "progress counts the recorded steps as done");
        String asBuilt = new SimulatedRigDriver().open(JournalFixtures.SIM_OPTIONS).identity();
        assertEquals(List.of("resuming " + file + " after 5 completed step(s) on " + asBuilt), notices);

        JournalContents after = JournalReader.read(file);
        assertEquals(Optional.empty(), after.warning());
        assertEquals(13, after.steps().size());
        assertEquals(2, after.sessions().size());
        assertTrue(after.sessions().get(0).reason().startsWith("stopped by the test during the step at"),
                after.sessions().get(0).reason());
        assertEquals(5, after.sessions().get(1).firstStep());
        assertEquals(Optional.of(SweepStatus.COMPLETED), after.lastStatus());
        assertEquals(resumed.steps(), after.completedSteps(), "the journal holds the whole resumed sweep");
    }

    @Test
    void anAdaptiveSweepResumedMakesTheSameDecisions(@TempDir Path dir) {
        SweepPlan plan = JournalFixtures.adaptivePlan();
        SweepResult whole = uninterrupted(plan);
        assertTrue(whole.completed(), whole.reason());
        Path file = JournalFixtures.journal(dir);
        SweepControl control = new SweepControl();
        int stopAt = whole.steps().size() / 2;
        SweepResult first = JournaledSweep.run(DRIVERS, "sim", JournalFixtures.SIM_OPTIONS, plan, file, false,
                stopAfter(stopAt, control), control, JournalFixtures.CLOCK);
        assertEquals(stopAt, first.steps().size(), "stopped half way, in the refinement");
        SweepResult resumed = JournaledSweep.resume(DRIVERS, file, Map.of(), n -> { }, SweepEventListener.NONE,
                SweepControl.none(), JournalFixtures.CLOCK);
        assertTrue(resumed.completed(), resumed.reason());
        assertEquals(first.steps(), resumed.steps().subList(0, stopAt), "the recorded steps are taken over as they were");
        assertEquals(whole.passes().get(0).modes().size(), resumed.passes().get(0).modes().size(),
                "the same resonances are refined");
        for (int i = 0; i < whole.passes().get(0).modes().size(); i++) {
            double f = whole.passes().get(0).modes().get(i).mode().frequencyHz();
            double fr = resumed.passes().get(0).modes().get(i).mode().frequencyHz();
            double std = whole.passes().get(0).modes().get(i).frequencyStdHz();
            assertEquals(f, fr, 3 * std + 1e-6 * f, "resonance " + i + " agrees within its standard error");
        }
    }

    @Test
    void aRigFaultSwitchesTheOutputOffIsRecordedAndTheSweepResumes(@TempDir Path dir) {
        Path file = JournalFixtures.journal(dir);
        Rig sim = JournalFixtures.cleanRig();
        FaultyRig faulty = new FaultyRig(sim, 7);
        SweepResult stopped;
        try (JournalWriter writer = JournalWriter.create(file, JournalFixtures.header(sim, false), JournalFixtures.CLOCK)) {
            stopped = new SweepEngine(faulty).run(JournalFixtures.PLAN, SweepEventListener.NONE, SweepControl.none(),
                    writer);
        }
        assertFalse(sim.exciter().isOutputEnabled(), "the output is off after the fault");
        sim.close();
        assertEquals(SweepStatus.FAULT, stopped.status());
        assertEquals(FaultyRig.FAULT, stopped.reason());
        assertEquals(7, stopped.points().size());
        JournalContents recorded = JournalReader.read(file);
        assertEquals(7, recorded.steps().size(), "the step in progress is discarded");
        assertEquals(Optional.of(SweepStatus.FAULT), recorded.lastStatus());
        assertEquals(FaultyRig.FAULT, recorded.sessions().get(0).reason());

        SweepResult resumed = JournaledSweep.resume(DRIVERS, file, Map.of(), n -> { }, SweepEventListener.NONE,
                SweepControl.none(), JournalFixtures.CLOCK);
        assertSameSweep(uninterrupted(JournalFixtures.PLAN), resumed);
    }

    @Test
    void aJournalCutMidRecordIsTrimmedAndResumed(@TempDir Path dir) throws Exception {
        Path file = JournalFixtures.journal(dir);
        SweepControl control = new SweepControl();
        JournaledSweep.run(DRIVERS, "sim", JournalFixtures.SIM_OPTIONS, JournalFixtures.PLAN, file, true,
                stopAfter(9, control), control, JournalFixtures.CLOCK);
        byte[] bytes = Files.readAllBytes(file);
        List<Integer> starts = JournalReadBackTest.lineStarts(bytes);
        int ninthStep = starts.get(9);
        Files.write(file, Arrays.copyOf(bytes, ninthStep + 100), java.nio.file.StandardOpenOption.TRUNCATE_EXISTING);
        List<String> notices = new ArrayList<>();
        SweepResult resumed = JournaledSweep.resume(DRIVERS, file, Map.of(), notices::add, SweepEventListener.NONE,
                SweepControl.none(), JournalFixtures.CLOCK);
        assertTrue(notices.get(0).startsWith("journal " + file + ": read up to byte " + ninthStep + " of "
                + (ninthStep + 100) + "; the record starting there is incomplete"), notices.get(0));
        assertSameSweep(uninterrupted(JournalFixtures.PLAN), resumed);
        JournalContents after = JournalReader.read(file);
        assertEquals(Optional.empty(), after.warning(), "the torn record was cut off before appending");
        assertEquals(13, after.steps().size());
        for (JournalStep step : after.steps()) {
            assertEquals(JournalFixtures.PLAN.integrationSamples(step.frequencyHz(), 20000), after.samples(step)[0].length,
                    "samples of step " + step.index() + " pass their CRC after the resume");
        }
    }

    @Test
    void aResumeRefusesARigThatAnswersDifferently(@TempDir Path dir) {
        Path file = JournalFixtures.journal(dir);
        SweepControl control = new SweepControl();
        JournaledSweep.run(DRIVERS, "sim", JournalFixtures.SIM_OPTIONS, JournalFixtures.PLAN, file, false,
                stopAfter(2, control), control, JournalFixtures.CLOCK);
        RigDriver otherSeed = new RigDriver() {
            @Override
            public String name() {
                return "sim";
            }

            @Override
            public String description() {
                return "a simulated rig that always uses seed 2";
            }

            @Override
            public List<RigOption> options() {
                return new SimulatedRigDriver().options();
            }

            @Override
            public Rig open(Map<String, String> options) {
                return new SimulatedRigDriver().open(Map.of("scenario", "demo-wire-clean", "seed", "2"));
            }
        };
        RigException e = assertThrows(RigException.class, () -> JournaledSweep.resume(RigDrivers.of(List.of(otherSeed)),
                file, Map.of(), n -> { }, SweepEventListener.NONE, SweepControl.none(), JournalFixtures.CLOCK));
        String recorded = new SimulatedRigDriver().open(JournalFixtures.SIM_OPTIONS).identity();
        String now = otherSeed.open(Map.of()).identity();
        assertEquals("journal " + file + " was recorded on '" + recorded + "' but the rig now answers '" + now + "';"
                + " a sweep can only be resumed on the rig it started on", e.getMessage());
        assertEquals(2, JournalReader.read(file).steps().size(), "nothing was appended");
    }

    @Test
    void aResumeMayChangeAnOptionButNotTheRig(@TempDir Path dir) {
        Path file = JournalFixtures.journal(dir);
        SweepControl control = new SweepControl();
        JournaledSweep.run(DRIVERS, "sim", JournalFixtures.SIM_OPTIONS, JournalFixtures.PLAN, file, false,
                stopAfter(2, control), control, JournalFixtures.CLOCK);
        RigException unknown = assertThrows(RigException.class, () -> JournaledSweep.resume(DRIVERS, file,
                Map.of("port", "/dev/ttyUSB1"), n -> { }, SweepEventListener.NONE, SweepControl.none(),
                JournalFixtures.CLOCK));
        assertEquals("the sim rig of journal " + file + " has no option 'port'; its options are scenario, seed, tensionN",
                unknown.getMessage());
        RigException other = assertThrows(RigException.class, () -> JournaledSweep.resume(DRIVERS, file,
                Map.of("seed", "3"), n -> { }, SweepEventListener.NONE, SweepControl.none(), JournalFixtures.CLOCK));
        assertTrue(other.getMessage().endsWith("a sweep can only be resumed on the rig it started on"), other.getMessage());
        assertEquals(2, JournalReader.read(file).steps().size(), "nothing was appended");
    }

    @Test
    void resumingAFinishedJournalIsRefusedWithoutOpeningARig(@TempDir Path dir) {
        Path file = JournalFixtures.journal(dir);
        SweepResult run = JournaledSweep.run(DRIVERS, "sim", JournalFixtures.SIM_OPTIONS, JournalFixtures.PLAN, file, false,
                SweepEventListener.NONE, SweepControl.none(), JournalFixtures.CLOCK);
        assertTrue(run.completed());
        RigException e = assertThrows(RigException.class, () -> JournaledSweep.resume(RigDrivers.of(List.of()), file,
                Map.of(), n -> { }, SweepEventListener.NONE, SweepControl.none(), JournalFixtures.CLOCK));
        assertEquals("journal " + file + " records a sweep that ran to its end (13 steps); there is nothing to resume",
                e.getMessage());
    }
}
