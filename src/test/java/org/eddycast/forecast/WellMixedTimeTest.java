package org.eddycast.forecast;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

class WellMixedTimeTest {

    @Test
    void cornerReleaseInACubeMatchesTheFirstModeSolution() {
        // Derived from the cosine series (Crank 1975, The Mathematics of Diffusion): for a release in a corner
        // of a cube of side L, the worst point is the release corner, where each axis gives
        // 1 + 2 q + 2 q^4 + ..., q = exp(-pi^2 D t / L^2). Keeping the first mode, (1 + 2q)^3 = 1.05 gives
        // q = (1.05^(1/3) - 1) / 2 and t = -ln(q) L^2 / (pi^2 D) = 0.48717 L^2 / D. The neglected modes are
        // of order q^4 ~ 1e-8, far below the 1e-6 relative tolerance.
        double side = 3.0;
        double d = 0.01;
        double q = (Math.cbrt(1.05) - 1.0) / 2.0;
        double expected = -Math.log(q) * side * side / (Math.PI * Math.PI * d);
        double actual = WellMixedTime.closedBox(new double[] {side, side, side}, new double[] {0, 0, 0},
                new double[] {d, d, d});
        assertEquals(expected, actual, 1e-6 * expected);
    }

    @Test
    void worstPointAgreesWithABruteForceGridSearch() {
        // Independent check of the worst-point argument: at the computed blend time no point of a 21^3 grid
        // (including the release point and the corners) departs from uniform by more than 5%, and at 97% of
        // it some grid point still departs by more (the deviation falls by several percent over that time).
        double[] size = {2.0, 1.0, 1.0};
        double[] release = {0.5, 0.25, 0.75};
        double[] d = {0.02, 0.01, 0.005};
        double blend = WellMixedTime.closedBox(size, release, d);
        InstantaneousRelease box = InstantaneousRelease.closedBox(1.0, size, release, d);
        double uniform = 1.0 / (size[0] * size[1] * size[2]);
        assertTrue(gridDeviation(box, size, uniform, blend) <= 0.05 + 1e-9);
        assertTrue(gridDeviation(box, size, uniform, 0.97 * blend) > 0.05);
    }

    @Test
    void deviationMatchesBruteForceWhereTheFarWallIsWorst() {
        // For a release between a quarter and half the gap the largest departure is the deficit at the far
        // wall, not the excess near the release (first mode: 1 +- 2 cos(pi x0 / L) q at the two walls, and the
        // second mode lowers both). The worst-point rule must see it: compare with a 4001-point grid.
        TwoWallCosineAxis axis = new TwoWallCosineAxis(0, 1, 0.4, 0.05);
        for (double t : new double[] {0.5, 1.0, 2.0}) {
            double worst = 0.0;
            for (int i = 0; i <= 4000; i++) {
                worst = Math.max(worst, Math.abs(axis.relativeDensity(i / 4000.0, t) - 1.0));
            }
            assertEquals(worst, WellMixedTime.deviation(t, axis), 1e-6, "t=" + t);
            assertTrue(1.0 - axis.lowestRelativeDensity(t) > axis.peakRelativeDensity(t) - 1.0);
        }
    }

    @Test
    void deviationNeverGrows() {
        // Maximum principle for zero-flux diffusion: the deviation from uniform is non-increasing in time.
        TwoWallCosineAxis a = new TwoWallCosineAxis(0, 1, 0.2, 0.01);
        TwoWallCosineAxis b = new TwoWallCosineAxis(0, 2, 1.9, 0.03);
        double previous = Double.MAX_VALUE;
        for (double t = 0.5; t < 100; t *= 1.3) {
            double now = WellMixedTime.deviation(t, a, b);
            assertTrue(now <= previous + 1e-12, "t=" + t);
            previous = now;
        }
    }

    private static double gridDeviation(InstantaneousRelease box, double[] size, double uniform, double t) {
        double worst = 0.0;
        int n = 20;
        for (int i = 0; i <= n; i++) {
            for (int j = 0; j <= n; j++) {
                for (int k = 0; k <= n; k++) {
                    double c = box.concentration(i * size[0] / n, j * size[1] / n, k * size[2] / n, t);
                    worst = Math.max(worst, Math.abs(c / uniform - 1.0));
                }
            }
        }
        return worst;
    }
}
