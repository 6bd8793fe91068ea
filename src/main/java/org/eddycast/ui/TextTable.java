package org.eddycast.ui;

import java.util.ArrayList;
import java.util.List;
import javax.swing.JTable;
import javax.swing.table.DefaultTableModel;
import org.eddycast.report.SummaryContent;

/** A read-only table of text showing a {@link SummaryContent.Table}; the headings carry the units. */
final class TextTable {

    private final DefaultTableModel model = new DefaultTableModel() {
        @Override
        public boolean isCellEditable(int row, int column) {
            return false;
        }
    };
    private final JTable table = new JTable(model) {
        @Override
        public String getToolTipText(java.awt.event.MouseEvent e) {
            int r = rowAtPoint(e.getPoint());
            int c = columnAtPoint(e.getPoint());
            return r < 0 || c < 0 ? null : String.valueOf(getValueAt(r, c));
        }
    };

    TextTable(String name) {
        table.setName(name);
        table.setFillsViewportHeight(true);
        table.setAutoCreateRowSorter(false);
    }

    JTable table() {
        return table;
    }

    /** The table in a scroll pane that shows its header even before the pane is in a window. */
    javax.swing.JScrollPane scroll() {
        javax.swing.JScrollPane pane = new javax.swing.JScrollPane(table);
        pane.setColumnHeaderView(table.getTableHeader());
        return pane;
    }

    /** Replaces the content. */
    void show(SummaryContent.Table t) {
        model.setRowCount(0);
        model.setColumnIdentifiers(t.header().stream().map(TextTable::headerHtml).toArray());
        int lines = 1;
        for (String h : t.header()) {
            lines = Math.max(lines, headerHtml(h).split("<br>", -1).length);
        }
        // a header's height follows its tallest heading, so no unit is cut off
        java.awt.FontMetrics fm = table.getTableHeader().getFontMetrics(table.getTableHeader().getFont());
        // columns as wide as their widest cell (within reason), scrolling sideways rather than cutting numbers
        java.awt.FontMetrics cellFm = table.getFontMetrics(table.getFont());
        table.setAutoResizeMode(t.header().size() > 4 ? JTable.AUTO_RESIZE_OFF : JTable.AUTO_RESIZE_ALL_COLUMNS);
        for (int c = 0; c < t.header().size(); c++) {
            int w = 80;
            for (String part : t.header().get(c).split(", | \\[")) {
                w = Math.max(w, fm.stringWidth(part) + 16);
            }
            for (List<String> row : t.rows()) {
                w = Math.max(w, cellFm.stringWidth(row.get(c)) + 16);
            }
            table.getColumnModel().getColumn(c).setPreferredWidth(Math.min(w, 360));
        }
        table.getTableHeader().setPreferredSize(new java.awt.Dimension(
                table.getColumnModel().getTotalColumnWidth(), (lines + 1) * fm.getHeight() + 8));
        // tall enough for every row and a sideways scroll bar, so no row hides below the fold
        table.setPreferredScrollableViewportSize(new java.awt.Dimension(
                Math.min(table.getColumnModel().getTotalColumnWidth(), 600),
                Math.max(1, t.rows().size()) * table.getRowHeight() + 18));
        for (List<String> row : t.rows()) {
            model.addRow(row.toArray());
        }
    }

    /** A heading on two or three lines, so a long heading with its unit is not cut off. */
    static String headerHtml(String h) {
        String escaped = h.replace("&", "&amp;").replace("<", "&lt;").replace(">", "&gt;");
        return "<html><center>" + escaped.replace(", ", ",<br>").replace(" [", "<br>[") + "</center></html>";
    }

    /** Puts the content's columns on screen in this order; the content's own order is unchanged. */
    void showInOrder(int... contentColumns) {
        for (int place = 0; place < contentColumns.length; place++) {
            int view = table.convertColumnIndexToView(contentColumns[place]);
            if (view >= 0 && view != place) {
                table.moveColumn(view, place);
            }
        }
    }

    /** The cells as text. */
    List<List<String>> rows() {
        List<List<String>> rows = new ArrayList<>();
        for (int r = 0; r < model.getRowCount(); r++) {
            List<String> row = new ArrayList<>();
            for (int c = 0; c < model.getColumnCount(); c++) {
                row.add(String.valueOf(model.getValueAt(r, c)));
            }
            rows.add(row);
        }
        return rows;
    }
}
