package org.eddycast.stats;

import java.util.Arrays;

/**
 * Streaming mean and covariance, over independent blocks of particles, of each block's mean-square
 * displacement curve per axis at fixed record times.
 *
 * <p>A block's curve is the vector (MSD(t_1), ..., MSD(t_R)) for one axis; blocks are independent, so the
 * spread of these vectors gives the standard error of any linear functional of the mean curve (a slope over a
 * window, a difference of two slopes) without keeping any per-block data. Updated by Welford's algorithm
 * (Welford 1962, "Note on a method for calculating corrected sums of squares and products", Technometrics
 * 4:419-420) and merged by the pairwise formula of Chan, Golub and LeVeque (1983, "Algorithms for computing the
 * sample variance: analysis and recommendations", Am. Stat. 37:242-247). Memory: axes * R * (R + 1) doubles,
 * whatever the number of particles or steps.
 *
 * <p>Merging blocks in a fixed order gives the same numbers whatever the thread count.
 */
public final class DisplacementMoments {

    private final int axes;
    private final double[] times;
    private final int particlesPerBlock;
    private final double[] mean;
    private final double[] comoment;
    private final double[] delta;
    private long count;

    /**
     * @param axes              number of axes (2 or 3)
     * @param times             record times, increasing (copied)
     * @param particlesPerBlock particles averaged in each block's curve
     */
    public DisplacementMoments(int axes, double[] times, int particlesPerBlock) {
        this.axes = axes;
        this.times = times.clone();
        this.particlesPerBlock = particlesPerBlock;
        int r = times.length;
        this.mean = new double[axes * r];
        this.comoment = new double[axes * r * r];
        this.delta = new double[r];
    }

    private DisplacementMoments(DisplacementMoments other) {
        this.axes = other.axes;
        this.times = other.times;
        this.particlesPerBlock = other.particlesPerBlock;
        this.mean = other.mean.clone();
        this.comoment = other.comoment.clone();
        this.delta = new double[other.delta.length];
        this.count = other.count;
    }

    /** An independent copy (a snapshot for progress reports). */
    public DisplacementMoments copy() {
        return new DisplacementMoments(this);
    }

    /**
     * Adds one block's curves.
     *
     * @param blockCurves the block's mean-square displacement, laid out [axis * R + record]
     */
    public void increment(double[] blockCurves) {
        int r = times.length;
        count++;
        double inverse = 1.0 / count;
        for (int a = 0; a < axes; a++) {
            int base = a * r;
            for (int i = 0; i < r; i++) {
                double d = blockCurves[base + i] - mean[base + i];
                delta[i] = d;
                mean[base + i] += d * inverse;
            }
            int matrix = a * r * r;
            for (int i = 0; i < r; i++) {
                double di = delta[i];
                int row = matrix + i * r;
                for (int j = 0; j < r; j++) {
                    comoment[row + j] += di * (blockCurves[base + j] - mean[base + j]);
                }
            }
        }
    }

    /** Adds all blocks of another accumulator with the same layout. */
    public void merge(DisplacementMoments other) {
        if (other.axes != axes || !Arrays.equals(other.times, times)) {
            throw new IllegalArgumentException("cannot merge moments recorded at different times or axes");
        }
        if (other.count == 0) {
            return;
        }
        long n = count + other.count;
        double wa = (double) count / n;
        double wb = (double) other.count / n;
        double cross = (double) count * other.count / n;
        int r = times.length;
        for (int a = 0; a < axes; a++) {
            int base = a * r;
            int matrix = a * r * r;
            for (int i = 0; i < r; i++) {
                double di = other.mean[base + i] - mean[base + i];
                for (int j = 0; j < r; j++) {
                    double dj = other.mean[base + j] - mean[base + j];
                    comoment[matrix + i * r + j] += other.comoment[matrix + i * r + j] + cross * di * dj;
                }
            }
            for (int i = 0; i < r; i++) {
                mean[base + i] = wa * mean[base + i] + wb * other.mean[base + i];
            }
        }
        count = n;
    }

    public int axes() {
        return axes;
    }

    public int records() {
        return times.length;
    }

    public double time(int record) {
        return times[record];
    }

    public double[] times() {
        return times.clone();
    }

    /** Number of blocks added. */
    public long count() {
        return count;
    }

    public int particlesPerBlock() {
        return particlesPerBlock;
    }

    /** Mean-square displacement along the axis at the record, averaged over all particles. */
    public double mean(int axis, int record) {
        return mean[axis * times.length + record];
    }

    /** Covariance between blocks of the curve at records i and j (NaN with fewer than two blocks). */
    public double covariance(int axis, int i, int j) {
        if (count < 2) {
            return Double.NaN;
        }
        int r = times.length;
        return comoment[axis * r * r + i * r + j] / (count - 1);
    }
}
