package org.tautline.app.lot;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.sql.Connection;
import java.sql.DriverManager;
import java.sql.Statement;
import java.util.ArrayList;
import java.util.List;

import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.Assumptions;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;

/**
 * The register tests against a real PostgreSQL server named by {@code TAUTLINE_TEST_POSTGRES_URL}
 * ({@code .ci/run} starts one). Without the variable they are skipped, except with {@code CI=true}, where they fail.
 * Each test works in a schema of its own, dropped afterwards.
 */
class PostgresRegisterTest extends RegisterContract {
    private static final String URL = System.getenv("TAUTLINE_TEST_POSTGRES_URL");
    private final List<String> schemas = new ArrayList<>();

    @BeforeEach
    void needServer() {
        if (URL == null || URL.isBlank()) {
            assertTrue(!"true".equals(System.getenv("CI")), "CI=true but TAUTLINE_TEST_POSTGRES_URL is not set:"
                    + " .ci/run should have started PostgreSQL");
            Assumptions.abort("TAUTLINE_TEST_POSTGRES_URL is not set; PostgreSQL register tests skipped");
        }
    }

    @Override
    String freshLocation() throws Exception {
        String schema = "tautline_test_" + Long.toHexString(System.nanoTime()) + "_" + schemas.size();
        try (Connection c = DriverManager.getConnection(URL); Statement s = c.createStatement()) {
            s.executeUpdate("CREATE SCHEMA " + schema);
        }
        schemas.add(schema);
        return URL + (URL.contains("?") ? "&" : "?") + "currentSchema=" + schema;
    }

    @AfterEach
    void dropSchemas() throws Exception {
        if (URL == null || URL.isBlank()) {
            return;
        }
        try (Connection c = DriverManager.getConnection(URL); Statement s = c.createStatement()) {
            for (String schema : schemas) {
                s.executeUpdate("DROP SCHEMA " + schema + " CASCADE");
            }
        }
    }

    @Test
    void refusesANewerSchemaAndLeavesItAsItIs() throws Exception {
        String location = freshLocation();
        try (LotRegister r = LotRegister.open(location)) {
            r.append(new LotEntry("L", "W-1", java.time.Instant.now(), "PASS", "", List.of()));
        }
        try (Connection c = DriverManager.getConnection(location); Statement s = c.createStatement()) {
            s.executeUpdate("INSERT INTO schema_version (version) VALUES (3)");
        }
        LotRegisterException e = assertThrows(LotRegisterException.class, () -> LotRegister.open(location));
        assertTrue(e.getMessage().endsWith(" has schema version 3, written by a newer Tautline; this version reads up to"
                + " schema 1. The register was left as it is; use a newer Tautline or another register"), e.getMessage());
        try (Connection c = DriverManager.getConnection(location); Statement s = c.createStatement();
             var rs = s.executeQuery("SELECT COUNT(*) FROM qualification")) {
            rs.next();
            assertEquals(1, rs.getInt(1), "the register's rows are untouched");
        }
    }
}
