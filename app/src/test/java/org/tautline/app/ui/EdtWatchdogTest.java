package org.tautline.app.ui;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.EventQueue;
import java.util.concurrent.CountDownLatch;

import org.junit.jupiter.api.Test;

/**
 * The watchdog's tally checked with given numbers, and the watchdog itself on the event queue (which runs without a
 * display): no sleep, no time bound; conditions are awaited with a deadline.
 */
class EdtWatchdogTest {
    private static final long PERIOD_NS = 20_000_000L;

    @Test
    void aDelayCountsAsAStallUnlessTheWatchdogWasLateByHalfOfIt() {
        // Ran before the look: the event thread's doing.
        assertTrue(EventThreadDelays.attributable(45_000_000L, -1, PERIOD_NS));
        // Looked at 5 ms late, the probe waited 300 ms: the event thread was busy.
        assertTrue(EventThreadDelays.attributable(300_000_000L, 5_000_000L, PERIOD_NS));
        // Looked at 200 ms late, the probe waited 300 ms: the machine, not the event thread.
        assertFalse(EventThreadDelays.attributable(300_000_000L, 200_000_000L, PERIOD_NS));
        // A lateness under one period never disqualifies.
        assertTrue(EventThreadDelays.attributable(30_000_000L, 19_000_000L, PERIOD_NS));
    }

    @Test
    void keepsTheLongestStallWithWhereTheEventThreadWasAndEveryDelayForQuantiles() {
        EventThreadDelays d = new EventThreadDelays();
        for (int i = 1; i <= 100; i++) {
            d.record(i * 1_000_000L, -1, PERIOD_NS, "");
        }
        d.record(300_000_000L, 5_000_000L, PERIOD_NS, "at blocker");
        d.record(900_000_000L, 800_000_000L, PERIOD_NS, "at a paused JVM");
        assertEquals(102, d.probes());
        assertEquals(900.0, d.longestDelayMs());
        assertEquals(300.0, d.longestStallMs(), "the late look does not count as a stall");
        assertEquals("at blocker", d.stackAtLongestStall());
        // Nearest-rank quantiles of 1 .. 100 ms, 300 ms and 900 ms (102 values).
        assertEquals(51.0, d.delayQuantileMs(0.5));
        assertEquals(100.0, d.delayQuantileMs(0.98));
        assertEquals(900.0, d.delayQuantileMs(1.0));
        assertTrue(Double.isNaN(new EventThreadDelays().delayQuantileMs(0.5)));
    }

    @Test
    void seesWhereABlockedEventThreadIs() throws Exception {
        EventQueue.invokeAndWait(() -> { }); // start the event thread before measuring
        CountDownLatch blocking = new CountDownLatch(1);
        CountDownLatch release = new CountDownLatch(1);
        try (EdtWatchdog watchdog = new EdtWatchdog(20).start()) {
            // The watchdog learns which thread is the event thread from its first probe.
            assertTrue(SwingDriver.poll(() -> watchdog.probeCount() > 0, 30_000), "the first probe ran");
            EventQueue.invokeLater(() -> blockUntilReleased(blocking, release));
            assertTrue(blocking.await(30, java.util.concurrent.TimeUnit.SECONDS), "the event thread ran the blocker");
            boolean seen = SwingDriver.poll(() -> watchdog.delays().stackWhenLastSeenBusy()
                    .contains("blockUntilReleased"), 30_000);
            release.countDown();
            assertTrue(seen, "the watchdog saw the event thread in the blocker: "
                    + watchdog.delays().stackWhenLastSeenBusy());
            long before = watchdog.probeCount();
            assertTrue(SwingDriver.poll(() -> watchdog.probeCount() > before, 30_000), "the waiting probe ran once the event thread was free");
            assertTrue(watchdog.longestDelayMs() > 0);
            assertTrue(watchdog.delays().busySightings() >= 1);
        } finally {
            release.countDown();
        }
    }

    private static void blockUntilReleased(CountDownLatch blocking, CountDownLatch release) {
        blocking.countDown();
        try {
            release.await();
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
        }
    }

    @Test
    void takesADarkDesktopThemeForADarkLook() {
        assertTrue(Themes.isDarkThemeName("Adwaita-dark"));
        assertTrue(!Themes.isDarkThemeName("Adwaita") && !Themes.isDarkThemeName(null));
    }
}
