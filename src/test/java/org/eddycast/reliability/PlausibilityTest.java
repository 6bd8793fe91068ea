package org.eddycast.reliability;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.eddycast.engine.Engine;
import org.eddycast.engine.Plausibility;
import org.eddycast.scenario.ScenarioReader;
import org.junit.jupiter.api.Test;

/**
 * Designs that every field accepts but no real tank or channel has are warned about before the run, naming the
 * fields; the bundled presets, which are ordinary designs, give no such warning.
 */
class PlausibilityTest {

    private static final String TANK = """
            { "version": 1, "name": "t", "flow": { "kind": "tank", "tankDiameter": 1.5, "liquidHeight": %s,
              "impellerDiameter": 0.5, "impellerSpeed": %s, "impellerType": "hydrofoil" },
              "substance": { "molecularDiffusivity": 1e-9 } }""";

    private static final String CHANNEL = """
            { "version": 1, "name": "c", "flow": { "kind": "channel", "depth": 1, "width": 20,
              "meanVelocity": %s, "shearVelocity": %s }, "substance": { "molecularDiffusivity": 1e-9 } }""";

    private static List<String> warnings(String text) {
        return Plausibility.warnings(ScenarioReader.parse(text));
    }

    @Test
    void aMillimetreOfLiquidOverAHalfMetreImpellerAtAThousandRevolutionsIsWarnedAbout() {
        List<String> w = warnings(TANK.formatted("0.001", "1000"));
        assertTrue(w.stream().anyMatch(s -> s.startsWith("implausible design: flow.liquidHeight 0.001 m is not "
                + "above flow.impellerDiameter 0.5 m")), w.toString());
        // tip speed pi N D = pi * 1000 * 0.5 = 1571 m/s
        assertTrue(w.stream().anyMatch(s -> s.startsWith("implausible design: impeller tip speed pi N D = 1571 m/s")),
                w.toString());
        List<String> preflight = Engine.preflight(ScenarioReader.parse(TANK.formatted("0.001", "1000")));
        assertTrue(preflight.containsAll(w), "the preflight carries them");
    }

    @Test
    void aShearVelocityAboveTheMeanVelocityIsWarnedAbout() {
        List<String> w = warnings(CHANNEL.formatted("0.3", "0.5"));
        assertEquals(1, w.size(), w.toString());
        assertTrue(w.get(0).startsWith("implausible design: the shear velocity u* = 0.5 m/s is not below "
                + "flow.meanVelocity 0.3 m/s"), w.get(0));
        assertTrue(warnings(CHANNEL.formatted("0.3", "0.02")).isEmpty());
    }

    @Test
    void theBundledPresetsArePlausible() throws Exception {
        try (var files = Files.list(Path.of("presets"))) {
            for (Path p : files.filter(f -> f.toString().endsWith(".json")).toList()) {
                assertEquals(List.of(), Plausibility.warnings(ScenarioReader.read(p)), p.toString());
            }
        }
    }
}
