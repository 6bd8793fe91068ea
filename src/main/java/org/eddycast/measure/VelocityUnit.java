package org.eddycast.measure;

import java.util.Locale;

/** The velocity units a record header may name, with their factor to metres per second. */
public enum VelocityUnit {
    METRES_PER_SECOND("m/s", 1.0),
    CENTIMETRES_PER_SECOND("cm/s", 0.01),
    MILLIMETRES_PER_SECOND("mm/s", 0.001);

    /** The accepted spellings, for error messages. */
    public static final String VALID = "m/s, cm/s or mm/s";

    private final String symbol;
    private final double toSi;

    VelocityUnit(String symbol, double toSi) {
        this.symbol = symbol;
        this.toSi = toSi;
    }

    /** The unit as written in a header, for example "cm/s". */
    public String symbol() {
        return symbol;
    }

    /** Multiply a value in this unit by this factor to get metres per second. */
    public double toMetresPerSecond() {
        return toSi;
    }

    /** The unit for a header spelling (case and blanks ignored), or null if it is not a velocity unit we accept. */
    public static VelocityUnit parse(String text) {
        String key = text.replace(" ", "").toLowerCase(Locale.ROOT);
        for (VelocityUnit u : values()) {
            if (u.symbol.equals(key)) {
                return u;
            }
        }
        return null;
    }

    /** True when the text looks like a velocity unit (a length per time), accepted or not. */
    static boolean looksLikeVelocity(String text) {
        String key = text.replace(" ", "").toLowerCase(Locale.ROOT);
        return key.endsWith("/s") || key.endsWith("/sec") || key.endsWith("s-1") || key.endsWith("s^-1")
                || key.endsWith("/h") || key.equals("kn") || key.equals("knots") || key.endsWith("/min");
    }
}
