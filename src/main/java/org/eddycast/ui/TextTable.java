package org.eddycast.ui;

import java.awt.Component;
import java.awt.FontMetrics;
import java.util.ArrayList;
import java.util.List;
import javax.swing.JTable;
import javax.swing.table.DefaultTableCellRenderer;
import javax.swing.table.DefaultTableModel;
import javax.swing.table.JTableHeader;
import org.eddycast.report.SummaryContent;

/**
 * A read-only table of text showing a {@link SummaryContent.Table}; the headings carry the units. Every column
 * is as wide as its widest line, so nothing is cut off: a value with its interval ("1.2 [1.1, 1.3]") takes two
 * lines, a long heading up to three, and a table wider than its place scrolls sideways. Headings and the first
 * column explain their terms in tooltips.
 */
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
            if (r < 0 || c < 0) {
                return null;
            }
            String cell = String.valueOf(getValueAt(r, c));
            String term = Glossary.definition(String.valueOf(getValueAt(r, 0)));
            if (term == null) {
                term = Glossary.definition(getColumnName(c));
            }
            return term == null ? cell : "<html><body style='width: 320px'>" + escape(cell) + "<br><br>"
                    + escape(term) + "</body></html>";
        }

        @Override
        protected JTableHeader createDefaultTableHeader() {
            return new JTableHeader(columnModel) {
                @Override
                public String getToolTipText(java.awt.event.MouseEvent e) {
                    int c = columnAtPoint(e.getPoint());
                    return c < 0 ? null : Glossary.tooltip(String.valueOf(getColumnModel().getColumn(c)
                            .getHeaderValue()));
                }
            };
        }
    };
    private List<String> header = List.of();
    private java.util.function.BiPredicate<Integer, Integer> highlighted = (r, c) -> false;

    TextTable(String name) {
        table.setName(name);
        table.setFillsViewportHeight(true);
        table.setAutoCreateRowSorter(false);
        table.setDefaultRenderer(Object.class, new DefaultTableCellRenderer() {
            @Override
            public Component getTableCellRendererComponent(JTable t, Object v, boolean sel, boolean focus, int r,
                                                           int c) {
                Component comp = super.getTableCellRendererComponent(t, cellHtml(String.valueOf(v)), sel, focus,
                        r, c);
                boolean mark = highlighted.test(r, t.convertColumnIndexToModel(c));
                setFont(t.getFont().deriveFont(mark ? java.awt.Font.BOLD : java.awt.Font.PLAIN));
                if (!sel) {
                    comp.setBackground(mark ? ThemeColours.highlight() : t.getBackground());
                    comp.setForeground(t.getForeground());
                }
                return comp;
            }
        });
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
        header = t.header();
        model.setRowCount(0);
        model.setColumnIdentifiers(t.header().stream().map(TextTable::headerHtml).toArray());
        for (List<String> row : t.rows()) {
            model.addRow(row.toArray());
        }
        fitColumns(t);
    }

    /** Sets each column to its widest line and each row to its tallest cell. */
    private void fitColumns(SummaryContent.Table t) {
        FontMetrics fm = table.getTableHeader().getFontMetrics(table.getTableHeader().getFont());
        // measured in bold, so a highlighted (bold) cell fits too
        FontMetrics cellFm = table.getFontMetrics(table.getFont().deriveFont(java.awt.Font.BOLD));
        table.setAutoResizeMode(JTable.AUTO_RESIZE_OFF);
        int headerLines = 1;
        for (int c = 0; c < t.header().size(); c++) {
            int w = 60;
            String[] parts = headerHtml(t.header().get(c)).replaceAll("</?(html|center)>", "").split("<br>");
            headerLines = Math.max(headerLines, parts.length);
            for (String part : parts) {
                w = Math.max(w, fm.stringWidth(part.replace("&amp;", "&").replace("&lt;", "<")) + 20);
            }
            for (List<String> row : t.rows()) {
                for (String line : lines(row.get(c))) {
                    w = Math.max(w, cellFm.stringWidth(line) + 16);
                }
            }
            table.getColumnModel().getColumn(c).setPreferredWidth(w);
            table.getColumnModel().getColumn(c).setMinWidth(w);
        }
        int lineHeight = cellFm.getHeight();
        for (int r = 0; r < t.rows().size(); r++) {
            int n = 1;
            for (int c = 0; c < t.header().size(); c++) {
                n = Math.max(n, lines(t.rows().get(r).get(c)).size());
            }
            table.setRowHeight(r, n * lineHeight + 6);
        }
        int width = table.getColumnModel().getTotalColumnWidth();
        table.getTableHeader().setPreferredSize(new java.awt.Dimension(width, (headerLines + 1) * fm.getHeight()
                + 4));
        int height = 0;
        for (int r = 0; r < table.getRowCount(); r++) {
            height += table.getRowHeight(r);
        }
        // tall enough for every row and a sideways scroll bar, so no row hides below the fold
        table.setPreferredScrollableViewportSize(new java.awt.Dimension(Math.min(width, 560),
                Math.max(table.getRowHeight(), height) + 18));
    }

    /** The lines a cell is drawn on: a value and its bracketed interval on two. */
    static List<String> lines(String cell) {
        int bracket = cell.indexOf(" [");
        if (bracket > 0 && cell.indexOf(']', bracket) > 0) {
            return List.of(cell.substring(0, bracket), cell.substring(bracket + 1));
        }
        return List.of(cell);
    }

    private static String cellHtml(String cell) {
        List<String> lines = lines(cell);
        if (lines.size() == 1) {
            return cell;
        }
        return "<html>" + String.join("<br>", lines.stream().map(TextTable::escape).toList()) + "</html>";
    }

    private static String escape(String s) {
        return s.replace("&", "&amp;").replace("<", "&lt;").replace(">", "&gt;");
    }

    /** A heading on two or three lines, so a long heading with its unit is not cut off. */
    static String headerHtml(String h) {
        return "<html><center>" + escape(h).replace(", ", ",<br>").replace(" [", "<br>[") + "</center></html>";
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

    /** Marks the cells (row, content column) the test holds for; see {@link ThemeColours#highlight()}. */
    void highlight(java.util.function.BiPredicate<Integer, Integer> cells) {
        highlighted = cells;
        table.repaint();
    }

    /** Hides a column of the content (it stays in the content and in the tooltips). */
    void hide(int contentColumn) {
        int view = table.convertColumnIndexToView(contentColumn);
        if (view >= 0) {
            table.removeColumn(table.getColumnModel().getColumn(view));
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

    /** The headings as given (for tests). */
    List<String> header() {
        return header;
    }
}
