package org.eddycast.measure;

import org.apache.commons.math3.stat.regression.SimpleRegression;

/**
 * Removes a straight-line trend from a series, keeping its mean: x_i - b (t_i - mean t), with b the
 * least-squares slope of x against t (Commons Math {@link SimpleRegression}). Keeping the mean matters because
 * the mean speed carries the frozen-turbulence conversion.
 *
 * <p>Special cases: a series of fewer than 3 samples is returned unchanged with slope 0.
 */
public final class LinearDetrender {

    /**
     * @param detrended the series with the trend removed (a copy)
     * @param slope     the removed slope (series units per second)
     */
    public record Result(double[] detrended, double slope) {
        public Result {
            detrended = detrended.clone();
        }

        @Override
        public double[] detrended() {
            return detrended.clone();
        }
    }

    private LinearDetrender() {
    }

    /** Removes the least-squares line of {@code series} against {@code times}; the mean is kept. */
    public static Result detrend(double[] times, double[] series) {
        int n = series.length;
        if (times.length != n) {
            throw new IllegalArgumentException("times and series differ in length: " + times.length + " and " + n);
        }
        if (n < 3) {
            return new Result(series, 0.0);
        }
        SimpleRegression fit = new SimpleRegression(true);
        double meanTime = 0;
        for (int i = 0; i < n; i++) {
            fit.addData(times[i], series[i]);
            meanTime += times[i];
        }
        meanTime /= n;
        double slope = fit.getSlope();
        double[] out = new double[n];
        for (int i = 0; i < n; i++) {
            out[i] = series[i] - slope * (times[i] - meanTime);
        }
        return new Result(out, slope);
    }
}
