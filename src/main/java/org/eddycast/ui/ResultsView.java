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
import org.eddycast.forecast.Forecast;
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
    private final JPanel width = new JPanel(new BorderLayout());
    private final JPanel peak = new JPanel(new BorderLayout());
    private final TextTable forecastTable = new TextTable("forecast");
    private final JTextArea mixing = area("mixing");
    private final TextTable handbookTable = new TextTable("handbook");
    private final JTextArea handbookNotes = area("handbookNotes");
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
    /** The preflight warnings of the run (wrapped at a fixed width so a long one cannot widen the panel). */
    private final JLabel preflight = new JLabel();
    private List<String> preflightWarnings = List.of();
    private final OptionsView options = new OptionsView();
    private ChartSpec spreadSpec;
    private ChartSpec settlingSpec;
    private ChartSpec widthSpec;
    private ChartSpec peakSpec;

    ResultsView() {
        super(new BorderLayout());
        banner.putClientProperty("FlatLaf.styleClass", "medium");
        banner.setBorder(javax.swing.BorderFactory.createEmptyBorder(6, 10, 6, 10));
        preflight.setName("preflight");
        preflight.setForeground(javax.swing.UIManager.getColor("Component.warning.focusedBorderColor"));
        preflight.setBorder(javax.swing.BorderFactory.createEmptyBorder(0, 10, 6, 10));
        preflight.setVisible(false);
        JPanel north = new JPanel(new BorderLayout());
        north.add(banner, BorderLayout.NORTH);
        north.add(preflight, BorderLayout.CENTER);
        add(north, BorderLayout.NORTH);
        resultsTable.setName("results");
        resultsTable.setFillsViewportHeight(true);
        reasoning.setEditable(false);
        reasoning.setLineWrap(true);
        reasoning.setWrapStyleWord(true);
        reasoning.setName("reasoning");
        JPanel forecast = new JPanel(new MigLayout("insets dialog, wrap 1, fill", "[grow,fill]",
                "[pref!,fill][grow,fill]"));
        forecast.add(forecastTable.scroll());
        forecast.add(new JScrollPane(mixing), "h 80:120:n");
        JPanel handbook = new JPanel(new MigLayout("insets dialog, wrap 1, fill", "[grow,fill]",
                "[pref!,fill][grow,fill]"));
        handbook.add(handbookTable.scroll());
        handbook.add(new JScrollPane(handbookNotes), "h 80:120:n");
        tabs.addTab("Width", width);
        tabs.addTab("Peak", peak);
        tabs.addTab("Forecast table", forecast);
        tabs.addTab("Handbook", handbook);
        tabs.addTab("Spread", spread);
        tabs.addTab("Settling", settling);
        tabs.addTab("Record", record);
        JScrollPane diffusivity = new JScrollPane(resultsTable);
        diffusivity.setColumnHeaderView(resultsTable.getTableHeader());
        tabs.addTab("Diffusivity", diffusivity);
        tabs.addTab("Assumptions and cautions", new JScrollPane(reasoning));
        tabs.addTab("Options", options);
        tabs.setTabLayoutPolicy(JTabbedPane.WRAP_TAB_LAYOUT);
        int[] keys = {java.awt.event.KeyEvent.VK_W, java.awt.event.KeyEvent.VK_P, java.awt.event.KeyEvent.VK_T,
                java.awt.event.KeyEvent.VK_H, java.awt.event.KeyEvent.VK_S, java.awt.event.KeyEvent.VK_E,
                java.awt.event.KeyEvent.VK_C, java.awt.event.KeyEvent.VK_I, java.awt.event.KeyEvent.VK_A,
                java.awt.event.KeyEvent.VK_O};
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
        if (widthSpec != null) {
            list.add(widthSpec);
        }
        if (peakSpec != null) {
            list.add(peakSpec);
        }
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

    /** Shows the warnings given before the run (an empty list hides them). */
    void showPreflight(List<String> warnings) {
        preflightWarnings = List.copyOf(warnings);
        StringBuilder html = new StringBuilder("<html><body style='width: 560px'>");
        for (String w : preflightWarnings) {
            html.append("Before the run: ").append(w.replace("&", "&amp;").replace("<", "&lt;")).append("<br>");
        }
        preflight.setText(html.append("</body></html>").toString());
        preflight.setVisible(!preflightWarnings.isEmpty());
    }

    /** The preflight warnings shown (for tests). */
    List<String> preflightShown() {
        return preflight.isVisible() ? preflightWarnings : List.of();
    }

    /** The banner's text (for tests). */
    String bannerText() {
        return banner.getText();
    }

    /** The forecast table's rows (for tests). */
    List<List<String>> forecastRows() {
        return forecastTable.rows();
    }

    /** The handbook table's rows (for tests). */
    List<List<String>> handbookRows() {
        return handbookTable.rows();
    }

    /** The assumptions and cautions as shown (for tests). */
    String reasoningText() {
        return reasoning.getText();
    }

    void showEmpty() {
        banner.setText("No result yet: fill in the form and press Run (Ctrl+R).");
        spreadSpec = null;
        settlingSpec = null;
        widthSpec = null;
        peakSpec = null;
        placeholder(width, "The forecast plume width appears here when a run finishes.");
        placeholder(peak, "The forecast peak concentration appears here when a run finishes.");
        forecastTable.show(SummaryContent.Table.EMPTY);
        handbookTable.show(SummaryContent.Table.EMPTY);
        mixing.setText("");
        handbookNotes.setText("");
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

    /** Tab indices the run moves between. */
    static final int WIDTH_TAB = 0;
    static final int SPREAD_TAB = 4;

    private boolean movedToSpread;

    void showRunning(String status) {
        banner.setText(status);
        // the forecast tabs stay empty until the end: show the curves that fill in meanwhile
        if (tabs.getSelectedIndex() < SPREAD_TAB) {
            tabs.setSelectedIndex(SPREAD_TAB);
            movedToSpread = true;
        }
    }

    void showStale() {
        banner.setText("The inputs changed since this result: run again to update it.");
    }

    void showResult(StudyResult s) {
        if (movedToSpread && tabs.getSelectedIndex() == SPREAD_TAB) {
            tabs.setSelectedIndex(WIDTH_TAB);
        }
        movedToSpread = false;
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
        SummaryContent content = SummaryContent.of(s);
        for (SummaryContent.Row row : content.results()) {
            table.addRow(new Object[] {row.quantity(), row.value(), row.interval(), row.unit()});
        }
        showForecast(s, content);
        reasoning.setText(cautionsText(content.assumptions(), content.cautions()));
        reasoning.setCaretPosition(0);
        int warnings = s.flow().warnings().size() + r.warnings().size();
        banner.setText(String.format(Locale.ROOT, "Result of \"%s\" (%.1f s)%s", s.scenario().name(),
                r.elapsedSeconds(), warnings == 0 ? "" : ": " + warnings + " warning" + (warnings == 1 ? "" : "s")
                        + ", see Assumptions and cautions"));
        revalidate();
        repaint();
    }

    private void showForecast(StudyResult s, SummaryContent content) {
        Forecast f = s.forecast();
        if (f == null) {
            widthSpec = null;
            peakSpec = null;
            placeholder(width, "This result carries no forecast.");
            placeholder(peak, "This result carries no forecast.");
            forecastTable.show(SummaryContent.Table.EMPTY);
            handbookTable.show(SummaryContent.Table.EMPTY);
            mixing.setText("");
            handbookNotes.setText("");
            return;
        }
        widthSpec = ChartSpecs.width(f, "Plume width");
        peakSpec = ChartSpecs.peak(f);
        chart(width, widthSpec);
        chart(peak, peakSpec);
        forecastTable.show(content.forecastTable());
        StringBuilder sb = new StringBuilder();
        for (SummaryContent.Row row : content.forecast()) {
            sb.append(row.quantity()).append(": ").append(row.value());
            if (!row.unit().isEmpty()) {
                sb.append(' ').append(row.unit());
            }
            if (!row.interval().isEmpty()) {
                sb.append("   95% interval ").append(row.interval()).append(' ').append(row.unit());
            }
            sb.append('\n');
        }
        sb.append("Widths are ").append(ChartSpecs.measureName(f))
                .append(f.measure() == org.eddycast.forecast.WidthMeasure.FULL_WIDTH_AT_HALF_MAXIMUM
                        ? " (FWHM)" : "").append("; brackets hold the 95% band.");
        mixing.setText(sb.toString());
        mixing.setCaretPosition(0);
        handbookTable.show(content.handbook());
        // on screen: estimate, ratio, agreement, the two values, and the long formula and source last
        if (!content.handbook().isEmpty()) {
            handbookTable.showInOrder(0, 4, 5, 2, 3, 1);
        }
        handbookNotes.setText(content.handbookNotes().isEmpty()
                ? "No handbook estimate applies to this flow route."
                : String.join("\n\n", content.handbookNotes()));
        handbookNotes.setCaretPosition(0);
    }

    private static JTextArea area(String name) {
        JTextArea a = new JTextArea();
        a.setEditable(false);
        a.setLineWrap(true);
        a.setWrapStyleWord(true);
        a.setName(name);
        return a;
    }

    private static String cautionsText(List<String> assumptions) {
        return cautionsText(assumptions, Cautions.ALL);
    }

    private static String cautionsText(List<String> assumptions, List<String> cautions) {
        StringBuilder sb = new StringBuilder();
        if (!assumptions.isEmpty()) {
            sb.append("How this result was obtained\n");
            for (String a : assumptions) {
                sb.append("  \u2022 ").append(a).append('\n');
            }
            sb.append('\n');
        }
        sb.append("Cautions\n");
        for (String c : cautions) {
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
