package org.eddycast.cli;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * A sweep split into shards merges into the unsplit sweep's result, byte for byte: each shard is its own run of
 * the command, as it would be on another machine.
 */
class SweepShardsTest {

    /** A small direct-flow scenario whose field stage takes milliseconds, with three ranged inputs. */
    static final String SCENARIO = """
            { "version": 1, "name": "small sweep",
              "flow": { "kind": "direct", "dimensions": 3, "rmsVelocity": 0.04, "integralLength": 0.25,
                        "correlationTime": 5.0, "meanVelocity": 0.35,
                        "spectrum": { "model": "power-law", "slope": -1.6667, "wavenumberRatio": 16 } },
              "substance": { "molecularDiffusivity": 4.25e-10 },
              "simulation": { "particles": 512, "groupSize": 64, "modes": 16, "timeStep": 0.1, "duration": 12,
                              "seed": 5 },
              "uncertainty": { "ranges": [
                  { "input": "flow.rmsVelocity", "plusMinus": 0.2 },
                  { "input": "flow.correlationTime", "low": 4, "high": 6 },
                  { "input": "flow.meanVelocity", "distribution": "normal", "mean": 0.35, "sd": 0.02 } ],
                "baseSamples": 4, "particles": 512 } }
            """;

    @Test
    void threeShardsMergeIntoTheWholeSweepByteForByte(@TempDir Path dir) throws Exception {
        Path scenario = dir.resolve("s.json");
        Files.writeString(scenario, SCENARIO);
        Path whole = dir.resolve("whole.json");
        CommandLineTest.Outcome o = CommandLineTest.run("sweep", scenario.toString(), "--out", whole.toString(),
                "--threads", "2");
        assertEquals(0, o.status(), o.err());
        String[] parts = new String[3];
        for (int k = 1; k <= 3; k++) {
            parts[k - 1] = dir.resolve("part" + k + ".json").toString();
            // one thread here, two for the whole sweep: the thread count must not change a single bit
            o = CommandLineTest.run("sweep", scenario.toString(), "--shard", k + "/3", "--out", parts[k - 1],
                    "--threads", "1");
            assertEquals(0, o.status(), o.err());
        }
        Path merged = dir.resolve("merged.json");
        // parts given out of order: the merge puts the rows back in place
        o = CommandLineTest.run("sweep", "--merge", parts[2], parts[0], parts[1], "--out", merged.toString());
        assertEquals(0, o.status(), o.err());
        assertArrayEquals(Files.readAllBytes(whole), Files.readAllBytes(merged));

        JsonNode root = new ObjectMapper().readTree(merged.toFile());
        JsonNode figure = root.path("uncertainty").path("figures").path(0);
        assertTrue(figure.path("inputRange").path("p05").asDouble() < figure.path("inputRange").path("p95")
                .asDouble(), figure.toString());
        assertEquals(3, root.path("sensitivity").size());
        assertEquals(4 * 5 + 1, root.path("uncertainty").path("runs").asInt());
        assertTrue(root.path("cautions").size() > 0);
    }

    @Test
    void aMissingOrDuplicatedShardIsRefusedByName(@TempDir Path dir) throws Exception {
        Path scenario = dir.resolve("s.json");
        Files.writeString(scenario, SCENARIO);
        String first = dir.resolve("p1.json").toString();
        CommandLineTest.Outcome o = CommandLineTest.run("sweep", scenario.toString(), "--shard", "1/3", "--out",
                first);
        assertEquals(0, o.status(), o.err());
        o = CommandLineTest.run("sweep", "--merge", first, "--out", dir.resolve("r.json").toString());
        assertEquals(2, o.status());
        assertTrue(o.err().contains("are in no part"), o.err());
        o = CommandLineTest.run("sweep", "--merge", first, first, "--out", dir.resolve("r.json").toString());
        assertEquals(2, o.status());
        assertTrue(o.err().contains("is in two parts"), o.err());
        o = CommandLineTest.run("sweep", scenario.toString(), "--shard", "4/3", "--out", first);
        assertEquals(2, o.status());
        assertTrue(o.err().contains("--shard must be K/N"), o.err());
    }

    @Test
    void runOfAScenarioWithRangesGivesBothIntervalsAndTheRankingInTextAndJson(@TempDir Path dir) throws Exception {
        Path scenario = dir.resolve("s.json");
        Files.writeString(scenario, SCENARIO);
        Path json = dir.resolve("r.json");
        CommandLineTest.Outcome o = CommandLineTest.run("run", scenario.toString(), "--json", json.toString(),
                "--threads", "2");
        assertEquals(0, o.status(), o.err());
        String[] lines = o.out().split("\n");
        assertTrue(lines[1].startsWith("How sure: eddy diffusivity along x"), lines[1]);
        assertTrue(lines[1].contains("particles' noise [") && lines[1].contains("over the inputs' ranges 5-95% ["),
                lines[1]);
        assertTrue(o.out().contains("share of the variance"), o.out());
        JsonNode root = new ObjectMapper().readTree(json.toFile());
        JsonNode x = root.path("eddyDiffusivity").path("x");
        JsonNode range = x.path("inputRange");
        assertTrue(range.path("p05").asDouble() < range.path("p95").asDouble(), x.toString());
        // the Monte Carlo interval and the input range sit side by side, each with what it covers
        assertTrue(x.has("low") && x.has("high"));
        JsonNode figure = root.path("uncertainty").path("figures").path(0);
        assertEquals(x.path("value").asDouble(), figure.path("value").asDouble(), 0.0);
        assertTrue(figure.path("monteCarlo").path("covers").asText().contains("noise"));
        assertTrue(figure.path("inputRange").path("covers").asText().contains("percentile"));
        JsonNode sensitivity = root.path("sensitivity");
        assertEquals(3, sensitivity.size());
        for (int i = 1; i < sensitivity.size(); i++) {
            assertTrue(sensitivity.path(i - 1).path("total").asDouble() >= sensitivity.path(i).path("total")
                    .asDouble(), "ordered by total index");
        }
        // the mean velocity does not enter the field stage: the rows that differ from A only in it reuse A's
        // simulation (4 of the 21 runs here), and the notes say how many were simulated
        String reuse = null;
        for (JsonNode n : root.path("uncertainty").path("notes")) {
            if (n.asText().startsWith("the field stage was simulated")) {
                reuse = n.asText();
            }
        }
        assertEquals("the field stage was simulated 17 times for the 21 runs; the others share a dimensionless case"
                + " with one of them and reuse it, rescaled", reuse);
        // the mean velocity carries the tracer but does not enter the eddy diffusivity: its indices are zero
        for (JsonNode s : sensitivity) {
            if (s.path("input").asText().equals("flow.meanVelocity")) {
                assertEquals(0.0, s.path("total").asDouble(), 0.0, s.toString());
                assertEquals(0.0, s.path("first").asDouble(), 0.0, s.toString());
            }
        }
    }
}
