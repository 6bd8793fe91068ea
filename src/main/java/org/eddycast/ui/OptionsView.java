package org.eddycast.ui;

import java.awt.Component;
import java.util.ArrayList;
import java.util.List;
import javax.swing.JLabel;
import javax.swing.JPanel;
import javax.swing.JScrollPane;
import javax.swing.JTable;
import javax.swing.JTextArea;
import javax.swing.UIManager;
import javax.swing.table.DefaultTableCellRenderer;
import javax.swing.table.DefaultTableModel;
import net.miginfocom.swing.MigLayout;
import org.eddycast.engine.StudyResult;
import org.eddycast.report.ChartSpec;
import org.eddycast.report.ChartSpecs;
import org.eddycast.report.OptionComparison;
import org.eddycast.report.SpreadCurves;
import org.eddycast.report.SummaryContent;

/**
 * Design options side by side: the curves overlaid, a table with each option's diffusivity per axis (cells
 * that differ from the first option are highlighted), and the verdict in plain words.
 */
final class OptionsView extends JPanel {

    private final List<String> names = new ArrayList<>();
    private final List<StudyResult> results = new ArrayList<>();
    private final JPanel chartHolder = new JPanel(new java.awt.BorderLayout());
    private final DefaultTableModel model = new DefaultTableModel() {
        @Override
        public boolean isCellEditable(int row, int column) {
            return false;
        }
    };
    private final JTable table = new JTable(model);
    private final JTextArea verdict = new JTextArea();
    private OptionComparison comparison;

    OptionsView() {
        super(new MigLayout("insets dialog, wrap 1, fill", "[grow,fill]", "[grow 70,fill][grow 30,fill][]"));
        table.setName("options");
        table.setDefaultRenderer(Object.class, new DefaultTableCellRenderer() {
            @Override
            public Component getTableCellRendererComponent(JTable t, Object v, boolean sel, boolean focus, int r,
                                                           int c) {
                Component comp = super.getTableCellRendererComponent(t, v, sel, focus, r, c);
                boolean highlight = comparison != null && c > 0 && r < comparison.axes().size()
                        && comparison.differs().get(c - 1).get(r);
                setFont(getFont().deriveFont(highlight ? java.awt.Font.BOLD : java.awt.Font.PLAIN));
                if (!sel) {
                    comp.setBackground(highlight ? UIManager.getColor("Component.warning.focusedBorderColor")
                            : t.getBackground());
                }
                return comp;
            }
        });
        verdict.setEditable(false);
        verdict.setLineWrap(true);
        verdict.setWrapStyleWord(true);
        verdict.setName("verdict");
        add(chartHolder);
        JScrollPane scroll = new JScrollPane(table);
        scroll.setColumnHeaderView(table.getTableHeader());
        add(scroll);
        add(verdict, "hmin 48");
        refresh();
    }

    /** Keeps a result as a named option. */
    void keep(String name, StudyResult r) {
        names.add(name);
        results.add(r);
        refresh();
    }

    void clear() {
        names.clear();
        results.clear();
        refresh();
    }

    int count() {
        return results.size();
    }

    List<String> names() {
        return List.copyOf(names);
    }

    List<StudyResult> results() {
        return List.copyOf(results);
    }

    /** The verdict shown (for tests). */
    String verdictText() {
        return verdict.getText();
    }

    /** The overlaid chart: every option's plume width (or, without forecasts, its variance along x). */
    ChartSpec chartSpec() {
        if (results.stream().allMatch(r -> r.forecast() != null)) {
            return ChartSpecs.optionWidths(names, results.stream().map(StudyResult::forecast).toList());
        }
        List<ChartSpec.Curve> curves = new ArrayList<>();
        for (int i = 0; i < results.size(); i++) {
            ChartSpec.Curve c = ChartSpecs.spread(SpreadCurves.of(results.get(i).diffusivity()), "").curves().get(0);
            curves.add(new ChartSpec.Curve(names.get(i) + ": variance along x", c.x(), c.y(), c.low(), c.high(),
                    false));
        }
        return new ChartSpec("Options compared: spread along x", "time (s)", "mean-square displacement (m\u00b2)",
                false, false, curves);
    }

    private void refresh() {
        chartHolder.removeAll();
        model.setRowCount(0);
        model.setColumnCount(0);
        comparison = null;
        if (results.size() < 2) {
            chartHolder.add(new JLabel("<html><center>Keep two or more results as options (Run \u25b8 Keep result as"
                    + " option, Ctrl+K)<br>to compare them side by side.</center></html>", JLabel.CENTER));
            verdict.setText(results.size() == 1 ? "One option kept: \"" + names.get(0) + "\"." : "");
        } else {
            comparison = OptionComparison.of(names, results);
            chartHolder.add(ThemeCharts.panel(chartSpec()));
            model.addColumn("eddy diffusivity (m\u00b2/s)");
            for (String n : names) {
                model.addColumn(n);
            }
            for (int a = 0; a < comparison.axes().size(); a++) {
                Object[] row = new Object[names.size() + 1];
                row[0] = "along " + comparison.axes().get(a);
                for (int o = 0; o < names.size(); o++) {
                    var e = comparison.values().get(o).get(a);
                    row[o + 1] = SummaryContent.number(e.value()) + "  [" + SummaryContent.number(e.low()) + ", "
                            + SummaryContent.number(e.high()) + "]";
                }
                model.addRow(row);
            }
            if (results.stream().anyMatch(r -> r.forecast() != null && !r.forecast().mixing().isEmpty())) {
                Object[] row = new Object[names.size() + 1];
                row[0] = "first mixing figure";
                for (int o = 0; o < names.size(); o++) {
                    var f = results.get(o).forecast();
                    if (f == null || f.mixing().isEmpty()) {
                        row[o + 1] = "\u2014";
                    } else {
                        var m = f.mixing().get(0);
                        row[o + 1] = m.name() + ": " + SummaryContent.number(m.value()) + " " + m.unit() + "  ["
                                + SummaryContent.number(m.low()) + ", " + SummaryContent.number(m.high()) + "]";
                    }
                }
                model.addRow(row);
            }
            verdict.setText(comparison.verdict());
        }
        revalidate();
        repaint();
    }
}
