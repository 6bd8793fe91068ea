package org.eddycast.field;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.SplittableRandom;
import java.util.random.RandomGeneratorFactory;
import org.junit.jupiter.api.Test;

/**
 * The Beltrami verification flow against its defining formula, u = (A sin z + C cos y, B sin x + A cos z,
 * C sin y + B cos x), whose curl equals u (Dombre, Frisch, Greene, Henon, Mehr and Soward 1986, "Chaotic
 * streamlines in the ABC flows", J. Fluid Mech. 167:353-391, eq. 1.1 with k = 1).
 */
class BeltramiFlowTest {

    private static final double A = 1.3;
    private static final double B = 0.7;
    private static final double C = 0.4;

    private static ShearModeField realized() {
        BeltramiFlow flow = new BeltramiFlow(A, B, C);
        ShearModeField f = new ShearModeField(3, flow.modeCount());
        flow.realize(f, RandomGeneratorFactory.of("L64X128MixRandom").create(1));
        f.prepareStep(0.01);
        return f;
    }

    private static double[] formula(double x, double y, double z) {
        return new double[] {A * Math.sin(z) + C * Math.cos(y), B * Math.sin(x) + A * Math.cos(z),
            C * Math.sin(y) + B * Math.cos(x)};
    }

    @Test
    void velocityIsTheDefiningFormula() {
        ShearModeField f = realized();
        SplittableRandom random = new SplittableRandom(2);
        double[] u = new double[3];
        for (int i = 0; i < 500; i++) {
            double[] p = {random.nextDouble(-10, 10), random.nextDouble(-10, 10), random.nextDouble(-10, 10)};
            f.velocityAt(p, u);
            double[] expected = formula(p[0], p[1], p[2]);
            for (int a = 0; a < 3; a++) {
                assertEquals(expected[a], u[a], 1e-14, "component " + a + " at point " + i);
            }
        }
    }

    /**
     * Curl u = u and div u = 0 by central differences of step h = 1e-4: the truncation error h^2 |u'''| / 6 is
     * below 1e-8 for amplitudes of order one; 2e-7 leaves room for rounding (1e-16 / h).
     */
    @Test
    void curlEqualsVelocityAndDivergenceVanishes() {
        ShearModeField f = realized();
        SplittableRandom random = new SplittableRandom(3);
        double h = 1e-4;
        double[][] grad = new double[3][3];
        double[] plus = new double[3];
        double[] minus = new double[3];
        double[] u = new double[3];
        for (int i = 0; i < 100; i++) {
            double[] p = {random.nextDouble(0, 7), random.nextDouble(0, 7), random.nextDouble(0, 7)};
            for (int j = 0; j < 3; j++) {
                double[] pp = p.clone();
                double[] pm = p.clone();
                pp[j] += h;
                pm[j] -= h;
                f.velocityAt(pp, plus);
                f.velocityAt(pm, minus);
                for (int a = 0; a < 3; a++) {
                    grad[a][j] = (plus[a] - minus[a]) / (2 * h);
                }
            }
            f.velocityAt(p, u);
            double[] curl = {grad[2][1] - grad[1][2], grad[0][2] - grad[2][0], grad[1][0] - grad[0][1]};
            for (int a = 0; a < 3; a++) {
                assertEquals(u[a], curl[a], 2e-7, "curl component " + a + " at point " + i);
            }
            assertEquals(0.0, grad[0][0] + grad[1][1] + grad[2][2], 2e-7, "divergence at point " + i);
        }
    }

    /**
     * The stated component variances against the mean of u_i^2 over the periodic cell, by the trapezoid rule on
     * an 8 x 8 x 8 grid, which is exact for trigonometric polynomials of degree below 8: (A^2 + C^2) / 2,
     * (B^2 + A^2) / 2, (C^2 + B^2) / 2.
     */
    @Test
    void componentVariancesAreTheCellAverages() {
        BeltramiFlow flow = new BeltramiFlow(A, B, C);
        int n = 8;
        double[] mean = new double[3];
        for (int i = 0; i < n; i++) {
            for (int j = 0; j < n; j++) {
                for (int k = 0; k < n; k++) {
                    double[] u = formula(2 * Math.PI * i / n, 2 * Math.PI * j / n, 2 * Math.PI * k / n);
                    for (int a = 0; a < 3; a++) {
                        mean[a] += u[a] * u[a] / (n * n * n);
                    }
                }
            }
        }
        for (int a = 0; a < 3; a++) {
            assertEquals(mean[a], flow.componentVariance(a), 1e-14, "component " + a);
        }
        assertEquals((A * A + C * C) / 2, flow.componentVariance(0), 1e-15);
    }

    @Test
    void scalesAndBadInput() {
        BeltramiFlow flow = new BeltramiFlow(0.5, -2.0, 1.0);
        assertEquals(0.5, flow.shortestTimeScale(), 0.0, "1 / max(|A|, |B|, |C|)");
        assertEquals(2 * Math.PI, flow.startRegion(), 0.0, "one period");
        assertEquals(3, flow.dimensions());
        assertEquals(3, flow.modeCount());
        assertEquals("steady Beltrami flow, A = 0.5000, B = -2.000, C = 1.000", flow.describe());
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> new BeltramiFlow(1, Double.NaN, 1));
        assertEquals("Beltrami amplitudes must be finite; got NaN", e.getMessage());
        assertTrue(assertThrows(IllegalArgumentException.class,
                () -> new BeltramiFlow(Double.POSITIVE_INFINITY, 1, 1)).getMessage().contains("Infinity"));
    }
}
