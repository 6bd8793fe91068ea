package org.eddycast.particles;

import jdk.incubator.vector.DoubleVector;
import jdk.incubator.vector.LongVector;
import jdk.incubator.vector.VectorOperators;
import jdk.incubator.vector.VectorSpecies;
import org.eddycast.field.VectorSinCos;

/**
 * {@link NormalStream} on the Vector API: the generator lanes side by side in vector lanes, the logarithm by
 * the Vector API's own lanewise LOG, sine and cosine by {@link VectorSinCos}. Needs the module
 * jdk.incubator.vector and a vector length that divides {@value NormalStream#LANES}.
 */
public final class VectorNormalStream extends NormalStream {

    private static final VectorSpecies<Long> LONGS = LongVector.SPECIES_PREFERRED;
    private static final VectorSpecies<Double> DOUBLES = DoubleVector.SPECIES_PREFERRED;
    private static final DoubleVector TWO_PI = DoubleVector.broadcast(DOUBLES, 2 * Math.PI);
    private static final DoubleVector TWO = DoubleVector.broadcast(DOUBLES, 2.0);
    private static final DoubleVector MINUS_TWO = DoubleVector.broadcast(DOUBLES, -2.0);

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
        LongVector s = LongVector.fromArray(LONGS, state, l);
        for (int base = 0; base < count; base += RUN) {
            LongVector s1 = s.add(GAMMA);
            s = s1.add(GAMMA);
            LongVector z1 = s1.lanewise(VectorOperators.XOR, s1.lanewise(VectorOperators.LSHR, 30))
                    .mul(0xBF58476D1CE4E5B9L);
            z1 = z1.lanewise(VectorOperators.XOR, z1.lanewise(VectorOperators.LSHR, 27)).mul(0x94D049BB133111EBL);
            z1 = z1.lanewise(VectorOperators.XOR, z1.lanewise(VectorOperators.LSHR, 31));
            LongVector z2 = s.lanewise(VectorOperators.XOR, s.lanewise(VectorOperators.LSHR, 30))
                    .mul(0xBF58476D1CE4E5B9L);
            z2 = z2.lanewise(VectorOperators.XOR, z2.lanewise(VectorOperators.LSHR, 27)).mul(0x94D049BB133111EBL);
            z2 = z2.lanewise(VectorOperators.XOR, z2.lanewise(VectorOperators.LSHR, 31));
            DoubleVector u1 = TWO.sub(z1.lanewise(VectorOperators.LSHR, 12).or(ONE_BITS).reinterpretAsDoubles());
            DoubleVector u2 = z2.lanewise(VectorOperators.LSHR, 12).or(ONE_BITS).reinterpretAsDoubles()
                    .sub(VectorSinCos.ONE);
            DoubleVector radius = u1.lanewise(VectorOperators.LOG).mul(MINUS_TWO).lanewise(VectorOperators.SQRT);
            DoubleVector phase = u2.mul(TWO_PI);
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
            DoubleVector sin = sb.lanewise(VectorOperators.XOR, swap)
                    .lanewise(VectorOperators.XOR, q.and(2L).lanewise(VectorOperators.LSHL, 62))
                    .reinterpretAsDoubles();
            DoubleVector cos = cb.lanewise(VectorOperators.XOR, swap)
                    .lanewise(VectorOperators.XOR, q.add(1L).and(2L).lanewise(VectorOperators.LSHL, 62))
                    .reinterpretAsDoubles();
            radius.mul(cos).intoArray(out, base + l);
            radius.mul(sin).intoArray(out, base + LANES + l);
        }
        s.intoArray(state, l);
    }
}
