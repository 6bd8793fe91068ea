package org.eddycast.reliability;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import org.eddycast.scenario.Scenario;
import org.eddycast.scenario.ScenarioException;
import org.eddycast.scenario.ScenarioReader;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The reader refuses what a lenient JSON reader would let through silently: keys given twice, integers past 64
 * bits, fields that do not apply, a release outside the tank; it names the encoding of a file that is not
 * UTF-8 and accepts a UTF-8 byte-order mark; its messages are capped and free of raw control characters.
 */
class StrictScenarioReaderTest {

    static final String DIRECT = """
            { "version": 1, "name": "strict reader case",
              "flow": { "kind": "direct", "rmsVelocity": 0.1, "integralLength": 0.5, "correlationTime": 5 },
              "substance": { "molecularDiffusivity": 1e-9 }%s }""";

    static final String TANK = """
            { "version": 1, "name": "tank",
              "flow": { "kind": "tank", "tankDiameter": 1.5, "liquidHeight": 1.5, "impellerDiameter": 0.5,
                        "impellerSpeed": 2, "impellerType": "hydrofoil" },
              "substance": { "molecularDiffusivity": 1e-9 }%s }""";

    static final String CHANNEL = """
            { "version": 1, "name": "channel",
              "flow": { "kind": "channel", "depth": 1, "width": 10, "meanVelocity": 0.5, "shearVelocity": 0.05 },
              "substance": { "molecularDiffusivity": 1e-9 }%s }""";

    private static String refusal(String text) {
        return assertThrows(ScenarioException.class, () -> ScenarioReader.parse(text)).getMessage();
    }

    @Test
    void aKeyGivenTwiceIsRefusedWithItsPath() {
        String m = refusal(String.format(DIRECT, ", \"release\": { \"mass\": 1, \"mass\": 2 }"));
        assertTrue(m.contains("release.mass is given twice"), m);
        assertTrue(m.startsWith("line 3, column"), m);
    }

    @Test
    void integersPast64BitsAreRefusedNotWrappedOrClamped() {
        String particles = refusal(String.format(DIRECT, ", \"simulation\": { \"particles\": 18446744073709552128 }"));
        assertTrue(particles.contains("simulation.particles must be a whole number from 64 to"), particles);
        assertTrue(particles.contains("got 18446744073709552128"), particles);
        String version = refusal(String.format(DIRECT, "").replace("\"version\": 1", "\"version\": 18446744073709551617"));
        assertTrue(version.startsWith("version must be a whole number"), version);
        String seed = refusal(String.format(DIRECT, ", \"simulation\": { \"seed\": 1e30 }"));
        assertTrue(seed.contains("simulation.seed must be a whole number from " + Long.MIN_VALUE), seed);
        // the largest seed itself is fine
        Scenario s = ScenarioReader.parse(String.format(DIRECT, ", \"simulation\": { \"seed\": " + Long.MAX_VALUE
                + " }"));
        assertEquals(Long.MAX_VALUE, s.simulation().seed());
    }

    @Test
    void fieldsThatDoNotApplyAreRefusedWithWhatTheyApplyTo() {
        String eta = refusal(String.format(DIRECT, "").replace("\"correlationTime\": 5",
                "\"correlationTime\": 5, \"spectrum\": { \"model\": \"power-law\", \"kolmogorovLength\": 0.001 }"));
        assertTrue(eta.contains("flow.spectrum.kolmogorovLength applies to the model spectrum only"), eta);
        String slope = refusal(String.format(DIRECT, "").replace("\"correlationTime\": 5",
                "\"correlationTime\": 5, \"spectrum\": { \"model\": \"model\", \"kolmogorovLength\": 0.001, "
                        + "\"slope\": -2 }"));
        assertTrue(slope.contains("flow.spectrum.slope applies to the power-law spectrum only"), slope);
        String location = refusal(String.format(TANK, ", \"release\": { \"location\": \"bank\" }"));
        assertTrue(location.contains("release.location applies to a channel only"), location);
        String position = refusal(String.format(CHANNEL, ", \"release\": { \"position\": { \"x\": 1, \"y\": 1, "
                + "\"z\": 0.5 } }"));
        assertTrue(position.contains("release.position applies to a tank only"), position);
        String rateInTank = refusal(String.format(TANK, ", \"release\": { \"rate\": 0.1 }"));
        assertTrue(rateInTank.contains("release.rate (a continuous source) applies to a channel only"), rateInTank);
        String rateAlone = refusal(String.format(CHANNEL, ", \"release\": { \"rate\": 0.1 }"));
        assertTrue(rateAlone.contains("release.mass is missing"), rateAlone);
        ScenarioReader.parse(String.format(CHANNEL, ", \"release\": { \"rate\": 0.1, \"mass\": 2 }"));
    }

    @Test
    void aReleaseOutsideTheTankIsRefusedWithTheTanksSize() {
        String m = refusal(String.format(TANK, ", \"release\": { \"position\": { \"x\": 50, \"y\": 0.5, \"z\": 0.5 } }"));
        // the equivalent box: side 1.5 sqrt(pi) / 2 = 1.32934 m
        assertTrue(m.contains("release.position.x must be between 0 and 1.32934 m"), m);
        assertTrue(m.contains("got 50"), m);
        String z = refusal(String.format(TANK, ", \"release\": { \"position\": { \"x\": 1, \"y\": 1, \"z\": 1.6 } }"));
        assertTrue(z.contains("release.position.z must be between 0 and 1.5 m"), z);
        ScenarioReader.parse(String.format(TANK, ", \"release\": { \"position\": { \"x\": 1.3, \"y\": 0, \"z\": 1.5 } }"));
    }

    @Test
    void anUnknownFlowKindIsOneProblemNotACascade() {
        ScenarioException e = assertThrows(ScenarioException.class,
                () -> ScenarioReader.parse(String.format(DIRECT, "").replace("\"direct\"", "\"pond\"")));
        assertEquals(1, e.problems().size(), e.getMessage());
        assertTrue(e.getMessage().startsWith("flow.kind must be one of"), e.getMessage());
    }

    @Test
    void manyProblemsAreCappedAtTwentyThenCounted() {
        StringBuilder keys = new StringBuilder();
        for (int i = 0; i < 200_000; i++) {
            keys.append(", \"k").append(i).append("\": 1");
        }
        ScenarioException e = assertThrows(ScenarioException.class,
                () -> ScenarioReader.parse(String.format(DIRECT, keys)));
        assertEquals(200_000, e.problems().size());
        String[] lines = e.getMessage().split("\n");
        assertEquals(ScenarioException.MAX_LISTED + 1, lines.length);
        assertEquals("and 199980 more problems", lines[lines.length - 1]);
        assertTrue(e.getMessage().length() < 20_000, "message of " + e.getMessage().length() + " characters");
    }

    @Test
    void controlCharactersInMessagesAreEscaped() {
        String m = refusal(String.format(DIRECT, ", \"\\u001b[2J\\u0007\": 1"));
        assertFalse(m.chars().anyMatch(c -> c == 0x1b || c == 0x07), m);
        assertTrue(m.contains("\\u001b[2J\\u0007"), m);
    }

    @Test
    void subnormalNumbersAreRefusedByTheFieldNotBlamedOnAnother() {
        String velocity = refusal(String.format(DIRECT, "").replace("\"rmsVelocity\": 0.1", "\"rmsVelocity\": 1e-310"));
        assertTrue(velocity.startsWith("flow.rmsVelocity 1e-310 is too small to compute with"), velocity);
        String length = refusal(String.format(DIRECT, "").replace("\"integralLength\": 0.5",
                "\"integralLength\": 1e-310"));
        assertTrue(length.startsWith("flow.integralLength 1e-310 is too small to compute with"), length);
    }

    @Test
    void theRangeOfASlopeIsTheRangeAccepted() {
        String m = refusal(CHANNEL.formatted("").replace("\"shearVelocity\": 0.05", "\"bedSlope\": 1"));
        assertTrue(m.contains("flow.bedSlope must be between 0 and 1 (both exclusive) m/m; got 1"), m);
        String eta = refusal(String.format(DIRECT, "").replace("\"correlationTime\": 5",
                "\"correlationTime\": 5, \"spectrum\": { \"model\": \"model\", \"kolmogorovLength\": 0.1 }"));
        assertTrue(eta.contains("at most integralLength / 25 = 0.02 m"), eta);
    }

    @Test
    void encodingsOtherThanUtf8AreNamedAndTheByteOrderMarkIsAccepted(@TempDir Path dir) throws IOException {
        String text = String.format(DIRECT, "").replace("strict reader case", "Zürich weir");
        Path bom = dir.resolve("bom.json");
        Files.write(bom, concat(new byte[] {(byte) 0xEF, (byte) 0xBB, (byte) 0xBF}, text.getBytes(StandardCharsets.UTF_8)));
        assertEquals("Zürich weir", ScenarioReader.read(bom).name());

        Path latin = dir.resolve("latin.json");
        Files.write(latin, text.getBytes(StandardCharsets.ISO_8859_1));
        String m = assertThrows(IOException.class, () -> ScenarioReader.read(latin)).getMessage();
        assertTrue(m.contains("is not UTF-8 text: byte 0xFC on line 1"), m);
        assertTrue(m.contains("Latin-1"), m);

        Path utf16 = dir.resolve("utf16.json");
        Files.write(utf16, text.getBytes(StandardCharsets.UTF_16));
        m = assertThrows(IOException.class, () -> ScenarioReader.read(utf16)).getMessage();
        assertTrue(m.contains("UTF-16 text (big-endian byte-order mark FE FF)"), m);

        Path utf16le = dir.resolve("utf16le.json");
        Files.write(utf16le, text.getBytes(StandardCharsets.UTF_16LE));
        m = assertThrows(IOException.class, () -> ScenarioReader.read(utf16le)).getMessage();
        assertTrue(m.contains("UTF-16 text without a byte-order mark (little-endian)"), m);

        Path binary = dir.resolve("binary.json");
        Files.write(binary, new byte[] {0x50, 0x4b, 0x03, 0x04, 0x00, 0x14, 0x00, 0x00, 0x08, 0x00, 0x41, 0x42});
        m = assertThrows(IOException.class, () -> ScenarioReader.read(binary)).getMessage();
        assertTrue(m.contains("a binary file"), m);

        m = assertThrows(IOException.class, () -> ScenarioReader.read(dir)).getMessage();
        assertTrue(m.contains("is a folder, not a scenario file"), m);
    }

    static byte[] concat(byte[] a, byte[] b) {
        byte[] c = new byte[a.length + b.length];
        System.arraycopy(a, 0, c, 0, a.length);
        System.arraycopy(b, 0, c, a.length, b.length);
        return c;
    }
}
