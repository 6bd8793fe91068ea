package org.eddycast.transport;

/**
 * A value with its 95% interval over independent blocks of particles.
 *
 * @param value the estimate
 * @param low   lower end of the 95% interval (NaN when not determined)
 * @param high  upper end of the 95% interval (NaN when not determined)
 * @param note  how it was obtained when that matters to the reader (empty otherwise)
 */
public record Estimate(double value, double low, double high, String note) {

    /** An estimate with no value. */
    public static Estimate undetermined(String why) {
        return new Estimate(Double.NaN, Double.NaN, Double.NaN, why);
    }

    public boolean determined() {
        return Double.isFinite(value);
    }

    /** Half the interval's width over the value. */
    public double relativeHalfWidth() {
        return 0.5 * (high - low) / Math.abs(value);
    }

    /** The same estimate multiplied by a positive factor. */
    public Estimate times(double factor) {
        return new Estimate(value * factor, low * factor, high * factor, note);
    }
}
