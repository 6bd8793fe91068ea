package org.eddycast.particles;

import java.util.random.RandomGenerator;

/**
 * Standard normal variates in bulk for the particle step, from {@value #LANES} interleaved SplitMix64
 * streams (Steele, Lea and Flood 2014, "Fast splittable pseudorandom number generators", OOPSLA '14) turned
 * into pairs of normals by the Box-Muller transform (Box and Muller 1958, "A note on the generation of random
 * normal deviates", Ann. Math. Statist. 29:610-611).
 *
 * <p>Each call of {@link #fill} produces runs of {@value #RUN} values: lane l's pair of uniforms (u1 in
 * (0, 1], u2 in [0, 1), 52 random bits each) gives r cos(2 pi u2) at position l and r sin(2 pi u2) at
 * position {@value #LANES} + l, r = sqrt(-2 ln u1). The smallest u1 is 2^-52, so the variates are exact normals
 * cut at 8.5 standard deviations (a tail mass near 2e-17). The lanes' starting states are drawn from the
 * block's own generator, so a block's variates are fixed by the run's seed and the block's index.
 *
 * <p>Owned by one thread. Implementations differ only in rounding ({@link VectorNormalStream} evaluates the
 * logarithm and the sine and cosine in vector form).
 */
public abstract class NormalStream {

    /** Interleaved generator lanes. */
    public static final int LANES = 8;
    /** Values produced per round of all lanes; fill counts are multiples of it. */
    public static final int RUN = 2 * LANES;

    static final long GAMMA = 0x9E3779B97F4A7C15L;
    static final long ONE_BITS = 0x3FF0000000000000L;

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

    static long mix(long z) {
        z = (z ^ (z >>> 30)) * 0xBF58476D1CE4E5B9L;
        z = (z ^ (z >>> 27)) * 0x94D049BB133111EBL;
        return z ^ (z >>> 31);
    }
}
