package org.eddycast.scenario;

/** Field checks shared by the design records; messages name the field, its unit and the valid range. */
final class DesignChecks {

    private DesignChecks() {
    }

    static void positive(String field, double value, String unit) {
        if (!(value > 0) || Double.isInfinite(value)) {
            throw new IllegalArgumentException(field + " must be > 0 " + unit + "; got " + format(value));
        }
    }

    static void openRange(String field, double value, double lower, double upper, String unit) {
        if (!(value > lower && value < upper)) {
            throw new IllegalArgumentException(field + " must be > " + format(lower) + " and < " + format(upper)
                    + " " + unit + "; got " + format(value));
        }
    }

    static String format(double value) {
        return value == Math.rint(value) && Math.abs(value) < 1e15 ? String.valueOf((long) value)
                : String.valueOf(value);
    }
}
