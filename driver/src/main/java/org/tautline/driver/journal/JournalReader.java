package org.tautline.driver.journal;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Locale;
import java.util.Optional;

import org.tautline.driver.RigException;
import org.tautline.driver.sweep.SweepStatus;

/**
 * Reads a journal back up to its last whole, valid record, whatever byte the writer stopped at.
 *
 * <p>A record counts when it ends in a line feed and its CRC matches. Reading stops at the first
 * record that does not (a torn write after a power loss or a killed process), and
 * {@link JournalContents#warning()} names the file and the byte where it stopped. A record that is
 * whole and valid but does not fit the journal (a step out of plan order, an unknown type) is a
 * format error and throws.
 */
public final class JournalReader {
    private JournalReader() {
    }

    /**
     * @param file the journal
     * @return its contents
     * @throws RigException when the file cannot be read, has no complete header, or holds a record that does not fit
     */
    public static JournalContents read(Path file) {
        byte[] bytes;
        try {
            bytes = Files.readAllBytes(file);
        } catch (IOException e) {
            throw new RigException("journal " + file + " could not be read: " + e, e);
        }
        List<JournalStep> steps = new ArrayList<>();
        List<JournalSession> sessions = new ArrayList<>();
        JournalHeader header = null;
        SessionBuilder open = null;
        String warning = null;
        int pos = 0;
        while (pos < bytes.length) {
            int nl = indexOf(bytes, (byte) '\n', pos);
            int end = nl > pos && bytes[nl - 1] == '\r' ? nl - 1 : nl;
            JournalLine line = nl < 0 ? null : JournalLine.decode(Arrays.copyOfRange(bytes, pos, end));
            if (line == null) {
                warning = String.format(Locale.ROOT, "journal %s: read up to byte %d of %d; the record starting there is %s,"
                        + " so it and anything after it are ignored (%d completed step(s) kept)", file, pos, bytes.length,
                        nl < 0 ? "incomplete (the writer stopped mid-record: a power loss or a killed process)"
                                : "damaged (its CRC does not match)", steps.size());
                break;
            }
            try {
                if (header == null) {
                    header = JournalHeader.fromLine(line);
                    open = new SessionBuilder(header.startedAt(), header.identity(), 0);
                } else {
                    open = apply(line, header, steps, sessions, open);
                }
            } catch (IllegalArgumentException e) {
                throw new RigException("journal " + file + ": the record at byte " + pos + " does not fit: " + e.getMessage(), e);
            }
            pos = nl + 1;
        }
        if (header == null) {
            boolean damaged = bytes.length > 0 && indexOf(bytes, (byte) '\n', 0) >= 0;
            throw new RigException("journal " + file + (damaged
                    ? ": the header record (line 1) is damaged: its CRC does not match its contents, so the journal"
                    + " cannot be trusted; keep the file for inspection and run the sweep again into a new folder"
                    : " has no complete header record (" + bytes.length + " bytes): the sweep stopped before it"
                    + " started; run it again"));
        }
        if (open != null) {
            sessions.add(open.build(steps.size(), Optional.empty(), ""));
        }
        return new JournalContents(file, header, steps, sessions, pos, bytes.length, Optional.ofNullable(warning));
    }

    private static SessionBuilder apply(JournalLine line, JournalHeader header, List<JournalStep> steps,
                                        List<JournalSession> sessions, SessionBuilder open) {
        switch (line.type()) {
            case "STEP" -> {
                if (open == null) {
                    throw new IllegalArgumentException("a STEP after the END of its session and before any RESUMED");
                }
                JournalStep step = JournalStep.fromLine(line);
                if (step.index() != steps.size()) {
                    throw new IllegalArgumentException("STEP index " + step.index() + " where index " + steps.size()
                            + " was expected (steps are recorded in order)");
                }
                if (step.step().pass() >= header.plan().passCount()) {
                    throw new IllegalArgumentException("STEP " + step.index() + " belongs to pass " + step.step().pass()
                            + " but the plan has " + header.plan().passCount() + " pass(es)");
                }
                steps.add(step);
                return open;
            }
            case "END" -> {
                if (open == null) {
                    throw new IllegalArgumentException("a second END with no RESUMED between");
                }
                SweepStatus status = PlanFields.choice(line, "status", SweepStatus.class);
                sessions.add(open.build(steps.size(), Optional.of(status), line.text("reason")));
                return null;
            }
            case "RESUMED" -> {
                if (open != null) {
                    sessions.add(open.build(steps.size(), Optional.empty(), ""));
                }
                if (line.whole("completedSteps") != steps.size()) {
                    throw new IllegalArgumentException("RESUMED after " + line.whole("completedSteps")
                            + " steps but the journal holds " + steps.size());
                }
                return new SessionBuilder(Instant.parse(line.text("at")), line.text("identity"), steps.size());
            }
            default -> throw new IllegalArgumentException("unknown record type '" + line.type() + "'");
        }
    }

    private static int indexOf(byte[] bytes, byte b, int from) {
        for (int i = from; i < bytes.length; i++) {
            if (bytes[i] == b) {
                return i;
            }
        }
        return -1;
    }

    /** A session being read: how it started; its steps and end come later. */
    private record SessionBuilder(Instant startedAt, String identity, int firstStep) {
        JournalSession build(int stepsSoFar, Optional<SweepStatus> status, String reason) {
            return new JournalSession(startedAt, identity, firstStep, stepsSoFar - firstStep, status, reason);
        }
    }
}
