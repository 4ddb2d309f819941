package org.tautline.app.ui;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.tautline.app.ui.SwingDriver.find;
import static org.tautline.app.ui.SwingDriver.onEdt;
import static org.tautline.app.ui.SwingDriver.waitFor;

import java.awt.Robot;
import java.awt.event.KeyEvent;
import java.nio.file.Path;

import javax.swing.AbstractButton;
import javax.swing.JDialog;
import javax.swing.JFrame;
import javax.swing.JLabel;
import javax.swing.JMenu;
import javax.swing.JMenuBar;
import javax.swing.JProgressBar;
import javax.swing.MenuSelectionManager;
import javax.swing.SwingUtilities;

import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.tautline.app.ui.project.RecentFiles;

/**
 * The STOP button above the screens, and Escape, end a running sweep with the drive ramped down, from any screen,
 * keeping the completed steps for Resume; Escape that closes a menu stops nothing.
 */
class WorkbenchStopTest {
    @TempDir
    Path dir;

    @BeforeAll
    static void needsADisplay() {
        SwingDriver.needDisplay();
    }

    /** Opens the window, connects the simulated rig and starts the demo sweep behind the cautions. */
    private Workbench startSweep() throws Exception {
        Workbench w = onEdt(() -> {
            Workbench wb = Workbench.create(new RecentFiles(dir.resolve("recent.txt")));
            wb.frame().setVisible(true);
            return wb;
        });
        JFrame frame = w.frame();
        SwingUtilities.invokeAndWait(find(frame, AbstractButton.class, "connect")::doClick);
        waitFor("the rig", 10, find(frame, AbstractButton.class, "disconnect")::isEnabled);
        SwingUtilities.invokeLater(find(frame, AbstractButton.class, "start")::doClick);
        JDialog safety = SwingDriver.waitForDialog("Safety: before excitation");
        SwingUtilities.invokeAndWait(SwingDriver.findButtonByText(safety, Workbench.START_CHOICE)::doClick);
        JProgressBar progress = find(frame, JProgressBar.class, "runProgress");
        waitFor("some steps", 20, () -> progress.getValue() > 50);
        return w;
    }

    @Test
    void stopFromTheSetupScreenRampsTheDriveDownKeepsTheStepsAndResumeGoesOn() throws Exception {
        Workbench w = startSweep();
        JFrame frame = w.frame();
        try {
            JProgressBar progress = find(frame, JProgressBar.class, "runProgress");
            SwingUtilities.invokeAndWait(() -> w.tabs().setSelectedIndex(0));
            SwingUtilities.invokeAndWait(find(frame, AbstractButton.class, "stop")::doClick);
            waitFor("the sweep to stop", 10, () -> progress.getString().startsWith("paused after"));
            String stopped = onEdt(progress::getString);
            assertTrue(stopped.endsWith("steps; the steps are kept and Resume goes on from the next one"), stopped);
            assertEquals("Rig: connected: excitation off", onEdt(find(frame, JLabel.class, "rigState")::getText));
            AbstractButton resume = find(frame, AbstractButton.class, "resume");
            assertTrue(onEdt(resume::isEnabled), "Resume is offered after STOP");
            // The kept steps are analysed with the setup as it was at Start: it stays read-only until the sweep ends.
            javax.swing.text.JTextComponent span = find(frame, javax.swing.text.JTextComponent.class, "lengthM");
            assertTrue(!onEdt(span::isEditable), "the setup is locked while the sweep is paused");
            assertTrue(onEdt(find(frame, JLabel.class, "setupLocked")::isVisible));
            SwingUtilities.invokeAndWait(resume::doClick);
            waitFor("the sweep to go on", 10, () -> progress.getString().startsWith("step "));
            SwingUtilities.invokeAndWait(find(frame, AbstractButton.class, "stop")::doClick);
            waitFor("the second stop", 10, () -> progress.getString().startsWith("paused after"));
        } finally {
            SwingUtilities.invokeAndWait(frame::dispose);
        }
    }

    @Test
    void escapeClosingAMenuStopsNothingButEscapeWithNoMenuOpenStops() throws Exception {
        Workbench w = startSweep();
        JFrame frame = w.frame();
        try {
            JProgressBar progress = find(frame, JProgressBar.class, "runProgress");
            SwingUtilities.invokeAndWait(() -> {
                frame.toFront();
                frame.requestFocus();
            });
            waitFor("the window to have the keyboard", 10, frame::isFocused);
            JMenu rigMenu = onEdt(() -> {
                JMenuBar bar = frame.getJMenuBar();
                return bar.getMenu(bar.getMenuCount() - 1);
            });
            SwingUtilities.invokeAndWait(rigMenu::doClick);
            waitFor("the Rig menu to open", 10, rigMenu::isPopupMenuVisible);
            Robot robot = new Robot();
            robot.keyPress(KeyEvent.VK_ESCAPE);
            robot.keyRelease(KeyEvent.VK_ESCAPE);
            waitFor("the menu to close", 10, () -> !rigMenu.isPopupMenuVisible()
                    && MenuSelectionManager.defaultManager().getSelectedPath().length == 0);
            int before = onEdt(progress::getValue);
            waitFor("the sweep to go on after the menu closed", 20, () -> progress.getValue() > before + 5);
            assertTrue(onEdt(progress::getString).startsWith("step "), "still sweeping: " + onEdt(progress::getString));

            robot.keyPress(KeyEvent.VK_ESCAPE);
            robot.keyRelease(KeyEvent.VK_ESCAPE);
            waitFor("Escape to stop the sweep", 10, () -> progress.getString().startsWith("paused after"));
            assertTrue(onEdt(find(frame, AbstractButton.class, "resume")::isEnabled), "the steps are kept for Resume");
        } finally {
            SwingUtilities.invokeAndWait(frame::dispose);
        }
    }
}
