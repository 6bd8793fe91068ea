package org.eddycast.stats;

/**
 * A diffusivity from the slope of a mean-square-displacement curve over a window, with its 95% interval.
 *
 * @param value             the estimate (half the slope)
 * @param standardError     its standard error over independent blocks
 * @param low               lower end of the 95% interval
 * @param high              upper end of the 95% interval
 * @param degreesOfFreedom  blocks minus one
 * @param windowStart       first time of the window
 * @param windowEnd         last time of the window
 */
public record SlopeEstimate(double value, double standardError, double low, double high, long degreesOfFreedom,
                            double windowStart, double windowEnd) {

    /** Half-width of the interval over the value (infinite for a zero value). */
    public double relativeHalfWidth() {
        return 0.5 * (high - low) / Math.abs(value);
    }

    /** The same estimate with every number multiplied by a positive factor (a change of units). */
    public SlopeEstimate scaled(double factor, double timeFactor) {
        return new SlopeEstimate(value * factor, standardError * factor, low * factor, high * factor,
                degreesOfFreedom, windowStart * timeFactor, windowEnd * timeFactor);
    }
}
