package org.tautline.app.lot;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.sql.Connection;
import java.sql.SQLException;
import java.sql.Statement;
import java.time.temporal.ChronoUnit;
import java.util.List;
import java.util.Optional;

/**
 * The lot register: every qualification appended to an SQL database, SQLite by default, PostgreSQL by JDBC URL.
 *
 * <p>A register is opened either for queries or for appending. For queries an SQLite file is opened read-only and a
 * server database runs read-only transactions: nothing is ever created or written. Either way the register is checked
 * first: a file that is not an SQLite database, a damaged or cut-short one, a database holding other tables but none
 * of the register's, a schema version this build does not know, several version rows, or a missing table or column is
 * refused with a message naming the register and what was expected, and its bytes are left as they are. For
 * appending, an existing file is checked read-only before it is opened for writing; an absent or empty file (or an
 * empty server schema) gets a new register of schema version {@value #SCHEMA_VERSION} (the README describes the
 * schema).
 *
 * <p>Each append is one transaction; SQLite waits up to {@value #BUSY_TIMEOUT_MS} ms for another process's lock, and
 * appends on a server are serialised by a transaction-scoped advisory lock; a busy append is retried a few times.
 * A version 1 register is brought to version 2 in the transaction of its first append. An entry from a run folder
 * (one with an FRF fingerprint) is refused when the lot already holds the same folder or the same FRF file.
 */
public final class LotRegister implements AutoCloseable {
    /** The schema this version writes; it reads this one and every earlier one. */
    public static final int SCHEMA_VERSION = RegisterSchema.VERSION;
    /** How long SQLite waits for a lock held by another process, ms. */
    public static final int BUSY_TIMEOUT_MS = 15_000;
    /** The default register file name, beside the runs. */
    public static final String DEFAULT_FILE_NAME = "tautline-lots.sqlite";
    private static final int ATTEMPTS = 5;
    private static final int SQLITE_CORRUPT = 11;
    private static final int SQLITE_NOTADB = 26;

    private final RegisterLocation where;
    private final Connection connection;
    private final boolean appending;
    private int version;

    private LotRegister(RegisterLocation where, Connection connection, boolean appending) {
        this.where = where;
        this.connection = connection;
        this.appending = appending;
    }

    /**
     * Opens an existing register to read it; nothing is created or written.
     *
     * @param location a file path (SQLite) or a {@code jdbc:} URL (PostgreSQL, or SQLite)
     * @return the open register
     * @throws LotRegisterException when it does not exist, cannot be opened or is not a register this build reads
     */
    public static LotRegister openForQueries(String location) {
        RegisterLocation where = RegisterLocation.of(location);
        if (where.file().isPresent()) {
            Path file = where.file().get();
            if (!Files.exists(file)) {
                throw new LotRegisterException(where.name() + " does not exist; expected an existing lot register", null);
            }
            requireFileNotFolder(where, file);
            if (size(where, file) == 0) {
                throw new LotRegisterException(where.name() + " is empty; expected a lot register (an SQLite database"
                        + " written by Tautline). It was left as it is", null);
            }
        }
        LotRegister register = new LotRegister(where, where.connect(true), false);
        try {
            register.version = register.reading("cannot read", () -> RegisterSchema.check(register.connection, where,
                    false, true));
        } catch (RuntimeException e) {
            register.closeAfter(e);
            throw e;
        }
        return register;
    }

    /**
     * Opens a register to append to (and read from): an existing one is checked read-only first; an absent or empty
     * file, or a server schema without the register's tables, gets a new register.
     *
     * @param location a file path (SQLite) or a {@code jdbc:} URL (PostgreSQL, or SQLite)
     * @return the open register
     * @throws LotRegisterException when it cannot be opened or is not a register this build can append to
     */
    public static LotRegister openForAppending(String location) {
        RegisterLocation where = RegisterLocation.of(location);
        if (where.file().isPresent()) {
            Path file = where.file().get();
            Path folder = file.getParent();
            if (folder != null && !Files.isDirectory(folder)) {
                throw new LotRegisterException(where.name() + ": its folder does not exist; expected an existing folder",
                        null);
            }
            requireFileNotFolder(where, file);
            if (Files.exists(file) && size(where, file) > 0) {
                openForQueriesOrEmpty(where).close();
            }
        }
        LotRegister register = new LotRegister(where, where.connect(false), true);
        try {
            if (!where.sqlite()) {
                register.connection.setReadOnly(true);
                register.reading("cannot read", () -> RegisterSchema.check(register.connection, where, true, true));
                register.connection.setReadOnly(false);
            }
            register.version = register.writing("cannot prepare the register", () -> {
                int found = RegisterSchema.check(register.connection, where, true, false);
                if (found == 0) {
                    RegisterSchema.create(register.connection, where.sqlite());
                    return SCHEMA_VERSION;
                }
                return found;
            });
        } catch (SQLException e) {
            register.closeAfter(e);
            throw new LotRegisterException(where.name() + ": cannot connect (" + e.getMessage() + ")", e);
        } catch (RuntimeException e) {
            register.closeAfter(e);
            throw e;
        }
        return register;
    }

    /**
     * Opens a register to append to: the same as {@link #openForAppending}.
     *
     * @param location a file path (SQLite) or a {@code jdbc:} URL
     * @return the open register
     */
    public static LotRegister open(String location) {
        return openForAppending(location);
    }

    /** Checks an existing SQLite file read-only, accepting a database without any table (to create a register in). */
    private static LotRegister openForQueriesOrEmpty(RegisterLocation where) {
        LotRegister probe = new LotRegister(where, where.connect(true), false);
        try {
            probe.version = probe.reading("cannot read", () -> RegisterSchema.check(probe.connection, where, true, true));
        } catch (RuntimeException e) {
            probe.closeAfter(e);
            throw e;
        }
        return probe;
    }

    private static void requireFileNotFolder(RegisterLocation where, Path file) {
        if (Files.isDirectory(file)) {
            throw new LotRegisterException(where.name() + " is a folder; expected an SQLite file holding a lot register",
                    null);
        }
    }

    private static long size(RegisterLocation where, Path file) {
        try {
            return Files.size(file);
        } catch (IOException e) {
            throw new LotRegisterException(where.name() + ": cannot read (" + e.getMessage() + ")", e);
        }
    }

    /** @return the register's name for messages (file path, or URL without password) */
    public String name() {
        return where.name();
    }

    /**
     * Appends one qualification in one transaction, retrying when the database is busy.
     *
     * @param entry the qualification
     * @throws LotRegisterException when it cannot be written, or when the entry comes from a run folder that is already
     *         in the lot (the same folder or the same FRF file); nothing is half-written
     * @throws IllegalStateException when the register was opened for queries
     */
    public void append(LotEntry entry) {
        if (!appending) {
            throw new IllegalStateException(name() + " was opened for queries; open it for appending to add to it");
        }
        version = writing("cannot append specimen " + entry.specimenId() + " to lot " + entry.lot(), () -> {
            int found = RegisterSchema.check(connection, where, false, false);
            if (found == 1) {
                RegisterSchema.upgradeFrom1(connection);
            }
            if (!entry.frfSha256().isEmpty()) {
                Optional<LotEntry> earlier = RegisterRows.sameRun(connection, SCHEMA_VERSION, entry.lot(),
                        entry.runDirectory(), entry.frfSha256());
                if (earlier.isPresent()) {
                    throw repeated(entry.lot(), entry.runDirectory(), entry.frfSha256(), earlier.get());
                }
            }
            RegisterRows.insert(connection, entry);
            return SCHEMA_VERSION;
        });
    }

    /**
     * Refuses a run folder that is already in a lot, before it is qualified: the same check {@link #append} makes.
     *
     * @param lot the lot
     * @param runDirectory the run folder's absolute path
     * @param frfSha256 the fingerprint of its {@code frf.csv}
     * @throws LotRegisterException naming the earlier entry when the lot holds the folder or its FRF file
     */
    public void refuseRepeatedRun(String lot, String runDirectory, String frfSha256) {
        Optional<LotEntry> earlier = reading("cannot read lot " + lot, () -> RegisterRows.sameRun(connection, version, lot,
                runDirectory, frfSha256));
        if (earlier.isPresent()) {
            throw repeated(lot, runDirectory, frfSha256, earlier.get());
        }
    }

    private LotRegisterException repeated(String lot, String runDirectory, String frfSha256, LotEntry earlier) {
        String when = "added " + earlier.recordedAt().truncatedTo(ChronoUnit.SECONDS) + " as specimen "
                + earlier.specimenId();
        String what = runDirectory.equals(earlier.runDirectory())
                ? "run folder " + runDirectory + " is already in lot " + lot + " (" + when + ")"
                : "run folder " + runDirectory + " holds the same frf.csv (SHA-256 " + frfSha256.substring(0, 16) + "...) as "
                        + (earlier.runDirectory().isEmpty() ? "an entry" : "run folder " + earlier.runDirectory())
                        + " already in lot " + lot + " (" + when + ")";
        return new LotRegisterException(name() + ": " + what + "; expected each run once in a lot. The register was left"
                + " as it is", null);
    }

    /**
     * Reads every qualification of a lot, in the order they were appended.
     *
     * @param lot the lot name
     * @return the entries, empty when the lot has none
     */
    public List<LotEntry> entries(String lot) {
        return reading("cannot read lot " + lot, () -> RegisterRows.entries(connection, version, lot));
    }

    /** Work on the database. */
    private interface SqlWork<T> {
        T run() throws SQLException;
    }

    /** Runs reads; on a server they end their (read-only, when opened for queries) transaction. */
    private <T> T reading(String failure, SqlWork<T> work) {
        try {
            T out = work.run();
            if (!connection.getAutoCommit()) {
                connection.commit();
            }
            return out;
        } catch (SQLException e) {
            rollbackQuietly();
            throw translated(failure, e);
        } catch (RuntimeException e) {
            rollbackQuietly();
            throw e;
        }
    }

    /** Runs one write transaction, retrying when the database is busy; a refusal is not retried. */
    private <T> T writing(String failure, SqlWork<T> work) {
        SQLException last = null;
        for (int attempt = 0; attempt < ATTEMPTS; attempt++) {
            try {
                if (where.sqlite()) {
                    connection.setAutoCommit(false);
                } else {
                    try (Statement s = connection.createStatement()) {
                        s.execute("SELECT pg_advisory_xact_lock(hashtext('tautline lot register ' || current_schema()))");
                    }
                }
                T out = work.run();
                connection.commit();
                return out;
            } catch (SQLException e) {
                rollbackQuietly();
                if (isDamage(e)) {
                    throw translated(failure, e);
                }
                last = e;
                pause(attempt);
            } catch (RuntimeException e) {
                rollbackQuietly();
                throw e;
            } finally {
                endSqliteTransaction();
            }
        }
        throw new LotRegisterException(name() + ": " + failure + " (" + last.getMessage() + ")", last);
    }

    private void endSqliteTransaction() {
        if (where.sqlite()) {
            try {
                connection.setAutoCommit(true);
            } catch (SQLException e) {
                throw new LotRegisterException(name() + ": cannot end the transaction (" + e.getMessage() + ")", e);
            }
        }
    }

    private boolean isDamage(SQLException e) {
        int code = e.getErrorCode() & 0xff;
        return where.sqlite() && (code == SQLITE_NOTADB || code == SQLITE_CORRUPT);
    }

    private LotRegisterException translated(String failure, SQLException e) {
        if (where.sqlite() && (e.getErrorCode() & 0xff) == SQLITE_NOTADB) {
            return new LotRegisterException(name() + " is not a lot register: it is not an SQLite database; expected an"
                    + " SQLite database written by Tautline. It was left as it is", e);
        }
        if (where.sqlite() && (e.getErrorCode() & 0xff) == SQLITE_CORRUPT) {
            return new LotRegisterException(name() + " is damaged or cut short (the database disk image is malformed);"
                    + " expected an intact SQLite database. It was left as it is", e);
        }
        return new LotRegisterException(name() + ": " + failure + " (" + e.getMessage() + ")", e);
    }

    private void rollbackQuietly() {
        try {
            if (!connection.getAutoCommit()) {
                connection.rollback();
            }
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

    private void closeAfter(Exception failure) {
        try {
            connection.close();
        } catch (SQLException e) {
            failure.addSuppressed(e);
        }
    }

    @Override
    public void close() {
        try {
            connection.close();
        } catch (SQLException e) {
            throw new LotRegisterException(name() + ": cannot close (" + e.getMessage() + ")", e);
        }
    }
}
