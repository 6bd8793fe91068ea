package org.eddycast.transport;

/**
 * How a transport run is sized.
 *
 * @param blocks      independent blocks of particles (the units of every confidence interval), at least 2
 * @param blockSize   particles per block, a positive multiple of 16
 * @param timeStep    time step (s)
 * @param steps       time steps, at least 1
 * @param recordEvery steps between record times (the last step is always a record time)
 * @param seed        the run's seed; the same seed gives the same answer on any number of threads
 */
public record TransportSettings(int blocks, int blockSize, double timeStep, long steps, int recordEvery, long seed) {

    /** The most particle-steps one run may take (about ten minutes on two cores). */
    public static final double MAX_PARTICLE_STEPS = 1e11;

    public TransportSettings {
        if (blocks < 2) {
            throw new IllegalArgumentException("transport blocks must be at least 2; got " + blocks);
        }
        if (blockSize < 16 || blockSize % 16 != 0) {
            throw new IllegalArgumentException("transport block size must be a positive multiple of 16; got "
                    + blockSize);
        }
        if (!(timeStep > 0) || !Double.isFinite(timeStep)) {
            throw new IllegalArgumentException("transport time step must be positive and finite; got " + timeStep);
        }
        if (steps < 1 || recordEvery < 1) {
            throw new IllegalArgumentException("transport steps and record interval must be at least 1; got "
                    + steps + " and " + recordEvery);
        }
        if ((double) blocks * blockSize * steps > MAX_PARTICLE_STEPS) {
            throw new IllegalArgumentException(String.format(java.util.Locale.ROOT,
                    "the transport run would take %.3g particle-steps, more than the limit %.0e: shorten the"
                            + " horizon or use fewer particles", (double) blocks * blockSize * steps,
                    MAX_PARTICLE_STEPS));
        }
    }

    /** Particles in all. */
    public long particles() {
        return (long) blocks * blockSize;
    }

    /** Number of record times. */
    public int records() {
        return (int) ((steps + recordEvery - 1) / recordEvery);
    }

    /** The step of record j (1-based steps; the last record is the last step). */
    public long stepOfRecord(int j) {
        return Math.min(steps, (long) (j + 1) * recordEvery);
    }

    /** Record times (s). */
    public double[] recordTimes() {
        double[] t = new double[records()];
        for (int j = 0; j < t.length; j++) {
            t[j] = stepOfRecord(j) * timeStep;
        }
        return t;
    }

    /** Simulated duration (s). */
    public double duration() {
        return steps * timeStep;
    }
}
