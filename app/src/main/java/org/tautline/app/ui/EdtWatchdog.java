package org.tautline.app.ui;

import java.awt.EventQueue;

/**
 * Measures how responsive the Swing event thread is: a daemon thread posts a probe every {@code periodMs}
 * milliseconds and records, in an {@link EventThreadDelays}, the wait between posting and running.
 *
 * <p>Three periods after posting, a probe still waiting is looked at: the watchdog records what the event thread is
 * doing, and how late it made that look itself, which tells a busy event thread from a busy machine (see
 * {@link EventThreadDelays}). For benchmarks, which print the figures; no test asserts a time with it.
 */
public final class EdtWatchdog implements AutoCloseable {
    private final long periodMs;
    private final Thread thread;
    private final EventThreadDelays delays = new EventThreadDelays();
    private volatile boolean running = true;
    private volatile Thread eventThread;

    /** @param periodMs time between probes, milliseconds, 1 or more */
    public EdtWatchdog(long periodMs) {
        if (periodMs < 1) {
            throw new IllegalArgumentException("watchdog period must be 1 ms or more, got " + periodMs);
        }
        this.periodMs = periodMs;
        this.thread = new Thread(this::probeLoop, "edt-watchdog");
        thread.setDaemon(true);
    }

    /** @return this watchdog, started */
    public EdtWatchdog start() {
        thread.start();
        return this;
    }

    private void probeLoop() {
        while (running) {
            try {
                probeOnce();
                Thread.sleep(periodMs);
            } catch (InterruptedException e) {
                Thread.currentThread().interrupt();
                return;
            }
        }
    }

    private void probeOnce() throws InterruptedException {
        Object lock = new Object();
        long[] ranAt = {0};
        long posted = System.nanoTime();
        EventQueue.invokeLater(() -> {
            eventThread = Thread.currentThread();
            synchronized (lock) {
                ranAt[0] = System.nanoTime();
                lock.notifyAll();
            }
        });
        long periodNs = periodMs * 1_000_000L;
        long checkNs = 3 * periodNs;
        String stack = "";
        long lateNs = -1;
        synchronized (lock) {
            long deadline = posted + checkNs;
            for (long left = checkNs; ranAt[0] == 0 && left > 0 && running; left = deadline - System.nanoTime()) {
                lock.wait(Math.max(1, left / 1_000_000L));
            }
            if (ranAt[0] == 0) {
                lateNs = System.nanoTime() - deadline;
                Thread edt = eventThread;
                stack = edt == null ? "" : stackOf(edt);
                delays.seenBusy(stack);
            }
            while (ranAt[0] == 0 && running) {
                lock.wait(periodMs);
            }
        }
        if (ranAt[0] != 0) {
            delays.record(ranAt[0] - posted, lateNs, periodNs, stack);
        }
    }

    /** @return the tally so far */
    public EventThreadDelays delays() {
        return delays;
    }

    /** @return the longest delay seen between posting a probe and the event thread running it, milliseconds */
    public double longestDelayMs() {
        return delays.longestDelayMs();
    }

    /** @return the longest delay while the event thread was found busy, milliseconds (see the class comment) */
    public double longestStallMs() {
        return delays.longestStallMs();
    }

    /** @return what the event thread was doing during the longest stall, when it was over three periods */
    public String stackAtLongestStall() {
        return delays.stackAtLongestStall();
    }

    /** @return probes that have run */
    public long probeCount() {
        return delays.probes();
    }

    private static String stackOf(Thread thread) {
        StringBuilder out = new StringBuilder();
        StackTraceElement[] stack = thread.getStackTrace();
        for (int i = 0; i < Math.min(60, stack.length); i++) {
            out.append("\n  at ").append(stack[i]);
        }
        return out.toString();
    }

    /** Stops probing. */
    @Override
    public void close() {
        running = false;
        thread.interrupt();
    }
}
