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
import org.tautline.driver.sweep.SafetyLimits;
import org.tautline.driver.sweep.SweepControl;
import org.tautline.driver.sweep.SweepEngine;
import org.tautline.driver.sweep.SweepEventListener;
import org.tautline.driver.sweep.SweepJournal;
import org.tautline.driver.sweep.SweepPlan;
import org.tautline.driver.sweep.SweepStatus;
import org.tautline.driver.sweep.SweepPoint;
import org.tautline.driver.sweep.SweepResult;

/** The replay driver plays a journal back: raw samples exactly, phasors as clean sines. */
class ReplayRigTest {
    private static final RigDrivers DRIVERS = RigDrivers.load(List.of());

    /** The noisy demo wire, so that exact replay of the raw samples includes the noise. */
    private static SweepResult record(Path file, boolean samples) {
        return JournaledSweep.run(DRIVERS, "sim", Map.of(), JournalFixtures.PLAN, file, samples, SweepEventListener.NONE,
                SweepControl.none(), JournalFixtures.CLOCK);
    }

    private static SweepResult replay(Path file, SweepPlan plan) {
        try (Rig rig = DRIVERS.find("replay").open(Map.of("journal", file.toString()))) {
            return new SweepEngine(rig).run(plan, SweepEventListener.NONE, SweepControl.none(), SweepJournal.NONE);
        }
    }

    /** The recorded plan with a drive limit the replay rig accepts (it drives no higher than was recorded). */
    private static SweepPlan replayPlan(double startHz, double settleCycles, double driveV) {
        return SweepPlan.uniform(startHz, 300, 13, settleCycles, 0.0, 20, driveV, 0.02, 3,
                new SafetyLimits(1.0, 10.0, 0.01, 0.01));
    }

    @Test
    void replayingKeptSamplesWithTheRecordedPlanGivesTheRecordedSweep(@TempDir Path dir) {
        Path file = dir.resolve("journal");
        SweepResult recorded = record(file, true);
        SweepResult replayed = replay(file, replayPlan(150, 400, 1.0));
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
        SweepResult recorded = record(file, false);
        // Half the drive: the replayed sines scale with it, so the FRF (response / force) is unchanged.
        SweepResult replayed = replay(file, replayPlan(150, 40, 0.5));
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
        SweepResult other = replay(file, replayPlan(100, 40, 1.0));
        assertEquals(SweepStatus.FAULT, other.status());
        assertEquals("replay rig: journal " + file + " has no step at 100.0 Hz; it holds 13 step(s) from 150.0 to"
                + " 300.0 Hz", other.reason());
        SweepPlan louder = SweepPlan.uniform(150, 300, 13, 40, 0.0, 20, 2.0, 0.02, 3, JournalFixtures.wideLimits());
        RigException loud = assertThrows(RigException.class, () -> replay(file, louder));
        assertEquals("sweep plan: the drive limit 5.0 V is above the exciter's limit of 1.0 V; lower limits.driveV",
                loud.getMessage());
    }

    @Test
    void needsItsJournalOption() {
        RigException e = assertThrows(RigException.class, () -> DRIVERS.find("replay").open(Map.of()));
        assertEquals("rig driver 'replay' needs option 'journal' (the journal file to play back); give it as"
                + " journal=VALUE", e.getMessage());
    }
}
