package org.eddycast.report;

import org.eddycast.engine.DiffusivityResult;
import org.eddycast.engine.Scales;
import org.eddycast.stats.DisplacementMoments;

/**
 * Mean-square-displacement curves per axis in SI units with their standard errors: from a finished result, or
 * from a run's partial moments while it is still going.
 */
public final class SpreadCurves {

    private final double[] times;
    private final double[][] msd;
    private final double[][] error;

    private SpreadCurves(double[] times, double[][] msd, double[][] error) {
        this.times = times;
        this.msd = msd;
        this.error = error;
    }

    /** The curves of a finished result. */
    public static SpreadCurves of(DiffusivityResult r) {
        int axes = r.axes().size();
        double[][] m = new double[axes][];
        double[][] e = new double[axes][];
        for (int a = 0; a < axes; a++) {
            m[a] = r.meanSquareDisplacement(a);
            e[a] = r.meanSquareDisplacementError(a);
        }
        return new SpreadCurves(r.times(), m, e);
    }

    /** The curves of partial (dimensionless) moments, scaled to SI; empty when no block has finished. */
    public static SpreadCurves of(DisplacementMoments moments, Scales scales) {
        int axes = moments.axes();
        int records = moments.records();
        double l2 = scales.length() * scales.length();
        double[] t = moments.times();
        for (int j = 0; j < t.length; j++) {
            t[j] *= scales.time();
        }
        double[][] m = new double[axes][records];
        double[][] e = new double[axes][records];
        long n = moments.count();
        for (int a = 0; a < axes; a++) {
            for (int j = 0; j < records; j++) {
                m[a][j] = n == 0 ? Double.NaN : moments.mean(a, j) * l2;
                e[a][j] = n < 2 ? Double.NaN : Math.sqrt(moments.covariance(a, j, j) / n) * l2;
            }
        }
        return new SpreadCurves(n == 0 ? new double[0] : t, n == 0 ? new double[axes][0] : m,
                n == 0 ? new double[axes][0] : e);
    }

    public int axes() {
        return msd.length;
    }

    public double[] times() {
        return times.clone();
    }

    public double[] meanSquareDisplacement(int axis) {
        return msd[axis].clone();
    }

    public double[] standardError(int axis) {
        return error[axis].clone();
    }
}
