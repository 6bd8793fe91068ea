package org.eddycast.transport;

/**
 * The longitudinal dispersion coefficient K_L = (1/2) d sigma_x^2 / dt once a cloud is mixed over the section
 * (Taylor 1953, "Dispersion of soluble matter in solvent flowing slowly through a tube", Proc. R. Soc. A
 * 219:186-203; Taylor 1954, "The dispersion of matter in turbulent flow through a pipe", Proc. R. Soc. A
 * 223:446-468): half the least-squares slope of each block's along-flow variance over a late window, averaged
 * over blocks with a Student-t interval. The same for the lateral and vertical axes gives the spreading rate
 * of an unbounded axis.
 */
public final class DispersionEstimator {

    private DispersionEstimator() {
    }

    /** Half the slope of the variance along the axis over record times in [start, end]. */
    public static Estimate halfSlope(CloudMoments m, int axis, double start, double end) {
        double[] t = m.times();
        double[] perBlock = new double[m.blocks()];
        for (int b = 0; b < perBlock.length; b++) {
            perBlock[b] = 0.5 * slope(m, b, axis, t, start, end);
        }
        return BlockStatistics.mean(perBlock, "");
    }

    /**
     * The change of the estimate between the first and the second half of the window, as a fraction of the
     * whole-window value, with its interval: a run whose late slope still drifts has not reached the
     * Taylor regime.
     */
    public static Estimate drift(CloudMoments m, int axis, double start, double end) {
        double[] t = m.times();
        double mid = 0.5 * (start + end);
        double[] perBlock = new double[m.blocks()];
        double whole = halfSlope(m, axis, start, end).value();
        for (int b = 0; b < perBlock.length; b++) {
            perBlock[b] = 0.5 * (slope(m, b, axis, t, mid, end) - slope(m, b, axis, t, start, mid)) / whole;
        }
        return BlockStatistics.mean(perBlock, "");
    }

    private static double slope(CloudMoments m, int b, int axis, double[] t, double start, double end) {
        double st = 0;
        double sv = 0;
        int n = 0;
        for (int j = 0; j < t.length; j++) {
            if (t[j] >= start && t[j] <= end) {
                st += t[j];
                sv += m.blockVariance(b, j, axis);
                n++;
            }
        }
        if (n < 3) {
            throw new IllegalArgumentException("the window [" + start + ", " + end + "] s holds fewer than three"
                    + " record times");
        }
        double mt = st / n;
        double mv = sv / n;
        double sxy = 0;
        double sxx = 0;
        for (int j = 0; j < t.length; j++) {
            if (t[j] >= start && t[j] <= end) {
                sxy += (t[j] - mt) * (m.blockVariance(b, j, axis) - mv);
                sxx += (t[j] - mt) * (t[j] - mt);
            }
        }
        return sxy / sxx;
    }
}
