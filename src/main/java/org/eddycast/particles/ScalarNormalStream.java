package org.eddycast.particles;

import org.eddycast.field.FastSinCos;

/**
 * {@link NormalStream} in plain scalar code, lane after lane, with the JDK's logarithm and the polynomial sine
 * and cosine of {@link FastSinCos} (the angle needs no reduction).
 */
public final class ScalarNormalStream extends NormalStream {

    @Override
    public void fill(double[] out, int count) {
        if (count % RUN != 0) {
            throw new IllegalArgumentException("count must be a multiple of " + RUN + "; got " + count);
        }
        for (int base = 0; base < count; base += RUN) {
            for (int l = 0; l < LANES; l++) {
                long s1 = state[l] + GAMMA;
                long s2 = s1 + GAMMA;
                state[l] = s2;
                long z1 = mix(s1);
                long z2 = mix(s2);
                double u = 2.0 - Double.longBitsToDouble((z1 >>> 12) | ONE_BITS);
                double theta = Math.fma(Double.longBitsToDouble((z2 >>> 12) | ONE_BITS), PI, MINUS_THREE_HALVES_PI);
                double r = Math.sqrt(-2.0 * Math.log(u));
                if ((z2 & 1L) != 0) {
                    r = -r;
                }
                out[base + l] = r * FastSinCos.cosOfReduced(theta);
                out[base + LANES + l] = r * FastSinCos.sinOfReduced(theta);
            }
        }
    }
}
