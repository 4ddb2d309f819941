package org.tautline.driver.serial;

import java.util.concurrent.LinkedBlockingQueue;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.atomic.AtomicLong;

import org.tautline.driver.RigLinkException;
import org.tautline.driver.RigLinkException.Kind;

/**
 * What the host has received: one queue of {@link LinkEvent}s in arrival order, and the notice or port fault
 * that ends the link.
 *
 * <p>Fed by the transport's reader thread; read by the thread using the rig. A notice ({@code !RESET},
 * {@code !FAULT}) or a lost port becomes the {@link #linkFault()} at once, so a read in progress sees it within
 * its next poll. Status lines are checked here ({@link DeviceStatus#parse}); one that fails its check is
 * {@link LinkEvent.Garbled}, never a status.
 */
final class LinkInbox implements StreamDecoder.Sink, SerialTransport.Receiver {
    private final String port;
    private final StreamDecoder decoder;
    private final LinkedBlockingQueue<LinkEvent> events = new LinkedBlockingQueue<>();
    private volatile RigLinkException linkFault;
    private volatile long lastByteNanos = System.nanoTime();
    private volatile long lastPartialBlockNanos;
    private final AtomicLong strayFaults = new AtomicLong();
    private final AtomicLong bytesReceived = new AtomicLong();

    LinkInbox(String port) {
        this.port = port;
        this.decoder = new StreamDecoder(port, BlockCodec.DEFAULT_MAX_PAYLOAD_BYTES, this);
    }

    @Override
    public void bytes(byte[] data, int offset, int length) {
        long now = System.nanoTime();
        lastByteNanos = now;
        bytesReceived.addAndGet(length);
        synchronized (decoder) {
            decoder.feed(data, offset, length);
            if (decoder.pendingBytes() > 0) {
                lastPartialBlockNanos = now;
            }
        }
    }

    @Override
    public void gone(RigLinkException fault) {
        if (linkFault == null) {
            linkFault = fault;
        }
    }

    @Override
    public void line(String line) {
        if (line.startsWith("!RESET")) {
            gone(new RigLinkException(Kind.DEVICE_RESET, port, "the device announced a reset ('" + line
                    + "') and has forgotten its state", "no reset during a session; reconnect to go on"));
        } else if (line.startsWith("!FAULT")) {
            DeviceError e = DeviceError.parse(line.substring(6).strip());
            gone(new RigLinkException(Kind.DEVICE_ERROR, port, "the device switched its output off by itself ("
                    + (e == null ? "notice '" + line + "'" : e.message() + ", fault " + e.code()) + ")",
                    "no device fault during a session; check the amplifier and the rig, then reconnect"));
        } else if (line.startsWith(DeviceStatus.PREFIX)) {
            DeviceStatus s = DeviceStatus.parse(line);
            if (s == null) {
                strayFaults.incrementAndGet();
                events.add(new LinkEvent.Garbled("a status line failed its check: " + line));
            } else {
                events.add(new LinkEvent.Status(s));
            }
        } else {
            events.add(new LinkEvent.Reply(line));
        }
    }

    @Override
    public void block(DataBlock block) {
        events.add(new LinkEvent.Block(block));
    }

    @Override
    public void fault(RigLinkException fault) {
        if (fault.kind() == Kind.CRC) {
            events.add(new LinkEvent.Damaged(fault));
        } else {
            strayFaults.incrementAndGet();
            events.add(new LinkEvent.Garbled(fault.getMessage()));
        }
    }

    /** @param unitsPerCount engineering units per count of each channel */
    void sensitivity(double[] unitsPerCount) {
        synchronized (decoder) {
            decoder.sensitivity(unitsPerCount);
        }
    }

    /** Gives up on a partly received block so that what follows its {@code '#'} can be decoded. */
    void abandonPending() {
        synchronized (decoder) {
            decoder.abandonPending();
        }
    }

    /** @return the notice or port fault that ended the link, or null */
    RigLinkException linkFault() {
        return linkFault;
    }

    /** @return {@link System#nanoTime()} when the last byte arrived (or when the inbox was made) */
    long lastByteNanos() {
        return lastByteNanos;
    }

    /**
     * @return {@link System#nanoTime()} when bytes last arrived while the decoder held part of a block (a block on
     *         its way), or 0
     */
    long lastPartialBlockNanos() {
        return lastPartialBlockNanos;
    }

    /** Forgets every event nobody waited for. */
    void clear() {
        events.clear();
    }

    /**
     * @param ms longest wait, ms
     * @return the next event, or null
     * @throws InterruptedException when the waiting thread is interrupted
     */
    LinkEvent poll(long ms) throws InterruptedException {
        return events.poll(ms, TimeUnit.MILLISECONDS);
    }

    /** @return unreadable lines and stray bytes seen so far, as counted fault events */
    long strayFaults() {
        return strayFaults.get();
    }

    /** @return bytes received so far */
    long bytesReceived() {
        return bytesReceived.get();
    }
}
