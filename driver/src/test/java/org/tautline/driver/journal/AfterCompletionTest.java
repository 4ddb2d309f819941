package org.tautline.driver.journal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Optional;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.tautline.driver.spi.RigDrivers;
import org.tautline.driver.sweep.SweepControl;
import org.tautline.driver.sweep.SweepEventListener;
import org.tautline.driver.sweep.SweepResult;
import org.tautline.driver.sweep.SweepStatus;

/**
 * The work after a journaled sweep gets the rig the sweep ran on, still open and with the output off, once the journal
 * has recorded the end; only after a sweep that ran to its end.
 */
class AfterCompletionTest {
    private static final RigDrivers DRIVERS = RigDrivers.load(List.of());

    /** What the work after the sweep saw. */
    private static final class Seen implements JournaledSweep.AfterCompletion {
        final List<SweepResult> sweeps = new ArrayList<>();
        final List<Boolean> outputOn = new ArrayList<>();
        final List<Long> nextSample = new ArrayList<>();
        final List<Optional<SweepStatus>> journalEnd = new ArrayList<>();
        private final Path journal;

        Seen(Path journal) {
            this.journal = journal;
        }

        @Override
        public void completed(org.tautline.driver.spi.Rig rig, SweepResult sweep) {
            sweeps.add(sweep);
            outputOn.add(rig.exciter().isOutputEnabled());
            // The rig still answers: a closed simulated rig refuses to be read.
            nextSample.add(rig.acquisition().read(16).firstSampleIndex());
            journalEnd.add(JournalReader.read(journal).lastStatus());
        }
    }

    @Test
    void aCompletedSweepHandsTheOpenRigOverWithTheOutputOffAndTheEndJournaled(@TempDir Path dir) {
        Path file = JournalFixtures.journal(dir);
        Seen seen = new Seen(file);
        SweepResult result = JournaledSweep.run(DRIVERS, "sim", JournalFixtures.SIM_OPTIONS, JournalFixtures.PLAN, file,
                false, SweepEventListener.NONE, SweepControl.none(), JournalFixtures.CLOCK, seen);
        assertTrue(result.completed(), result.reason());
        assertEquals(1, seen.sweeps.size());
        assertSame(result, seen.sweeps.get(0));
        assertEquals(List.of(false), seen.outputOn, "the output is off when the work after the sweep starts");
        assertTrue(seen.nextSample.get(0) > 0, "the rig was still open and kept its clock");
        assertEquals(List.of(Optional.of(SweepStatus.COMPLETED)), seen.journalEnd, "the end is journaled first");
    }

    @Test
    void aStoppedSweepHandsNothingOverAndItsResumeDoesOnceComplete(@TempDir Path dir) {
        Path file = JournalFixtures.journal(dir);
        Seen seen = new Seen(file);
        SweepControl control = new SweepControl();
        SweepResult first = JournaledSweep.run(DRIVERS, "sim", JournalFixtures.SIM_OPTIONS, JournalFixtures.PLAN, file,
                false, SweepResumeTest.stopAfter(4, control), control, JournalFixtures.CLOCK, seen);
        assertFalse(first.completed());
        assertTrue(seen.sweeps.isEmpty(), "nothing is done after a sweep that ended early");

        SweepResult resumed = JournaledSweep.resume(DRIVERS, file, Map.of(), n -> { }, SweepEventListener.NONE,
                SweepControl.none(), JournalFixtures.CLOCK, seen);
        assertTrue(resumed.completed(), resumed.reason());
        assertEquals(1, seen.sweeps.size());
        assertEquals(13, seen.sweeps.get(0).steps().size(), "the whole sweep, recorded steps included");
        assertEquals(List.of(false), seen.outputOn);
        assertEquals(List.of(Optional.of(SweepStatus.COMPLETED)), seen.journalEnd);
    }
}
