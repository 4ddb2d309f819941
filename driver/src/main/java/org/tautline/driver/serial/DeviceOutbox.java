package org.tautline.driver.serial;

import java.util.ArrayDeque;
import java.util.function.Supplier;

/**
 * What the virtual device has to send: an ordered queue (replies, resent blocks, streaming blocks and fetches
 * whose blocks are made one at a time as they are sent) and an urgent queue that goes ahead of it at the next
 * item boundary (notices, and status replies made when they are sent). Thread-safe.
 */
final class DeviceOutbox {
    /** A fetch whose blocks the device makes as the sender reaches them; fields guarded by the device. */
    static final class FetchJob {
        final int blockSamples;
        final SampleFormat format;
        volatile int remaining;
        volatile boolean cancelled;

        FetchJob(int samples, int blockSamples, SampleFormat format) {
            this.remaining = samples;
            this.blockSamples = blockSamples;
            this.format = format;
        }

        boolean done() {
            return cancelled || remaining <= 0;
        }
    }

    /** A streaming block, counted so that the device can tell when the line falls behind. */
    private record StreamBlock(byte[] bytes) {
    }

    private final ArrayDeque<Object> ordered = new ArrayDeque<>();
    private final ArrayDeque<Object> urgent = new ArrayDeque<>();
    /** What {@link #take()} returns after {@link #nudge()}: nothing to send, look again. */
    static final Object NUDGE = new Object();

    private int queuedStreamBlocks;
    private boolean closed;
    private boolean nudged;

    /** @param item a reply line or a block, with its terminator */
    synchronized void send(byte[] item) {
        ordered.add(item);
        notifyAll();
    }

    /** @param block a streaming block */
    synchronized void sendStreamBlock(byte[] block) {
        ordered.add(new StreamBlock(block));
        queuedStreamBlocks++;
        notifyAll();
    }

    /** @param job a fetch to send after everything queued before it */
    synchronized void fetch(FetchJob job) {
        ordered.add(job);
        notifyAll();
    }

    /** @param notice a notice line, sent ahead of the ordered queue */
    synchronized void urgent(byte[] notice) {
        urgent.add(notice);
        notifyAll();
    }

    /** @param reply a reply made when it is sent, ahead of the ordered queue */
    synchronized void urgent(Supplier<byte[]> reply) {
        urgent.add(reply);
        notifyAll();
    }

    /** Drops everything ordered that has not begun: replies, resends, streaming blocks, fetches. */
    synchronized void dropOrdered() {
        for (Object o : ordered) {
            if (o instanceof FetchJob j) {
                j.cancelled = true;
            }
        }
        ordered.clear();
        queuedStreamBlocks = 0;
    }

    /** Drops everything not yet begun, urgent items too (a reset). */
    synchronized void dropAll() {
        dropOrdered();
        urgent.clear();
    }

    /** @return streaming blocks waiting to be sent */
    synchronized int queuedStreamBlocks() {
        return queuedStreamBlocks;
    }

    /** Makes a waiting {@link #take()} return {@link #NUDGE} once, so that the sender looks at its fault schedule. */
    synchronized void nudge() {
        nudged = true;
        notifyAll();
    }

    /** Wakes the sender for good: {@link #take()} returns null from now on. */
    synchronized void close() {
        closed = true;
        notifyAll();
    }

    /**
     * Waits for the next thing to send: urgent items first. A fetch is returned without being removed: the
     * caller makes its next block and the fetch leaves the queue once it is {@linkplain FetchJob#done() done}.
     *
     * @return a {@code byte[]}, a {@code Supplier<byte[]>}, a {@link FetchJob}, {@link #NUDGE}, or null once closed
     * @throws InterruptedException when the sender is interrupted
     */
    synchronized Object take() throws InterruptedException {
        while (!closed) {
            if (nudged) {
                nudged = false;
                return NUDGE;
            }
            if (!urgent.isEmpty()) {
                return urgent.poll();
            }
            Object o = ordered.peek();
            if (o instanceof FetchJob j) {
                if (!j.done()) {
                    return j;
                }
                ordered.poll();
                continue;
            }
            if (o != null) {
                ordered.poll();
                if (o instanceof StreamBlock s) {
                    queuedStreamBlocks--;
                    return s.bytes();
                }
                return o;
            }
            wait();
        }
        return null;
    }
}
