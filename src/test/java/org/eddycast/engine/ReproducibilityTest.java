package org.eddycast.engine;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.eddycast.field.PowerLawBand;
import org.eddycast.field.RandomFourierModel;
import org.eddycast.field.SpectrumTable;
import org.eddycast.particles.Cancellation;
import org.eddycast.particles.Integrator;
import org.eddycast.particles.RunCancelledException;
import org.eddycast.particles.RunListener;
import org.eddycast.stats.DisplacementMoments;
import org.junit.jupiter.api.Test;

/** Same seed, same answer bit for bit, whatever the thread count; cancellation stops a run at once. */
class ReproducibilityTest {

    private static DimensionlessCase smallCase(int groupSize, long seed) {
        SpectrumTable table = new SpectrumTable(new PowerLawBand(-5.0 / 3.0, 16), 3, 16);
        RandomFourierModel model = new RandomFourierModel(table, 1.0, "test");
        return new DimensionlessCase(model, Integrator.STRANG, new double[] {0.01, 0.01, 0.01}, 0.05, 200,
                groupSize, 2048, 2048, Double.NaN, seed, new Scales(1, 1), 1, 100, List.of(), "test");
    }

    private static double[] flatten(DiffusivityResult r) {
        DisplacementMoments m = r.moments();
        double[] all = new double[m.axes() * m.records() * 2];
        int i = 0;
        for (int a = 0; a < m.axes(); a++) {
            for (int j = 0; j < m.records(); j++) {
                all[i++] = m.mean(a, j);
                all[i++] = m.covariance(a, j, j);
            }
        }
        return all;
    }

    @Test
    void identicalForOneTwoAndFourThreads() {
        for (int group : new int[] {64, 1}) {
            double[] one = flatten(DiffusivityStudy.run(smallCase(group, 9), 1, RunListener.NONE, new Cancellation()));
            double[] two = flatten(DiffusivityStudy.run(smallCase(group, 9), 2, RunListener.NONE, new Cancellation()));
            double[] four = flatten(DiffusivityStudy.run(smallCase(group, 9), 4, RunListener.NONE, new Cancellation()));
            assertArrayEquals(one, two, 0.0, "1 vs 2 threads, group " + group);
            assertArrayEquals(one, four, 0.0, "1 vs 4 threads, group " + group);
        }
    }

    @Test
    void anotherSeedGivesAnotherSample() {
        double[] a = flatten(DiffusivityStudy.run(smallCase(64, 9), 2, RunListener.NONE, new Cancellation()));
        double[] b = flatten(DiffusivityStudy.run(smallCase(64, 10), 2, RunListener.NONE, new Cancellation()));
        assertTrue(a[a.length - 2] != b[b.length - 2]);
    }

    @Test
    void cancellationStopsTheRunPromptlyAndLeavesNoWorker() throws Exception {
        DimensionlessCase big = new DimensionlessCase(smallCase(64, 1).model(), Integrator.STRANG,
                new double[] {0.01, 0.01, 0.01}, 0.05, 100_000, 64, 1 << 20, 1 << 20, Double.NaN, 1,
                new Scales(1, 1), 1, 100, List.of(), "long");
        Cancellation cancel = new Cancellation();
        Thread canceller = new Thread(() -> {
            try {
                Thread.sleep(300);
            } catch (InterruptedException e) {
                Thread.currentThread().interrupt();
            }
            cancel.cancel();
        });
        canceller.start();
        long start = System.nanoTime();
        assertThrows(RunCancelledException.class, () -> DiffusivityStudy.run(big, 2, RunListener.NONE, cancel));
        double seconds = (System.nanoTime() - start) / 1e9;
        canceller.join();
        // A run of this size takes hours; stopping within a few seconds shows the flag is seen every step.
        assertTrue(seconds < 5, "cancel took " + seconds + " s");
        // The pool has terminated when the run returns; a worker thread may still be leaving its run method for
        // a moment after that, so each is given up to a second to end before it counts as left running.
        for (Thread t : Thread.getAllStackTraces().keySet()) {
            if (t.getName().startsWith("ForkJoinPool-")) {
                t.join(1000);
            }
        }
        long workers = Thread.getAllStackTraces().keySet().stream()
                .filter(t -> t.getName().startsWith("ForkJoinPool-") && t.isAlive()).count();
        assertEquals(0, workers, "worker threads left running after cancel");
    }

    /**
     * Taylor (1921): for t much shorter than the Lagrangian time scale a particle moves ballistically,
     * sigma^2 = u'^2 t^2 (+ 2 D0 t from molecular diffusion). After one step of a field with unit rms velocity
     * the mean-square displacement per axis must be dt^2 + 2 D0 dt to within sampling error and O(dt^3).
     */
    @Test
    void ballisticStartFollowsTaylor() {
        DiffusivityResult r = DiffusivityStudy.run(smallCase(1, 4), 2, RunListener.NONE, new Cancellation());
        DisplacementMoments m = r.moments();
        double dt = m.time(0);
        double expected = dt * dt + 2 * 0.01 * dt;
        for (int a = 0; a < 3; a++) {
            double se = Math.sqrt(m.covariance(a, 0, 0) / m.count());
            // O(dt^3) curvature of the Lagrangian correlation: below 5% of dt^2 at dt = 0.05 for T_L near 1.
            assertEquals(expected, m.mean(a, 0), 4 * se + 0.05 * dt * dt, "axis " + a);
        }
    }
}
