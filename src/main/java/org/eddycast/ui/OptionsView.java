package org.eddycast.ui;

import java.awt.BorderLayout;
import java.util.ArrayList;
import java.util.List;
import javax.swing.BorderFactory;
import javax.swing.JLabel;
import javax.swing.JPanel;
import net.miginfocom.swing.MigLayout;
import org.eddycast.engine.StudyResult;
import org.eddycast.forecast.Forecast;
import org.eddycast.report.ChartSpec;
import org.eddycast.report.ChartSpecs;
import org.eddycast.report.OptionComparison;
import org.eddycast.report.OptionVerdict;
import org.eddycast.report.SpreadCurves;
import org.eddycast.report.SummaryContent;

/**
 * Design options compared: the answer to the design question in one sentence naming the options, a table of
 * the figures the question is about per option (the first mixing figure, then the eddy diffusivity per axis,
 * each with its 95% interval; cells whose interval does not overlap the first option's are marked, and a legend
 * says so), the full comparison in words, and the options' curves overlaid below.
 */
final class OptionsView extends JPanel {

    private final List<String> names = new ArrayList<>();
    private final List<StudyResult> results = new ArrayList<>();
    private final WrappingText verdict = new WrappingText("verdict");
    private final TextTable table = new TextTable("options");
    private final JPanel legend = new JPanel(new MigLayout("insets 0", "[][grow,fill]"));
    private final JLabel swatch = new JLabel(" 1.23 ");
    private final WrappingText legendText = new WrappingText("optionsLegend");
    private final WrappingText details = new WrappingText("optionDetails");
    private final JPanel chartHolder = new JPanel(new BorderLayout());
    private final JLabel empty = new JLabel("<html><center>Keep two or more results as options (Run \u25b8 Keep result"
            + " as option, Ctrl+K)<br>to compare them side by side.</center></html>", JLabel.CENTER);
    private final JPanel page = new JPanel(new MigLayout("insets dialog, wrap 1, fillx, hidemode 3",
            "[grow,fill]"));
    private final javax.swing.JScrollPane scroll = ScrollPage.around(page);
    private OptionComparison comparison;

    OptionsView() {
        super(new BorderLayout());
        verdict.putClientProperty("FlatLaf.styleClass", "h3");
        swatch.setOpaque(true);
        swatch.setFont(swatch.getFont().deriveFont(java.awt.Font.BOLD));
        legend.add(swatch, "aligny top");
        legend.add(legendText, "wmin 10");
        chartHolder.setPreferredSize(new java.awt.Dimension(480, 300));
        chartHolder.setMinimumSize(new java.awt.Dimension(200, 220));
        JPanel top = new JPanel(new MigLayout("insets dialog, wrap 1, fillx", "[grow,fill]"));
        top.add(verdict, "wmin 10");
        top.setBorder(BorderFactory.createMatteBorder(0, 0, 1, 0, javax.swing.UIManager.getColor(
                "Separator.foreground")));
        page.add(table.scroll(), "wmin 10");
        page.add(legend, "wmin 10");
        page.add(details, "wmin 10");
        page.add(chartHolder, "wmin 10, h 300!");
        add(top, BorderLayout.NORTH);
        add(scroll, BorderLayout.CENTER);
        refresh();
    }

    /** Keeps a result as an option under its own name; returns the name it is shown under. */
    String keep(StudyResult r) {
        String base = r.scenario().name();
        String name = base;
        for (int i = 2; names.contains(name); i++) {
            name = base + " (" + i + ")";
        }
        names.add(name);
        results.add(r);
        refresh();
        return name;
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

    /** The one-sentence verdict shown (for tests). */
    String verdictText() {
        return verdict.getText();
    }

    /** The full comparison in words (for tests). */
    String detailsText() {
        return details.getText();
    }

    /** The table's rows (for tests). */
    List<List<String>> tableRows() {
        return table.rows();
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
                    false, i));
        }
        return new ChartSpec("Options compared: spread along x", "time (s)", "mean-square displacement (m\u00b2)",
                false, false, curves);
    }

    @Override
    public void updateUI() {
        super.updateUI();
        if (chartHolder != null) {
            refresh();
        }
    }

    private void refresh() {
        chartHolder.removeAll();
        comparison = null;
        boolean compared = results.size() >= 2;
        if (!compared) {
            verdict.setText(results.size() == 1 ? "One option kept: \u201c" + names.get(0) + "\u201d. Keep another "
                    + "to compare." : "No options kept yet.");
            table.show(SummaryContent.Table.EMPTY);
            table.highlight((r, c) -> false);
            chartHolder.add(empty, BorderLayout.CENTER);
            details.setText("");
        } else {
            comparison = OptionComparison.of(names, results);
            verdict.setText(OptionVerdict.sentence(names, results));
            showTable();
            details.setText(comparison.verdict());
            chartHolder.add(ThemeCharts.panel(chartSpec()), BorderLayout.CENTER);
        }
        legend.setVisible(compared);
        details.setVisible(compared);
        ScrollPage.toTop(scroll);
        revalidate();
        repaint();
    }

    private void showTable() {
        List<String> header = new ArrayList<>();
        header.add("figure");
        header.addAll(names);
        List<List<String>> rows = new ArrayList<>();
        boolean mixingRow = results.stream().anyMatch(r -> r.forecast() != null && !r.forecast().mixing().isEmpty());
        if (mixingRow) {
            String label = results.stream().filter(r -> r.forecast() != null && !r.forecast().mixing().isEmpty())
                    .findFirst().map(r -> r.forecast().mixing().get(0)).map(m -> shortName(m.name()) + " ["
                            + SummaryContent.unit(m.unit()) + "]").orElse("");
            List<String> row = new ArrayList<>(List.of(label));
            for (StudyResult r : results) {
                Forecast f = r.forecast();
                if (f == null || f.mixing().isEmpty()) {
                    row.add("\u2014");
                } else {
                    Forecast.MixingFigure m = f.mixing().get(0);
                    row.add(SummaryContent.number(m.value()) + " [" + SummaryContent.number(m.low()) + ", "
                            + SummaryContent.number(m.high()) + "]");
                }
            }
            rows.add(row);
        }
        for (int a = 0; a < comparison.axes().size(); a++) {
            // the unit in brackets goes on a second line, so the table fits beside the form at 1024 pixels
            List<String> row = new ArrayList<>(List.of("eddy diffusivity along " + comparison.axes().get(a)
                    + " [m\u00b2/s]"));
            for (int o = 0; o < names.size(); o++) {
                var e = comparison.values().get(o).get(a);
                row.add(SummaryContent.number(e.value()) + " [" + SummaryContent.number(e.low()) + ", "
                        + SummaryContent.number(e.high()) + "]");
            }
            rows.add(row);
        }
        table.show(new SummaryContent.Table(header, rows));
        int offset = mixingRow ? 1 : 0;
        OptionComparison c = comparison;
        table.highlight((r, col) -> col > 0 && r >= offset && r - offset < c.axes().size()
                && c.differs().get(col - 1).get(r - offset));
        swatch.setBackground(ThemeColours.highlight());
        legendText.setText("Bold on amber: this option's 95% interval does not overlap the first option's (\u201c"
                + names.get(0) + "\u201d). Under each value, its 95% interval.");
    }

    private static String shortName(String name) {
        int bracket = name.indexOf(" (");
        return bracket > 0 ? name.substring(0, bracket) : name;
    }

}
