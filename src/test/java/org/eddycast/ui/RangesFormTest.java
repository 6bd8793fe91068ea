package org.eddycast.ui;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import javax.swing.SwingUtilities;
import org.eddycast.scenario.InputRange;
import org.eddycast.scenario.Scenario;
import org.eddycast.scenario.ScenarioReader;
import org.eddycast.scenario.ScenarioWriter;
import org.junit.jupiter.api.Test;

/** Input ranges in the form: typed as lines, read into the scenario, loaded back from a file, faults by line. */
class RangesFormTest {

    @Test
    void rangesTypedInTheFormReachTheScenarioAndComeBackFromItsFile() throws Exception {
        Scenario preset = ScenarioReader.read(Path.of("presets/lowland-channel-dye.json"));
        ScenarioForm.Check[] check = new ScenarioForm.Check[1];
        String[] shown = new String[1];
        SwingUtilities.invokeAndWait(() -> {
            ScenarioForm form = new ScenarioForm();
            form.load(preset.withUncertainty(org.eddycast.scenario.UncertaintySettings.none()), Path.of("presets"));
            form.setValue("uncertainty.ranges", """
                    flow.bedSlope +-25%   # surveyed to one figure
                    flow.meanVelocity 0.40 to 0.50
                    flow.depth normal 1.2 0.05
                    flow.width log-normal 6 1.05
                    release.mass triangular 0.004 0.005 0.007
                    """);
            check[0] = form.lastCheck();
            // a scenario read from its file shows its ranges as the same lines
            ScenarioForm again = new ScenarioForm();
            again.load(check[0].scenario(), Path.of("presets"));
            shown[0] = ScenarioWriter.text(again.check().scenario());
        });
        assertNotNull(check[0].scenario(), check[0]::toString);
        var ranges = check[0].scenario().uncertainty().ranges();
        assertEquals(5, ranges.size());
        assertEquals(new InputRange("flow.bedSlope", InputRange.Shape.PLUS_MINUS, 0.25, Double.NaN, Double.NaN,
                "surveyed to one figure"), ranges.get(0));
        assertEquals(InputRange.Shape.UNIFORM, ranges.get(1).shape());
        assertEquals(0.40, ranges.get(1).a());
        assertEquals(InputRange.Shape.NORMAL, ranges.get(2).shape());
        assertEquals(InputRange.Shape.LOG_NORMAL, ranges.get(3).shape());
        assertEquals(InputRange.Shape.TRIANGULAR, ranges.get(4).shape());
        assertEquals(0.007, ranges.get(4).c());
        assertEquals(ScenarioWriter.text(check[0].scenario()), shown[0]);
    }

    @Test
    void aBadLineOrAnInputTheScenarioLacksIsShownUnderTheRangesByItsLine() throws Exception {
        Scenario preset = ScenarioReader.read(Path.of("presets/lowland-channel-dye.json"));
        ScenarioForm.Check[] check = new ScenarioForm.Check[2];
        SwingUtilities.invokeAndWait(() -> {
            ScenarioForm form = new ScenarioForm();
            form.load(preset, Path.of("presets"));
            form.setValue("uncertainty.ranges", "flow.bedSlope +-25%\nflow.depth about 1.2\n");
            check[0] = form.lastCheck();
            form.setValue("uncertainty.ranges", "flow.impellerSpeed +-5%\n");
            check[1] = form.lastCheck();
        });
        assertNull(check[0].scenario());
        String problem = check[0].fieldProblems().get("uncertainty.ranges");
        assertTrue(problem.contains("line 2") && problem.contains("about"), problem);
        problem = check[1].fieldProblems().get("uncertainty.ranges");
        assertNotNull(problem, check[1]::toString);
        assertTrue(problem.contains("flow.impellerSpeed") && problem.contains("not in this scenario"), problem);
    }
}
