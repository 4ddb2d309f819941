package org.tautline.app.cli;

import java.io.PrintStream;
import java.util.Locale;

import org.tautline.analysis.ProgressListener;
import org.tautline.driver.sweep.SweepEvent;
import org.tautline.driver.sweep.SweepEventListener;
import org.tautline.driver.sweep.WallTimeEstimate;

/**
 * A one-line text progress bar with ETA, written to a stream (normally standard error).
 *
 * <p>On a terminal the line is redrawn in place at most ten times a second; when the stream is not
 * a terminal a plain line is printed at every tenth of the way so logs stay short. It follows a
 * sweep ({@link #sweep()}) or a long file job ({@link #frames(String)}).
 */
final class ProgressBar {
    private static final int WIDTH = 30;
    private static final long REDRAW_INTERVAL_NS = 100_000_000L;

    private final PrintStream out;
    private final boolean interactive;
    private final long startNs = System.nanoTime();
    private long lastDrawNs;
    private int lastTenth = -1;
    private boolean finished;

    ProgressBar(PrintStream out, boolean interactive) {
        this.out = out;
        this.interactive = interactive;
    }

    /** @return a sweep listener drawing, after every completed step, the pass, step, frequency, rig time and ETA */
    SweepEventListener sweep() {
        WallTimeEstimate eta = new WallTimeEstimate();
        return e -> {
            if (e.completed()) {
                boolean last = e.pass() == e.passCount() - 1 && e.stepNumber() >= e.plannedSteps();
                draw(e.fraction(), last, line(e, eta.remainingWallS(e)));
            }
        };
    }

    /**
     * A listener for work counted in frames; the ETA comes from the rate so far.
     *
     * @param what what is being read, for the line (a file name)
     * @return the listener
     */
    ProgressListener frames(String what) {
        return (done, total) -> {
            double fraction = total > 0 ? Math.min(1.0, (double) done / total) : 0.0;
            double elapsedS = (System.nanoTime() - startNs) * 1e-9;
            double etaS = fraction > 0 ? elapsedS * (1 - fraction) / fraction : Double.NaN;
            String amount = total > 0 ? String.format(Locale.ROOT, "%.2f of %.2f M frames", done / 1e6, total / 1e6)
                    : String.format(Locale.ROOT, "%.2f M frames", done / 1e6);
            draw(fraction, total > 0 && done >= total, bar(fraction) + "  " + what + "  " + amount + "  " + eta(etaS));
        };
    }

    private void draw(double fraction, boolean last, String line) {
        if (finished) {
            return;
        }
        finished = last;
        if (interactive) {
            long now = System.nanoTime();
            if (!last && now - lastDrawNs < REDRAW_INTERVAL_NS) {
                return;
            }
            lastDrawNs = now;
            out.print("\r" + line + (last ? "\n" : ""));
        } else {
            int tenth = (int) Math.floor(fraction * 10);
            if (tenth == lastTenth && !last) {
                return;
            }
            lastTenth = tenth;
            out.println(line);
        }
        out.flush();
    }

    static String line(SweepEvent e, double remainingWallS) {
        String pass = e.passCount() > 1 ? String.format(Locale.ROOT, "pass %d/%d  ", e.pass() + 1, e.passCount()) : "";
        return String.format(Locale.ROOT, "%s  %sstep %d/%d  %8.2f Hz  rig %6.1f s  %s", bar(e.fraction()), pass,
                e.stepNumber(), Math.max(e.stepNumber(), e.plannedSteps()), e.frequencyHz(), e.rigTimeS(),
                eta(remainingWallS));
    }

    private static String bar(double fraction) {
        int filled = (int) Math.round(fraction * WIDTH);
        return String.format(Locale.ROOT, "[%s] %3.0f%%", "#".repeat(filled) + ".".repeat(WIDTH - filled), 100 * fraction);
    }

    private static String eta(double seconds) {
        return Double.isFinite(seconds) ? String.format(Locale.ROOT, "ETA %4.0f s", seconds) : "ETA    ? s";
    }
}
