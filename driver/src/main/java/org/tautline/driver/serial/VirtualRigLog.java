package org.tautline.driver.serial;

import java.io.BufferedWriter;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import java.util.ArrayDeque;
import java.util.ArrayList;
import java.util.List;
import java.util.OptionalLong;

import org.tautline.driver.RigException;

/**
 * The virtual rig's event log: one line per event, with the wall-clock time in microseconds since the epoch.
 *
 * <p>Line format: {@code <epoch microseconds> <kind> <text>}, for example
 * {@code 1764812345123456 recv DRIVE:OUT OFF}. Kinds:
 * <ul>
 * <li>{@code recv}: a command line as received (times are when its terminator was read)</li>
 * <li>{@code notice}: a line starting with {@code !} as sent ({@code !RESET}, {@code !FAULT}, {@code !ERR})</li>
 * <li>{@code output}: {@code on} or {@code off}, then the cause, for every change of the drive output</li>
 * <li>{@code fault}: an injected fault</li>
 * <li>{@code event}: anything else worth knowing (a resend, a dropped streaming block, a stall ending)</li>
 * </ul>
 * Microseconds since the epoch (from {@link Instant#now()}) let another process compare its own clock; within
 * one process {@link Entry#nanoTime()} is also kept. The file, when given, is written and flushed line by line.
 * The in-memory copy keeps the latest {@value #KEEP} entries.
 */
public final class VirtualRigLog implements AutoCloseable {
    /** Entries kept in memory. */
    public static final int KEEP = 200_000;

    /**
     * One event.
     *
     * @param epochMicros wall-clock time, microseconds since 1970-01-01T00:00Z
     * @param nanoTime {@link System#nanoTime()} in the logging process, or -1 for an entry read from a file
     * @param kind {@code recv}, {@code notice}, {@code output}, {@code fault} or {@code event}
     * @param text what happened
     */
    public record Entry(long epochMicros, long nanoTime, String kind, String text) {
        /** @return the entry as a log line, without terminator */
        public String line() {
            return epochMicros + " " + kind + " " + text;
        }

        /**
         * @param line a log line
         * @return the entry, with {@code nanoTime} -1
         * @throws RigException when the line is not {@code <microseconds> <kind> <text>}
         */
        public static Entry parse(String line) {
            String[] p = line.split(" ", 3);
            try {
                if (p.length >= 2) {
                    return new Entry(Long.parseLong(p[0]), -1, p[1], p.length == 3 ? p[2] : "");
                }
            } catch (NumberFormatException e) {
                // Reported below.
            }
            throw new RigException("virtual rig log line '" + line + "' is not '<epoch microseconds> <kind> <text>'");
        }
    }

    private final ArrayDeque<Entry> entries = new ArrayDeque<>();
    private final BufferedWriter file;
    private final Path path;
    private boolean fileFailed;

    /**
     * @param path the file to write, or null for memory only
     * @throws RigException when the file cannot be created
     */
    VirtualRigLog(Path path) {
        this.path = path;
        try {
            this.file = path == null ? null : Files.newBufferedWriter(path, StandardCharsets.UTF_8);
        } catch (IOException e) {
            throw new RigException("cannot write the virtual rig log " + path + ": " + e.getMessage()
                    + "; expected a writable file path", e);
        }
    }

    /**
     * @param kind the entry's kind
     * @param text what happened
     */
    synchronized void add(String kind, String text) {
        Instant now = Instant.now();
        Entry e = new Entry(now.getEpochSecond() * 1_000_000L + now.getNano() / 1000, System.nanoTime(), kind, text);
        entries.add(e);
        if (entries.size() > KEEP) {
            entries.poll();
        }
        if (file != null && !fileFailed) {
            try {
                file.write(e.line());
                file.newLine();
                file.flush();
            } catch (IOException ex) {
                fileFailed = true;
                System.err.println("tautline: virtual rig: writing the log " + path + " failed (" + ex.getMessage()
                        + "); logging to memory only");
            }
        }
    }

    /** @return a copy of the kept entries, oldest first */
    public synchronized List<Entry> entries() {
        return new ArrayList<>(entries);
    }

    /**
     * Reads a log file.
     *
     * @param file a file written by {@code virtual-rig --log}
     * @return its entries, oldest first
     * @throws RigException when it cannot be read or a line is malformed
     */
    public static List<Entry> read(Path file) {
        try {
            List<Entry> out = new ArrayList<>();
            for (String line : Files.readAllLines(file, StandardCharsets.UTF_8)) {
                if (!line.isBlank()) {
                    out.add(Entry.parse(line));
                }
            }
            return out;
        } catch (IOException e) {
            throw new RigException("cannot read the virtual rig log " + file + ": " + e.getMessage(), e);
        }
    }

    /**
     * Finds the first entry of a kind and text at or after a time.
     *
     * @param entries log entries, oldest first
     * @param epochMicros the earliest time, microseconds since the epoch
     * @param kind the kind, for example {@code recv}
     * @param text the exact text, for example {@code DRIVE:OUT OFF}
     * @return its time in microseconds since the epoch, or empty
     */
    public static OptionalLong firstAfter(List<Entry> entries, long epochMicros, String kind, String text) {
        for (Entry e : entries) {
            if (e.epochMicros() >= epochMicros && e.kind().equals(kind) && e.text().equals(text)) {
                return OptionalLong.of(e.epochMicros());
            }
        }
        return OptionalLong.empty();
    }

    /** Closes the file, if any; later entries go to memory only. Idempotent. */
    @Override
    public synchronized void close() {
        if (file != null && !fileFailed) {
            fileFailed = true;
            try {
                file.close();
            } catch (IOException e) {
                // Every line was flushed as it was written; nothing is lost.
                return;
            }
        }
    }
}
