package org.eddycast.particles;

import java.util.ArrayDeque;
import java.util.Locale;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.ForkJoinPool;
import java.util.concurrent.Future;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.TimeoutException;
import java.util.concurrent.atomic.AtomicLong;
import java.util.random.RandomGenerator;
import java.util.stream.IntStream;
import org.eddycast.field.FieldModel;
import org.eddycast.field.ModeLanes;
import org.eddycast.field.ShearModeField;
import org.eddycast.stats.DisplacementMoments;

/**
 * Runs an ensemble of particles through realizations of a field and accumulates the mean-square displacement
 * per axis, block by block.
 *
 * <p>Particles come in groups that share one realization; groups make up blocks of at least
 * {@value #MIN_BLOCK} particles, the independent units of the confidence interval. A block is advanced through
 * all its steps while it sits in cache and leaves only its curve of mean-square displacements at the record
 * times, so memory does not grow with the number of steps or particles. Shared realizations run one group at
 * a time (the realization and the group's positions: a few kilobytes); with one realization per particle
 * (group size 1) the whole block runs at once, particle i in lane i of a {@link ModeLanes} (15 doubles per
 * mode and particle: about 490 kB for 64 modes and 64 particles, in the core's second-level cache).
 *
 * <p>Memory bound: per worker thread one block's workspace (above) and its curve (axes x records doubles);
 * for the run, the moments (axes x records^2 doubles, about 0.45 MB for 3 axes and the schedule's ~136
 * records) and two batches of {@value #BATCH} curves. Nothing depends on the number of steps or particles.
 *
 * <p>Blocks run in parallel in batches of {@value #BATCH}, two batches in flight so that no worker waits at
 * the end of a batch; each block has its own random stream
 * ({@link BlockStreams}) from which it draws its realizations, start points and the seeds of its bulk normal
 * variates ({@link NormalStream}), and the batch's curves are merged in block order, so the result is the same,
 * bit for bit, for any thread count.
 */
public final class EnsembleRunner {

    static final int MIN_BLOCK = 64;
    static final int BATCH = 16;

    private final FieldModel model;
    private final Integrator integrator;
    private final double dt;
    private final int steps;
    private final int groupSize;
    private final int blockSize;
    private final double[] d0;
    private final BlockStreams streams;
    private final RecordSchedule schedule;
    private final DisplacementMoments moments;
    private final KernelChoice kernels;
    private long blocksDone;

    /**
     * @param model      the field
     * @param integrator the drift scheme
     * @param dt         time step (dimensionless)
     * @param steps      number of steps, at least 2
     * @param groupSize  particles sharing one realization, at least 1
     * @param d0         molecular diffusivity per axis (length 3, dimensionless)
     * @param seed       the run's seed
     */
    public EnsembleRunner(FieldModel model, Integrator integrator, double dt, int steps, int groupSize,
                          double[] d0, long seed) {
        this(model, integrator, dt, steps, groupSize, d0, seed, KernelChoice.fastest());
    }

    /** As above, on the given implementation of the inner loops. */
    public EnsembleRunner(FieldModel model, Integrator integrator, double dt, int steps, int groupSize,
                          double[] d0, long seed, KernelChoice kernels) {
        if (!(dt > 0) || !Double.isFinite(dt)) {
            throw new IllegalArgumentException("time step must be positive; got " + dt);
        }
        if (groupSize < 1) {
            throw new IllegalArgumentException("group size must be at least 1; got " + groupSize);
        }
        this.model = model;
        this.integrator = integrator;
        this.dt = dt;
        this.steps = steps;
        this.groupSize = groupSize;
        this.blockSize = blockSizeFor(groupSize);
        this.d0 = d0.clone();
        this.streams = new BlockStreams(seed);
        this.schedule = RecordSchedule.forSteps(steps);
        this.moments = new DisplacementMoments(model.dimensions(), schedule.times(dt), blockSize);
        this.kernels = kernels;
    }

    /** Particles per block for groups of the given size: a whole number of groups, at least {@value #MIN_BLOCK}. */
    public static int blockSizeFor(int groupSize) {
        return groupSize >= MIN_BLOCK ? groupSize : groupSize * ((MIN_BLOCK + groupSize - 1) / groupSize);
    }

    /** Particles per block (a whole number of groups). */
    public int blockSize() {
        return blockSize;
    }

    public long blocksDone() {
        return blocksDone;
    }

    public int steps() {
        return steps;
    }

    /** A snapshot of the moments merged so far. */
    public DisplacementMoments moments() {
        return moments.copy();
    }

    /**
     * Runs the next {@code count} blocks on {@code threads} workers and merges them.
     *
     * @throws RunCancelledException     when cancelled (the blocks of the unfinished batch are dropped)
     * @throws NumericalBlowupException  when positions stop being finite
     */
    public void runBlocks(long count, int threads, RunListener listener, Cancellation cancel) {
        ForkJoinPool pool = new ForkJoinPool(Math.max(1, threads));
        try {
            AtomicLong groupSteps = new AtomicLong();
            double totalGroupSteps = (double) count * (blockSize / groupSize) * steps;
            long end = blocksDone + count;
            long submitted = blocksDone;
            // Two batches in flight: a worker that finishes its part of one batch starts on the next
            // instead of waiting for the other workers' last blocks.
            ArrayDeque<Batch> inFlight = new ArrayDeque<>();
            while (blocksDone < end) {
                while (inFlight.size() < 2 && submitted < end) {
                    inFlight.add(submit(pool, submitted, (int) Math.min(BATCH, end - submitted), cancel, groupSteps));
                    submitted += inFlight.peekLast().curves().length;
                }
                Batch batch = inFlight.remove();
                awaitBatch(batch.future(), cancel, listener, groupSteps, totalGroupSteps);
                for (double[] curve : batch.curves()) {
                    moments.increment(curve);
                }
                blocksDone += batch.curves().length;
                listener.progress(Math.min(1.0, groupSteps.get() / totalGroupSteps), moments.copy());
            }
        } finally {
            pool.shutdownNow();
            try {
                pool.awaitTermination(10, TimeUnit.SECONDS);
            } catch (InterruptedException e) {
                Thread.currentThread().interrupt();
            }
        }
    }

    /** A batch of blocks running on the pool, and the curves its blocks fill in. */
    private record Batch(Future<?> future, double[][] curves) {
    }

    private Batch submit(ForkJoinPool pool, long first, int size, Cancellation cancel, AtomicLong groupSteps) {
        double[][] curves = new double[size][];
        Future<?> future = pool.submit(() -> IntStream.range(0, size).parallel()
                .forEach(i -> curves[i] = runBlock(first + i, cancel, groupSteps)));
        return new Batch(future, curves);
    }

    private static void awaitBatch(Future<?> future, Cancellation cancel, RunListener listener, AtomicLong done,
                                   double total) {
        while (true) {
            try {
                future.get(200, TimeUnit.MILLISECONDS);
                return;
            } catch (TimeoutException e) {
                listener.progress(Math.min(1.0, done.get() / total), null);
            } catch (InterruptedException e) {
                cancel.cancel();
                Thread.currentThread().interrupt();
                throw new RunCancelledException();
            } catch (ExecutionException e) {
                Throwable cause = e.getCause();
                if (cause instanceof RuntimeException re) {
                    throw re;
                }
                throw new IllegalStateException(cause);
            }
        }
    }

    /** Advances block b through all its groups and steps; returns its mean-square displacement curves. */
    double[] runBlock(long b, Cancellation cancel, AtomicLong groupSteps) {
        RandomGenerator rng = streams.forBlock(b);
        double[] curve = groupSize == 1 ? runOwnRealizations(rng, cancel, groupSteps)
                : runSharedRealizations(rng, cancel, groupSteps);
        double inverse = 1.0 / blockSize;
        for (int j = 0; j < curve.length; j++) {
            curve[j] *= inverse;
        }
        return curve;
    }

    /** Groups of particles, one group at a time through all steps, each group in one realization. */
    private double[] runSharedRealizations(RandomGenerator rng, Cancellation cancel, AtomicLong groupSteps) {
        int axes = model.dimensions();
        int records = schedule.size();
        double[] curve = new double[axes * records];
        ShearModeField field = new ShearModeField(axes, model.modeCount());
        ParticleBlock particles = new ParticleBlock(groupSize);
        ParticleStepper stepper = new ParticleStepper(integrator, dt, d0, kernels.newShearKernel());
        NormalStream normals = kernels.newNormalStream();
        for (int g = 0; g < blockSize / groupSize; g++) {
            model.realize(field, rng);
            field.prepareStep(dt);
            place(particles, groupSize, rng);
            normals.reseed(rng);
            int record = 0;
            for (int s = 1; s <= steps; s++) {
                if (cancel.isCancelled()) {
                    throw new RunCancelledException();
                }
                stepper.step(field, particles, groupSize, normals);
                if (s == schedule.step(record)) {
                    accumulate(particles, groupSize, curve, record, records, axes, s);
                    record++;
                }
                if ((s & 63) == 0) {
                    groupSteps.addAndGet(64);
                }
            }
            groupSteps.addAndGet(steps & 63);
        }
        return curve;
    }

    /** The whole block at once, particle i in lane i with a realization of its own. */
    private double[] runOwnRealizations(RandomGenerator rng, Cancellation cancel, AtomicLong groupSteps) {
        int axes = model.dimensions();
        int records = schedule.size();
        double[] curve = new double[axes * records];
        ShearModeField field = new ShearModeField(axes, model.modeCount());
        ModeLanes lanes = new ModeLanes(axes, model.modeCount(), blockSize);
        for (int lane = 0; lane < blockSize; lane++) {
            model.realize(field, rng);
            field.prepareStep(dt);
            lanes.load(lane, field);
        }
        ParticleBlock particles = new ParticleBlock(blockSize);
        place(particles, blockSize, rng);
        ParticleStepper stepper = new ParticleStepper(integrator, dt, d0, kernels.newShearKernel());
        NormalStream normals = kernels.newNormalStream();
        normals.reseed(rng);
        int record = 0;
        for (int s = 1; s <= steps; s++) {
            if (cancel.isCancelled()) {
                throw new RunCancelledException();
            }
            stepper.step(lanes, particles, normals);
            if (s == schedule.step(record)) {
                accumulate(particles, blockSize, curve, record, records, axes, s);
                record++;
            }
            if ((s & 63) == 0) {
                groupSteps.addAndGet(64L * blockSize);
            }
        }
        groupSteps.addAndGet((long) (steps & 63) * blockSize);
        return curve;
    }

    /** Places the first n particles uniformly in the model's start region. */
    private void place(ParticleBlock particles, int n, RandomGenerator rng) {
        double region = model.startRegion();
        double[] start = new double[3];
        boolean three = model.dimensions() == 3;
        for (int i = 0; i < n; i++) {
            start[0] = region * rng.nextDouble();
            start[1] = region * rng.nextDouble();
            start[2] = three ? region * rng.nextDouble() : 0.0;
            particles.place(i, start);
        }
    }

    private void accumulate(ParticleBlock p, int n, double[] curve, int record, int records, int axes, int step) {
        double sx = 0;
        double sy = 0;
        double sz = 0;
        for (int i = 0; i < n; i++) {
            double dx = p.x[i] - p.x0[i];
            double dy = p.y[i] - p.y0[i];
            double dz = p.z[i] - p.z0[i];
            sx += dx * dx;
            sy += dy * dy;
            sz += dz * dz;
        }
        if (!Double.isFinite(sx + sy + sz)) {
            throw new NumericalBlowupException(String.format(Locale.ROOT,
                    "particle positions stopped being finite numbers at step %d (time %.4g in units of the "
                            + "flow's time scale): the time step %.4g is far too large for this flow; use a time "
                            + "step below %.3g", step, step * dt, dt, 0.1 * model.shortestTimeScale()));
        }
        curve[record] += sx;
        curve[records + record] += sy;
        if (axes == 3) {
            curve[2 * records + record] += sz;
        }
    }
}
