package org.eddycast.stats;

import org.apache.commons.math3.distribution.TDistribution;

/**
 * Eddy diffusivity as half the least-squares slope of the mean-square displacement over a time window,
 * sigma^2(t) ~ c + 2 D t for t well past the Lagrangian time scale (Taylor 1921, "Diffusion by continuous
 * movements", Proc. London Math. Soc. s2-20:196-212).
 *
 * <p>The slope is a fixed linear combination w . MSD of the recorded curve, so its standard error over n
 * independent blocks is sqrt(w' C w / n) with C the blocks' covariance, and the 95% interval uses Student's t
 * with n - 1 degrees of freedom. The same holds for a difference of two window slopes, which is how the
 * settling check compares an earlier window with the late one.
 *
 * <p>Special cases: a window with fewer than two record times throws; with fewer than two blocks the
 * standard error and the interval are NaN.
 */
public final class LateWindowSlopeEstimator {

    private LateWindowSlopeEstimator() {
    }

    /** Least-squares slope weights for the records whose times lie in [start, end] (zero elsewhere). */
    public static double[] slopeWeights(DisplacementMoments m, double start, double end) {
        int r = m.records();
        double[] w = new double[r];
        int n = 0;
        double meanTime = 0;
        for (int j = 0; j < r; j++) {
            double t = m.time(j);
            if (t >= start - 1e-12 * Math.abs(end) && t <= end + 1e-12 * Math.abs(end)) {
                meanTime += t;
                n++;
            }
        }
        if (n < 2) {
            throw new IllegalArgumentException(
                    "the window [" + start + ", " + end + "] holds fewer than two record times");
        }
        meanTime /= n;
        double sxx = 0;
        for (int j = 0; j < r; j++) {
            double t = m.time(j);
            if (t >= start - 1e-12 * Math.abs(end) && t <= end + 1e-12 * Math.abs(end)) {
                w[j] = t - meanTime;
                sxx += w[j] * w[j];
            }
        }
        for (int j = 0; j < r; j++) {
            w[j] /= sxx;
        }
        return w;
    }

    /** Half the slope over [start, end] along the axis, with its 95% interval. */
    public static SlopeEstimate estimate(DisplacementMoments m, int axis, double start, double end) {
        double[] w = slopeWeights(m, start, end);
        double value = 0.5 * dot(m, axis, w);
        double se = 0.5 * standardError(m, axis, w);
        return withInterval(value, se, m.count(), start, end);
    }

    /** The difference (late minus early) of two window estimates with its standard error. */
    public static SlopeEstimate difference(DisplacementMoments m, int axis, double earlyStart, double earlyEnd,
                                           double lateStart, double lateEnd) {
        double[] early = slopeWeights(m, earlyStart, earlyEnd);
        double[] late = slopeWeights(m, lateStart, lateEnd);
        double[] w = new double[early.length];
        for (int j = 0; j < w.length; j++) {
            w[j] = late[j] - early[j];
        }
        return withInterval(0.5 * dot(m, axis, w), 0.5 * standardError(m, axis, w), m.count(), earlyStart, lateEnd);
    }

    private static SlopeEstimate withInterval(double value, double se, long blocks, double start, double end) {
        long dof = blocks - 1;
        if (dof < 1 || !Double.isFinite(se)) {
            return new SlopeEstimate(value, Double.NaN, Double.NaN, Double.NaN, Math.max(dof, 0), start, end);
        }
        double t = new TDistribution(null, dof).inverseCumulativeProbability(0.975);
        return new SlopeEstimate(value, se, value - t * se, value + t * se, dof, start, end);
    }

    private static double dot(DisplacementMoments m, int axis, double[] w) {
        double s = 0;
        for (int j = 0; j < w.length; j++) {
            if (w[j] != 0) {
                s += w[j] * m.mean(axis, j);
            }
        }
        return s;
    }

    private static double standardError(DisplacementMoments m, int axis, double[] w) {
        if (m.count() < 2) {
            return Double.NaN;
        }
        double v = 0;
        for (int i = 0; i < w.length; i++) {
            if (w[i] == 0) {
                continue;
            }
            for (int j = 0; j < w.length; j++) {
                if (w[j] != 0) {
                    v += w[i] * w[j] * m.covariance(axis, i, j);
                }
            }
        }
        return Math.sqrt(Math.max(v, 0) / m.count());
    }
}
