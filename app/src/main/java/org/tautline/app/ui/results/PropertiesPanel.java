package org.tautline.app.ui.results;

import org.tautline.app.ui.Palette;
import java.awt.Component;
import java.util.List;

import javax.swing.JComponent;
import javax.swing.JLabel;
import javax.swing.JPanel;
import javax.swing.JScrollPane;
import javax.swing.JTable;
import javax.swing.JTextArea;
import javax.swing.table.DefaultTableCellRenderer;
import javax.swing.table.DefaultTableModel;

import net.miginfocom.swing.MigLayout;
import org.tautline.app.qualify.QualificationResult;

/** Tension, bending stiffness and positions with their uncertainties, then the verdict per limit and its reasons. */
final class PropertiesPanel {
    private final JPanel properties = new JPanel(new MigLayout("insets 0, wrap 2", "[][grow]"));
    private final JLabel outcome = new JLabel();
    private final DefaultTableModel verdict = new DefaultTableModel(PropertyLines.VERDICT_COLUMNS.toArray(), 0) {
        private static final long serialVersionUID = 1L;

        @Override
        public boolean isCellEditable(int row, int column) {
            return false;
        }
    };
    private final JTextArea reasons = new JTextArea();
    private final JPanel component = new JPanel(new MigLayout("fill, wrap 1", "[grow, fill]", "[][][fill][][grow, fill]"));

    PropertiesPanel() {
        JTable table = new JTable(verdict);
        table.setName("verdictTable");
        table.setFillsViewportHeight(true);
        // Room for about eight limits; the reasons below take the rest of the height.
        table.setPreferredScrollableViewportSize(new java.awt.Dimension(600, 8 * table.getRowHeight()));
        table.getColumnModel().getColumn(4).setCellRenderer(new DefaultTableCellRenderer() {
            private static final long serialVersionUID = 1L;

            @Override
            public Component getTableCellRendererComponent(JTable t, Object value, boolean selected, boolean focus,
                                                           int row, int column) {
                Component c = super.getTableCellRendererComponent(t, value, selected, focus, row, column);
                c.setForeground(colourOf(String.valueOf(value)));
                return c;
            }
        });
        reasons.setEditable(false);
        reasons.setLineWrap(true);
        reasons.setWrapStyleWord(true);
        reasons.setName("reasons");
        outcome.setName("outcome");
        outcome.setFont(outcome.getFont().deriveFont(java.awt.Font.BOLD, outcome.getFont().getSize2D() * 1.2f));
        component.add(properties);
        component.add(outcome, "gaptop para");
        component.add(new JScrollPane(table));
        component.add(new JLabel("Reasons and notes"));
        component.add(new JScrollPane(reasons));
    }

    JComponent component() {
        return component;
    }

    void show(QualificationResult result) {
        properties.removeAll();
        for (String[] row : PropertyLines.properties(result)) {
            properties.add(new JLabel(row[0] + ":"));
            properties.add(new JLabel(row[1]));
        }
        properties.revalidate();
        verdict.setRowCount(0);
        List<String[]> rows = PropertyLines.verdictRows(result);
        rows.forEach(verdict::addRow);
        outcome.setText(result.verdict().map(v -> "Verdict: " + v.outcome()).orElse("No specification: no verdict"));
        outcome.setForeground(result.verdict().map(v -> colourOf(v.outcome().toString())).orElse(java.awt.Color.BLACK));
        reasons.setText(String.join("\n", PropertyLines.reasons(result)));
        reasons.setCaretPosition(0);
    }

    private static java.awt.Color colourOf(String outcome) {
        return switch (outcome) {
            case "PASS" -> Palette.PASS.darker();
            case "FAIL" -> Palette.FAIL;
            default -> Palette.UNDETERMINED.darker();
        };
    }
}
