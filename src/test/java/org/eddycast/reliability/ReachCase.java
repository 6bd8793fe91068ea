package org.eddycast.reliability;

import org.eddycast.engine.DiffusivityResult;
import org.eddycast.engine.DiffusivityStudy;
import org.eddycast.engine.Engine;
import org.eddycast.particles.Cancellation;
import org.eddycast.particles.RunListener;
import org.eddycast.scenario.Scenario;
import org.eddycast.scenario.ScenarioReader;
import org.eddycast.stats.AxisEstimate;
import org.eddycast.stats.DisplacementMoments;

/** A small invented case the reproducibility tests run, and every number its simulation produces. */
final class ReachCase {

    /** An invented open-channel reach given directly, small enough to run in a fraction of a second. */
    static final String SCENARIO = """
            { "version": 1, "name": "reach below the weir",
              "flow": { "kind": "direct", "dimensions": 3, "rmsVelocity": 0.06, "integralLength": 0.4,
                        "correlationTime": 8.0, "meanVelocity": 0.3,
                        "spectrum": { "model": "power-law", "slope": -1.6667, "wavenumberRatio": 12 } },
              "substance": { "name": "rhodamine", "molecularDiffusivity": 4.0e-10 },
              "release": { "mass": 0.25 },
              "simulation": { "particles": 1024, "groupSize": 64, "modes": 16, "integrator": "strang",
                              "timeStep": 0.5, "duration": 60, "seed": 20240611 } }
            """;

    /** The case as a scenario. */
    static Scenario scenario() {
        return ScenarioReader.parse(SCENARIO);
    }

    /** Every number of a run of the scenario on the given number of threads. */
    static double[] numbersOf(Scenario s, int threads) {
        return numbers(simulate(s, threads));
    }

    private static DiffusivityResult simulate(Scenario s, int threads) {
        return DiffusivityStudy.run(Engine.dimensionlessCase(s), threads, RunListener.NONE, new Cancellation());
    }

    /** Every number the simulation produced: moments (mean and covariance) and per-axis estimates. */
    private static double[] numbers(DiffusivityResult r) {
        DisplacementMoments m = r.moments();
        int n = m.records();
        double[] all = new double[m.axes() * n * (n + 1) + 4 * r.axes().size()];
        int k = 0;
        for (int a = 0; a < m.axes(); a++) {
            for (int i = 0; i < n; i++) {
                all[k++] = m.mean(a, i);
                for (int j = 0; j < n; j++) {
                    all[k++] = m.covariance(a, i, j);
                }
            }
        }
        for (AxisEstimate e : r.axes()) {
            all[k++] = e.diffusivity().value();
            all[k++] = e.diffusivity().low();
            all[k++] = e.diffusivity().high();
            all[k++] = e.lagrangianTimeScale();
        }
        return all;
    }

    private ReachCase() {
    }
}
