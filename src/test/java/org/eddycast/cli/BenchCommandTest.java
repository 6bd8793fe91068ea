package org.eddycast.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.nio.file.Path;
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
        JsonNode results = new ObjectMapper().readTree(json.toFile()).get("results");
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

    @Test
    void rejectsAnUnknownSchemeNamingTheOption() {
        CommandLineTest.Outcome o = CommandLineTest.run("bench", "--scheme", "rk4");
        assertEquals(Main.BAD_INPUT, o.status());
        assertTrue(o.err().contains("--scheme"), o.err());
    }
}
