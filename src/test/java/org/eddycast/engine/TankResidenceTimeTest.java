package org.eddycast.engine;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Locale;
import org.eddycast.forecast.Forecast;
import org.eddycast.particles.Cancellation;
import org.eddycast.particles.RunListener;
import org.eddycast.scenario.ScenarioReader;
import org.eddycast.transport.TankStageResult;
import org.junit.jupiter.api.Test;

/**
 * A continuously fed tank: its mean residence time V / Q_in beside the 95% blend time, against the guideline
 * that it should be at least ten blend times for near-ideal mixing (Roussinova &amp; Kresta 2008, "Comparison of
 * continuous blend time and residence time distribution models for a stirred tank", Ind. Eng. Chem. Res.
 * 47:3532).
 */
class TankResidenceTimeTest {

    @Test
    void residenceTimeIsSetBesideTheBlendTime() {
        StudyResult r = Engine.run(ScenarioReader.parse("""
                { "version": 1, "name": "fed tank", "flow": { "kind": "tank", "tankDiameter": 2, "liquidHeight": 2,
                  "impellerDiameter": 0.67, "impellerSpeed": 1.5, "impellerType": "pitched-blade",
                  "throughflow": 0.02 }, "substance": { "molecularDiffusivity": 1e-9 }, "release": { "mass": 1 },
                  "simulation": { "particles": 1024, "seed": 4 } }"""), 2, RunListener.NONE, new Cancellation());
        double volume = Math.PI * 2 * 2 / 4 * 2;
        Forecast.MixingFigure residence = r.forecast().mixing().stream()
                .filter(m -> m.name().startsWith("mean residence time")).findFirst().orElseThrow();
        assertEquals(volume / 0.02, residence.value(), 1e-9 * residence.value());
        double blend = ((TankStageResult) r.transport()).blendTime95().value();
        String ratio = String.format(Locale.ROOT, "%.3g times the 95%% blend time", volume / 0.02 / blend);
        assertTrue(r.forecast().assumptions().stream().anyMatch(a -> a.contains(ratio)
                && a.contains(volume / 0.02 / blend < 10 ? "WARNING" : "near-ideal")), r.forecast().assumptions()
                .toString());
    }
}
