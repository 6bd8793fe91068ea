package org.eddycast.ui;

import java.util.ResourceBundle;

/** The form's labels and tooltips, from {@code form.properties}. */
final class FormText {

    private static final ResourceBundle BUNDLE = ResourceBundle.getBundle("org.eddycast.ui.form");

    private FormText() {
    }

    /** The text for a key, or the key itself when missing (so a missing text shows, never crashes). */
    static String get(String key) {
        return BUNDLE.containsKey(key) ? BUNDLE.getString(key) : key;
    }

    /** A label with its '&amp;' mnemonic marker removed. */
    static String plain(String key) {
        return get(key).replace("&", "");
    }

    /** The mnemonic character marked by '&amp;' in a label, or 0. */
    static int mnemonic(String key) {
        String s = get(key);
        int i = s.indexOf('&');
        return i >= 0 && i + 1 < s.length() ? Character.toUpperCase(s.charAt(i + 1)) : 0;
    }
}
