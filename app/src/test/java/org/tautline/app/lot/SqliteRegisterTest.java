package org.tautline.app.lot;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.sql.Connection;
import java.sql.DriverManager;
import java.sql.Statement;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class SqliteRegisterTest extends RegisterContract {
    @TempDir
    Path dir;
    private int count;

    @Override
    String freshLocation() {
        return dir.resolve("register-" + (count++) + ".sqlite").toString();
    }

    @Test
    void refusesAFileThatIsNotADatabaseAndLeavesItAsItIs() throws Exception {
        Path file = dir.resolve("notes.sqlite");
        byte[] content = "these are my lab notes, not a database\n".repeat(200).getBytes(StandardCharsets.UTF_8);
        Files.write(file, content);
        LotRegisterException e = assertThrows(LotRegisterException.class, () -> LotRegister.open(file.toString()));
        assertEquals(true, e.getMessage().startsWith("register file " + file.toAbsolutePath() + " is not a lot register ("),
                e.getMessage());
        assertEquals(true, e.getMessage().endsWith("expected an SQLite database written by Tautline. The file was left as it is"),
                e.getMessage());
        assertArrayEquals(content, Files.readAllBytes(file), "the file is never overwritten");
    }

    @Test
    void refusesANewerSchemaAndLeavesTheFileAsItIs() throws Exception {
        Path file = dir.resolve("newer.sqlite");
        try (LotRegister r = LotRegister.open(file.toString())) {
            r.name();
        }
        try (Connection c = DriverManager.getConnection("jdbc:sqlite:" + file); Statement s = c.createStatement()) {
            s.executeUpdate("INSERT INTO schema_version (version) VALUES (7)");
        }
        byte[] before = Files.readAllBytes(file);
        LotRegisterException e = assertThrows(LotRegisterException.class, () -> LotRegister.open(file.toString()));
        assertEquals("register file " + file.toAbsolutePath() + " has schema version 7, written by a newer Tautline; this"
                + " version reads up to schema 1. The register was left as it is; use a newer Tautline or another register",
                e.getMessage());
        assertArrayEquals(before, Files.readAllBytes(file));
    }

    @Test
    void refusesADatabaseWithLotTablesButNoVersion() throws Exception {
        Path file = dir.resolve("foreign.sqlite");
        try (Connection c = DriverManager.getConnection("jdbc:sqlite:" + file); Statement s = c.createStatement()) {
            s.executeUpdate("CREATE TABLE qualification (x TEXT)");
        }
        LotRegisterException e = assertThrows(LotRegisterException.class, () -> LotRegister.open(file.toString()));
        assertEquals("register file " + file.toAbsolutePath() + " has lot tables but no schema_version table; expected a"
                + " register written by Tautline. It was left as it is", e.getMessage());
    }
}
