package org.tautline.app.ui;

import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assertions.fail;

import java.awt.Component;
import java.awt.Container;
import java.awt.GraphicsEnvironment;
import java.awt.Window;
import java.awt.image.BufferedImage;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.atomic.AtomicReference;

import javax.imageio.ImageIO;
import javax.swing.AbstractButton;
import javax.swing.JDialog;
import javax.swing.JFrame;
import javax.swing.JTextArea;
import javax.swing.SwingUtilities;

import org.junit.jupiter.api.Assumptions;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

/** Drives the window through a demo qualification on a real (virtual) display and saves screenshots. */
class WorkbenchTest {
    private static final Path SHOTS = Path.of("target", "screenshots");

    @BeforeAll
    static void needsADisplay() {
        if (GraphicsEnvironment.isHeadless()) {
            if (System.getenv("CI") != null) {
                fail("CI must provide a display (Xvfb) for the workbench tests: DISPLAY=" + System.getenv("DISPLAY"));
            }
            Assumptions.abort("no display: the workbench tests need one (run them under Xvfb)");
        }
    }

    @Test
    void runsTheDemoFromTheWindowAndShowsTheVerdict() throws Exception {
        AtomicReference<JFrame> frame = new AtomicReference<>();
        SwingUtilities.invokeAndWait(() -> {
            JFrame f = Workbench.buildForTest();
            f.setVisible(true);
            frame.set(f);
        });
        try {
            shoot(frame.get(), "1-start.png");
            AbstractButton run = find(frame.get(), AbstractButton.class, "run");
            // The click opens the modal safety dialog; it blocks that event, so click from a later one.
            SwingUtilities.invokeLater(run::doClick);
            JDialog safety = waitForDialog();
            shoot(safety, "2-safety.png");
            AbstractButton ok = findByText(safety, Workbench.START_CHOICE);
            SwingUtilities.invokeAndWait(ok::doClick);
            JTextArea results = find(frame.get(), JTextArea.class, "results");
            long started = System.nanoTime();
            long deadline = started + TimeUnit.SECONDS.toNanos(180);
            String text = "";
            boolean runningShot = false;
            while (System.nanoTime() < deadline) {
                text = onEdt(results::getText);
                if (text.contains("Verdict")) {
                    break;
                }
                if (!runningShot && System.nanoTime() - started > TimeUnit.SECONDS.toNanos(2)) {
                    shoot(frame.get(), "3-running.png");
                    runningShot = true;
                }
                Thread.sleep(100);
            }
            assertTrue(text.contains("Verdict: PASS"), text);
            shoot(frame.get(), "4-results.png");
        } finally {
            SwingUtilities.invokeAndWait(() -> frame.get().dispose());
        }
    }

    private static JDialog waitForDialog() throws Exception {
        long deadline = System.nanoTime() + TimeUnit.SECONDS.toNanos(10);
        while (System.nanoTime() < deadline) {
            JDialog dialog = onEdt(() -> {
                for (Window w : Window.getWindows()) {
                    if (w instanceof JDialog && w.isShowing()) {
                        return (JDialog) w;
                    }
                }
                return null;
            });
            if (dialog != null) {
                return dialog;
            }
            Thread.sleep(50);
        }
        throw new AssertionError("the safety cautions were not shown before excitation");
    }

    private static <T> T onEdt(java.util.concurrent.Callable<T> call) throws Exception {
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
            throw error.get();
        }
        return result.get();
    }

    private static <T extends Component> T find(Container root, Class<T> type, String name) {
        for (Component c : root.getComponents()) {
            if (type.isInstance(c) && name.equals(c.getName())) {
                return type.cast(c);
            }
            if (c instanceof Container) {
                T inner = findOrNull((Container) c, type, name);
                if (inner != null) {
                    return inner;
                }
            }
        }
        throw new AssertionError("no " + type.getSimpleName() + " named '" + name + "' in the window");
    }

    private static <T extends Component> T findOrNull(Container root, Class<T> type, String name) {
        try {
            return find(root, type, name);
        } catch (AssertionError e) {
            return null;
        }
    }

    private static AbstractButton findByText(Container root, String text) {
        for (Component c : root.getComponents()) {
            if (c instanceof AbstractButton && text.equals(((AbstractButton) c).getText())) {
                return (AbstractButton) c;
            }
            if (c instanceof Container) {
                try {
                    return findByText((Container) c, text);
                } catch (AssertionError e) {
                    // keep looking in the siblings
                }
            }
        }
        throw new AssertionError("no button '" + text + "'");
    }

    private static void shoot(Window window, String name) throws Exception {
        BufferedImage image = onEdt(() -> {
            BufferedImage img = new BufferedImage(window.getWidth(), window.getHeight(), BufferedImage.TYPE_INT_RGB);
            window.paintAll(img.getGraphics());
            return img;
        });
        try {
            Files.createDirectories(SHOTS);
            ImageIO.write(image, "png", SHOTS.resolve(name).toFile());
        } catch (IOException e) {
            throw new AssertionError("could not save the screenshot " + name + ": " + e.getMessage(), e);
        }
    }
}
