package org.eddycast.particles;

import jdk.incubator.vector.DoubleVector;
import jdk.incubator.vector.FloatVector;
import jdk.incubator.vector.IntVector;
import jdk.incubator.vector.LongVector;
import jdk.incubator.vector.VectorOperators;
import jdk.incubator.vector.VectorSpecies;
import org.eddycast.field.VectorSinCos;

/**
 * {@link NormalStream} on the Vector API: the generator lanes side by side in long lanes, each long read as two
 * int lanes (low half first), so a vector of floats holds twice as many word pairs as a vector of doubles; the
 * logarithm, square root, sine and cosine in float lanes, then widened to doubles. Lane by lane the same
 * operations in the same order as {@link ScalarNormalStream}, so the same bits at every vector length.
 *
 * <p>The logarithm follows the method of fdlibm's logf (Sun Microsystems 1993): u = 2^k m with m in
 * [sqrt(1/2), sqrt(2)) found by integer arithmetic on the bit pattern; ln m = 2 atanh(s) with
 * s = (m - 1) / (m + 1), written 2 s G(s^2); then ln u = k ln 2 + ln m with ln 2 in two parts.
 *
 * <p>Needs the module jdk.incubator.vector and a vector length that divides {@value NormalStream#LANES}.
 */
public final class VectorNormalStream extends NormalStream {

    private static final VectorSpecies<Double> DOUBLES = VectorSinCos.SPECIES;
    private static final VectorSpecies<Long> LONGS = VectorSinCos.LONGS;
    private static final VectorSpecies<Integer> INTS = DOUBLES.withLanes(int.class);
    private static final VectorSpecies<Float> FLOATS = DOUBLES.withLanes(float.class);
    private static final FloatVector TWO_F = FloatVector.broadcast(FLOATS, TWO);
    private static final FloatVector ONE_F = FloatVector.broadcast(FLOATS, ONE);
    private static final FloatVector MINUS_TWO_F = FloatVector.broadcast(FLOATS, MINUS_TWO);
    private static final FloatVector THREE_HALVES_F = FloatVector.broadcast(FLOATS, THREE_HALVES);
    private static final FloatVector ROUNDER_F = FloatVector.broadcast(FLOATS, ROUNDER);
    private static final FloatVector LN2_HI_F = FloatVector.broadcast(FLOATS, LN2_HI);
    private static final FloatVector LN2_LO_F = FloatVector.broadcast(FLOATS, LN2_LO);
    private static final FloatVector G0 = FloatVector.broadcast(FLOATS, LOG_G[0]);
    private static final FloatVector G1 = FloatVector.broadcast(FLOATS, LOG_G[1]);
    private static final FloatVector G2 = FloatVector.broadcast(FLOATS, LOG_G[2]);
    private static final FloatVector G3 = FloatVector.broadcast(FLOATS, LOG_G[3]);
    private static final FloatVector S0 = FloatVector.broadcast(FLOATS, SINE_HALF_TURN[0]);
    private static final FloatVector S1 = FloatVector.broadcast(FLOATS, SINE_HALF_TURN[1]);
    private static final FloatVector S2 = FloatVector.broadcast(FLOATS, SINE_HALF_TURN[2]);
    private static final FloatVector S3 = FloatVector.broadcast(FLOATS, SINE_HALF_TURN[3]);
    private static final FloatVector S4 = FloatVector.broadcast(FLOATS, SINE_HALF_TURN[4]);
    private static final FloatVector C0 = FloatVector.broadcast(FLOATS, COSINE_HALF_TURN[0]);
    private static final FloatVector C1 = FloatVector.broadcast(FLOATS, COSINE_HALF_TURN[1]);
    private static final FloatVector C2 = FloatVector.broadcast(FLOATS, COSINE_HALF_TURN[2]);
    private static final FloatVector C3 = FloatVector.broadcast(FLOATS, COSINE_HALF_TURN[3]);
    private static final FloatVector C4 = FloatVector.broadcast(FLOATS, COSINE_HALF_TURN[4]);
    private static final FloatVector C5 = FloatVector.broadcast(FLOATS, COSINE_HALF_TURN[5]);

    /** True when this machine's vectors fit the generator's lanes. */
    public static boolean fits() {
        return LONGS.length() == DOUBLES.length() && LANES % LONGS.length() == 0;
    }

    @Override
    public void fill(double[] out, int count) {
        checkCount(count);
        for (int l = 0; l < LANES; l += LONGS.length()) {
            fillLanes(out, count, l);
        }
    }

    /** Generator lanes l .. l + vector length, every run; one flat loop (see VectorSinCos for why). */
    private void fillLanes(double[] out, int count, int l) {
        int half = DOUBLES.length();
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
            IntVector a = (IntVector) z1.reinterpretShape(INTS, 0);
            IntVector b = (IntVector) z2.reinterpretShape(INTS, 0);
            FloatVector u = TWO_F.sub((FloatVector) a.lanewise(VectorOperators.LSHR, MANTISSA_SHIFT).or(ONE_BITS)
                    .reinterpretShape(FLOATS, 0));
            FloatVector w = ((FloatVector) b.lanewise(VectorOperators.LSHR, MANTISSA_SHIFT).or(ONE_BITS)
                    .reinterpretShape(FLOATS, 0)).sub(THREE_HALVES_F);
            // ln u = k ln 2 + 2 s G(s^2)
            IntVector bits = (IntVector) u.reinterpretShape(INTS, 0);
            IntVector split = bits.sub(SQRT_HALF_BITS);
            FloatVector m = (FloatVector) bits.sub(split.and(EXPONENT_BITS)).reinterpretShape(FLOATS, 0);
            FloatVector k = ((FloatVector) split.lanewise(VectorOperators.ASHR, 23).add(ROUNDER_BITS)
                    .reinterpretShape(FLOATS, 0)).sub(ROUNDER_F);
            FloatVector t = m.sub(ONE_F);
            FloatVector s = t.div(t.add(TWO_F));
            FloatVector z = s.mul(s);
            FloatVector g = z.fma(G3, G2).fma(z, G1).fma(z, G0);
            FloatVector ln = k.fma(LN2_HI_F, s.add(s).fma(g, k.mul(LN2_LO_F)));
            IntVector radiusBits = (IntVector) ln.mul(MINUS_TWO_F).lanewise(VectorOperators.SQRT)
                    .reinterpretShape(INTS, 0);
            FloatVector radius = (FloatVector) radiusBits.lanewise(VectorOperators.XOR,
                    b.lanewise(VectorOperators.LSHL, 31)).reinterpretShape(FLOATS, 0);
            FloatVector w2 = w.mul(w);
            FloatVector sin = w2.fma(S4, S3).fma(w2, S2).fma(w2, S1).fma(w2, S0).mul(w);
            FloatVector cos = w2.fma(C5, C4).fma(w2, C3).fma(w2, C2).fma(w2, C1).fma(w2, C0);
            FloatVector x = radius.mul(cos);
            FloatVector y = radius.mul(sin);
            int at = base + 2 * l;
            ((DoubleVector) x.convertShape(VectorOperators.F2D, DOUBLES, 0)).intoArray(out, at);
            ((DoubleVector) x.convertShape(VectorOperators.F2D, DOUBLES, 1)).intoArray(out, at + half);
            ((DoubleVector) y.convertShape(VectorOperators.F2D, DOUBLES, 0)).intoArray(out, at + WORDS);
            ((DoubleVector) y.convertShape(VectorOperators.F2D, DOUBLES, 1)).intoArray(out, at + WORDS + half);
        }
        state.intoArray(this.state, l);
    }
}
