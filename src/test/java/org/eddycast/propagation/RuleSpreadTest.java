package org.eddycast.propagation;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import org.eddycast.scenario.ScenarioException;
import org.eddycast.scenario.ScenarioReader;
import org.eddycast.uncertainty.UniformRange;
import org.junit.jupiter.api.Test;

/**
 * A range may take the spread a rule's source states: a tank's typical power number 1.27 for a 45-degree
 * pitched-blade turbine varies by 10 to 20% in published data (Hemrajani &amp; Tatterson 2004, Handbook of
 * Industrial Mixing, ch. 6, from memory), read as +-15% about the rule's value.
 */
class RuleSpreadTest {

    private static final String TANK = """
            { "version": 1, "name": "tank",
              "flow": { "kind": "tank", "tankDiameter": 2.0, "liquidHeight": 2.0, "impellerDiameter": 0.67,
                        "impellerSpeed": 1.5, "impellerType": "pitched-blade", "baffled": true },
              "substance": { "molecularDiffusivity": 1e-9 },
              "uncertainty": { "ranges": [ { "input": "flow.powerNumber", "spread": "rule" },
                                           { "input": "flow.clearance", "plusMinus": 0.1 } ] } }
            """;

    @Test
    void theRulesSpreadRangesTheRulesValueWithTheRulesBasis() {
        SweepPlan plan = new SweepPlan(ScenarioReader.parse(TANK, Path.of(".")));
        assertEquals(new UniformRange(1.27 * 0.85, 1.27 * 1.15), plan.distributions().get(0));
        // a clearance left to the rules is ranged about the rule's T/3
        assertEquals(new UniformRange(2.0 / 3 * 0.9, 2.0 / 3 * 1.1), plan.distributions().get(1));
        double[] centre = plan.point(plan.centreRow());
        assertEquals(1.27, centre[0], 0.0);
        assertEquals(1.27, plan.scenarioAt(plan.centreRow()).flow() instanceof org.eddycast.scenario.TankFlow t
                ? t.design().powerNumber() : Double.NaN, 0.0);
    }

    @Test
    void aRuleWithoutAStatedSpreadIsRefusedNamingThoseThatHaveOne() {
        String channel = """
                { "version": 1, "name": "channel",
                  "flow": { "kind": "channel", "depth": 1.2, "width": 6, "meanVelocity": 0.45, "bedSlope": 2e-4 },
                  "substance": { "molecularDiffusivity": 1e-9 },
                  "uncertainty": { "ranges": [ { "input": "flow.bedSlope", "spread": "rule" } ] } }
                """;
        ScenarioException e = assertThrows(ScenarioException.class,
                () -> new SweepPlan(ScenarioReader.parse(channel, Path.of("."))));
        assertTrue(e.getMessage().contains("flow.powerNumber, flow.pumpingNumber"), e.getMessage());
    }
}
