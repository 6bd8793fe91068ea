package org.eddycast.ui;

import java.awt.BorderLayout;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import javax.swing.JLabel;
import javax.swing.JPanel;
import javax.swing.JScrollPane;
import javax.swing.JTabbedPane;
import javax.swing.JTable;
import javax.swing.JTextArea;
import javax.swing.table.DefaultTableModel;
import net.miginfocom.swing.MigLayout;
import org.eddycast.engine.DiffusivityResult;
import org.eddycast.engine.StudyResult;
import org.eddycast.forecast.Cautions;
import org.eddycast.report.ChartSpec;
import org.eddycast.report.ChartSpecs;
import org.eddycast.report.SpreadCurves;
import org.eddycast.report.SummaryContent;
import org.jfree.chart.ChartPanel;

/**
 * The results side: charts (spread with its band, running diffusivity, the record's spectrum and
 * autocorrelation), the results table, the assumptions and cautions in plain view, and the comparison of
 * design options. Shows whatever a study result holds; the forecast results plug in through
 * {@link SummaryContent}.
 */
final class ResultsView extends JPanel {

    private final JTabbedPane tabs = new JTabbedPane();
    private final JPanel spread = new JPanel(new BorderLayout());
    private final JPanel settling = new JPanel(new BorderLayout());
    private final JPanel record = new JPanel(new MigLayout("insets 0, wrap 1, fill", "[grow,fill]", "[grow,fill][grow,fill]"));
    private final DefaultTableModel table = new DefaultTableModel(new Object[] {"quantity", "value", "95% interval",
            "unit"}, 0) {
        @Override
        public boolean isCellEditable(int row, int column) {
            return false;
        }
    };
    private final JTable resultsTable = new JTable(table);
    private final JTextArea reasoning = new JTextArea();
    private final JLabel banner = new JLabel(" ");
    private final OptionsView options = new OptionsView();
    private ChartSpec spreadSpec;
    private ChartSpec settlingSpec;

    ResultsView() {
        super(new BorderLayout());
        banner.putClientProperty("FlatLaf.styleClass", "medium");
        banner.setBorder(javax.swing.BorderFactory.createEmptyBorder(6, 10, 6, 10));
        add(banner, BorderLayout.NORTH);
        resultsTable.setName("results");
        resultsTable.setFillsViewportHeight(true);
        reasoning.setEditable(false);
        reasoning.setLineWrap(true);
        reasoning.setWrapStyleWord(true);
        reasoning.setName("reasoning");
        tabs.addTab("Spread", spread);
        tabs.addTab("Settling", settling);
        tabs.addTab("Record", record);
        tabs.addTab("Table", new JScrollPane(resultsTable));
        tabs.addTab("Assumptions and cautions", new JScrollPane(reasoning));
        tabs.addTab("Options", options);
        int[] keys = {java.awt.event.KeyEvent.VK_S, java.awt.event.KeyEvent.VK_E, java.awt.event.KeyEvent.VK_D,
                java.awt.event.KeyEvent.VK_T, java.awt.event.KeyEvent.VK_A, java.awt.event.KeyEvent.VK_O};
        for (int i = 0; i < keys.length; i++) {
            tabs.setMnemonicAt(i, keys[i]);
        }
        add(tabs, BorderLayout.CENTER);
        showEmpty();
    }

    OptionsView options() {
        return options;
    }

    JTabbedPane tabs() {
        return tabs;
    }

    /** The charts currently shown (for export). */
    List<ChartSpec> charts() {
        List<ChartSpec> list = new ArrayList<>();
        if (spreadSpec != null) {
            list.add(spreadSpec);
        }
        if (settlingSpec != null) {
            list.add(settlingSpec);
        }
        return list;
    }

    /** The results table as text rows (for tests and the clipboard). */
    List<List<String>> tableRows() {
        List<List<String>> rows = new ArrayList<>();
        for (int r = 0; r < table.getRowCount(); r++) {
            List<String> row = new ArrayList<>();
            for (int c = 0; c < table.getColumnCount(); c++) {
                row.add(String.valueOf(table.getValueAt(r, c)));
            }
            rows.add(row);
        }
        return rows;
    }

    void showEmpty() {
        banner.setText("No result yet: fill in the form and press Run (Ctrl+R).");
        spreadSpec = null;
        settlingSpec = null;
        placeholder(spread, "The spread of the particle cloud appears here while the simulation runs.");
        placeholder(settling, "The running eddy diffusivity appears here while the simulation runs.");
        record.removeAll();
        record.add(new JLabel("For the measured-record route, the record's spectrum and autocorrelation appear here.",
                JLabel.CENTER));
        table.setRowCount(0);
        reasoning.setText(cautionsText(List.of()));
    }

    /** Curves so far while a run is going. */
    void showPartial(SpreadCurves c, String status) {
        banner.setText(status);
        spreadSpec = ChartSpecs.spread(c, "Spread of the particle cloud (so far)");
        settlingSpec = ChartSpecs.settling(c, null);
        chart(spread, spreadSpec);
        chart(settling, settlingSpec);
    }

    void showRunning(String status) {
        banner.setText(status);
    }

    void showStale() {
        banner.setText("The inputs changed since this result: run again to update it.");
    }

    void showResult(StudyResult s) {
        DiffusivityResult r = s.diffusivity();
        SpreadCurves c = SpreadCurves.of(r);
        spreadSpec = ChartSpecs.spread(c, "Spread of the particle cloud");
        settlingSpec = ChartSpecs.settling(c, r.axes());
        chart(spread, spreadSpec);
        chart(settling, settlingSpec);
        record.removeAll();
        if (s.flow().analysis() != null) {
            record.add(ThemeCharts.panel(ChartSpecs.spectrum(s.flow().analysis())));
            record.add(ThemeCharts.panel(ChartSpecs.autocorrelation(s.flow().analysis())));
        } else {
            record.add(new JLabel("This route has no measured record.", JLabel.CENTER));
        }
        table.setRowCount(0);
        for (SummaryContent.Row row : SummaryContent.of(s).results()) {
            table.addRow(new Object[] {row.quantity(), row.value(), row.interval(), row.unit()});
        }
        List<String> assumptions = new ArrayList<>(s.flow().assumptions());
        assumptions.addAll(s.flow().warnings().stream().map(w -> "Warning: " + w).toList());
        assumptions.addAll(r.warnings().stream().map(w -> "Warning: " + w).toList());
        assumptions.addAll(r.notes().stream().map(n -> "Note: " + n).toList());
        reasoning.setText(cautionsText(assumptions));
        reasoning.setCaretPosition(0);
        int warnings = s.flow().warnings().size() + r.warnings().size();
        banner.setText(String.format(Locale.ROOT, "Result of \"%s\" (%.1f s)%s", s.scenario().name(),
                r.elapsedSeconds(), warnings == 0 ? "" : ": " + warnings + " warning" + (warnings == 1 ? "" : "s")
                        + ", see Assumptions and cautions"));
        revalidate();
        repaint();
    }

    private static String cautionsText(List<String> assumptions) {
        StringBuilder sb = new StringBuilder();
        if (!assumptions.isEmpty()) {
            sb.append("How this result was obtained\n");
            for (String a : assumptions) {
                sb.append("  \u2022 ").append(a).append('\n');
            }
            sb.append('\n');
        }
        sb.append("Cautions\n");
        for (String c : Cautions.ALL) {
            sb.append("  \u2022 ").append(c).append('\n');
        }
        return sb.toString();
    }

    private static void placeholder(JPanel p, String text) {
        p.removeAll();
        p.add(new JLabel(text, JLabel.CENTER), BorderLayout.CENTER);
        p.revalidate();
    }

    private static void chart(JPanel p, ChartSpec spec) {
        if (p.getComponentCount() == 1 && p.getComponent(0) instanceof ChartPanel cp) {
            cp.setChart(org.eddycast.sheet.ChartRendering.chart(spec, ThemeCharts.palette(), ThemeCharts.font()));
            return;
        }
        p.removeAll();
        p.add(ThemeCharts.panel(spec), BorderLayout.CENTER);
        p.revalidate();
    }
}
