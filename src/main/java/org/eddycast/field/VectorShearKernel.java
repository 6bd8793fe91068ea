package org.eddycast.field;

import jdk.incubator.vector.DoubleVector;
import jdk.incubator.vector.LongVector;
import jdk.incubator.vector.VectorOperators;
import jdk.incubator.vector.VectorSpecies;

/**
 * The kernel on the Vector API (jdk.incubator.vector): particles across the lanes of the machine's preferred
 * vector shape, phase, sine and cosine ({@link VectorSinCos}) and update fused in one pass per mode, nothing
 * allocated. Points beyond the last whole vector are done one by one with {@link FastSinCos}. Every loop is
 * one flat method (see {@link VectorSinCos} for why).
 *
 * <p>Loading this class needs the module jdk.incubator.vector ({@code --add-modules jdk.incubator.vector});
 * {@link KernelChoice} checks for it first.
 */
public final class VectorShearKernel implements ShearKernel {

    private static final VectorSpecies<Double> SPECIES = VectorSinCos.SPECIES;

    @Override
    public void shear(ShearModeField f, int m, double h, double[] x, double[] y, double[] z, int n) {
        sharedPass(f.kx[m], f.ky[m], f.kz[m], h * f.ax[m], h * f.ay[m], h * f.az[m], h * f.bx[m], h * f.by[m],
                h * f.bz[m], x, y, z, x, y, z, n);
    }

    @Override
    public void addVelocity(ShearModeField f, int m, double[] x, double[] y, double[] z, int n,
                            double[] vx, double[] vy, double[] vz) {
        sharedPass(f.kx[m], f.ky[m], f.kz[m], f.ax[m], f.ay[m], f.az[m], f.bx[m], f.by[m], f.bz[m],
                x, y, z, vx, vy, vz, n);
    }

    @Override
    public void shear(ModeLanes f, int m, double h, double[] x, double[] y, double[] z) {
        lanePass(f, m * ModeLanes.FIELDS * f.width(), h, x, y, z, x, y, z, f.width());
    }

    @Override
    public void addVelocity(ModeLanes f, int m, double[] x, double[] y, double[] z,
                            double[] vx, double[] vy, double[] vz) {
        lanePass(f, m * ModeLanes.FIELDS * f.width(), 1.0, x, y, z, vx, vy, vz, f.width());
    }

    /**
     * One mode sharing one realization: out &lt;- out + ca cos(k . p) + cb sin(k . p) over points 0..n-1, p read
     * from (px, py, pz). The shear passes the positions as both p and out, the velocity the velocity as out.
     */
    private void sharedPass(double k1, double k2, double k3, double ca1, double ca2, double ca3,
                            double cb1, double cb2, double cb3, double[] px, double[] py, double[] pz,
                            double[] ox, double[] oy, double[] oz, int n) {
        DoubleVector kx = DoubleVector.broadcast(SPECIES, k1);
        DoubleVector ky = DoubleVector.broadcast(SPECIES, k2);
        DoubleVector kz = DoubleVector.broadcast(SPECIES, k3);
        DoubleVector ax = DoubleVector.broadcast(SPECIES, ca1);
        DoubleVector ay = DoubleVector.broadcast(SPECIES, ca2);
        DoubleVector az = DoubleVector.broadcast(SPECIES, ca3);
        DoubleVector bx = DoubleVector.broadcast(SPECIES, cb1);
        DoubleVector by = DoubleVector.broadcast(SPECIES, cb2);
        DoubleVector bz = DoubleVector.broadcast(SPECIES, cb3);
        int whole = SPECIES.loopBound(n);
        for (int i = 0; i < whole; i += SPECIES.length()) {
            DoubleVector phase = DoubleVector.fromArray(SPECIES, pz, i).fma(kz, DoubleVector.fromArray(SPECIES, py, i)
                    .fma(ky, DoubleVector.fromArray(SPECIES, px, i).mul(kx)));
            DoubleVector shifted = phase.fma(VectorSinCos.TWO_OVER_PI, VectorSinCos.ROUNDER);
            LongVector q = shifted.reinterpretAsLongs();
            DoubleVector turns = shifted.sub(VectorSinCos.ROUNDER);
            DoubleVector r = turns.fma(VectorSinCos.MINUS_PIO2_LO, turns.fma(VectorSinCos.MINUS_PIO2_HI, phase));
            DoubleVector r2 = r.mul(r);
            DoubleVector sr = r2.fma(VectorSinCos.S15, VectorSinCos.S13).fma(r2, VectorSinCos.S11)
                    .fma(r2, VectorSinCos.S9).fma(r2, VectorSinCos.S7).fma(r2, VectorSinCos.S5)
                    .fma(r2, VectorSinCos.S3).mul(r2).fma(r, r);
            DoubleVector cr = r2.fma(VectorSinCos.C16, VectorSinCos.C14).fma(r2, VectorSinCos.C12)
                    .fma(r2, VectorSinCos.C10).fma(r2, VectorSinCos.C8).fma(r2, VectorSinCos.C6)
                    .fma(r2, VectorSinCos.C4).fma(r2, VectorSinCos.C2).fma(r2, VectorSinCos.ONE);
            LongVector sb = sr.reinterpretAsLongs();
            LongVector cb = cr.reinterpretAsLongs();
            LongVector swap = sb.lanewise(VectorOperators.XOR, cb)
                    .and(q.lanewise(VectorOperators.LSHL, 63).lanewise(VectorOperators.ASHR, 63));
            DoubleVector s = sb.lanewise(VectorOperators.XOR, swap)
                    .lanewise(VectorOperators.XOR, q.and(2L).lanewise(VectorOperators.LSHL, 62))
                    .reinterpretAsDoubles();
            DoubleVector c = cb.lanewise(VectorOperators.XOR, swap)
                    .lanewise(VectorOperators.XOR, q.add(1L).and(2L).lanewise(VectorOperators.LSHL, 62))
                    .reinterpretAsDoubles();
            ax.fma(c, bx.fma(s, DoubleVector.fromArray(SPECIES, ox, i))).intoArray(ox, i);
            ay.fma(c, by.fma(s, DoubleVector.fromArray(SPECIES, oy, i))).intoArray(oy, i);
            az.fma(c, bz.fma(s, DoubleVector.fromArray(SPECIES, oz, i))).intoArray(oz, i);
        }
        for (int i = whole; i < n; i++) {
            double p = k1 * px[i] + k2 * py[i] + k3 * pz[i];
            double s = FastSinCos.sin(p);
            double c = FastSinCos.cos(p);
            ox[i] += ca1 * c + cb1 * s;
            oy[i] += ca2 * c + cb2 * s;
            oz[i] += ca3 * c + cb3 * s;
        }
    }

    /** As {@link #sharedPass} with each lane's own mode at offset o of the lane layout, scaled by h. */
    private void lanePass(ModeLanes f, int o, double h, double[] px, double[] py, double[] pz,
                          double[] ox, double[] oy, double[] oz, int n) {
        double[] d = f.data;
        for (int i = 0; i < n; i += SPECIES.length()) {
            int j = o + i;
            DoubleVector kx = DoubleVector.fromArray(SPECIES, d, j + ModeLanes.KX * n);
            DoubleVector ky = DoubleVector.fromArray(SPECIES, d, j + ModeLanes.KY * n);
            DoubleVector kz = DoubleVector.fromArray(SPECIES, d, j + ModeLanes.KZ * n);
            DoubleVector phase = DoubleVector.fromArray(SPECIES, pz, i).fma(kz,
                    DoubleVector.fromArray(SPECIES, py, i).fma(ky, DoubleVector.fromArray(SPECIES, px, i).mul(kx)));
            DoubleVector shifted = phase.fma(VectorSinCos.TWO_OVER_PI, VectorSinCos.ROUNDER);
            LongVector q = shifted.reinterpretAsLongs();
            DoubleVector turns = shifted.sub(VectorSinCos.ROUNDER);
            DoubleVector r = turns.fma(VectorSinCos.MINUS_PIO2_LO, turns.fma(VectorSinCos.MINUS_PIO2_HI, phase));
            DoubleVector r2 = r.mul(r);
            DoubleVector sr = r2.fma(VectorSinCos.S15, VectorSinCos.S13).fma(r2, VectorSinCos.S11)
                    .fma(r2, VectorSinCos.S9).fma(r2, VectorSinCos.S7).fma(r2, VectorSinCos.S5)
                    .fma(r2, VectorSinCos.S3).mul(r2).fma(r, r);
            DoubleVector cr = r2.fma(VectorSinCos.C16, VectorSinCos.C14).fma(r2, VectorSinCos.C12)
                    .fma(r2, VectorSinCos.C10).fma(r2, VectorSinCos.C8).fma(r2, VectorSinCos.C6)
                    .fma(r2, VectorSinCos.C4).fma(r2, VectorSinCos.C2).fma(r2, VectorSinCos.ONE);
            LongVector sb = sr.reinterpretAsLongs();
            LongVector cb = cr.reinterpretAsLongs();
            LongVector swap = sb.lanewise(VectorOperators.XOR, cb)
                    .and(q.lanewise(VectorOperators.LSHL, 63).lanewise(VectorOperators.ASHR, 63));
            DoubleVector s = sb.lanewise(VectorOperators.XOR, swap)
                    .lanewise(VectorOperators.XOR, q.and(2L).lanewise(VectorOperators.LSHL, 62))
                    .reinterpretAsDoubles().mul(h);
            DoubleVector c = cb.lanewise(VectorOperators.XOR, swap)
                    .lanewise(VectorOperators.XOR, q.add(1L).and(2L).lanewise(VectorOperators.LSHL, 62))
                    .reinterpretAsDoubles().mul(h);
            DoubleVector ax = DoubleVector.fromArray(SPECIES, d, j + ModeLanes.AX * n);
            DoubleVector bx = DoubleVector.fromArray(SPECIES, d, j + ModeLanes.BX * n);
            ax.fma(c, bx.fma(s, DoubleVector.fromArray(SPECIES, ox, i))).intoArray(ox, i);
            DoubleVector ay = DoubleVector.fromArray(SPECIES, d, j + ModeLanes.AY * n);
            DoubleVector by = DoubleVector.fromArray(SPECIES, d, j + ModeLanes.BY * n);
            ay.fma(c, by.fma(s, DoubleVector.fromArray(SPECIES, oy, i))).intoArray(oy, i);
            DoubleVector az = DoubleVector.fromArray(SPECIES, d, j + ModeLanes.AZ * n);
            DoubleVector bz = DoubleVector.fromArray(SPECIES, d, j + ModeLanes.BZ * n);
            az.fma(c, bz.fma(s, DoubleVector.fromArray(SPECIES, oz, i))).intoArray(oz, i);
        }
    }

    @Override
    public void advance(ModeLanes f, int m, double[] normals) {
        int n = f.width();
        int o = m * ModeLanes.FIELDS * n;
        double[] d = f.data;
        for (int i = 0; i < n; i += SPECIES.length()) {
            int j = o + i;
            DoubleVector rho = DoubleVector.fromArray(SPECIES, d, j + ModeLanes.DECAY * n);
            DoubleVector k = DoubleVector.fromArray(SPECIES, d, j + ModeLanes.KICK * n);
            DoubleVector a1 = k.mul(DoubleVector.fromArray(SPECIES, normals, i))
                    .add(rho.mul(DoubleVector.fromArray(SPECIES, d, j + ModeLanes.ALPHA1 * n)));
            DoubleVector b1 = k.mul(DoubleVector.fromArray(SPECIES, normals, n + i))
                    .add(rho.mul(DoubleVector.fromArray(SPECIES, d, j + ModeLanes.BETA1 * n)));
            DoubleVector a2 = k.mul(DoubleVector.fromArray(SPECIES, normals, 2 * n + i))
                    .add(rho.mul(DoubleVector.fromArray(SPECIES, d, j + ModeLanes.ALPHA2 * n)));
            DoubleVector b2 = k.mul(DoubleVector.fromArray(SPECIES, normals, 3 * n + i))
                    .add(rho.mul(DoubleVector.fromArray(SPECIES, d, j + ModeLanes.BETA2 * n)));
            a1.intoArray(d, j + ModeLanes.ALPHA1 * n);
            b1.intoArray(d, j + ModeLanes.BETA1 * n);
            a2.intoArray(d, j + ModeLanes.ALPHA2 * n);
            b2.intoArray(d, j + ModeLanes.BETA2 * n);
            DoubleVector e1x = DoubleVector.fromArray(SPECIES, d, j + ModeLanes.E1X * n);
            DoubleVector e1y = DoubleVector.fromArray(SPECIES, d, j + ModeLanes.E1Y * n);
            DoubleVector e1z = DoubleVector.fromArray(SPECIES, d, j + ModeLanes.E1Z * n);
            DoubleVector e2x = DoubleVector.fromArray(SPECIES, d, j + ModeLanes.E2X * n);
            DoubleVector e2y = DoubleVector.fromArray(SPECIES, d, j + ModeLanes.E2Y * n);
            DoubleVector e2z = DoubleVector.fromArray(SPECIES, d, j + ModeLanes.E2Z * n);
            a1.fma(e1x, a2.mul(e2x)).intoArray(d, j + ModeLanes.AX * n);
            a1.fma(e1y, a2.mul(e2y)).intoArray(d, j + ModeLanes.AY * n);
            a1.fma(e1z, a2.mul(e2z)).intoArray(d, j + ModeLanes.AZ * n);
            b1.fma(e1x, b2.mul(e2x)).intoArray(d, j + ModeLanes.BX * n);
            b1.fma(e1y, b2.mul(e2y)).intoArray(d, j + ModeLanes.BY * n);
            b1.fma(e1z, b2.mul(e2z)).intoArray(d, j + ModeLanes.BZ * n);
        }
    }

    @Override
    public String name() {
        return "vector " + SPECIES.vectorBitSize() + "-bit";
    }
}
