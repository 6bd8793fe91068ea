package org.eddycast.ui;

import java.awt.Color;

/** The few colours the window sets itself, chosen per theme so text stays readable on light and dark. */
final class ThemeColours {

    private ThemeColours() {
    }

    /**
     * The background that marks a table cell worth a second look: a soft amber under dark text in the light
     * theme, a deep amber under light text in the dark theme, so the text stays readable in both.
     */
    static Color highlight() {
        return ThemeCharts.dark() ? new Color(0x6b, 0x4a, 0x10) : new Color(0xff, 0xe0, 0xb0);
    }

    /** Text that names a problem: a red that stays readable on the theme's background. */
    static Color problemText() {
        return ThemeCharts.dark() ? new Color(0xff, 0x8a, 0x80) : new Color(0xc6, 0x28, 0x28);
    }
}
