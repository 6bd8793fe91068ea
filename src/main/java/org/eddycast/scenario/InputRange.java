package org.eddycast.scenario;

/**
 * The uncertainty the user gives one numeric input of a scenario: a plus-or-minus fraction of the value, a
 * low-high pair, or a named distribution. Plain data; the uncertainty package turns it into a distribution.
 *
 * @param input the input's path in the scenario file, such as {@code flow.bedSlope} or
 *              {@code forecast.stations[0].distance}
 * @param shape how the parameters read
 * @param a     RULE: NaN (the rule gives the spread); PLUS_MINUS: the fraction; UNIFORM and TRIANGULAR: the low end; NORMAL: the mean; LOG_NORMAL: the
 *              median
 * @param b     UNIFORM: the high end; TRIANGULAR: the mode; NORMAL: the standard deviation; LOG_NORMAL: the
 *              geometric standard deviation; otherwise NaN
 * @param c     TRIANGULAR: the high end; otherwise NaN
 * @param basis where the range comes from, in the user's words (may be empty)
 */
public record InputRange(String input, Shape shape, double a, double b, double c, String basis) {

    /** How a range's parameters read. */
    public enum Shape {
        /** Uniform from (1 - a) to (1 + a) times the scenario's value. */
        PLUS_MINUS,
        /** Uniform from a to b. */
        UNIFORM,
        /** Triangular from a to c with its mode at b. */
        TRIANGULAR,
        /** Normal with mean a and standard deviation b. */
        NORMAL,
        /** Log-normal with median a and geometric standard deviation b. */
        LOG_NORMAL,
        /** The spread the rule that gives the input states for it, read as a plus-or-minus fraction. */
        RULE
    }

    /** A plus-or-minus fraction of the scenario's value. */
    public static InputRange plusMinus(String input, double fraction, String basis) {
        return new InputRange(input, Shape.PLUS_MINUS, fraction, Double.NaN, Double.NaN, basis);
    }

    /** A uniform range from low to high. */
    public static InputRange uniform(String input, double low, double high, String basis) {
        return new InputRange(input, Shape.UNIFORM, low, high, Double.NaN, basis);
    }
}
