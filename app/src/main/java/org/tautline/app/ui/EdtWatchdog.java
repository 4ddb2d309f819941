package org.tautline.app.ui;

import java.awt.EventQueue;

/**
 * Measures how responsive the Swing event thread is: a daemon thread posts a probe every
 * {@code periodMs} milliseconds and records the longest wait between posting and running.
 *
 * <p>Two figures are kept. {@link #longestDelayMs()} is every delay as measured. {@link #longestStallMs()}
 * counts a delay only when the event thread itself was found busy: three periods after posting, the
 * watchdog sees the probe still waiting and records what the event thread is doing. When the watchdog
 * itself woke for that look later than half the delay (a pause of the whole JVM, or a machine too busy
 * to schedule it), the delay is not the event thread's doing and counts only in the first figure.
 */
public final class EdtWatchdog implements AutoCloseable {
    private final long periodMs;
    private final Thread thread;
    private volatile boolean running = true;
    private volatile Thread eventThread;
    private volatile long longestDelayNs;
    private volatile long longestStallNs;
    private volatile long probes;
    private volatile String stackAtLongest = "";

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
        long checkNs = 3 * periodMs * 1_000_000L;
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
            }
            while (ranAt[0] == 0 && running) {
                lock.wait(periodMs);
            }
        }
        if (ranAt[0] == 0) {
            return;
        }
        long delay = ranAt[0] - posted;
        // The watchdog, woken late by less than half the delay, saw the probe waiting: the event thread's doing.
        boolean attributable = lateNs < Math.max(periodMs * 1_000_000L, delay / 2);
        probes++;
        longestDelayNs = Math.max(longestDelayNs, delay);
        if (attributable && delay > longestStallNs) {
            longestStallNs = delay;
            stackAtLongest = stack;
        }
    }

    /** @return the longest delay seen between posting a probe and the event thread running it, milliseconds */
    public double longestDelayMs() {
        return longestDelayNs / 1e6;
    }

    /** @return the longest delay while the event thread was found busy, milliseconds (see the class comment) */
    public double longestStallMs() {
        return longestStallNs / 1e6;
    }

    /** @return what the event thread was doing during the longest stall, when it was over three periods */
    public String stackAtLongestStall() {
        return stackAtLongest;
    }

    /** @return probes that have run */
    public long probeCount() {
        return probes;
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
