package org.eddycast.particles;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import org.eddycast.field.ShearFlow;
import org.eddycast.stats.DisplacementMoments;
import org.junit.jupiter.api.Test;

/**
 * The runner on the smallest flow with an exact answer, a spatially uniform Ornstein-Uhlenbeck velocity
 * (u' = tau = 1) plus molecular diffusion D0 = 0.05: every particle moves by A_i dt per step with A_i the
 * stationary process sampled at the steps, lag correlation rho = exp(-dt / tau), so the mean-square
 * displacement after n steps is exactly dt^2 [n + 2 sum_{k=1}^{n-1} (n - k) rho^k] + 2 D0 n dt along x and
 * 2 D0 n dt along y: the time-discrete form of Taylor's formula (Taylor 1921, "Diffusion by continuous
 * movements", Proc. London Math. Soc. s2-20:196). Checked at ten records within four standard errors of the
 * run's own curve (over independent blocks), for own and shared realizations. Also the runner's contract:
 * block sizes, the same numbers on one or two threads, progress, cancellation and the blow-up message.
 */
class EnsembleRunnerTest {

    private static final double DT = 0.05;
    private static final double D0 = 0.05;
    private static final double[] D0S = {D0, D0, D0};

    private static EnsembleRunner runner(Integrator integrator, int groupSize, int steps) {
        return runner(2, integrator, groupSize, steps);
    }

    private static EnsembleRunner runner(int dimensions, Integrator integrator, int groupSize, int steps) {
        return new EnsembleRunner(new ShearFlow(dimensions, 0, 1.0), integrator, DT, steps, groupSize, D0S, 5,
                KernelChoice.VECTOR);
    }

    private static double discreteTaylor(int n) {
        double rho = Math.exp(-DT);
        double sum = n;
        for (int k = 1; k < n; k++) {
            sum += 2.0 * (n - k) * Math.pow(rho, k);
        }
        return DT * DT * sum;
    }

    private static void assertDiscreteTaylorCurve(int dimensions, Integrator integrator, int groupSize, long blocks) {
        int steps = 200;
        EnsembleRunner r = runner(dimensions, integrator, groupSize, steps);
        r.runBlocks(blocks, 2, RunListener.NONE, new Cancellation());
        DisplacementMoments m = r.moments();
        assertEquals(blocks, m.count());
        int records = m.records();
        for (int j = records / 10; j < records; j += records / 10) {
            int n = (int) Math.round(m.time(j) / DT);
            double se = Math.sqrt(m.covariance(0, j, j) / m.count());
            String where = integrator + ", groups of " + groupSize + ", step " + n;
            assertEquals(discreteTaylor(n) + 2 * D0 * n * DT, m.mean(0, j), 4 * se, where + ", x");
            for (int axis = 1; axis < dimensions; axis++) {
                double seAcross = Math.sqrt(m.covariance(axis, j, j) / m.count());
                assertEquals(2 * D0 * n * DT, m.mean(axis, j), 4 * seAcross, where + ", axis " + axis);
            }
        }
    }

    /** Every scheme moves a point by A dt per step in a uniform velocity, so all follow the same curve. */
    @Test
    void ownRealizationsFollowTheDiscreteTaylorCurve() {
        for (Integrator integrator : Integrator.values()) {
            assertDiscreteTaylorCurve(3, integrator, 1, 64);
        }
    }

    @Test
    void sharedRealizationsFollowTheDiscreteTaylorCurve() {
        // 64 particles share one velocity: the x curve varies block to block by the shared velocity's path.
        for (Integrator integrator : Integrator.values()) {
            assertDiscreteTaylorCurve(2, integrator, 64, 128);
        }
    }

    @Test
    void blockSizesAreWholeGroupsOfAtLeastSixtyFour() {
        assertEquals(64, EnsembleRunner.blockSizeFor(1));
        assertEquals(65, EnsembleRunner.blockSizeFor(5));
        assertEquals(64, EnsembleRunner.blockSizeFor(64));
        assertEquals(100, EnsembleRunner.blockSizeFor(100));
        assertEquals(65, runner(Integrator.LIE, 5, 10).blockSize());
        assertEquals(10, runner(Integrator.LIE, 5, 10).steps());
    }

    @Test
    void oneOrTwoThreadsGiveTheSameNumbers() {
        EnsembleRunner one = runner(Integrator.STRANG, 8, 40);
        EnsembleRunner two = runner(Integrator.STRANG, 8, 40);
        one.runBlocks(20, 1, RunListener.NONE, new Cancellation());
        two.runBlocks(7, 2, RunListener.NONE, new Cancellation());
        two.runBlocks(13, 2, RunListener.NONE, new Cancellation());
        assertEquals(20, two.blocksDone());
        DisplacementMoments a = one.moments();
        DisplacementMoments b = two.moments();
        for (int axis = 0; axis < 2; axis++) {
            for (int j = 0; j < a.records(); j++) {
                assertEquals(a.mean(axis, j), b.mean(axis, j), 0.0, "axis " + axis + " record " + j);
                assertEquals(a.covariance(axis, j, j), b.covariance(axis, j, j), 0.0);
            }
        }
    }

    @Test
    void progressGrowsToOneAndCancellationStopsTheRun() {
        List<Double> fractions = new ArrayList<>();
        EnsembleRunner r = runner(Integrator.LIE, 1, 100);
        r.runBlocks(40, 2, (f, partial) -> fractions.add(f), new Cancellation());
        for (int i = 1; i < fractions.size(); i++) {
            assertTrue(fractions.get(i) >= fractions.get(i - 1), "monotone: " + fractions);
        }
        assertEquals(1.0, fractions.get(fractions.size() - 1), 0.0);
        Cancellation cancel = new Cancellation();
        cancel.cancel();
        EnsembleRunner stopped = runner(Integrator.LIE, 1, 100);
        assertThrows(RunCancelledException.class,
                () -> stopped.runBlocks(40, 2, RunListener.NONE, cancel));
        assertEquals(0, stopped.blocksDone(), "no block of the cancelled batch is kept");
    }

    @Test
    void blowUpAndBadSettingsAreNamed() {
        // A correlated shear with tau = 0.5: its shortest time scale is 0.5, so the advice is a step below 0.05.
        EnsembleRunner wild = new EnsembleRunner(new ShearFlow(2, 1, 0.5), Integrator.LIE, 1e200, 4, 1, D0S, 5,
                KernelChoice.VECTOR);
        NumericalBlowupException e = assertThrows(NumericalBlowupException.class,
                () -> wild.runBlocks(1, 1, RunListener.NONE, new Cancellation()));
        assertEquals("particle positions stopped being finite numbers at step 1 (time 1.000e+200 in units of the "
                + "flow's time scale): the time step 1.000e+200 is far too large for this flow; use a time step below "
                + "0.0500", e.getMessage());
        assertEquals("time step must be positive; got 0.0", assertThrows(IllegalArgumentException.class,
                () -> new EnsembleRunner(new ShearFlow(2, 0, 1.0), Integrator.LIE, 0.0, 4, 1, D0S, 5)).getMessage());
        assertEquals("group size must be at least 1; got 0", assertThrows(IllegalArgumentException.class,
                () -> new EnsembleRunner(new ShearFlow(2, 0, 1.0), Integrator.LIE, 0.1, 4, 0, D0S, 5)).getMessage());
        assertArrayEquals(RecordSchedule.forSteps(4).times(0.1), new EnsembleRunner(new ShearFlow(2, 0, 1.0),
                Integrator.LIE, 0.1, 4, 1, D0S, 5).moments().times(), 0.0);
    }
}
