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
}
