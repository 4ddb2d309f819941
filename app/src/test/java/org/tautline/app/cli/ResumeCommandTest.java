package org.tautline.app.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Clock;
import java.util.List;
import java.util.Map;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.tautline.analysis.frf.Frf;
import org.tautline.analysis.frf.FrfCsvReader;
import org.tautline.app.SafetyNotice;
import org.tautline.driver.journal.JournaledSweep;
import org.tautline.driver.spi.RigDrivers;
import org.tautline.driver.sweep.SafetyLimits;
import org.tautline.driver.sweep.SweepControl;
import org.tautline.driver.sweep.SweepPlan;
import org.tautline.driver.sweep.SweepResult;

/** {@code tautline resume RUNDIR} continues a cancelled sweep to the FRF an uninterrupted sweep writes. */
class ResumeCommandTest {

    @Test
    void resumesACancelledRunToTheUninterruptedFrf(@TempDir Path dir) throws Exception {
        Path whole = dir.resolve("whole");
        assertEquals(0, CliRun.of(SweepCommandTest.sweep(dir, whole)).exitCode());

        // The same sweep as the command runs (its plan, minimum settle 0.02 s, harmonic order 3 and default limits),
        // stopped after 4 steps.
        Path cut = dir.resolve("cut");
        Files.createDirectories(cut);
        SweepPlan plan = SweepPlan.uniform(150, 300, 9, 400, 0.02, 20, 1.0, 0.02, 3,
                new SafetyLimits(1.0, 2.0, Double.POSITIVE_INFINITY, 0.001));
        SweepControl control = new SweepControl();
        SweepResult partial = JournaledSweep.run(RigDrivers.load(List.of()), "sim", Map.of("scenario", "demo-wire-clean"),
                plan, cut.resolve("journal"), false, e -> {
                    if (e.completed() && e.stepNumber() == 4) {
                        control.requestStop("stopped by the test");
                    }
                }, control, Clock.systemUTC());
        assertEquals(4, partial.points().size());

        CliRun wrongOption = CliRun.of("resume", cut.toString(), "--port", "/dev/ttyUSB9", "--no-progress",
                "--plugins", dir.toString());
        assertEquals(1, wrongOption.exitCode());
        assertTrue(wrongOption.err().endsWith("tautline: the sim rig of journal " + cut.resolve("journal") + " has no"
                + " option 'port'; its options are scenario, seed, tensionN\n"), wrongOption.err());

        CliRun r = CliRun.of("resume", cut.toString(), "--no-progress", "--plugins", dir.toString());
        assertEquals(0, r.exitCode(), r.err());
        assertTrue(r.err().startsWith(SafetyNotice.asText(true)), r.err());
        assertTrue(r.err().contains("tautline: resuming " + cut.resolve("journal") + " after 4 completed step(s) on "),
                r.err());
        assertTrue(r.out().startsWith("sweep complete: 9 steps"), r.out());

        Frf expected = FrfCsvReader.read(whole.resolve("frf.csv")).frf();
        Frf resumed = FrfCsvReader.read(cut.resolve("frf.csv")).frf();
        assertEquals(expected.size(), resumed.size());
        for (int i = 0; i < expected.size(); i++) {
            assertEquals(expected.frequencyHz(i), resumed.frequencyHz(i), 0.0, "frequency of line " + i);
            // Resumed steps start from rest; after 400 settle cycles the leftover transient is below 2e-6
            // (the journal tests' reasoning), so the values agree far inside this tolerance.
            double rel = expected.value(i).subtract(resumed.value(i)).norm() / expected.value(i).norm();
            assertEquals(0.0, rel, 2e-5, "FRF line " + i);
        }
        CliRun again = CliRun.of("resume", cut.toString(), "--no-progress", "--plugins", dir.toString());
        assertEquals(1, again.exitCode());
        assertEquals("tautline: journal " + cut.resolve("journal") + " records a sweep that ran to its end (9 steps);"
                + " there is nothing to resume", again.err().strip());
    }

    @Test
    void aFolderWithoutAJournalIsRefused(@TempDir Path dir) {
        CliRun r = CliRun.of("resume", dir.toString());
        assertEquals(1, r.exitCode());
        assertEquals("tautline: " + dir + " holds no journal (" + dir.resolve("journal") + "); give the folder a"
                + " 'tautline sweep --out' made", r.err().strip());
    }
}
