package org.tautline.app.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Optional;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.tautline.driver.journal.JournalContents;
import org.tautline.driver.journal.JournalReader;
import org.tautline.driver.sweep.RecordingRig;
import org.tautline.driver.sweep.SafetyLimits;
import org.tautline.driver.sweep.SweepStatus;

/**
 * Every command that excites a rig stops at a safety limit within one block, ramps the drive down and switches the
 * output off, and says so: {@code sweep} (uniform and from a plan file) and {@code resume}.
 *
 * <p>The rig is the simulated demo wire through a recording plugin ({@link RecordingSimDriver}), so the check is the
 * engine's contract seen from outside the command: the last block read is the first that reached the limit, then a
 * ramp to zero over the plan's ramp time, then the output off (common practice: never a step of the drive to zero).
 */
class SafetyLimitPathsTest {
    @TempDir
    Path dir;

    private static void assertStoppedAtTheLimit(CliRun run, String what, SafetyLimits limits, double rampS, Path runDir) {
        assertEquals(ExitCodes.SWEEP_LIMIT, run.exitCode(), run.err());
        assertTrue(run.out().startsWith("sweep stopped at a safety limit after "), run.out());
        assertTrue(run.out().contains("safety limit reached: " + what), run.out());
        RecordingRig rig = RecordingSimDriver.last();
        rig.assertTrippedOnTheLastBlock(what, limits);
        rig.assertRampedDownThenOff(rampS);
        JournalContents journal = JournalReader.read(runDir.resolve(SweepCommand.JOURNAL));
        assertEquals(Optional.of(SweepStatus.LIMIT), journal.lastStatus());
        assertTrue(journal.sessions().get(journal.sessions().size() - 1).reason().startsWith("safety limit reached: "
                + what), "the journal says why");
    }

    @Test
    void aUniformSweepStopsAtTheDisplacementLimit() throws Exception {
        Path plugins = RecordingSimDriver.pluginJar(dir.resolve("plugins"));
        Path run = dir.resolve("run");
        // The demo wire moves about 41 micrometres per volt at its fundamental (228 Hz): 30 micrometres trips there.
        CliRun r = CliRun.of("sweep", "--rig", RecordingSimDriver.NAME, "--from", "200", "--to", "260", "--steps", "30",
                "--settle-cycles", "40", "--cycles", "32", "--ramp", "0.05", "--max-displacement", "3e-5",
                "--no-progress", "--plugins", plugins.toString(), "--out", run.toString());
        assertStoppedAtTheLimit(r, "specimen displacement", new SafetyLimits(1.0, 2.0, Double.POSITIVE_INFINITY, 3e-5),
                0.05, run);
    }

    @Test
    void aPlanSweepStopsAtTheForceLimit() throws Exception {
        Path plugins = RecordingSimDriver.pluginJar(dir.resolve("plugins"));
        Path plan = dir.resolve("plan.json");
        Files.writeString(plan, """
                {"startHz": 200, "stopHz": 260, "levelMode": "drive", "levels": [1.0],
                 "frequencyRelStd": 1e-4, "dampingRelStd": 0.05,
                 "limits": {"driveV": 5, "forceN": 0.05, "responseAmplitude": 9e-4, "displacementM": 9e-4},
                 "timeBudgetS": 120, "coarseSteps": 9, "rampS": 0.1}
                """);
        Path run = dir.resolve("run");
        CliRun r = CliRun.of("sweep", "--rig", RecordingSimDriver.NAME, "--plan", plan.toString(), "--no-progress",
                "--plugins", plugins.toString(), "--out", run.toString());
        assertStoppedAtTheLimit(r, "force", new SafetyLimits(5, 0.05, 9e-4, 9e-4), 0.1, run);
    }

    @Test
    void aResumedSweepStopsAtTheLimitOfItsRecordedPlan() throws Exception {
        Path plugins = RecordingSimDriver.pluginJar(dir.resolve("plugins"));
        Path run = dir.resolve("run");
        CliRun first = CliRun.of("sweep", "--rig", RecordingSimDriver.NAME, "--from", "200", "--to", "260", "--steps",
                "30", "--settle-cycles", "40", "--cycles", "32", "--ramp", "0.05", "--max-displacement", "3e-5",
                "--no-progress", "--plugins", plugins.toString(), "--out", run.toString());
        assertEquals(ExitCodes.SWEEP_LIMIT, first.exitCode(), first.err());
        CliRun again = CliRun.of("resume", run.toString(), "--no-progress", "--plugins", plugins.toString());
        assertStoppedAtTheLimit(again, "specimen displacement",
                new SafetyLimits(1.0, 2.0, Double.POSITIVE_INFINITY, 3e-5), 0.05, run);
        assertTrue(again.out().contains("'tautline resume " + run + "' continues with the same plan and limits"),
                again.out());
    }
}
