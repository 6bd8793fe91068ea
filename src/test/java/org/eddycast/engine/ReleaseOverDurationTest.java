package org.eddycast.engine;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import org.eddycast.particles.Cancellation;
import org.eddycast.particles.RunListener;
import org.eddycast.report.ResultJson;
import org.eddycast.scenario.Release;
import org.eddycast.scenario.ScenarioReader;
import org.eddycast.transport.SlidingWindow;
import org.eddycast.transport.StationCurve;
import org.junit.jupiter.api.Test;

/**
 * A channel release at a constant rate over a stated duration: the box factor of the grid's peaks against a
 * quadrature, and a run against the same run as a slug (same seed, same particles).
 */
class ReleaseOverDurationTest {

    private static final String CHANNEL = """
            { "version": 1, "name": "dye fed over five minutes",
              "flow": { "kind": "channel", "depth": 1.0, "width": 5.0, "meanVelocity": 0.4, "bedSlope": 2.0e-4 },
              "substance": { "molecularDiffusivity": 4.0e-10 },
              "release": { "mass": 0.01 DURATION },
              "forecast": { "stations": [ { "distance": 150 } ] },
              "simulation": { "particles": 1024, "seed": 3 } }
            """;

    /**
     * The centre of a Gaussian of standard deviation sigma smoothed by a box of length L, over the Gaussian's own
     * peak: (1/L) integral over [-L/2, L/2] of exp(-x^2 / (2 sigma^2)) dx, by Simpson's rule on 2,000 panels.
     */
    @Test
    void theBoxFactorIsTheGaussiansAverageOverTheBox() {
        double sigma = 7.0;
        for (double length : new double[] {0.5, 7, 30, 300}) {
            int n = 2000;
            double h = length / n;
            double sum = 0;
            for (int i = 0; i <= n; i++) {
                double x = -length / 2 + i * h;
                double w = i == 0 || i == n ? 1 : i % 2 == 1 ? 4 : 2;
                sum += w * Math.exp(-x * x / (2 * sigma * sigma));
            }
            double expected = sum * h / 3 / length;
            assertEquals(expected, ReleaseOverDuration.boxFactor(sigma, length), 1e-9, "L = " + length);
        }
        assertEquals(1.0, ReleaseOverDuration.boxFactor(sigma, 0), 0);
        assertEquals(1.0, ReleaseOverDuration.boxFactor(sigma, 1e-9), 1e-12);
    }

    @Test
    void aRunOverADurationIsTheSlugsRunSeenThroughTheWindow() throws Exception {
        StudyResult slug = Engine.run(ScenarioReader.parse(CHANNEL.replace("DURATION", "")), 2, RunListener.NONE,
                new Cancellation());
        StudyResult fed = Engine.run(ScenarioReader.parse(CHANNEL.replace("DURATION", ", \"duration\": 300")), 2,
                RunListener.NONE, new Cancellation());
        StationCurve expected = SlidingWindow.of(slug.answers().stations().get(0).curve(), 300);
        StationCurve got = fed.answers().stations().get(0).curve();
        assertEquals(expected.times().length, got.times().length);
        for (int j = 0; j < got.times().length; j++) {
            assertEquals(expected.concentration()[j], got.concentration()[j], 1e-12 * expected.peak(), "record " + j);
        }
        assertTrue(got.peak() < slug.answers().stations().get(0).curve().peak(), "spread over five minutes");
        // the grid's peaks: never above the slug's, and the assumption line says how they were made
        double[] a = slug.forecast().peakConcentration();
        double[] b = fed.forecast().peakConcentration();
        for (int j = 0; j < a.length; j++) {
            assertTrue(b[j] <= a[j] * (1 + 1e-12), "grid point " + j);
        }
        assertTrue(fed.forecast().assumptions().stream().anyMatch(l -> l.startsWith("release at a constant rate over"
                + " 300 s")));
        JsonNode release = new ObjectMapper().readTree(ResultJson.text(fed)).get("release");
        assertEquals(Release.OVER_DURATION, release.get("mode").asText());
        assertEquals(300.0, release.get("duration").asDouble(), 0);
        assertEquals(0.01, release.get("mass").asDouble(), 0);
        JsonNode slugRelease = new ObjectMapper().readTree(ResultJson.text(slug)).get("release");
        assertEquals(Release.SLUG, slugRelease.get("mode").asText());
        assertEquals(0.0, slugRelease.get("duration").asDouble(), 0);
    }
}
