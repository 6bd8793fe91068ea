package org.eddycast.reliability;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import org.eddycast.engine.Engine;
import org.eddycast.engine.StudyResult;
import org.eddycast.particles.Cancellation;
import org.eddycast.particles.RunListener;
import org.eddycast.report.ResultJson;
import org.eddycast.report.TextSummary;
import org.eddycast.scenario.ScenarioReader;
import org.eddycast.stats.AxisEstimate;
import org.junit.jupiter.api.Test;

/**
 * A diffusivity or a Lagrangian time scale that comes out negative is noise, never a result: it becomes a
 * named warning and "not determined" in every output, and no forecast is built on it. The cases are chosen
 * (fixed seeds) where the estimate's noise exceeds the quantity: a uniform Ornstein-Uhlenbeck velocity seen
 * through two realizations only, and turbulence at a Peclet number of 0.01 where D - D0 is a few percent of D0.
 */
class EstimatorSanityTest {

    private static StudyResult run(String text) {
        return Engine.run(ScenarioReader.parse(text), 2, RunListener.NONE, new Cancellation());
    }

    @Test
    void aNegativeDiffusivityIsNotDeterminedAndNoForecastIsBuiltOnIt() throws Exception {
        StudyResult r = run("""
                { "version": 1, "name": "zero wavenumber", "flow": { "kind": "shear", "amplitude": 1,
                  "wavenumber": 0, "correlationTime": 1 }, "substance": { "molecularDiffusivity": 1e-6 },
                  "simulation": { "particles": 128, "groupSize": 64, "timeStep": 0.05, "duration": 4, "seed": 16 } }""");
        AxisEstimate x = r.diffusivity().axes().get(0);
        assertTrue(x.diffusivity().value() < 0, "the case must stay one whose slope is negative");
        assertFalse(x.determined());
        assertFalse(x.settled());
        assertTrue(r.diffusivity().warnings().stream().anyMatch(w -> w.startsWith("the x diffusivity is not determined")),
                r.diffusivity().warnings().toString());
        assertNull(r.forecast());
        String text = TextSummary.of(r);
        assertTrue(text.contains("    x  not determined (see the warnings)"), text);
        assertTrue(text.contains("forecast: not determined"), text);
        // the value may be quoted in the warning that explains it, never on the result's line
        String value = String.format(java.util.Locale.ROOT, "%.4g", x.diffusivity().value());
        assertTrue(text.lines().filter(l -> l.startsWith("    x  ")).noneMatch(l -> l.contains(value)), text);
        JsonNode json = new ObjectMapper().readTree(ResultJson.text(r));
        assertTrue(json.path("eddyDiffusivity").path("x").path("value").isNull());
        assertFalse(json.path("eddyDiffusivity").path("x").path("determined").asBoolean());
        assertFalse(json.path("eddyDiffusivity").path("x").path("settled").asBoolean());
        assertTrue(json.path("forecast").isMissingNode());
    }

    @Test
    void aNegativeLagrangianTimeScaleAtSmallPecletIsNotDetermined() {
        StudyResult r = run("""
                { "version": 1, "name": "small peclet", "flow": { "kind": "direct", "rmsVelocity": 0.1,
                  "integralLength": 0.1, "correlationTime": 1 }, "substance": { "molecularDiffusivity": 1 },
                  "simulation": { "particles": 512, "modes": 16, "seed": 3 } }""");
        assertEquals(0.01, r.diffusivity().peclet(), 1e-12);
        AxisEstimate x = r.diffusivity().axes().get(0);
        assertTrue(x.diffusivity().value() < r.diffusivity().molecularDiffusivity(),
                "the case must stay one where D - D0 comes out negative");
        assertFalse(x.timeScaleDetermined());
        assertTrue(r.diffusivity().warnings().stream()
                .anyMatch(w -> w.startsWith("the x Lagrangian time scale is not determined")));
        assertTrue(TextSummary.of(r).contains("Lagrangian time scale not determined"));
    }
}
