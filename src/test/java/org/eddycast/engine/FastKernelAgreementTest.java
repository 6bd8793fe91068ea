package org.eddycast.engine;

import static org.junit.jupiter.api.Assertions.assertTrue;

import org.eddycast.particles.Cancellation;
import org.eddycast.particles.EnsembleRunner;
import org.eddycast.particles.Integrator;
import org.eddycast.particles.KernelChoice;
import org.eddycast.particles.RunListener;
import org.eddycast.stats.DiffusivityAnalysis;
import org.eddycast.stats.SlopeEstimate;
import org.junit.jupiter.api.Test;

/**
 * The benchmark workload's answer on the fast vector kernel against the slow reference path (scalar loops,
 * {@link Math#sin} and {@link Math#cos}), shortened to keep the test brief: the same model, so the two
 * diffusivity estimates must agree within sampling error. Both runs use seed 17 (fixed before any outcome was
 * seen) and share realizations and start points, so their difference is smaller than that of two independent
 * runs; the check allows three standard errors of an independent difference, sqrt(se1^2 + se2^2).
 */
class FastKernelAgreementTest {

    private static SlopeEstimate[] estimate(KernelChoice kernels, Integrator integrator, int groupSize) {
        Benchmark.Workload w = new Benchmark.Workload(2048, 300, 64, 1);
        DimensionlessCase c = Benchmark.workload(w, integrator, groupSize, 17);
        EnsembleRunner runner = new EnsembleRunner(c.model(), integrator, c.timeStep(), c.steps(), groupSize, c.d0(),
                c.seed(), kernels);
        runner.runBlocks(w.particles() / runner.blockSize(), 2, RunListener.NONE, new Cancellation());
        DiffusivityAnalysis a = DiffusivityAnalysis.of(runner.moments(), new double[] {1, 1, 1}, c.d0(), 1.0);
        SlopeEstimate[] out = new SlopeEstimate[3];
        for (int axis = 0; axis < 3; axis++) {
            out[axis] = a.axes().get(axis).diffusivity();
        }
        return out;
    }

    private static void assertAgree(Integrator integrator, int groupSize) {
        SlopeEstimate[] fast = estimate(KernelChoice.VECTOR, integrator, groupSize);
        SlopeEstimate[] slow = estimate(KernelChoice.REFERENCE, integrator, groupSize);
        for (int axis = 0; axis < 3; axis++) {
            double se = Math.hypot(fast[axis].standardError(), slow[axis].standardError());
            double gap = Math.abs(fast[axis].value() - slow[axis].value());
            assertTrue(gap < 3 * se, integrator + ", groups of " + groupSize + ", axis " + axis + ": fast "
                    + fast[axis].value() + ", reference " + slow[axis].value() + ", standard error " + se);
        }
    }

    @Test
    void sharedRealizationsStrang() {
        assertAgree(Integrator.STRANG, 64);
    }

    @Test
    void ownRealizationsLie() {
        assertAgree(Integrator.LIE, 1);
    }
}
