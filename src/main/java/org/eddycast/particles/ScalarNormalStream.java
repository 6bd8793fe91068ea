package org.eddycast.particles;

import org.eddycast.field.FastSinCos;

/** {@link NormalStream} in plain scalar code, lane after lane. */
public final class ScalarNormalStream extends NormalStream {

    private static final double TWO_PI = 2 * Math.PI;

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
                double u1 = 2.0 - Double.longBitsToDouble((mix(s1) >>> 12) | ONE_BITS);
                double u2 = Double.longBitsToDouble((mix(s2) >>> 12) | ONE_BITS) - 1.0;
                double r = Math.sqrt(-2.0 * Math.log(u1));
                double theta = TWO_PI * u2;
                out[base + l] = r * FastSinCos.cos(theta);
                out[base + LANES + l] = r * FastSinCos.sin(theta);
            }
        }
    }
}
