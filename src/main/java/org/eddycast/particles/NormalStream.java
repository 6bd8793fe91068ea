package org.eddycast.particles;

import java.util.random.RandomGenerator;

/**
 * Standard normal variates in bulk for the amplitude updates and the Brownian steps, from {@value #LANES}
 * interleaved SplitMix64 streams (Steele, Lea and Flood 2014, "Fast splittable pseudorandom number generators",
 * OOPSLA '14) turned into pairs of normals by the Box-Muller transform (Box and Muller 1958, "A note on the
 * generation of random normal deviates", Ann. Math. Statist. 29:610-611), computed in single precision and
 * written out as doubles.
 *
 * <p>Each round of {@link #fill} writes {@value #RUN} values. Every generator lane l gives two 64-bit outputs
 * z1, z2; each is read as two 32-bit words, the low half first, so a round has {@value #WORDS} word pairs
 * (a, b), pair w = 2 l + h from the halves h = 0, 1. From a pair: u = 2 - (1 + 23 bits of a) in (0, 1] gives the
 * radius r = sqrt(-2 ln u); 23 bits of b give w = v - 3/2 uniform in [-1/2, 1/2) (v = 1 + 23 bits, so the
 * difference is exact) and b's lowest bit a sign s; the pair writes s r cos(pi w) at position w and
 * s r sin(pi w) at position {@value #WORDS} + w. A uniform angle on the half circle with a random sign of the
 * pair is a uniform angle on the whole circle, so the pair is that of Box and Muller.
 *
 * <p>Single precision, and what it costs: the logarithm, square root, sine, cosine and products are computed in
 * float arithmetic (polynomials of our own, {@link #LOG_G}, {@link #SINE_HALF_TURN}, {@link #COSINE_HALF_TURN});
 * each variate lies within {@value #VARIATE_BOUND} (1 + |x|) of the exact Box-Muller value of its two words
 * (tested). The smallest u is 2^-23, so the variates are normals cut at sqrt(46 ln 2) = 5.646 standard
 * deviations (tail mass 1.6e-8). Only the variates are single precision: they are widened to doubles, and
 * every update that uses them, the positions, phases and moments, is double precision.
 *
 * <p>The lanes' starting states are drawn from the block's own generator, so a block's variates are fixed by
 * the run's seed and the block's index. The implementations ({@link ScalarNormalStream},
 * {@link VectorNormalStream}) do the same operations in the same order and give the same bits, at every vector
 * length. Owned by one thread.
 */
public abstract class NormalStream {

    /** Interleaved generator lanes. */
    public static final int LANES = 8;
    /** Word pairs, so pairs of normals, per round: two 64-bit outputs of each lane, two words each. */
    public static final int WORDS = 2 * LANES;
    /** Values produced per round of all lanes; fill counts are multiples of it. */
    public static final int RUN = 2 * WORDS;
    /** The bound per variate, relative to 1 + |x|, against the exact Box-Muller value of its words. */
    public static final double VARIATE_BOUND = 1e-6;
    /** The largest |variate|: the radius of the smallest u, 2^-23. */
    public static final double CUT = Math.sqrt(46 * Math.log(2));

    static final long GAMMA = 0x9E3779B97F4A7C15L;
    /** Bit pattern of 1.0f: 23 random bits or-ed into it give a float uniform in [1, 2). */
    static final int ONE_BITS = 0x3F800000;
    /** Shift that keeps the top 23 bits of a 32-bit word. */
    static final int MANTISSA_SHIFT = 9;
    static final float TWO = 2.0f;
    static final float ONE = 1.0f;
    static final float MINUS_TWO = -2.0f;
    static final float THREE_HALVES = 1.5f;
    /** Bit pattern of sqrt(1/2) as a float: subtracting it splits u into 2^k and m in [sqrt(1/2), sqrt(2)). */
    static final int SQRT_HALF_BITS = 0x3F3504F3;
    static final int EXPONENT_BITS = 0xFF800000;
    /** Bit pattern of 1.5 * 2^23: a small integer k added to it reads as the float 1.5 * 2^23 + k. */
    static final int ROUNDER_BITS = 0x4B400000;
    static final float ROUNDER = 12582912.0f;
    /** ln 2 in two parts (fdlibm's e_logf.c): k LN2_HI is exact for |k| below 2^8. */
    static final float LN2_HI = 6.9313812256e-01f;
    static final float LN2_LO = 9.0580006145e-06f;

    /**
     * atanh(s) / s on s^2 in [0, 0.0295] (|s| &lt;= (sqrt 2 - 1) / (sqrt 2 + 1)): coefficients of s^0, s^2, s^4,
     * s^6, by Chebyshev interpolation in s^2 (Trefethen 2013, Approximation Theory and Approximation Practice,
     * SIAM); error 7e-10 before rounding to float.
     */
    static final float[] LOG_G = {1.0f, 0.3333340883255005f, 0.19987425208091736f, 0.14962194859981537f};
    /** sin(pi w) / w on w^2 in [0, 1/4]: coefficients of w^0 .. w^8, Chebyshev interpolation; error 1.3e-7. */
    static final float[] SINE_HALF_TURN = {
        3.1415927410125732f, -5.167710304260254f, 2.550077438354492f, -0.5982903838157654f, 0.07765591144561768f};
    /**
     * cos(pi w) on w^2 in [0, 1/4]: coefficients of w^0 .. w^10, Chebyshev interpolation with the first held at
     * 1; error 9.5e-8.
     */
    static final float[] COSINE_HALF_TURN = {
        1.0f, -4.934802055358887f, 4.058709144592285f, -1.335211992263794f, 0.23493707180023193f,
        -0.024395931512117386f};

    final long[] state = new long[LANES];

    /** Seeds every lane from the block's generator. */
    public final void reseed(RandomGenerator rng) {
        for (int l = 0; l < LANES; l++) {
            state[l] = rng.nextLong();
        }
    }

    /** Writes {@code count} standard normal variates to {@code out[0 .. count)}; count a multiple of RUN. */
    public abstract void fill(double[] out, int count);

    /** The count rounded up to a whole number of runs. */
    public static int roundUp(int count) {
        return (count + RUN - 1) / RUN * RUN;
    }

    static void checkCount(int count) {
        if (count % RUN != 0) {
            throw new IllegalArgumentException("count must be a multiple of " + RUN + "; got " + count);
        }
    }

    static long mix(long z) {
        z = (z ^ (z >>> 30)) * 0xBF58476D1CE4E5B9L;
        z = (z ^ (z >>> 27)) * 0x94D049BB133111EBL;
        return z ^ (z >>> 31);
    }
}
