package org.tautline.driver.journal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.nio.file.Path;
import java.util.List;
import java.util.Map;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.tautline.driver.RigException;
import org.tautline.driver.spi.Rig;
import org.tautline.driver.spi.RigDrivers;
import org.tautline.driver.sweep.SteppedSinePlan;
import org.tautline.driver.sweep.SteppedSineRunner;
import org.tautline.driver.sweep.SweepListener;
import org.tautline.driver.sweep.SweepPoint;
import org.tautline.driver.sweep.SweepRecord;

/** The replay driver plays a journal back: raw samples exactly, phasors as clean sines. */
class ReplayRigTest {
    private static final RigDrivers DRIVERS = RigDrivers.load(List.of());

    /** The noisy demo wire, so that exact replay of the raw samples includes the noise. */
    private static SweepRecord record(Path file, boolean samples) {
        return JournaledSweep.run(DRIVERS, "sim", Map.of(), JournalFixtures.PLAN, file, samples, SweepListener.NONE,
                () -> false, JournalFixtures.CLOCK);
    }

    private static SweepRecord replay(Path file, SteppedSinePlan plan) {
        try (Rig rig = DRIVERS.find("replay").open(Map.of("journal", file.toString()))) {
            return new SteppedSineRunner(rig).run(plan, SweepListener.NONE, () -> false);
        }
    }

    @Test
    void replayingKeptSamplesWithTheRecordedPlanGivesTheRecordedSweep(@TempDir Path dir) {
        Path file = dir.resolve("journal");
        SweepRecord recorded = record(file, true);
        SweepRecord replayed = replay(file, JournalFixtures.PLAN);
        for (int i = 0; i < recorded.points().size(); i++) {
            SweepPoint r = recorded.points().get(i);
            SweepPoint p = replayed.points().get(i);
            assertEquals(r.response(), p.response(), "FRF of step " + i + ", noise included");
            assertEquals(r.relativeStdError(), p.relativeStdError(), 0.0, "std error of step " + i);
            assertEquals(r.forceDistortion(), p.forceDistortion(), 0.0, "distortion of step " + i);
            assertEquals(r.rigTimeS(), p.rigTimeS(), 1e-12, "rig time of step " + i);
        }
    }

    @Test
    void replayingPhasorsGivesTheRecordedFrfFromCleanSines(@TempDir Path dir) {
        Path file = dir.resolve("journal");
        SweepRecord recorded = record(file, false);
        // Half the drive: the replayed sines scale with it, so the FRF (response / force) is unchanged.
        SteppedSinePlan half = new SteppedSinePlan(150, 300, 13, 40, 0.0, 20, 0.5, 0.02, 3);
        SweepRecord replayed = replay(file, half);
        for (int i = 0; i < recorded.points().size(); i++) {
            SweepPoint r = recorded.points().get(i);
            SweepPoint p = replayed.points().get(i);
            // A three-parameter fit of an exact sine over whole samples returns it to rounding (IEEE Std 1057).
            assertEquals(0.0, r.response().subtract(p.response()).norm() / r.response().norm(), 1e-9, "FRF of step " + i);
            assertEquals(r.forceAmplitudeN() / 2, p.forceAmplitudeN(), 1e-9 * r.forceAmplitudeN(), "force of step " + i);
            assertEquals(0.0, p.forceDistortion(), 1e-9, "clean sines have no harmonics");
        }
    }

    @Test
    void refusesAFrequencyThatWasNotRecordedAndAHigherDrive(@TempDir Path dir) {
        Path file = dir.resolve("journal");
        record(file, false);
        SteppedSinePlan other = new SteppedSinePlan(100, 300, 13, 40, 0.0, 20, 1.0, 0.02, 3);
        RigException e = assertThrows(RigException.class, () -> replay(file, other));
        assertEquals("sweep stopped by a fault at step 1 of 13 (100.00 Hz); the output is off and the 0 completed step(s)"
                + " are kept: replay rig: journal " + file + " has no step at 100.0 Hz; it holds 13 step(s) from 150.0 to"
                + " 300.0 Hz", e.getMessage());
        SteppedSinePlan louder = new SteppedSinePlan(150, 300, 13, 40, 0.0, 20, 2.0, 0.02, 3);
        RigException loud = assertThrows(RigException.class, () -> replay(file, louder));
        assertEquals("sweep plan: drive amplitude 2.0 V is above the exciter's limit of 1.0 V", loud.getMessage());
    }

    @Test
    void needsItsJournalOption() {
        RigException e = assertThrows(RigException.class, () -> DRIVERS.find("replay").open(Map.of()));
        assertEquals("rig driver 'replay' needs option 'journal' (the journal file to play back); give it as"
                + " journal=VALUE", e.getMessage());
    }
}
