package org.eddycast.forecast;

import org.apache.commons.math3.analysis.solvers.BrentSolver;

/**
 * The time after which every point of a closed region is within a fraction (5% by default) of the final
 * uniform concentration, after an instantaneous release at a point. This "within 5% everywhere" criterion is
 * common practice for blend time (the 95% blend time) and for the distance to mixed in channels (Fischer, List,
 * Koh, Imberger &amp; Brooks 1979, Mixing in Inland and Coastal Waters, Academic Press, ch. 5, from memory).
 *
 * <p>The region is a gap or a box with reflecting walls, one {@link TwoWallCosineAxis} per bounded axis. The
 * concentration over its final value is the product of the per-axis relative densities phi_i, all positive.
 * The worst point therefore needs no grid search: the largest value of the product is the product of the
 * per-axis largest values, the smallest is the product of the per-axis smallest, and the deviation is
 * max(prod max phi_i - 1, 1 - prod min phi_i). Per axis the largest value is found by a unimodal search and the
 * smallest lies at a wall (see {@link TwoWallCosineAxis}); in a box the smallest value is thus at a corner.
 *
 * <p>The deviation never grows with time (the maximum principle for the diffusion equation with zero-flux
 * walls: the largest value cannot rise, the smallest cannot fall), so the crossing is found by bracketing and
 * Brent's root finder (Commons Math).
 */
public final class WellMixedTime {

    /** The common-practice criterion: within 5% of the final uniform value everywhere. */
    public static final double DEFAULT_CRITERION = 0.05;

    private WellMixedTime() {
    }

    /** Largest relative departure from the uniform value anywhere in the region at time t (s). */
    public static double deviation(double t, TwoWallCosineAxis... axes) {
        requireAxes(axes);
        double highest = 1.0;
        double lowest = 1.0;
        for (TwoWallCosineAxis axis : axes) {
            highest *= axis.peakRelativeDensity(t);
            lowest *= axis.lowestRelativeDensity(t);
        }
        return Math.max(highest - 1.0, 1.0 - lowest);
    }

    /**
     * The time (s) after which the deviation stays at or below {@code criterion}.
     *
     * @param criterion allowed relative departure, strictly between 0 and 1 (0.05 for the 95% blend time)
     */
    public static double timeToWithin(double criterion, TwoWallCosineAxis... axes) {
        Checks.openFraction("criterion", criterion);
        requireAxes(axes);
        double slowest = 0.0;
        for (TwoWallCosineAxis axis : axes) {
            slowest = Math.max(slowest, axis.gap() * axis.gap() / axis.diffusivity());
        }
        double early = 1e-3 * slowest;
        for (int i = 0; i < 60 && deviation(early, axes) <= criterion; i++) {
            early *= 0.5;
        }
        double late = early;
        while (deviation(late, axes) > criterion) {
            early = late;
            late *= 2.0;
        }
        if (late == early) {
            return early;
        }
        BrentSolver solver = new BrentSolver(1e-12, 1e-12 * late);
        return solver.solve(200, t -> deviation(t, axes) - criterion, early, late);
    }

    /**
     * The 95% blend time (s) of a closed box [0, Lx] x [0, Ly] x [0, Lz] with reflecting walls and constant
     * diffusivities per axis, after a release at the given point.
     */
    public static double closedBox(double[] size, double[] release, double[] diffusivity) {
        return closedBox(size, release, diffusivity, DEFAULT_CRITERION);
    }

    /** As {@link #closedBox(double[], double[], double[])} with a chosen criterion. */
    public static double closedBox(double[] size, double[] release, double[] diffusivity, double criterion) {
        InstantaneousRelease box = InstantaneousRelease.closedBox(1.0, size, release, diffusivity);
        return timeToWithin(criterion, (TwoWallCosineAxis) box.x(), (TwoWallCosineAxis) box.y(),
                (TwoWallCosineAxis) box.z());
    }

    private static void requireAxes(TwoWallCosineAxis[] axes) {
        if (axes == null || axes.length == 0) {
            throw new IllegalArgumentException("at least one bounded axis is needed");
        }
    }
}
