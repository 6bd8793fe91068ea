package org.eddycast.engine;

import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.stream.Stream;
import org.eddycast.particles.Cancellation;
import org.eddycast.particles.RunListener;
import org.eddycast.scenario.Scenario;
import org.eddycast.scenario.ScenarioReader;
import org.eddycast.stats.AxisEstimate;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

/** Every bundled preset runs end to end (with fewer particles, to keep the suite short) and forecasts. */
class PresetsRunTest {

    static Stream<Path> presets() throws Exception {
        return Files.list(Path.of("presets")).filter(p -> p.toString().endsWith(".json")).sorted();
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("presets")
    void runsAndForecasts(Path preset) throws Exception {
        String text = Files.readString(preset).replaceAll("\"particles\": \\d+", "\"particles\": 1024");
        Scenario s = ScenarioReader.parse(text, preset.toAbsolutePath().getParent());
        StudyResult r = Engine.run(s, 2, RunListener.NONE, new Cancellation());
        for (AxisEstimate a : r.diffusivity().axes()) {
            assertTrue(a.diffusivity().value() > 0 && Double.isFinite(a.diffusivity().value()),
                    preset + " axis " + a.axisName());
        }
        assertFalse(r.forecast().cautions().isEmpty());
        assertTrue(r.forecast().width()[0][r.forecast().times().length - 1] > 0);
    }
}
