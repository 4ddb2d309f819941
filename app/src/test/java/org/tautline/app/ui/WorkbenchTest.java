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
 * Drives the window through a whole demo qualification on the simulated rig (setup, connect, run with a pause and a
 * resume, results, verdict, lot, then a second run cancelled) on a real (virtual) display, saving a screenshot of
 * every screen and every results tab in the light and the dark look. About behaviour only: how responsive the event
 * thread stays is measured by {@code tautline bench ui}, which prints figures.
 */
class WorkbenchTest {
    @TempDir
    Path home;

    @BeforeAll
    static void needsADisplay() {
        SwingDriver.needDisplay();
    }

    @Test
    void qualifiesTheDemoWireFromConnectToVerdictAndMarksTheResultNotCurrentWhenTheNextRunIsCancelled()
            throws Exception {
        Workbench w = onEdt(() -> {
            Workbench wb = Workbench.create(new RecentFiles(home.resolve("recent.txt")));
            wb.frame().setVisible(true);
            return wb;
        });
        JFrame frame = w.frame();
        try {
            shoot(frame, "1-setup.png");
            String rigTime = onEdt(find(frame, JLabel.class, "rigTime")::getText);
            assertTrue(rigTime.startsWith("<html>Rig time: about "), rigTime);
            JTextField span = find(frame, JTextField.class, "lengthM");
            JLabel spanProblem = find(frame, JLabel.class, "problem.lengthM");
            SwingUtilities.invokeAndWait(() -> span.setText("-0.6"));
            waitFor("the inline message on the span", 2, spanProblem::isVisible);
            assertEquals("<html>got '-0.6'; expected a positive number of m</html>", onEdt(spanProblem::getText));
            shoot(frame, "1b-setup-invalid.png");
            SwingUtilities.invokeAndWait(() -> span.setText("0.6"));
            waitFor("the span message to go", 2, () -> !spanProblem.isVisible());

            // Before any run the results screen says what to do next.
            SwingUtilities.invokeAndWait(() -> w.tabs().setSelectedIndex(3));
            JTextArea empty = find(frame, JTextArea.class, "resultsEmpty");
            String emptyText = onEdt(empty::getText);
            assertTrue(emptyText.startsWith("No result yet."), emptyText);
            shoot(frame, "0-results-empty.png");

            SwingUtilities.invokeAndWait(() -> w.tabs().setSelectedIndex(1));
            assertTrue(onEdt(find(frame, JTextArea.class, "rigIdentity")::getText).startsWith("No rig connected."));
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
            SwingUtilities.invokeAndWait(ok::doClick);
            waitFor("a few hundred steps", 60, () -> progress.getValue() > 300);
            SwingUtilities.invokeAndWait(pause::doClick);
            waitFor("the pause to ramp down", 10, resume::isEnabled);
            String paused = onEdt(progress::getString);
            assertTrue(paused.startsWith("paused after "), paused);
            shoot(frame, "4-run-paused.png");
            SwingUtilities.invokeAndWait(resume::doClick);
            waitFor("the sweep to go on", 10, () -> progress.getString().startsWith("step "));
            waitFor("the last step", 90, () -> progress.getValue() == progress.getMaximum());
            JLabel headline = find(frame, JLabel.class, "verdictHeadline");
            waitFor("the verdict", 60, () -> headline.isShowing() && !headline.getText().isEmpty());
            String text = onEdt(headline::getText);
            String reasons = onEdt(find(frame, javax.swing.text.JTextComponent.class, "reasons")::getText);
            // The demo wire passes its specification; where the pause fell changes the data a little, and the sixth
            // harmonic's two polarisations, one half-power bandwidth apart, are at the edge of what the modal fit
            // resolves: it may leave the stinger position too uncertain to judge. Never a FAIL.
            assertTrue(text.equals("PASS") || text.equals("NOT DETERMINABLE")
                    && reasons.contains("the uncertainty reaches across a limit"), text + "\n" + reasons);
            assertTrue(onEdt(find(frame, JLabel.class, "runHeader")::getText).startsWith("Specimen DEMO-TW-0042     Sweep"
                    + " started "), "the run header names the specimen and the run");
            assertEquals(3, (int) onEdt(() -> w.tabs().getSelectedIndex()));
            // The rig was excited once more after the sweep, for the level check; the window says when all is over.
            String finished = onEdt(find(frame, JLabel.class, "statusMessage")::getText);
            assertTrue(finished.startsWith("Finished: the sweep") && finished.contains("the output is off"), finished);
            shootEveryScreen(w, "");
            SwingUtilities.invokeAndWait(() -> Themes.apply(Themes.Choice.DARK));
            shootEveryScreen(w, "dark-");
            SwingUtilities.invokeAndWait(() -> Themes.apply(Themes.Choice.LIGHT));

            // The lot screen: add the result to a new register file, then read the lot's statistics back.
            SwingUtilities.invokeAndWait(() -> w.tabs().setSelectedIndex(4));
            JTextField register = find(frame, JTextField.class, "lotRegister");
            Path registerFile = home.resolve("lots.sqlite");
            SwingUtilities.invokeAndWait(() -> register.setText(registerFile.toString()));
            AbstractButton addToLot = find(frame, AbstractButton.class, "addToLot");
            assertTrue(onEdt(addToLot::isEnabled), "a current result can be added to a lot");
            SwingUtilities.invokeAndWait(addToLot::doClick);
            JLabel lotMessage = find(frame, JLabel.class, "lotMessage");
            waitFor("the lot's statistics", 30, () -> lotMessage.getText().startsWith("tension:"));
            javax.swing.JTable lotFigures = find(frame, javax.swing.JTable.class, "lotFigures");
            assertTrue(onEdt(lotFigures::getRowCount) >= 5, "one row per figure of the qualification");
            assertEquals("tension", onEdt(() -> lotFigures.getValueAt(lotFigures.getSelectedRow(), 0)));
            assertEquals("1", onEdt(() -> lotFigures.getValueAt(lotFigures.getSelectedRow(), 2)));
            shoot(frame, "10-lot.png");

            // A second run, cancelled: the result on show is from the first and is marked so; it is not offered to a lot.
            SwingUtilities.invokeAndWait(() -> w.tabs().setSelectedIndex(2));
            SwingUtilities.invokeAndWait(start::doClick);
            waitFor("the second sweep", 30, () -> progress.getString().startsWith("step "));
            assertEquals("NOT CURRENT", onEdt(headline::getText));
            assertTrue(!onEdt(addToLot::isEnabled), "a result that is not current cannot be added to a lot");
            SwingUtilities.invokeAndWait(find(frame, AbstractButton.class, "cancel")::doClick);
            waitFor("the cancel", 30, () -> progress.getString().startsWith("cancelled"));
            JTextArea note = find(frame, JTextArea.class, "staleNote");
            String noteText = onEdt(note::getText);
            assertTrue(noteText.startsWith("Not current: the sweep started at ") && noteText.contains(" was cancelled."),
                    noteText);
            assertTrue(!onEdt(addToLot::isEnabled), "still not offered to a lot after the cancel");
            SwingUtilities.invokeAndWait(() -> w.tabs().setSelectedIndex(3));
            shoot(frame, "11-results-not-current.png");
        } finally {
            SwingUtilities.invokeAndWait(() -> {
                w.files().edited();
                frame.dispose();
            });
        }
    }

    /** Saves every screen, and every tab of the results screen, with a prefix for the look. */
    private static void shootEveryScreen(Workbench w, String prefix) throws Exception {
        String[] names = {"1-setup", "2-rig", "3-run", "4-results", "5-lot"};
        for (int i = 0; i < names.length; i++) {
            int screen = i;
            SwingUtilities.invokeAndWait(() -> w.tabs().setSelectedIndex(screen));
            if (screen != 3) {
                shoot(w.frame(), prefix + "screen-" + names[i] + ".png");
                continue;
            }
            JTabbedPane resultTabs = find(w.frame(), JTabbedPane.class, "resultTabs");
            int count = onEdt(resultTabs::getTabCount);
            for (int t = 0; t < count; t++) {
                int tab = t;
                SwingUtilities.invokeAndWait(() -> resultTabs.setSelectedIndex(tab));
                shoot(w.frame(), prefix + "screen-4-results-" + (t + 1) + ".png");
            }
            SwingUtilities.invokeAndWait(() -> resultTabs.setSelectedIndex(0));
        }
        SwingUtilities.invokeAndWait(() -> w.tabs().setSelectedIndex(3));
    }
}
