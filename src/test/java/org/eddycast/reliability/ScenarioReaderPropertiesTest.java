package org.eddycast.reliability;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.JsonNodeFactory;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Iterator;
import java.util.List;
import java.util.Map;
import java.util.regex.Pattern;
import java.util.stream.Stream;
import net.jqwik.api.Arbitraries;
import net.jqwik.api.Arbitrary;
import net.jqwik.api.Combinators;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.Provide;
import net.jqwik.api.statistics.Statistics;
import org.eddycast.scenario.Scenario;
import org.eddycast.scenario.ScenarioException;
import org.eddycast.scenario.ScenarioReader;
import org.eddycast.scenario.ScenarioWriter;

/**
 * Property-based tests of the scenario reader: random text and mutated preset files never crash it (the only
 * failure is a {@link ScenarioException}); every problem it reports names a field by its path, or a line and
 * column; every scenario it accepts comes back unchanged through {@link ScenarioWriter} and the reader.
 * Seeds are fixed so a run is repeatable.
 */
class ScenarioReaderPropertiesTest {

    private static final Path PRESETS = Path.of("presets");
    private static final ObjectMapper MAPPER = new ObjectMapper();
    private static final List<String> PRESET_TEXTS = presetTexts();

    /**
     * A field path such as flow.rmsVelocity, a top-level field (known, or an unknown one named as not used), or a
     * syntax error's line and column.
     */
    private static final Pattern NAMES_A_FIELD_OR_LINE = Pattern.compile(
            "(^line \\d+, column \\d+: .*)"
                    + "|(.*\\b(flow|substance|simulation|release|forecast|uncertainty)(\\.[A-Za-z]+)+\\b.*)"
                    + "|(^(version|name|description|flow|substance|simulation|release|forecast|uncertainty)\\b.*)"
                    + "|(^([A-Za-z0-9_.\\[\\]]+\\.)?([A-Za-z0-9_]+|\"[^\"]*\") is not used here.*)"
                    + "|(^flow: .*)|(^a scenario must be a JSON object .*)", Pattern.DOTALL);

    private static List<String> presetTexts() {
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

    /** Parses, and checks the contract: a scenario, or a ScenarioException whose every problem names its place. */
    private static Scenario parseChecked(String text) {
        try {
            Scenario s = ScenarioReader.parse(text, PRESETS.toAbsolutePath());
            Statistics.collect("accepted");
            return s;
        } catch (ScenarioException e) {
            Statistics.collect("rejected");
            assertFalse(e.problems().isEmpty(), "a rejection without a problem");
            for (String problem : e.problems()) {
                assertTrue(NAMES_A_FIELD_OR_LINE.matcher(problem).matches(),
                        "the problem names no field or line: " + problem + "\nin:\n" + text);
            }
            return null;
        }
        // any other exception escapes and fails the property
    }

    private static void assertRoundTrip(Scenario s) {
        String written = ScenarioWriter.text(s);
        Scenario again = ScenarioReader.parse(written, PRESETS.toAbsolutePath());
        assertNull(RecordValues.difference(s, again, "scenario"), written);
        assertEquals(written, ScenarioWriter.text(again));
    }

    @Property(tries = 1000, seed = "8101")
    void randomTextNeverCrashesTheReader(@ForAll("jsonishText") String text) {
        Scenario s = parseChecked(text);
        if (s != null) {
            assertRoundTrip(s);
        }
    }

    @Property(tries = 1500, seed = "8102")
    void presetsWithTextMutationsAreAcceptedWholeOrRejectedWithNamedProblems(
            @ForAll("textMutatedPresets") String text) {
        Scenario s = parseChecked(text);
        if (s != null) {
            assertRoundTrip(s);
        }
    }

    @Property(tries = 2000, seed = "8103")
    void presetsWithFieldMutationsAreAcceptedWholeOrRejectedWithNamedProblems(
            @ForAll("fieldMutatedPresets") String text) {
        Scenario s = parseChecked(text);
        if (s != null) {
            assertRoundTrip(s);
        }
    }

    @Property(tries = 200, seed = "8104")
    void everyPresetRoundTripsUnchanged(@ForAll("presetIndex") int index) {
        Scenario s = parseChecked(PRESET_TEXTS.get(index));
        assertTrue(s != null, "preset " + index + " is rejected");
        assertRoundTrip(s);
    }

    @Provide
    Arbitrary<Integer> presetIndex() {
        return Arbitraries.integers().between(0, PRESET_TEXTS.size() - 1);
    }

    /** Short texts over the characters JSON is made of, plus a few words the reader knows. */
    @Provide
    Arbitrary<String> jsonishText() {
        Arbitrary<String> pieces = Arbitraries.oneOf(
                Arbitraries.of("{", "}", "[", "]", ":", ",", "\"", " ", "\n", "null", "true", "-", "1e309", "0",
                        "\"version\"", "\"flow\"", "\"kind\"", "\"tank\"", "\"simulation\"", "\\u0000", "é"),
                Arbitraries.strings().withCharRange(' ', '~').ofMaxLength(4));
        return pieces.list().ofMaxSize(40).map(l -> String.join("", l));
    }

    /** A preset with one to four edits of its text: a cut, an insertion, a swap of two pieces, a doubling. */
    @Provide
    Arbitrary<String> textMutatedPresets() {
        Arbitrary<String> tokens = Arbitraries.of("{", "}", "[", "]", ":", ",", "\"", "null", "-1", "1e309", "0",
                "\"x\"", "true", "NaN", "\n", "//", "\uFFFD", "\"kind\": \"tank\",", "\"seed\": 1.5,");
        Arbitrary<Edit> edit = Combinators.combine(Arbitraries.integers().between(0, 3),
                Arbitraries.doubles().between(0, 1), Arbitraries.doubles().between(0, 1), tokens).as(Edit::new);
        return Combinators.combine(Arbitraries.integers().between(0, PRESET_TEXTS.size() - 1),
                edit.list().ofMinSize(1).ofMaxSize(4)).as((i, edits) -> {
                    String text = PRESET_TEXTS.get(i);
                    for (Edit e : edits) {
                        text = e.apply(text);
                    }
                    return text;
                });
    }

    /** One edit of a text at relative positions {@code where} and {@code to}. */
    private record Edit(int kind, double where, double to, String token) {
        String apply(String text) {
            int n = text.length();
            int a = (int) (where * n);
            int b = Math.min(n, a + 1 + (int) (to * 12));
            return switch (kind) {
                case 0 -> text.substring(0, a) + text.substring(b);
                case 1 -> text.substring(0, a) + token + text.substring(a);
                case 2 -> text.substring(0, a) + token + text.substring(b);
                default -> text.substring(0, b) + text.substring(a, b) + text.substring(b);
            };
        }
    }

    /**
     * A preset with one to three field edits in its JSON tree: a value replaced by another value (numbers at
     * and beyond the limits, texts, booleans, null, arrays, objects), a field removed, an unknown field added.
     * These pass the syntax check and reach the validation of every field.
     */
    @Provide
    Arbitrary<String> fieldMutatedPresets() {
        Arbitrary<JsonNode> values = Arbitraries.oneOf(
                Arbitraries.of(0.0, -1.0, 1e-300, 1e300, 0.5, 2.0, 64.0, 1e9, 1e12, 3.0, 1.5, -1e-9, 65536.0, 7.0)
                        .map(JsonNodeFactory.instance::numberNode),
                Arbitraries.of(0L, 1L, 2L, 3L, 63L, 64L, 100L, Long.MAX_VALUE, Long.MIN_VALUE, 50_000_001L)
                        .map(JsonNodeFactory.instance::numberNode),
                Arbitraries.doubles().between(-1e3, 1e3).map(JsonNodeFactory.instance::numberNode),
                Arbitraries.of("tank", "channel", "direct", "measured", "shear", "cellular", "beltrami", "model",
                        "power-law", "euler", "lie", "strang", "rushton", "bank", "fwhm", "", "records/none.csv",
                        "records/flume-probe.csv", "ÅÆ", "1").map(JsonNodeFactory.instance::textNode),
                Arbitraries.of(true, false).map(JsonNodeFactory.instance::booleanNode),
                Arbitraries.just(JsonNodeFactory.instance.nullNode()),
                Arbitraries.just(JsonNodeFactory.instance.arrayNode().add(1)),
                Arbitraries.just(JsonNodeFactory.instance.objectNode()));
        Arbitrary<FieldEdit> edit = Combinators.combine(Arbitraries.integers().between(0, 9),
                Arbitraries.integers().between(0, 1000), values).as(FieldEdit::new);
        return Combinators.combine(Arbitraries.integers().between(0, PRESET_TEXTS.size() - 1),
                edit.list().ofMinSize(1).ofMaxSize(3)).as((i, edits) -> {
                    try {
                        ObjectNode root = (ObjectNode) MAPPER.readTree(PRESET_TEXTS.get(i));
                        for (FieldEdit e : edits) {
                            e.apply(root);
                        }
                        return MAPPER.writeValueAsString(root);
                    } catch (IOException e) {
                        throw new UncheckedIOException(e);
                    }
                });
    }

    /** Replace (kinds 0-6), remove (7-8) or add (9) the field chosen by {@code pick} among all object fields. */
    private record FieldEdit(int kind, int pick, JsonNode value) {
        void apply(ObjectNode root) {
            List<ObjectNode> owners = new ArrayList<>();
            List<String> names = new ArrayList<>();
            collect(root, owners, names);
            int k = pick % owners.size();
            ObjectNode owner = owners.get(k);
            if (kind <= 6) {
                owner.set(names.get(k), value.deepCopy());
            } else if (kind <= 8) {
                owner.remove(names.get(k));
            } else {
                owner.set("unexpected", value.deepCopy());
            }
        }

        private static void collect(ObjectNode node, List<ObjectNode> owners, List<String> names) {
            for (Iterator<Map.Entry<String, JsonNode>> it = node.fields(); it.hasNext(); ) {
                Map.Entry<String, JsonNode> f = it.next();
                owners.add(node);
                names.add(f.getKey());
                if (f.getValue() instanceof ObjectNode child) {
                    collect(child, owners, names);
                } else if (f.getValue() instanceof ArrayNode) {
                    continue;
                }
            }
        }
    }
}
