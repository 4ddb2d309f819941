package org.tautline.app.ui.results;

import java.util.List;

import javax.swing.table.AbstractTableModel;

import org.tautline.app.qualify.QualificationResult;

/** The mode table's contents: {@link ModeRows} of the shown result. */
final class ModeTableModel extends AbstractTableModel {
    private static final long serialVersionUID = 1L;
    private transient List<ModeRows.Row> rows = List.of();

    void clear() {
        rows = List.of();
        fireTableDataChanged();
    }

    void show(QualificationResult result) {
        rows = ModeRows.of(result);
        fireTableDataChanged();
    }

    @Override
    public int getRowCount() {
        return rows.size();
    }

    @Override
    public int getColumnCount() {
        return ModeRows.COLUMNS.size();
    }

    @Override
    public String getColumnName(int column) {
        return ModeRows.COLUMNS.get(column);
    }

    @Override
    public Object getValueAt(int row, int column) {
        return rows.get(row).cell(column);
    }
}
