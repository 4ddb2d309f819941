package org.tautline.app.lot;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.File;
import java.nio.file.Files;
import java.nio.file.Path;
import java.sql.Connection;
import java.sql.SQLException;
import java.sql.Statement;
import java.time.Instant;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.concurrent.TimeUnit;

import org.junit.jupiter.api.Test;

/** Register tests shared by the SQLite and the PostgreSQL register. */
abstract class RegisterContract {
    static final Instant AT = Instant.parse("2026-11-30T10:15:30.123Z");
    static final String SHA_A = "a".repeat(64);
    static final String SHA_B = "b".repeat(64);

    /** @return a fresh, empty register location for one test */
    abstract String freshLocation() throws Exception;

    /** @return a plain connection to the database at a location, for setting up and inspecting it */
    abstract Connection raw(String location) throws SQLException;

    /** @return everything the register holds (its bytes, or its tables, columns and rows), to compare before and after */
    abstract String state(String location) throws Exception;

    /** @return how messages name the register at a location */
    abstract String displayName(String location);

    static LotEntry run(String lot, String folder, String sha, String specimen) {
        return new LotEntry(lot, specimen, AT, "PASS", folder, List.of(new LotFigure("tensionN", 150, 1.5, "N", 135, 165)),
                sha);
    }

    void sql(String location, String... statements) throws SQLException {
        try (Connection c = raw(location); Statement s = c.createStatement()) {
            for (String statement : statements) {
                s.executeUpdate(statement);
            }
        }
    }

    /** A register of schema version 1 with one qualification, as the first Tautline wrote it. */
    void writeVersion1(String location, String id) throws SQLException {
        sql(location, "CREATE TABLE schema_version (version INTEGER NOT NULL)",
                "CREATE TABLE qualification (id " + id + ", lot VARCHAR(200) NOT NULL, specimen VARCHAR(200) NOT NULL,"
                        + " recorded_at VARCHAR(40) NOT NULL, outcome VARCHAR(40) NOT NULL, run_dir VARCHAR(1000) NOT NULL)",
                "CREATE TABLE figure (qualification_id BIGINT NOT NULL REFERENCES qualification(id), position INTEGER NOT NULL,"
                        + " figure_key VARCHAR(200) NOT NULL, value_si DOUBLE PRECISION NOT NULL, standard_uncertainty DOUBLE"
                        + " PRECISION NOT NULL, unit VARCHAR(40) NOT NULL, lower_limit DOUBLE PRECISION, upper_limit DOUBLE"
                        + " PRECISION)",
                "INSERT INTO schema_version (version) VALUES (1)",
                "INSERT INTO qualification (lot, specimen, recorded_at, outcome, run_dir) VALUES ('L', 'W-OLD',"
                        + " '2025-01-02T03:04:05Z', 'PASS', '/runs/old')",
                "INSERT INTO figure (qualification_id, position, figure_key, value_si, standard_uncertainty, unit)"
                        + " SELECT id, 0, 'tensionN', 151.5, 1.5, 'N' FROM qualification");
    }

    /** The id column as the first version declared it. */
    abstract String version1Id();

    @Test
    void roundTripKeepsEveryField() throws Exception {
        String location = freshLocation();
        LotEntry entry = new LotEntry("LOT-A", "W-001", AT, "PASS", "/runs/w1",
                List.of(new LotFigure("tensionN", 146.514, 1.46522, "N", 135, 165),
                        new LotFigure("inharmonicityB", 1.02166e-4, 3.07e-5, "", Double.NaN, 1e-3)), SHA_A);
        try (LotRegister r = LotRegister.openForAppending(location)) {
            r.append(entry);
            r.append(new LotEntry("LOT-B", "W-900", AT, "FAIL", "", List.of()));
        }
        try (LotRegister r = LotRegister.openForQueries(location)) {
            List<LotEntry> back = r.entries("LOT-A");
            assertEquals(List.of(entry), back, "every field comes back (NaN bounds as NaN)");
            assertTrue(Double.isNaN(back.get(0).figures().get(1).lowerLimit()), "a missing bound comes back as NaN");
            assertEquals(List.of(), r.entries("LOT-B").get(0).figures());
            assertEquals("", r.entries("LOT-B").get(0).frfSha256());
            assertEquals(List.of(), r.entries("NO-SUCH-LOT"));
            assertThrows(IllegalStateException.class, () -> r.append(entry), "a register opened for queries never writes");
        }
    }

    @Test
    void queriesNeverWriteAndAnEmptyDatabaseIsNoRegisterToQuery() throws Exception {
        String location = freshLocation();
        LotRegisterException e = assertThrows(LotRegisterException.class, () -> LotRegister.openForQueries(location));
        assertTrue(e.getMessage().startsWith(displayName(location)), e.getMessage());
        try (LotRegister r = LotRegister.openForAppending(location)) {
            r.append(run("L", "/runs/a", SHA_A, "W-1"));
        }
        String before = state(location);
        try (LotRegister r = LotRegister.openForQueries(location)) {
            assertEquals(1, r.entries("L").size());
            r.refuseRepeatedRun("L", "/runs/other", SHA_B);
        }
        assertEquals(before, state(location), "a query leaves the register as it was");
    }

    @Test
    void aRunFolderIsAddedToALotOnce() throws Exception {
        String location = freshLocation();
        String name = displayName(location);
        try (LotRegister r = LotRegister.openForAppending(location)) {
            r.append(run("L", "/runs/a", SHA_A, "W-1"));
            String before = state(location);
            LotRegisterException samePath = assertThrows(LotRegisterException.class,
                    () -> r.append(run("L", "/runs/a", SHA_B, "W-1")));
            assertEquals(name + ": run folder /runs/a is already in lot L (added 2026-11-30T10:15:30Z as specimen W-1);"
                    + " expected each run once in a lot. The register was left as it is", samePath.getMessage());
            LotRegisterException sameFrf = assertThrows(LotRegisterException.class,
                    () -> r.append(run("L", "/copies/a", SHA_A, "W-1")));
            assertEquals(name + ": run folder /copies/a holds the same frf.csv (SHA-256 aaaaaaaaaaaaaaaa...) as run folder"
                    + " /runs/a already in lot L (added 2026-11-30T10:15:30Z as specimen W-1); expected each run once in"
                    + " a lot. The register was left as it is", sameFrf.getMessage());
            assertEquals(before, state(location), "a refused run leaves the register as it was");
            r.append(run("M", "/runs/a", SHA_A, "W-1"));
            r.append(run("L", "/runs/b", SHA_B, "W-2"));
            r.append(run("L", "workbench", "", "W-3"));
            r.append(run("L", "workbench", "", "W-3"));
            assertEquals(4, r.entries("L").size(), "entries without a run folder fingerprint are not matched");
        }
        try (LotRegister r = LotRegister.openForQueries(location)) {
            LotRegisterException e = assertThrows(LotRegisterException.class,
                    () -> r.refuseRepeatedRun("M", "/elsewhere", SHA_A));
            assertTrue(e.getMessage().contains("holds the same frf.csv"), e.getMessage());
        }
    }

    @Test
    void aVersion1RegisterIsReadAsItIsAndBroughtToVersion2ByAnAppend() throws Exception {
        String location = freshLocation();
        writeVersion1(location, version1Id());
        String before = state(location);
        try (LotRegister r = LotRegister.openForQueries(location)) {
            LotEntry old = r.entries("L").get(0);
            assertEquals("/runs/old", old.runDirectory());
            assertEquals("", old.frfSha256());
            assertEquals(151.5, old.figures().get(0).value());
        }
        assertEquals(before, state(location), "reading a version 1 register does not bring it to version 2");
        try (LotRegister r = LotRegister.openForAppending(location)) {
            assertEquals(before, state(location), "opening to append changes nothing until the append");
            assertThrows(LotRegisterException.class, () -> r.append(run("L", "/runs/old", SHA_A, "W-OLD")),
                    "the version 1 entry's folder is matched by its path");
            assertEquals(before, state(location));
            r.append(run("L", "/runs/new", SHA_A, "W-NEW"));
        }
        try (Connection c = raw(location); Statement s = c.createStatement();
             var rs = s.executeQuery("SELECT version FROM schema_version")) {
            assertTrue(rs.next());
            assertEquals(2, rs.getInt(1));
            assertTrue(!rs.next(), "one version row");
        }
        try (LotRegister r = LotRegister.openForQueries(location)) {
            List<LotEntry> all = r.entries("L");
            assertEquals(List.of("W-OLD", "W-NEW"), all.stream().map(LotEntry::specimenId).toList());
            assertEquals(SHA_A, all.get(1).frfSha256());
        }
    }

    /** Each case: SQL that spoils a fresh register, and the end of the message that refuses it. */
    static final Map<String, List<String>> SPOILED = Map.of(
            "UPDATE schema_version SET version = 7", List.of(" has schema version 7, written by a newer Tautline; this version"
                    + " reads up to schema 2. The register was left as it is; use a newer Tautline or another register"),
            "UPDATE schema_version SET version = 0", List.of(" has an unexpected schema: schema version 0; expected a version"
                    + " from 1 to 2. It was left as it is"),
            "INSERT INTO schema_version (version) VALUES (1)", List.of(" has an unexpected schema: its schema_version table"
                    + " holds 2 rows (2, 1); expected one row naming the schema version. It was left as it is"),
            "DELETE FROM schema_version", List.of(" has an unexpected schema: its schema_version table holds no row; expected"
                    + " one row naming the schema version. It was left as it is"),
            "DROP TABLE figure", List.of(" has an unexpected schema: there is no table figure; expected the tables"
                    + " schema_version, qualification, figure of schema version 2. It was left as it is"),
            "ALTER TABLE qualification DROP COLUMN run_dir", List.of(" has an unexpected schema: table qualification has no"
                    + " column run_dir; expected the columns id, lot, specimen, recorded_at, outcome, run_dir, frf_sha256 of"
                    + " schema version 2. It was left as it is"),
            "DROP TABLE schema_version", List.of(" has lot tables but no schema_version table; expected a register written by"
                    + " Tautline. It was left as it is"));

    @Test
    void refusesAnUnexpectedSchemaForQueriesAndAppendsAndLeavesItAsItIs() throws Exception {
        for (Map.Entry<String, List<String>> c : SPOILED.entrySet()) {
            String location = freshLocation();
            try (LotRegister r = LotRegister.openForAppending(location)) {
                r.append(run("L", "/runs/a", SHA_A, "W-1"));
            }
            sql(location, c.getKey());
            String before = state(location);
            String expected = displayName(location) + c.getValue().get(0);
            LotRegisterException query = assertThrows(LotRegisterException.class, () -> LotRegister.openForQueries(location),
                    c.getKey());
            assertEquals(expected, query.getMessage(), c.getKey());
            assertEquals(before, state(location), c.getKey() + ": a refused query");
            LotRegisterException append = assertThrows(LotRegisterException.class,
                    () -> LotRegister.openForAppending(location), c.getKey());
            assertEquals(expected, append.getMessage(), c.getKey());
            assertEquals(before, state(location), c.getKey() + ": a refused append");
        }
    }

    @Test
    void twoProcessesAppendingAtOnceLoseNothingAndAddEachRunOnce() throws Exception {
        String location = freshLocation();
        try (LotRegister r = LotRegister.openForAppending(location)) {
            assertEquals(List.of(), r.entries("SHARED"));
        }
        int each = 40;
        int runs = 15;
        String java = Path.of(System.getProperty("java.home"), "bin", "java").toString();
        Path barrier = Files.createTempDirectory("tautline-appenders");
        List<Process> processes = new ArrayList<>();
        for (String name : List.of("first", "second")) {
            processes.add(new ProcessBuilder(java, "-cp", System.getProperty("java.class.path"),
                    RegisterAppender.class.getName(), location, "SHARED", Integer.toString(each), name, Integer.toString(runs),
                    barrier.toString(), "2")
                    .redirectErrorStream(true).redirectOutput(new File(System.getProperty("java.io.tmpdir"),
                            "tautline-appender-" + name + ".log")).start());
        }
        for (Process p : processes) {
            assertTrue(p.waitFor(120, TimeUnit.SECONDS), "an appender did not finish in 120 s");
            assertEquals(0, p.exitValue(), "an appender failed; see tautline-appender-*.log in the temp folder");
        }
        try (var ready = Files.list(barrier)) {
            for (Path p : ready.toList()) {
                Files.delete(p);
            }
        }
        Files.delete(barrier);
        try (LotRegister r = LotRegister.openForQueries(location)) {
            List<LotEntry> all = r.entries("SHARED");
            assertEquals(2 * each, all.size());
            Set<String> ids = new HashSet<>();
            all.forEach(e -> {
                ids.add(e.specimenId());
                assertEquals(2, e.figures().size(), "every entry keeps both figures");
            });
            assertEquals(2 * each, ids.size(), "every appended specimen is there once");
            FigureStatistics tension = LotStatistics.of(all).get(0);
            assertEquals(2 * each, tension.n());
            assertEquals(150 + (each - 1) / 2.0, tension.mean(), 1e-9);
            assertEquals(runs, r.entries("RUNS").size(), "both processes added the same run folders; each is there once");
        }
    }
}
