package org.tautline.app.ui;

import java.awt.BorderLayout;
import java.awt.Font;
import java.util.Optional;

import javax.swing.JComponent;
import javax.swing.JPanel;
import javax.swing.JScrollPane;
import javax.swing.JSplitPane;
import javax.swing.JTextArea;

import org.tautline.app.qualify.QualificationResult;
import org.tautline.app.qualify.ResultText;

/**
 * The results screen: for now the FRF with the fitted model, and the mode table, properties and verdict as text.
 *
 * <p>Everything the workbench shows of a result goes through {@link #showResults(QualificationResult)};
 * a richer results view replaces the body of this class without touching the rest of the workbench.
 */
final class ResultsScreen {
    private final JPanel panel = new JPanel(new BorderLayout());
    private final FrfChart chart = new FrfChart();
    private final JTextArea text = new JTextArea(14, 80);

    ResultsScreen() {
        text.setEditable(false);
        text.setName("results");
        text.setFont(new Font(Font.MONOSPACED, Font.PLAIN, text.getFont().getSize()));
        text.setText("No result yet: run a sweep on the Run screen, or import an FRF or a recording (File menu).\n");
        JSplitPane split = new JSplitPane(JSplitPane.VERTICAL_SPLIT, chart.panel(), new JScrollPane(text));
        split.setResizeWeight(0.55);
        panel.add(split, BorderLayout.CENTER);
    }

    JComponent component() {
        return panel;
    }

    /**
     * Shows a qualification result: the measured FRF with the fit, the modes, the properties and the verdict.
     *
     * @param result the result; call on the event thread
     */
    void showResults(QualificationResult result) {
        chart.showMeasured(result.receptance());
        chart.showFit(result.synthesized());
        text.setText(ResultText.format(result, Optional.empty()));
        text.setCaretPosition(0);
    }
}
