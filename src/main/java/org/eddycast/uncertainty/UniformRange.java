package org.eddycast.uncertainty;

import org.apache.commons.math3.distribution.UniformRealDistribution;

/**
 * Every value between low and high equally likely.
 *
 * @param low  the smallest value, finite
 * @param high the largest value, finite and above low
 */
public record UniformRange(double low, double high) implements InputDistribution {

    public UniformRange {
        RangeText.requireFinite("uniform range", "low", low);
        RangeText.requireFinite("uniform range", "high", high);
        if (!(low < high)) {
            throw new IllegalArgumentException("uniform range: low (" + low + ") must be below high (" + high + ")");
        }
    }

    @Override
    public double quantile(double u) {
        InputDistribution.checkProbability(u);
        return new UniformRealDistribution(null, low, high).inverseCumulativeProbability(u);
    }

    @Override
    public double mean() {
        return 0.5 * (low + high);
    }

    @Override
    public String describe() {
        return "uniform " + RangeText.number(low) + " to " + RangeText.number(high);
    }
}
