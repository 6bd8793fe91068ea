package org.eddycast.scenario;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/** The stations, limits, dose target, display units and release volume: read, refused with a clear message, written back. */
class StationFieldsTest {

    private static final String CHANNEL = """
            { "version": 1, "name": "stations",
              "flow": { "kind": "channel", "depth": 1.0, "width": 5.0, "meanVelocity": 0.4, "bedSlope": 2.0e-4 },
              "substance": { "molecularDiffusivity": 4.0e-10 },
              "release": { "mass": 0.01, "volume": 0.0005 },
              "forecast": { "stations": [ { "distance": 150 }, { "distance": 300, "across": 1.5 } ],
                            "detectionLimit": 1.0e-7, "targetPeak": 2.0e-5,
                            "cap": { "distance": 500, "concentration": 1.0e-5 },
                            "units": { "concentration": "ug/L", "time": "min", "distance": "km" } },
              "simulation": { "particles": 1024, "seed": 1 } }
            """;

    @Test
    void readsAndWritesBackEveryField() {
        Scenario s = ScenarioReader.parse(CHANNEL);
        ForecastSettings f = s.forecast();
        assertEquals(2, f.stations().size());
        assertTrue(Double.isNaN(f.stations().get(0).across()));
        assertEquals(1.5, f.stations().get(1).across());
        assertEquals(1e-7, f.detectionLimit());
        assertEquals(2e-5, f.targetPeak());
        assertEquals(new ConcentrationCap(500, 1e-5), f.cap());
        assertEquals(new DisplayUnits("ug/L", "min", "km"), f.units());
        assertEquals(20.0, s.release().stockConcentration(), 1e-12, "0.01 kg in 0.0005 m^3");
        assertTrue(s.release().given());
        Scenario again = ScenarioReader.parse(ScenarioWriter.text(s));
        assertEquals(f, again.forecast());
        assertEquals(s.release().volume(), again.release().volume());
    }

    @Test
    void aScenarioWithoutReleaseIsMarkedAssumed() {
        Scenario s = ScenarioReader.parse(CHANNEL.replaceAll("\"release\": \\{[^}]*\\},", ""));
        assertFalse(s.release().given());
        assertEquals(1.0, s.release().mass());
        assertFalse(ScenarioReader.parse(ScenarioWriter.text(s)).release().given(), "stays assumed when written");
    }

    @Test
    void badFieldsAreNamedWithWhatWouldBeValid() {
        String across = CHANNEL.replace("\"across\": 1.5", "\"across\": 7");
        ScenarioException e = assertThrows(ScenarioException.class, () -> ScenarioReader.parse(across));
        assertTrue(e.getMessage().contains("forecast.stations[1].across must be between 0 and the surface width"),
                e.getMessage());
        String target = CHANNEL.replace("\"stations\": [ { \"distance\": 150 }, { \"distance\": 300, \"across\": 1.5 } ],",
                "");
        e = assertThrows(ScenarioException.class, () -> ScenarioReader.parse(target));
        assertTrue(e.getMessage().contains("forecast.targetPeak plans the dose for a peak at the first station"),
                e.getMessage());
        String unit = CHANNEL.replace("\"ug/L\"", "\"ppb\"");
        e = assertThrows(ScenarioException.class, () -> ScenarioReader.parse(unit));
        assertTrue(e.getMessage().contains("forecast.units.concentration must be one of kg/m3, mg/L, ug/L"),
                e.getMessage());
        String tank = """
                { "version": 1, "name": "tank", "flow": { "kind": "tank", "tankDiameter": 2, "liquidHeight": 2,
                  "impellerDiameter": 0.67, "impellerSpeed": 1.5, "impellerType": "pitched-blade", "baffled": true },
                  "substance": { "molecularDiffusivity": 1e-9 }, "forecast": { "stations": [ { "distance": 1 } ] } }""";
        e = assertThrows(ScenarioException.class, () -> ScenarioReader.parse(tank));
        assertTrue(e.getMessage().contains("forecast.stations applies to a channel only"), e.getMessage());
    }
}
