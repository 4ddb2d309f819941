package org.tautline.app.lot;

import java.nio.file.Files;
import java.nio.file.Path;
import java.sql.Connection;
import java.sql.DriverManager;
import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.sql.Statement;
import java.time.Instant;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Properties;

/**
 * The lot register: every qualification appended to an SQL database, SQLite by default, PostgreSQL by JDBC URL.
 *
 * <p>Schema version {@value #SCHEMA_VERSION}: {@code schema_version(version)}, {@code qualification(id, lot,
 * specimen, recorded_at, outcome, run_dir)}, {@code figure(qualification_id, figure_key, value_si,
 * standard_uncertainty, unit, lower_limit, upper_limit)}. A register of a newer schema, or a file that is not a
 * register, is refused with a message naming it and is never written. Each append is one transaction; SQLite
 * waits up to {@value #BUSY_TIMEOUT_MS} ms for another process's lock and appends are retried a few times.
 */
public final class LotRegister implements AutoCloseable {
    /** The schema this version writes and reads. */
    public static final int SCHEMA_VERSION = 1;
    /** How long SQLite waits for a lock held by another process, ms. */
    public static final int BUSY_TIMEOUT_MS = 15_000;
    /** The default register file name, beside the runs. */
    public static final String DEFAULT_FILE_NAME = "tautline-lots.sqlite";
    private static final int ATTEMPTS = 5;

    private final String name;
    private final Connection connection;
    private final boolean sqlite;

    private LotRegister(String name, Connection connection, boolean sqlite) {
        this.name = name;
        this.connection = connection;
        this.sqlite = sqlite;
    }

    /**
     * Opens a register, creating or migrating its schema.
     *
     * @param location a file path (SQLite) or a {@code jdbc:} URL (PostgreSQL, or SQLite)
     * @return the open register
     * @throws LotRegisterException when it cannot be opened, is not a register, or has a newer schema
     */
    public static LotRegister open(String location) {
        boolean url = location.startsWith("jdbc:");
        String jdbc = url ? location : "jdbc:sqlite:" + Path.of(location).toAbsolutePath();
        String name = url ? redact(location) : "register file " + Path.of(location).toAbsolutePath();
        boolean sqlite = jdbc.startsWith("jdbc:sqlite:");
        if (!url && Path.of(location).toAbsolutePath().getParent() != null
                && !Files.isDirectory(Path.of(location).toAbsolutePath().getParent())) {
            throw new LotRegisterException(name + ": its folder does not exist; expected an existing folder", null);
        }
        Properties properties = new Properties();
        if (sqlite) {
            properties.setProperty("busy_timeout", Integer.toString(BUSY_TIMEOUT_MS));
            properties.setProperty("transaction_mode", "IMMEDIATE");
        }
        Connection connection;
        try {
            connection = DriverManager.getConnection(jdbc, properties);
        } catch (SQLException e) {
            throw new LotRegisterException(name + ": cannot connect (" + e.getMessage() + ")", e);
        }
        LotRegister register = new LotRegister(name, connection, sqlite);
        try {
            register.prepareSchema();
        } catch (RuntimeException e) {
            register.close();
            throw e;
        }
        return register;
    }

    /** @return the register's name for messages (file path, or URL without password) */
    public String name() {
        return name;
    }

    private static String redact(String url) {
        return "register " + url.replaceAll("(?i)password=[^&]*", "password=***");
    }

    private void prepareSchema() {
        SQLException last = null;
        for (int attempt = 0; attempt < ATTEMPTS; attempt++) {
            try {
                connection.setAutoCommit(false);
                int version = readVersion();
                if (version > SCHEMA_VERSION) {
                    connection.rollback();
                    throw new LotRegisterException(name + " has schema version " + version
                            + ", written by a newer Tautline; this version reads up to schema " + SCHEMA_VERSION
                            + ". The register was left as it is; use a newer Tautline or another register", null);
                }
                if (version < 1) {
                    createVersion1();
                }
                connection.commit();
                return;
            } catch (SQLException e) {
                rollbackQuietly();
                if (isNotADatabase(e)) {
                    throw new LotRegisterException(name + " is not a lot register (" + e.getMessage()
                            + "); expected an SQLite database written by Tautline. The file was left as it is", e);
                }
                last = e;
                pause(attempt);
            }
        }
        throw new LotRegisterException(name + ": cannot prepare the schema (" + last.getMessage() + ")", last);
    }

    private static boolean isNotADatabase(SQLException e) {
        String message = String.valueOf(e.getMessage());
        return message.contains("SQLITE_NOTADB") || message.contains("SQLITE_CORRUPT");
    }

    private int readVersion() throws SQLException {
        boolean hasVersionTable = tableExists("schema_version");
        if (!hasVersionTable) {
            if (tableExists("qualification") || tableExists("figure")) {
                throw new LotRegisterException(name + " has lot tables but no schema_version table; expected a register"
                        + " written by Tautline. It was left as it is", null);
            }
            return 0;
        }
        try (Statement s = connection.createStatement(); ResultSet rs = s.executeQuery("SELECT MAX(version) FROM schema_version")) {
            return rs.next() ? rs.getInt(1) : 0;
        }
    }

    private boolean tableExists(String table) throws SQLException {
        String sql = sqlite ? "SELECT 1 FROM sqlite_master WHERE type = 'table' AND name = ?"
                : "SELECT 1 FROM information_schema.tables WHERE table_schema = current_schema() AND table_name = ?";
        try (PreparedStatement p = connection.prepareStatement(sql)) {
            p.setString(1, table);
            try (ResultSet rs = p.executeQuery()) {
                return rs.next();
            }
        }
    }

    private void createVersion1() throws SQLException {
        String id = sqlite ? "INTEGER PRIMARY KEY AUTOINCREMENT" : "BIGINT GENERATED BY DEFAULT AS IDENTITY PRIMARY KEY";
        try (Statement s = connection.createStatement()) {
            s.executeUpdate("CREATE TABLE IF NOT EXISTS schema_version (version INTEGER NOT NULL)");
            s.executeUpdate("CREATE TABLE IF NOT EXISTS qualification (id " + id + ", lot VARCHAR(200) NOT NULL,"
                    + " specimen VARCHAR(200) NOT NULL, recorded_at VARCHAR(40) NOT NULL, outcome VARCHAR(40) NOT NULL,"
                    + " run_dir VARCHAR(1000) NOT NULL)");
            s.executeUpdate("CREATE TABLE IF NOT EXISTS figure (qualification_id BIGINT NOT NULL REFERENCES qualification(id),"
                    + " position INTEGER NOT NULL, figure_key VARCHAR(200) NOT NULL, value_si DOUBLE PRECISION NOT NULL,"
                    + " standard_uncertainty DOUBLE PRECISION NOT NULL, unit VARCHAR(40) NOT NULL,"
                    + " lower_limit DOUBLE PRECISION, upper_limit DOUBLE PRECISION)");
            s.executeUpdate("CREATE INDEX IF NOT EXISTS qualification_lot ON qualification (lot)");
            s.executeUpdate("INSERT INTO schema_version (version) VALUES (1)");
        }
    }

    /**
     * Appends one qualification in one transaction, retrying when the database is busy.
     *
     * @param entry the qualification
     * @throws LotRegisterException when it cannot be written; nothing is half-written
     */
    public void append(LotEntry entry) {
        SQLException last = null;
        for (int attempt = 0; attempt < ATTEMPTS; attempt++) {
            try {
                insert(entry);
                connection.commit();
                return;
            } catch (SQLException e) {
                rollbackQuietly();
                last = e;
                pause(attempt);
            }
        }
        throw new LotRegisterException(name + ": cannot append specimen " + entry.specimenId() + " to lot " + entry.lot()
                + " (" + last.getMessage() + ")", last);
    }

    private void insert(LotEntry entry) throws SQLException {
        long id;
        try (PreparedStatement p = connection.prepareStatement("INSERT INTO qualification (lot, specimen, recorded_at,"
                + " outcome, run_dir) VALUES (?, ?, ?, ?, ?)", new String[] {"id"})) {
            p.setString(1, entry.lot());
            p.setString(2, entry.specimenId());
            p.setString(3, entry.recordedAt().toString());
            p.setString(4, entry.outcome());
            p.setString(5, entry.runDirectory());
            p.executeUpdate();
            try (ResultSet keys = p.getGeneratedKeys()) {
                if (!keys.next()) {
                    throw new SQLException("the database returned no id for the new qualification");
                }
                id = keys.getLong(1);
            }
        }
        try (PreparedStatement p = connection.prepareStatement("INSERT INTO figure (qualification_id, position, figure_key,"
                + " value_si, standard_uncertainty, unit, lower_limit, upper_limit) VALUES (?, ?, ?, ?, ?, ?, ?, ?)")) {
            int position = 0;
            for (LotFigure f : entry.figures()) {
                p.setLong(1, id);
                p.setInt(2, position++);
                p.setString(3, f.key());
                p.setDouble(4, f.value());
                p.setDouble(5, f.standardUncertainty());
                p.setString(6, f.unit());
                setBound(p, 7, f.lowerLimit());
                setBound(p, 8, f.upperLimit());
                p.addBatch();
            }
            p.executeBatch();
        }
    }

    private static void setBound(PreparedStatement p, int index, double bound) throws SQLException {
        if (Double.isNaN(bound)) {
            p.setNull(index, java.sql.Types.DOUBLE);
        } else {
            p.setDouble(index, bound);
        }
    }

    /**
     * Reads every qualification of a lot, in the order they were appended.
     *
     * @param lot the lot name
     * @return the entries, empty when the lot has none
     */
    public List<LotEntry> entries(String lot) {
        String sql = "SELECT q.id, q.specimen, q.recorded_at, q.outcome, q.run_dir, f.figure_key, f.value_si,"
                + " f.standard_uncertainty, f.unit, f.lower_limit, f.upper_limit FROM qualification q LEFT JOIN figure f"
                + " ON f.qualification_id = q.id WHERE q.lot = ? ORDER BY q.id, f.position";
        Map<Long, List<Object>> heads = new LinkedHashMap<>();
        Map<Long, List<LotFigure>> figures = new LinkedHashMap<>();
        try (PreparedStatement p = connection.prepareStatement(sql)) {
            p.setString(1, lot);
            try (ResultSet rs = p.executeQuery()) {
                while (rs.next()) {
                    long id = rs.getLong(1);
                    heads.computeIfAbsent(id, k -> row(rs));
                    List<LotFigure> list = figures.computeIfAbsent(id, k -> new ArrayList<>());
                    String key = rs.getString(6);
                    if (key != null) {
                        list.add(new LotFigure(key, rs.getDouble(7), rs.getDouble(8), rs.getString(9), bound(rs, 10),
                                bound(rs, 11)));
                    }
                }
            }
            connection.commit();
        } catch (SQLException e) {
            rollbackQuietly();
            throw new LotRegisterException(name + ": cannot read lot " + lot + " (" + e.getMessage() + ")", e);
        }
        List<LotEntry> out = new ArrayList<>();
        heads.forEach((id, h) -> out.add(new LotEntry(lot, (String) h.get(0), Instant.parse((String) h.get(1)),
                (String) h.get(2), (String) h.get(3), figures.get(id))));
        return out;
    }

    private static List<Object> row(ResultSet rs) {
        try {
            return List.of(rs.getString(2), rs.getString(3), rs.getString(4), rs.getString(5));
        } catch (SQLException e) {
            throw new LotRegisterException("cannot read a qualification row (" + e.getMessage() + ")", e);
        }
    }

    private static double bound(ResultSet rs, int column) throws SQLException {
        double v = rs.getDouble(column);
        return rs.wasNull() ? Double.NaN : v;
    }

    private void rollbackQuietly() {
        try {
            connection.rollback();
        } catch (SQLException ignored) {
            // the original error is reported
        }
    }

    private static void pause(int attempt) {
        try {
            Thread.sleep(50L << attempt);
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
        }
    }

    @Override
    public void close() {
        try {
            connection.close();
        } catch (SQLException e) {
            throw new LotRegisterException(name + ": cannot close (" + e.getMessage() + ")", e);
        }
    }
}
