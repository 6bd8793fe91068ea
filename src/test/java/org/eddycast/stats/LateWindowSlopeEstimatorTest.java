package org.eddycast.stats;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/**
 * The late-window slope on made-up curves whose answer is known by construction. Block b's curve is
 * c_b + 2 D_b t (linear in each window), so half the least-squares slope of block b is exactly D_b, the
 * estimate is the mean of the D_b, and its standard error is their sample standard deviation over sqrt(n);
 * the offsets c_b must not enter. The 95% interval uses Student's t with n - 1 degrees of freedom, checked
 * against printed table values (Fisher and Yates 1963, Statistical Tables for Biological, Agricultural and
 * Medical Research, table III; the same values in Abramowitz and Stegun 1964, Handbook of Mathematical
 * Functions, table 26.10; from memory, given to the three decimals the tables print).
 */
class LateWindowSlopeEstimatorTest {

    /** Record times 0.25, 0.5, ..., 10. */
    static double[] times() {
        double[] t = new double[40];
        for (int j = 0; j < t.length; j++) {
            t[j] = 0.25 * (j + 1);
        }
        return t;
    }

    /** One axis; block b's curve is c_b + 2 D_b t. */
    static DisplacementMoments linear(double[] d, double[] offset) {
        double[] t = times();
        DisplacementMoments m = new DisplacementMoments(1, t, 64);
        for (int b = 0; b < d.length; b++) {
            double[] curve = new double[t.length];
            for (int j = 0; j < t.length; j++) {
                curve[j] = offset[b] + 2 * d[b] * t[j];
            }
            m.increment(curve);
        }
        return m;
    }

    private static double mean(double[] v) {
        double s = 0;
        for (double x : v) {
            s += x;
        }
        return s / v.length;
    }

    private static double standardError(double[] v) {
        double mean = mean(v);
        double s = 0;
        for (double x : v) {
            s += (x - mean) * (x - mean);
        }
        return Math.sqrt(s / (v.length - 1) / v.length);
    }

    private static final double[] D10 = {1.00, 1.20, 0.90, 1.10, 0.95, 1.30, 0.85, 1.05, 1.15, 0.80};
    private static final double[] C10 = {0.3, -0.2, 5.0, 0.0, -1.0, 2.0, 0.7, -0.4, 0.1, 3.0};

    @Test
    void slopeIsTheMeanBlockDiffusivityWithItsStandardError() {
        DisplacementMoments m = linear(D10, C10);
        SlopeEstimate e = LateWindowSlopeEstimator.estimate(m, 0, 5, 10);
        assertEquals(mean(D10), e.value(), 1e-12, "mean of the blocks' D");
        assertEquals(standardError(D10), e.standardError(), 1e-12, "sample sd of D over sqrt(n)");
        assertEquals(9, e.degreesOfFreedom());
        assertEquals(5.0, e.windowStart(), 0.0);
        assertEquals(10.0, e.windowEnd(), 0.0);
    }

    /** t(0.975; 9) = 2.262: the interval is the mean plus or minus 2.262 standard errors. */
    @Test
    void intervalUsesStudentsTQuantileFromThePrintedTable() {
        SlopeEstimate e = LateWindowSlopeEstimator.estimate(linear(D10, C10), 0, 5, 10);
        double t = (e.high() - e.value()) / e.standardError();
        assertEquals(2.262, t, 5e-4, "t(0.975; 9 degrees of freedom)");
        assertEquals(t, (e.value() - e.low()) / e.standardError(), 1e-9, "symmetric interval");
        // Five blocks: t(0.975; 4) = 2.776; twenty blocks: t(0.975; 19) = 2.093.
        double[] d5 = {1.0, 1.3, 0.8, 1.1, 0.9};
        SlopeEstimate five = LateWindowSlopeEstimator.estimate(linear(d5, new double[5]), 0, 5, 10);
        assertEquals(2.776, (five.high() - five.value()) / five.standardError(), 5e-4, "t(0.975; 4)");
        double[] d20 = new double[20];
        for (int b = 0; b < 20; b++) {
            d20[b] = 1 + 0.01 * (b % 7) - 0.02 * (b % 3);
        }
        SlopeEstimate twenty = LateWindowSlopeEstimator.estimate(linear(d20, new double[20]), 0, 5, 10);
        assertEquals(2.093, (twenty.high() - twenty.value()) / twenty.standardError(), 5e-4, "t(0.975; 19)");
        assertEquals(0.5 * (e.high() - e.low()) / e.value(), e.relativeHalfWidth(), 1e-15);
    }

    @Test
    void weightsAreTheLeastSquaresSlopeWeightsOfTheWindow() {
        DisplacementMoments m = linear(D10, C10);
        double[] w = LateWindowSlopeEstimator.slopeWeights(m, 5, 10);
        double[] t = times();
        double sum = 0;
        double moment = 0;
        int inside = 0;
        for (int j = 0; j < t.length; j++) {
            if (t[j] < 5 || t[j] > 10) {
                assertEquals(0.0, w[j], 0.0, "outside the window, record " + j);
            } else {
                inside++;
            }
            sum += w[j];
            moment += w[j] * t[j];
        }
        assertEquals(21, inside, "both ends of the window are inside: 5.00, 5.25, ..., 10.00");
        assertEquals(0.0, sum, 1e-14, "weights sum to zero: an offset does not move the slope");
        assertEquals(1.0, moment, 1e-13, "weights applied to t give one: the slope of t is one");
    }

    /**
     * A curve with slope 2 D1 on [T/4, T/2] and 2 D2 on [T/2, T]: the difference of the two window estimates is
     * D2 - D1 exactly, and its standard error is that of the per-block differences (paired, not independent).
     */
    /** Two blocks are the fewest with a standard error and an interval (one degree of freedom: t = 12.706). */
    @Test
    void twoBlocksGiveAnInterval() {
        DisplacementMoments two = linear(new double[] {1.0, 1.2}, new double[] {0, 0});
        assertEquals(0.005, two.covariance(0, 0, 0), 1e-15, "4 t^2 Var(D) = 4 (1/16) 0.02 at t = 0.25");
        SlopeEstimate e = LateWindowSlopeEstimator.estimate(two, 0, 5, 10);
        assertEquals(0.1, e.standardError(), 1e-12, "sd 0.1414 over sqrt(2)");
        assertEquals(12.706, (e.high() - e.value()) / e.standardError(), 5e-4, "t(0.975; 1)");
    }

    /**
     * Record times are step counts times the step, so a window end may miss a record time by rounding; a
     * record within 1e-12 of the window's end (relative) counts as inside.
     */
    @Test
    void recordsARoundingErrorOutsideTheWindowCountAsInside() {
        DisplacementMoments m = new DisplacementMoments(1, new double[] {1, 2, 3, 4}, 64);
        double[] w = LateWindowSlopeEstimator.slopeWeights(m, 2 + 2e-12, 4 - 2e-12);
        assertEquals(-1.0, w[1] / w[3], 1e-9, "records 2 and 4 both inside, weights -1/2 and 1/2 over sxx");
        assertEquals(0.0, w[2], 1e-9, "the middle record of three has weight zero");
        assertEquals(0.0, w[0], 0.0);
    }

    @Test
    void differenceOfWindowsIsPairedBlockByBlock() {
        double[] t = times();
        double[] early = {1.0, 1.1, 0.9, 1.2, 0.8, 1.0};
        double[] late = {1.3, 1.35, 1.25, 1.45, 1.15, 1.2};
        DisplacementMoments m = new DisplacementMoments(1, t, 64);
        double[] gap = new double[early.length];
        for (int b = 0; b < early.length; b++) {
            double[] curve = new double[t.length];
            for (int j = 0; j < t.length; j++) {
                curve[j] = t[j] <= 5 ? 2 * early[b] * t[j] : 2 * early[b] * 5 + 2 * late[b] * (t[j] - 5);
            }
            m.increment(curve);
            gap[b] = late[b] - early[b];
        }
        assertEquals(mean(early), LateWindowSlopeEstimator.estimate(m, 0, 2.5, 5).value(), 1e-12);
        assertEquals(mean(late), LateWindowSlopeEstimator.estimate(m, 0, 5, 10).value(), 1e-12);
        SlopeEstimate d = LateWindowSlopeEstimator.difference(m, 0, 2.5, 5, 5, 10);
        assertEquals(mean(gap), d.value(), 1e-12, "late minus early");
        assertEquals(standardError(gap), d.standardError(), 1e-12, "standard error of the paired differences");
        assertEquals(2.5, d.windowStart(), 0.0);
        assertEquals(10.0, d.windowEnd(), 0.0);
    }

    @Test
    void specialCases() {
        DisplacementMoments m = linear(D10, C10);
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> LateWindowSlopeEstimator.estimate(m, 0, 5.1, 5.4));
        assertTrue(e.getMessage().contains("fewer than two record times"), e.getMessage());
        LateWindowSlopeEstimator.estimate(m, 0, 5.0, 5.25);
        DisplacementMoments one = linear(new double[] {1.5}, new double[] {0.2});
        SlopeEstimate single = LateWindowSlopeEstimator.estimate(one, 0, 5, 10);
        assertEquals(1.5, single.value(), 1e-12, "one block still gives its slope");
        assertTrue(Double.isNaN(single.standardError()) && Double.isNaN(single.low())
                && Double.isNaN(single.high()), "one block: no standard error, no interval");
        assertEquals(0, single.degreesOfFreedom());
        SlopeEstimate unscaled = LateWindowSlopeEstimator.estimate(m, 0, 5, 10);
        SlopeEstimate scaled = unscaled.scaled(3, 2);
        assertEquals(3 * mean(D10), scaled.value(), 1e-12);
        assertEquals(3 * standardError(D10), scaled.standardError(), 1e-12);
        assertEquals(3 * unscaled.low(), scaled.low(), 1e-12);
        assertEquals(3 * unscaled.high(), scaled.high(), 1e-12);
        assertEquals(10, scaled.windowStart(), 0.0);
        assertEquals(20, scaled.windowEnd(), 0.0);
    }
}
