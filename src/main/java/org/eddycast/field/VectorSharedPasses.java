package org.eddycast.field;

import static org.eddycast.field.VectorSinCos.MINUS_ONE;
import static org.eddycast.field.VectorSinCos.ROUNDER;
import static org.eddycast.field.VectorSinCos.TC0;
import static org.eddycast.field.VectorSinCos.TC1;
import static org.eddycast.field.VectorSinCos.TC2;
import static org.eddycast.field.VectorSinCos.TC3;
import static org.eddycast.field.VectorSinCos.TC4;
import static org.eddycast.field.VectorSinCos.TC5;
import static org.eddycast.field.VectorSinCos.TC6;
import static org.eddycast.field.VectorSinCos.TC7;
import static org.eddycast.field.VectorSinCos.TS0;
import static org.eddycast.field.VectorSinCos.TS1;
import static org.eddycast.field.VectorSinCos.TS2;
import static org.eddycast.field.VectorSinCos.TS3;
import static org.eddycast.field.VectorSinCos.TS4;
import static org.eddycast.field.VectorSinCos.TS5;
import static org.eddycast.field.VectorSinCos.TS6;

import jdk.incubator.vector.DoubleVector;
import jdk.incubator.vector.VectorSpecies;

/**
 * The vector passes over particles sharing one realization ({@link ShearModeField}, amplitudes carrying the
 * substep): points in the lanes, every shear of a step applied while the points' coordinates stay in
 * registers. Bundles of four vectors go through the shears in turn side by side, because one vector alone
 * would wait on each shear's result (about 70 cycles of dependent arithmetic) before starting the next; four
 * keep the arithmetic units busy. Shears applied at once do not wait on each other, so there one vector at a
 * time is enough. The phase is taken in turns with the field's wavevectors over 2 pi, which reduces by
 * rounding alone. Every loop is one flat method (see {@link VectorSinCos} for why and for the sine and
 * cosine).
 */
final class VectorSharedPasses {

    private static final VectorSpecies<Double> SPECIES = VectorSinCos.SPECIES;
    private static final int LANES = SPECIES.length();
    /** Points per bundle. */
    static final int BUNDLE = 4 * LANES;

    private VectorSharedPasses() {
    }

    /** Modes first, first + direction, ... up to but not including stop, in turn, for points i .. i + BUNDLE. */
    static void inTurnBundle(ShearModeField f, int first, int stop, int direction, double[] x, double[] y,
                             double[] z, int i) {
        DoubleVector x0 = DoubleVector.fromArray(SPECIES, x, i);
        DoubleVector x1 = DoubleVector.fromArray(SPECIES, x, i + LANES);
        DoubleVector x2 = DoubleVector.fromArray(SPECIES, x, i + 2 * LANES);
        DoubleVector x3 = DoubleVector.fromArray(SPECIES, x, i + 3 * LANES);
        DoubleVector y0 = DoubleVector.fromArray(SPECIES, y, i);
        DoubleVector y1 = DoubleVector.fromArray(SPECIES, y, i + LANES);
        DoubleVector y2 = DoubleVector.fromArray(SPECIES, y, i + 2 * LANES);
        DoubleVector y3 = DoubleVector.fromArray(SPECIES, y, i + 3 * LANES);
        DoubleVector z0 = DoubleVector.fromArray(SPECIES, z, i);
        DoubleVector z1 = DoubleVector.fromArray(SPECIES, z, i + LANES);
        DoubleVector z2 = DoubleVector.fromArray(SPECIES, z, i + 2 * LANES);
        DoubleVector z3 = DoubleVector.fromArray(SPECIES, z, i + 3 * LANES);
        double[] kx = f.turnKx;
        double[] ky = f.turnKy;
        double[] kz = f.turnKz;
        double[] ax = f.ax;
        double[] ay = f.ay;
        double[] az = f.az;
        double[] bx = f.bx;
        double[] by = f.by;
        double[] bz = f.bz;
        int count = (stop - first) * direction;
        for (int k = 0; k < count; k++) {
            int m = first + k * direction;
            DoubleVector kxm = DoubleVector.broadcast(SPECIES, kx[m]);
            DoubleVector kym = DoubleVector.broadcast(SPECIES, ky[m]);
            DoubleVector kzm = DoubleVector.broadcast(SPECIES, kz[m]);
            DoubleVector p0 = z0.fma(kzm, y0.fma(kym, x0.mul(kxm)));
            DoubleVector p1 = z1.fma(kzm, y1.fma(kym, x1.mul(kxm)));
            DoubleVector p2 = z2.fma(kzm, y2.fma(kym, x2.mul(kxm)));
            DoubleVector p3 = z3.fma(kzm, y3.fma(kym, x3.mul(kxm)));
            DoubleVector f0 = p0.sub(p0.add(ROUNDER).sub(ROUNDER));
            DoubleVector w0 = f0.mul(f0);
            DoubleVector sh0 = w0.fma(TS6, TS5).fma(w0, TS4).fma(w0, TS3).fma(w0, TS2).fma(w0, TS1).fma(w0, TS0)
                    .mul(f0);
            DoubleVector ch0 = w0.fma(TC7, TC6).fma(w0, TC5).fma(w0, TC4).fma(w0, TC3).fma(w0, TC2).fma(w0, TC1)
                    .fma(w0, TC0);
            DoubleVector s0 = sh0.mul(ch0);
            DoubleVector c0 = ch0.add(ch0).fma(ch0, MINUS_ONE);
            DoubleVector f1 = p1.sub(p1.add(ROUNDER).sub(ROUNDER));
            DoubleVector w1 = f1.mul(f1);
            DoubleVector sh1 = w1.fma(TS6, TS5).fma(w1, TS4).fma(w1, TS3).fma(w1, TS2).fma(w1, TS1).fma(w1, TS0)
                    .mul(f1);
            DoubleVector ch1 = w1.fma(TC7, TC6).fma(w1, TC5).fma(w1, TC4).fma(w1, TC3).fma(w1, TC2).fma(w1, TC1)
                    .fma(w1, TC0);
            DoubleVector s1 = sh1.mul(ch1);
            DoubleVector c1 = ch1.add(ch1).fma(ch1, MINUS_ONE);
            DoubleVector f2 = p2.sub(p2.add(ROUNDER).sub(ROUNDER));
            DoubleVector w2 = f2.mul(f2);
            DoubleVector sh2 = w2.fma(TS6, TS5).fma(w2, TS4).fma(w2, TS3).fma(w2, TS2).fma(w2, TS1).fma(w2, TS0)
                    .mul(f2);
            DoubleVector ch2 = w2.fma(TC7, TC6).fma(w2, TC5).fma(w2, TC4).fma(w2, TC3).fma(w2, TC2).fma(w2, TC1)
                    .fma(w2, TC0);
            DoubleVector s2 = sh2.mul(ch2);
            DoubleVector c2 = ch2.add(ch2).fma(ch2, MINUS_ONE);
            DoubleVector f3 = p3.sub(p3.add(ROUNDER).sub(ROUNDER));
            DoubleVector w3 = f3.mul(f3);
            DoubleVector sh3 = w3.fma(TS6, TS5).fma(w3, TS4).fma(w3, TS3).fma(w3, TS2).fma(w3, TS1).fma(w3, TS0)
                    .mul(f3);
            DoubleVector ch3 = w3.fma(TC7, TC6).fma(w3, TC5).fma(w3, TC4).fma(w3, TC3).fma(w3, TC2).fma(w3, TC1)
                    .fma(w3, TC0);
            DoubleVector s3 = sh3.mul(ch3);
            DoubleVector c3 = ch3.add(ch3).fma(ch3, MINUS_ONE);
            DoubleVector axm = DoubleVector.broadcast(SPECIES, ax[m]);
            DoubleVector bxm = DoubleVector.broadcast(SPECIES, bx[m]);
            x0 = axm.fma(c0, bxm.fma(s0, x0));
            x1 = axm.fma(c1, bxm.fma(s1, x1));
            x2 = axm.fma(c2, bxm.fma(s2, x2));
            x3 = axm.fma(c3, bxm.fma(s3, x3));
            DoubleVector aym = DoubleVector.broadcast(SPECIES, ay[m]);
            DoubleVector bym = DoubleVector.broadcast(SPECIES, by[m]);
            y0 = aym.fma(c0, bym.fma(s0, y0));
            y1 = aym.fma(c1, bym.fma(s1, y1));
            y2 = aym.fma(c2, bym.fma(s2, y2));
            y3 = aym.fma(c3, bym.fma(s3, y3));
            DoubleVector azm = DoubleVector.broadcast(SPECIES, az[m]);
            DoubleVector bzm = DoubleVector.broadcast(SPECIES, bz[m]);
            z0 = azm.fma(c0, bzm.fma(s0, z0));
            z1 = azm.fma(c1, bzm.fma(s1, z1));
            z2 = azm.fma(c2, bzm.fma(s2, z2));
            z3 = azm.fma(c3, bzm.fma(s3, z3));
        }
        x0.intoArray(x, i);
        x1.intoArray(x, i + LANES);
        x2.intoArray(x, i + 2 * LANES);
        x3.intoArray(x, i + 3 * LANES);
        y0.intoArray(y, i);
        y1.intoArray(y, i + LANES);
        y2.intoArray(y, i + 2 * LANES);
        y3.intoArray(y, i + 3 * LANES);
        z0.intoArray(z, i);
        z1.intoArray(z, i + LANES);
        z2.intoArray(z, i + 2 * LANES);
        z3.intoArray(z, i + 3 * LANES);
    }

    /** As {@link #inTurnBundle} for the points of one vector from i. */
    static void inTurnVector(ShearModeField f, int first, int stop, int direction, double[] x, double[] y,
                             double[] z, int i) {
        DoubleVector x0 = DoubleVector.fromArray(SPECIES, x, i);
        DoubleVector y0 = DoubleVector.fromArray(SPECIES, y, i);
        DoubleVector z0 = DoubleVector.fromArray(SPECIES, z, i);
        double[] kx = f.turnKx;
        double[] ky = f.turnKy;
        double[] kz = f.turnKz;
        double[] ax = f.ax;
        double[] ay = f.ay;
        double[] az = f.az;
        double[] bx = f.bx;
        double[] by = f.by;
        double[] bz = f.bz;
        int count = (stop - first) * direction;
        for (int k = 0; k < count; k++) {
            int m = first + k * direction;
            DoubleVector kxm = DoubleVector.broadcast(SPECIES, kx[m]);
            DoubleVector kym = DoubleVector.broadcast(SPECIES, ky[m]);
            DoubleVector kzm = DoubleVector.broadcast(SPECIES, kz[m]);
            DoubleVector p0 = z0.fma(kzm, y0.fma(kym, x0.mul(kxm)));
            DoubleVector f0 = p0.sub(p0.add(ROUNDER).sub(ROUNDER));
            DoubleVector w0 = f0.mul(f0);
            DoubleVector sh0 = w0.fma(TS6, TS5).fma(w0, TS4).fma(w0, TS3).fma(w0, TS2).fma(w0, TS1).fma(w0, TS0)
                    .mul(f0);
            DoubleVector ch0 = w0.fma(TC7, TC6).fma(w0, TC5).fma(w0, TC4).fma(w0, TC3).fma(w0, TC2).fma(w0, TC1)
                    .fma(w0, TC0);
            DoubleVector s0 = sh0.mul(ch0);
            DoubleVector c0 = ch0.add(ch0).fma(ch0, MINUS_ONE);
            DoubleVector axm = DoubleVector.broadcast(SPECIES, ax[m]);
            DoubleVector bxm = DoubleVector.broadcast(SPECIES, bx[m]);
            x0 = axm.fma(c0, bxm.fma(s0, x0));
            DoubleVector aym = DoubleVector.broadcast(SPECIES, ay[m]);
            DoubleVector bym = DoubleVector.broadcast(SPECIES, by[m]);
            y0 = aym.fma(c0, bym.fma(s0, y0));
            DoubleVector azm = DoubleVector.broadcast(SPECIES, az[m]);
            DoubleVector bzm = DoubleVector.broadcast(SPECIES, bz[m]);
            z0 = azm.fma(c0, bzm.fma(s0, z0));
        }
        x0.intoArray(x, i);
        y0.intoArray(y, i);
        z0.intoArray(z, i);
    }

    /** The sum of every mode at the starting point, added, for the points of one vector from i. */
    static void atOnceVector(ShearModeField f, double[] x, double[] y, double[] z, int i) {
        DoubleVector x0 = DoubleVector.fromArray(SPECIES, x, i);
        DoubleVector y0 = DoubleVector.fromArray(SPECIES, y, i);
        DoubleVector z0 = DoubleVector.fromArray(SPECIES, z, i);
        DoubleVector dx0 = DoubleVector.zero(SPECIES);
        DoubleVector dy0 = DoubleVector.zero(SPECIES);
        DoubleVector dz0 = DoubleVector.zero(SPECIES);
        double[] kx = f.turnKx;
        double[] ky = f.turnKy;
        double[] kz = f.turnKz;
        double[] ax = f.ax;
        double[] ay = f.ay;
        double[] az = f.az;
        double[] bx = f.bx;
        double[] by = f.by;
        double[] bz = f.bz;
        for (int m = 0; m < f.modes(); m++) {
            DoubleVector kxm = DoubleVector.broadcast(SPECIES, kx[m]);
            DoubleVector kym = DoubleVector.broadcast(SPECIES, ky[m]);
            DoubleVector kzm = DoubleVector.broadcast(SPECIES, kz[m]);
            DoubleVector p0 = z0.fma(kzm, y0.fma(kym, x0.mul(kxm)));
            DoubleVector f0 = p0.sub(p0.add(ROUNDER).sub(ROUNDER));
            DoubleVector w0 = f0.mul(f0);
            DoubleVector sh0 = w0.fma(TS6, TS5).fma(w0, TS4).fma(w0, TS3).fma(w0, TS2).fma(w0, TS1).fma(w0, TS0)
                    .mul(f0);
            DoubleVector ch0 = w0.fma(TC7, TC6).fma(w0, TC5).fma(w0, TC4).fma(w0, TC3).fma(w0, TC2).fma(w0, TC1)
                    .fma(w0, TC0);
            DoubleVector s0 = sh0.mul(ch0);
            DoubleVector c0 = ch0.add(ch0).fma(ch0, MINUS_ONE);
            DoubleVector axm = DoubleVector.broadcast(SPECIES, ax[m]);
            DoubleVector bxm = DoubleVector.broadcast(SPECIES, bx[m]);
            dx0 = axm.fma(c0, bxm.fma(s0, dx0));
            DoubleVector aym = DoubleVector.broadcast(SPECIES, ay[m]);
            DoubleVector bym = DoubleVector.broadcast(SPECIES, by[m]);
            dy0 = aym.fma(c0, bym.fma(s0, dy0));
            DoubleVector azm = DoubleVector.broadcast(SPECIES, az[m]);
            DoubleVector bzm = DoubleVector.broadcast(SPECIES, bz[m]);
            dz0 = azm.fma(c0, bzm.fma(s0, dz0));
        }
        x0.add(dx0).intoArray(x, i);
        y0.add(dy0).intoArray(y, i);
        z0.add(dz0).intoArray(z, i);
    }
}
