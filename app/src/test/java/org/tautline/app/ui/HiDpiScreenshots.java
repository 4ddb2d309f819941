package org.tautline.app.ui;

import static org.tautline.app.ui.SwingDriver.find;
import static org.tautline.app.ui.SwingDriver.onEdt;
import static org.tautline.app.ui.SwingDriver.shoot;
import static org.tautline.app.ui.SwingDriver.waitFor;

import java.nio.file.Files;
import java.nio.file.Path;

import javax.swing.AbstractButton;
import javax.swing.JDialog;
import javax.swing.JLabel;
import javax.swing.JTabbedPane;
import javax.swing.SwingUtilities;

import org.tautline.app.ui.project.RecentFiles;

/**
 * Run in a child JVM at 200 % scale ({@code -Dsun.java2d.uiScale=2}) by {@link HiDpiScreenshotTest}: qualifies
 * the demo wire and saves each screen with an {@code hidpi-} prefix. Exits 0 when the verdict was shown.
 */
public final class HiDpiScreenshots {
    private HiDpiScreenshots() {
    }

    public static void main(String[] args) throws Exception {
        Path recent = Files.createTempDirectory("tautline-hidpi").resolve("recent.txt");
        Workbench w = onEdt(() -> {
            Workbench wb = Workbench.create(new RecentFiles(recent));
            wb.frame().setVisible(true);
            return wb;
        });
        try {
            // A shorter sweep than the demo's 1061 steps keeps this run brief; the screens are the same.
            javax.swing.JTextField steps = find(w.frame(), javax.swing.JTextField.class, "stepCount");
            SwingUtilities.invokeAndWait(() -> steps.setText("400"));
            JLabel rigTime = find(w.frame(), JLabel.class, "rigTime");
            waitFor("the shorter plan's rig time", 10, () -> rigTime.getText().contains("Rig time: about"));
            shoot(w.frame(), "hidpi-1-setup.png");
            SwingUtilities.invokeAndWait(() -> w.tabs().setSelectedIndex(1));
            AbstractButton connect = find(w.frame(), AbstractButton.class, "connect");
            SwingUtilities.invokeAndWait(connect::doClick);
            AbstractButton disconnect = find(w.frame(), AbstractButton.class, "disconnect");
            waitFor("the rig", 10, disconnect::isEnabled);
            shoot(w.frame(), "hidpi-2-rig.png");
            SwingUtilities.invokeAndWait(() -> w.tabs().setSelectedIndex(2));
            AbstractButton start = find(w.frame(), AbstractButton.class, "start");
            SwingUtilities.invokeLater(start::doClick);
            JDialog safety = SwingDriver.waitForDialog("Safety: before excitation");
            shoot(safety, "hidpi-3-safety.png");
            AbstractButton ok = SwingDriver.findButtonByText(safety, Workbench.START_CHOICE);
            SwingUtilities.invokeAndWait(ok::doClick);
            javax.swing.JProgressBar progress = find(w.frame(), javax.swing.JProgressBar.class, "runProgress");
            waitFor("some steps on the run screen", 60, () -> progress.getValue() > 100);
            shoot(w.frame(), "hidpi-4-run.png");
            JLabel headline = find(w.frame(), JLabel.class, "verdictHeadline");
            waitFor("the verdict", 60, () -> headline.isShowing() && !headline.getText().isEmpty());
            JTabbedPane resultTabs = find(w.frame(), JTabbedPane.class, "resultTabs");
            shoot(w.frame(), "hidpi-5-results-1.png");
            SwingUtilities.invokeAndWait(() -> resultTabs.setSelectedIndex(resultTabs.getTabCount() - 1));
            shoot(w.frame(), "hidpi-5-results-verdict.png");
        } finally {
            SwingUtilities.invokeAndWait(() -> w.frame().dispose());
        }
        System.exit(0);
    }
}
