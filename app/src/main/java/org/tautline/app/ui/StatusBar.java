package org.tautline.app.ui;

import javax.swing.JLabel;
import javax.swing.JPanel;
import javax.swing.JProgressBar;
import javax.swing.JSeparator;
import javax.swing.SwingConstants;

import net.miginfocom.swing.MigLayout;

/** The bottom line of the window: rig connection state, the last message and the progress of the running job. */
final class StatusBar {
    private final JPanel panel = new JPanel(new MigLayout("insets 3 8 3 8, fillx", "[][][grow,fill][]"));
    private final JLabel rig = new JLabel();
    private final JLabel message = new JLabel(" ");
    private final JProgressBar progress = new JProgressBar(0, 1000);

    StatusBar() {
        rig.setName("rigState");
        message.setName("statusMessage");
        progress.setStringPainted(true);
        progress.setString("idle");
        panel.add(rig);
        panel.add(new JSeparator(SwingConstants.VERTICAL), "growy, h 16!");
        panel.add(message);
        panel.add(progress, "w 360!");
        rig("not connected");
    }

    JPanel panel() {
        return panel;
    }

    void rig(String state) {
        rig.setText("Rig: " + state);
    }

    void message(String text) {
        message.setText(text);
    }

    /**
     * @param fraction 0..1, or negative for a job of unknown length
     * @param text what the job is doing
     */
    void progress(double fraction, String text) {
        progress.setIndeterminate(fraction < 0);
        progress.setValue((int) Math.round(1000 * Math.max(0, Math.min(1, fraction))));
        progress.setString(text);
    }
}
