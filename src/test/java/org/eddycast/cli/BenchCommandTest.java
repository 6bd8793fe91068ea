package org.eddycast.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.nio.file.Files;
import java.nio.file.Path;
import org.eddycast.engine.Engine;
import org.eddycast.engine.StudyResult;
import org.eddycast.particles.Cancellation;
import org.eddycast.particles.RunListener;
import org.eddycast.scenario.ScenarioReader;
import org.eddycast.stats.AxisEstimate;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The bench command's output contract on a tiny workload (its figures are not checked: speed is not tested). */
class BenchCommandTest {

    @Test
    void writesTheDocumentedJsonShape(@TempDir Path dir) throws Exception {
        Path json = dir.resolve("bench.json");
        CommandLineTest.Outcome o = CommandLineTest.run("bench", "--particles", "128", "--steps", "20", "--modes",
                "4", "--scheme", "lie,euler", "--sharing", "shared,own", "--threads", "2", "--json", json.toString());
        assertEquals(0, o.status(), o.err());
        JsonNode all = new ObjectMapper().readTree(json.toFile()).get("results");
        assertEquals(6, all.size(), "four field figures and two of the transport stage");
        java.util.List<JsonNode> results = new java.util.ArrayList<>();
        for (JsonNode r : all) {
            if (r.path("stage").asText().equals("transport")) {
                assertEquals(2, r.get("threads").asInt());
                assertTrue(r.get("particleStepsPerSecond").asDouble() > 0, r.toString());
                assertTrue(r.get("peakMemoryBytes").asLong() > 0);
            } else {
                results.add(r);
            }
        }
        assertEquals(4, results.size());
        assertEquals("shared", results.get(0).get("sharing").asText());
        assertEquals("own", results.get(3).get("sharing").asText());
        for (JsonNode r : results) {
            assertEquals(2, r.get("threads").asInt());
            assertTrue(r.get("modeUpdatesPerSecond").asDouble() > 0);
            JsonNode spread = r.get("modeUpdatesPerSecondRange");
            assertTrue(spread.get("low").asDouble() <= r.get("modeUpdatesPerSecond").asDouble()
                    && r.get("modeUpdatesPerSecond").asDouble() <= spread.get("high").asDouble(), r.toString());
            assertTrue(r.get("peakMemoryBytes").asLong() > 0);
            JsonNode d = r.get("diffusivity");
            assertTrue(d.get("low").asDouble() <= d.get("value").asDouble()
                    && d.get("value").asDouble() <= d.get("high").asDouble(), r.toString());
        }
    }

    /** An invented small case; the second copy asks for a precision the runs must then report as asked. */
    private static final String SMALL_CASE = """
            { "version": 1, "name": "side channel below the sluice",
              "flow": { "kind": "direct", "dimensions": 3, "rmsVelocity": 0.05, "integralLength": 0.3,
                        "correlationTime": 6.0, "meanVelocity": 0.2,
                        "spectrum": { "model": "power-law", "slope": -1.6667, "wavenumberRatio": 8 } },
              "substance": { "name": "rhodamine", "molecularDiffusivity": 4.0e-10 },
              "release": { "mass": 0.1 },
              "simulation": { "particles": 512, "groupSize": 64, "modes": 8, "integrator": "lie",
                              "timeStep": 0.5, "duration": 40, "seed": 31 %s } }
            """;

    /**
     * Each preset is timed in a fresh process to the end of its run; the precision is the target the preset
     * sets, or else the widest half-width the run reached, which must equal the same seed's run in this
     * process (the numbers are the same in any process).
     */
    @Test
    void timesEachPresetInAFreshProcess(@TempDir Path dir) throws Exception {
        Path presets = Files.createDirectory(dir.resolve("presets"));
        Files.writeString(presets.resolve("a-reached.json"), String.format(SMALL_CASE, ""));
        Files.writeString(presets.resolve("b-asked.json"), String.format(SMALL_CASE,
                ", \"precisionTarget\": 0.3, \"maxParticles\": 1024"));
        Path json = dir.resolve("answer.json");
        CommandLineTest.Outcome o = CommandLineTest.run("bench", "--answer", "--presets", presets.toString(),
                "--threads", "2", "--json", json.toString());
        assertEquals(0, o.status(), o.err());
        JsonNode table = new ObjectMapper().readTree(json.toFile()).get("timeToHeadline");
        assertEquals(2, table.size());
        assertEquals("a-reached", table.get(0).get("preset").asText());
        assertEquals("b-asked", table.get(1).get("preset").asText());

        StudyResult here = Engine.run(ScenarioReader.read(presets.resolve("a-reached.json")), 2, RunListener.NONE,
                new Cancellation());
        double widest = 0;
        for (AxisEstimate a : here.diffusivity().axes()) {
            widest = Math.max(widest, Math.abs((a.diffusivity().high() - a.diffusivity().low()) / 2
                    / a.diffusivity().value()));
        }
        assertEquals(widest, table.get(0).get("precision").asDouble(), 1e-12 * widest);
        assertEquals(false, table.get(0).get("precisionRequested").asBoolean());
        assertEquals(0.3, table.get(1).get("precision").asDouble(), 0.0);
        assertEquals(true, table.get(1).get("precisionRequested").asBoolean());
        for (JsonNode row : table) {
            // A fresh runtime cannot start, load the tool and run in less than a tenth of a second.
            assertTrue(row.get("seconds").asDouble() > 0.1, row.toString());
        }
        assertTrue(o.out().contains("a-reached") && o.out().contains("target +-30.0%"), o.out());
    }

    @Test
    void answerNeedsAFolderOfPresets(@TempDir Path dir) {
        CommandLineTest.Outcome o = CommandLineTest.run("bench", "--answer", "--presets",
                dir.resolve("none").toString());
        assertEquals(Main.BAD_INPUT, o.status());
        assertTrue(o.err().contains("--presets"), o.err());
    }

    @Test
    void rejectsAnUnknownSchemeNamingTheOption() {
        CommandLineTest.Outcome o = CommandLineTest.run("bench", "--scheme", "rk4");
        assertEquals(Main.BAD_INPUT, o.status());
        assertTrue(o.err().contains("--scheme"), o.err());
    }
}
