package org.eddycast.reliability;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Locale;
import org.eddycast.engine.CaseBuilder;
import org.eddycast.engine.DiffusivityResult;
import org.eddycast.engine.DiffusivityStudy;
import org.eddycast.engine.DimensionlessCase;
import org.eddycast.engine.Engine;
import org.eddycast.engine.Scales;
import org.eddycast.field.PowerLawBand;
import org.eddycast.field.RandomFourierModel;
import org.eddycast.field.SpectrumTable;
import org.eddycast.particles.Cancellation;
import org.eddycast.particles.Integrator;
import org.eddycast.particles.NumericalBlowupException;
import org.eddycast.particles.RunListener;
import org.eddycast.scenario.Scenario;
import org.eddycast.scenario.ScenarioReader;
import org.junit.jupiter.api.Test;

/**
 * Numerical guards: a time step too large for the flow is warned about before the run (Engine.preflight), and
 * a run whose particles leave the finite numbers stops with a message saying what to change.
 */
class NumericalGuardsTest {

    /** A small invented direct flow (a stirred basin); the time step is filled in per test. */
    static String scenario(String timeStep, String integrator) {
        return String.format(Locale.ROOT, """
                { "version": 1, "name": "guard check",
                  "flow": { "kind": "direct", "dimensions": 3, "rmsVelocity": 0.04, "integralLength": 0.2,
                            "correlationTime": 5.0 },
                  "substance": { "molecularDiffusivity": 1.0e-9 },
                  "simulation": { "particles": 128, "groupSize": 64, "modes": 16, "integrator": "%s",
                                  %s "duration": 20, "seed": 3 } }
                """, integrator, timeStep.isEmpty() ? "" : "\"timeStep\": " + timeStep + ",");
    }

    /** The field's shortest time scale in seconds, as the engine sees it. */
    private static double shortestSeconds(Scenario s) {
        DimensionlessCase c = Engine.dimensionlessCase(s);
        return c.model().shortestTimeScale() * c.scales().time();
    }

    @Test
    void preflightWarnsJustAboveTheStatedFractionOfTheShortestTimeScale() {
        double shortest = shortestSeconds(ScenarioReader.parse(scenario("", "strang")));
        double below = 0.99 * CaseBuilder.MAX_STEP_FRACTION * shortest;
        double above = 1.01 * CaseBuilder.MAX_STEP_FRACTION * shortest;
        assertEquals(List.of(), Engine.preflight(ScenarioReader.parse(scenario(Double.toString(below), "strang"))));
        List<String> warnings = Engine.preflight(ScenarioReader.parse(scenario(Double.toString(above), "strang")));
        assertEquals(1, warnings.size(), warnings.toString());
        String w = warnings.get(0);
        assertTrue(w.startsWith("simulation.timeStep "), w);
        assertTrue(w.contains(String.format(Locale.ROOT, "use a time step below %.3g s",
                CaseBuilder.DEFAULT_STEP_FRACTION * shortest)), w);
    }

    @Test
    void aTimeStepLeftOutIsChosenSafelyAndNotWarnedAbout() {
        assertEquals(List.of(), Engine.preflight(ScenarioReader.parse(scenario("", "euler"))));
    }

    /** What preflight says before the run, the run says after it: the same check, not a second opinion. */
    @Test
    void theRunReportsTheTimeStepThePreflightWarnedAbout() {
        Scenario s = ScenarioReader.parse(scenario("1.0", "strang"));
        assertEquals(1, Engine.preflight(s).size());
        DiffusivityResult r = DiffusivityStudy.run(Engine.dimensionlessCase(s), 1, RunListener.NONE,
                new Cancellation());
        assertTrue(r.warnings().stream().anyMatch(w -> w.contains("time-step bias")), r.warnings().toString());
    }

    /**
     * The Euler scheme with an absurd step: positions overflow to infinity within a few steps, and the run
     * stops with the step it reached and the step to use instead, rather than returning a number.
     */
    @Test
    void aBlownUpRunStopsWithAMessageSayingWhatToChange() {
        SpectrumTable table = new SpectrumTable(new PowerLawBand(-5.0 / 3.0, 16), 3, 16);
        RandomFourierModel model = new RandomFourierModel(table, 1.0, "test");
        double absurd = 1e200;
        DimensionlessCase c = new DimensionlessCase(model, Integrator.EULER_MARUYAMA, new double[] {0.01, 0.01, 0.01},
                absurd, 20, 64, 128, 128, Double.NaN, 5, new Scales(1, 1), 1, 100, List.of(), "blow-up");
        NumericalBlowupException e = assertThrows(NumericalBlowupException.class,
                () -> DiffusivityStudy.run(c, 2, RunListener.NONE, new Cancellation()));
        String m = e.getMessage();
        assertTrue(m.contains("stopped being finite numbers"), m);
        assertTrue(m.contains("simulation.timeStep"), m);
        assertTrue(m.contains("far too large for this flow"), m);
        assertTrue(m.contains(String.format(Locale.ROOT, "use a time step below %.3g", 0.1 * model.shortestTimeScale())),
                m);
        assertTrue(Engine.preflight(ScenarioReader.parse(scenario("1.25", "euler"))).size() == 1,
                "preflight warns about such a step first");
    }
}
