package org.tautline.app.ui;

import java.util.Arrays;

/**
 * The tally of an {@link EdtWatchdog}: each probe's delay between being posted to the event thread and running there,
 * and which delays were the event thread's own doing. Thread-safe; free of Swing and of any clock.
 *
 * <p>A delay counts as a stall of the event thread unless the watchdog itself was late: a probe still waiting after
 * three periods is looked at, and when that look came later than half the delay (or a period, if more), the whole
 * JVM or the machine was too busy to schedule the watchdog, and the delay counts only among all delays.
 */
public final class EventThreadDelays {
    private long[] delaysNs = new long[256];
    private int count;
    private long longestDelayNs;
    private long longestStallNs;
    private long busySightings;
    private String stackAtLongestStall = "";
    private String stackWhenLastSeenBusy = "";

    /**
     * Whether a delay was the event thread's doing.
     *
     * @param delayNs the probe's delay, ns
     * @param watchdogLateNs how late the watchdog looked at the waiting probe, ns; negative when it ran before the look
     * @param periodNs the watchdog's period, ns
     * @return true when the delay counts as a stall of the event thread
     */
    public static boolean attributable(long delayNs, long watchdogLateNs, long periodNs) {
        return watchdogLateNs < Math.max(periodNs, delayNs / 2);
    }

    /**
     * Records that a probe was seen still waiting, and where the event thread was then.
     *
     * @param stack the event thread's stack at that moment
     */
    public synchronized void seenBusy(String stack) {
        busySightings++;
        stackWhenLastSeenBusy = stack;
    }

    /**
     * Records one probe that ran.
     *
     * @param delayNs its delay, ns
     * @param watchdogLateNs how late the watchdog looked at it while it waited, ns; negative when it was not looked at
     * @param periodNs the watchdog's period, ns
     * @param stack where the event thread was when the probe was seen waiting, empty when it was not looked at
     */
    public synchronized void record(long delayNs, long watchdogLateNs, long periodNs, String stack) {
        if (count == delaysNs.length) {
            delaysNs = Arrays.copyOf(delaysNs, 2 * count);
        }
        delaysNs[count++] = delayNs;
        longestDelayNs = Math.max(longestDelayNs, delayNs);
        if (attributable(delayNs, watchdogLateNs, periodNs) && delayNs > longestStallNs) {
            longestStallNs = delayNs;
            stackAtLongestStall = stack;
        }
    }

    /** @return probes recorded */
    public synchronized long probes() {
        return count;
    }

    /** @return probes seen still waiting three periods after they were posted */
    public synchronized long busySightings() {
        return busySightings;
    }

    /** @return the longest delay of any probe, milliseconds */
    public synchronized double longestDelayMs() {
        return longestDelayNs / 1e6;
    }

    /** @return the longest delay that counts as a stall of the event thread, milliseconds */
    public synchronized double longestStallMs() {
        return longestStallNs / 1e6;
    }

    /** @return where the event thread was during the longest stall, when that probe was seen waiting */
    public synchronized String stackAtLongestStall() {
        return stackAtLongestStall;
    }

    /** @return where the event thread was when a probe was last seen waiting */
    public synchronized String stackWhenLastSeenBusy() {
        return stackWhenLastSeenBusy;
    }

    /**
     * @param fraction 0 to 1, for example 0.99
     * @return that quantile of all probe delays (nearest rank), milliseconds; NaN with no probes
     */
    public synchronized double delayQuantileMs(double fraction) {
        if (count == 0) {
            return Double.NaN;
        }
        if (!(fraction >= 0 && fraction <= 1)) {
            throw new IllegalArgumentException("a quantile lies between 0 and 1, got " + fraction);
        }
        long[] sorted = Arrays.copyOf(delaysNs, count);
        Arrays.sort(sorted);
        int rank = (int) Math.ceil(fraction * count);
        return sorted[Math.max(0, rank - 1)] / 1e6;
    }
}
