package org.eddycast.ui;

import java.util.Locale;
import java.util.ResourceBundle;

/**
 * Plain definitions of the terms the results use, with their units, for tooltips on table columns, table rows
 * and chart axes. The definitions live in {@code glossary.properties}; the longest phrase of the glossary found
 * in a heading gives its definition.
 */
final class Glossary {

    private static final ResourceBundle BUNDLE = ResourceBundle.getBundle("org.eddycast.ui.glossary");

    private Glossary() {
    }

    /** The definition of the longest glossary term the text contains, or null when it contains none. */
    static String definition(String text) {
        if (text == null) {
            return null;
        }
        String lower = text.replaceAll("<[^>]*>", " ").toLowerCase(Locale.ROOT);
        String best = null;
        for (String key : BUNDLE.keySet()) {
            if (lower.contains(key) && (best == null || key.length() > best.length())) {
                best = key;
            }
        }
        return best == null ? null : BUNDLE.getString(best);
    }

    /** The definition as a tooltip that wraps (HTML), or null. */
    static String tooltip(String text) {
        String d = definition(text);
        if (d == null) {
            return null;
        }
        return "<html><body style='width: 320px'>" + d.replace("&", "&amp;").replace("<", "&lt;") + "</body></html>";
    }
}
