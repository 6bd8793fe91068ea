package org.eddycast.particles;

import java.util.random.RandomGenerator;
import java.util.random.RandomGeneratorFactory;

/**
 * One independent random stream per block of particles, fixed by the run's seed and the block's index, so the
 * same seed gives the same answer whatever the number of threads or the order blocks are run in.
 *
 * <p>Generator: L64X128MixRandom of the LXM family (Steele and Vigna 2021, "LXM: better splittable
 * pseudorandom number generators (and almost as fast)", Proc. ACM Program. Lang. 5, OOPSLA, 148), seeded with
 * a 64-bit mix of (seed, block) by the finaliser of SplitMix64 (Steele, Lea and Flood 2014, "Fast splittable
 * pseudorandom number generators", OOPSLA '14).
 */
public final class BlockStreams {

    private static final RandomGeneratorFactory<RandomGenerator> FACTORY =
            RandomGeneratorFactory.of("L64X128MixRandom");

    private final long seed;

    public BlockStreams(long seed) {
        this.seed = seed;
    }

    /** The generator of block b. */
    public RandomGenerator forBlock(long block) {
        return FACTORY.create(mix(seed + 0x9E3779B97F4A7C15L * (block + 1)) ^ mix(block * 0xD1B54A32D192ED03L));
    }

    static long mix(long z) {
        z = (z ^ (z >>> 30)) * 0xBF58476D1CE4E5B9L;
        z = (z ^ (z >>> 27)) * 0x94D049BB133111EBL;
        return z ^ (z >>> 31);
    }
}
