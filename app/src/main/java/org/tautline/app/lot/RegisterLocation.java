package org.tautline.app.lot;

import java.nio.file.Path;
import java.sql.Connection;
import java.sql.DriverManager;
import java.sql.SQLException;
import java.util.Optional;
import java.util.Properties;

import org.sqlite.SQLiteConfig;

/**
 * Where a register is: an SQLite file (a path, or a {@code jdbc:sqlite:} URL) or a database by JDBC URL
 * (PostgreSQL), with its name for messages (the file's absolute path, or the URL without its password).
 *
 * @param jdbcUrl the JDBC URL to connect to
 * @param name how messages name it: {@code register file /abs/path} or {@code register jdbc:...password=***}
 * @param file the SQLite file, empty for a server database or an SQLite URI the path cannot be read from
 * @param sqlite whether it is SQLite
 */
record RegisterLocation(String jdbcUrl, String name, Optional<Path> file, boolean sqlite) {
    private static final String SQLITE_PREFIX = "jdbc:sqlite:";

    /**
     * @param location a file path (SQLite) or a {@code jdbc:} URL
     * @return where it is
     */
    static RegisterLocation of(String location) {
        if (!location.startsWith("jdbc:")) {
            Path file = Path.of(location).toAbsolutePath();
            return new RegisterLocation(SQLITE_PREFIX + file, "register file " + file, Optional.of(file), true);
        }
        String name = "register " + location.replaceAll("(?i)password=[^&]*", "password=***");
        if (location.startsWith(SQLITE_PREFIX)) {
            String rest = location.substring(SQLITE_PREFIX.length());
            boolean plainPath = !rest.isEmpty() && !rest.startsWith("file:") && !rest.startsWith(":") && !rest.contains("?");
            return new RegisterLocation(location, name, plainPath ? Optional.of(Path.of(rest).toAbsolutePath())
                    : Optional.empty(), true);
        }
        return new RegisterLocation(location, name, Optional.empty(), false);
    }

    /**
     * Connects. A read-only SQLite connection opens the file read-only and never creates it; a read-only server
     * connection runs every transaction read-only.
     *
     * @param readOnly whether the connection may only read
     * @return the connection, in auto-commit mode for SQLite and in manual-commit mode for a server
     * @throws LotRegisterException when it cannot connect
     */
    Connection connect(boolean readOnly) {
        Properties properties = new Properties();
        if (sqlite) {
            SQLiteConfig config = new SQLiteConfig();
            config.setReadOnly(readOnly);
            config.setBusyTimeout(LotRegister.BUSY_TIMEOUT_MS);
            config.setTransactionMode(readOnly ? SQLiteConfig.TransactionMode.DEFERRED
                    : SQLiteConfig.TransactionMode.IMMEDIATE);
            properties = config.toProperties();
        }
        try {
            Connection connection = DriverManager.getConnection(jdbcUrl, properties);
            try {
                if (!sqlite) {
                    connection.setAutoCommit(false);
                    connection.setReadOnly(readOnly);
                }
            } catch (SQLException e) {
                connection.close();
                throw e;
            }
            return connection;
        } catch (SQLException e) {
            throw new LotRegisterException(name + ": cannot connect (" + e.getMessage() + ")", e);
        }
    }
}
