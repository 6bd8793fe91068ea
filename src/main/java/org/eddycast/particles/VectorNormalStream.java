package org.eddycast.particles;

import static org.eddycast.field.VectorSinCos.C0;
import static org.eddycast.field.VectorSinCos.C1;
import static org.eddycast.field.VectorSinCos.C2;
import static org.eddycast.field.VectorSinCos.C3;
import static org.eddycast.field.VectorSinCos.C4;
import static org.eddycast.field.VectorSinCos.C5;
import static org.eddycast.field.VectorSinCos.C6;
import static org.eddycast.field.VectorSinCos.C7;
import static org.eddycast.field.VectorSinCos.ONE;
import static org.eddycast.field.VectorSinCos.ROUNDER;
import static org.eddycast.field.VectorSinCos.S0;
import static org.eddycast.field.VectorSinCos.S1;
import static org.eddycast.field.VectorSinCos.S2;
import static org.eddycast.field.VectorSinCos.S3;
import static org.eddycast.field.VectorSinCos.S4;
import static org.eddycast.field.VectorSinCos.S5;
import static org.eddycast.field.VectorSinCos.S6;

import jdk.incubator.vector.DoubleVector;
import jdk.incubator.vector.LongVector;
import jdk.incubator.vector.VectorOperators;
import jdk.incubator.vector.VectorSpecies;
import org.eddycast.field.VectorSinCos;

/**
 * {@link NormalStream} on the Vector API: the generator lanes side by side in vector lanes, the sine and cosine
 * of the angle (already in [-pi/2, pi/2)) by the polynomials of {@link org.eddycast.field.VectorSinCos}, and
 * the logarithm by a polynomial of our own, which is several times cheaper than the Vector API's lanewise LOG.
 *
 * <p>The logarithm (the method of fdlibm's log, Sun Microsystems 1993): u = 2^k m with m in [sqrt(1/2),
 * sqrt(2)), found by integer arithmetic on the bit pattern; ln m = 2 atanh(s) with s = (m - 1) / (m + 1),
 * |s| &lt;= 0.1716, written 2 s G(s^2) with G of degree 5 from a Chebyshev interpolation of atanh(s)/s
 * (Trefethen 2013, Approximation Theory and Approximation Practice, SIAM; error below 1e-14); then
 * ln u = k ln 2 + ln m with ln 2 in two parts. Within 4e-14 relative of {@link Math#log} (tested through the
 * variates).
 *
 * <p>Needs the module jdk.incubator.vector and a vector length that divides {@value NormalStream#LANES}.
 */
public final class VectorNormalStream extends NormalStream {

    private static final VectorSpecies<Double> DOUBLES = VectorSinCos.SPECIES;
    private static final VectorSpecies<Long> LONGS = VectorSinCos.LONGS;
    private static final DoubleVector TWO = DoubleVector.broadcast(DOUBLES, 2.0);
    private static final DoubleVector MINUS_TWO = DoubleVector.broadcast(DOUBLES, -2.0);
    private static final DoubleVector ANGLE_SCALE = DoubleVector.broadcast(DOUBLES, PI);
    private static final DoubleVector ANGLE_SHIFT = DoubleVector.broadcast(DOUBLES, MINUS_THREE_HALVES_PI);
    /** Bit pattern of sqrt(1/2): subtracting it splits u into 2^k and m in [sqrt(1/2), sqrt(2)). */
    private static final long SQRT_HALF_BITS = 0x3FE6A09E667F3BCDL;
    private static final long EXPONENT_BITS = 0xFFF0000000000000L;
    /** Bit pattern of 1.5 * 2^52: a small integer k added to it reads as the double 1.5 * 2^52 + k. */
    private static final long ROUNDER_BITS = 0x4338000000000000L;
    private static final DoubleVector LN2_HI = DoubleVector.broadcast(DOUBLES, 6.93147180369123816490e-01);
    private static final DoubleVector LN2_LO = DoubleVector.broadcast(DOUBLES, 1.90821492927058770002e-10);
    private static final DoubleVector G0 = DoubleVector.broadcast(DOUBLES, 0.9999999999999736);
    private static final DoubleVector G1 = DoubleVector.broadcast(DOUBLES, 0.3333333333978963);
    private static final DoubleVector G2 = DoubleVector.broadcast(DOUBLES, 0.1999999744591619);
    private static final DoubleVector G3 = DoubleVector.broadcast(DOUBLES, 0.14286083072937864);
    private static final DoubleVector G4 = DoubleVector.broadcast(DOUBLES, 0.11087124955038745);
    private static final DoubleVector G5 = DoubleVector.broadcast(DOUBLES, 0.09804047819876527);

    /** True when this machine's vectors fit the generator's lanes. */
    public static boolean fits() {
        return LONGS.length() == DOUBLES.length() && LANES % LONGS.length() == 0;
    }

    @Override
    public void fill(double[] out, int count) {
        if (count % RUN != 0) {
            throw new IllegalArgumentException("count must be a multiple of " + RUN + "; got " + count);
        }
        for (int l = 0; l < LANES; l += LONGS.length()) {
            fillLanes(out, count, l);
        }
    }

    /** Generator lanes l .. l + vector length, every run; one flat loop (see VectorSinCos for why). */
    private void fillLanes(double[] out, int count, int l) {
        LongVector state = LongVector.fromArray(LONGS, this.state, l);
        for (int base = 0; base < count; base += RUN) {
            LongVector s1 = state.add(GAMMA);
            state = s1.add(GAMMA);
            LongVector z1 = s1.lanewise(VectorOperators.XOR, s1.lanewise(VectorOperators.LSHR, 30))
                    .mul(0xBF58476D1CE4E5B9L);
            z1 = z1.lanewise(VectorOperators.XOR, z1.lanewise(VectorOperators.LSHR, 27)).mul(0x94D049BB133111EBL);
            z1 = z1.lanewise(VectorOperators.XOR, z1.lanewise(VectorOperators.LSHR, 31));
            LongVector z2 = state.lanewise(VectorOperators.XOR, state.lanewise(VectorOperators.LSHR, 30))
                    .mul(0xBF58476D1CE4E5B9L);
            z2 = z2.lanewise(VectorOperators.XOR, z2.lanewise(VectorOperators.LSHR, 27)).mul(0x94D049BB133111EBL);
            z2 = z2.lanewise(VectorOperators.XOR, z2.lanewise(VectorOperators.LSHR, 31));
            DoubleVector u = TWO.sub((DoubleVector) z1.lanewise(VectorOperators.LSHR, 12).or(ONE_BITS)
                    .reinterpretShape(DOUBLES, 0));
            DoubleVector theta = ((DoubleVector) z2.lanewise(VectorOperators.LSHR, 12).or(ONE_BITS)
                    .reinterpretShape(DOUBLES, 0)).fma(ANGLE_SCALE, ANGLE_SHIFT);
            // ln u = k ln 2 + 2 s G(s^2)
            LongVector bits = (LongVector) u.reinterpretShape(LONGS, 0);
            LongVector split = bits.sub(SQRT_HALF_BITS);
            DoubleVector m = (DoubleVector) bits.sub(split.and(EXPONENT_BITS)).reinterpretShape(DOUBLES, 0);
            DoubleVector k = ((DoubleVector) split.lanewise(VectorOperators.ASHR, 52).add(ROUNDER_BITS)
                    .reinterpretShape(DOUBLES, 0)).sub(ROUNDER);
            DoubleVector t = m.sub(ONE);
            DoubleVector s = t.div(t.add(TWO));
            DoubleVector z = s.mul(s);
            DoubleVector g = z.fma(G5, G4).fma(z, G3).fma(z, G2).fma(z, G1).fma(z, G0);
            DoubleVector ln = k.fma(LN2_HI, s.add(s).fma(g, k.mul(LN2_LO)));
            LongVector radiusBits = (LongVector) ln.mul(MINUS_TWO).lanewise(VectorOperators.SQRT)
                    .reinterpretShape(LONGS, 0);
            DoubleVector radius = (DoubleVector) radiusBits.lanewise(VectorOperators.XOR,
                    z2.lanewise(VectorOperators.LSHL, 63)).reinterpretShape(DOUBLES, 0);
            DoubleVector w = theta.mul(theta);
            DoubleVector sin = w.fma(S6, S5).fma(w, S4).fma(w, S3).fma(w, S2).fma(w, S1).fma(w, S0).mul(theta);
            DoubleVector cos = w.fma(C7, C6).fma(w, C5).fma(w, C4).fma(w, C3).fma(w, C2).fma(w, C1).fma(w, C0);
            radius.mul(cos).intoArray(out, base + l);
            radius.mul(sin).intoArray(out, base + LANES + l);
        }
        state.intoArray(this.state, l);
    }
}
