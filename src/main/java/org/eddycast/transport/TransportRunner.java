package org.eddycast.transport;

import java.util.List;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.ForkJoinPool;
import java.util.concurrent.Future;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.TimeoutException;
import java.util.concurrent.atomic.AtomicLong;
import java.util.function.DoubleConsumer;
import java.util.random.RandomGenerator;
import java.util.stream.IntStream;
import org.eddycast.particles.BlockStreams;
import org.eddycast.particles.Cancellation;
import org.eddycast.particles.KernelChoice;
import org.eddycast.particles.NormalStream;
import org.eddycast.particles.NumericalBlowupException;
import org.eddycast.particles.RunCancelledException;

/**
 * Runs the transport stage: blocks of particles start from the release, move through the model with the
 * random-displacement scheme, and hand their positions to the recorders at every record time.
 *
 * <p>Each block has its own random stream, fixed by the seed and the block's index ({@link BlockStreams}), and
 * its own positions (three arrays of doubles); the recorders keep per-block results. So the answer is the same,
 * bit for bit, whatever the number of threads. Memory: per worker, one block's positions and variates.
 */
public final class TransportRunner {

    private TransportRunner() {
    }

    /**
     * Runs the whole stage.
     *
     * @param progress called on the calling thread with the fraction done, at least every 200 ms
     * @throws RunCancelledException    when cancelled
     * @throws NumericalBlowupException when a position stops being finite
     */
    public static void run(TransportModel model, ReleaseSampler release, TransportSettings settings,
                           List<TransportRecorder> recorders, int threads, DoubleConsumer progress,
                           Cancellation cancel) {
        BlockStreams streams = new BlockStreams(settings.seed());
        AtomicLong done = new AtomicLong();
        double total = (double) settings.blocks() * settings.steps();
        ForkJoinPool pool = new ForkJoinPool(Math.max(1, threads));
        try {
            Future<?> all = pool.submit(() -> IntStream.range(0, settings.blocks()).parallel().forEach(
                    b -> runBlock(b, model, release, settings, recorders, streams.forBlock(b), cancel, done)));
            while (true) {
                try {
                    all.get(200, TimeUnit.MILLISECONDS);
                    break;
                } catch (TimeoutException e) {
                    progress.accept(Math.min(1.0, done.get() / total));
                } catch (InterruptedException e) {
                    cancel.cancel();
                    Thread.currentThread().interrupt();
                    throw new RunCancelledException();
                } catch (ExecutionException e) {
                    if (e.getCause() instanceof RuntimeException re) {
                        throw re;
                    }
                    throw new IllegalStateException(e.getCause());
                }
            }
            progress.accept(1.0);
        } finally {
            pool.shutdownNow();
        }
    }

    private static void runBlock(int b, TransportModel model, ReleaseSampler release, TransportSettings settings,
                                 List<TransportRecorder> recorders, RandomGenerator rng, Cancellation cancel,
                                 AtomicLong done) {
        int n = settings.blockSize();
        double[] x = new double[n];
        double[] y = new double[n];
        double[] z = new double[n];
        release.place(rng, x, y, z, n);
        NormalStream stream = KernelChoice.fastest().newNormalStream();
        stream.reseed(rng);
        double[] normals = new double[NormalStream.roundUp(3 * n)];
        RandomDisplacementScheme scheme = new RandomDisplacementScheme(model, settings.timeStep());
        int record = 0;
        long steps = settings.steps();
        long[] recordSteps = settings.recordSteps();
        for (long s = 1; s <= steps; s++) {
            if (cancel.isCancelled()) {
                throw new RunCancelledException();
            }
            stream.fill(normals, normals.length);
            scheme.step(x, y, z, n, normals);
            if (s == recordSteps[record]) {
                if (!Double.isFinite(x[0] + y[0] + z[0])) {
                    throw new NumericalBlowupException("transport positions stopped being finite at step " + s
                            + ": the transport time step is too large for the flow");
                }
                for (TransportRecorder r : recorders) {
                    r.record(b, record, x, y, z, n);
                }
                record++;
            }
            if ((s & 31) == 0) {
                done.addAndGet(32);
            }
        }
        done.addAndGet(steps & 31);
    }
}
