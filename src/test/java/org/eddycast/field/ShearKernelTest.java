package org.eddycast.field;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;

/**
 * The fast kernels against the JDK's {@link Math#sin} and {@link Math#cos} (accurate to 1 ulp by their
 * specification). A single mode with k = (1, 0, 0), a = (1, 0, 0) and b = (0, 1, 0), applied to a point with
 * x = phase, adds cos(phase) to the x velocity and sin(phase) to the y velocity: the kernel's own sine and
 * cosine come out directly, for the shared and the per-lane layouts.
 */
class ShearKernelTest {

    private static ShearModeField probeField() {
        ShearModeField f = new ShearModeField(3, 2);
        f.setMode(0, new double[] {1, 0, 0}, new double[] {1, 0, 0}, new double[] {0, 1, 0}, 0,
                Double.POSITIVE_INFINITY);
        f.setCoefficients(0, 1, 0, 0, 1);
        f.setMode(1, new double[] {0, 0, 1}, new double[] {1, 0, 0}, new double[] {0, 1, 0}, 0,
                Double.POSITIVE_INFINITY);
        f.prepareStep(0.1);
        return f;
    }

    /** Phases as they occur (|k| up to a few tens times positions up to a few tens) and far beyond. */
    private static double[] phases(int n) {
        SplittableRandom random = new SplittableRandom(5);
        double[] p = new double[n];
        for (int i = 0; i < n; i++) {
            double scale = Math.pow(10, random.nextDouble(-3, 6));
            p[i] = (random.nextBoolean() ? 1 : -1) * scale * random.nextDouble();
        }
        return p;
    }

    private static double worstError(ShearKernel kernel, boolean lanes) {
        int n = 4099; // not a multiple of any vector length, so the shared path's tail is exercised too
        double[] x = phases(n);
        double[] y = new double[n];
        double[] z = new double[n];
        double[] vx = new double[n];
        double[] vy = new double[n];
        double[] vz = new double[n];
        ShearModeField f = probeField();
        if (lanes) {
            int width = 4096;
            ModeLanes l = new ModeLanes(3, 2, width);
            for (int i = 0; i < width; i++) {
                l.load(i, f);
            }
            kernel.addVelocity(l, 0, x, y, z, vx, vy, vz);
            n = width;
        } else {
            kernel.addVelocity(f, 0, x, y, z, n, vx, vy, vz);
        }
        double worst = 0;
        for (int i = 0; i < n; i++) {
            worst = Math.max(worst, Math.abs(vx[i] - Math.cos(x[i])));
            worst = Math.max(worst, Math.abs(vy[i] - Math.sin(x[i])));
            assertEquals(0.0, vz[i], 0.0);
        }
        return worst;
    }

    @Test
    void vectorKernelSineAndCosineWithinTwoEMinus15() {
        ShearKernel vector = new VectorShearKernel();
        assertTrue(worstError(vector, false) < 2e-15, "shared layout: " + worstError(vector, false));
        assertTrue(worstError(vector, true) < 2e-15, "lane layout: " + worstError(vector, true));
    }

    @Test
    void scalarKernelSineAndCosineWithinTwoEMinus15() {
        ShearKernel scalar = new ScalarShearKernel();
        assertTrue(worstError(scalar, false) < 2e-15, "shared layout: " + worstError(scalar, false));
        assertTrue(worstError(scalar, true) < 2e-15, "lane layout: " + worstError(scalar, true));
    }

    /** The shear of the vector kernel equals the reference kernel's to rounding, in both layouts. */
    @Test
    void vectorShearMatchesTheReferenceShear() {
        ShearModeField f = new ShearModeField(3, 3);
        new RandomFourierModel(new SpectrumTable(new PowerLawBand(-5.0 / 3.0, 16), 3, 3), 1.0, "test")
                .realize(f, java.util.random.RandomGeneratorFactory.of("L64X128MixRandom").create(8));
        f.prepareStep(0.02);
        int n = 64;
        double[][] fast = new double[3][n];
        double[][] slow = new double[3][n];
        SplittableRandom random = new SplittableRandom(6);
        for (int i = 0; i < n; i++) {
            for (int a = 0; a < 3; a++) {
                fast[a][i] = random.nextDouble(-20, 20);
                slow[a][i] = fast[a][i];
            }
        }
        ShearKernel vector = new VectorShearKernel();
        ShearKernel reference = new ReferenceShearKernel();
        ModeLanes lanes = new ModeLanes(3, 3, n);
        for (int i = 0; i < n; i++) {
            lanes.load(i, f);
        }
        for (int m = 0; m < 3; m++) {
            vector.shear(f, m, 0.02, fast[0], fast[1], fast[2], n);
            reference.shear(f, m, 0.02, slow[0], slow[1], slow[2], n);
            vector.shear(lanes, m, 0.02, fast[0], fast[1], fast[2]);
            reference.shear(lanes, m, 0.02, slow[0], slow[1], slow[2]);
        }
        for (int a = 0; a < 3; a++) {
            for (int i = 0; i < n; i++) {
                // Six shears of size 0.02 |a| (|a| of order 1): rounding of order 1e-15 per step.
                assertEquals(slow[a][i], fast[a][i], 1e-13, "axis " + a + " point " + i);
            }
        }
    }
}
