package org.tautline.app.ui;

import java.awt.GraphicsEnvironment;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.function.Consumer;

import javax.swing.AbstractButton;
import javax.swing.JDialog;
import javax.swing.JTextField;
import javax.swing.SwingUtilities;

import org.tautline.app.ui.project.RecentFiles;

/**
 * Runs the demo sweep in the workbench window on the simulated rig, as a person would (connect, start, accept the
 * cautions, wait for the verdict), while an {@link EdtWatchdog} measures the event thread: the body of
 * {@code tautline bench ui}. It needs a display (a desktop, or Xvfb).
 */
public final class DemoSweepInWindow {
    /**
     * What the run measured.
     *
     * @param steps the sweep's step count
     * @param wallS wall time from pressing Start to the verdict on show, s
     * @param periodMs the watchdog's period, ms
     * @param delays the watchdog's tally
     */
    public record Figures(int steps, double wallS, long periodMs, EventThreadDelays delays) {
    }

    private DemoSweepInWindow() {
    }

    /**
     * @param steps the sweep's step count (the demo plan has 1061), 2 or more
     * @param periodMs the watchdog's period, ms
     * @param progress told what the run is doing, in a few words, from the calling thread
     * @return the figures
     * @throws IllegalStateException when there is no display
     * @throws Exception when the window cannot be driven (a step timed out)
     */
    public static Figures run(int steps, long periodMs, Consumer<String> progress) throws Exception {
        if (GraphicsEnvironment.isHeadless()) {
            throw new IllegalStateException("bench ui needs a display: run it on a desktop or under Xvfb, for example"
                    + " 'xvfb-run java -jar app/target/tautline.jar bench ui'");
        }
        if (steps < 2) {
            throw new IllegalArgumentException("--steps must be 2 or more, got " + steps);
        }
        Path recent = Files.createTempDirectory("tautline-bench-ui").resolve("recent.txt");
        Workbench w = WindowSearch.onEdt(() -> {
            Workbench wb = Workbench.create(new RecentFiles(recent));
            wb.frame().setVisible(true);
            return wb;
        });
        try {
            SwingUtilities.invokeAndWait(() -> WindowSearch.find(w.frame(), JTextField.class, "stepCount")
                    .setText(Integer.toString(steps)));
            progress.accept("connecting the simulated rig");
            SwingUtilities.invokeAndWait(() -> {
                w.tabs().setSelectedIndex(1);
                WindowSearch.find(w.frame(), AbstractButton.class, "connect").doClick();
            });
            AbstractButton disconnect = WindowSearch.find(w.frame(), AbstractButton.class, "disconnect");
            WindowSearch.waitFor("the simulated rig to connect", 30, disconnect::isEnabled);
            SwingUtilities.invokeAndWait(() -> w.tabs().setSelectedIndex(2));
            // The click opens the modal cautions, which block that event: click from a later one, then accept them.
            SwingUtilities.invokeLater(WindowSearch.find(w.frame(), AbstractButton.class, "start")::doClick);
            JDialog cautions = WindowSearch.waitForDialog("Safety: before excitation", 30);
            AbstractButton accept = WindowSearch.onEdt(() -> WindowSearch.findButtonByText(cautions,
                    Workbench.START_CHOICE));
            progress.accept("sweeping " + steps + " steps and fitting, the event thread watched every " + periodMs
                    + " ms");
            long started = System.nanoTime();
            try (EdtWatchdog watchdog = new EdtWatchdog(periodMs).start()) {
                SwingUtilities.invokeAndWait(accept::doClick);
                WindowSearch.waitFor("the verdict", 3600, () -> w.results().current().isPresent());
                return new Figures(steps, (System.nanoTime() - started) / 1e9, periodMs, watchdog.delays());
            }
        } finally {
            SwingUtilities.invokeAndWait(() -> w.frame().dispose());
        }
    }

}
