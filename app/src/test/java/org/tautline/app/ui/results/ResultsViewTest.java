package org.tautline.app.ui.results;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assertions.fail;

import java.awt.Dimension;
import java.awt.GraphicsEnvironment;
import java.awt.image.BufferedImage;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.concurrent.CountDownLatch;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.atomic.AtomicReference;

import javax.imageio.ImageIO;
import javax.swing.JFrame;
import javax.swing.SwingUtilities;

import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.Assumptions;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.tautline.analysis.modal.Pole;
import org.tautline.app.qualify.DemoRun;
import org.tautline.app.ui.SwingDriver;
import org.tautline.app.qualify.QualificationResult;
import org.tautline.driver.sweep.SweepControl;
import org.tautline.driver.sweep.SweepEventListener;

/** Shows the results of the demo qualification in a window, saves a screenshot of every tab, and refits by a click. */
class ResultsViewTest {
    private static final Path SHOTS = Path.of("target", "screenshots");
    /** An invented origin for the header: the demo run at a fixed moment on the simulated rig. */
    static final ResultOrigin ORIGIN = ResultOrigin.sweep(java.time.Instant.parse("2025-06-11T12:03:12Z"), "sim",
            "Tautline simulated rig (demo)");
    private static QualificationResult demo;
    private static JFrame frame;
    private static ResultsView view;

    @BeforeAll
    static void showTheDemo() throws Exception {
        if (GraphicsEnvironment.isHeadless()) {
            if (System.getenv("CI") != null) {
                fail("CI must provide a display (Xvfb) for the results view tests: DISPLAY=" + System.getenv("DISPLAY"));
            }
            Assumptions.abort("no display: the results view tests need one (run them under Xvfb)");
        }
        demo = DemoRun.run(SweepEventListener.NONE, SweepControl.none()).result();
        SwingUtilities.invokeAndWait(() -> {
            view = new ResultsView();
            view.show(demo, ORIGIN);
            frame = new JFrame("Results");
            frame.setContentPane(view.component());
            frame.setSize(new Dimension(1280, 800));
            frame.setVisible(true);
        });
    }

    @AfterAll
    static void close() throws Exception {
        if (frame != null) {
            SwingUtilities.invokeAndWait(frame::dispose);
        }
    }

    @Test
    void savesAScreenshotOfEveryTab() throws Exception {
        int tabs = onEdt(() -> view.tabs().getTabCount());
        assertEquals(5, tabs);
        for (int i = 0; i < tabs; i++) {
            int index = i;
            BufferedImage image = onEdt(() -> {
                view.tabs().setSelectedIndex(index);
                frame.validate();
                // At a UI scale above 1 (-Dsun.java2d.uiScale=2) the image keeps the device pixels.
                double scale = frame.getGraphicsConfiguration().getDefaultTransform().getScaleX();
                BufferedImage img = new BufferedImage((int) Math.round(frame.getWidth() * scale),
                        (int) Math.round(frame.getHeight() * scale), BufferedImage.TYPE_INT_RGB);
                java.awt.Graphics2D g = img.createGraphics();
                g.scale(scale, scale);
                frame.paintAll(g);
                g.dispose();
                return img;
            });
            Files.createDirectories(SHOTS);
            double scale = onEdt(() -> frame.getGraphicsConfiguration().getDefaultTransform().getScaleX());
            String name = "results-" + (scale > 1 ? Math.round(100 * scale) + "pc-" : "") + (i + 1) + "-" + onEdt(() -> view.tabs().getTitleAt(index)).toLowerCase()
                    .replaceAll("[^a-z]+", "-") + ".png";
            ImageIO.write(image, "png", SHOTS.resolve(name).toFile());
            assertTrue(Files.size(SHOTS.resolve(name)) > 10_000, name);
        }
    }

    @Test
    void everyColumnOfTheModeTableIsWholeAt1280By800() throws Exception {
        javax.swing.JTable table = find(view.component(), javax.swing.JTable.class, "modeTable");
        SwingUtilities.invokeAndWait(() -> {
            view.show(demo, ORIGIN);
            view.tabs().setSelectedIndex(2);
            frame.validate();
        });
        onEdt(() -> {
            int shownWidth = table.getParent().getWidth();
            for (int c = 0; c < table.getColumnCount(); c++) {
                int needed = ColumnWidths.contentWidth(table, c);
                int width = table.getColumnModel().getColumn(c).getWidth();
                assertTrue(width >= needed, "column '" + table.getColumnName(c) + "' is " + width + " px wide and needs "
                        + needed + " px");
            }
            assertTrue(table.getColumnModel().getTotalColumnWidth() <= shownWidth, "the columns take "
                    + table.getColumnModel().getTotalColumnWidth() + " px of the " + shownWidth + " px shown");
            return null;
        });
        assertTrue(onEdt(() -> table.getColumnName(4)).contains("(1/kg)"), "the modal constant's unit is in its heading");
        assertTrue(onEdt(() -> String.valueOf(table.getValueAt(0, 3))).contains(" ± "), "damping with its uncertainty");
    }

    @Test
    void aWithdrawnResultIsMarkedNotCurrentAndNoLongerOfferedAndAClearedScreenSaysWhatToDo() throws Exception {
        SwingUtilities.invokeAndWait(() -> view.show(demo, ORIGIN));
        assertTrue(onEdt(() -> view.current().isPresent()));
        javax.swing.JLabel headline = find(view.component(), javax.swing.JLabel.class, "verdictHeadline");
        String outcome = onEdt(headline::getText);
        assertTrue(outcome.equals("PASS") || outcome.equals("NOT DETERMINABLE"), outcome);
        assertTrue(onEdt(() -> find(view.component(), javax.swing.JLabel.class, "runHeader").getText())
                .startsWith("Specimen " + demo.specimen().id() + "     Sweep started 2025-06-11 "));

        SwingUtilities.invokeAndWait(() -> view.withdraw("the sweep started at 14:03:12 was cancelled"));
        assertTrue(onEdt(() -> view.current().isEmpty()), "a result that is not current is not offered");
        assertEquals("NOT CURRENT", onEdt(headline::getText));
        javax.swing.JTextArea note = find(view.component(), javax.swing.JTextArea.class, "staleNote");
        assertTrue(onEdt(note::isVisible));
        String noteText = onEdt(note::getText);
        assertTrue(noteText.startsWith("Not current: the sweep started at 14:03:12 was cancelled. The result below is"
                + " from the sweep started 2025-06-11 "), noteText);
        shootFrame("results-not-current.png");

        SwingUtilities.invokeAndWait(() -> view.clear("A new project was started."));
        javax.swing.JTextArea empty = find(view.component(), javax.swing.JTextArea.class, "resultsEmpty");
        assertTrue(onEdt(empty::isShowing), "the empty screen is on show");
        assertTrue(onEdt(empty::getText).startsWith("A new project was started.\n\nNo result yet.\n\nTo get one, connect"));
        shootFrame("results-empty.png");
        SwingUtilities.invokeAndWait(() -> view.show(demo, ORIGIN));
        assertTrue(onEdt(() -> view.current().isPresent()));
    }

    @Test
    void theFrfCursorReadsTheNearestLineAndSnapsToAFittedMode() throws Exception {
        SwingUtilities.invokeAndWait(() -> view.show(demo, ORIGIN));
        double f1 = demo.modes().get(0).mode().frequencyHz();
        SwingUtilities.invokeAndWait(() -> view.frf().cursor().readAt(f1 * 0.997, 1.01));
        org.tautline.app.ui.chart.FrfReading snapped = onEdt(() -> view.frf().cursor().reading().orElseThrow());
        assertEquals(f1, snapped.cursorHz(), 0.0, "the cursor sits on the mode's natural frequency");
        assertTrue(snapped.text().startsWith("Mode harmonic " + demo.modes().get(0).harmonic()), snapped.text());
        assertTrue(snapped.text().contains("|H| ") && snapped.text().contains("phase "), snapped.text());
        SwingUtilities.invokeAndWait(() -> view.frf().cursor().readAt(f1 * 0.997, 1.0));
        org.tautline.app.ui.chart.FrfReading free = onEdt(() -> view.frf().cursor().reading().orElseThrow());
        assertTrue(free.mode().isEmpty(), "no snapping asked");
        assertEquals(f1 * 0.997, free.cursorHz(), f1 * 0.002, "the nearest measured line");
        assertTrue(onEdt(() -> find(view.component(), javax.swing.JLabel.class, "frfReadout").getText())
                .equals(free.text()));
    }

    private static void shootFrame(String name) throws Exception {
        BufferedImage image = onEdt(() -> {
            frame.validate();
            BufferedImage img = new BufferedImage(frame.getWidth(), frame.getHeight(), BufferedImage.TYPE_INT_RGB);
            java.awt.Graphics2D g = img.createGraphics();
            frame.paintAll(g);
            g.dispose();
            return img;
        });
        Files.createDirectories(SHOTS);
        ImageIO.write(image, "png", SHOTS.resolve(name).toFile());
    }

    @Test
    void droppingAPoleRefitsOffTheEventThreadAndTellsTheListener() throws Exception {
        // The invented stiff wire refits in well under a second; the demo's weighted refit takes longer.
        QualificationResult wire = SyntheticWire.qualified();
        CountDownLatch changed = new CountDownLatch(1);
        AtomicReference<QualificationResult> refit = new AtomicReference<>();
        Pole first = RefitTest.poleNear(wire.modal().selection().poles(), SyntheticWire.frequencyHz(2));
        SwingUtilities.invokeAndWait(() -> {
            view.show(wire, ORIGIN);
            view.onResultChanged(r -> {
                assertTrue(SwingUtilities.isEventDispatchThread());
                refit.set(r);
                changed.countDown();
            });
            PoleChoice choice = PoleChoice.of(wire.modal().chart(), wire.modal().selection());
            assertTrue(choice.isChosen(first));
        });
        SwingUtilities.invokeAndWait(() -> clickPole(first));
        assertTrue(changed.await(30, TimeUnit.SECONDS), "the refit did not finish: " + onEdt(() -> statusText()));
        assertTrue(refit.get().modal().selection().poles().stream().noneMatch(first::equals),
                "the dropped pole is out of the selection the refit used");
        assertEquals(wire.modes().size() - 1, refit.get().modes().size());
        assertEquals(wire.modes().size() - 1, onEdt(() -> modeRowsShown()), "the mode table shows the refit");
        SwingUtilities.invokeAndWait(() -> view.show(demo, ORIGIN));
    }

    private static String statusText() {
        return find(view.component(), javax.swing.JLabel.class, "refitStatus").getText();
    }

    private static int modeRowsShown() {
        return find(view.component(), javax.swing.JTable.class, "modeTable").getRowCount();
    }

    private static <T extends java.awt.Component> T find(java.awt.Container root, Class<T> type, String name) {
        for (java.awt.Component c : root.getComponents()) {
            if (type.isInstance(c) && name.equals(c.getName())) {
                return type.cast(c);
            }
            if (c instanceof java.awt.Container inner) {
                T found = findOrNull(inner, type, name);
                if (found != null) {
                    return found;
                }
            }
        }
        throw new AssertionError("no " + type.getSimpleName() + " named " + name);
    }

    private static <T extends java.awt.Component> T findOrNull(java.awt.Container root, Class<T> type, String name) {
        try {
            return find(root, type, name);
        } catch (AssertionError e) {
            return null;
        }
    }

    private static void clickPole(Pole pole) {
        try {
            java.lang.reflect.Method m = ResultsView.class.getDeclaredMethod("poleClicked", Pole.class);
            m.setAccessible(true);
            m.invoke(view, pole);
        } catch (ReflectiveOperationException e) {
            throw new AssertionError(e);
        }
    }

    private static <T> T onEdt(java.util.concurrent.Callable<T> call) throws Exception {
        return SwingDriver.onEdt(call);
    }
}
