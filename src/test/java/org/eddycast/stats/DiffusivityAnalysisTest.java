package org.eddycast.stats;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;

/**
 * The analysis's rules on made-up curves whose estimates are known by construction: block b's curve has slope
 * 2 early_b on the earlier window [T/4, T/2] and 2 late_b on the late window [T/2, T] (T = 10, records every
 * 0.25), so the window estimates are the means of early_b and late_b and the standard error of their
 * difference is the sample standard deviation of late_b - early_b over sqrt(n). Every warning is checked just
 * below and just above its threshold (1% either side), with its full text.
 */
class DiffusivityAnalysisTest {

    private static final double END = 10;

    /** Curves for one axis per row of early and late slopes (half-slopes: diffusivities). */
    private static DisplacementMoments moments(double[][] early, double[][] late) {
        double[] t = LateWindowSlopeEstimatorTest.times();
        int axes = early.length;
        DisplacementMoments m = new DisplacementMoments(axes, t, 64);
        for (int b = 0; b < early[0].length; b++) {
            double[] curve = new double[axes * t.length];
            for (int a = 0; a < axes; a++) {
                for (int j = 0; j < t.length; j++) {
                    curve[a * t.length + j] = t[j] <= END / 2 ? 2 * early[a][b] * t[j]
                            : 2 * early[a][b] * END / 2 + 2 * late[a][b] * (t[j] - END / 2);
                }
            }
            m.increment(curve);
        }
        return m;
    }

    /** n blocks with the same diffusivity d in both windows, spread +-1% block to block. */
    private static DisplacementMoments steady(int n, double d) {
        double[] v = new double[n];
        for (int b = 0; b < n; b++) {
            v[b] = d * (1 + 0.01 * (b % 2 == 0 ? 1 : -1));
        }
        return moments(new double[][] {v}, new double[][] {v});
    }

    /**
     * 20 blocks, late slope `level` in every block, early slope level - delta -+ s alternately: the change late
     * minus early is delta + s z_b with z_b = +-1, whose standard error is s sqrt(20/19) / sqrt(20) = s / sqrt(19).
     * So the change is delta sqrt(19) / s standard errors, and 100 delta / level per cent.
     */
    private static double[][] drift(double level, double delta, double errorsOfChange) {
        int n = 20;
        double s = delta * Math.sqrt(19) / errorsOfChange;
        double[] early = new double[n];
        double[] late = new double[n];
        for (int b = 0; b < n; b++) {
            late[b] = level;
            early[b] = level - delta - s * (b % 2 == 0 ? 1 : -1);
        }
        return new double[][] {early, late};
    }

    private static DisplacementMoments drifting(double delta, double errorsOfChange) {
        double[][] d = drift(1, delta, errorsOfChange);
        return moments(new double[][] {d[0]}, new double[][] {d[1]});
    }

    private static DiffusivityAnalysis analyse(DisplacementMoments m, double variance, double timeUnit) {
        double[] var = new double[m.axes()];
        java.util.Arrays.fill(var, variance);
        return DiffusivityAnalysis.of(m, var, new double[m.axes()], timeUnit);
    }

    @Test
    void aSteadyRunWithEnoughBlocksHasNoWarning() {
        DiffusivityAnalysis a = analyse(steady(20, 1.0), 2.0, 1.0);
        assertEquals(List.of(), a.warnings());
        AxisEstimate x = a.axes().get(0);
        assertTrue(x.settled());
        assertEquals("x", x.axisName());
        assertEquals(1.0, x.diffusivity().value(), 1e-12);
        assertEquals(1.0, x.earlyWindow().value(), 1e-12);
        assertEquals(2.5, x.earlyWindow().windowStart(), 1e-12);
        assertEquals(5.0, x.diffusivity().windowStart(), 1e-12);
        assertEquals(0.5, x.lagrangianTimeScale(), 1e-12, "T_L = (D - D0) / u'^2 = 1 / 2");
    }

    /** Taylor's formula D - D0 = u'^2 T_L (Taylor 1921, Proc. London Math. Soc. s2-20:196). */
    @Test
    void lagrangianTimeScaleSubtractsTheMolecularPart() {
        DiffusivityAnalysis a = DiffusivityAnalysis.of(steady(20, 1.0), new double[] {0.5}, new double[] {0.1}, 1);
        assertEquals((1.0 - 0.1) / 0.5, a.axes().get(0).lagrangianTimeScale(), 1e-12);
        DiffusivityAnalysis still = DiffusivityAnalysis.of(steady(20, 1.0), new double[] {0.0}, new double[] {0.1},
                1);
        assertTrue(Double.isNaN(still.axes().get(0).lagrangianTimeScale()), "no velocity on the axis: no T_L");
        assertEquals(List.of(), still.warnings(), "no T_L, no short-run warning");
    }

    /** The late window must start at 5 T_L or later: T/2 = 5, so the threshold is T_L = 1. */
    @Test
    void shortRunWarningJustBelowAndJustAboveItsThreshold() {
        assertEquals(List.of(), analyse(steady(20, 1.0), 1 / 0.99, 2.0).warnings(), "T_L = 0.99");
        List<String> w = analyse(steady(20, 1.0), 1 / 1.01, 2.0).warnings();
        assertEquals(List.of("the run is short: the late window starts at 10.00 s, less than 5 Lagrangian time "
                + "scales (T_L = 2.020 s), so the early ballistic growth may still bias the slope. Run at least "
                + "40.40 s."), w, "T_L = 1.01 (times in units of 2 s)");
    }

    @Test
    void tooFewBlocksWarningJustBelowAndJustAboveItsThreshold() {
        assertEquals(List.of(), analyse(steady(20, 1.0), 2.0, 1.0).warnings(), "20 blocks");
        assertEquals(List.of("only 19 independent blocks of 64 particles: the 95% interval is unreliable below 20; "
                + "use at least 1280 particles"), analyse(steady(19, 1.0), 2.0, 1.0).warnings(), "19 blocks");
    }

    /** Settled unless the change exceeds both three standard errors and 1% of the late value. */
    @Test
    void notSettledWarningAtThreeStandardErrors() {
        DiffusivityAnalysis below = analyse(drifting(0.05, 2.97), 2.0, 1.0);
        assertTrue(below.axes().get(0).settled(), "a 5% change of 2.97 standard errors");
        assertEquals(List.of(), below.warnings());
        DiffusivityAnalysis above = analyse(drifting(0.05, 3.03), 2.0, 1.0);
        assertFalse(above.axes().get(0).settled(), "a 5% change of 3.03 standard errors");
        // T_L = 0.5: the advice is the larger of 2 T = 20 s and 20 T_L = 10 s.
        assertEquals(List.of("the x estimate has not settled: over the earlier window [T/4, T/2] it was 0.9500, "
                + "over [T/2, T] 1.000 (a change of 5.0%, beyond three standard errors). Run at least 20.00 s."),
                above.warnings());
    }

    /** At a level of 2 (not 1), so that 1% of the level and the percentage's divisor are both exercised. */
    @Test
    void notSettledWarningAtOnePerCent() {
        double[][] below = drift(2, 0.0198, 10);
        DiffusivityAnalysis settled = analyse(moments(new double[][] {below[0]}, new double[][] {below[1]}), 4, 1);
        assertTrue(settled.axes().get(0).settled(), "a change of 0.99%, ten standard errors");
        double[][] above = drift(2, 0.0202, 10);
        DiffusivityAnalysis drifting = analyse(moments(new double[][] {above[0]}, new double[][] {above[1]}), 4, 1);
        assertFalse(drifting.axes().get(0).settled(), "a change of 1.01%, ten standard errors");
        assertEquals(List.of("the x estimate has not settled: over the earlier window [T/4, T/2] it was 1.980, "
                + "over [T/2, T] 2.000 (a change of 1.0%, beyond three standard errors). Run at least 20.00 s."),
                drifting.warnings());
    }

    /** The warning names the axis that drifts. */
    @Test
    void notSettledWarningNamesTheAxis() {
        double[] flat = steadyRow();
        double[][] d = drift(1, 0.05, 5);
        DiffusivityAnalysis y = analyse(moments(new double[][] {flat, d[0], flat}, new double[][] {flat, d[1], flat}),
                2, 1);
        assertEquals(1, y.warnings().size(), y.warnings().toString());
        assertTrue(y.warnings().get(0).startsWith("the y estimate has not settled"), y.warnings().get(0));
        assertTrue(y.axes().get(0).settled() && !y.axes().get(1).settled() && y.axes().get(2).settled());
        DiffusivityAnalysis z = analyse(moments(new double[][] {flat, flat, d[0]}, new double[][] {flat, flat, d[1]}),
                2, 1);
        assertTrue(z.warnings().get(0).startsWith("the z estimate has not settled"), z.warnings().get(0));
        assertEquals("z", z.axes().get(2).axisName());
    }

    private static double[] steadyRow() {
        double[] v = new double[20];
        for (int b = 0; b < 20; b++) {
            v[b] = 1 + 0.01 * (b % 2 == 0 ? 1 : -1);
        }
        return v;
    }

    /** With T_L = 1.5 the advice 20 T_L = 30 s exceeds 2 T = 20 s (and the run is short as well). */
    @Test
    void adviceIsTwentyLagrangianTimesWhenThatIsLonger() {
        List<String> w = analyse(drifting(0.05, 4), 1 / 1.5, 1.0).warnings();
        assertEquals(2, w.size(), w.toString());
        assertTrue(w.get(0).startsWith("the x estimate has not settled") && w.get(0).endsWith("Run at least 30.00 s."),
                w.get(0));
        assertTrue(w.get(1).startsWith("the run is short") && w.get(1).endsWith("Run at least 30.00 s."), w.get(1));
    }

    @Test
    void worstRelativeHalfWidthIsTheLargestOverTheAxes() {
        double[] narrow = new double[20];
        double[] wide = new double[20];
        for (int b = 0; b < 20; b++) {
            narrow[b] = 1 + 0.01 * (b % 2 == 0 ? 1 : -1);
            wide[b] = 2 + 0.1 * (b % 2 == 0 ? 1 : -1);
        }
        DiffusivityAnalysis a = analyse(moments(new double[][] {narrow, wide}, new double[][] {narrow, wide}), 4,
                1.0);
        assertEquals("y", a.axes().get(1).axisName());
        double expected = a.axes().get(1).diffusivity().relativeHalfWidth();
        assertTrue(expected > a.axes().get(0).diffusivity().relativeHalfWidth());
        assertEquals(expected, a.worstRelativeHalfWidth(), 0.0);
        // Half-width t(0.975; 19) * 0.1 sqrt(20/19) / sqrt(20) over the value 2: 2.093 * 0.1 / sqrt(19) / 2.
        assertEquals(2.093 * 0.1 / Math.sqrt(19) / 2, expected, 5e-4 * expected);
        DiffusivityAnalysis single = analyse(steady(1, 1.0), 2.0, 1.0);
        assertEquals(Double.POSITIVE_INFINITY, single.worstRelativeHalfWidth(), "one block: no interval");
    }
}
