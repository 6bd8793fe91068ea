package org.eddycast.transport;

/**
 * Takes what it needs from one block of particles at each record time. Blocks run in parallel, each on one
 * thread; a recorder keeps what it takes per block (its own slice of its storage), so the reduction over
 * blocks, done after the run in block order, gives the same numbers whatever the thread count.
 */
@FunctionalInterface
public interface TransportRecorder {

    /**
     * @param block  the block's index
     * @param record the record's index in the run's record times
     * @param count  particles in the block
     */
    void record(int block, int record, double[] x, double[] y, double[] z, int count);
}
