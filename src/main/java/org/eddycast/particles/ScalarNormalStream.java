package org.eddycast.particles;

/**
 * {@link NormalStream} in plain scalar code, lane after lane and word after word: the twin of
 * {@link VectorNormalStream}, the same float operations in the same order, so the same bits. It is also the
 * written-out statement of the method: change the two together.
 */
public final class ScalarNormalStream extends NormalStream {

    private static final float G0 = LOG_G[0];
    private static final float G1 = LOG_G[1];
    private static final float G2 = LOG_G[2];
    private static final float G3 = LOG_G[3];
    private static final float S0 = SINE_HALF_TURN[0];
    private static final float S1 = SINE_HALF_TURN[1];
    private static final float S2 = SINE_HALF_TURN[2];
    private static final float S3 = SINE_HALF_TURN[3];
    private static final float S4 = SINE_HALF_TURN[4];
    private static final float C0 = COSINE_HALF_TURN[0];
    private static final float C1 = COSINE_HALF_TURN[1];
    private static final float C2 = COSINE_HALF_TURN[2];
    private static final float C3 = COSINE_HALF_TURN[3];
    private static final float C4 = COSINE_HALF_TURN[4];
    private static final float C5 = COSINE_HALF_TURN[5];

    @Override
    public void fill(double[] out, int count) {
        checkCount(count);
        for (int base = 0; base < count; base += RUN) {
            for (int l = 0; l < LANES; l++) {
                long s1 = state[l] + GAMMA;
                long s2 = s1 + GAMMA;
                state[l] = s2;
                long z1 = mix(s1);
                long z2 = mix(s2);
                pair((int) z1, (int) z2, out, base + 2 * l);
                pair((int) (z1 >>> 32), (int) (z2 >>> 32), out, base + 2 * l + 1);
            }
        }
    }

    /** The pair of normals of the words (a, b), written at {@code at} and {@code at + WORDS}. */
    static void pair(int a, int b, double[] out, int at) {
        float u = TWO - Float.intBitsToFloat((a >>> MANTISSA_SHIFT) | ONE_BITS);
        float w = Float.intBitsToFloat((b >>> MANTISSA_SHIFT) | ONE_BITS) - THREE_HALVES;
        // ln u = k ln 2 + 2 s G(s^2), u = 2^k m, s = (m - 1) / (m + 1)
        int bits = Float.floatToRawIntBits(u);
        int split = bits - SQRT_HALF_BITS;
        float m = Float.intBitsToFloat(bits - (split & EXPONENT_BITS));
        float k = Float.intBitsToFloat((split >> 23) + ROUNDER_BITS) - ROUNDER;
        float t = m - ONE;
        float s = t / (t + TWO);
        float z = s * s;
        float g = Math.fma(Math.fma(Math.fma(z, G3, G2), z, G1), z, G0);
        float ln = Math.fma(k, LN2_HI, Math.fma(s + s, g, k * LN2_LO));
        // The square root of a float through double is the correctly rounded float square root.
        float radius = (float) Math.sqrt(ln * MINUS_TWO);
        radius = Float.intBitsToFloat(Float.floatToRawIntBits(radius) ^ (b << 31));
        float w2 = w * w;
        float sin = Math.fma(Math.fma(Math.fma(Math.fma(w2, S4, S3), w2, S2), w2, S1), w2, S0) * w;
        float cos = Math.fma(Math.fma(Math.fma(Math.fma(Math.fma(w2, C5, C4), w2, C3), w2, C2), w2, C1), w2, C0);
        out[at] = radius * cos;
        out[at + WORDS] = radius * sin;
    }
}
