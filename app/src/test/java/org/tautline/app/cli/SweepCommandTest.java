package org.tautline.app.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

import com.fasterxml.jackson.databind.JsonNode;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.tautline.analysis.frf.Frf;
import org.tautline.analysis.frf.FrfCsvReader;
import org.tautline.app.SafetyNotice;
import org.tautline.driver.journal.JournalContents;
import org.tautline.driver.journal.JournalReader;

/** {@code tautline sweep} on the simulated rig: cautions first, journal and FRF written, exact errors. */
class SweepCommandTest {
    /** A short sweep of the clean demo wire; the plugins folder is empty so only the built-in drivers exist. */
    static String[] sweep(Path plugins, Path run, String... extra) {
        List<String> args = new java.util.ArrayList<>(List.of("sweep", "--rig", "sim", "--option", "scenario=demo-wire-clean",
                "--from", "150", "--to", "300", "--steps", "9", "--settle-cycles", "400", "--cycles", "20", "--ramp", "0.02",
                "--no-progress", "--plugins", plugins.toString(), "--out", run.toString()));
        args.addAll(List.of(extra));
        return args.toArray(String[]::new);
    }

    @Test
    void runsASweepWritingTheJournalAndTheFrfAfterTheCautions(@TempDir Path dir) throws Exception {
        Path run = dir.resolve("run");
        CliRun r = CliRun.of(sweep(dir, run, "--json"));
        assertEquals(0, r.exitCode(), r.err());
        assertTrue(r.err().startsWith(SafetyNotice.asText(true)), "the cautions come first: " + r.err());
        JsonNode summary = ResultJson.MAPPER.readTree(r.out());
        assertTrue(summary.get("completed").asBoolean());
        assertEquals(9, summary.get("steps").asInt());
        assertEquals("sim", summary.get("driver").asText());
        JournalContents journal = JournalReader.read(run.resolve("journal"));
        assertEquals(9, journal.steps().size());
        assertEquals("demo-wire-clean", journal.header().options().get("scenario"));
        assertEquals("none", journal.header().options().get("seed"), "the default is recorded too");
        Frf frf = FrfCsvReader.read(run.resolve("frf.csv")).frf();
        assertEquals(9, frf.size());
        for (int i = 0; i < 9; i++) {
            assertEquals(journal.steps().get(i).point().response(), frf.value(i), "line " + i + " is the journaled step");
        }
    }

    @Test
    void anUnknownRigListsTheKnownDrivers(@TempDir Path dir) {
        CliRun r = CliRun.of("sweep", "--rig", "shaker9", "--from", "150", "--to", "300", "--steps", "9",
                "--plugins", dir.toString(), "--out", dir.resolve("run").toString());
        assertEquals(1, r.exitCode());
        assertEquals("tautline: no rig driver is named 'shaker9'; known drivers: replay, serial, sim", r.err().strip());
        assertFalse(Files.exists(dir.resolve("run")), "nothing was created");
    }

    @Test
    void badOptionsAreNamedWithWhatWasExpected(@TempDir Path dir) {
        CliRun bad = CliRun.of(sweep(dir, dir.resolve("a"), "--option", "seed=x"));
        assertEquals(1, bad.exitCode());
        assertTrue(bad.err().endsWith("tautline: rig driver 'sim': option 'seed' must be a whole number, got 'x'\n"),
                bad.err());
        CliRun unknown = CliRun.of(sweep(dir, dir.resolve("b"), "--option", "port=/dev/ttyS0"));
        assertTrue(unknown.err().endsWith("tautline: rig driver 'sim' has no option 'port'; its options are: scenario,"
                + " seed, tensionN\n"), unknown.err());
        CliRun malformed = CliRun.of(sweep(dir, dir.resolve("c"), "--option", "seed"));
        assertEquals("tautline: --option 'seed': expected KEY=VALUE, for example seed=7", malformed.err().strip());
        CliRun plan = CliRun.of("sweep", "--rig", "sim", "--from", "300", "--to", "150", "--steps", "9",
                "--plugins", dir.toString(), "--out", dir.resolve("d").toString());
        assertEquals("tautline: sweep plan: stopHz (150.0 Hz) must be above startHz (300.0 Hz)", plan.err().strip());
    }

    @Test
    void refusesToOverwriteARunFolderThatHoldsAJournal(@TempDir Path dir) {
        Path run = dir.resolve("run");
        assertEquals(0, CliRun.of(sweep(dir, run)).exitCode());
        CliRun again = CliRun.of(sweep(dir, run));
        assertEquals(1, again.exitCode());
        assertEquals("tautline: " + run + " already holds a journal; continue it with 'tautline resume " + run
                + "' or choose another --out", again.err().strip());
    }
}
