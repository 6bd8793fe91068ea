package org.eddycast.sheet;

import org.eddycast.report.ChartSpec;
import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Font;
import java.awt.Graphics2D;
import java.awt.geom.Rectangle2D;
import java.util.List;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.axis.LogAxis;
import org.jfree.chart.axis.NumberAxis;
import org.jfree.chart.axis.ValueAxis;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.xy.DeviationRenderer;
import org.jfree.chart.title.LegendTitle;
import org.jfree.chart.title.TextTitle;
import org.jfree.chart.ui.RectangleEdge;
import org.jfree.data.xy.YIntervalSeries;
import org.jfree.data.xy.YIntervalSeriesCollection;

/**
 * Draws a {@link ChartSpec} with JFreeChart: once for the panel (colours of the current theme) and once for
 * paper (the sheet's palette). Bands are drawn as translucent areas behind their curves. Works headless.
 */
public final class ChartRendering {

    /**
     * The colours a chart is drawn with.
     *
     * @param background the plot background
     * @param foreground text and axes
     * @param grid       grid lines
     * @param series     curve colours, used in turn
     */
    public record Palette(Color background, Color foreground, Color grid, List<Color> series) {
        public Palette {
            series = List.copyOf(series);
        }
    }

    /** The palette for paper: dark text on white, curves that stay apart when printed in grey. */
    public static final Palette PAPER = new Palette(Color.WHITE, new Color(0x22, 0x22, 0x22),
            new Color(0xd6, 0xd6, 0xd6), List.of(new Color(0x1f, 0x6f, 0x8b), new Color(0xb8, 0x6b, 0x1c),
            new Color(0x6a, 0x3d, 0x8f), new Color(0x3d, 0x8f, 0x4f), new Color(0x8b, 0x1f, 0x3d),
            new Color(0x55, 0x55, 0x55)));

    private ChartRendering() {
    }

    /** A JFreeChart of the spec in the given palette. */
    public static JFreeChart chart(ChartSpec spec, Palette palette, Font baseFont) {
        YIntervalSeriesCollection data = new YIntervalSeriesCollection();
        for (ChartSpec.Curve c : spec.curves()) {
            YIntervalSeries s = new YIntervalSeries(c.name(), false, true);
            double[] x = c.x();
            double[] y = c.y();
            double[] lo = c.hasBand() ? c.low() : y;
            double[] hi = c.hasBand() ? c.high() : y;
            for (int j = 0; j < x.length; j++) {
                boolean drawable = Double.isFinite(x[j]) && Double.isFinite(y[j])
                        && (!spec.logX() || x[j] > 0) && (!spec.logY() || y[j] > 0);
                if (drawable) {
                    s.add(x[j], y[j], Double.isFinite(lo[j]) ? lo[j] : y[j], Double.isFinite(hi[j]) ? hi[j] : y[j]);
                }
            }
            data.addSeries(s);
        }
        DeviationRenderer renderer = new DeviationRenderer(true, false);
        renderer.setAlpha(0.22f);
        for (int i = 0; i < spec.curves().size(); i++) {
            ChartSpec.Curve c = spec.curves().get(i);
            int index = c.colour() >= 0 ? c.colour() : i;
            Color colour = palette.series().get(index % palette.series().size());
            renderer.setSeriesPaint(i, colour);
            renderer.setSeriesFillPaint(i, colour);
            renderer.setSeriesStroke(i, c.dashed()
                    ? new BasicStroke(1.4f, BasicStroke.CAP_BUTT, BasicStroke.JOIN_ROUND, 1f, new float[] {6f, 4f},
                    0f)
                    : new BasicStroke(1.8f));
        }
        ValueAxis xAxis = axis(spec.xLabel(), spec.logX(), palette, baseFont);
        ValueAxis yAxis = axis(spec.yLabel(), spec.logY(), palette, baseFont);
        if (xAxis instanceof NumberAxis n) {
            n.setAutoRangeIncludesZero(false);
        }
        XYPlot plot = new XYPlot(data, xAxis, yAxis, renderer);
        plot.setBackgroundPaint(palette.background());
        plot.setDomainGridlinePaint(palette.grid());
        plot.setRangeGridlinePaint(palette.grid());
        plot.setOutlinePaint(palette.grid());
        JFreeChart chart = new JFreeChart(null, baseFont, plot, true);
        chart.setTitle(new TextTitle(spec.title(), baseFont.deriveFont(Font.BOLD, baseFont.getSize2D() + 1f),
                palette.foreground(), RectangleEdge.TOP, org.jfree.chart.ui.HorizontalAlignment.LEFT,
                org.jfree.chart.ui.VerticalAlignment.CENTER, new org.jfree.chart.ui.RectangleInsets(2, 4, 4, 4)));
        chart.setBackgroundPaint(palette.background());
        LegendTitle legend = chart.getLegend();
        legend.setPosition(RectangleEdge.BOTTOM);
        legend.setBackgroundPaint(palette.background());
        legend.setItemPaint(palette.foreground());
        legend.setItemFont(baseFont.deriveFont(baseFont.getSize2D() - 1f));
        legend.setFrame(org.jfree.chart.block.BlockBorder.NONE);
        return chart;
    }

    private static ValueAxis axis(String label, boolean log, Palette p, Font font) {
        ValueAxis a;
        if (log) {
            LogAxis l = new LogAxis(label);
            l.setSmallestValue(1e-300);
            l.setNumberFormatOverride(new LogTickFormat());
            a = l;
        } else {
            NumberAxis n = new NumberAxis(label);
            n.setNumberFormatOverride(new CompactNumberFormat());
            a = n;
        }
        a.setLabelFont(font);
        a.setTickLabelFont(font.deriveFont(font.getSize2D() - 1f));
        a.setLabelPaint(p.foreground());
        a.setTickLabelPaint(p.foreground());
        a.setAxisLinePaint(p.foreground());
        a.setTickMarkPaint(p.foreground());
        return a;
    }

    /** Draws the spec into an area of a Graphics2D (a PDF page, a printer page, an image or an SVG document). */
    public static void draw(ChartSpec spec, Palette palette, Font font, Graphics2D g, Rectangle2D area) {
        chart(spec, palette, font).draw(g, area);
    }

    /** Log-axis tick labels: two significant figures, plain decimals for ordinary magnitudes. */
    static final class LogTickFormat extends java.text.NumberFormat {
        private static final long serialVersionUID = 1L;

        @Override
        public StringBuffer format(double v, StringBuffer sb, java.text.FieldPosition pos) {
            double a = Math.abs(v);
            if (v == 0 || !Double.isFinite(v)) {
                return sb.append(v == 0 ? "0" : String.valueOf(v));
            }
            if (a >= 1e-3 && a < 1e5) {
                return sb.append(new java.math.BigDecimal(v).round(new java.math.MathContext(2))
                        .stripTrailingZeros().toPlainString());
            }
            return sb.append(String.format(java.util.Locale.ROOT, "%.1e", v));
        }

        @Override
        public StringBuffer format(long v, StringBuffer sb, java.text.FieldPosition pos) {
            return format((double) v, sb, pos);
        }

        @Override
        public Number parse(String s, java.text.ParsePosition pos) {
            return null;
        }
    }

    /** Tick labels: plain decimals for ordinary magnitudes, powers of ten for very small or large ones. */
    static final class CompactNumberFormat extends java.text.NumberFormat {
        private static final long serialVersionUID = 1L;

        @Override
        public StringBuffer format(double v, StringBuffer sb, java.text.FieldPosition pos) {
            double a = Math.abs(v);
            if (v == 0) {
                return sb.append('0');
            }
            if (a >= 1e-3 && a < 1e5) {
                String s = new java.math.BigDecimal(v).round(new java.math.MathContext(4)).stripTrailingZeros()
                        .toPlainString();
                return sb.append(s);
            }
            return sb.append(String.format(java.util.Locale.ROOT, "%.3g", v));
        }

        @Override
        public StringBuffer format(long v, StringBuffer sb, java.text.FieldPosition pos) {
            return sb.append(v);
        }

        @Override
        public Number parse(String s, java.text.ParsePosition pos) {
            return null;
        }
    }
}
