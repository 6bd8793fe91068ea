package org.eddycast.ui;

import java.awt.Color;
import java.awt.Font;
import java.util.List;
import javax.swing.UIManager;
import org.eddycast.sheet.ChartRendering;
import org.eddycast.report.ChartSpec;
import org.jfree.chart.ChartPanel;

/** Chart components in the colours of the current FlatLaf theme (light or dark). */
final class ThemeCharts {

    private ThemeCharts() {
    }

    static ChartRendering.Palette palette() {
        Color bg = colour("Panel.background", Color.WHITE);
        Color fg = colour("Label.foreground", Color.BLACK);
        Color grid = colour("Separator.foreground", Color.LIGHT_GRAY);
        boolean dark = bg.getRed() + bg.getGreen() + bg.getBlue() < 384;
        List<Color> series = dark
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

    static ChartPanel panel(ChartSpec spec) {
        ChartPanel p = new ChartPanel(ChartRendering.chart(spec, palette(), font()), false, false, false, true,
                true);
        p.setMouseWheelEnabled(true);
        return p;
    }
}
