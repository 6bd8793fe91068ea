package org.eddycast.reliability;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.eddycast.reliability.ReachCase.numbersOf;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.nio.file.Path;
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
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The same scenario and seed give the same numbers bit for bit: run again, on 1, 2 or 4 threads, and after the
 * scenario was saved and loaded again. Every output names the tool version and the seed.
 */
class ReproducibleResultsTest {

    @TempDir
    Path folder;

    @Test
    void sameSeedSameNumbersAcrossRunsThreadsAndSaveLoad() throws IOException {
        Scenario original = ReachCase.scenario();
        Path file = folder.resolve("reach.json");
        ScenarioWriter.write(original, file);
        Scenario reloaded = ScenarioReader.read(file);

        double[] reference = numbersOf(original, 1);
        assertArrayEquals(reference, numbersOf(original, 1), 0.0, "second run, 1 thread");
        assertArrayEquals(reference, numbersOf(original, 2), 0.0, "2 threads");
        assertArrayEquals(reference, numbersOf(original, 4), 0.0, "4 threads");
        assertArrayEquals(reference, numbersOf(reloaded, 2), 0.0, "after save and load");
    }

    @Test
    void anotherSeedGivesOtherNumbers() {
        Scenario a = ReachCase.scenario();
        Scenario b = ScenarioReader.parse(ReachCase.SCENARIO.replace("20240611", "20240612"));
        assertFalse(java.util.Arrays.equals(numbersOf(a, 1), numbersOf(b, 1)));
    }

    @Test
    void everyOutputNamesTheVersionAndTheSeed() throws IOException {
        SimulationCache.shared().clear();
        StudyResult r = Engine.run(ReachCase.scenario(), 2, RunListener.NONE, new Cancellation());
        String version = ToolVersion.get();
        assertFalse(version.isBlank());

        String csv = CurveCsv.text(r);
        assertEquals("# eddycast " + version + ", seed 20240611", csv.lines().findFirst().orElseThrow());
        assertTrue(csv.lines().filter(l -> !l.startsWith("#")).findFirst().orElseThrow()
                .startsWith("time_s,msd_x_m2"), csv);

        String summary = TextSummary.of(r);
        // the summary opens with the answer; the line after it names the version and the seed
        assertEquals("eddycast " + version + ", seed 20240611: reach below the weir",
                summary.lines().skip(1).findFirst().orElseThrow());

        JsonNode json = new ObjectMapper().readTree(ResultJson.text(r));
        assertEquals(version, json.get("toolVersion").asText());
        assertEquals(20240611L, json.get("seed").asLong());
    }
}
