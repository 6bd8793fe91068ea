package org.eddycast.sheet;

import java.awt.BasicStroke;
import java.awt.Font;
import java.awt.Graphics2D;
import java.awt.geom.Rectangle2D;
import java.util.Comparator;
import java.util.List;
import org.eddycast.uncertainty.UncertaintySummary;
import org.eddycast.uncertainty.UncertaintySummary.SensitivityIndex;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.axis.AxisLocation;
import org.jfree.chart.axis.CategoryAxis;
import org.jfree.chart.axis.NumberAxis;
import org.jfree.chart.axis.NumberTickUnit;
import org.jfree.chart.block.BlockBorder;
import org.jfree.chart.plot.CategoryPlot;
import org.jfree.chart.plot.PlotOrientation;
import org.jfree.chart.renderer.category.StandardBarPainter;
import org.jfree.chart.renderer.category.StatisticalBarRenderer;
import org.jfree.chart.title.LegendTitle;
import org.jfree.chart.title.TextTitle;
import org.jfree.chart.ui.HorizontalAlignment;
import org.jfree.chart.ui.RectangleEdge;
import org.jfree.chart.ui.RectangleInsets;
import org.jfree.chart.ui.VerticalAlignment;
import org.jfree.data.statistics.DefaultStatisticalCategoryDataset;

/**
 * The inputs ranked by their share of the main figure's variance, as horizontal bars: for each input its
 * first-order index (the share it explains alone) beside its total index (the share including its
 * interactions), each with a whisker over its 95% interval, the input with the largest total index on top.
 * The axis runs from 0 to 1, widened to take the intervals in but never beyond -0.5 and 1.5: a whisker cut
 * there belongs to a design too small to rank its inputs, and the tables give its numbers.
 * The title names the figure; the advice sentence stands under the chart. Drawn in any
 * {@link ChartRendering.Palette}, so the window (light or dark theme), the exports and the sheet show the same
 * ranking. Works headless.
 */
public final class SensitivityChart {

    /** The legend's words for the two bars. */
    static final String FIRST = "first-order index (the input alone)";
    static final String TOTAL = "total index (with its interactions)";

    /** How far beyond 0 and 1 the axis goes at most, however wide an interval. */
    static final double AXIS_LIMIT = 0.5;

    private SensitivityChart() {
    }

    /** The title: which figure the shares are of. */
    public static String title(UncertaintySummary u) {
        return "What moves the " + u.mainFigure().label() + ": share of its variance by input";
    }

    /** The indices, largest total index first. */
    public static List<SensitivityIndex> ranked(UncertaintySummary u) {
        return u.sensitivity().stream()
                .sorted(Comparator.comparingDouble(SensitivityIndex::total).reversed()).toList();
    }

    /** The chart of a summary with at least one index, in a palette. */
    public static JFreeChart chart(UncertaintySummary u, ChartRendering.Palette palette, Font baseFont) {
        if (u.sensitivity().isEmpty()) {
            throw new IllegalArgumentException("the summary carries no sensitivity indices to chart");
        }
        DefaultStatisticalCategoryDataset data = new DefaultStatisticalCategoryDataset();
        double low = 0;
        double high = 1;
        for (SensitivityIndex s : ranked(u)) {
            // the dataset's "standard deviation" is drawn as a whisker of that half-length: the 95% half-width
            data.add(s.first(), s.firstHalfWidth(), FIRST, s.input());
            data.add(s.total(), s.totalHalfWidth(), TOTAL, s.input());
            low = Math.min(low, Math.min(s.first() - s.firstHalfWidth(), s.total() - s.totalHalfWidth()));
            high = Math.max(high, Math.max(s.first() + s.firstHalfWidth(), s.total() + s.totalHalfWidth()));
        }
        Font small = baseFont.deriveFont(baseFont.getSize2D() - 1f);
        CategoryAxis inputs = new CategoryAxis(null);
        inputs.setTickLabelFont(baseFont);
        inputs.setTickLabelPaint(palette.foreground());
        inputs.setAxisLinePaint(palette.foreground());
        inputs.setCategoryMargin(0.3);
        inputs.setMaximumCategoryLabelWidthRatio(0.45f);
        NumberAxis share = new NumberAxis("share of the variance (Sobol index); whiskers: 95% interval");
        // an index is a share from 0 to 1; a small design's wide intervals are cut at AXIS_LIMIT beyond that
        low = Math.max(-AXIS_LIMIT, low);
        high = Math.min(1 + AXIS_LIMIT, high);
        share.setRange(low, high);
        share.setTickUnit(new NumberTickUnit(tickStep(high - low)));
        share.setLabelFont(small);
        share.setTickLabelFont(small);
        share.setLabelPaint(palette.foreground());
        share.setTickLabelPaint(palette.foreground());
        share.setAxisLinePaint(palette.foreground());
        share.setTickMarkPaint(palette.foreground());
        StatisticalBarRenderer bars = new StatisticalBarRenderer();
        bars.setBarPainter(new StandardBarPainter());
        bars.setShadowVisible(false);
        bars.setDrawBarOutline(false);
        bars.setItemMargin(0.05);
        bars.setSeriesPaint(0, palette.series().get(0));
        bars.setSeriesPaint(1, palette.series().get(1 % palette.series().size()));
        bars.setErrorIndicatorPaint(palette.foreground());
        bars.setErrorIndicatorStroke(new BasicStroke(1.2f));
        CategoryPlot plot = new CategoryPlot(data, inputs, share, bars);
        plot.setOrientation(PlotOrientation.HORIZONTAL);
        plot.setRangeAxisLocation(AxisLocation.BOTTOM_OR_LEFT);
        plot.setBackgroundPaint(palette.background());
        plot.setRangeGridlinePaint(palette.grid());
        plot.setOutlinePaint(palette.grid());
        plot.setDomainGridlinesVisible(false);
        JFreeChart chart = new JFreeChart(null, baseFont, plot, true);
        chart.setBackgroundPaint(palette.background());
        chart.setPadding(new RectangleInsets(2, 2, 2, 12));
        chart.setTitle(new TextTitle(title(u), baseFont.deriveFont(Font.BOLD, baseFont.getSize2D() + 1f),
                palette.foreground(), RectangleEdge.TOP, HorizontalAlignment.LEFT, VerticalAlignment.CENTER,
                new RectangleInsets(2, 4, 4, 4)));
        LegendTitle legend = chart.getLegend();
        legend.setPosition(RectangleEdge.BOTTOM);
        legend.setBackgroundPaint(palette.background());
        legend.setItemPaint(palette.foreground());
        legend.setItemFont(small);
        legend.setFrame(BlockBorder.NONE);
        if (!u.advice().isBlank()) {
            TextTitle advice = new TextTitle(u.advice(), baseFont, palette.foreground(), RectangleEdge.BOTTOM,
                    HorizontalAlignment.LEFT, VerticalAlignment.CENTER, new RectangleInsets(6, 4, 2, 4));
            advice.setMaximumLinesToDisplay(4);
            // the first subtitle at an edge is drawn outermost: the advice below the legend
            chart.addSubtitle(0, advice);
        }
        return chart;
    }

    /** A height that gives each input's pair of bars room: points on paper, pixels on screen. */
    public static double preferredHeight(UncertaintySummary u) {
        return Math.min(460, 170 + 36 * u.sensitivity().size());
    }

    /** A step of 1, 2 or 5 times a power of ten giving five to ten ticks over the span. */
    static double tickStep(double span) {
        double raw = span / 10;
        double power = Math.pow(10, Math.floor(Math.log10(raw)));
        for (double m : new double[] {1, 2, 5}) {
            if (m * power >= raw) {
                return m * power;
            }
        }
        return 10 * power;
    }

    /** Draws the chart into an area of a Graphics2D (a PDF page, an image or an SVG document). */
    public static void draw(UncertaintySummary u, ChartRendering.Palette palette, Font font, Graphics2D g,
                            Rectangle2D area) {
        chart(u, palette, font).draw(g, area);
    }
}
