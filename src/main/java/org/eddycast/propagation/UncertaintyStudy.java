package org.eddycast.propagation;

import java.util.List;
import org.eddycast.engine.Engine;
import org.eddycast.engine.StudyResult;
import org.eddycast.particles.Cancellation;
import org.eddycast.particles.RunListener;
import org.eddycast.scenario.Scenario;
import org.eddycast.uncertainty.UncertaintySummary;

/**
 * A scenario's study with its inputs' uncertainty: the scenario's own run, then, when its inputs carry ranges,
 * the sweep over them, whose summary the result carries. A scenario without ranges runs exactly as
 * {@link Engine#run} runs it.
 */
public final class UncertaintyStudy {

    private UncertaintyStudy() {
    }

    /**
     * Runs the scenario and, where its inputs carry ranges, the sweep. Every sampled scenario is made and checked
     * before anything is simulated.
     *
     * @throws org.eddycast.scenario.ScenarioException       for a scenario or a range that cannot run
     * @throws org.eddycast.particles.RunCancelledException when cancelled
     */
    public static StudyResult run(Scenario s, int threads, RunListener listener, Cancellation cancel) {
        if (!s.uncertainty().ranged()) {
            return Engine.run(s, threads, listener, cancel);
        }
        SweepPlan plan = new SweepPlan(s);
        plan.prepare();
        double share = nominalShare(s, plan);
        StudyResult nominal = Engine.run(s, threads,
                (fraction, partial) -> listener.progress(share * fraction, partial), cancel);
        SweepPart all = plan.run(0, plan.rows(), threads,
                fraction -> listener.progress(share + (1 - share) * fraction, null), cancel);
        UncertaintySummary u = SweepSummary.summarise(plan, SweepSummary.merge(plan, List.of(all)), nominal);
        return nominal.withUncertainty(u.withNote(String.format(java.util.Locale.ROOT, "the field stage was "
                + "simulated %d times for the %d runs; the others share a dimensionless case with one of them and "
                + "reuse it, rescaled", plan.fieldSimulations(), plan.rows())));
    }

    /** The scenario's own run's share of the work, by particles followed. */
    private static double nominalShare(Scenario s, SweepPlan plan) {
        double own = s.simulation().particles();
        double sweep = (double) plan.rows() * s.uncertainty().particles();
        return own / (own + sweep);
    }
}
