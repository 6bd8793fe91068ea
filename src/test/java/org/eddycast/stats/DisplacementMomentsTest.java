package org.eddycast.stats;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;

/**
 * The streamed block moments against the textbook two-pass formulas (sample mean, then the sample covariance
 * with divisor n - 1), on made-up curves; and the pairwise merge of Chan, Golub and LeVeque (1983, "Algorithms
 * for computing the sample variance: analysis and recommendations", Am. Stat. 37:242-247) against one pass
 * over the same blocks. Exact relations: the tolerances are rounding only.
 */
class DisplacementMomentsTest {

    private static final double[] TIMES = {0.5, 1.0, 1.5, 2.0, 3.0};
    private static final int AXES = 2;

    /** Made-up curves: per axis, c + 2 D t + noise, with D and c differing between blocks. */
    private static double[][] curves(int blocks, long seed) {
        SplittableRandom random = new SplittableRandom(seed);
        double[][] out = new double[blocks][AXES * TIMES.length];
        for (int b = 0; b < blocks; b++) {
            for (int a = 0; a < AXES; a++) {
                double d = 1 + a + 0.3 * random.nextGaussian();
                double c = 0.2 * random.nextGaussian();
                for (int j = 0; j < TIMES.length; j++) {
                    out[b][a * TIMES.length + j] = 100 + c + 2 * d * TIMES[j] + 0.05 * random.nextGaussian();
                }
            }
        }
        return out;
    }

    private static DisplacementMoments streamed(double[][] curves, int from, int to) {
        DisplacementMoments m = new DisplacementMoments(AXES, TIMES, 16);
        for (int b = from; b < to; b++) {
            m.increment(curves[b]);
        }
        return m;
    }

    private static void assertSameMoments(DisplacementMoments expected, DisplacementMoments actual, String what) {
        assertEquals(expected.count(), actual.count(), what + ": count");
        for (int a = 0; a < AXES; a++) {
            for (int i = 0; i < TIMES.length; i++) {
                assertEquals(expected.mean(a, i), actual.mean(a, i), 1e-12 * Math.abs(expected.mean(a, i)),
                        what + ": mean, axis " + a + " record " + i);
                for (int j = 0; j < TIMES.length; j++) {
                    double c = expected.covariance(a, i, j);
                    assertEquals(c, actual.covariance(a, i, j), 1e-10 * Math.abs(c) + 1e-13,
                            what + ": covariance, axis " + a + " records " + i + ", " + j);
                }
            }
        }
    }

    @Test
    void meanAndCovarianceEqualTheTwoPassFormulas() {
        double[][] c = curves(37, 1);
        DisplacementMoments m = streamed(c, 0, c.length);
        int n = c.length;
        int r = TIMES.length;
        for (int a = 0; a < AXES; a++) {
            double[] mean = new double[r];
            for (double[] curve : c) {
                for (int i = 0; i < r; i++) {
                    mean[i] += curve[a * r + i] / n;
                }
            }
            for (int i = 0; i < r; i++) {
                assertEquals(mean[i], m.mean(a, i), 1e-12 * mean[i], "mean, axis " + a + " record " + i);
                for (int j = 0; j < r; j++) {
                    double s = 0;
                    for (double[] curve : c) {
                        s += (curve[a * r + i] - mean[i]) * (curve[a * r + j] - mean[j]);
                    }
                    double expected = s / (n - 1);
                    assertEquals(expected, m.covariance(a, i, j), 1e-10 * Math.abs(expected),
                            "covariance, axis " + a + " records " + i + ", " + j);
                }
            }
        }
        assertEquals(37, m.count());
        assertEquals(16, m.particlesPerBlock());
        assertEquals(2, m.axes());
        assertEquals(TIMES.length, m.records());
        assertEquals(1.5, m.time(2), 0.0);
    }

    /**
     * Curves 2 D_b t with no noise: the covariance between records i and j is exactly 4 t_i t_j Var(D) (the
     * sample variance of the D_b), a known covariance of rank one.
     */
    @Test
    void linearCurvesHaveTheRankOneCovariance() {
        double[] d = {0.7, 1.1, 0.9, 1.6, 1.2, 0.5};
        double mean = 0;
        for (double v : d) {
            mean += v / d.length;
        }
        double variance = 0;
        for (double v : d) {
            variance += (v - mean) * (v - mean) / (d.length - 1);
        }
        DisplacementMoments m = new DisplacementMoments(1, TIMES, 64);
        for (double v : d) {
            double[] curve = new double[TIMES.length];
            for (int j = 0; j < TIMES.length; j++) {
                curve[j] = 2 * v * TIMES[j];
            }
            m.increment(curve);
        }
        for (int i = 0; i < TIMES.length; i++) {
            assertEquals(2 * mean * TIMES[i], m.mean(0, i), 1e-14);
            for (int j = 0; j < TIMES.length; j++) {
                assertEquals(4 * TIMES[i] * TIMES[j] * variance, m.covariance(0, i, j), 1e-13);
            }
        }
    }

    @Test
    void mergeEqualsOnePassWhateverTheSplit() {
        double[][] c = curves(23, 2);
        DisplacementMoments single = streamed(c, 0, c.length);
        for (int split : new int[] {1, 2, 7, 11, 22}) {
            DisplacementMoments first = streamed(c, 0, split);
            first.merge(streamed(c, split, c.length));
            assertSameMoments(single, first, "split after " + split);
        }
        // Three parts merged in order, as the runner's workers would be.
        DisplacementMoments parts = streamed(c, 0, 5);
        parts.merge(streamed(c, 5, 14));
        parts.merge(streamed(c, 14, c.length));
        assertSameMoments(single, parts, "three parts");
    }

    @Test
    void mergingAnEmptyAccumulatorChangesNothingAndMergingIntoOneCopies() {
        double[][] c = curves(9, 3);
        DisplacementMoments single = streamed(c, 0, c.length);
        DisplacementMoments withEmpty = streamed(c, 0, c.length);
        withEmpty.merge(new DisplacementMoments(AXES, TIMES, 16));
        assertSameMoments(single, withEmpty, "merged with an empty one");
        DisplacementMoments empty = new DisplacementMoments(AXES, TIMES, 16);
        empty.merge(single);
        assertSameMoments(single, empty, "merged into an empty one");
    }

    @Test
    void mergeRefusesDifferentTimesOrAxes() {
        DisplacementMoments m = new DisplacementMoments(AXES, TIMES, 16);
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> m.merge(new DisplacementMoments(AXES, new double[] {0.5, 1.0, 1.5, 2.0, 3.5}, 16)));
        assertTrue(e.getMessage().contains("different times or axes"), e.getMessage());
        assertThrows(IllegalArgumentException.class, () -> m.merge(new DisplacementMoments(3, TIMES, 16)));
    }

    @Test
    void covarianceNeedsTwoBlocksAndCopiesAreIndependent() {
        double[][] c = curves(3, 4);
        DisplacementMoments m = new DisplacementMoments(AXES, TIMES, 16);
        assertTrue(Double.isNaN(m.covariance(0, 0, 0)), "no blocks");
        m.increment(c[0]);
        assertTrue(Double.isNaN(m.covariance(1, 2, 3)), "one block");
        assertEquals(c[0][TIMES.length + 2], m.mean(1, 2), 0.0, "one block's mean is its curve");
        DisplacementMoments snapshot = m.copy();
        m.increment(c[1]);
        assertEquals(1, snapshot.count(), "a copy does not follow later blocks");
        assertEquals(c[0][0], snapshot.mean(0, 0), 0.0);
        double[] times = m.times();
        times[0] = 99;
        assertEquals(0.5, m.time(0), 0.0, "times are copied out");
    }
}
