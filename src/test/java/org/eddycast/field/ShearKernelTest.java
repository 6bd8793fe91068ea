package org.eddycast.field;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.SplittableRandom;
import java.util.random.RandomGeneratorFactory;
import org.junit.jupiter.api.Test;

/**
 * The fast kernels against the JDK's {@link Math#sin} and {@link Math#cos} (within 1 ulp by their
 * specification). A single mode with k = (1, 0, 0), a = (0, 0, 1) and b = (0, 1, 0), applied with h = 1 to a
 * point (phase, 0, 0), moves it to (phase, sin(phase), cos(phase)): the kernel's own sine and cosine come out
 * directly, for the shared and the per-lane layouts, in turn and at once.
 */
class ShearKernelTest {

    /** Bundles of four vectors, one single vector and three points one by one. */
    private static final int POINTS = 4096 + 8 + 3;

    private static ShearModeField probeField() {
        ShearModeField f = new ShearModeField(3, 1);
        f.setMode(0, new double[] {1, 0, 0}, new double[] {0, 0, 1}, new double[] {0, 1, 0}, 0,
                Double.POSITIVE_INFINITY);
        f.setCoefficients(0, 1, 0, 0, 1);
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

    private static double worstError(ShearKernel kernel, boolean lanes, boolean inTurn) {
        double[] x = phases(POINTS);
        double[] start = x.clone();
        double[] y = new double[POINTS];
        double[] z = new double[POINTS];
        ShearModeField f = probeField();
        int n = POINTS;
        if (lanes) {
            n = 4096;
            ModeLanes l = new ModeLanes(3, 1, n);
            for (int i = 0; i < n; i++) {
                l.load(i, f);
            }
            if (inTurn) {
                kernel.applyInTurn(l, 0, 0, x, y, z);
            } else {
                kernel.applyAtOnce(l, x, y, z);
            }
        } else if (inTurn) {
            kernel.applyInTurn(f, 0, 0, x, y, z, n);
        } else {
            kernel.applyAtOnce(f, x, y, z, n);
        }
        double worst = 0;
        for (int i = 0; i < n; i++) {
            assertEquals(start[i], x[i], 0.0, "the shear must leave its own phase unchanged");
            // The polynomial's error plus the rounding of the phase itself: a kernel that keeps the
            // wavevector in turns forms (k / 2 pi) x, two roundings of relative 2^-53 each.
            double allowed = 2e-13 + 2.5e-16 * Math.abs(start[i]);
            worst = Math.max(worst, Math.abs(z[i] - Math.cos(start[i])) / allowed);
            worst = Math.max(worst, Math.abs(y[i] - Math.sin(start[i])) / allowed);
        }
        return worst;
    }

    private static void assertWithinTwoEMinus13(ShearKernel kernel) {
        for (boolean lanes : new boolean[] {false, true}) {
            for (boolean inTurn : new boolean[] {false, true}) {
                double worst = worstError(kernel, lanes, inTurn);
                assertTrue(worst <= 1, (lanes ? "lane" : "shared") + " layout, " + (inTurn ? "in turn" : "at once")
                        + ": largest error " + worst + " of the allowed 2e-13 + 2.5e-16 |phase|");
            }
        }
    }

    /**
     * The vector passes compute, lane by lane, exactly what the scalar turn method computes for the turn
     * phase (k / 2 pi) x: the same operations in the same order, so the same bits.
     */
    @Test
    void vectorPassesMatchTheScalarTurnMethodBitForBit() {
        ShearKernel kernel = new VectorShearKernel();
        double turns = probeField().turnKx[0];
        for (boolean lanes : new boolean[] {false, true}) {
            for (boolean inTurn : new boolean[] {false, true}) {
                int n = 4096;
                double[] x = phases(n);
                double[] y = new double[n];
                double[] z = new double[n];
                if (lanes) {
                    ModeLanes l = new ModeLanes(3, 1, n);
                    for (int i = 0; i < n; i++) {
                        l.load(i, probeField());
                    }
                    if (inTurn) {
                        kernel.applyInTurn(l, 0, 0, x, y, z);
                    } else {
                        kernel.applyAtOnce(l, x, y, z);
                    }
                } else if (inTurn) {
                    kernel.applyInTurn(probeField(), 0, 0, x, y, z, n);
                } else {
                    kernel.applyAtOnce(probeField(), x, y, z, n);
                }
                String where = (lanes ? "lane" : "shared") + " layout, " + (inTurn ? "in turn" : "at once");
                for (int i = 0; i < n; i++) {
                    double t = turns * x[i];
                    assertEquals(FastSinCos.sinOfTurns(t), y[i], 0.0, where + ", sine at point " + i);
                    assertEquals(FastSinCos.cosOfTurns(t), z[i], 0.0, where + ", cosine at point " + i);
                }
            }
        }
    }

    @Test
    void vectorKernelSineAndCosineWithinTwoEMinus13() {
        assertWithinTwoEMinus13(new VectorShearKernel());
    }

    @Test
    void scalarKernelSineAndCosineWithinTwoEMinus13() {
        assertWithinTwoEMinus13(new ScalarShearKernel());
    }

    private static ShearModeField realization() {
        ShearModeField f = new ShearModeField(3, 3);
        new RandomFourierModel(new SpectrumTable(new PowerLawBand(-5.0 / 3.0, 16), 3, 3), 1.0, "test")
                .realize(f, RandomGeneratorFactory.of("L64X128MixRandom").create(8));
        f.prepareStep(0.02);
        return f;
    }

    private static double[][] points(int n) {
        SplittableRandom random = new SplittableRandom(6);
        double[][] p = new double[3][n];
        for (int a = 0; a < 3; a++) {
            for (int i = 0; i < n; i++) {
                p[a][i] = random.nextDouble(-20, 20);
            }
        }
        return p;
    }

    private static void assertClose(double[][] expected, double[][] actual, String what) {
        for (int a = 0; a < 3; a++) {
            for (int i = 0; i < expected[a].length; i++) {
                // A handful of shears of size 0.02 |a| (|a| of order 1): rounding of order 1e-15 per shear.
                assertEquals(expected[a][i], actual[a][i], 1e-13, what + ", axis " + a + " point " + i);
            }
        }
    }

    /**
     * The vector kernel's shears, in turn forward and back (the Strang order) and at once, equal the reference
     * kernel's to rounding, in both layouts; and the lane layout gives the shared layout's answer.
     */
    @Test
    void vectorShearsMatchTheReferenceShears() {
        ShearModeField f = realization();
        f.setStepScale(0.01);
        ShearKernel vector = new VectorShearKernel();
        ShearKernel reference = new ReferenceShearKernel();
        int n = 64 + 8 + 5; // two bundles, one single vector and five points one by one
        double[][] fast = points(n);
        double[][] slow = points(n);
        vector.applyInTurn(f, 0, 2, fast[0], fast[1], fast[2], n);
        vector.applyInTurn(f, 2, 0, fast[0], fast[1], fast[2], n);
        reference.applyInTurn(f, 0, 2, slow[0], slow[1], slow[2], n);
        reference.applyInTurn(f, 2, 0, slow[0], slow[1], slow[2], n);
        assertClose(slow, fast, "shared, in turn");
        vector.applyAtOnce(f, fast[0], fast[1], fast[2], n);
        reference.applyAtOnce(f, slow[0], slow[1], slow[2], n);
        assertClose(slow, fast, "shared, at once");

        int width = 64;
        ModeLanes lanes = new ModeLanes(3, 3, width);
        for (int i = 0; i < width; i++) {
            lanes.load(i, f);
        }
        lanes.setStepScale(0.01);
        double[][] inLanes = points(width);
        double[][] slowLanes = points(width);
        double[][] shared = points(width);
        vector.applyInTurn(lanes, 0, 2, inLanes[0], inLanes[1], inLanes[2]);
        vector.applyInTurn(lanes, 2, 0, inLanes[0], inLanes[1], inLanes[2]);
        reference.applyInTurn(lanes, 0, 2, slowLanes[0], slowLanes[1], slowLanes[2]);
        reference.applyInTurn(lanes, 2, 0, slowLanes[0], slowLanes[1], slowLanes[2]);
        reference.applyInTurn(f, 0, 2, shared[0], shared[1], shared[2], width);
        reference.applyInTurn(f, 2, 0, shared[0], shared[1], shared[2], width);
        assertClose(slowLanes, inLanes, "lanes, in turn");
        assertClose(shared, inLanes, "lanes against the shared layout");
        vector.applyAtOnce(lanes, inLanes[0], inLanes[1], inLanes[2]);
        reference.applyAtOnce(lanes, slowLanes[0], slowLanes[1], slowLanes[2]);
        assertClose(slowLanes, inLanes, "lanes, at once");
    }

    /** Two half steps of one shear are its full step: the shear leaves its own phase unchanged. */
    @Test
    void twoHalfShearsMakeTheFullShear() {
        ShearModeField f = realization();
        ShearKernel vector = new VectorShearKernel();
        int n = 64;
        double[][] halves = points(n);
        double[][] full = points(n);
        f.setStepScale(0.01);
        vector.applyInTurn(f, 1, 1, halves[0], halves[1], halves[2], n);
        vector.applyInTurn(f, 1, 1, halves[0], halves[1], halves[2], n);
        f.setStepScale(0.02);
        vector.applyInTurn(f, 1, 1, full[0], full[1], full[2], n);
        assertClose(full, halves, "two half steps against one full step");
    }

    /**
     * The amplitude update in vector form equals the field's own scalar update to rounding, with the step scale
     * carried into the amplitudes.
     */
    @Test
    void vectorAmplitudeUpdateMatchesTheScalarUpdate() {
        int modes = 16;
        ShearModeField vectorField = new ShearModeField(3, modes);
        ShearModeField scalarField = new ShearModeField(3, modes);
        RandomFourierModel model = new RandomFourierModel(
                new SpectrumTable(new PowerLawBand(-5.0 / 3.0, 16), 3, modes), 1.0, "test");
        model.realize(vectorField, RandomGeneratorFactory.of("L64X128MixRandom").create(9));
        model.realize(scalarField, RandomGeneratorFactory.of("L64X128MixRandom").create(9));
        for (ShearModeField f : new ShearModeField[] {vectorField, scalarField}) {
            f.prepareStep(0.02);
            f.setStepScale(0.02);
        }
        double[] normals = new double[3 + 4 * modes];
        SplittableRandom random = new SplittableRandom(10);
        for (int i = 0; i < normals.length; i++) {
            normals[i] = random.nextGaussian();
        }
        new VectorShearKernel().advance(vectorField, normals, 3);
        new ScalarShearKernel().advance(scalarField, normals, 3);
        double[] a = new double[3];
        double[] b = new double[3];
        double[] expectedA = new double[3];
        double[] expectedB = new double[3];
        boolean changed = false;
        for (int m = 0; m < modes; m++) {
            vectorField.amplitudes(m, a, b);
            scalarField.amplitudes(m, expectedA, expectedB);
            for (int c = 0; c < 3; c++) {
                assertEquals(expectedA[c], a[c], 1e-14, "mode " + m + " a[" + c + "]");
                assertEquals(expectedB[c], b[c], 1e-14, "mode " + m + " b[" + c + "]");
            }
            assertEquals(expectedA[0] * 0.02, vectorField.ax[m], 1e-15, "stored amplitudes carry the step scale");
        }
        ShearModeField fresh = new ShearModeField(3, modes);
        model.realize(fresh, RandomGeneratorFactory.of("L64X128MixRandom").create(9));
        fresh.prepareStep(0.02);
        for (int m = 0; m < modes; m++) {
            fresh.amplitudes(m, expectedA, expectedB);
            vectorField.amplitudes(m, a, b);
            changed |= Math.abs(a[0] - expectedA[0]) > 1e-6;
        }
        assertTrue(changed, "the update must move the amplitudes");
    }

    @Test
    void vectorLaneKernelNeedsWholeBundles() {
        ModeLanes lanes = new ModeLanes(3, 1, 40);
        double[] p = new double[40];
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> new VectorShearKernel().applyAtOnce(lanes, p, p, p));
        assertTrue(e.getMessage().contains("multiple of"), e.getMessage());
    }
}
