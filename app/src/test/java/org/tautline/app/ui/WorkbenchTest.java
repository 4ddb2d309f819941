package org.tautline.app.ui;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.tautline.app.ui.SwingDriver.find;
import static org.tautline.app.ui.SwingDriver.onEdt;
import static org.tautline.app.ui.SwingDriver.shoot;
import static org.tautline.app.ui.SwingDriver.waitFor;

import java.nio.file.Path;

import javax.swing.AbstractButton;
import javax.swing.JDialog;
import javax.swing.JFrame;
import javax.swing.JLabel;
import javax.swing.JProgressBar;
import javax.swing.JTabbedPane;
import javax.swing.JTextArea;
import javax.swing.JTextField;
import javax.swing.SwingUtilities;

import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.tautline.app.ui.project.RecentFiles;

/**
 * Drives the window through a whole demo qualification on the simulated rig (setup, connect, run
 * with a pause and a resume, results, verdict) on a real (virtual) display, saving a screenshot of each screen.
 */
class WorkbenchTest {
    @TempDir
    Path home;

    @BeforeAll
    static void needsADisplay() {
        SwingDriver.needDisplay();
    }

    @Test
    void qualifiesTheDemoWireFromConnectToVerdictWithoutStallingTheEventThread() throws Exception {
        Workbench w = onEdt(() -> {
            Workbench wb = Workbench.create(new RecentFiles(home.resolve("recent.txt")));
            wb.frame().setVisible(true);
            return wb;
        });
        JFrame frame = w.frame();
        try {
            shoot(frame, "1-setup.png");
            JTextField span = find(frame, JTextField.class, "lengthM");
            JLabel spanProblem = find(frame, JLabel.class, "problem.lengthM");
            SwingUtilities.invokeAndWait(() -> span.setText("-0.6"));
            waitFor("the inline message on the span", 2, spanProblem::isVisible);
            assertEquals("<html>got '-0.6'; expected a positive number of m</html>", onEdt(spanProblem::getText));
            shoot(frame, "1b-setup-invalid.png");
            SwingUtilities.invokeAndWait(() -> span.setText("0.6"));
            waitFor("the span message to go", 2, () -> !spanProblem.isVisible());

            SwingUtilities.invokeAndWait(() -> w.tabs().setSelectedIndex(1));
            AbstractButton connect = find(frame, AbstractButton.class, "connect");
            SwingUtilities.invokeAndWait(connect::doClick);
            AbstractButton disconnect = find(frame, AbstractButton.class, "disconnect");
            waitFor("the simulated rig to connect", 10, disconnect::isEnabled);
            JTextArea identity = find(frame, JTextArea.class, "rigIdentity");
            String health = onEdt(identity::getText);
            assertTrue(health.contains("Health: ready"), health);
            shoot(frame, "2-rig.png");

            SwingUtilities.invokeAndWait(() -> w.tabs().setSelectedIndex(2));
            AbstractButton start = find(frame, AbstractButton.class, "start");
            // The click opens the modal safety dialog, which blocks that event: click from a later one.
            SwingUtilities.invokeLater(start::doClick);
            JDialog safety = SwingDriver.waitForDialog("Safety: before excitation");
            shoot(safety, "3-safety.png");
            AbstractButton ok = SwingDriver.findButtonByText(safety, Workbench.START_CHOICE);
            JProgressBar progress = find(frame, JProgressBar.class, "runProgress");
            AbstractButton pause = find(frame, AbstractButton.class, "pause");
            AbstractButton resume = find(frame, AbstractButton.class, "resume");
            // Screenshots paint on the event thread, so none is taken while the watchdog measures.
            SwingUtilities.invokeAndWait(ok::doClick);
            // Measured from the first steps on, once the sweep is under way.
            waitFor("the first steps", 30, () -> progress.getValue() > 20);
            try (EdtWatchdog watchdog = new EdtWatchdog(20).start()) {
                waitFor("a few hundred steps", 30, () -> progress.getValue() > 300);
                SwingUtilities.invokeAndWait(pause::doClick);
                waitFor("the pause to ramp down", 10, resume::isEnabled);
                assertNoStall(watchdog);
            }
            String paused = onEdt(progress::getString);
            assertTrue(paused.startsWith("paused after "), paused);
            shoot(frame, "4-run-paused.png");
            try (EdtWatchdog watchdog = new EdtWatchdog(20).start()) {
                SwingUtilities.invokeAndWait(resume::doClick);
                waitFor("the sweep to go on", 10, () -> progress.getString().startsWith("step "));
                waitFor("the last step", 60, () -> progress.getValue() == progress.getMaximum());
                assertNoStall(watchdog);
            }
            JLabel outcome = find(frame, JLabel.class, "outcome");
            waitFor("the verdict", 60, () -> outcome.getText().startsWith("Verdict"));
            String text = onEdt(outcome::getText);
            String reasons = onEdt(find(frame, javax.swing.text.JTextComponent.class, "reasons")::getText);
            // The demo wire passes its specification; where the pause fell changes the data a little, and the sixth
            // harmonic's two polarisations, one half-power bandwidth apart, are at the edge of what the modal fit
            // resolves: it may leave the stinger position too uncertain to judge. Never a FAIL.
            assertTrue(text.equals("Verdict: PASS") || text.equals("Verdict: NOT_DETERMINABLE")
                    && reasons.contains("the uncertainty is too large to decide"), text + "\n" + reasons);
            assertEquals(3, (int) onEdt(() -> w.tabs().getSelectedIndex()));
            JTabbedPane resultTabs = find(frame, JTabbedPane.class, "resultTabs");
            int resultTabCount = onEdt(resultTabs::getTabCount);
            for (int i = 0; i < resultTabCount; i++) {
                int tab = i;
                SwingUtilities.invokeAndWait(() -> resultTabs.setSelectedIndex(tab));
                shoot(frame, "6-results-" + (i + 1) + ".png");
            }
            SwingUtilities.invokeAndWait(() -> resultTabs.setSelectedIndex(0));
            SwingUtilities.invokeAndWait(() -> Themes.apply(Themes.Choice.DARK));
            shoot(frame, "7-results-dark.png");
            SwingUtilities.invokeAndWait(() -> w.tabs().setSelectedIndex(2));
            shoot(frame, "8-run-dark.png");
            SwingUtilities.invokeAndWait(() -> Themes.apply(Themes.Choice.LIGHT));
            // The lot screen: add the result to a new register file, then read the lot's statistics back.
            SwingUtilities.invokeAndWait(() -> w.tabs().setSelectedIndex(4));
            JTextField register = find(frame, JTextField.class, "lotRegister");
            Path registerFile = home.resolve("lots.sqlite");
            SwingUtilities.invokeAndWait(() -> register.setText(registerFile.toString()));
            AbstractButton addToLot = find(frame, AbstractButton.class, "addToLot");
            SwingUtilities.invokeAndWait(addToLot::doClick);
            JLabel lotMessage = find(frame, JLabel.class, "lotMessage");
            waitFor("the lot's statistics", 30, () -> lotMessage.getText().startsWith("tension:"));
            javax.swing.JTable lotFigures = find(frame, javax.swing.JTable.class, "lotFigures");
            assertTrue(onEdt(lotFigures::getRowCount) >= 5, "one row per figure of the qualification");
            assertEquals("tension", onEdt(() -> lotFigures.getValueAt(lotFigures.getSelectedRow(), 0)));
            assertEquals("1", onEdt(() -> lotFigures.getValueAt(lotFigures.getSelectedRow(), 2)));
            SwingUtilities.invokeAndWait(addToLot::doClick);
            waitFor("the second qualification", 30, () -> "2".equals(lotFigures.getValueAt(0, 2)));
            shoot(frame, "10-lot.png");
        } finally {
            SwingUtilities.invokeAndWait(() -> {
                w.files().edited();
                frame.dispose();
            });
        }
    }

    private static void assertNoStall(EdtWatchdog watchdog) {
        assertTrue(watchdog.probeCount() > 20, "the watchdog ran " + watchdog.probeCount() + " probes");
        System.out.printf(java.util.Locale.ROOT, "event thread: longest stall %.1f ms, longest delay of any kind %.1f ms,"
                + " %d probes%n", watchdog.longestStallMs(), watchdog.longestDelayMs(), watchdog.probeCount());
        assertTrue(watchdog.longestStallMs() < 100, "the event thread stalled for " + watchdog.longestStallMs()
                + " ms during the sweep; it was at" + watchdog.stackAtLongestStall());
    }
}
