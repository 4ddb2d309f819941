package org.tautline.app.ui.results;

import java.awt.Component;

import javax.swing.JTable;
import javax.swing.table.TableCellRenderer;
import javax.swing.table.TableColumn;

/** Sizes a table's columns to their widest cell or heading, so that nothing is cut off with "...". */
public final class ColumnWidths {
    /** Room either side of the text, pixels. */
    private static final int PADDING = 16;

    private ColumnWidths() {
    }

    /**
     * Sets each column's preferred and minimum width to its widest cell or heading; the last column takes what is
     * left. Call on the event thread after the data changed.
     *
     * @param table the table
     */
    public static void fitToContent(JTable table) {
        for (int c = 0; c < table.getColumnCount(); c++) {
            int width = contentWidth(table, c);
            TableColumn column = table.getColumnModel().getColumn(c);
            column.setMinWidth(width);
            column.setPreferredWidth(width);
        }
        table.revalidate();
    }

    /**
     * @param table a table
     * @param column a column index
     * @return the width its widest cell or its heading needs, pixels, padding included
     */
    static int contentWidth(JTable table, int column) {
        TableColumn tc = table.getColumnModel().getColumn(column);
        TableCellRenderer headerRenderer = tc.getHeaderRenderer() != null ? tc.getHeaderRenderer()
                : table.getTableHeader().getDefaultRenderer();
        Component head = headerRenderer.getTableCellRendererComponent(table, tc.getHeaderValue(), false, false, -1, column);
        int width = head.getPreferredSize().width;
        for (int r = 0; r < table.getRowCount(); r++) {
            Component cell = table.prepareRenderer(table.getCellRenderer(r, column), r, column);
            width = Math.max(width, cell.getPreferredSize().width);
        }
        return width + PADDING;
    }
}
