package org.tautline.app.ui;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.EventQueue;

import org.junit.jupiter.api.Test;

/** The event queue runs without a display, so the watchdog can be checked headless. */
class EdtWatchdogTest {
    @Test
    void recordsAStallOfTheEventThreadAndWhereItWas() throws Exception {
        EventQueue.invokeAndWait(() -> { }); // start the event thread before measuring
        try (EdtWatchdog watchdog = new EdtWatchdog(20).start()) {
            Thread.sleep(200);
            assertTrue(watchdog.longestStallMs() < 150, "idle event thread: " + watchdog.longestStallMs() + " ms");
            EventQueue.invokeAndWait(EdtWatchdogTest::blockFor300Ms);
            Thread.sleep(100);
            assertTrue(watchdog.longestStallMs() >= 200, "after a 300 ms block: " + watchdog.longestStallMs() + " ms");
            assertTrue(watchdog.longestDelayMs() >= watchdog.longestStallMs());
            assertTrue(watchdog.stackAtLongestStall().contains("blockFor300Ms"), watchdog.stackAtLongestStall());
            assertTrue(watchdog.probeCount() > 3);
        }
    }

    private static void blockFor300Ms() {
        long end = System.nanoTime() + 300_000_000L;
        while (System.nanoTime() < end) {
            Thread.onSpinWait();
        }
    }

    @Test
    void takesADarkDesktopThemeForADarkLook() {
        assertTrue(Themes.isDarkThemeName("Adwaita-dark"));
        assertTrue(!Themes.isDarkThemeName("Adwaita") && !Themes.isDarkThemeName(null));
    }
}
