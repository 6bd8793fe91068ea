package org.eddycast.docs;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.ObjectMapper;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.stream.Stream;
import org.eddycast.engine.Engine;
import org.eddycast.engine.StudyResult;
import org.eddycast.particles.Cancellation;
import org.eddycast.particles.RunListener;
import org.eddycast.scenario.ScenarioReader;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * Every preset's result sits in the range its own description claims ("Expected: the ... comes out between
 * ... and ..."). The presets run with 1,024 particles instead of their own count, with their own fixed seeds,
 * to keep the suite short (the same reduced runs as the engine's preset test, so the simulation cache shares
 * them). Why the claimed ranges are wide enough for that: at 1,024 particles the printed 95% intervals of these
 * presets are at most about +-26% of the value (a standard error near 13%, smaller for a mean over three axes
 * and for mixing figures, whose intervals come from the same diffusivities), and every claimed range reaches at
 * least 28% on each side of the reduced estimate (and, for the two verification flows, of the exact value), so
 * more than two standard errors of the reduced run; a full-size run, with a far smaller error, lands inside
 * whenever it agrees with the reduced one. Each claim is an outside estimate stated in the preset's description
 * (a handbook formula or an analytic value with its stated uncertainty); every outcome goes into the validation
 * record. A claim the tool is known not to meet says so in its description ("Known gap:") and in the limits
 * chapter: it is recorded as a finding, never widened to pass.
 */
class PresetClaimsTest {
    // Every preset runs end to end here too (the engine, the forecast and its cautions), so no separate run test.

    private static final int PARTICLES = 1024;

    static Stream<Path> presets() throws Exception {
        return Files.list(Path.of("presets")).filter(p -> p.toString().endsWith(".json")).sorted();
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("presets")
    void resultSitsInTheClaimedRange(Path preset) throws Exception {
        String text = Files.readString(preset);
        PresetClaim claim = PresetClaim.parse(new ObjectMapper().readTree(text).path("description").asText());
        String reduced = text.replaceAll("\"particles\": \\d+", "\"particles\": " + PARTICLES);
        StudyResult r = Engine.run(ScenarioReader.parse(reduced, preset.toAbsolutePath().getParent()), 2,
                RunListener.NONE, new Cancellation());
        for (var a : r.diffusivity().axes()) {
            assertTrue(a.diffusivity().value() > 0 && Double.isFinite(a.diffusivity().value()),
                    preset.getFileName() + " axis " + a.axisName());
        }
        assertFalse(r.forecast().cautions().isEmpty(), "every forecast carries the cautions");
        assertTrue(r.forecast().width()[0][r.forecast().times().length - 1] > 0, "a forecast width");
        double value = claim.valueOf(r);
        boolean met = claim.low() <= value && value <= claim.high();
        String description = new ObjectMapper().readTree(text).path("description").asText();
        boolean knownGap = description.contains("Known gap:");
        ValidationLog.statistical("preset " + preset.getFileName() + ": " + claim.quantity(),
                "the outside estimate stated in the preset's description", Math.sqrt(claim.low() * claim.high()),
                value, Double.NaN, Double.NaN, claim.low(), claim.high(), knownGap
                        ? "within the claimed range; a known gap, stated in the description and the limits chapter"
                        : "within the claimed range", met);
        if (!knownGap) {
            assertTrue(met, preset.getFileName() + ": " + claim.quantity() + " = " + value + " " + claim.unit()
                    + ", claimed between " + claim.low() + " and " + claim.high());
        }
    }

    @Test
    void claimsAreReadFromTheDescription() {
        PresetClaim c = PresetClaim.parse("Question? Expected: the blend time comes out between 170 and 370 s.");
        assertEquals("blend time", c.quantity());
        assertEquals(170, c.low());
        assertEquals(370, c.high());
        assertThrows(IllegalArgumentException.class, () -> PresetClaim.parse("No claim here."));
        assertThrows(IllegalArgumentException.class,
                () -> PresetClaim.parse("Expected: the blend time comes out between 3 and 1 s."));
    }
}
