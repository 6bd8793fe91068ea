package org.eddycast.engine;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.eddycast.particles.Cancellation;
import org.eddycast.particles.EnsembleRunner;
import org.eddycast.particles.NumericalBlowupException;
import org.eddycast.particles.RunListener;
import org.eddycast.stats.AxisEstimate;
import org.eddycast.stats.DiffusivityAnalysis;
import org.eddycast.stats.DisplacementMoments;

/**
 * Runs the simulation of a dimensionless case and turns its moments into eddy diffusivities in physical
 * units. With a precision target it keeps adding blocks of particles (in fixed batches, so the stopping point
 * does not depend on the thread count) until every axis' 95% half-width is below the target or the particle
 * budget is spent.
 */
public final class DiffusivityStudy {

    private DiffusivityStudy() {
    }

    /**
     * @param c        the case
     * @param threads  worker threads, at least 1
     * @param listener progress (fraction of the planned work; the moments so far)
     * @param cancel   set to stop; the run then throws {@link org.eddycast.particles.RunCancelledException}
     */
    public static DiffusivityResult run(DimensionlessCase c, int threads, RunListener listener, Cancellation cancel) {
        try {
            return simulate(c, threads, listener, cancel);
        } catch (NumericalBlowupException e) {
            throw new NumericalBlowupException(CaseBuilder.blowupMessage(c));
        }
    }

    private static DiffusivityResult simulate(DimensionlessCase c, int threads, RunListener listener,
                                              Cancellation cancel) {
        long start = System.nanoTime();
        EnsembleRunner runner = new EnsembleRunner(c.model(), c.integrator(), c.timeStep(), c.steps(),
                c.groupSize(), c.d0(), c.seed());
        long blocks = Math.max(2, (c.particles() + runner.blockSize() - 1) / runner.blockSize());
        long maxBlocks = Math.max(blocks, c.maxParticles() / runner.blockSize());
        boolean targeted = !Double.isNaN(c.precisionTarget());
        long planned = targeted ? maxBlocks : blocks;
        final long[] done = {0};
        final long[] runningCount = {0};
        RunListener scaled = (fraction, partial) ->
                listener.progress(Math.min(1.0, (done[0] + fraction * runningCount[0]) / planned), partial);
        runningCount[0] = blocks;
        runner.runBlocks(blocks, threads, scaled, cancel);
        done[0] = blocks;
        double[] variance = new double[c.model().dimensions()];
        for (int a = 0; a < variance.length; a++) {
            variance[a] = c.model().componentVariance(a);
        }
        DiffusivityAnalysis analysis = DiffusivityAnalysis.of(runner.moments(), variance, c.d0(), c.scales().time());
        List<String> warnings = new ArrayList<>();
        if (targeted) {
            while (analysis.worstRelativeHalfWidth() > c.precisionTarget() && runner.blocksDone() < maxBlocks) {
                long more = Math.min(Math.max(16, runner.blocksDone() / 2), maxBlocks - runner.blocksDone());
                runningCount[0] = more;
                runner.runBlocks(more, threads, scaled, cancel);
                done[0] += more;
                analysis = DiffusivityAnalysis.of(runner.moments(), variance, c.d0(), c.scales().time());
            }
            if (analysis.worstRelativeHalfWidth() > c.precisionTarget()) {
                warnings.add(String.format(Locale.ROOT,
                        "the precision target (95%% half-width below %.3g%%) was not reached with the particle "
                                + "budget of %d: the widest interval is +-%.3g%%; raise simulation.maxParticles",
                        100 * c.precisionTarget(), c.maxParticles(), 100 * analysis.worstRelativeHalfWidth()));
            }
        }
        warnings.addAll(0, analysis.warnings());
        String stepWarning = CaseBuilder.timeStepWarning(c);
        if (stepWarning != null) {
            warnings.add(stepWarning);
        }
        DisplacementMoments moments = runner.moments();
        double diffusivity = c.scales().diffusivity();
        double time = c.scales().time();
        double velocity2 = c.scales().velocity() * c.scales().velocity();
        List<AxisEstimate> axes = new ArrayList<>();
        for (AxisEstimate a : analysis.axes()) {
            axes.add(new AxisEstimate(a.axis(), a.diffusivity().scaled(diffusivity, time), a.lagrangianTimeScale() * time,
                    a.settled(), a.earlyWindow().scaled(diffusivity, time)));
        }
        double[] physicalVariance = variance.clone();
        for (int a = 0; a < physicalVariance.length; a++) {
            physicalVariance[a] *= velocity2;
        }
        double elapsed = (System.nanoTime() - start) / 1e9;
        return new DiffusivityResult(axes, moments, c.scales(), c.kubo(), c.peclet(), c.d0()[0] * diffusivity,
                physicalVariance, runner.blocksDone() * runner.blockSize(), runner.blocksDone(), c.steps(),
                c.timeStep() * time, threads, elapsed, false, c.model().describe(), warnings, c.notes());
    }
}
