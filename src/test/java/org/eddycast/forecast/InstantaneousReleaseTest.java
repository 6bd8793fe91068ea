package org.eddycast.forecast;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

class InstantaneousReleaseTest {

    private static final double MASS = 2.5;
    private static final double[] D = {0.02, 0.01, 0.004};

    @Test
    void freePuffPeakIsCranksFormula() {
        // Crank 1975, The Mathematics of Diffusion: C_peak = M / ((4 pi t)^(3/2) sqrt(Dx Dy Dz)),
        // equal to M / ((2 pi)^(3/2) sx sy sz) with s_i = sqrt(2 D_i t).
        InstantaneousRelease puff = InstantaneousRelease.freeSpace(MASS, new double[] {1, 2, 3}, D);
        double t = 30.0;
        double expected = MASS / (Math.pow(4.0 * Math.PI * t, 1.5) * Math.sqrt(D[0] * D[1] * D[2]));
        assertEquals(expected, puff.peakConcentration(t), 1e-9 * expected);
        assertEquals(expected, puff.concentration(1, 2, 3, t), 1e-12 * expected);
        double s0 = Math.sqrt(2 * D[0] * t);
        double s1 = Math.sqrt(2 * D[1] * t);
        double s2 = Math.sqrt(2 * D[2] * t);
        assertEquals(expected, InstantaneousRelease.gaussianPeak(MASS, s0, s1, s2), 1e-12 * expected);
        // One standard deviation off along x the puff is exp(-1/2) of its peak.
        assertEquals(expected * Math.exp(-0.5), puff.concentration(1 + s0, 2, 3, t), 1e-12 * expected);
    }

    @Test
    void closedBoxKeepsItsMass() {
        // Reflecting walls lose nothing (Crank 1975): the box concentration integrates to M. A 3-D
        // Gauss-Legendre product rule on the concentration checks the composition of the three series.
        double[] size = {2.0, 1.0, 0.5};
        InstantaneousRelease box = InstantaneousRelease.closedBox(MASS, size, new double[] {0.3, 0.5, 0.1}, D);
        double t = 5.0;
        double total = Quadrature.integrate(
                x -> Quadrature.integrate(
                        y -> Quadrature.integrate(z -> box.concentration(x, y, z, t), 0, size[2], 4),
                        0, size[1], 4),
                0, size[0], 6);
        assertEquals(MASS, total, 1e-7 * MASS);
    }

    @Test
    void closedBoxTendsToTheUniformConcentration() {
        // Late times: only the uniform mode is left, C -> M / V (Crank 1975).
        double[] size = {2.0, 1.0, 0.5};
        InstantaneousRelease box = InstantaneousRelease.closedBox(MASS, size, new double[] {0.3, 0.5, 0.1}, D);
        double uniform = MASS / (size[0] * size[1] * size[2]);
        double late = 2000.0;
        assertEquals(uniform, box.peakConcentration(late), 1e-6 * uniform);
        assertEquals(uniform, box.lowestConcentration(late), 1e-6 * uniform);
    }
}
