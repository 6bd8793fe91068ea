package org.eddycast.uncertainty;

import org.apache.commons.math3.stat.descriptive.rank.Percentile;
import org.apache.commons.math3.stat.descriptive.rank.Percentile.EstimationType;

/**
 * A propagated sample in four figures: its mean and its 5th, 50th and 95th percentiles.
 *
 * <p>Percentiles are Hyndman & Fan's type 7 (Hyndman & Fan 1996, "Sample quantiles in statistical packages",
 * The American Statistician 50:361-365): linear interpolation between order statistics at (n - 1) p, through
 * Commons Math's {@link Percentile} with {@link EstimationType#R_7}. A single value is its own percentiles.
 *
 * @param mean  the sample mean
 * @param p05   the 5th percentile
 * @param p50   the median
 * @param p95   the 95th percentile
 * @param count the number of values
 */
public record SampleSummary(double mean, double p05, double p50, double p95, int count) {

    /**
     * Summarises the values.
     *
     * @throws IllegalArgumentException for an empty sample or a value that is not a finite number (naming its
     *                                  index)
     */
    public static SampleSummary of(double[] values) {
        if (values.length == 0) {
            throw new IllegalArgumentException("a sample summary needs at least one value");
        }
        double sum = 0;
        for (int i = 0; i < values.length; i++) {
            if (!Double.isFinite(values[i])) {
                throw new IllegalArgumentException(
                        "value " + i + " of the sample is " + values[i] + "; every value must be a finite number");
            }
            sum += values[i];
        }
        Percentile percentile = new Percentile().withEstimationType(EstimationType.R_7);
        percentile.setData(values);
        return new SampleSummary(sum / values.length, percentile.evaluate(5), percentile.evaluate(50),
                percentile.evaluate(95), values.length);
    }
}
