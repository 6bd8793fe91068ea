package org.eddycast.particles;

import java.util.random.RandomGenerator;

/**
 * Standard normal variates in bulk for the particle step, from {@value #LANES} interleaved SplitMix64
 * streams (Steele, Lea and Flood 2014, "Fast splittable pseudorandom number generators", OOPSLA '14) turned
 * into pairs of normals by the Box-Muller transform (Box and Muller 1958, "A note on the generation of random
 * normal deviates", Ann. Math. Statist. 29:610-611).
 *
 * <p>Each call of {@link #fill} produces runs of {@value #RUN} values from one pair of 64-bit outputs (z1, z2)
 * per lane: u = 2 - (1 + 52 bits of z1) in (0, 1] gives the radius r = sqrt(-2 ln u); 52 further bits of z2
 * give an angle theta uniform in [-pi/2, pi/2), and z2's lowest bit a sign s; lane l writes s r cos(theta) at
 * position l and s r sin(theta) at position {@value #LANES} + l. A uniform angle on the half circle with a
 * random sign of the pair is a uniform angle on the whole circle, so the pair is that of Box and Muller; drawn
 * this way the angle needs no range reduction. The smallest u is 2^-52, so the variates are exact normals cut
 * at 8.5 standard deviations (a tail mass near 2e-17). The lanes' starting states are drawn from the block's
 * own generator, so a block's variates are fixed by the run's seed and the block's index.
 *
 * <p>Owned by one thread. Implementations differ only in rounding ({@link VectorNormalStream} evaluates the
 * logarithm by a polynomial of its own, within 4e-14 relative of the JDK's).
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

    /** pi and -3 pi / 2: the angle is pi (1 + v) - 3 pi / 2 for v uniform in [0, 1). */
    static final double PI = Math.PI;
    static final double MINUS_THREE_HALVES_PI = -1.5 * Math.PI;

    static long mix(long z) {
        z = (z ^ (z >>> 30)) * 0xBF58476D1CE4E5B9L;
        z = (z ^ (z >>> 27)) * 0x94D049BB133111EBL;
        return z ^ (z >>> 31);
    }
}
