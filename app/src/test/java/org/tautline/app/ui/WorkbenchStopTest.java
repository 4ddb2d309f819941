package org.tautline.app.ui;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.tautline.app.ui.SwingDriver.find;
import static org.tautline.app.ui.SwingDriver.onEdt;
import static org.tautline.app.ui.SwingDriver.waitFor;

import java.nio.file.Path;

import javax.swing.AbstractButton;
import javax.swing.JDialog;
import javax.swing.JFrame;
import javax.swing.JLabel;
import javax.swing.JProgressBar;
import javax.swing.SwingUtilities;

import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.tautline.app.ui.project.RecentFiles;

/** The STOP button above the screens ends a running sweep with the drive ramped down, from any screen. */
class WorkbenchStopTest {
    @TempDir
    Path dir;

    @BeforeAll
    static void needsADisplay() {
        SwingDriver.needDisplay();
    }

    @Test
    void stopFromTheSetupScreenRampsTheDriveDownAndEndsTheSweep() throws Exception {
        Workbench w = onEdt(() -> {
            Workbench wb = Workbench.create(new RecentFiles(dir.resolve("recent.txt")));
            wb.frame().setVisible(true);
            return wb;
        });
        JFrame frame = w.frame();
        try {
            SwingUtilities.invokeAndWait(find(frame, AbstractButton.class, "connect")::doClick);
            waitFor("the rig", 10, find(frame, AbstractButton.class, "disconnect")::isEnabled);
            SwingUtilities.invokeLater(find(frame, AbstractButton.class, "start")::doClick);
            JDialog safety = SwingDriver.waitForDialog("Safety: before excitation");
            SwingUtilities.invokeAndWait(SwingDriver.findButtonByText(safety, Workbench.START_CHOICE)::doClick);
            JProgressBar progress = find(frame, JProgressBar.class, "runProgress");
            waitFor("some steps", 20, () -> progress.getValue() > 50);
            SwingUtilities.invokeAndWait(() -> w.tabs().setSelectedIndex(0));
            SwingUtilities.invokeAndWait(find(frame, AbstractButton.class, "stop")::doClick);
            waitFor("the sweep to end", 10, () -> progress.getString().startsWith("cancelled"));
            assertEquals("cancelled; the drive was ramped down", onEdt(progress::getString));
            assertEquals("Rig: connected: excitation off", onEdt(find(frame, JLabel.class, "rigState")::getText));
            assertEquals(true, onEdt(find(frame, AbstractButton.class, "start")::isEnabled));
        } finally {
            SwingUtilities.invokeAndWait(frame::dispose);
        }
    }
}
