package org.eddycast.reliability;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.eddycast.engine.DimensionlessCase;
import org.eddycast.engine.Engine;
import org.eddycast.scenario.ScenarioException;
import org.eddycast.scenario.ScenarioReader;
import org.junit.jupiter.api.Test;

/**
 * Run sizes are computed in 64 bits and held to the same limits whoever chose the time step and the duration:
 * a long correlation time with no duration given once made the engine choose 4e12 steps, which an int wrapped
 * to a short run without a word.
 */
class RunSizeTest {

    private static final String DIRECT = """
            { "version": 1, "name": "run size",
              "flow": { "kind": "direct", "rmsVelocity": 1, "integralLength": 1, "correlationTime": %s },
              "substance": { "molecularDiffusivity": 1e-3 }, "simulation": { %s } }""";

    /** The step count a message reports ("gives N steps"). */
    private static double stepsIn(String message) {
        java.util.regex.Matcher m = java.util.regex.Pattern.compile("gives (\\S+) steps").matcher(message);
        assertTrue(m.find(), message);
        return Double.parseDouble(m.group(1));
    }

    @Test
    void aDurationTheEngineChoseIsHeldToTheStepLimitAndSaysSo() {
        // tau = 1e7 s with L/u' = 1 s: duration 40 tau = 4e8 s at a step of 0.1 s is 4e9 steps
        ScenarioException e = assertThrows(ScenarioException.class,
                () -> Engine.dimensionlessCase(ScenarioReader.parse(DIRECT.formatted("1e7", "\"particles\": 256"))));
        String m = e.getMessage();
        assertTrue(m.contains("the duration the engine chose"), m);
        assertTrue(m.contains("steps; at most 1e+08 are allowed: give simulation.duration of at most"), m);
        // 4e8 s at the engine's step (a tenth of the shortest time scale, 0.0108 s) is 3.7e10 steps, not wrapped
        assertTrue(stepsIn(m) > 1e10, m);
    }

    @Test
    void stepCountsBeyondTheRangeOfAnIntAreReportedAsTheyAre() {
        // 4e11 s at the engine's step of about 0.01 s is about 4e13 steps (an int cast gave a wrapped count)
        String m = assertThrows(ScenarioException.class, () -> Engine.dimensionlessCase(ScenarioReader.parse(
                DIRECT.formatted("1", "\"particles\": 256, \"duration\": 4e11")))).getMessage();
        assertTrue(stepsIn(m) > 1e13, m);
        assertTrue(m.contains("simulation.duration 4e+11 s with the time step the engine chose"), m);
    }

    @Test
    void tooShortARunNamesTheFewestSteps() {
        String m = assertThrows(ScenarioException.class, () -> Engine.dimensionlessCase(ScenarioReader.parse(
                DIRECT.formatted("1", "\"particles\": 256, \"duration\": 0.1")))).getMessage();
        assertTrue(m.contains("at least 16 are allowed: give simulation.duration of at least"), m);
        assertTrue(stepsIn(m) < 16, m);
        String reader = assertThrows(ScenarioException.class, () -> ScenarioReader.parse(
                DIRECT.formatted("1", "\"timeStep\": 0.1, \"duration\": 0.2"))).getMessage();
        assertTrue(reader.contains("simulation.duration must be at least 16 time steps (1.6 s); got 0.2"), reader);
    }

    @Test
    void theShortestRunAllowedGivesAnEstimate() {
        // 16 steps: both windows of the estimator, [T/4, T/2] and [T/2, T], hold records (2 steps did not)
        org.eddycast.engine.StudyResult r = Engine.run(ScenarioReader.parse(DIRECT.formatted("1",
                "\"particles\": 256, \"modes\": 8, \"timeStep\": 0.01, \"duration\": 0.16")), 2,
                org.eddycast.particles.RunListener.NONE, new org.eddycast.particles.Cancellation());
        assertEquals(16, r.diffusivity().steps());
    }

    @Test
    void particlesRaisedToWholeBlocksAreNotedAndAGroupLargerThanTheRunIsRefused() {
        DimensionlessCase c = Engine.dimensionlessCase(ScenarioReader.parse(DIRECT.formatted("1",
                "\"particles\": 1000, \"groupSize\": 64")));
        assertTrue(c.notes().stream().anyMatch(n -> n.startsWith("particles raised from 1000 to 1024")),
                c.notes().toString());
        String m = assertThrows(ScenarioException.class, () -> ScenarioReader.parse(DIRECT.formatted("1",
                "\"particles\": 512, \"groupSize\": 65536"))).getMessage();
        assertEquals("simulation.groupSize must be at most simulation.particles (512): the particles would be raised"
                + " to whole groups, 131072 at least; got 65536", m);
    }
}
