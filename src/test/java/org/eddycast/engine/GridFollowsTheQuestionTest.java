package org.eddycast.engine;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.eddycast.forecast.Forecast;
import org.eddycast.particles.Cancellation;
import org.eddycast.particles.RunListener;
import org.eddycast.scenario.ScenarioException;
import org.eddycast.scenario.ScenarioReader;
import org.eddycast.scenario.ScenarioWriter;
import org.junit.jupiter.api.Test;

/**
 * The forecast grid follows the scenario's question: it starts at the first recorded step (no point nearer the
 * release than the run resolved), runs out to the furthest station and to the horizon given as a distance, and
 * holds every station's distance as a grid point.
 */
class GridFollowsTheQuestionTest {

    private static final String CHANNEL = """
            { "version": 1, "name": "a reach with a far question",
              "flow": { "kind": "channel", "depth": 1.0, "width": 5.0, "meanVelocity": 0.4, "bedSlope": 2.0e-4 },
              "substance": { "molecularDiffusivity": 4.0e-10 },
              "release": { "mass": 0.01 },
              "forecast": { "stations": [ { "distance": 37 }, { "distance": 150 } ] HORIZON },
              "simulation": { "particles": 1024, "seed": 3 } }
            """;

    @Test
    void theGridRunsToTheStationsAndTheReachAndHoldsThem() {
        StudyResult r = Engine.run(ScenarioReader.parse(CHANNEL.replace("HORIZON", ", \"horizonDistance\": 400")), 2,
                RunListener.NONE, new Cancellation());
        Forecast f = r.forecast();
        double[] grid = f.grid();
        assertEquals(400, grid[grid.length - 1], 1e-9, "the reach given as a distance ends the grid");
        for (double station : new double[] {37, 150}) {
            boolean on = false;
            for (double x : grid) {
                on |= Math.abs(x - station) < 1e-9 * station;
            }
            assertTrue(on, "station " + station + " m is a grid point");
        }
        for (int j = 1; j < grid.length; j++) {
            assertTrue(grid[j] > grid[j - 1], "the grid rises at " + j);
        }
        // no point nearer the release than the first recorded step of the transport stage
        double firstRecord = ((org.eddycast.transport.ChannelStageResult) r.transport()).times()[0];
        assertTrue(f.times()[0] >= firstRecord, f.times()[0] + " before the first record " + firstRecord);
        assertEquals(0.4 * f.times()[0], grid[0], 1e-12);
    }

    @Test
    void withoutAHorizonTheGridStillReachesTheFurthestStation() {
        StudyResult r = Engine.run(ScenarioReader.parse(CHANNEL.replace("HORIZON", "")
                .replace("{ \"distance\": 150 }", "{ \"distance\": 600 }")), 2, RunListener.NONE, new Cancellation());
        double[] grid = r.forecast().grid();
        assertTrue(grid[grid.length - 1] >= 600 - 1e-9, "grid ends at " + grid[grid.length - 1]);
    }

    @Test
    void theReachIsReadWrittenAndRefusedWhereItDoesNotApply() {
        String text = CHANNEL.replace("HORIZON", ", \"horizonDistance\": 400");
        assertEquals(400, ScenarioReader.parse(ScenarioWriter.text(ScenarioReader.parse(text))).forecast()
                .horizonDistance());
        ScenarioException both = assertThrows(ScenarioException.class, () -> ScenarioReader.parse(
                CHANNEL.replace("HORIZON", ", \"horizonDistance\": 400, \"horizon\": 900")));
        assertTrue(both.getMessage().contains("forecast.horizon and forecast.horizonDistance both set"),
                both.getMessage());
        String direct = """
                { "version": 1, "name": "x", "flow": { "kind": "direct", "rmsVelocity": 0.04, "integralLength": 0.25 },
                  "substance": { "molecularDiffusivity": 1e-9 }, "forecast": { "horizonDistance": 10 } }""";
        ScenarioException elsewhere = assertThrows(ScenarioException.class, () -> ScenarioReader.parse(direct));
        assertTrue(elsewhere.getMessage().contains("forecast.horizonDistance applies to a channel only"),
                elsewhere.getMessage());
    }
}
