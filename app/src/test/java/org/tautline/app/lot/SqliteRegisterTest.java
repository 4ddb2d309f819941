package org.tautline.app.lot;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.security.MessageDigest;
import java.sql.Connection;
import java.sql.DriverManager;
import java.sql.SQLException;
import java.util.Arrays;
import java.util.HexFormat;
import java.util.List;
import java.util.stream.Stream;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The SQLite register: the shared contract, and files that are no register, damaged or not there. */
class SqliteRegisterTest extends RegisterContract {
    @TempDir
    Path dir;
    private int count;

    @Override
    String freshLocation() {
        return dir.resolve("register-" + (count++) + ".sqlite").toString();
    }

    @Override
    Connection raw(String location) throws SQLException {
        return DriverManager.getConnection("jdbc:sqlite:" + location);
    }

    /** The SHA-256 of the file's bytes, and the folder's file names (a journal left behind would show). */
    @Override
    String state(String location) throws Exception {
        byte[] bytes = Files.isRegularFile(Path.of(location)) ? Files.readAllBytes(Path.of(location)) : new byte[0];
        try (Stream<Path> files = Files.list(dir)) {
            return HexFormat.of().formatHex(MessageDigest.getInstance("SHA-256").digest(bytes)) + " "
                    + files.map(p -> p.getFileName().toString()).sorted().toList();
        }
    }

    @Override
    String displayName(String location) {
        return "register file " + Path.of(location).toAbsolutePath();
    }

    @Override
    String version1Id() {
        return "INTEGER PRIMARY KEY AUTOINCREMENT";
    }

    /** Opening for queries and for appending are both refused with the message, and the file's bytes stay as they are. */
    private void refusedBoth(Path file, String expected) throws Exception {
        String before = state(file.toString());
        for (boolean append : new boolean[] {false, true}) {
            LotRegisterException e = assertThrows(LotRegisterException.class, () -> {
                if (append) {
                    LotRegister.openForAppending(file.toString()).close();
                } else {
                    LotRegister.openForQueries(file.toString()).close();
                }
            });
            assertEquals(expected, e.getMessage(), append ? "appending" : "queries");
            assertEquals(before, state(file.toString()), (append ? "appending" : "queries") + ": the file is unchanged");
        }
    }

    @Test
    void refusesAFileThatIsNotADatabase() throws Exception {
        Path file = dir.resolve("notes.sqlite");
        Files.write(file, "these are my lab notes, not a database\n".repeat(200).getBytes(StandardCharsets.UTF_8));
        refusedBoth(file, "register file " + file.toAbsolutePath() + " is not a lot register: it is not an SQLite database;"
                + " expected an SQLite database written by Tautline. It was left as it is");
    }

    @Test
    void refusesAnotherApplicationsDatabase() throws Exception {
        Path file = dir.resolve("inventory.sqlite");
        sql(file.toString(), "CREATE TABLE parts (id INTEGER, name TEXT)", "CREATE TABLE stock (part INTEGER, count INTEGER)",
                "INSERT INTO parts VALUES (1, 'clamp')");
        refusedBoth(file, "register file " + file.toAbsolutePath() + " is not a lot register: it holds the tables parts,"
                + " stock and none of schema_version, qualification, figure; expected a register written by Tautline. It was"
                + " left as it is");
    }

    @Test
    void refusesARegisterCutShort() throws Exception {
        Path whole = dir.resolve("whole.sqlite");
        try (LotRegister r = LotRegister.openForAppending(whole.toString())) {
            for (int i = 0; i < 60; i++) {
                r.append(run("L", "/runs/r" + i, HexFormat.of().toHexDigits((long) i).repeat(4), "W-" + i));
            }
        }
        byte[] bytes = Files.readAllBytes(whole);
        assertTrue(bytes.length >= 8 * 4096, "the register spans several pages: " + bytes.length + " bytes");
        for (int length : new int[] {100, 4096, bytes.length / 2, bytes.length - 4096}) {
            Path cut = dir.resolve("cut-" + length + ".sqlite");
            Files.write(cut, Arrays.copyOf(bytes, length));
            refusedBoth(cut, "register file " + cut.toAbsolutePath() + " is damaged or cut short (the database disk image is"
                    + " malformed); expected an intact SQLite database. It was left as it is");
        }
    }

    @Test
    void refusesASchemaVersionThatIsNotANumber() throws Exception {
        Path file = dir.resolve("odd.sqlite");
        try (LotRegister r = LotRegister.openForAppending(file.toString())) {
            r.name();
        }
        sql(file.toString(), "UPDATE schema_version SET version = 'two'");
        refusedBoth(file, "register file " + file.toAbsolutePath() + " has an unexpected schema: its schema version is"
                + " 'two'; expected a whole number from 1 to 2. It was left as it is");
    }

    @Test
    void refusesAFolder() throws Exception {
        Path folder = Files.createDirectory(dir.resolve("folder.sqlite"));
        refusedBoth(folder, "register file " + folder.toAbsolutePath() + " is a folder; expected an SQLite file holding a lot"
                + " register");
    }

    @Test
    void aQueryNeverCreatesAFileAndAnEmptyFileIsNoRegisterToQuery() throws Exception {
        Path absent = dir.resolve("absent.sqlite");
        LotRegisterException e = assertThrows(LotRegisterException.class, () -> LotRegister.openForQueries(absent.toString()));
        assertEquals("register file " + absent.toAbsolutePath() + " does not exist; expected an existing lot register",
                e.getMessage());
        assertTrue(!Files.exists(absent), "a query creates no file");
        Path empty = Files.createFile(dir.resolve("empty.sqlite"));
        e = assertThrows(LotRegisterException.class, () -> LotRegister.openForQueries(empty.toString()));
        assertEquals("register file " + empty.toAbsolutePath() + " is empty; expected a lot register (an SQLite database"
                + " written by Tautline). It was left as it is", e.getMessage());
        assertArrayEquals(new byte[0], Files.readAllBytes(empty));
        try (LotRegister r = LotRegister.openForAppending(empty.toString())) {
            r.append(run("L", "/runs/a", SHA_A, "W-1"));
        }
        try (LotRegister r = LotRegister.openForQueries(empty.toString())) {
            assertEquals(List.of("W-1"), r.entries("L").stream().map(LotEntry::specimenId).toList(),
                    "an empty file becomes a register when something is appended");
        }
    }
}
