package org.tautline.driver.serial;

import org.tautline.driver.RigLinkException;

/** Test helper: a host that speaks to the virtual rig line by line, without {@link SerialRig}'s checks and retries. */
final class RawHost implements AutoCloseable {
    /** Longest wait for anything, ms; only a broken device makes a test wait this long. */
    static final long WAIT_MS = 10_000;

    final SerialTransport transport;
    final LinkInbox inbox;

    /** @param server the virtual rig to speak to */
    RawHost(VirtualRigServer server) {
        transport = SerialTransport.open(server.hostPath(), server.settings().baud());
        inbox = new LinkInbox(transport.port());
        transport.startReading(inbox);
    }

    /** @param lines command lines to send, in order */
    void send(String... lines) {
        for (String line : lines) {
            transport.writeLine(line);
        }
    }

    /** @return the next event, waiting for it */
    LinkEvent next() {
        try {
            LinkEvent e = inbox.poll(WAIT_MS);
            if (e == null) {
                throw new AssertionError("the virtual rig sent nothing for " + WAIT_MS + " ms");
            }
            return e;
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new AssertionError("interrupted", e);
        }
    }

    /** @return the next reply line, skipping blocks and statuses */
    String reply() {
        while (true) {
            if (next() instanceof LinkEvent.Reply r) {
                return r.text();
            }
        }
    }

    /**
     * @param query a query
     * @return its reply
     */
    String ask(String query) {
        send(query);
        return reply();
    }

    /** @return the next data block, skipping lines */
    DataBlock block() {
        while (true) {
            if (next() instanceof LinkEvent.Block b) {
                return b.block();
            }
        }
    }

    /** @return the code of the oldest error, removed from the device's queue */
    int error() {
        DeviceError e = DeviceError.parse(ask("SYST:ERR?"));
        if (e == null) {
            throw new AssertionError("SYST:ERR? answered something else than code,\"message\"");
        }
        return e.code();
    }

    /** @return the notice or port fault that ended the link, or null */
    RigLinkException linkFault() {
        return inbox.linkFault();
    }

    @Override
    public void close() {
        transport.close();
    }
}
