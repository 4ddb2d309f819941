package org.tautline.app.ui;

import java.awt.BorderLayout;
import java.awt.Font;
import java.awt.event.KeyEvent;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.CancellationException;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.atomic.AtomicBoolean;

import javax.swing.AbstractAction;
import javax.swing.JButton;
import javax.swing.JComponent;
import javax.swing.JFrame;
import javax.swing.JLabel;
import javax.swing.JOptionPane;
import javax.swing.JPanel;
import javax.swing.JProgressBar;
import javax.swing.JScrollPane;
import javax.swing.JSplitPane;
import javax.swing.JTextArea;
import javax.swing.KeyStroke;
import javax.swing.SwingUtilities;
import javax.swing.SwingWorker;
import javax.swing.WindowConstants;

import com.formdev.flatlaf.FlatLightLaf;
import net.miginfocom.swing.MigLayout;
import org.tautline.app.SafetyNotice;
import org.tautline.app.qualify.DemoOutcome;
import org.tautline.app.qualify.DemoRun;
import org.tautline.app.qualify.ResultText;
import org.tautline.driver.sweep.SweepProgress;

/**
 * The first workbench window: runs the demo qualification on the simulated rig and shows the FRF
 * with the fit, the mode table and the verdict.
 *
 * <p>The sweep and the fit run on a {@link SwingWorker}'s background thread; progress and results
 * come back on the event thread. The stop control (button, Escape) asks the sweep to ramp down.
 */
public final class Workbench {
    /** The button that acknowledges the safety cautions and starts the first excitation. */
    static final String START_CHOICE = "I have read the cautions: start";
    private final JFrame frame = new JFrame("Tautline - vibration qualification");
    private final FrfChart chart = new FrfChart();
    private final JTextArea results = new JTextArea(18, 90);
    private final JProgressBar progress = new JProgressBar(0, 1000);
    private final JLabel status = new JLabel("Rig: simulated rig (not connected)");
    private final JButton runButton = new JButton("Run demo qualification");
    private final JButton stopButton = new JButton("Stop excitation");
    private final AtomicBoolean cancelRequested = new AtomicBoolean();
    private boolean safetyAcknowledged;

    private Workbench() {
    }

    /** Opens the window on the event thread, with the light look and feel. */
    public static void open() {
        SwingUtilities.invokeLater(() -> {
            FlatLightLaf.setup();
            new Workbench().build().setVisible(true);
        });
    }

    /**
     * Builds the window without showing it; for tests that drive it under a virtual display.
     *
     * @return the frame, ready to show; must be called on the event thread
     */
    public static JFrame buildForTest() {
        FlatLightLaf.setup();
        return new Workbench().build();
    }

    private JFrame build() {
        results.setEditable(false);
        results.setFont(new Font(Font.MONOSPACED, Font.PLAIN, results.getFont().getSize()));
        results.setText("Press \"Run demo qualification\" to sweep the invented demo wire on the simulated rig.\n");
        progress.setStringPainted(true);
        progress.setString("idle");
        stopButton.setEnabled(false);
        runButton.setMnemonic(KeyEvent.VK_R);
        runButton.addActionListener(event -> startRun());
        stopButton.addActionListener(event -> requestStop());
        runButton.setName("run");
        stopButton.setName("stop");
        results.setName("results");

        JPanel top = new JPanel(new MigLayout("insets 8, fillx", "[][]push[]"));
        top.add(runButton);
        top.add(stopButton);
        top.add(new JLabel("Esc stops the excitation"));
        JPanel centre = new JPanel(new BorderLayout());
        JSplitPane split = new JSplitPane(JSplitPane.VERTICAL_SPLIT, chart.panel(), new JScrollPane(results));
        split.setResizeWeight(0.6);
        centre.add(split, BorderLayout.CENTER);
        JPanel bottom = new JPanel(new MigLayout("insets 4 8 4 8, fillx", "[grow,fill][]"));
        bottom.add(status);
        bottom.add(progress, "w 420!");

        JPanel root = new JPanel(new BorderLayout());
        root.add(top, BorderLayout.NORTH);
        root.add(centre, BorderLayout.CENTER);
        root.add(bottom, BorderLayout.SOUTH);
        root.getInputMap(JComponent.WHEN_IN_FOCUSED_WINDOW).put(KeyStroke.getKeyStroke(KeyEvent.VK_ESCAPE, 0), "stop");
        root.getActionMap().put("stop", new AbstractAction() {
            private static final long serialVersionUID = 1L;

            @Override
            public void actionPerformed(java.awt.event.ActionEvent event) {
                requestStop();
            }
        });
        frame.setContentPane(root);
        frame.setDefaultCloseOperation(WindowConstants.DISPOSE_ON_CLOSE);
        frame.setSize(1280, 800);
        frame.setLocationRelativeTo(null);
        return frame;
    }

    private boolean acknowledgeSafety() {
        if (safetyAcknowledged) {
            return true;
        }
        String[] choices = {START_CHOICE, "Cancel"};
        int answer = JOptionPane.showOptionDialog(frame, SafetyNotice.asHtml(true), "Safety: before excitation",
                JOptionPane.OK_CANCEL_OPTION, JOptionPane.WARNING_MESSAGE, null, choices, choices[1]);
        safetyAcknowledged = answer == 0;
        return safetyAcknowledged;
    }

    private void startRun() {
        if (!acknowledgeSafety()) {
            return;
        }
        cancelRequested.set(false);
        runButton.setEnabled(false);
        stopButton.setEnabled(true);
        chart.clear();
        results.setText("Sweeping...\n");
        status.setText("Rig: simulated rig (connected, excitation on)");
        new DemoWorker().execute();
    }

    private void requestStop() {
        if (stopButton.isEnabled()) {
            cancelRequested.set(true);
            status.setText("Rig: simulated rig (stopping: ramping the drive down)");
        }
    }

    /** Runs the demo off the event thread and publishes each completed step. */
    private final class DemoWorker extends SwingWorker<DemoOutcome, SweepProgress> {
        @Override
        protected DemoOutcome doInBackground() {
            return DemoRun.run(this::publish, cancelRequested::get);
        }

        @Override
        protected void process(List<SweepProgress> steps) {
            double[] frequencies = new double[steps.size()];
            double[] magnitudes = new double[steps.size()];
            for (int i = 0; i < steps.size(); i++) {
                frequencies[i] = steps.get(i).frequencyHz();
                magnitudes[i] = steps.get(i).point().response().norm();
            }
            chart.addMeasuredPoints(frequencies, magnitudes);
            SweepProgress last = steps.get(steps.size() - 1);
            progress.setValue((int) Math.round(1000 * last.fraction()));
            String eta = Double.isFinite(last.remainingWallTimeS())
                    ? String.format(Locale.ROOT, "%.0f s", last.remainingWallTimeS()) : "?";
            progress.setString(String.format(Locale.ROOT, "step %d of %d  |  %.1f Hz  |  ETA %s", last.completedSteps(),
                    last.totalSteps(), last.frequencyHz(), eta));
        }

        @Override
        protected void done() {
            runButton.setEnabled(true);
            stopButton.setEnabled(false);
            status.setText("Rig: simulated rig (connected, excitation off)");
            try {
                DemoOutcome outcome = get();
                chart.showMeasured(outcome.result().receptance());
                chart.showFit(outcome.result().synthesized());
                results.setText(ResultText.format(outcome));
                results.setCaretPosition(0);
                progress.setValue(1000);
                progress.setString(outcome.result().sweep().map(s -> s.completed()).orElse(true) ? "done" : "stopped");
            } catch (InterruptedException e) {
                Thread.currentThread().interrupt();
            } catch (CancellationException e) {
                progress.setString("stopped");
            } catch (ExecutionException e) {
                progress.setString("failed");
                results.setText("The run failed: " + e.getCause().getMessage() + "\nThe excitation was switched off.\n");
            }
        }
    }
}
