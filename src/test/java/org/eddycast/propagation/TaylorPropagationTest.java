package org.eddycast.propagation;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import org.apache.commons.math3.distribution.NormalDistribution;
import org.eddycast.engine.Engine;
import org.eddycast.forecast.TaylorEstimate;
import org.eddycast.scenario.Scenario;
import org.eddycast.scenario.ScenarioException;
import org.eddycast.scenario.ScenarioReader;
import org.eddycast.scenario.TurbulenceStatistics;
import org.eddycast.uncertainty.SampleSummary;
import org.junit.jupiter.api.Test;

/**
 * The propagation on a case with a closed-form answer: Taylor's long-time diffusivity D = u'^2 T_L (Taylor 1921,
 * Diffusion by continuous movements, Proc. London Math. Soc. s2-20:196) with u' and T_L log-normal. Then ln D =
 * 2 ln u' + ln T_L is normal with mean 2 mu_u + mu_T and variance 4 s_u^2 + s_T^2, so D is log-normal: its mean is
 * exp(mu + s^2 / 2) and its p-quantile exp(mu + s z_p) (Aitchison & Brown 1957, The Lognormal Distribution). Each
 * sampled scenario goes through the same chain as a run (the scenario file's ranges, the sampler, the reader's
 * checks, the flow's resolution) and D is read from the resolved statistics.
 */
class TaylorPropagationTest {

    private static final double U_MEDIAN = 0.04;
    private static final double U_GSD = 1.25;
    private static final double TAU_MEDIAN = 5.0;
    private static final double TAU_GSD = 1.4;
    private static final int BASE = 1024;

    static Scenario scenario(int base) {
        return ScenarioReader.parse("""
                { "version": 1, "name": "Taylor's formula under uncertain inputs",
                  "flow": { "kind": "direct", "dimensions": 3, "rmsVelocity": 0.04, "integralLength": 0.25,
                            "correlationTime": 5.0,
                            "spectrum": { "model": "power-law", "slope": -1.6667, "wavenumberRatio": 16 } },
                  "substance": { "molecularDiffusivity": 1e-9 },
                  "uncertainty": { "ranges": [
                      { "input": "flow.rmsVelocity", "distribution": "log-normal", "median": %s, "geometricSd": %s },
                      { "input": "flow.correlationTime", "distribution": "log-normal", "median": %s,
                        "geometricSd": %s } ],
                    "baseSamples": %d } }
                """.formatted(U_MEDIAN, U_GSD, TAU_MEDIAN, TAU_GSD, base), Path.of("."));
    }

    @Test
    void propagatedMeanAndRangeMatchTheLogNormalOfTaylorsFormula() {
        SweepPlan plan = new SweepPlan(scenario(BASE));
        int n = 2 * BASE;
        double[] d = new double[n];
        for (int row = 0; row < n; row++) {
            TurbulenceStatistics t = Engine.resolve(plan.scenarioAt(row)).turbulence();
            d[row] = TaylorEstimate.longTime(t.rmsVelocity(), t.correlationTime(), t.integralLength(), 1e-9)
                    .value() - 1e-9;
        }
        SampleSummary sample = SampleSummary.of(d);

        double su = Math.log(U_GSD);
        double st = Math.log(TAU_GSD);
        double mu = 2 * Math.log(U_MEDIAN) + Math.log(TAU_MEDIAN);
        double s = Math.sqrt(4 * su * su + st * st);
        double mean = Math.exp(mu + s * s / 2);
        double sd = mean * Math.sqrt(Math.expm1(s * s));
        NormalDistribution z = new NormalDistribution();
        double p05 = Math.exp(mu + s * z.inverseCumulativeProbability(0.05));
        double p95 = Math.exp(mu + s * z.inverseCumulativeProbability(0.95));

        // tolerances: three standard errors of independent sampling (sd / sqrt(n) for the mean; sqrt(p (1 - p) / n)
        // over the density at the quantile for a percentile: Kendall & Stuart, The Advanced Theory of Statistics,
        // vol. 1, from memory); the quasi-random design does at least as well as independent sampling, so these
        // bound it
        assertEquals(mean, sample.mean(), 3 * sd / Math.sqrt(n), "mean");
        assertEquals(p05, sample.p05(), 3 * quantileError(0.05, p05, mu, s, n), "5th percentile");
        assertEquals(p95, sample.p95(), 3 * quantileError(0.95, p95, mu, s, n), "95th percentile");
    }

    /** The standard error of the p-quantile of n independent draws of a log-normal (mu, s). */
    private static double quantileError(double p, double q, double mu, double s, int n) {
        double density = Math.exp(-Math.pow(Math.log(q) - mu, 2) / (2 * s * s)) / (q * s * Math.sqrt(2 * Math.PI));
        return Math.sqrt(p * (1 - p) / n) / density;
    }

    @Test
    void aRangeThatReachesAnInvalidValueIsRefusedBeforeAnyRunNamingTheInput() {
        Scenario s = ScenarioReader.parse("""
                { "version": 1, "name": "bad range",
                  "flow": { "kind": "direct", "dimensions": 3, "rmsVelocity": 0.04, "integralLength": 0.25,
                            "correlationTime": 5.0,
                            "spectrum": { "model": "power-law", "slope": -1.6667, "wavenumberRatio": 16 } },
                  "substance": { "molecularDiffusivity": 1e-9 },
                  "uncertainty": { "ranges": [
                      { "input": "flow.integralLength", "distribution": "normal", "mean": 0.25, "sd": 0.2 } ] } }
                """, Path.of("."));
        SweepPlan plan = new SweepPlan(s);
        ScenarioException e = assertThrows(ScenarioException.class, plan::prepare);
        assertTrue(e.getMessage().contains("flow.integralLength = -"), e.getMessage());
        assertTrue(e.getMessage().contains("Narrow the ranges"), e.getMessage());
    }
}
