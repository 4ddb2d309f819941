package org.tautline.app.ui.results;

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
import org.tautline.analysis.verdict.Outcome;
import org.tautline.app.qualify.QualificationResult;

/** Tension, bending stiffness and positions with their uncertainties, then the verdict per limit and its reasons. */
final class PropertiesPanel {
    private final JPanel properties = new JPanel(new MigLayout("insets 0, wrap 2", "[][grow]"));
    private final DefaultTableModel verdict = new DefaultTableModel(PropertyLines.VERDICT_COLUMNS.toArray(), 0) {
        private static final long serialVersionUID = 1L;

        @Override
        public boolean isCellEditable(int row, int column) {
            return false;
        }
    };
    private final JTable table = new JTable(verdict);
    private final JTextArea reasons = new JTextArea();
    private final JPanel component = new JPanel(new MigLayout("fill, wrap 1", "[grow, fill]", "[][fill][][grow, fill]"));

    PropertiesPanel() {
        table.setName("verdictTable");
        table.setFillsViewportHeight(true);
        table.setAutoResizeMode(JTable.AUTO_RESIZE_LAST_COLUMN);
        // Room for about eight limits; the reasons below take the rest of the height.
        table.setPreferredScrollableViewportSize(new java.awt.Dimension(600, 8 * table.getRowHeight()));
        table.getColumnModel().getColumn(4).setCellRenderer(new DefaultTableCellRenderer() {
            private static final long serialVersionUID = 1L;

            @Override
            public Component getTableCellRendererComponent(JTable t, Object value, boolean selected, boolean focus,
                                                           int row, int column) {
                Component c = super.getTableCellRendererComponent(t, value, selected, focus, row, column);
                // The banner's colours: they read the same in the light and the dark look.
                VerdictColours colours = VerdictColours.of(outcomeOf(String.valueOf(value)));
                c.setBackground(colours.background());
                c.setForeground(colours.text());
                return c;
            }
        });
        reasons.setEditable(false);
        reasons.setLineWrap(true);
        reasons.setWrapStyleWord(true);
        reasons.setName("reasons");
        component.add(properties);
        component.add(new JScrollPane(table), "gaptop para");
        component.add(new JLabel("Why: the verdict per limit, then the notes of the fit"));
        component.add(new JScrollPane(reasons));
    }

    JComponent component() {
        return component;
    }

    /** Empties the panel, for a screen with no result. */
    void clear() {
        properties.removeAll();
        verdict.setRowCount(0);
        reasons.setText("");
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
        ColumnWidths.fitToContent(table);
        reasons.setText(String.join("\n", PropertyLines.reasons(result)));
        reasons.setCaretPosition(0);
    }

    private static java.util.Optional<Outcome> outcomeOf(String label) {
        for (Outcome o : Outcome.values()) {
            if (o.label().equals(label)) {
                return java.util.Optional.of(o);
            }
        }
        return java.util.Optional.empty();
    }
}
