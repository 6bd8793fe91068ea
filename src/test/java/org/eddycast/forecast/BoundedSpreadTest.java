package org.eddycast.forecast;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

/**
 * The bounded cloud's variance against its limits and against a direct quadrature of the cosine-series density
 * (Crank 1975, The Mathematics of Diffusion, ch. 4).
 */
class BoundedSpreadTest {

    @Test
    void earlyItIsTheFreeVarianceAndLateThatOfAUniformCloud() {
        assertEquals(0.01, BoundedSpread.variance(10, 5, 0.01), 1e-15, "far from the walls");
        assertEquals(100.0 / 12, BoundedSpread.variance(10, 2, 1e4), 1e-9, "uniform: L^2 / 12");
    }

    /** Midpoint-rule quadrature of the density's variance; the series and the quadrature must agree. */
    @Test
    void agreesWithAQuadratureOfTheDensity() {
        double length = 3;
        double diffusivity = 0.02;
        for (double release : new double[] {0.0, 0.4, 1.5}) {
            for (double t : new double[] {5, 20, 60, 200}) {
                TwoWallCosineAxis axis = new TwoWallCosineAxis(0, length, release, diffusivity);
                int n = 20000;
                double h = length / n;
                double m0 = 0;
                double m1 = 0;
                double m2 = 0;
                for (int i = 0; i < n; i++) {
                    double x = (i + 0.5) * h;
                    double p = axis.density(x, t) * h;
                    m0 += p;
                    m1 += p * x;
                    m2 += p * x * x;
                }
                double expected = m2 / m0 - (m1 / m0) * (m1 / m0);
                assertEquals(expected, BoundedSpread.variance(length, release, 2 * diffusivity * t),
                        1e-6 * length * length, "release " + release + ", t " + t);
            }
        }
    }
}
