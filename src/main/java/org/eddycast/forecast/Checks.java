package org.eddycast.forecast;

/**
 * Argument checks shared by the forecast classes. Each failure names the argument, its unit and the valid
 * range, and shows the value that was given.
 */
final class Checks {

    private Checks() {
    }

    /** Requires a finite value strictly greater than zero. */
    static double positive(String name, double value, String unit) {
        if (!(value > 0) || Double.isInfinite(value)) {
            throw new IllegalArgumentException(name + " must be a finite number > 0" + unitSuffix(unit)
                    + "; got " + value);
        }
        return value;
    }

    /** Requires a finite value greater than or equal to zero. */
    static double nonNegative(String name, double value, String unit) {
        if (!(value >= 0) || Double.isInfinite(value)) {
            throw new IllegalArgumentException(name + " must be a finite number >= 0" + unitSuffix(unit)
                    + "; got " + value);
        }
        return value;
    }

    /** Requires a finite value. */
    static double finite(String name, double value, String unit) {
        if (!Double.isFinite(value)) {
            throw new IllegalArgumentException(name + " must be a finite number" + unitSuffix(unit)
                    + "; got " + value);
        }
        return value;
    }

    /** Requires lower <= value <= upper. */
    static double within(String name, double value, double lower, double upper, String unit) {
        if (!(value >= lower && value <= upper)) {
            throw new IllegalArgumentException(name + " must lie in [" + lower + ", " + upper + "]"
                    + unitSuffix(unit) + "; got " + value);
        }
        return value;
    }

    /** Requires 0 < value < 1. */
    static double openFraction(String name, double value) {
        if (!(value > 0 && value < 1)) {
            throw new IllegalArgumentException(name + " must lie strictly between 0 and 1; got " + value);
        }
        return value;
    }

    /** Requires an array of exactly the given length. */
    static double[] length(String name, double[] values, int expected) {
        if (values == null || values.length != expected) {
            throw new IllegalArgumentException(name + " must hold " + expected + " values; got "
                    + (values == null ? "none" : values.length));
        }
        return values.clone();
    }

    private static String unitSuffix(String unit) {
        return unit == null || unit.isEmpty() ? "" : " " + unit;
    }
}
