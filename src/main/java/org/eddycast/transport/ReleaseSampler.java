package org.eddycast.transport;

import java.util.random.RandomGenerator;

/** Where the particles of one block start: the released cloud, in the transport model's coordinates. */
@FunctionalInterface
public interface ReleaseSampler {

    /** Writes the start points of particles {@code [0, count)}, drawing any randomness from {@code rng}. */
    void place(RandomGenerator rng, double[] x, double[] y, double[] z, int count);
}
