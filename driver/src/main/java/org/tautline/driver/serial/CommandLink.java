package org.tautline.driver.serial;

import org.tautline.driver.RigException;
import org.tautline.driver.RigLinkException;
import org.tautline.driver.RigLinkException.Kind;

/**
 * The command side of a serial rig's link: commands, replies and status queries, their retries, and what a
 * fault does.
 *
 * <p>Reply lines carry no check, so a reply that matters is read twice ({@link #stableQuery}); the device's
 * state comes from {@code LINK:STAT?} ({@link #status}), whose reply carries a CRC-32 and echoes a tag. A lost or
 * damaged reply is asked for again after {@link #resync} has discarded anything late; only silence for
 * {@link LinkTiming#silenceMs()} is a fault. Every failure goes through {@link #fail(RigLinkException)}: the
 * first one commands the output off at once and is kept as the link's {@link SerialRig.FaultRecord}; after it
 * every command throws. Not thread-safe: callers hold the owning {@link SerialRig}'s lock (the fault record is
 * readable from any thread).
 */
final class CommandLink {
    /** Most attempts at one query or status before the link counts as broken. */
    static final int MAX_TRIES = 16;

    private final SerialTransport transport;
    private final LinkInbox inbox;
    private final String port;
    private LinkTiming timing;
    private boolean closed;
    private volatile SerialRig.FaultRecord faultRecord;
    private long nextTag = 1;
    private long bootCount = -1;

    /**
     * @param transport the open port
     * @param inbox where the reader thread puts what arrives
     * @param timing the waits
     */
    CommandLink(SerialTransport transport, LinkInbox inbox, LinkTiming timing) {
        this.transport = transport;
        this.inbox = inbox;
        this.timing = timing;
        this.port = transport.port();
    }

    /** @param value the waits, once the channel count is known */
    void timing(LinkTiming value) {
        timing = value;
    }

    /** @return the waits */
    LinkTiming timing() {
        return timing;
    }

    /** @param value the device's boot counter at the start of the session; later statuses must show it */
    void bootCount(long value) {
        bootCount = value;
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

    /** Commands the output off and, while the link is healthy, waits for a status showing it off; never throws. */
    void outputOff() {
        if (!transport.isOpen()) {
            return;
        }
        try {
            transport.writeLine("DRIVE:OUT OFF");
            long sent = System.nanoTime();
            if (faultRecord == null && !confirmOff(timing.silenceMs())) {
                faultRecord = new SerialRig.FaultRecord(new RigLinkException(Kind.TIMEOUT, port, "the device did not"
                        + " confirm its output off within " + timing.silenceMs() + " ms of DRIVE:OUT OFF",
                        "a status showing the output off"), sent, sent, false);
            }
        } catch (RigLinkException e) {
            if (faultRecord == null) {
                faultRecord = new SerialRig.FaultRecord(e, System.nanoTime(), -1, false);
            }
        }
    }

    /**
     * Asks for a status and waits at most waitMs for one showing the output off. Half way through, or at once when a
     * status still shows it on, it sends {@code DRIVE:OUT OFF} and the query once more, in case a line was lost on
     * the way. Never throws.
     */
    private boolean confirmOff(long waitMs) {
        try {
            long tag = nextTag++;
            transport.writeLine("LINK:STAT? " + tag);
            long start = System.nanoTime();
            boolean resent = false;
            while (System.nanoTime() - start < waitMs * 1_000_000L) {
                boolean again = !resent && System.nanoTime() - start > waitMs * 500_000L;
                if (inbox.poll(5) instanceof LinkEvent.Status s && s.status().tag() >= tag) {
                    if (!s.status().outputOn()) {
                        return true;
                    }
                    again = !resent;
                }
                if (again) {
                    resent = true;
                    tag = nextTag++;
                    transport.writeLine("DRIVE:OUT OFF");
                    transport.writeLine("LINK:STAT? " + tag);
                }
            }
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
        } catch (RigLinkException e) {
            return false;
        }
        return false;
    }

    /**
     * Records the fault, commands the output off at once, and returns the fault for throwing.
     *
     * @param e the fault
     * @return {@code e}
     */
    RigLinkException fail(RigLinkException e) {
        return fail(e, System.nanoTime());
    }

    /**
     * @param e the fault
     * @param detectedNanos {@link System#nanoTime()} when it was detected
     * @return {@code e}
     */
    RigLinkException fail(RigLinkException e, long detectedNanos) {
        if (faultRecord != null) {
            return e;
        }
        long sent = -1;
        boolean confirmed = false;
        if (transport.isOpen()) {
            try {
                transport.writeLine("DRIVE:OUT OFF");
                sent = System.nanoTime();
                confirmed = confirmOff(timing.offConfirmMs());
            } catch (RigLinkException writeFault) {
                e.addSuppressed(writeFault);
            }
        }
        faultRecord = new SerialRig.FaultRecord(e, detectedNanos, sent, confirmed);
        return e;
    }

    /** Throws when the link is closed or has faulted; turns a notice or lost port into the link's fault. */
    void requireUsable() {
        if (closed) {
            throw new RigException("the serial rig on " + port + " is closed; open it again with SerialRig.open");
        }
        SerialRig.FaultRecord record = faultRecord;
        if (record != null) {
            RigLinkException first = record.fault();
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
     * @param ms longest wait, ms
     * @return the next event or null; throws the link's fault when a notice or a lost port ended the link
     */
    LinkEvent nextEvent(long ms) {
        RigLinkException link = inbox.linkFault();
        if (link != null) {
            throw fail(link);
        }
        try {
            return inbox.poll(ms);
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw fail(new RigLinkException(Kind.TIMEOUT, port, "interrupted while waiting for the device",
                    "the waiting thread not to be interrupted", e));
        }
    }

    /**
     * Throws a {@link Kind#TIMEOUT} fault when the device has sent nothing for {@link LinkTiming#silenceMs()}.
     *
     * @param waitStartNanos when the wait began
     * @param awaited what the host waits for, for the message
     */
    void checkSilence(long waitStartNanos, String awaited) {
        long last = Math.max(waitStartNanos, inbox.lastByteNanos());
        if (System.nanoTime() - last > timing.silenceMs() * 1_000_000L) {
            throw fail(new RigLinkException(Kind.TIMEOUT, port, "the device sent nothing for " + timing.silenceMs()
                    + " ms while the host waited for " + awaited, "the device to answer within the reply timeout"));
        }
    }

    /**
     * Sends a query and returns its reply line; a lost or unreadable reply is asked for again.
     *
     * @param command a query
     * @return its reply, stripped
     */
    String query(String command) {
        long waitStart = System.nanoTime();
        for (int attempt = 1; ; attempt++) {
            inbox.clear();
            send(command);
            long sent = System.nanoTime();
            while (true) {
                LinkEvent e = nextEvent(5);
                if (e instanceof LinkEvent.Reply r) {
                    if (r.text().startsWith("!ERR")) {
                        throw fail(new RigLinkException(Kind.DEVICE_ERROR, port, "the device refused " + command + ": "
                                + r.text().substring(4).strip(), "a reply; see PROTOCOL.md for the command"));
                    }
                    return r.text().strip();
                }
                if (e instanceof LinkEvent.Garbled) {
                    break;
                }
                if (e == null) {
                    checkSilence(waitStart, "the reply to " + command);
                    if (System.nanoTime() - sent > timing.retryMs() * 1_000_000L) {
                        break;
                    }
                }
            }
            if (attempt == MAX_TRIES) {
                throw fail(new RigLinkException(Kind.PROTOCOL, port, "no readable reply to " + command + " in "
                        + MAX_TRIES + " tries", "one reply line per query"));
            }
            resync("a lost reply to " + command);
        }
    }

    /**
     * Reads a value that does not change during a session until two replies in a row agree, so that a reply
     * damaged on the way (a reply line has no check) is never taken.
     *
     * @param command a query
     * @return the agreed reply
     */
    String stableQuery(String command) {
        String last = query(command);
        for (int attempt = 2; attempt <= MAX_TRIES; attempt++) {
            String next = query(command);
            if (next.equals(last)) {
                return next;
            }
            last = next;
        }
        throw fail(new RigLinkException(Kind.PROTOCOL, port, "the replies to " + command + " kept changing (last '"
                + last + "')", "the same reply twice in a row"));
    }

    /**
     * Asks {@code LINK:STAT?} with a fresh tag and waits for a status with that tag or a later one; a lost or
     * damaged status is asked for again. The status reflects every command sent before it.
     *
     * @param during what the host is doing, for messages
     * @return the status, not yet checked against what the host expects (see {@link #verify})
     */
    DeviceStatus status(String during) {
        long tag = nextTag++;
        long waitStart = System.nanoTime();
        send("LINK:STAT? " + tag);
        long sent = waitStart;
        int tries = 1;
        boolean hurried = false;
        while (true) {
            LinkEvent e = nextEvent(5);
            if (e instanceof LinkEvent.Status s && s.status().tag() >= tag) {
                return s.status();
            }
            if (e == null) {
                checkSilence(waitStart, "a status reply " + during);
                if (System.nanoTime() - sent > timing.retryMs() * 1_000_000L) {
                    if (++tries > MAX_TRIES) {
                        throw fail(new RigLinkException(Kind.PROTOCOL, port, "no readable status reply " + during
                                + " in " + MAX_TRIES + " tries", "STAT lines whose check matches"));
                    }
                    inbox.abandonPending();
                    send("LINK:STAT? " + tag);
                    sent = System.nanoTime();
                    hurried = false;
                }
            } else if (!hurried && (e instanceof LinkEvent.Garbled || e instanceof LinkEvent.Reply)) {
                // Perhaps the status itself arrived damaged: ask once more at once. Further garbage (a damaged
                // block read as text) waits for the retry time, so that it cannot use up the tries.
                send("LINK:STAT? " + tag);
                hurried = true;
            }
        }
    }

    /** @return a fresh status tag, for a caller that sends {@code LINK:STAT?} itself */
    long nextTag() {
        return nextTag++;
    }

    /**
     * Checks a status against the session: same boot counter, output on when the host believes it on, an empty
     * error queue; otherwise switches the output off and throws.
     *
     * @param s the status
     * @param expectOn true when the host believes the output is on
     * @param after where the host is, for the message (for example "after DRIVE:SINE 250.0,1.0")
     */
    void verify(DeviceStatus s, boolean expectOn, String after) {
        if (bootCount >= 0 && s.bootCount() != bootCount) {
            throw fail(new RigLinkException(Kind.DEVICE_RESET, port, "the device's boot counter went from " + bootCount
                    + " to " + s.bootCount() + " " + after + ": it reset and forgot its state",
                    "the same boot counter for the whole session; reconnect to go on"));
        }
        if (expectOn && !s.outputOn()) {
            throw fail(new RigLinkException(Kind.DEVICE_ERROR, port, "the device's output went off by itself " + after
                    + " (" + DeviceStatus.faultText(s.lastFault()) + ")",
                    "the output to stay on until the host switches it off; check the amplifier and the rig"));
        }
        if (s.errorCount() > 0) {
            long detected = System.nanoTime();
            try {
                transport.writeLine("DRIVE:OUT OFF");
            } catch (RigLinkException e) {
                // fail() below records the port fault it meets in turn.
            }
            throw fail(new RigLinkException(Kind.DEVICE_ERROR, port, "the device reported " + errorText(s.errorCount())
                    + " " + after, "an empty error queue (0,\"No error\")"), detected);
        }
    }

    /** Reads the oldest queue entry once, for a message; the fault is reported whatever comes back. */
    private String errorText(int count) {
        inbox.clear();
        try {
            transport.writeLine("SYST:ERR?");
            long start = System.nanoTime();
            while (System.nanoTime() - start < timing.retryMs() * 1_000_000L) {
                if (inbox.poll(5) instanceof LinkEvent.Reply r) {
                    DeviceError e = DeviceError.parse(r.text());
                    return e == null ? count + " error(s), the first unreadable ('" + r.text() + "')" : e.reply()
                            + (count > 1 ? " and " + (count - 1) + " more error(s)" : "");
                }
            }
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
        } catch (RigLinkException e) {
            // Reported below as an error whose text did not arrive.
        }
        return count + " error(s) whose text did not arrive";
    }

    /**
     * Brings the link to a known point: {@code ACQ:ABORT} ends any fetch and drops everything the device had
     * queued, and everything received before the status that follows it is discarded.
     *
     * @param why what went wrong, for messages
     * @return the status after the abort, not yet verified
     */
    DeviceStatus resync(String why) {
        send("ACQ:ABORT");
        inbox.abandonPending();
        return status("while resynchronising after " + why);
    }
}
