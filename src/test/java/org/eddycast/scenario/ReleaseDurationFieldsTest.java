package org.eddycast.scenario;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/** release.duration: read with the mass in a channel, its mode named, refused elsewhere or beside a rate, written back. */
class ReleaseDurationFieldsTest {

    private static final String CHANNEL = """
            { "version": 1, "name": "fed dye",
              "flow": { "kind": "channel", "depth": 1.0, "width": 5.0, "meanVelocity": 0.4, "bedSlope": 2.0e-4 },
              "substance": { "molecularDiffusivity": 4.0e-10 },
              "release": { RELEASE } }
            """;

    private static String channel(String release) {
        return CHANNEL.replace("RELEASE", release);
    }

    @Test
    void theModeFollowsWhatWasGiven() {
        assertEquals(Release.SLUG, ScenarioReader.parse(channel("\"mass\": 0.1")).release().mode());
        Release fed = ScenarioReader.parse(channel("\"mass\": 0.1, \"duration\": 600")).release();
        assertEquals(Release.OVER_DURATION, fed.mode());
        assertEquals(600, fed.duration());
        assertEquals(Release.CONTINUOUS, ScenarioReader.parse(channel("\"mass\": 0.1, \"rate\": 1e-3")).release()
                .mode());
        Scenario again = ScenarioReader.parse(ScenarioWriter.text(ScenarioReader.parse(
                channel("\"mass\": 0.1, \"duration\": 600"))));
        assertEquals(600, again.release().duration());
        assertEquals(Release.OVER_DURATION, again.release().mode());
    }

    @Test
    void refusedWhereItDoesNotApplyWithWhatWouldBeValid() {
        ScenarioException e = assertThrows(ScenarioException.class,
                () -> ScenarioReader.parse(channel("\"mass\": 0.1, \"duration\": -5")));
        assertTrue(e.getMessage().contains("release.duration must be between 0 (exclusive) and 1e+07 s"),
                e.getMessage());
        e = assertThrows(ScenarioException.class,
                () -> ScenarioReader.parse(channel("\"mass\": 0.1, \"rate\": 1e-3, \"duration\": 60")));
        assertTrue(e.getMessage().contains("release.duration and release.rate"), e.getMessage());
        e = assertThrows(ScenarioException.class, () -> ScenarioReader.parse(channel("\"duration\": 60")));
        assertTrue(e.getMessage().contains("release.mass is missing: a release over release.duration"),
                e.getMessage());
        String tank = """
                { "version": 1, "name": "fed tank",
                  "flow": { "kind": "tank", "tankDiameter": 2, "liquidHeight": 2, "impellerDiameter": 0.7,
                            "impellerSpeed": 1.5, "impellerType": "pitched-blade" },
                  "substance": { "molecularDiffusivity": 1e-9 }, "release": { "mass": 1, "duration": 60 } }""";
        e = assertThrows(ScenarioException.class, () -> ScenarioReader.parse(tank));
        assertTrue(e.getMessage().contains("release.duration (a constant rate over a stated time) applies to a"
                + " channel only"), e.getMessage());
    }
}
