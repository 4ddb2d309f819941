package org.tautline.app.cli;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.security.MessageDigest;
import java.sql.Connection;
import java.sql.DriverManager;
import java.sql.Statement;
import java.time.temporal.ChronoUnit;
import java.util.HexFormat;

import com.fasterxml.jackson.databind.JsonNode;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.tautline.app.lot.LotEntry;
import org.tautline.app.lot.LotRegister;

/** {@code tautline lot}: statistics from the register, a run folder added to a lot once, and registers it must refuse. */
class LotCommandTest {
    static DemoRunFixture demo;

    @BeforeAll
    static void runTheDemo() throws Exception {
        demo = DemoRunFixture.get();
    }

    private static String sha256(Path file) throws Exception {
        return HexFormat.of().formatHex(MessageDigest.getInstance("SHA-256").digest(Files.readAllBytes(file)));
    }

    @Test
    void aRunFolderIsAddedToALotOnceAndTheLotsStatisticsArePrinted(@TempDir Path out) throws Exception {
        Path register = Files.copy(demo.register(), out.resolve("lots.sqlite"));
        String runDir = demo.runDir().toAbsolutePath().normalize().toString();
        LotEntry demoEntry;
        try (LotRegister r = LotRegister.openForQueries(register.toString())) {
            demoEntry = r.entries("LOT-7").get(0);
        }
        String before = sha256(register);
        CliRun again = CliRun.of("lot", "LOT-7", "--register", register.toString(), "--add", runDir);
        assertEquals(1, again.exitCode(), again.err());
        assertEquals("tautline: register file " + register.toAbsolutePath() + ": run folder " + runDir + " is already in lot"
                + " LOT-7 (added " + demoEntry.recordedAt().truncatedTo(ChronoUnit.SECONDS) + " as specimen "
                + demoEntry.specimenId() + "); expected each run once in a lot. The register was left as it is\n",
                again.err().replace("\r", ""));
        assertEquals(before, sha256(register), "a refused add leaves the register's bytes as they were");

        CliRun add = CliRun.of("lot", "LOT-8", "--register", register.toString(), "--add", runDir, "--json");
        assertEquals(0, add.exitCode(), add.err());
        JsonNode tension = null;
        for (JsonNode f : ResultJson.MAPPER.readTree(add.out()).get("figures")) {
            tension = f.get("figure").asText().equals("tensionN") ? f : tension;
        }
        assertTrue(tension != null, add.out());
        assertEquals(1, tension.get("n").asInt(), "the run, added to a new lot");
        assertEquals(demo.recorded().get("properties").get("tensionN").asDouble(), tension.get("mean").asDouble(), 1e-9,
                "the same run qualified again gives the same tension");
        assertEquals(135.0, tension.get("lowerLimit").asDouble());
        assertEquals(165.0, tension.get("upperLimit").asDouble());

        Path copy = demo.copyInputs(out.resolve("copy"));
        String afterAdd = sha256(register);
        CliRun copied = CliRun.of("lot", "LOT-8", "--register", register.toString(), "--add", copy.toString());
        assertEquals(1, copied.exitCode(), copied.err());
        String err = copied.err().replace("\r", "");
        String frf = sha256(copy.resolve("frf.csv"));
        assertTrue(err.startsWith("tautline: register file " + register.toAbsolutePath() + ": run folder " + copy
                + " holds the same frf.csv (SHA-256 " + frf.substring(0, 16) + "...) as run folder " + runDir
                + " already in lot LOT-8 (added "), err);
        assertTrue(err.endsWith("); expected each run once in a lot. The register was left as it is\n"), err);
        assertEquals(afterAdd, sha256(register), "a copy of a run folder is refused and the register left as it is");

        CliRun text = CliRun.of("lot", "LOT-7", "--register", register.toString());
        assertEquals(0, text.exitCode(), text.err());
        assertTrue(text.out().contains("tension (N)"), text.out()); // the figure named for people, not by its key
    }

    @Test
    void queriesAndAddsRefuseAForeignDatabaseAndLeaveItsBytes(@TempDir Path out) throws Exception {
        Path foreign = out.resolve("inventory.sqlite");
        try (Connection c = DriverManager.getConnection("jdbc:sqlite:" + foreign); Statement s = c.createStatement()) {
            s.executeUpdate("CREATE TABLE parts (id INTEGER, name TEXT)");
        }
        String before = sha256(foreign);
        String expected = "tautline: register file " + foreign.toAbsolutePath() + " is not a lot register: it holds the"
                + " table parts and none of schema_version, qualification, figure; expected a register written by Tautline."
                + " It was left as it is\n";
        CliRun query = CliRun.of("lot", "L", "--register", foreign.toString());
        assertEquals(1, query.exitCode());
        assertEquals(expected, query.err().replace("\r", ""));
        CliRun add = CliRun.of("lot", "L", "--register", foreign.toString(), "--add", demo.runDir().toString());
        assertEquals(1, add.exitCode());
        assertEquals(expected, add.err().replace("\r", ""));
        CliRun report = CliRun.of("report", demo.runDir().toString(), "--pdf", out.resolve("r.pdf").toString(), "--lot", "L",
                "--register", foreign.toString());
        assertEquals(1, report.exitCode());
        assertEquals(expected, report.err().replace("\r", ""));
        assertFalse(Files.exists(out.resolve("r.pdf")), "no report");
        assertEquals(before, sha256(foreign), "the foreign database's bytes are unchanged");
    }

    @Test
    void aMissingRegisterIsRefusedAndNeverCreatedByAQuery(@TempDir Path out) throws Exception {
        Path missing = out.resolve("none.sqlite");
        CliRun run = CliRun.of("lot", "LOT-7", "--register", missing.toString());
        assertEquals(1, run.exitCode());
        assertEquals("tautline: register file " + missing.toAbsolutePath() + " does not exist; expected --register FILE|URL"
                + " naming a lot register, or --add RUNDIR to start one\n", run.err().replace("\r", ""));
        CliRun report = CliRun.of("report", demo.runDir().toString(), "--pdf", out.resolve("r.pdf").toString(), "--lot",
                "LOT-7", "--register", missing.toString());
        assertEquals(1, report.exitCode());
        assertEquals("tautline: register file " + missing.toAbsolutePath() + " does not exist; expected an existing lot"
                + " register\n", report.err().replace("\r", ""));
        assertFalse(Files.exists(missing), "a query creates no register");
        assertFalse(Files.exists(out.resolve("r.pdf")), "no report");
        Path empty = Files.write(out.resolve("empty.sqlite"), new byte[0]);
        CliRun emptyQuery = CliRun.of("lot", "LOT-7", "--register", empty.toString());
        assertEquals(1, emptyQuery.exitCode());
        assertEquals("tautline: register file " + empty.toAbsolutePath() + " is empty; expected a lot register (an SQLite"
                + " database written by Tautline). It was left as it is\n", emptyQuery.err().replace("\r", ""));
        assertArrayEquals(new byte[0], Files.readAllBytes(empty));
    }
}
