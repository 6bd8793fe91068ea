package org.eddycast.measure;

/**
 * An estimated autocorrelation function and the integral time scale read from it.
 *
 * @param lagTimes          lags (s), from 0 in steps of the sampling interval
 * @param values            autocorrelation coefficient at each lag, 1 at lag 0
 * @param firstZeroCrossing lag (s) where the coefficient first reaches zero, by linear interpolation; NaN when
 *                          it stays positive over all stored lags
 * @param integralTime      integral of the coefficient from 0 to the first zero crossing (s), by the
 *                          trapezoid rule; up to the last stored lag (a lower bound) when there is no crossing
 */
public record Autocorrelation(double[] lagTimes, double[] values, double firstZeroCrossing, double integralTime) {

    /** The rule for the integral time, in words. */
    public static final String INTEGRAL_TIME_RULE = "T = integral of the autocorrelation coefficient from lag 0 to"
            + " its first zero crossing (trapezoid rule; common practice)";

    public Autocorrelation {
        lagTimes = lagTimes.clone();
        values = values.clone();
    }

    @Override
    public double[] lagTimes() {
        return lagTimes.clone();
    }

    @Override
    public double[] values() {
        return values.clone();
    }

    /** True when the coefficient crossed zero within the stored lags. */
    public boolean crossesZero() {
        return !Double.isNaN(firstZeroCrossing);
    }
}
