package org.eddycast.engine;

import java.time.Instant;
import org.eddycast.particles.Cancellation;
import org.eddycast.particles.RunListener;
import org.eddycast.scenario.DirectFlow;
import org.eddycast.scenario.Scenario;
import org.eddycast.scenario.TurbulenceStatistics;

/**
 * The one entry point the panel, the command line and the report share: a scenario in, a study result out.
 * Knows nothing of any user interface.
 */
public final class Engine {

    private Engine() {
    }

    /** The number of worker threads to use by default: every core. */
    public static int defaultThreads() {
        return Runtime.getRuntime().availableProcessors();
    }

    /** Resolves the scenario's flow into turbulence statistics (null for verification flows). */
    public static TurbulenceStatistics turbulence(Scenario s) {
        if (s.flow() instanceof DirectFlow d) {
            return CaseBuilder.direct(d);
        }
        return null;
    }

    /** The dimensionless case of a scenario. */
    public static DimensionlessCase dimensionlessCase(Scenario s) {
        return CaseBuilder.build(s, turbulence(s));
    }

    /**
     * Runs a scenario.
     *
     * @throws org.eddycast.scenario.ScenarioException          for a scenario the engine cannot run
     * @throws org.eddycast.particles.RunCancelledException    when cancelled
     * @throws org.eddycast.particles.NumericalBlowupException when the time step is far too large
     */
    public static StudyResult run(Scenario s, int threads, RunListener listener, Cancellation cancel) {
        TurbulenceStatistics t = turbulence(s);
        DimensionlessCase c = CaseBuilder.build(s, t);
        DiffusivityResult r = DiffusivityStudy.run(c, threads, listener, cancel);
        return new StudyResult(s, t, r, ToolVersion.get(), Instant.now());
    }
}
