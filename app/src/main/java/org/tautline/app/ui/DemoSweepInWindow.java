package org.tautline.app.ui;

import java.awt.Component;
import java.awt.Container;
import java.awt.GraphicsEnvironment;
import java.awt.Window;
import java.lang.reflect.InvocationTargetException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.concurrent.Callable;
import java.util.concurrent.atomic.AtomicReference;
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
        Workbench w = onEdt(() -> {
            Workbench wb = Workbench.create(new RecentFiles(recent));
            wb.frame().setVisible(true);
            return wb;
        });
        try {
            SwingUtilities.invokeAndWait(() -> find(w.frame(), JTextField.class, "stepCount").setText(Integer.toString(steps)));
            progress.accept("connecting the simulated rig");
            SwingUtilities.invokeAndWait(() -> {
                w.tabs().setSelectedIndex(1);
                find(w.frame(), AbstractButton.class, "connect").doClick();
            });
            AbstractButton disconnect = find(w.frame(), AbstractButton.class, "disconnect");
            waitFor("the simulated rig to connect", 30, disconnect::isEnabled);
            SwingUtilities.invokeAndWait(() -> w.tabs().setSelectedIndex(2));
            // The click opens the modal cautions, which block that event: click from a later one, then accept them.
            SwingUtilities.invokeLater(find(w.frame(), AbstractButton.class, "start")::doClick);
            JDialog cautions = waitForDialog("Safety: before excitation");
            AbstractButton accept = onEdt(() -> findButton(cautions, Workbench.START_CHOICE));
            progress.accept("sweeping " + steps + " steps and fitting, the event thread watched every " + periodMs
                    + " ms");
            long started = System.nanoTime();
            try (EdtWatchdog watchdog = new EdtWatchdog(periodMs).start()) {
                SwingUtilities.invokeAndWait(accept::doClick);
                waitFor("the verdict", 3600, () -> w.results().current().isPresent());
                return new Figures(steps, (System.nanoTime() - started) / 1e9, periodMs, watchdog.delays());
            }
        } finally {
            SwingUtilities.invokeAndWait(() -> w.frame().dispose());
        }
    }

    private static <T> T onEdt(Callable<T> call) throws InterruptedException, InvocationTargetException {
        AtomicReference<T> result = new AtomicReference<>();
        AtomicReference<Exception> error = new AtomicReference<>();
        SwingUtilities.invokeAndWait(() -> {
            try {
                result.set(call.call());
            } catch (Exception e) {
                error.set(e);
            }
        });
        if (error.get() != null) {
            throw new InvocationTargetException(error.get());
        }
        return result.get();
    }

    private static void waitFor(String what, double seconds, Callable<Boolean> condition) throws Exception {
        long deadline = System.nanoTime() + (long) (seconds * 1e9);
        while (System.nanoTime() < deadline) {
            if (onEdt(condition)) {
                return;
            }
            Thread.sleep(100);
        }
        throw new IllegalStateException("timed out after " + seconds + " s waiting for " + what);
    }

    private static JDialog waitForDialog(String title) throws Exception {
        AtomicReference<JDialog> found = new AtomicReference<>();
        waitFor("the dialog '" + title + "'", 30, () -> {
            for (Window window : Window.getWindows()) {
                if (window instanceof JDialog d && d.isShowing() && title.equals(d.getTitle())) {
                    found.set(d);
                    return true;
                }
            }
            return false;
        });
        return found.get();
    }

    private static <T extends Component> T find(Container root, Class<T> type, String name) {
        T found = search(root, type, c -> name.equals(c.getName()));
        if (found == null) {
            throw new IllegalStateException("the workbench has no " + type.getSimpleName() + " named '" + name + "'");
        }
        return found;
    }

    private static AbstractButton findButton(Container root, String text) {
        AbstractButton found = search(root, AbstractButton.class, c -> text.equals(((AbstractButton) c).getText()));
        if (found == null) {
            throw new IllegalStateException("the cautions have no button '" + text + "'");
        }
        return found;
    }

    private static <T extends Component> T search(Container root, Class<T> type,
                                                  java.util.function.Predicate<Component> match) {
        for (Component c : root.getComponents()) {
            if (type.isInstance(c) && match.test(c)) {
                return type.cast(c);
            }
            if (c instanceof Container inner) {
                T found = search(inner, type, match);
                if (found != null) {
                    return found;
                }
            }
        }
        return null;
    }
}
