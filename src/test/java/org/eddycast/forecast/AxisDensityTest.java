package org.eddycast.forecast;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/**
 * The free, one-wall and two-wall densities against each other and against the exact properties of the
 * diffusion equation (Crank 1975, The Mathematics of Diffusion, 2nd ed., Oxford University Press).
 */
class AxisDensityTest {

    private static final double GAP = 2.0;
    private static final double D = 0.05;

    @Test
    void imageSeriesAndCosineSeriesAgreeBetweenTwoWalls() {
        // Two exact solutions of one problem (Crank 1975): they must agree to the truncation tolerance, here
        // 1e-10 of 1/L each, at early, middle and late times, near and away from the walls.
        double[] releases = {0.0, 0.3, 1.0, 1.9};
        double[] times = {0.05, 1.0, 10.0, 80.0};
        for (double x0 : releases) {
            TwoWallImageAxis images = new TwoWallImageAxis(0.0, GAP, x0, D);
            TwoWallCosineAxis cosines = new TwoWallCosineAxis(0.0, GAP, x0, D);
            for (double t : times) {
                for (double x = 0.0; x <= GAP; x += 0.1) {
                    assertEquals(images.density(x, t), cosines.density(x, t), 3e-10 / GAP,
                            "x0=" + x0 + " t=" + t + " x=" + x);
                }
            }
        }
    }

    @Test
    void bothSeriesMatchTheFreeGaussianEarlyAndFarFromTheWalls() {
        // Early, sqrt(2 D t) = 0.05 L, release mid-gap: the nearest image is 20 standard deviations away, so
        // the bounded densities equal the free one (Crank 1975) to far below 1e-9 relative near the release.
        double t = Math.pow(0.05 * GAP, 2) / (2.0 * D);
        FreeAxis free = new FreeAxis(1.0, D);
        TwoWallImageAxis images = new TwoWallImageAxis(0.0, GAP, 1.0, D);
        TwoWallCosineAxis cosines = new TwoWallCosineAxis(0.0, GAP, 1.0, D);
        for (double x = 0.8; x <= 1.2; x += 0.05) {
            double expected = free.density(x, t);
            assertEquals(expected, images.density(x, t), 1e-9 * expected);
            assertEquals(expected, cosines.density(x, t), 1e-9 * expected + 3e-10 / GAP);
        }
        assertEquals(free.peakDensity(t), cosines.peakDensity(t), 1e-9 * free.peakDensity(t));
    }

    @Test
    void densitiesConserveMass() {
        // Zero-flux walls keep all the tracer (Crank 1975): each density integrates to 1 over its domain.
        double t = 3.0;
        TwoWallCosineAxis cosines = new TwoWallCosineAxis(0.0, GAP, 0.4, D);
        TwoWallImageAxis images = new TwoWallImageAxis(0.0, GAP, 0.4, D);
        OneWallAxis oneWall = new OneWallAxis(0.0, true, 0.2, D);
        assertEquals(1.0, Quadrature.integrate(x -> cosines.density(x, t), 0.0, GAP, 40), 1e-9);
        assertEquals(1.0, Quadrature.integrate(x -> images.density(x, t), 0.0, GAP, 40), 1e-9);
        assertEquals(1.0, Quadrature.integrate(x -> oneWall.density(x, t), 0.0, 10.0, 200), 1e-9);
    }

    @Test
    void oneWallDoublesTheDensityAtTheWallForAReleaseOnIt() {
        // Method of images (Crank 1975): a source on a reflecting wall coincides with its image.
        FreeAxis free = new FreeAxis(0.0, D);
        OneWallAxis wall = new OneWallAxis(0.0, true, 0.0, D);
        for (double x : new double[] {0.0, 0.1, 0.7}) {
            assertEquals(2.0 * free.density(x, 2.0), wall.density(x, 2.0), 1e-14);
        }
        assertEquals(0.0, wall.density(-0.1, 2.0));
        assertEquals(2.0 * free.peakDensity(2.0), wall.peakDensity(2.0), 1e-9 * free.peakDensity(2.0));
    }

    @Test
    void oneWallPeakMatchesAFineGridSearch() {
        // Peak of the sum of a Gaussian and its image, checked against brute force on a fine grid.
        double t = 1.0;
        for (double x0 : new double[] {0.05, 0.3, 1.0}) {
            OneWallAxis wall = new OneWallAxis(0.0, true, x0, D);
            double grid = 0.0;
            for (int i = 0; i <= 20000; i++) {
                grid = Math.max(grid, wall.density(i * 1e-4, t));
            }
            assertEquals(grid, wall.peakDensity(t), 1e-7 * grid);
        }
    }

    @Test
    void cosinePeakAndLowestMatchAFineGridSearch() {
        // Checks the unimodal-shape argument of TwoWallCosineAxis against brute force.
        for (double x0 : new double[] {0.0, 0.15, 0.9, 1.6}) {
            TwoWallCosineAxis axis = new TwoWallCosineAxis(0.0, GAP, x0, D);
            for (double t : new double[] {0.5, 4.0, 20.0}) {
                double high = 0.0;
                double low = Double.MAX_VALUE;
                for (int i = 0; i <= 4000; i++) {
                    double p = axis.density(i * GAP / 4000, t);
                    high = Math.max(high, p);
                    low = Math.min(low, p);
                }
                assertEquals(high, axis.peakDensity(t), 1e-6 * high);
                assertEquals(low, axis.lowestDensity(t), 1e-12);
                assertTrue(axis.peakDensity(t) >= high);
            }
        }
    }

    @Test
    void freeAxisVarianceIsTwoDt() {
        // Second moment of the Gaussian density: 2 D t (Crank 1975), by quadrature.
        FreeAxis free = new FreeAxis(0.0, D);
        double t = 4.0;
        double variance = Quadrature.integrate(x -> x * x * free.density(x, t), -5.0, 5.0, 100);
        assertEquals(2.0 * D * t, variance, 1e-10);
        assertEquals(Math.sqrt(2.0 * D * t), free.sigma(t), 1e-15);
    }

    @Test
    void badArgumentsNameTheFieldAndTheRange() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> new TwoWallCosineAxis(0.0, 1.0, 1.5, D));
        assertEquals("release must lie in [0.0, 1.0] m; got 1.5", e.getMessage());
        e = assertThrows(IllegalArgumentException.class, () -> new FreeAxis(0.0, -1.0));
        assertEquals("diffusivity must be a finite number > 0 m^2/s; got -1.0", e.getMessage());
        e = assertThrows(IllegalArgumentException.class, () -> new FreeAxis(0.0, D).density(0.0, 0.0));
        assertEquals("t must be a finite number > 0 s; got 0.0", e.getMessage());
    }
}
