package org.tautline.app.ui;

import java.awt.EventQueue;
import java.util.concurrent.atomic.AtomicLong;

/**
 * Measures how responsive the Swing event thread is: a daemon thread posts a probe every
 * {@code periodMs} milliseconds and records the longest wait between posting and running.
 */
public final class EdtWatchdog implements AutoCloseable {
    private final long periodMs;
    private final AtomicLong longestDelayNs = new AtomicLong();
    private final AtomicLong probes = new AtomicLong();
    private final Thread thread;
    private volatile boolean running = true;
    private volatile Thread eventThread;
    private volatile String pendingStack = "";
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
            long posted = System.nanoTime();
            Object ran = new Object();
            boolean[] done = {false};
            EventQueue.invokeLater(() -> {
                eventThread = Thread.currentThread();
                long delay = System.nanoTime() - posted;
                if (delay > longestDelayNs.get()) {
                    stackAtLongest = pendingStack;
                }
                longestDelayNs.accumulateAndGet(System.nanoTime() - posted, Math::max);
                probes.incrementAndGet();
                synchronized (ran) {
                    done[0] = true;
                    ran.notifyAll();
                }
            });
            try {
                synchronized (ran) {
                    // Wait for the probe before posting the next, so that a stall counts once, in full.
                    pendingStack = "";
                    ran.wait(periodMs * 3);
                    if (!done[0] && eventThread != null) {
                        pendingStack = stackOf(eventThread);
                    }
                    while (!done[0] && running) {
                        ran.wait(periodMs);
                    }
                }
                Thread.sleep(periodMs);
            } catch (InterruptedException e) {
                Thread.currentThread().interrupt();
                return;
            }
        }
    }

    /** @return the longest delay seen between posting a probe and the event thread running it, milliseconds */
    public double longestDelayMs() {
        return longestDelayNs.get() / 1e6;
    }

    /** @return what the event thread was doing during the longest delay, when that delay was over three periods */
    public String stackAtLongestDelay() {
        return stackAtLongest;
    }

    private static String stackOf(Thread thread) {
        StringBuilder out = new StringBuilder();
        StackTraceElement[] stack = thread.getStackTrace();
        for (int i = 0; i < Math.min(60, stack.length); i++) {
            out.append("\n  at ").append(stack[i]);
        }
        return out.toString();
    }

    /** @return probes that have run */
    public long probeCount() {
        return probes.get();
    }

    /** Stops probing. */
    @Override
    public void close() {
        running = false;
        thread.interrupt();
    }
}
