package org.eddycast.ui;

import java.awt.BorderLayout;
import java.awt.Dimension;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import javax.swing.JLabel;
import javax.swing.JPanel;
import net.miginfocom.swing.MigLayout;
import org.eddycast.sheet.SensitivityChart;
import org.eddycast.sheet.UncertaintyTables;
import org.eddycast.uncertainty.UncertaintySummary;
import org.jfree.chart.ChartPanel;

/**
 * How sure the answer is once the inputs are uncertain, at the head of the results' inputs tab: the inputs
 * ranked by their share of the main figure's variance (a {@link SensitivityChart} in the theme's colours, the
 * advice under it), each headline figure's two intervals side by side, and the ranged inputs with their
 * indices as numbers.
 */
final class SensitivityView extends JPanel {

    private final JPanel chartHolder = new JPanel(new BorderLayout());
    private final TextTable figures = new TextTable("uncertainty.figures");
    private final TextTable inputs = new TextTable("uncertainty.inputs");
    private final WrappingText notes = new WrappingText("uncertainty.notes");
    private UncertaintySummary summary;

    SensitivityView() {
        super(new MigLayout("insets 0, wrap 1, fillx", "[grow,fill]"));
        setName("uncertainty");
        chartHolder.setName("uncertainty.chart");
        add(chartHolder, "wmin 10");
        add(heading("Headline figures: the particles' noise beside the inputs' range"), "wmin 10");
        add(figures.scroll(), "wmin 10");
        add(heading("Ranged inputs, largest total index first"), "wmin 10");
        add(inputs.scroll(), "wmin 10");
        add(notes, "wmin 10");
    }

    private static JLabel heading(String text) {
        JLabel l = new JLabel(text);
        l.putClientProperty("FlatLaf.styleClass", "h4");
        return l;
    }

    /** Shows a summary that carries sensitivity indices. */
    void show(UncertaintySummary u) {
        show(u, org.eddycast.scenario.DisplayUnits.si());
    }

    /** Shows a summary, its figures in the scenario's display units. */
    void show(UncertaintySummary u, org.eddycast.scenario.DisplayUnits units) {
        summary = u;
        drawChart();
        figures.show(UncertaintyTables.figures(u, units));
        inputs.show(UncertaintyTables.inputs(u));
        List<String> lines = new ArrayList<>();
        lines.add(String.format(Locale.ROOT, "%d runs of %d particles each: a Saltelli design of %d base samples "
                        + "over %d ranged inputs (Saltelli et al. 2010). The Monte Carlo interval covers the "
                        + "particles' noise in the single run; the input range, the spread of the inputs.",
                u.runs(), u.particles(), u.baseSamples(), u.inputs().size()));
        u.notes().forEach(n -> lines.add("\u2022 " + n));
        notes.setText(String.join("\n", lines));
    }

    /** The summary shown, or null. */
    UncertaintySummary summary() {
        return summary;
    }

    /** The chart component (for tests), or null before a summary is shown. */
    ChartPanel chartPanel() {
        return chartHolder.getComponentCount() == 1 && chartHolder.getComponent(0) instanceof ChartPanel p ? p : null;
    }

    List<List<String>> figureRows() {
        return figures.rows();
    }

    List<List<String>> inputRows() {
        return inputs.rows();
    }

    @Override
    public void updateUI() {
        super.updateUI();
        // the look and feel calls this before the fields exist, and again on every change of theme
        if (chartHolder != null && summary != null) {
            drawChart();
        }
    }

    private void drawChart() {
        chartHolder.removeAll();
        if (summary.sensitivity().isEmpty()) {
            JLabel none = new JLabel("This study ranged its inputs without ranking them: no sensitivity indices.");
            none.setName("uncertainty.noRanking");
            chartHolder.add(none, BorderLayout.CENTER);
            chartHolder.revalidate();
            return;
        }
        ChartPanel p = new ChartPanel(SensitivityChart.chart(summary, ThemeCharts.palette(), ThemeCharts.font()),
                false, false, false, true, true);
        int height = (int) SensitivityChart.preferredHeight(summary);
        // small enough that the chart never forces the window wider than 1024
        p.setMinimumDrawWidth(200);
        p.setMinimumDrawHeight(150);
        p.setMaximumDrawHeight(2000);
        p.setMaximumDrawWidth(3000);
        p.setPreferredSize(new Dimension(480, height));
        p.setMinimumSize(new Dimension(200, height));
        p.setBackground(ThemeCharts.palette().background());
        p.setMouseWheelEnabled(false);
        chartHolder.add(p, BorderLayout.CENTER);
        chartHolder.revalidate();
        chartHolder.repaint();
    }
}
