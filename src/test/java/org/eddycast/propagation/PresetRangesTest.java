package org.eddycast.propagation;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import java.nio.file.Files;
import java.nio.file.Path;
import org.eddycast.engine.StudyResult;
import org.eddycast.particles.Cancellation;
import org.eddycast.particles.RunListener;
import org.eddycast.report.ResultJson;
import org.eddycast.report.TextSummary;
import org.eddycast.scenario.Scenario;
import org.eddycast.scenario.ScenarioReader;
import org.eddycast.uncertainty.UncertaintySummary;
import org.junit.jupiter.api.Test;

/**
 * The lowland and dose-tank presets carry input ranges, each with where it comes from, and every sampled
 * scenario of their designs is valid; the lowland preset's run, made small, shows both intervals and the ranking
 * in its text and JSON.
 */
class PresetRangesTest {

    @Test
    void bothPresetsRangeTheirInputsWithAStatedBasisAndEveryRowIsValid() throws Exception {
        for (String name : new String[] {"lowland-channel-dye.json", "mixing-tank-dose.json"}) {
            Scenario s = ScenarioReader.read(Path.of("presets", name));
            assertTrue(s.uncertainty().ranges().size() >= 3, name);
            SweepPlan plan = new SweepPlan(s);
            plan.prepare();
            for (int i = 0; i < plan.inputs().size(); i++) {
                String basis = SweepPlan.resolved(s, s.uncertainty().ranges().get(i)).basis();
                assertTrue(basis.contains("from memory") || basis.contains("common practice")
                        || basis.contains("invented example"), name + " " + plan.inputs().get(i) + ": " + basis);
            }
        }
    }

    @Test
    void theLowlandPresetShowsBothIntervalsAndTheRankingInTextAndJson() throws Exception {
        Path preset = Path.of("presets/lowland-channel-dye.json");
        String text = Files.readString(preset).replaceAll("\"particles\": \\d+", "\"particles\": 2048")
                .replace("\"baseSamples\": 8", "\"baseSamples\": 2");
        Scenario s = ScenarioReader.parse(text, preset.toAbsolutePath().getParent());
        StudyResult r = UncertaintyStudy.run(s, 2, RunListener.NONE, new Cancellation());
        UncertaintySummary u = r.uncertainty();
        assertEquals(2 * 5 + 1, u.runs());
        assertEquals("stationPeak", u.mainFigure().key());
        assertEquals(r.answers().stations().get(0).passage().peak(), u.mainFigure().nominal(), 0.0);
        assertTrue(u.mainFigure().p05() <= u.mainFigure().p95());
        assertEquals(3, u.sensitivity().size());
        String[] lines = TextSummary.of(r).split("\n");
        assertTrue(lines[0].startsWith("200 m downstream"), lines[0]);
        assertTrue(lines[1].startsWith("How sure: peak at the first station")
                && lines[1].contains("particles' noise [") && lines[1].contains("inputs' ranges 5-95% [")
                && lines[1].contains("most sensitive to flow."), lines[1]);
        JsonNode root = ResultJson.of(r);
        JsonNode station = root.path("headline").path("stations").path(0);
        assertTrue(station.has("peakLow") && station.path("inputRange").has("p05"), station.toString());
        assertTrue(root.path("transport").path("longitudinalDispersion").path("inputRange").has("p95"));
        assertEquals(3, root.path("sensitivity").size());
    }
}
