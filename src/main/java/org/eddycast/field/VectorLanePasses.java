package org.eddycast.field;

import static org.eddycast.field.ModeLanes.ALPHA1;
import static org.eddycast.field.ModeLanes.ALPHA2;
import static org.eddycast.field.ModeLanes.BETA1;
import static org.eddycast.field.ModeLanes.BETA2;
import static org.eddycast.field.ModeLanes.E1X;
import static org.eddycast.field.ModeLanes.E1Y;
import static org.eddycast.field.ModeLanes.E1Z;
import static org.eddycast.field.ModeLanes.E2X;
import static org.eddycast.field.ModeLanes.E2Y;
import static org.eddycast.field.ModeLanes.E2Z;
import static org.eddycast.field.ModeLanes.KX;
import static org.eddycast.field.ModeLanes.KY;
import static org.eddycast.field.ModeLanes.KZ;
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
 * The vector passes over particles that each carry their own realization ({@link ModeLanes}, particle i in
 * lane i): as {@link VectorSharedPasses}, with each lane's wavevector, coefficients and (scaled) basis read
 * from the lane layout instead of broadcast; the displacement is formed as u1 e1 + u2 e2 with
 * u1 = alpha1 cos + beta1 sin and u2 = alpha2 cos + beta2 sin. Bundles of two vectors in turn (each vector's
 * loads make the loop long enough to hide the latency with two), one vector at once; the lane count must be a
 * whole number of bundles.
 */
final class VectorLanePasses {

    private static final VectorSpecies<Double> SPECIES = VectorSinCos.SPECIES;
    private static final int LANES = SPECIES.length();
    /** Lanes per bundle. */
    static final int BUNDLE = 2 * LANES;

    private VectorLanePasses() {
    }

    /**
     * Modes first, first + direction, ... up to but not including stop, in turn, for the particles in lanes
     * i .. i + BUNDLE.
     */
    static void inTurnBundle(double[] d, int width, int first, int stop, int direction, double[] x, double[] y,
                             double[] z, int i) {
        DoubleVector x0 = DoubleVector.fromArray(SPECIES, x, i);
        DoubleVector x1 = DoubleVector.fromArray(SPECIES, x, i + LANES);
        DoubleVector y0 = DoubleVector.fromArray(SPECIES, y, i);
        DoubleVector y1 = DoubleVector.fromArray(SPECIES, y, i + LANES);
        DoubleVector z0 = DoubleVector.fromArray(SPECIES, z, i);
        DoubleVector z1 = DoubleVector.fromArray(SPECIES, z, i + LANES);
        int count = (stop - first) * direction;
        int record = direction * ModeLanes.FIELDS * width;
        for (int k = 0; k < count; k++) {
            int o = first * ModeLanes.FIELDS * width + i + k * record;
            DoubleVector p0 = z0.fma(DoubleVector.fromArray(SPECIES, d, o + KZ * width),
                    y0.fma(DoubleVector.fromArray(SPECIES, d, o + KY * width),
                    x0.mul(DoubleVector.fromArray(SPECIES, d, o + KX * width))));
            DoubleVector p1 = z1.fma(DoubleVector.fromArray(SPECIES, d, o + LANES + KZ * width),
                    y1.fma(DoubleVector.fromArray(SPECIES, d, o + LANES + KY * width),
                    x1.mul(DoubleVector.fromArray(SPECIES, d, o + LANES + KX * width))));
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
            DoubleVector u10 = DoubleVector.fromArray(SPECIES, d, o + ALPHA1 * width).fma(c0,
                    DoubleVector.fromArray(SPECIES, d, o + BETA1 * width).mul(s0));
            DoubleVector u20 = DoubleVector.fromArray(SPECIES, d, o + ALPHA2 * width).fma(c0,
                    DoubleVector.fromArray(SPECIES, d, o + BETA2 * width).mul(s0));
            DoubleVector u11 = DoubleVector.fromArray(SPECIES, d, o + LANES + ALPHA1 * width).fma(c1,
                    DoubleVector.fromArray(SPECIES, d, o + LANES + BETA1 * width).mul(s1));
            DoubleVector u21 = DoubleVector.fromArray(SPECIES, d, o + LANES + ALPHA2 * width).fma(c1,
                    DoubleVector.fromArray(SPECIES, d, o + LANES + BETA2 * width).mul(s1));
            x0 = DoubleVector.fromArray(SPECIES, d, o + E1X * width).fma(u10,
                    DoubleVector.fromArray(SPECIES, d, o + E2X * width).fma(u20, x0));
            x1 = DoubleVector.fromArray(SPECIES, d, o + LANES + E1X * width).fma(u11,
                    DoubleVector.fromArray(SPECIES, d, o + LANES + E2X * width).fma(u21, x1));
            y0 = DoubleVector.fromArray(SPECIES, d, o + E1Y * width).fma(u10,
                    DoubleVector.fromArray(SPECIES, d, o + E2Y * width).fma(u20, y0));
            y1 = DoubleVector.fromArray(SPECIES, d, o + LANES + E1Y * width).fma(u11,
                    DoubleVector.fromArray(SPECIES, d, o + LANES + E2Y * width).fma(u21, y1));
            z0 = DoubleVector.fromArray(SPECIES, d, o + E1Z * width).fma(u10,
                    DoubleVector.fromArray(SPECIES, d, o + E2Z * width).fma(u20, z0));
            z1 = DoubleVector.fromArray(SPECIES, d, o + LANES + E1Z * width).fma(u11,
                    DoubleVector.fromArray(SPECIES, d, o + LANES + E2Z * width).fma(u21, z1));
        }
        x0.intoArray(x, i);
        x1.intoArray(x, i + LANES);
        y0.intoArray(y, i);
        y1.intoArray(y, i + LANES);
        z0.intoArray(z, i);
        z1.intoArray(z, i + LANES);
    }

    /** The sum of modes 0 .. end / (FIELDS * width) at the starting point, added, for the lanes of one vector. */
    static void atOnceVector(double[] d, int width, int end, double[] x, double[] y, double[] z, int i) {
        DoubleVector x0 = DoubleVector.fromArray(SPECIES, x, i);
        DoubleVector y0 = DoubleVector.fromArray(SPECIES, y, i);
        DoubleVector z0 = DoubleVector.fromArray(SPECIES, z, i);
        DoubleVector dx0 = DoubleVector.zero(SPECIES);
        DoubleVector dy0 = DoubleVector.zero(SPECIES);
        DoubleVector dz0 = DoubleVector.zero(SPECIES);
        int record = ModeLanes.FIELDS * width;
        int modes = end / record;
        for (int m = 0; m < modes; m++) {
            int o = i + m * record;
            DoubleVector p0 = z0.fma(DoubleVector.fromArray(SPECIES, d, o + KZ * width),
                    y0.fma(DoubleVector.fromArray(SPECIES, d, o + KY * width),
                    x0.mul(DoubleVector.fromArray(SPECIES, d, o + KX * width))));
            DoubleVector f0 = p0.sub(p0.add(ROUNDER).sub(ROUNDER));
            DoubleVector w0 = f0.mul(f0);
            DoubleVector sh0 = w0.fma(TS6, TS5).fma(w0, TS4).fma(w0, TS3).fma(w0, TS2).fma(w0, TS1).fma(w0, TS0)
                    .mul(f0);
            DoubleVector ch0 = w0.fma(TC7, TC6).fma(w0, TC5).fma(w0, TC4).fma(w0, TC3).fma(w0, TC2).fma(w0, TC1)
                    .fma(w0, TC0);
            DoubleVector s0 = sh0.mul(ch0);
            DoubleVector c0 = ch0.add(ch0).fma(ch0, MINUS_ONE);
            DoubleVector u10 = DoubleVector.fromArray(SPECIES, d, o + ALPHA1 * width).fma(c0,
                    DoubleVector.fromArray(SPECIES, d, o + BETA1 * width).mul(s0));
            DoubleVector u20 = DoubleVector.fromArray(SPECIES, d, o + ALPHA2 * width).fma(c0,
                    DoubleVector.fromArray(SPECIES, d, o + BETA2 * width).mul(s0));
            dx0 = DoubleVector.fromArray(SPECIES, d, o + E1X * width).fma(u10,
                    DoubleVector.fromArray(SPECIES, d, o + E2X * width).fma(u20, dx0));
            dy0 = DoubleVector.fromArray(SPECIES, d, o + E1Y * width).fma(u10,
                    DoubleVector.fromArray(SPECIES, d, o + E2Y * width).fma(u20, dy0));
            dz0 = DoubleVector.fromArray(SPECIES, d, o + E1Z * width).fma(u10,
                    DoubleVector.fromArray(SPECIES, d, o + E2Z * width).fma(u20, dz0));
        }
        x0.add(dx0).intoArray(x, i);
        y0.add(dy0).intoArray(y, i);
        z0.add(dz0).intoArray(z, i);
    }
}
