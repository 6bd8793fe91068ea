package org.eddycast.uncertainty;

import org.apache.commons.math3.distribution.NormalDistribution;

/**
 * A normal (Gaussian) distribution.
 *
 * @param mean the mean, finite
 * @param sd   the standard deviation, finite and positive
 */
public record NormalRange(double mean, double sd) implements InputDistribution {

    public NormalRange {
        RangeText.requireFinite("normal range", "mean", mean);
        RangeText.requireFinite("normal range", "sd", sd);
        if (!(sd > 0)) {
            throw new IllegalArgumentException("normal range: the standard deviation sd must be positive, not " + sd);
        }
    }

    @Override
    public double quantile(double u) {
        InputDistribution.checkProbability(u);
        return new NormalDistribution(null, mean, sd).inverseCumulativeProbability(u);
    }

    @Override
    public String describe() {
        return "normal, mean " + RangeText.number(mean) + ", sd " + RangeText.number(sd);
    }
}
