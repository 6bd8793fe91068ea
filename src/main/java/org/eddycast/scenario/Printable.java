package org.eddycast.scenario;

/**
 * Text from a file made safe to show on a terminal or in a message: control characters (which could move the
 * cursor, clear the screen or ring the bell) are written as escapes such as {@code \t} or {@code \u001b},
 * everything else is kept as it is.
 */
public final class Printable {

    private Printable() {
    }

    /** {@code text} with its control characters escaped; null stays null. */
    public static String escape(String text) {
        if (text == null) {
            return null;
        }
        StringBuilder sb = null;
        for (int i = 0; i < text.length(); i++) {
            char c = text.charAt(i);
            if (Character.isISOControl(c)) {
                if (sb == null) {
                    sb = new StringBuilder(text.length() + 8).append(text, 0, i);
                }
                switch (c) {
                    case '\n' -> sb.append("\\n");
                    case '\r' -> sb.append("\\r");
                    case '\t' -> sb.append("\\t");
                    default -> sb.append(String.format("\\u%04x", (int) c));
                }
            } else if (sb != null) {
                sb.append(c);
            }
        }
        return sb == null ? text : sb.toString();
    }
}
