package org.tautline.app.ui;

import java.awt.Component;
import java.util.Optional;

import javax.swing.JButton;
import javax.swing.JFileChooser;
import javax.swing.JLabel;
import javax.swing.JOptionPane;
import javax.swing.JPanel;
import javax.swing.JTextField;
import javax.swing.filechooser.FileNameExtensionFilter;

import net.miginfocom.swing.MigLayout;

/**
 * The dialog that asks for a report's details before it is exported: operator, report number, the air at the test, a
 * rig file, and the test date when the workbench does not know it. Called on the event thread.
 */
final class ReportDetailsForm {
    private ReportDetailsForm() {
    }

    /**
     * @param owner the window the dialog belongs to
     * @param sweepStarted when the sweep of the result started, in words, for a sweep run in the window; empty for an
     *        FRF from a file, whose test date is asked for
     * @return what was given, empty when the dialog was cancelled
     */
    static Optional<ReportDetails> ask(Component owner, Optional<String> sweepStarted) {
        JTextField operator = field("operator", System.getProperty("user.name", ""));
        JTextField number = field("reportNumber", "");
        JTextField testDate = field("testDate", "");
        JTextField temperature = field("temperatureC", "");
        JTextField humidity = field("humidityPct", "");
        JTextField rigFile = field("rigFile", "");
        JButton choose = new JButton("Choose...");
        choose.addActionListener(e -> {
            JFileChooser chooser = new JFileChooser();
            chooser.setFileFilter(new FileNameExtensionFilter("Rig file (JSON)", "json"));
            if (chooser.showOpenDialog(owner) == JFileChooser.APPROVE_OPTION) {
                rigFile.setText(chooser.getSelectedFile().getAbsolutePath());
            }
        });
        JPanel p = new JPanel(new MigLayout("insets 0, wrap 3, gapy 4", "[right][grow,fill,260:320:][]"));
        p.add(new JLabel("<html>Facts left empty are printed \"not given\" in the report, never made up.</html>"),
                "span 3, left, wmax 560, gapbottom 6");
        p.add(new JLabel("Operator"));
        p.add(operator, "span 2");
        p.add(new JLabel("Report number"));
        p.add(number, "span 2");
        p.add(new JLabel("Test date"));
        if (sweepStarted.isPresent()) {
            p.add(new JLabel("the sweep's start, " + sweepStarted.get()), "span 2");
        } else {
            p.add(testDate);
            p.add(new JLabel("2026-11-02, or empty"));
        }
        p.add(new JLabel("Air temperature (°C)"));
        p.add(temperature, "span 2");
        p.add(new JLabel("Relative humidity (%)"));
        p.add(humidity, "span 2");
        p.add(new JLabel("Rig file"));
        p.add(rigFile);
        p.add(choose);
        p.add(new JLabel("<html>The rig file gives the instruments' serials and calibration. Without one the report"
                + (sweepStarted.isPresent() ? " names the rig the sweep ran on, with no instruments."
                : " gives no rig: the FRF came from a file.") + "</html>"), "span 3, left, wmax 560");
        int answer = JOptionPane.showConfirmDialog(owner, p, "Report details", JOptionPane.OK_CANCEL_OPTION,
                JOptionPane.PLAIN_MESSAGE);
        if (answer != JOptionPane.OK_OPTION) {
            return Optional.empty();
        }
        return Optional.of(new ReportDetails(operator.getText(), number.getText(), testDate.getText(),
                temperature.getText(), humidity.getText(), rigFile.getText()));
    }

    private static JTextField field(String name, String text) {
        JTextField f = new JTextField(text);
        f.setName(name);
        return f;
    }
}
