package org.eddycast.reliability;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTimeoutPreemptively;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.time.Duration;
import org.eddycast.engine.DimensionlessCase;
import org.eddycast.engine.Engine;
import org.eddycast.engine.ForecastBuilder;
import org.eddycast.engine.ResolvedFlow;
import org.eddycast.engine.StudyResult;
import org.eddycast.forecast.Forecast;
import org.eddycast.forecast.TwoWallAxis;
import org.eddycast.forecast.TwoWallCosineAxis;
import org.eddycast.forecast.TwoWallImageAxis;
import org.eddycast.particles.Cancellation;
import org.eddycast.particles.RunListener;
import org.eddycast.scenario.Scenario;
import org.eddycast.scenario.ScenarioReader;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.api.Test;

/**
 * The forecast after a simulation is bounded work: at the edges of the accepted ranges (the widest channel,
 * the largest tank with the smallest impeller) it takes well under the 2 s promised. The bound is generous on
 * purpose: the forecast takes tens of milliseconds; the cosine series alone used to need about 1e8 terms per
 * value in a 1e5 m channel and ran for minutes.
 */
class ForecastBoundsTest {

    private static final Duration PROMISE = Duration.ofSeconds(2);

    private static final String SCENARIO = """
            { "version": 1, "name": "bounds", "flow": %s, "substance": { "molecularDiffusivity": 1e-9 },
              "release": %s, "simulation": { "particles": 256, "modes": 16, "seed": 3 %s} }""";

    /**
     * The scenario simulated cheaply: the engine's own duration in 200 coarse steps (the time-step bias does not
     * matter here, only the geometry the forecast works in).
     */
    private static StudyResult simulate(String flow, String release) {
        Scenario chosen = ScenarioReader.parse(SCENARIO.formatted(flow, release, ""));
        DimensionlessCase c = Engine.dimensionlessCase(chosen);
        double duration = c.steps() * c.timeStep() * c.scales().time();
        Scenario s = ScenarioReader.parse(SCENARIO.formatted(flow, release, ", \"duration\": %s, \"timeStep\": %s "
                .formatted(duration, duration / 200)));
        // the homogeneous forecast is the one under test here; the transport stage bounds its own work
        return Engine.run(s, 2, RunListener.NONE, new Cancellation(), false);
    }

    private static void forecastWithinPromise(StudyResult r) {
        ResolvedFlow flow = Engine.resolve(r.scenario());
        Forecast f = assertTimeoutPreemptively(PROMISE, () -> ForecastBuilder.build(r.scenario(), flow, r.diffusivity()));
        for (double p : f.peakConcentration()) {
            assertTrue(p > 0 && Double.isFinite(p), "peak " + p);
        }
        f.mixing().forEach(m -> assertTrue(m.value() > 0 && Double.isFinite(m.value()), m.name() + " " + m.value()));
    }

    @ParameterizedTest(name = "channel {0} m wide, {1} m deep")
    @CsvSource({"100000, 1", "10000, 1", "100000, 0.01", "100000, 1000"})
    void channelsUpToTheWidestAcceptedWidth(String width, String depth) {
        StudyResult r = simulate("""
                { "kind": "channel", "width": %s, "depth": %s, "meanVelocity": 1, "shearVelocity": 0.05 }"""
                .formatted(width, depth), "{ \"mass\": 1, \"rate\": 1, \"location\": \"bank\" }");
        forecastWithinPromise(r);
    }

    @ParameterizedTest(name = "tank {0} m, impeller {1} m")
    @CsvSource({"1000, 0.01", "1000, 999", "0.01, 0.001"})
    void tanksUpToTheLargestAcceptedSize(String tank, String impeller) {
        StudyResult r = simulate("""
                { "kind": "tank", "tankDiameter": %s, "liquidHeight": %s, "impellerDiameter": %s,
                  "impellerSpeed": 1, "impellerType": "hydrofoil" }""".formatted(tank, tank, impeller), "{ \"mass\": 1 }");
        forecastWithinPromise(r);
    }

    @Test
    void theBoundedDensityIsTheExactSeriesOnEitherSideOfTheSwitch() {
        // the two series are the same density (Crank 1975, The Mathematics of Diffusion, ch. 2 and 4): the
        // bounded axis must agree with both wherever both are cheap, here at c = pi^2 D t / L^2 from 0.1 to 10
        double gap = 2;
        for (double c : new double[] {0.1, 0.5, 0.99, 1.01, 2, 10}) {
            double t = c * gap * gap / (Math.PI * Math.PI * 0.3);
            TwoWallAxis bounded = new TwoWallAxis(0, gap, 0.4, 0.3);
            TwoWallImageAxis images = new TwoWallImageAxis(0, gap, 0.4, 0.3);
            TwoWallCosineAxis cosines = new TwoWallCosineAxis(0, gap, 0.4, 0.3);
            for (double x = 0; x <= gap; x += 0.25) {
                assertEquals(images.density(x, t), bounded.density(x, t), 1e-9 / gap);
                assertEquals(cosines.density(x, t), bounded.density(x, t), 1e-9 / gap);
            }
            assertEquals(cosines.peakDensity(t), bounded.peakDensity(t), 1e-9 / gap);
        }
    }

    @Test
    void aNarrowEarlyPeakInAWideGapIsFound() {
        // a second after release 1 m from a bank of a 1e5 m channel: the peak is the free Gaussian's and its
        // wall image's, 1 / sqrt(4 pi D t) (1 + exp(-d^2 / (D t))), found although the gap is 1e5 m wide
        double d = 0.01;
        double t = 1;
        TwoWallAxis axis = new TwoWallAxis(0, 1e5, 1, d);
        double expected = (1 + Math.exp(-1 / (d * t))) / Math.sqrt(4 * Math.PI * d * t);
        assertEquals(expected, axis.peakDensity(t), 1e-9 * expected);
    }
}
