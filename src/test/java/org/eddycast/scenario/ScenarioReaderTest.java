package org.eddycast.scenario;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.stream.Stream;
import org.eddycast.particles.Integrator;
import org.junit.jupiter.api.Test;

class ScenarioReaderTest {

    static final String EXAMPLE = """
            { "version": 1, "name": "example",
              "flow": { "kind": "direct", "dimensions": 3, "rmsVelocity": 0.05, "integralLength": 0.3,
                        "correlationTime": 6.0, "spectrum": { "model": "power-law", "slope": -1.6667, "wavenumberRatio": 16 } },
              "substance": { "molecularDiffusivity": 1.0e-9 },
              "simulation": { "particles": 16384, "groupSize": 64, "modes": 64, "integrator": "strang",
                              "timeStep": 0.05, "duration": 120, "seed": 7 } }
            """;

    @Test
    void readsTheDocumentedShape() {
        Scenario s = ScenarioReader.parse(EXAMPLE);
        DirectFlow f = (DirectFlow) s.flow();
        assertEquals(0.05, f.rmsVelocity());
        assertEquals(0.3, f.integralLength());
        assertEquals(6.0, f.correlationTime());
        assertEquals(-1.6667, f.spectrum().slope());
        assertEquals(16, f.spectrum().wavenumberRatio());
        assertEquals(1e-9, s.substance().molecularDiffusivity());
        assertEquals(Integrator.STRANG, s.simulation().integrator());
        assertEquals(2400L, s.simulation().steps());
        assertEquals(7, s.simulation().seed());
    }

    @Test
    void everyProblemNamesItsFieldAndTheValidRange() {
        String bad = EXAMPLE.replace("\"rmsVelocity\": 0.05", "\"rmsVelocity\": -1")
                .replace("\"integrator\": \"strang\"", "\"integrator\": \"rk4\"")
                .replace("\"particles\": 16384", "\"particles\": \"many\"");
        ScenarioException e = assertThrows(ScenarioException.class, () -> ScenarioReader.parse(bad));
        assertEquals(3, e.problems().size(), e.getMessage());
        assertTrue(e.getMessage().contains("flow.rmsVelocity must be between 0 (exclusive) and 100 m/s; got -1"), e.getMessage());
        assertTrue(e.getMessage().contains("simulation.integrator must be one of euler, lie, strang"), e.getMessage());
        assertTrue(e.getMessage().contains("simulation.particles must be a whole number"), e.getMessage());
    }

    @Test
    void syntaxErrorsNameLineAndColumn() {
        ScenarioException e = assertThrows(ScenarioException.class,
                () -> ScenarioReader.parse("{\n  \"version\": 1,\n  \"name\": oops\n}"));
        assertTrue(e.getMessage().startsWith("line 3, column"), e.getMessage());
    }

    @Test
    void missingSectionsAreNamed() {
        ScenarioException e = assertThrows(ScenarioException.class,
                () -> ScenarioReader.parse("{ \"version\": 1, \"name\": \"x\" }"));
        assertTrue(e.getMessage().contains("flow is missing"), e.getMessage());
        assertTrue(e.getMessage().contains("substance is missing"), e.getMessage());
    }

    @Test
    void everyBundledPresetIsValid() throws Exception {
        try (Stream<Path> files = Files.list(Path.of("presets"))) {
            long n = files.filter(p -> p.toString().endsWith(".json")).peek(p -> {
                try {
                    ScenarioReader.read(p);
                } catch (Exception ex) {
                    throw new AssertionError(p + ": " + ex.getMessage(), ex);
                }
            }).count();
            assertTrue(n >= 3, "at least three presets");
        }
    }

    @Test
    void everyPresetRoundTripsThroughTheWriter() throws Exception {
        try (Stream<Path> files = Files.list(Path.of("presets"))) {
            for (Path p : files.filter(f -> f.toString().endsWith(".json")).toList()) {
                Scenario first = ScenarioReader.read(p);
                String written = ScenarioWriter.text(first);
                Scenario second = ScenarioReader.parse(written, p.toAbsolutePath().getParent());
                assertEquals(written, ScenarioWriter.text(second), p + " round trip");
                assertEquals(first.flow().kind(), second.flow().kind());
            }
        }
    }

    @Test
    void tankAndChannelFieldsAreValidatedByName() {
        ScenarioException e = assertThrows(ScenarioException.class, () -> ScenarioReader.parse("""
                { "version": 1, "flow": { "kind": "tank", "tankDiameter": 1, "liquidHeight": 1,
                  "impellerDiameter": 2, "impellerSpeed": -1, "impellerType": "paddle" },
                  "substance": { "molecularDiffusivity": 1e-9 } }"""));
        assertTrue(e.getMessage().contains("flow.impellerSpeed must be between 0 (exclusive) and 1000 rev/s; got -1"), e.getMessage());
        assertTrue(e.getMessage().contains("flow.impellerType must be one of"), e.getMessage());
        assertTrue(e.getMessage().contains("flow.impellerDiameter must be smaller than tankDiameter"), e.getMessage());
        ScenarioException c = assertThrows(ScenarioException.class, () -> ScenarioReader.parse("""
                { "version": 1, "flow": { "kind": "channel", "depth": 1, "width": 5, "meanVelocity": 0.5 },
                  "substance": { "molecularDiffusivity": 1e-9 } }"""));
        assertTrue(c.getMessage().contains("give exactly one of bedSlope"), c.getMessage());
    }

    @Test
    void aMisspeltOptionalFieldIsReportedNotIgnored() {
        String typo = EXAMPLE.replace("\"correlationTime\": 6.0", "\"corelationTime\": 6.0");
        ScenarioException e = assertThrows(ScenarioException.class, () -> ScenarioReader.parse(typo));
        assertTrue(e.getMessage().contains("flow.corelationTime is not used here; did you mean correlationTime?"),
                e.getMessage());
        String wrongRoute = EXAMPLE.replace("\"kind\": \"direct\"", "\"kind\": \"channel\", \"depth\": 1, "
                + "\"width\": 4, \"meanVelocity\": 0.3, \"bedSlope\": 0.001, \"kindOf\": 1");
        ScenarioException w = assertThrows(ScenarioException.class, () -> ScenarioReader.parse(wrongRoute));
        assertTrue(w.getMessage().contains("flow.rmsVelocity is not used here"), w.getMessage());
    }
}
