package org.eddycast.transport;

/**
 * How a transport run is sized.
 *
 * @param blocks      independent blocks of particles (the units of every confidence interval), at least 2
 * @param blockSize   particles per block, a positive multiple of 16
 * @param timeStep    time step (s)
 * @param steps       time steps, at least 1
 * @param recordSteps the steps after which the recorders look at the particles, increasing, from 1 to steps
 * @param seed        the run's seed; the same seed gives the same answer on any number of threads
 */
public record TransportSettings(int blocks, int blockSize, double timeStep, long steps, long[] recordSteps,
                                long seed) {

    /** Record times every {@code recordEvery} steps (and at the last step). */
    public TransportSettings(int blocks, int blockSize, double timeStep, long steps, int recordEvery, long seed) {
        this(blocks, blockSize, timeStep, steps, uniform(steps, recordEvery), seed);
    }

    private static long[] uniform(long steps, int recordEvery) {
        if (steps < 1 || recordEvery < 1) {
            throw new IllegalArgumentException("transport steps and record interval must be at least 1; got "
                    + steps + " and " + recordEvery);
        }
        int n = (int) ((steps + recordEvery - 1) / recordEvery);
        long[] r = new long[n];
        for (int j = 0; j < n; j++) {
            r[j] = Math.min(steps, (long) (j + 1) * recordEvery);
        }
        return r;
    }

    /** Independent blocks of a stage's run. */
    public static final int STAGE_BLOCKS = 32;

    /** Particles per block for a requested count: whole multiples of 16 over {@value #STAGE_BLOCKS} blocks. */
    public static int stageBlockSize(int particles) {
        return Math.max(16, (particles + STAGE_BLOCKS * 16 - 1) / (STAGE_BLOCKS * 16) * 16);
    }

    /** The most steps a stage's run of the requested particles may take within both limits. */
    public static long stageStepLimit(int particles, long maxSteps, double maxParticleSteps) {
        return (long) Math.min(maxSteps, maxParticleSteps / ((double) STAGE_BLOCKS * stageBlockSize(particles)));
    }

    /**
     * A stage's run over {@code duration} with a step of at most {@code maxStep}: the step count a whole number
     * of the {@code records} uniform record intervals (the step shrunk to fit), with {@code early} geometric
     * record times before the first of them.
     */
    public static TransportSettings stage(int particles, double duration, double maxStep, int records, int early,
                                          long seed) {
        return stage(particles, duration, maxStep, records, early, seed, new double[0]);
    }

    /**
     * As {@link #stage(int, double, double, int, int, long)}, with records also at the given times (each at the
     * nearest step; times outside the run are dropped): a station's passage read densely.
     */
    public static TransportSettings stage(int particles, double duration, double maxStep, int records, int early,
                                          long seed, double[] extraTimes) {
        long steps = Math.max(records, (long) Math.ceil(duration / maxStep));
        steps = (steps + records - 1) / records * records;
        double dt = duration / steps;
        java.util.TreeSet<Long> set = new java.util.TreeSet<>();
        for (long step : mixedRecords(steps, early, records)) {
            set.add(step);
        }
        for (double t : extraTimes) {
            long step = Math.round(t / dt);
            if (step >= 1 && step <= steps) {
                set.add(step);
            }
        }
        return new TransportSettings(STAGE_BLOCKS, stageBlockSize(particles), dt, steps,
                set.stream().mapToLong(Long::longValue).toArray(), seed);
    }

    /**
     * Record times dense early (a geometric sequence from the first step, to follow a cloud still small beside
     * the section) and uniform late (for the late-window slope): about {@code early + late} records.
     */
    public static long[] mixedRecords(long steps, int early, int late) {
        java.util.TreeSet<Long> set = new java.util.TreeSet<>();
        for (int j = 1; j <= late; j++) {
            set.add(Math.max(1, Math.round((double) j * steps / late)));
        }
        double ratio = Math.pow(steps / (double) late, 1.0 / early);
        double s = 1;
        while (s < (double) steps / late) {
            set.add(Math.round(s));
            s = Math.max(s * ratio, s + 1);
        }
        return set.stream().mapToLong(Long::longValue).toArray();
    }

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
        recordSteps = recordSteps.clone();
        if (steps < 1 || recordSteps.length == 0 || recordSteps[recordSteps.length - 1] != steps) {
            throw new IllegalArgumentException("transport record steps must end at the last step " + steps);
        }
        for (int j = 0; j < recordSteps.length; j++) {
            if (recordSteps[j] < 1 || (j > 0 && recordSteps[j] <= recordSteps[j - 1])) {
                throw new IllegalArgumentException("transport record steps must increase from 1; got "
                        + recordSteps[j] + " at " + j);
            }
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

    @Override
    public long[] recordSteps() {
        return recordSteps.clone();
    }

    /** Number of record times. */
    public int records() {
        return recordSteps.length;
    }

    /** The step of record j (1-based steps; the last record is the last step). */
    public long stepOfRecord(int j) {
        return recordSteps[j];
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
