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
import static org.eddycast.field.VectorSinCos.C0;
import static org.eddycast.field.VectorSinCos.C1;
import static org.eddycast.field.VectorSinCos.C2;
import static org.eddycast.field.VectorSinCos.C3;
import static org.eddycast.field.VectorSinCos.C4;
import static org.eddycast.field.VectorSinCos.C5;
import static org.eddycast.field.VectorSinCos.C6;
import static org.eddycast.field.VectorSinCos.C7;
import static org.eddycast.field.VectorSinCos.MINUS_PI_HI;
import static org.eddycast.field.VectorSinCos.MINUS_PI_LO;
import static org.eddycast.field.VectorSinCos.HALF;
import static org.eddycast.field.VectorSinCos.MINUS_ONE;
import static org.eddycast.field.VectorSinCos.ONE_OVER_TWO_PI;
import static org.eddycast.field.VectorSinCos.ROUNDER;
import static org.eddycast.field.VectorSinCos.S0;
import static org.eddycast.field.VectorSinCos.S1;
import static org.eddycast.field.VectorSinCos.S2;
import static org.eddycast.field.VectorSinCos.S3;
import static org.eddycast.field.VectorSinCos.S4;
import static org.eddycast.field.VectorSinCos.S5;
import static org.eddycast.field.VectorSinCos.S6;

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
        for (int m = first; m != stop; m += direction) {
            int o = m * ModeLanes.FIELDS * width + i;
            DoubleVector p0 = z0.fma(DoubleVector.fromArray(SPECIES, d, o + KZ * width),
                    y0.fma(DoubleVector.fromArray(SPECIES, d, o + KY * width),
                    x0.mul(DoubleVector.fromArray(SPECIES, d, o + KX * width))));
            DoubleVector p1 = z1.fma(DoubleVector.fromArray(SPECIES, d, o + LANES + KZ * width),
                    y1.fma(DoubleVector.fromArray(SPECIES, d, o + LANES + KY * width),
                    x1.mul(DoubleVector.fromArray(SPECIES, d, o + LANES + KX * width))));
            DoubleVector t0 = p0.fma(ONE_OVER_TWO_PI, ROUNDER).sub(ROUNDER);
            DoubleVector h0 = t0.fma(MINUS_PI_LO, t0.fma(MINUS_PI_HI, p0.mul(HALF)));
            DoubleVector w0 = h0.mul(h0);
            DoubleVector sh0 = w0.fma(S6, S5).fma(w0, S4).fma(w0, S3).fma(w0, S2).fma(w0, S1).fma(w0, S0).mul(h0);
            DoubleVector ch0 = w0.fma(C7, C6).fma(w0, C5).fma(w0, C4).fma(w0, C3).fma(w0, C2).fma(w0, C1).fma(w0, C0);
            DoubleVector s0 = sh0.add(sh0).mul(ch0);
            DoubleVector c0 = ch0.add(ch0).fma(ch0, MINUS_ONE);
            DoubleVector t1 = p1.fma(ONE_OVER_TWO_PI, ROUNDER).sub(ROUNDER);
            DoubleVector h1 = t1.fma(MINUS_PI_LO, t1.fma(MINUS_PI_HI, p1.mul(HALF)));
            DoubleVector w1 = h1.mul(h1);
            DoubleVector sh1 = w1.fma(S6, S5).fma(w1, S4).fma(w1, S3).fma(w1, S2).fma(w1, S1).fma(w1, S0).mul(h1);
            DoubleVector ch1 = w1.fma(C7, C6).fma(w1, C5).fma(w1, C4).fma(w1, C3).fma(w1, C2).fma(w1, C1).fma(w1, C0);
            DoubleVector s1 = sh1.add(sh1).mul(ch1);
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
        for (int o = i; o < end; o += ModeLanes.FIELDS * width) {
            DoubleVector p0 = z0.fma(DoubleVector.fromArray(SPECIES, d, o + KZ * width),
                    y0.fma(DoubleVector.fromArray(SPECIES, d, o + KY * width),
                    x0.mul(DoubleVector.fromArray(SPECIES, d, o + KX * width))));
            DoubleVector t0 = p0.fma(ONE_OVER_TWO_PI, ROUNDER).sub(ROUNDER);
            DoubleVector h0 = t0.fma(MINUS_PI_LO, t0.fma(MINUS_PI_HI, p0.mul(HALF)));
            DoubleVector w0 = h0.mul(h0);
            DoubleVector sh0 = w0.fma(S6, S5).fma(w0, S4).fma(w0, S3).fma(w0, S2).fma(w0, S1).fma(w0, S0).mul(h0);
            DoubleVector ch0 = w0.fma(C7, C6).fma(w0, C5).fma(w0, C4).fma(w0, C3).fma(w0, C2).fma(w0, C1).fma(w0, C0);
            DoubleVector s0 = sh0.add(sh0).mul(ch0);
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
