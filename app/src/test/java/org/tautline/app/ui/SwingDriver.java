package org.tautline.app.ui;

import java.awt.Component;
import java.awt.Container;
import java.awt.GraphicsEnvironment;
import java.awt.Window;
import java.awt.image.BufferedImage;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.concurrent.Callable;
import java.util.concurrent.TimeUnit;
import java.util.function.BooleanSupplier;

import javax.imageio.ImageIO;
import javax.swing.AbstractButton;
import javax.swing.JDialog;

import org.junit.jupiter.api.Assumptions;

/** Finding components, waiting on the event thread and saving screenshots, for the workbench tests. */
public final class SwingDriver {
    public static final Path SHOTS = Path.of("target", "screenshots");

    private SwingDriver() {
    }

    /** Skips locally without a display; fails under CI, which must provide one. */
    public static void needDisplay() {
        if (GraphicsEnvironment.isHeadless()) {
            if (System.getenv("CI") != null) {
                throw new AssertionError("CI must provide a display (Xvfb) for the workbench tests: DISPLAY="
                        + System.getenv("DISPLAY"));
            }
            Assumptions.abort("no display: the workbench tests need one (run them under Xvfb)");
        }
    }

    public static <T> T onEdt(Callable<T> call) throws Exception {
        return WindowSearch.onEdt(call);
    }

    public static void waitFor(String what, double seconds, Callable<Boolean> condition) throws Exception {
        WindowSearch.waitFor(what, seconds, condition);
    }

    public static JDialog waitForDialog(String title) throws Exception {
        return WindowSearch.waitForDialog(title, 10);
    }

    public static <T extends Component> T find(Container root, Class<T> type, String name) {
        return WindowSearch.find(root, type, name);
    }

    public static AbstractButton findButtonByText(Container root, String text) {
        return WindowSearch.findButtonByText(root, text);
    }

    /** Paints a window into an image at the screen's scale and saves it as PNG. */
    public static void shoot(Window window, String name) throws Exception {
        BufferedImage image = onEdt(() -> {
            double scale = window.getGraphicsConfiguration().getDefaultTransform().getScaleX();
            int w = (int) Math.round(window.getWidth() * scale);
            int h = (int) Math.round(window.getHeight() * scale);
            BufferedImage img = new BufferedImage(w, h, BufferedImage.TYPE_INT_RGB);
            java.awt.Graphics2D g = img.createGraphics();
            g.scale(scale, scale);
            window.paintAll(g);
            g.dispose();
            return img;
        });
        try {
            Files.createDirectories(SHOTS);
            ImageIO.write(image, "png", SHOTS.resolve(name).toFile());
        } catch (IOException e) {
            throw new AssertionError("could not save the screenshot " + name + ": " + e.getMessage(), e);
        }
    }

    public static boolean poll(BooleanSupplier s, long timeoutMs) throws InterruptedException {
        long deadline = System.nanoTime() + TimeUnit.MILLISECONDS.toNanos(timeoutMs);
        while (System.nanoTime() < deadline) {
            if (s.getAsBoolean()) {
                return true;
            }
            Thread.sleep(20);
        }
        return false;
    }
}
