package org.tautline.app.lot;

import java.sql.Connection;
import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.sql.Statement;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.TreeSet;

/**
 * The register's schema: checking that a database is a register of a version this build knows, creating one, and
 * bringing version 1 to version 2. Checks only read; every refusal names the register and what was expected.
 *
 * <p>Version 1: {@code schema_version(version)}, {@code qualification(id, lot, specimen, recorded_at, outcome,
 * run_dir)}, {@code figure(qualification_id, position, figure_key, value_si, standard_uncertainty, unit, lower_limit,
 * upper_limit)}. Version 2 adds {@code qualification.frf_sha256}, the fingerprint of a run folder's FRF file.
 */
final class RegisterSchema {
    /** The version this build writes. */
    static final int VERSION = 2;
    private static final List<String> TABLES = List.of("schema_version", "qualification", "figure");
    private static final List<String> QUALIFICATION_V1 = List.of("id", "lot", "specimen", "recorded_at", "outcome",
            "run_dir");
    private static final List<String> FIGURE = List.of("qualification_id", "position", "figure_key", "value_si",
            "standard_uncertainty", "unit", "lower_limit", "upper_limit");
    private static final String LEFT = ". It was left as it is";

    private RegisterSchema() {
    }

    /**
     * Checks a database.
     *
     * @param c the connection
     * @param where the register
     * @param emptyAllowed whether a database without any table of the register is accepted (to create one in)
     * @param integrity whether to check an SQLite file's pages too
     * @return the schema version, 1 or 2; 0 for an empty database when {@code emptyAllowed}
     * @throws LotRegisterException when it is not a register this build can use
     */
    static int check(Connection c, RegisterLocation where, boolean emptyAllowed, boolean integrity) throws SQLException {
        String name = where.name();
        TreeSet<String> tables = tables(c, where.sqlite());
        if (integrity && where.sqlite()) {
            checkPages(c, name);
        }
        if (TABLES.stream().noneMatch(tables::contains)) {
            if (where.sqlite() && !tables.isEmpty()) {
                throw new LotRegisterException(name + " is not a lot register: it holds the table" + (tables.size() == 1
                        ? " " : "s ") + String.join(", ", tables) + " and none of " + String.join(", ", TABLES)
                        + "; expected a register written by Tautline" + LEFT, null);
            }
            if (!emptyAllowed) {
                throw new LotRegisterException(name + " holds no lot register: it has none of the tables "
                        + String.join(", ", TABLES) + "; expected a register that qualifications were added to" + LEFT, null);
            }
            return 0;
        }
        if (!tables.contains("schema_version")) {
            throw new LotRegisterException(name + " has lot tables but no schema_version table; expected a register"
                    + " written by Tautline" + LEFT, null);
        }
        int version = version(c, name);
        Map<String, List<String>> expected = Map.of("qualification", qualificationColumns(version), "figure", FIGURE);
        for (String table : List.of("qualification", "figure")) {
            if (!tables.contains(table)) {
                throw new LotRegisterException(name + " has an unexpected schema: there is no table " + table
                        + "; expected the tables " + String.join(", ", TABLES) + " of schema version " + version + LEFT, null);
            }
            List<String> missing = new ArrayList<>(expected.get(table));
            missing.removeAll(columns(c, where.sqlite(), table));
            if (!missing.isEmpty()) {
                throw new LotRegisterException(name + " has an unexpected schema: table " + table + " has no column"
                        + (missing.size() == 1 ? " " : "s ") + String.join(", ", missing) + "; expected the columns "
                        + String.join(", ", expected.get(table)) + " of schema version " + version + LEFT, null);
            }
        }
        return version;
    }

    private static List<String> qualificationColumns(int version) {
        List<String> columns = new ArrayList<>(QUALIFICATION_V1);
        if (version >= 2) {
            columns.add("frf_sha256");
        }
        return columns;
    }

    private static int version(Connection c, String name) throws SQLException {
        List<String> rows = new ArrayList<>();
        try (Statement s = c.createStatement(); ResultSet rs = s.executeQuery("SELECT version FROM schema_version")) {
            while (rs.next()) {
                rows.add(String.valueOf(rs.getString(1)));
            }
        }
        String expected = "; expected one row naming the schema version";
        if (rows.size() != 1) {
            throw new LotRegisterException(name + " has an unexpected schema: its schema_version table holds "
                    + (rows.isEmpty() ? "no row" : rows.size() + " rows (" + String.join(", ", rows) + ")") + expected + LEFT,
                    null);
        }
        int version;
        try {
            version = Integer.parseInt(rows.get(0).strip());
        } catch (NumberFormatException e) {
            throw new LotRegisterException(name + " has an unexpected schema: its schema version is '" + rows.get(0)
                    + "'; expected a whole number from 1 to " + VERSION + LEFT, e);
        }
        if (version > VERSION) {
            throw new LotRegisterException(name + " has schema version " + version + ", written by a newer Tautline; this"
                    + " version reads up to schema " + VERSION + ". The register was left as it is; use a newer Tautline or"
                    + " another register", null);
        }
        if (version < 1) {
            throw new LotRegisterException(name + " has an unexpected schema: schema version " + version
                    + "; expected a version from 1 to " + VERSION + LEFT, null);
        }
        return version;
    }

    private static void checkPages(Connection c, String name) throws SQLException {
        List<String> problems = new ArrayList<>();
        try (Statement s = c.createStatement(); ResultSet rs = s.executeQuery("PRAGMA quick_check")) {
            while (rs.next()) {
                problems.add(rs.getString(1));
            }
        }
        if (!problems.equals(List.of("ok"))) {
            throw new LotRegisterException(name + " is damaged or cut short (" + String.join("; ", problems.subList(0,
                    Math.min(3, problems.size()))) + "); expected an intact SQLite database" + LEFT, null);
        }
    }

    private static TreeSet<String> tables(Connection c, boolean sqlite) throws SQLException {
        String sql = sqlite ? "SELECT name FROM sqlite_master WHERE type = 'table' AND name NOT LIKE 'sqlite\\_%' ESCAPE '\\'"
                : "SELECT table_name FROM information_schema.tables WHERE table_schema = current_schema()";
        TreeSet<String> out = new TreeSet<>();
        try (Statement s = c.createStatement(); ResultSet rs = s.executeQuery(sql)) {
            while (rs.next()) {
                out.add(rs.getString(1).toLowerCase(Locale.ROOT));
            }
        }
        return out;
    }

    private static List<String> columns(Connection c, boolean sqlite, String table) throws SQLException {
        List<String> out = new ArrayList<>();
        if (sqlite) {
            try (Statement s = c.createStatement(); ResultSet rs = s.executeQuery("PRAGMA table_info(" + table + ")")) {
                while (rs.next()) {
                    out.add(rs.getString("name").toLowerCase(Locale.ROOT));
                }
            }
            return out;
        }
        try (PreparedStatement p = c.prepareStatement("SELECT column_name FROM information_schema.columns"
                + " WHERE table_schema = current_schema() AND table_name = ?")) {
            p.setString(1, table);
            try (ResultSet rs = p.executeQuery()) {
                while (rs.next()) {
                    out.add(rs.getString(1).toLowerCase(Locale.ROOT));
                }
            }
        }
        return out;
    }

    /** Creates the tables of the current version in an empty database, inside the caller's transaction. */
    static void create(Connection c, boolean sqlite) throws SQLException {
        String id = sqlite ? "INTEGER PRIMARY KEY AUTOINCREMENT" : "BIGINT GENERATED BY DEFAULT AS IDENTITY PRIMARY KEY";
        try (Statement s = c.createStatement()) {
            s.executeUpdate("CREATE TABLE schema_version (version INTEGER NOT NULL)");
            s.executeUpdate("CREATE TABLE qualification (id " + id + ", lot VARCHAR(200) NOT NULL,"
                    + " specimen VARCHAR(200) NOT NULL, recorded_at VARCHAR(40) NOT NULL, outcome VARCHAR(40) NOT NULL,"
                    + " run_dir VARCHAR(1000) NOT NULL, frf_sha256 VARCHAR(64))");
            s.executeUpdate("CREATE TABLE figure (qualification_id BIGINT NOT NULL REFERENCES qualification(id),"
                    + " position INTEGER NOT NULL, figure_key VARCHAR(200) NOT NULL, value_si DOUBLE PRECISION NOT NULL,"
                    + " standard_uncertainty DOUBLE PRECISION NOT NULL, unit VARCHAR(40) NOT NULL,"
                    + " lower_limit DOUBLE PRECISION, upper_limit DOUBLE PRECISION)");
            s.executeUpdate("CREATE INDEX qualification_lot ON qualification (lot)");
            s.executeUpdate("INSERT INTO schema_version (version) VALUES (" + VERSION + ")");
        }
    }

    /** Brings a version 1 register to version 2, inside the caller's transaction. */
    static void upgradeFrom1(Connection c) throws SQLException {
        try (Statement s = c.createStatement()) {
            s.executeUpdate("ALTER TABLE qualification ADD COLUMN frf_sha256 VARCHAR(64)");
            s.executeUpdate("UPDATE schema_version SET version = 2");
        }
    }
}
