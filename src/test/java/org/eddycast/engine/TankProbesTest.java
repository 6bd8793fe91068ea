package org.eddycast.engine;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import org.eddycast.scenario.Scenario;
import org.eddycast.scenario.ScenarioException;
import org.eddycast.scenario.ScenarioReader;
import org.eddycast.scenario.ScenarioWriter;
import org.eddycast.scenario.TankFlow;
import org.junit.jupiter.api.Test;

/** Probes the user places in a tank: read, written back, placed in the tank's own units, refused elsewhere. */
class TankProbesTest {

    private static final String TANK = """
            { "version": 1, "name": "probes", "flow": { "kind": "tank", "tankDiameter": 2, "liquidHeight": 2,
              "impellerDiameter": 0.67, "impellerSpeed": 1.5, "impellerType": "pitched-blade" },
              "substance": { "molecularDiffusivity": 1e-9 },
              "forecast": { "probes": [ %s ] } }""";

    @Test
    void probesArePlacedAsTheFeedPointIs() {
        // the axis stands at half the side of the square of the cross-section area: T sqrt(pi) / 4 = 0.8862 m
        double half = 2 * Math.sqrt(Math.PI) / 4;
        Scenario s = ScenarioReader.parse(TANK.formatted(
                "{ \"x\": %s, \"y\": %s, \"z\": 1.0 }, { \"x\": 0.0, \"y\": 0.0, \"z\": 1.9 }".formatted(half, half)));
        List<String> names = new ArrayList<>();
        List<double[]> probes = new ArrayList<>();
        TankStudy.probes(s, ((TankFlow) s.flow()).design(), new double[] {0, 0, 0.9}, names, probes);
        assertEquals(2, probes.size());
        assertEquals(0, probes.get(0)[0], 1e-12);
        assertEquals(0, probes.get(0)[1], 1e-12);
        assertEquals(0.5, probes.get(0)[2], 1e-12, "z in tank diameters");
        // the corner of the square lies outside the cylinder: moved in to a probe's radius from the wall and
        // from the surface
        double[] corner = probes.get(1);
        assertEquals(0.5 - TankStudy.PROBE_RADIUS, Math.hypot(corner[0], corner[1]), 1e-12);
        assertEquals(1 - TankStudy.PROBE_RADIUS, corner[2], 1e-12);
        Scenario again = ScenarioReader.parse(ScenarioWriter.text(s));
        assertEquals(s.forecast().probes(), again.forecast().probes());
    }

    @Test
    void probesBelongToTanksOnly() {
        ScenarioException e = assertThrows(ScenarioException.class, () -> ScenarioReader.parse("""
                { "version": 1, "name": "p", "flow": { "kind": "channel", "depth": 1, "width": 6, "meanVelocity": 0.4,
                  "bedSlope": 1e-4 }, "substance": { "molecularDiffusivity": 1e-9 },
                  "forecast": { "probes": [ { "x": 1, "y": 1, "z": 0.5 } ] } }"""));
        assertTrue(e.getMessage().contains("forecast.probes applies to a tank only"), e.getMessage());
    }
}
