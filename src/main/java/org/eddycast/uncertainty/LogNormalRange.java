package org.eddycast.uncertainty;

import org.apache.commons.math3.distribution.NormalDistribution;
import org.apache.commons.math3.util.FastMath;

/**
 * A log-normal distribution given as its median and geometric standard deviation: ln X is normal with mean
 * ln(median) and standard deviation ln(geometricSd), so about 68% of values lie between median / geometricSd and
 * median * geometricSd.
 *
 * <p>The quantile is median * geometricSd^z with z the standard normal quantile (Commons Math's
 * {@code LogNormalDistribution} inverts its distribution function numerically; this closed form is exact).
 *
 * @param median      the median, finite and positive
 * @param geometricSd the geometric standard deviation, finite and above 1
 */
public record LogNormalRange(double median, double geometricSd) implements InputDistribution {

    private static final NormalDistribution STANDARD_NORMAL = new NormalDistribution(null, 0, 1);

    public LogNormalRange {
        RangeText.requireFinite("log-normal range", "median", median);
        RangeText.requireFinite("log-normal range", "geometric sd", geometricSd);
        if (!(median > 0)) {
            throw new IllegalArgumentException("log-normal range: the median must be positive, not " + median);
        }
        if (!(geometricSd > 1)) {
            throw new IllegalArgumentException(
                    "log-normal range: the geometric sd must be above 1, not " + geometricSd);
        }
    }

    @Override
    public double quantile(double u) {
        InputDistribution.checkProbability(u);
        return median * FastMath.exp(FastMath.log(geometricSd) * STANDARD_NORMAL.inverseCumulativeProbability(u));
    }

    /** median exp(sigma^2 / 2) with sigma = ln(geometricSd). */
    @Override
    public double mean() {
        double sigma = FastMath.log(geometricSd);
        return median * FastMath.exp(0.5 * sigma * sigma);
    }

    @Override
    public String describe() {
        return "log-normal, median " + RangeText.number(median) + ", geometric sd " + RangeText.number(geometricSd);
    }
}
