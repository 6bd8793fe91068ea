package org.eddycast.ui;

import java.awt.Color;
import java.awt.Font;
import java.util.List;
import javax.swing.UIManager;
import org.eddycast.report.ChartSpec;
import org.eddycast.sheet.ChartRendering;
import org.jfree.chart.ChartPanel;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.plot.XYPlot;

/**
 * Chart components in the colours of the current FlatLaf theme (light or dark), with a plain definition of each
 * axis as its tooltip.
 */
final class ThemeCharts {

    private ThemeCharts() {
    }

    /** Whether the current theme is dark (its panel background is darker than mid grey). */
    static boolean dark() {
        Color bg = colour("Panel.background", Color.WHITE);
        return bg.getRed() + bg.getGreen() + bg.getBlue() < 384;
    }

    static ChartRendering.Palette palette() {
        Color bg = colour("Panel.background", Color.WHITE);
        Color fg = colour("Label.foreground", Color.BLACK);
        Color grid = colour("Separator.foreground", Color.LIGHT_GRAY);
        // on a dark background the paper colours are too dark: lighter tints of the same hues, in the same order
        List<Color> series = dark()
                ? List.of(new Color(0x5c, 0xb8, 0xd6), new Color(0xe8, 0xa2, 0x58), new Color(0xb3, 0x8c, 0xe0),
                new Color(0x7c, 0xcc, 0x8a), new Color(0xe0, 0x6c, 0x8c), new Color(0xaa, 0xaa, 0xaa))
                : ChartRendering.PAPER.series();
        return new ChartRendering.Palette(bg, fg, grid, series);
    }

    private static Color colour(String key, Color fallback) {
        Color c = UIManager.getColor(key);
        return c == null ? fallback : c;
    }

    static Font font() {
        Font f = UIManager.getFont("Label.font");
        return f == null ? new Font(Font.SANS_SERIF, Font.PLAIN, 12) : f;
    }

    /** The chart in the current theme. */
    static JFreeChart chart(ChartSpec spec) {
        return ChartRendering.chart(spec, palette(), font());
    }

    /** A chart panel whose axes explain themselves: over an axis the tooltip defines its quantity and unit. */
    static ChartPanel panel(ChartSpec spec) {
        ChartPanel p = new ChartPanel(chart(spec), false, false, false, true, true) {
            @Override
            public String getToolTipText(java.awt.event.MouseEvent e) {
                java.awt.geom.Rectangle2D area = getScreenDataArea();
                if (area != null && getChart().getPlot() instanceof XYPlot plot) {
                    if (e.getX() < area.getMinX() && e.getY() >= area.getMinY() && e.getY() <= area.getMaxY()) {
                        return Glossary.tooltip(plot.getRangeAxis().getLabel());
                    }
                    if (e.getY() > area.getMaxY() && e.getX() >= area.getMinX() && e.getX() <= area.getMaxX()) {
                        return Glossary.tooltip(plot.getDomainAxis().getLabel());
                    }
                }
                return super.getToolTipText(e);
            }
        };
        p.setMouseWheelEnabled(true);
        // small enough that a chart never forces the window wider or taller than 1024 x 700
        p.setMinimumDrawWidth(200);
        p.setMinimumDrawHeight(150);
        p.setPreferredSize(new java.awt.Dimension(480, 300));
        p.setMinimumSize(new java.awt.Dimension(200, 150));
        p.setBackground(palette().background());
        return p;
    }

    /** Puts a new chart of the spec in an existing panel, in the current theme's colours. */
    static void restyle(ChartPanel p, ChartSpec spec) {
        p.setChart(chart(spec));
        p.setBackground(palette().background());
    }
}
