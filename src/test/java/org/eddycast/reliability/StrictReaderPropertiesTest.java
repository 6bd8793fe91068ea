package org.eddycast.reliability;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.math.BigInteger;
import java.nio.charset.Charset;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Iterator;
import java.util.List;
import java.util.Map;
import java.util.stream.Stream;
import net.jqwik.api.Arbitraries;
import net.jqwik.api.Arbitrary;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.Provide;
import net.jqwik.api.constraints.IntRange;
import org.eddycast.scenario.ReleasePlacement;
import org.eddycast.scenario.Scenario;
import org.eddycast.scenario.ScenarioException;
import org.eddycast.scenario.ScenarioReader;
import org.eddycast.scenario.ScenarioWriter;
import org.eddycast.scenario.TankFlow;
import org.eddycast.scenario.TextFiles;

/**
 * Property-based tests of the strict reader over the bundled presets: a key given twice anywhere, an integer
 * field past 64 bits, a field that does not apply, a release outside the tank and a file in another encoding
 * are each refused with the field (or the encoding) named; a UTF-8 byte-order mark changes nothing. Seeds are
 * fixed so a run is repeatable.
 */
class StrictReaderPropertiesTest {

    private static final Path PRESETS = Path.of("presets");
    private static final ObjectMapper MAPPER = new ObjectMapper();
    private static final List<String> TEXTS = presets();

    private static List<String> presets() {
        try (Stream<Path> files = Files.list(PRESETS)) {
            List<String> texts = new ArrayList<>();
            for (Path p : files.filter(f -> f.toString().endsWith(".json")).sorted().toList()) {
                texts.add(Files.readString(p, StandardCharsets.UTF_8));
            }
            return texts;
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    private static ObjectNode tree(int preset) {
        try {
            return (ObjectNode) MAPPER.readTree(TEXTS.get(preset % TEXTS.size()));
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    private static String refusal(String text) {
        return assertThrows(ScenarioException.class, () -> ScenarioReader.parse(text, PRESETS.toAbsolutePath()))
                .getMessage();
    }

    /** Every field path of the tree, with its owner, in document order. */
    private static void paths(ObjectNode node, String prefix, List<String> out) {
        for (Iterator<Map.Entry<String, JsonNode>> it = node.fields(); it.hasNext(); ) {
            Map.Entry<String, JsonNode> f = it.next();
            String path = prefix.isEmpty() ? f.getKey() : prefix + "." + f.getKey();
            out.add(path);
            if (f.getValue() instanceof ObjectNode child) {
                paths(child, path, out);
            }
        }
    }

    /** The tree as JSON text with the field at {@code path} written twice. */
    private static String withDuplicate(JsonNode node, String prefix, String path) {
        StringBuilder sb = new StringBuilder("{");
        boolean first = true;
        for (Iterator<Map.Entry<String, JsonNode>> it = node.fields(); it.hasNext(); ) {
            Map.Entry<String, JsonNode> f = it.next();
            String here = prefix.isEmpty() ? f.getKey() : prefix + "." + f.getKey();
            String value = f.getValue().isObject() ? withDuplicate(f.getValue(), here, path) : f.getValue().toString();
            int times = here.equals(path) ? 2 : 1;
            for (int i = 0; i < times; i++) {
                sb.append(first ? "" : ",\n").append('"').append(f.getKey()).append("\": ").append(value);
                first = false;
            }
        }
        return sb.append("}").toString();
    }

    @Property(tries = 300, seed = "8201")
    void aKeyGivenTwiceAnywhereIsRefusedWithItsPath(@ForAll("presetIndex") int preset,
                                                    @ForAll @IntRange(min = 0, max = 1000) int pick) {
        ObjectNode root = tree(preset);
        List<String> all = new ArrayList<>();
        paths(root, "", all);
        String path = all.get(pick % all.size());
        String m = refusal(withDuplicate(root, "", path));
        assertTrue(m.matches("(?s)line \\d+, column \\d+: " + java.util.regex.Pattern.quote(path) + " is given twice.*"),
                path + ": " + m);
    }

    @Property(tries = 300, seed = "8202")
    void integersPast64BitsAreRefusedNamingTheField(@ForAll("presetIndex") int preset,
                                                    @ForAll("integerField") String field,
                                                    @ForAll("hugeInteger") BigInteger value) {
        ObjectNode root = tree(preset);
        String[] parts = field.split("\\.");
        ObjectNode owner = parts.length == 1 ? root : root.with(parts[0]);
        owner.put(parts[parts.length - 1], value);
        String m = refusal(root.toString());
        assertTrue(m.contains(field + " must be a whole number from"), m);
        // the value as written, not wrapped (long ones shortened to 57 digits and "...")
        String written = value.toString();
        assertTrue(m.contains("got " + (written.length() > 60 ? written.substring(0, 57) + "..." : written)), m);
    }

    @Property(tries = 200, seed = "8203")
    void aFieldThatDoesNotApplyIsRefusedByName(@ForAll("presetIndex") int preset,
                                               @ForAll @IntRange(min = 0, max = 4) int which) {
        ObjectNode root = tree(preset);
        String kind = root.path("flow").path("kind").asText();
        ObjectNode release = root.with("release");
        String field;
        switch (which) {
            case 0 -> {
                if (kind.equals("tank")) {
                    return;
                }
                release.putObject("position").put("x", 0.1).put("y", 0.1).put("z", 0.1);
                field = "release.position applies to a tank only";
            }
            case 1 -> {
                if (kind.equals("channel")) {
                    return;
                }
                release.put("location", "bank");
                field = "release.location applies to a channel only";
            }
            case 2 -> {
                if (kind.equals("channel")) {
                    return;
                }
                release.put("rate", 0.1);
                field = "release.rate (a continuous source) applies to a channel only";
            }
            default -> {
                JsonNode spectrum = root.path("flow").path("spectrum");
                if (!kind.equals("direct") || !spectrum.isObject()) {
                    return;
                }
                boolean model = spectrum.path("model").asText().equals("model");
                ((ObjectNode) spectrum).put(model ? "slope" : "kolmogorovLength", model ? -2.0 : 1e-4);
                field = model ? "flow.spectrum.slope applies to the power-law spectrum only"
                        : "flow.spectrum.kolmogorovLength applies to the model spectrum only";
            }
        }
        String m = refusal(root.toString());
        assertTrue(m.contains(field), field + " | " + m);
    }

    @Property(tries = 300, seed = "8204")
    void aReleaseOutsideTheTankIsRefusedAndOneInsideAccepted(@ForAll("tankPreset") int preset,
                                                             @ForAll("relativePosition") double[] where) {
        ObjectNode root = tree(preset);
        TankFlow tank = (TankFlow) ScenarioReader.parse(root.toString(), PRESETS.toAbsolutePath()).flow();
        double side = ReleasePlacement.equivalentSide(tank.design());
        double[] size = {side, side, tank.design().liquidHeight()};
        ObjectNode position = root.with("release").putObject("position");
        boolean inside = true;
        String[] axes = {"x", "y", "z"};
        for (int a = 0; a < 3; a++) {
            double v = where[a] * size[a];
            position.put(axes[a], v);
            inside &= v >= 0 && v <= size[a];
        }
        if (inside) {
            Scenario s = ScenarioReader.parse(root.toString(), PRESETS.toAbsolutePath());
            assertEquals(ScenarioWriter.text(s), ScenarioWriter.text(ScenarioReader.parse(ScenarioWriter.text(s),
                    PRESETS.toAbsolutePath())));
        } else {
            String m = refusal(root.toString());
            assertTrue(m.matches("(?s)release\\.position\\.[xyz] must be between 0 and .*"), m);
        }
    }

    @Property(tries = 200, seed = "8205")
    void encodingsOtherThanUtf8AreNamedAndTheMarkChangesNothing(@ForAll("presetIndex") int preset,
                                                                @ForAll("encoding") String encoding,
                                                                @ForAll("accentedName") String name) throws IOException {
        ObjectNode root = tree(preset);
        root.put("name", name);
        String text = root.toString();
        Scenario plain = ScenarioReader.parse(text, PRESETS.toAbsolutePath());
        byte[] bytes;
        if (encoding.equals("UTF-8 with mark")) {
            bytes = StrictScenarioReaderTest.concat(new byte[] {(byte) 0xEF, (byte) 0xBB, (byte) 0xBF},
                    text.getBytes(StandardCharsets.UTF_8));
            assertEquals(ScenarioWriter.text(plain), ScenarioWriter.text(ScenarioReader.parse(
                    TextFiles.decodeUtf8(bytes, "s.json"), PRESETS.toAbsolutePath())));
            return;
        }
        bytes = text.getBytes(Charset.forName(encoding));
        byte[] encoded = bytes;
        String m = assertThrows(IOException.class, () -> TextFiles.decodeUtf8(encoded, "s.json")).getMessage();
        assertTrue(m.startsWith("s.json is not UTF-8 text"), m);
        String expected = encoding.startsWith("UTF-16") ? "UTF-16" : encoding.startsWith("UTF-32") ? "UTF-32"
                : "Latin-1";
        assertTrue(m.contains(expected), encoding + ": " + m);
    }

    @Provide
    Arbitrary<Integer> presetIndex() {
        return Arbitraries.integers().between(0, TEXTS.size() - 1);
    }

    @Provide
    Arbitrary<Integer> tankPreset() {
        List<Integer> tanks = new ArrayList<>();
        for (int i = 0; i < TEXTS.size(); i++) {
            if (tree(i).path("flow").path("kind").asText().equals("tank")) {
                tanks.add(i);
            }
        }
        return Arbitraries.of(tanks);
    }

    @Provide
    Arbitrary<double[]> relativePosition() {
        return Arbitraries.doubles().between(-2, 3).array(double[].class).ofSize(3);
    }

    @Provide
    Arbitrary<String> integerField() {
        return Arbitraries.of("version", "simulation.particles", "simulation.groupSize", "simulation.modes",
                "simulation.seed", "simulation.maxParticles");
    }

    @Provide
    Arbitrary<BigInteger> hugeInteger() {
        return Arbitraries.bigIntegers().between(BigInteger.ONE.shiftLeft(63), BigInteger.ONE.shiftLeft(200))
                .flatMap(b -> Arbitraries.of(b, b.negate().subtract(BigInteger.ONE)));
    }

    @Provide
    Arbitrary<String> encoding() {
        return Arbitraries.of("UTF-8 with mark", "UTF-16", "UTF-16BE", "UTF-16LE", "UTF-32", "ISO-8859-1",
                "windows-1252");
    }

    @Provide
    Arbitrary<String> accentedName() {
        return Arbitraries.strings().withChars("abcdeéüßøÅ -").ofMinLength(1).ofMaxLength(20)
                .filter(s -> s.chars().anyMatch(c -> c > 127));
    }
}
