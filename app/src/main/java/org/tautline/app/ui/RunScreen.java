package org.tautline.app.ui;

import javax.swing.JButton;
import javax.swing.JComponent;
import javax.swing.JLabel;
import javax.swing.JPanel;
import javax.swing.JProgressBar;
import javax.swing.JSplitPane;

import net.miginfocom.swing.MigLayout;

/**
 * The run screen: start, pause, resume and cancel; progress with the time to go; the settling; live
 * signals beside the FRF as it grows point by point.
 */
final class RunScreen {
    private final JPanel panel = new JPanel(new MigLayout("insets 10, fill, wrap 1", "[grow,fill]", "[][][][][grow,fill]"));
    final JButton start = new JButton("Start sweep");
    final JButton pause = new JButton("Pause");
    final JButton resume = new JButton("Resume");
    final JButton cancel = new JButton("Cancel sweep");
    private final JProgressBar progress = new JProgressBar(0, 1000);
    private final JLabel settle = new JLabel("Settling: no sweep running.");
    private final TraceChart traces = new TraceChart();
    private final FrfChart frf = new FrfChart();

    RunScreen() {
        start.setName("start");
        start.setMnemonic('S');
        pause.setName("pause");
        pause.setMnemonic('P');
        resume.setName("resume");
        resume.setMnemonic('u');
        cancel.setName("cancel");
        cancel.setMnemonic('n');
        progress.setName("runProgress");
        progress.setStringPainted(true);
        progress.setString("no sweep yet");
        settle.setName("settle");
        JLabel title = new JLabel("Run");
        title.putClientProperty("FlatLaf.styleClass", "h3");
        panel.add(title);
        JPanel controls = new JPanel(new MigLayout("insets 0", "[sg b,fill][sg b,fill][sg b,fill][sg b,fill]"));
        controls.add(start);
        controls.add(pause);
        controls.add(resume);
        controls.add(cancel);
        panel.add(controls, "growx 0");
        panel.add(progress, "h 22!");
        panel.add(settle);
        JSplitPane split = new JSplitPane(JSplitPane.HORIZONTAL_SPLIT, traces.component(), frf.component());
        split.setResizeWeight(0.45);
        panel.add(split, "grow");
        frf.live(true);
        buttons(false, false, false);
    }

    JComponent component() {
        return panel;
    }

    TraceChart traces() {
        return traces;
    }

    FrfChart frf() {
        return frf;
    }

    /**
     * @param connected a rig is connected
     * @param running a sweep is running
     * @param paused a sweep is paused with steps kept
     */
    void buttons(boolean connected, boolean running, boolean paused) {
        start.setEnabled(connected && !running);
        pause.setEnabled(running);
        resume.setEnabled(connected && paused && !running);
        cancel.setEnabled(running || paused);
    }

    void progress(double fraction, String text) {
        progress.setValue((int) Math.round(1000 * fraction));
        progress.setString(text);
    }

    void settle(String text) {
        settle.setText(text);
    }
}
