package org.tautline.app.cli;

import java.io.PrintStream;
import java.util.Locale;

import org.tautline.driver.sweep.SweepListener;
import org.tautline.driver.sweep.SweepProgress;

/**
 * A one-line text progress bar with ETA for sweeps, written to a stream (normally standard error).
 *
 * <p>On a terminal the line is redrawn in place at most ten times a second; when the stream is not
 * a terminal a plain line is printed at every tenth of the way so logs stay short.
 */
final class ProgressBar implements SweepListener {
    private static final int WIDTH = 30;
    private static final long REDRAW_INTERVAL_NS = 100_000_000L;

    private final PrintStream out;
    private final boolean interactive;
    private long lastDrawNs;
    private int lastTenth = -1;

    ProgressBar(PrintStream out, boolean interactive) {
        this.out = out;
        this.interactive = interactive;
    }

    @Override
    public void onStep(SweepProgress progress) {
        boolean last = progress.completedSteps() == progress.totalSteps();
        if (interactive) {
            long now = System.nanoTime();
            if (!last && now - lastDrawNs < REDRAW_INTERVAL_NS) {
                return;
            }
            lastDrawNs = now;
            out.print("\r" + line(progress) + (last ? "\n" : ""));
        } else {
            int tenth = (int) Math.floor(progress.fraction() * 10);
            if (tenth == lastTenth && !last) {
                return;
            }
            lastTenth = tenth;
            out.println(line(progress));
        }
        out.flush();
    }

    static String line(SweepProgress p) {
        int filled = (int) Math.round(p.fraction() * WIDTH);
        String bar = "#".repeat(filled) + ".".repeat(WIDTH - filled);
        String eta = Double.isFinite(p.remainingWallTimeS())
                ? String.format(Locale.ROOT, "ETA %4.0f s", p.remainingWallTimeS()) : "ETA    ? s";
        return String.format(Locale.ROOT, "[%s] %3.0f%%  step %d/%d  %8.2f Hz  rig %6.1f s  %s", bar,
                100 * p.fraction(), p.completedSteps(), p.totalSteps(), p.frequencyHz(), p.rigTimeS(), eta);
    }
}
