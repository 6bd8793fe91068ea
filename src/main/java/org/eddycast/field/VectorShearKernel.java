package org.eddycast.field;

import jdk.incubator.vector.DoubleVector;
import jdk.incubator.vector.VectorSpecies;

/**
 * The kernel on the Vector API (jdk.incubator.vector): particles across the lanes of the machine's preferred
 * vector shape, each bundle of points taken through every shear of the step while it sits in registers
 * ({@link VectorSharedPasses}, {@link VectorLanePasses}); points beyond the last whole vector are done one by
 * one with {@link FastSinCos}. Nothing is allocated.
 *
 * <p>Loading this class needs the module jdk.incubator.vector ({@code --add-modules jdk.incubator.vector});
 * {@code KernelChoice} checks for it first.
 */
public final class VectorShearKernel implements ShearKernel {

    private static final VectorSpecies<Double> SPECIES = VectorSinCos.SPECIES;
    private static final int LANES = SPECIES.length();

    /** For the points beyond the last whole vector. */
    private final ScalarShearKernel tail = new ScalarShearKernel();

    @Override
    public void applyInTurn(ShearModeField f, int first, int last, double[] x, double[] y, double[] z, int n) {
        int direction = last >= first ? 1 : -1;
        int stop = last + direction;
        int bundled = n - n % VectorSharedPasses.BUNDLE;
        for (int i = 0; i < bundled; i += VectorSharedPasses.BUNDLE) {
            VectorSharedPasses.inTurnBundle(f, first, stop, direction, x, y, z, i);
        }
        int whole = SPECIES.loopBound(n);
        for (int i = bundled; i < whole; i += LANES) {
            VectorSharedPasses.inTurnVector(f, first, stop, direction, x, y, z, i);
        }
        for (int i = whole; i < n; i++) {
            tail.inTurnPoint(f, first, stop, direction, x, y, z, i);
        }
    }

    @Override
    public void applyAtOnce(ShearModeField f, double[] x, double[] y, double[] z, int n) {
        int whole = SPECIES.loopBound(n);
        for (int i = 0; i < whole; i += LANES) {
            VectorSharedPasses.atOnceVector(f, x, y, z, i);
        }
        for (int i = whole; i < n; i++) {
            tail.atOncePoint(f, x, y, z, i);
        }
    }

    @Override
    public void applyInTurn(ModeLanes f, int first, int last, double[] x, double[] y, double[] z) {
        int width = bundledWidth(f);
        int direction = last >= first ? 1 : -1;
        for (int i = 0; i < width; i += VectorLanePasses.BUNDLE) {
            VectorLanePasses.inTurnBundle(f.data, width, first, last + direction, direction, x, y, z, i);
        }
    }

    @Override
    public void applyAtOnce(ModeLanes f, double[] x, double[] y, double[] z) {
        int width = bundledWidth(f);
        int end = f.modes() * ModeLanes.FIELDS * width;
        for (int i = 0; i < width; i += LANES) {
            VectorLanePasses.atOnceVector(f.data, width, end, x, y, z, i);
        }
    }

    private static int bundledWidth(ModeLanes f) {
        int width = f.width();
        if (width % VectorLanePasses.BUNDLE != 0) {
            throw new IllegalArgumentException("the vector kernel needs a lane count that is a multiple of "
                    + VectorLanePasses.BUNDLE + "; got " + width);
        }
        return width;
    }

    /** {@link ShearModeField#advanceAmplitudes} in vector form, modes in the lanes. */
    @Override
    public void advance(ShearModeField f, double[] normals, int offset) {
        int modes = f.modes();
        if (!f.randomInTime()) {
            return;
        }
        if (modes % LANES != 0) {
            f.advanceAmplitudes(normals, offset);
            return;
        }
        DoubleVector h = DoubleVector.broadcast(SPECIES, f.stepScale());
        for (int m = 0; m < modes; m += LANES) {
            DoubleVector rho = DoubleVector.fromArray(SPECIES, f.decay, m);
            DoubleVector k = DoubleVector.fromArray(SPECIES, f.kick, m);
            DoubleVector a1 = k.fma(DoubleVector.fromArray(SPECIES, normals, offset + m),
                    rho.mul(DoubleVector.fromArray(SPECIES, f.alpha1, m)));
            DoubleVector b1 = k.fma(DoubleVector.fromArray(SPECIES, normals, offset + modes + m),
                    rho.mul(DoubleVector.fromArray(SPECIES, f.beta1, m)));
            DoubleVector a2 = k.fma(DoubleVector.fromArray(SPECIES, normals, offset + 2 * modes + m),
                    rho.mul(DoubleVector.fromArray(SPECIES, f.alpha2, m)));
            DoubleVector b2 = k.fma(DoubleVector.fromArray(SPECIES, normals, offset + 3 * modes + m),
                    rho.mul(DoubleVector.fromArray(SPECIES, f.beta2, m)));
            a1.intoArray(f.alpha1, m);
            b1.intoArray(f.beta1, m);
            a2.intoArray(f.alpha2, m);
            b2.intoArray(f.beta2, m);
            DoubleVector e1x = DoubleVector.fromArray(SPECIES, f.e1x, m);
            DoubleVector e1y = DoubleVector.fromArray(SPECIES, f.e1y, m);
            DoubleVector e1z = DoubleVector.fromArray(SPECIES, f.e1z, m);
            DoubleVector e2x = DoubleVector.fromArray(SPECIES, f.e2x, m);
            DoubleVector e2y = DoubleVector.fromArray(SPECIES, f.e2y, m);
            DoubleVector e2z = DoubleVector.fromArray(SPECIES, f.e2z, m);
            a1.fma(e1x, a2.mul(e2x)).mul(h).intoArray(f.ax, m);
            a1.fma(e1y, a2.mul(e2y)).mul(h).intoArray(f.ay, m);
            a1.fma(e1z, a2.mul(e2z)).mul(h).intoArray(f.az, m);
            b1.fma(e1x, b2.mul(e2x)).mul(h).intoArray(f.bx, m);
            b1.fma(e1y, b2.mul(e2y)).mul(h).intoArray(f.by, m);
            b1.fma(e1z, b2.mul(e2z)).mul(h).intoArray(f.bz, m);
        }
    }

    @Override
    public void advance(ModeLanes f, int m, double[] normals) {
        int n = f.width();
        int o = m * ModeLanes.FIELDS * n;
        double[] d = f.data;
        for (int i = 0; i < n; i += LANES) {
            int j = o + i;
            DoubleVector rho = DoubleVector.fromArray(SPECIES, d, j + ModeLanes.DECAY * n);
            DoubleVector k = DoubleVector.fromArray(SPECIES, d, j + ModeLanes.KICK * n);
            k.fma(DoubleVector.fromArray(SPECIES, normals, i),
                    rho.mul(DoubleVector.fromArray(SPECIES, d, j + ModeLanes.ALPHA1 * n)))
                    .intoArray(d, j + ModeLanes.ALPHA1 * n);
            k.fma(DoubleVector.fromArray(SPECIES, normals, n + i),
                    rho.mul(DoubleVector.fromArray(SPECIES, d, j + ModeLanes.BETA1 * n)))
                    .intoArray(d, j + ModeLanes.BETA1 * n);
            k.fma(DoubleVector.fromArray(SPECIES, normals, 2 * n + i),
                    rho.mul(DoubleVector.fromArray(SPECIES, d, j + ModeLanes.ALPHA2 * n)))
                    .intoArray(d, j + ModeLanes.ALPHA2 * n);
            k.fma(DoubleVector.fromArray(SPECIES, normals, 3 * n + i),
                    rho.mul(DoubleVector.fromArray(SPECIES, d, j + ModeLanes.BETA2 * n)))
                    .intoArray(d, j + ModeLanes.BETA2 * n);
        }
    }

    @Override
    public String name() {
        return "vector " + SPECIES.vectorBitSize() + "-bit";
    }
}
