package org.eddycast.scenario;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/** substance.decayRate and substance.halfLife: read, one of them at most, refused with the valid range, written back as given. */
class FirstOrderLossFieldsTest {

    private static String scenario(String loss) {
        return """
                { "version": 1, "name": "decaying dye",
                  "flow": { "kind": "direct", "dimensions": 3, "rmsVelocity": 0.04, "integralLength": 0.25 },
                  "substance": { "molecularDiffusivity": 4.0e-10 LOSS } }
                """.replace("LOSS", loss);
    }

    @Test
    void noneByDefault() {
        FirstOrderLoss loss = ScenarioReader.parse(scenario("")).substance().loss();
        assertFalse(loss.present());
        assertEquals(1.0, loss.remaining(1e6), 0);
    }

    @Test
    void aRateAndAHalfLifeAreTheSameLoss() {
        FirstOrderLoss byRate = ScenarioReader.parse(scenario(", \"decayRate\": 1.0e-4")).substance().loss();
        FirstOrderLoss byHalf = ScenarioReader.parse(scenario(", \"halfLife\": 6931.4718056")).substance().loss();
        assertEquals(1.0e-4, byRate.rate(), 0);
        // half-life = ln 2 / k, the solution of dc/dt = -k c reaching c0 / 2
        assertEquals(1.0e-4, byHalf.rate(), 1e-12);
        assertEquals(0.5, byHalf.remaining(6931.4718056), 1e-12);
        assertEquals(byRate.halfLife(), byHalf.halfLife(), 1e-6);
    }

    @Test
    void writtenBackAsTheUserGaveIt() {
        for (String loss : new String[] {", \"decayRate\": 3.3e-5", ", \"halfLife\": 5400.5"}) {
            Scenario s = ScenarioReader.parse(scenario(loss));
            String written = ScenarioWriter.text(s);
            assertTrue(written.contains(loss.substring(3, loss.indexOf(':') - 1)), written);
            assertEquals(s.substance(), ScenarioReader.parse(written).substance());
        }
        assertFalse(ScenarioWriter.text(ScenarioReader.parse(scenario(""))).contains("decayRate"));
        assertFalse(ScenarioWriter.text(ScenarioReader.parse(scenario(""))).contains("halfLife"));
    }

    @Test
    void badValuesAreNamedWithTheValidRange() {
        ScenarioException both = assertThrows(ScenarioException.class,
                () -> ScenarioReader.parse(scenario(", \"decayRate\": 1e-4, \"halfLife\": 600")));
        assertTrue(both.getMessage().contains("substance.decayRate and substance.halfLife both give the first-order"
                + " loss: keep one"), both.getMessage());
        ScenarioException negative = assertThrows(ScenarioException.class,
                () -> ScenarioReader.parse(scenario(", \"decayRate\": -1e-4")));
        assertTrue(negative.getMessage().contains("substance.decayRate must be between 0 (exclusive) and 10 1/s"),
                negative.getMessage());
        ScenarioException zero = assertThrows(ScenarioException.class,
                () -> ScenarioReader.parse(scenario(", \"halfLife\": 0")));
        assertTrue(zero.getMessage().contains("substance.halfLife must be >= 0.0693147 s"), zero.getMessage());
        ScenarioException text = assertThrows(ScenarioException.class,
                () -> ScenarioReader.parse(scenario(", \"halfLife\": \"2 h\"")));
        assertTrue(text.getMessage().contains("substance.halfLife must be a number"), text.getMessage());
    }
}
