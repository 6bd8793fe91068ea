package org.eddycast.uncertainty;

import java.util.List;
import org.apache.commons.math3.random.SobolSequenceGenerator;

/**
 * Saltelli's sampling design for first-order and total sensitivity indices: two independent quasi-random
 * matrices A and B of N rows and k columns, and for each input i the matrix AB_i, which is A with column i
 * taken from B. The model is run once per row, N (k + 2) runs in all (Saltelli, Annoni, Azzini, Campolongo,
 * Ratto & Tarantola 2010, "Variance based sensitivity analysis of model output. Design and estimator for the
 * total sensitivity index", Computer Physics Communications 181:259-270, section 3).
 *
 * <p>A and B come from one 2k-dimensional Sobol sequence (Commons Math's {@link SobolSequenceGenerator}, with
 * the Joe and Kuo direction numbers): the sequence's point j + 1 gives A's row j from its dimensions 0..k-1 and
 * B's row j from its dimensions k..2k-1. The sequence's first point, all zeros, is skipped.
 *
 * <p>Each dimension is then shifted by its own fixed offset, modulo 1 (a Cranley-Patterson rotation: Cranley &amp;
 * Patterson 1976, "Randomization of number theoretic methods for multiple integration", SIAM J. Numer. Anal.
 * 13:904-914). Unshifted, a short Sobol sequence's dimensions take the same few dyadic values: its second point is
 * 0.5 in every dimension, so A's and B's first rows would both sit at every input's median, and at N = 8 many rows
 * of B would repeat rows of A, leaving fewer distinct points than runs. The rotation keeps each dimension's
 * equidistribution and breaks those coincidences. The offsets come from a fixed integer hash of the dimension's
 * index (SplitMix64: Steele, Lea &amp; Flood 2014, "Fast splittable pseudorandom number generators", OOPSLA), so
 * they are the same in every process.
 *
 * <p>Rows are numbered: [0, N) are A, [N, 2N) are B, then [(2 + i) N, (3 + i) N) are AB_i for i = 0..k-1.
 * A row's point is a pure function of (N, k, row): integer operations, exact divisions by powers of two and one
 * IEEE addition per coordinate (the rotation), so every process re-creates the same bits and a design split
 * across machines stays one design.
 * The N points are generated once, on construction (N times 2k doubles).
 *
 * <p>Commons Math's direction numbers cover 1,000 dimensions, so at most 500 inputs.
 */
public final class SaltelliDesign {

    /** Half the dimensions of Commons Math's Sobol direction-number table. */
    public static final int MAX_INPUTS = 500;

    private final int baseSamples;
    private final int inputs;
    /** The Sobol points after the first, row j at [2k j, 2k (j + 1)): A's columns, then B's. */
    private final double[] points;

    /**
     * @param baseSamples N, the rows of A (and of B and of each AB_i), at least 2
     * @param inputs      k, the number of uncertain inputs, 1 to {@link #MAX_INPUTS}
     */
    public SaltelliDesign(int baseSamples, int inputs) {
        if (baseSamples < 2) {
            throw new IllegalArgumentException("a Saltelli design needs at least 2 base samples, not " + baseSamples);
        }
        if (inputs < 1 || inputs > MAX_INPUTS) {
            throw new IllegalArgumentException(
                    "a Saltelli design needs 1 to " + MAX_INPUTS + " inputs, not " + inputs);
        }
        if ((long) baseSamples * (inputs + 2) > Integer.MAX_VALUE) {
            throw new IllegalArgumentException("a Saltelli design of " + baseSamples + " base samples and " + inputs
                    + " inputs has more than " + Integer.MAX_VALUE + " rows");
        }
        this.baseSamples = baseSamples;
        this.inputs = inputs;
        int width = 2 * inputs;
        SobolSequenceGenerator sobol = new SobolSequenceGenerator(width);
        sobol.nextVector(); // the first point, all zeros
        points = new double[baseSamples * width];
        double[] offsets = new double[width];
        for (int d = 0; d < width; d++) {
            offsets[d] = offset(d);
        }
        for (int j = 0; j < baseSamples; j++) {
            double[] v = sobol.nextVector();
            for (int d = 0; d < width; d++) {
                double u = v[d] + offsets[d];
                u = u >= 1 ? u - 1 : u;
                // never 0: the quantile of an unbounded input would be infinite there
                points[j * width + d] = u > 0 ? u : 0x1p-53;
            }
        }
    }

    /** Dimension d's fixed offset in [0, 1): the top 53 bits of SplitMix64's output for d. */
    static double offset(int d) {
        long z = 0x9E3779B97F4A7C15L * (d + 1L);
        z = (z ^ (z >>> 30)) * 0xBF58476D1CE4E5B9L;
        z = (z ^ (z >>> 27)) * 0x94D049BB133111EBL;
        z = z ^ (z >>> 31);
        return (z >>> 11) * 0x1p-53;
    }

    public int baseSamples() {
        return baseSamples;
    }

    public int inputs() {
        return inputs;
    }

    /** N (k + 2): the model runs the design needs. */
    public int rows() {
        return baseSamples * (inputs + 2);
    }

    /** Which matrix a row belongs to: -2 for A, -1 for B, i for AB_i. */
    public int block(int row) {
        checkRow(row);
        return row / baseSamples - 2;
    }

    /** The row's base-sample index j: the row of A (and of B) it was built from. */
    public int baseIndex(int row) {
        checkRow(row);
        return row % baseSamples;
    }

    /** The row's point in (0, 1)^k (a new array). */
    public double[] unitPoint(int row) {
        int block = block(row);
        int base = (row % baseSamples) * 2 * inputs;
        double[] u = new double[inputs];
        if (block == -1) {
            System.arraycopy(points, base + inputs, u, 0, inputs);
        } else {
            System.arraycopy(points, base, u, 0, inputs);
            if (block >= 0) {
                u[block] = points[base + inputs + block];
            }
        }
        return u;
    }

    /** The row's input values: each coordinate of {@link #unitPoint} mapped through its input's quantile. */
    public double[] point(int row, List<InputDistribution> distributions) {
        if (distributions.size() != inputs) {
            throw new IllegalArgumentException("this design has " + inputs + " inputs but " + distributions.size()
                    + " distributions were given");
        }
        double[] x = unitPoint(row);
        for (int i = 0; i < inputs; i++) {
            x[i] = distributions.get(i).quantile(x[i]);
        }
        return x;
    }

    /** Names a row for messages: "row 17 (B, base sample 1)". */
    String describeRow(int row) {
        int block = block(row);
        String matrix = block == -2 ? "A" : block == -1 ? "B" : "AB_" + block;
        return "row " + row + " (" + matrix + ", base sample " + baseIndex(row) + ")";
    }

    private void checkRow(int row) {
        if (row < 0 || row >= rows()) {
            throw new IllegalArgumentException("row " + row + " is outside the design's rows 0 to " + (rows() - 1));
        }
    }
}
