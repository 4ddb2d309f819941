package org.tautline.driver.serial;

import org.tautline.driver.RigException;
import org.tautline.driver.RigLinkException;
import org.tautline.driver.RigLinkException.Kind;

/**
 * The command side of a serial rig's link: commands, replies, their parsing, and what a fault does.
 *
 * <p>Every failure goes through {@link #fail(RigLinkException)}: the first one commands the output off
 * at once (best effort, waiting at most {@value SerialRig#OFF_CONFIRM_MS} ms for the device to confirm)
 * and is kept as the link's {@link SerialRig.FaultRecord}; after it every command throws. Not
 * thread-safe: callers hold the owning {@link SerialRig}'s lock.
 */
final class CommandLink {
    private final SerialTransport transport;
    private final LinkInbox inbox;
    private final long replyTimeoutMs;
    private final String port;
    private boolean closed;
    private SerialRig.FaultRecord faultRecord;

    /**
     * @param transport the open port
     * @param inbox where the reader thread puts reply lines and link faults
     * @param replyTimeoutMs longest wait for a reply line, ms
     */
    CommandLink(SerialTransport transport, LinkInbox inbox, long replyTimeoutMs) {
        this.transport = transport;
        this.inbox = inbox;
        this.replyTimeoutMs = replyTimeoutMs;
        this.port = transport.port();
    }

    /** @return the port's path or name, for messages */
    String port() {
        return port;
    }

    /** @return the first fault and what was done about it, or null while the link is healthy */
    SerialRig.FaultRecord fault() {
        return faultRecord;
    }

    /** Commands the output off (bounded wait for confirmation while healthy), then closes the port; idempotent. */
    void close() {
        if (closed) {
            return;
        }
        outputOff();
        closed = true;
        transport.close();
    }

    /** Commands the output off; never throws (a write fault is recorded instead). */
    void outputOff() {
        if (!transport.isOpen()) {
            return;
        }
        try {
            transport.writeLine("DRIVE:OUT OFF");
            if (faultRecord == null) {
                confirmOff(replyTimeoutMs);
            }
        } catch (RigLinkException e) {
            record(e);
        }
    }

    /** Asks DRIVE:OUT? and waits at most waitMs for "0"; returns whether it came. */
    private boolean confirmOff(long waitMs) {
        inbox.clearLines();
        transport.writeLine("DRIVE:OUT?");
        long deadline = System.nanoTime() + waitMs * 1_000_000L;
        try {
            while (System.nanoTime() < deadline) {
                String line = inbox.pollLine(5);
                if (line != null) {
                    return line.strip().equals("0");
                }
            }
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
        }
        return false;
    }

    private void record(RigLinkException e) {
        if (faultRecord == null) {
            faultRecord = new SerialRig.FaultRecord(e, System.nanoTime(), -1, false);
        }
    }

    /**
     * Records the fault, commands the output off at once, and returns the fault for throwing.
     *
     * @param e the fault
     * @return {@code e}
     */
    RigLinkException fail(RigLinkException e) {
        if (faultRecord != null) {
            return e;
        }
        long detected = System.nanoTime();
        long sent = -1;
        boolean confirmed = false;
        if (transport.isOpen()) {
            try {
                transport.writeLine("DRIVE:OUT OFF");
                sent = System.nanoTime();
                confirmed = confirmOff(SerialRig.OFF_CONFIRM_MS);
            } catch (RigLinkException writeFault) {
                e.addSuppressed(writeFault);
            }
        }
        faultRecord = new SerialRig.FaultRecord(e, detected, sent, confirmed);
        return e;
    }

    /** Throws when the link is closed or has faulted; turns a fault the reader thread saw into the link's fault. */
    void requireUsable() {
        if (closed) {
            throw new RigException("the serial rig on " + port + " is closed; open it again with SerialRig.open");
        }
        if (faultRecord != null) {
            RigLinkException first = faultRecord.fault();
            throw new RigLinkException(first.kind(), port, "the link faulted earlier (" + first.getMessage() + ")",
                    "a new connection: close this rig and open it again");
        }
        RigLinkException link = inbox.linkFault();
        if (link != null) {
            throw fail(link);
        }
    }

    /** @param command one command line, sent without waiting for a reply */
    void send(String command) {
        requireUsable();
        try {
            transport.writeLine(command);
        } catch (RigLinkException e) {
            throw fail(e);
        }
    }

    /**
     * @param command a query
     * @return its reply line, stripped, within the reply timeout
     */
    String query(String command) {
        return query(command, replyTimeoutMs);
    }

    /**
     * @param command a query
     * @param timeoutMs longest wait for the reply, ms
     * @return its reply line, stripped
     */
    String query(String command, long timeoutMs) {
        inbox.clearLines();
        send(command);
        long deadline = System.nanoTime() + timeoutMs * 1_000_000L;
        try {
            while (true) {
                RigLinkException link = inbox.linkFault();
                if (link != null) {
                    throw fail(link);
                }
                String line = inbox.pollLine(5);
                if (line != null) {
                    if (line.startsWith("!ERR")) {
                        throw fail(new RigLinkException(Kind.DEVICE_ERROR, port, "the device refused " + command + ": "
                                + line.substring(4).strip(), "a reply; see PROTOCOL.md for the command"));
                    }
                    return line.strip();
                }
                if (System.nanoTime() > deadline) {
                    throw fail(new RigLinkException(Kind.TIMEOUT, port, "no reply to " + command + " within "
                            + timeoutMs + " ms", "one reply line"));
                }
            }
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw fail(new RigLinkException(Kind.TIMEOUT, port, "interrupted waiting for the reply to " + command,
                    "one reply line", e));
        }
    }

    /** @param after what was just done, for the message when the device's error queue is not empty */
    void checkErrors(String after) {
        String reply = query("SYST:ERR?");
        DeviceError e = DeviceError.parse(reply);
        if (e == null) {
            throw fail(new RigLinkException(Kind.PROTOCOL, port, "SYST:ERR? answered '" + reply + "'",
                    "code,\"message\", for example 0,\"No error\""));
        }
        if (e.code() != 0) {
            throw fail(new RigLinkException(Kind.DEVICE_ERROR, port, "the device reported " + e.reply() + " after "
                    + after, "0,\"No error\""));
        }
    }

    /**
     * @param reply a reply line
     * @param command the query it answered, for the message
     * @return the reply as a finite number
     */
    double decimal(String reply, String command) {
        try {
            double v = Double.parseDouble(reply.strip());
            if (Double.isFinite(v)) {
                return v;
            }
        } catch (NumberFormatException e) {
            // Reported below with the reply text.
        }
        throw fail(new RigLinkException(Kind.PROTOCOL, port, command + " answered '" + reply + "'", "a finite number"));
    }

    /**
     * @param reply a reply line
     * @param command the query it answered, for the message
     * @param count how many comma-separated whole numbers it must hold
     * @return the numbers
     */
    long[] numbers(String reply, String command, int count) {
        String[] parts = reply.split(",", -1);
        long[] out = new long[count];
        try {
            if (parts.length == count) {
                for (int i = 0; i < count; i++) {
                    out[i] = Long.parseLong(parts[i].strip());
                }
                return out;
            }
        } catch (NumberFormatException e) {
            // Reported below with the reply text.
        }
        throw fail(new RigLinkException(Kind.PROTOCOL, port, command + " answered '" + reply + "'",
                count + " comma-separated whole number(s)"));
    }
}
