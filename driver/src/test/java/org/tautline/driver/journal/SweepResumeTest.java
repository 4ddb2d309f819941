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
import java.util.concurrent.atomic.AtomicInteger;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.tautline.driver.RigException;
import org.tautline.driver.sim.SimulatedRigDriver;
import org.tautline.driver.spi.Rig;
import org.tautline.driver.spi.RigDriver;
import org.tautline.driver.spi.RigDrivers;
import org.tautline.driver.spi.RigOption;
import org.tautline.driver.sweep.SteppedSineRunner;
import org.tautline.driver.sweep.SweepFaultException;
import org.tautline.driver.sweep.SweepListener;
import org.tautline.driver.sweep.SweepPoint;
import org.tautline.driver.sweep.SweepProgress;
import org.tautline.driver.sweep.SweepRecord;
import org.tautline.driver.sweep.SweepStatus;

/** An interrupted sweep (cancel, rig fault, cut journal) resumed from its journal equals an uninterrupted sweep. */
class SweepResumeTest {
    private static final RigDrivers DRIVERS = RigDrivers.load(List.of());

    static SweepRecord uninterrupted() {
        try (Rig rig = JournalFixtures.cleanRig()) {
            return new SteppedSineRunner(rig).run(JournalFixtures.PLAN, SweepListener.NONE, () -> false);
        }
    }

    /**
     * Same steps in the same order and rig times; FRF values equal to 2e-5 relative. The simulated rig's
     * state carries over between steps, and a resumed sweep starts from rest, so only the settled part
     * is shared: the leftover transient is below 2e-6 (see {@link JournalFixtures#PLAN}) and the 24-bit
     * ADC's quantisation differs between the two histories at about 1e-6 (measured on this plan);
     * the tolerance is ten times the larger.
     */
    static void assertSameSweep(SweepRecord expected, SweepRecord actual) {
        assertTrue(actual.completed(), "the resumed sweep is complete");
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
    void aCancelledSweepResumedEqualsAnUninterruptedOne(@TempDir Path dir) {
        Path file = JournalFixtures.journal(dir);
        AtomicInteger steps = new AtomicInteger();
        SweepRecord first = JournaledSweep.run(DRIVERS, "sim", Map.of("scenario", "demo-wire-clean"), JournalFixtures.PLAN,
                file, false, p -> steps.incrementAndGet(), () -> steps.get() >= 5, JournalFixtures.CLOCK);
        assertFalse(first.completed());
        assertEquals(5, first.points().size());
        assertEquals(Optional.of(SweepStatus.CANCELLED), JournalReader.read(file).lastStatus());

        List<String> notices = new ArrayList<>();
        List<SweepProgress> progress = new ArrayList<>();
        SweepRecord resumed = JournaledSweep.resume(DRIVERS, file, notices::add, progress::add, () -> false,
                JournalFixtures.CLOCK);
        assertSameSweep(uninterrupted(), resumed);
        assertEquals(first.points(), resumed.points().subList(0, 5), "the recorded steps are kept as they were");
        assertEquals(8, progress.size(), "only the 8 steps not done are run");
        assertEquals(6, progress.get(0).completedSteps(), "progress counts the recorded steps as done");
        assertEquals(List.of("resuming " + file + " at step 6 of 13 on Tautline simulated rig (model of specimen, shaker"
                + " and sensors), seed 1"), notices);

        JournalContents after = JournalReader.read(file);
        assertEquals(Optional.empty(), after.warning());
        assertEquals(13, after.steps().size());
        assertEquals(2, after.sessions().size());
        assertEquals("cancelled after 5 of 13 steps", after.sessions().get(0).reason());
        assertEquals(5, after.sessions().get(1).firstStep());
        assertEquals(Optional.of(SweepStatus.COMPLETED), after.lastStatus());
        assertEquals(resumed.points(), after.record().points(), "the journal holds the whole resumed sweep");
    }

    @Test
    void aRigFaultSwitchesTheOutputOffIsRecordedAndTheSweepResumes(@TempDir Path dir) {
        Path file = JournalFixtures.journal(dir);
        Rig sim = JournalFixtures.cleanRig();
        FaultyRig faulty = new FaultyRig(sim, 7);
        SweepFaultException e;
        try (JournalWriter writer = JournalWriter.create(file, JournalFixtures.header(sim, false), JournalFixtures.CLOCK)) {
            e = assertThrows(SweepFaultException.class, () -> new SteppedSineRunner(faulty).run(JournalFixtures.PLAN,
                    SweepListener.NONE, () -> false, writer));
        }
        assertFalse(sim.exciter().isOutputEnabled(), "the output is off after the fault");
        sim.close();
        double f7 = JournalFixtures.PLAN.frequenciesHz()[7];
        assertEquals(String.format(java.util.Locale.ROOT, "sweep stopped by a fault at step 8 of 13 (%.2f Hz); the output"
                + " is off and the 7 completed step(s) are kept: %s", f7, FaultyRig.FAULT), e.getMessage());
        assertEquals(7, e.partial().points().size());
        JournalContents recorded = JournalReader.read(file);
        assertEquals(7, recorded.steps().size(), "the step in progress is discarded");
        assertEquals(Optional.of(SweepStatus.FAULT), recorded.lastStatus());
        assertEquals(FaultyRig.FAULT, recorded.sessions().get(0).reason());

        SweepRecord resumed = JournaledSweep.resume(DRIVERS, file, n -> { }, SweepListener.NONE, () -> false,
                JournalFixtures.CLOCK);
        assertSameSweep(uninterrupted(), resumed);
    }

    @Test
    void aJournalCutMidRecordIsTrimmedAndResumed(@TempDir Path dir) throws Exception {
        Path file = JournalFixtures.journal(dir);
        AtomicInteger steps = new AtomicInteger();
        JournaledSweep.run(DRIVERS, "sim", JournalFixtures.SIM_OPTIONS, JournalFixtures.PLAN, file, true,
                p -> steps.incrementAndGet(), () -> steps.get() >= 9, JournalFixtures.CLOCK);
        byte[] bytes = Files.readAllBytes(file);
        List<Integer> starts = JournalReadBackTest.lineStarts(bytes);
        int ninthStep = starts.get(9);
        Files.write(file, Arrays.copyOf(bytes, ninthStep + 100), java.nio.file.StandardOpenOption.TRUNCATE_EXISTING);
        List<String> notices = new ArrayList<>();
        SweepRecord resumed = JournaledSweep.resume(DRIVERS, file, notices::add, SweepListener.NONE, () -> false,
                JournalFixtures.CLOCK);
        assertTrue(notices.get(0).startsWith("journal " + file + ": read up to byte " + ninthStep + " of "
                + (ninthStep + 100) + "; the record starting there is incomplete"), notices.get(0));
        assertSameSweep(uninterrupted(), resumed);
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
        AtomicInteger steps = new AtomicInteger();
        JournaledSweep.run(DRIVERS, "sim", JournalFixtures.SIM_OPTIONS, JournalFixtures.PLAN, file, false,
                p -> steps.incrementAndGet(), () -> steps.get() >= 2, JournalFixtures.CLOCK);
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
                file, n -> { }, SweepListener.NONE, () -> false, JournalFixtures.CLOCK));
        assertEquals("journal " + file + " was recorded on 'Tautline simulated rig (model of specimen, shaker and sensors),"
                + " seed 1' but the rig now answers 'Tautline simulated rig (model of specimen, shaker and sensors), seed 2';"
                + " a sweep can only be resumed on the rig it started on", e.getMessage());
        assertEquals(2, JournalReader.read(file).steps().size(), "nothing was appended");
    }

    @Test
    void resumingAFinishedJournalRunsNothing(@TempDir Path dir) {
        Path file = JournalFixtures.journal(dir);
        SweepRecord run = JournaledSweep.run(DRIVERS, "sim", JournalFixtures.SIM_OPTIONS, JournalFixtures.PLAN, file, false,
                SweepListener.NONE, () -> false, JournalFixtures.CLOCK);
        List<String> notices = new ArrayList<>();
        SweepRecord again = JournaledSweep.resume(RigDrivers.of(List.of()), file, notices::add, SweepListener.NONE,
                () -> false, JournalFixtures.CLOCK);
        assertEquals(run.points(), again.points());
        assertEquals(List.of("journal " + file + " already holds all 13 steps; nothing to resume"), notices);
    }
}
