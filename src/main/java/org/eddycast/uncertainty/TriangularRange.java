package org.eddycast.uncertainty;

import org.apache.commons.math3.distribution.TriangularDistribution;

/**
 * A triangular density rising from low to its peak at the mode and falling to high.
 *
 * @param low  the smallest value, finite
 * @param mode the most likely value, from low to high
 * @param high the largest value, finite and above low
 */
public record TriangularRange(double low, double mode, double high) implements InputDistribution {

    public TriangularRange {
        RangeText.requireFinite("triangular range", "low", low);
        RangeText.requireFinite("triangular range", "mode", mode);
        RangeText.requireFinite("triangular range", "high", high);
        if (!(low < high)) {
            throw new IllegalArgumentException(
                    "triangular range: low (" + low + ") must be below high (" + high + ")");
        }
        if (mode < low || mode > high) {
            throw new IllegalArgumentException("triangular range: the mode (" + mode + ") must lie from low ("
                    + low + ") to high (" + high + ")");
        }
    }

    @Override
    public double quantile(double u) {
        InputDistribution.checkProbability(u);
        return new TriangularDistribution(null, low, mode, high).inverseCumulativeProbability(u);
    }

    @Override
    public double mean() {
        return (low + mode + high) / 3;
    }

    @Override
    public String describe() {
        return "triangular " + RangeText.number(low) + " to " + RangeText.number(high) + ", most likely "
                + RangeText.number(mode);
    }
}
