package org.eddycast.reliability;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.nio.file.Path;
import org.eddycast.engine.DiffusivityResult;
import org.eddycast.engine.DiffusivityStudy;
import org.eddycast.engine.Engine;
import org.eddycast.engine.SimulationCache;
import org.eddycast.engine.StudyResult;
import org.eddycast.engine.ToolVersion;
import org.eddycast.particles.Cancellation;
import org.eddycast.particles.RunListener;
import org.eddycast.report.CurveCsv;
import org.eddycast.report.ResultJson;
import org.eddycast.report.TextSummary;
import org.eddycast.scenario.Scenario;
import org.eddycast.scenario.ScenarioReader;
import org.eddycast.scenario.ScenarioWriter;
import org.eddycast.stats.AxisEstimate;
import org.eddycast.stats.DisplacementMoments;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The same scenario and seed give the same numbers bit for bit: run again, on 1, 2 or 4 threads, and after the
 * scenario was saved and loaded again. Every output names the tool version and the seed.
 */
class ReproducibleResultsTest {

    /** An invented open-channel reach given directly, small enough to run in a fraction of a second. */
    private static final String SCENARIO = """
            { "version": 1, "name": "reach below the weir",
              "flow": { "kind": "direct", "dimensions": 3, "rmsVelocity": 0.06, "integralLength": 0.4,
                        "correlationTime": 8.0, "meanVelocity": 0.3,
                        "spectrum": { "model": "power-law", "slope": -1.6667, "wavenumberRatio": 12 } },
              "substance": { "name": "rhodamine", "molecularDiffusivity": 4.0e-10 },
              "release": { "mass": 0.25 },
              "simulation": { "particles": 1024, "groupSize": 64, "modes": 16, "integrator": "strang",
                              "timeStep": 0.5, "duration": 60, "seed": 20240611 } }
            """;

    @TempDir
    Path folder;

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

    @Test
    void sameSeedSameNumbersAcrossRunsThreadsAndSaveLoad() throws IOException {
        Scenario original = ScenarioReader.parse(SCENARIO);
        Path file = folder.resolve("reach.json");
        ScenarioWriter.write(original, file);
        Scenario reloaded = ScenarioReader.read(file);

        double[] reference = numbers(simulate(original, 1));
        assertArrayEquals(reference, numbers(simulate(original, 1)), 0.0, "second run, 1 thread");
        assertArrayEquals(reference, numbers(simulate(original, 2)), 0.0, "2 threads");
        assertArrayEquals(reference, numbers(simulate(original, 4)), 0.0, "4 threads");
        assertArrayEquals(reference, numbers(simulate(reloaded, 2)), 0.0, "after save and load");
    }

    @Test
    void anotherSeedGivesOtherNumbers() {
        Scenario a = ScenarioReader.parse(SCENARIO);
        Scenario b = ScenarioReader.parse(SCENARIO.replace("20240611", "20240612"));
        assertFalse(java.util.Arrays.equals(numbers(simulate(a, 1)), numbers(simulate(b, 1))));
    }

    @Test
    void everyOutputNamesTheVersionAndTheSeed() throws IOException {
        SimulationCache.shared().clear();
        StudyResult r = Engine.run(ScenarioReader.parse(SCENARIO), 2, RunListener.NONE, new Cancellation());
        String version = ToolVersion.get();
        assertFalse(version.isBlank());

        String csv = CurveCsv.text(r);
        assertEquals("# eddycast " + version + ", seed 20240611", csv.lines().findFirst().orElseThrow());
        assertTrue(csv.lines().skip(1).findFirst().orElseThrow().startsWith("time_s,msd_x_m2"), csv);

        String summary = TextSummary.of(r);
        assertEquals("eddycast " + version + ", seed 20240611: reach below the weir",
                summary.lines().findFirst().orElseThrow());

        JsonNode json = new ObjectMapper().readTree(ResultJson.text(r));
        assertEquals(version, json.get("toolVersion").asText());
        assertEquals(20240611L, json.get("seed").asLong());
    }
}
