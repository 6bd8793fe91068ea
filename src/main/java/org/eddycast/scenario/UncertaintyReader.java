package org.eddycast.scenario;

import com.fasterxml.jackson.databind.JsonNode;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Set;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * Reads a scenario's {@code uncertainty} block: the ranged inputs and the sweep's size. Each range names a
 * numeric field of the same document by its path (or a tank's rule-given value that may be left out), and gives
 * exactly one of a plus-or-minus fraction, a low-high pair, or a distribution with its parameters.
 */
final class UncertaintyReader {

    /** Sections whose numbers may be ranged; the simulation's settings are how the answer is computed, not inputs. */
    private static final List<String> RANGED_SECTIONS = List.of("flow", "substance", "release", "forecast");
    /** A tank's values its rules give when the user leaves them out; a range on one ranges the rule's value. */
    static final List<String> TANK_RULE_VALUES = List.of("flow.powerNumber", "flow.pumpingNumber", "flow.clearance");
    static final List<String> DISTRIBUTIONS = List.of("uniform", "triangular", "normal", "log-normal");
    private static final Pattern SEGMENT = Pattern.compile("([A-Za-z][A-Za-z0-9]*)(?:\\[(\\d{1,2})\\])?");

    private UncertaintyReader() {
    }

    static UncertaintySettings read(FieldReader u, JsonNode root) {
        List<InputRange> ranges = new ArrayList<>();
        if (u.has("ranges")) {
            List<FieldReader> items = u.objects("ranges");
            if (items.size() > UncertaintySettings.MAX_INPUTS) {
                u.problem(u.name("ranges") + " may hold at most " + UncertaintySettings.MAX_INPUTS + " inputs; got "
                        + items.size());
            }
            Set<String> seen = new HashSet<>();
            for (FieldReader item : items) {
                InputRange range = readRange(item, root);
                if (range != null && !seen.add(range.input())) {
                    item.problem(item.name("input") + " " + range.input() + " is ranged twice; keep one range");
                }
                if (range != null) {
                    ranges.add(range);
                }
                item.rejectUnknown();
            }
        }
        int base = (int) u.integer("baseSamples", 2, 4096, UncertaintySettings.DEFAULT_BASE_SAMPLES, false);
        int particles = (int) u.integer("particles", 256, ScenarioReader.MAX_PARTICLES,
                UncertaintySettings.DEFAULT_PARTICLES, false);
        return new UncertaintySettings(ranges, base, particles);
    }

    private static InputRange readRange(FieldReader item, JsonNode root) {
        String input = item.text("input", "", true);
        String basis = item.text("basis", "", false);
        String problem = pathProblem(input, root);
        if (problem != null) {
            item.problem(item.name("input") + " " + problem);
            return null;
        }
        boolean plusMinus = item.has("plusMinus");
        boolean named = item.has("distribution");
        boolean pair = item.has("low") || item.has("high");
        if (item.has("spread")) {
            if (plusMinus || named || pair) {
                item.problem(item.path() + ": \"spread\": \"rule\" takes the rule's own spread; remove the other "
                        + "range fields, or remove spread");
                item.acceptAll();
                return null;
            }
            item.choice("spread", List.of("rule"), "rule", true);
            return new InputRange(input, InputRange.Shape.RULE, Double.NaN, Double.NaN, Double.NaN, basis);
        }
        if (plusMinus && (named || pair)) {
            item.problem(item.path() + ": give either plusMinus or a distribution (low/high, or \"distribution\" with "
                    + "its parameters), not both");
            item.acceptAll();
            return null;
        }
        if (plusMinus) {
            double f = item.number("plusMinus", "(a fraction of the value)", 0, 1, true, Double.NaN, true);
            return Double.isNaN(f) ? null : InputRange.plusMinus(input, f, basis);
        }
        if (!named && !pair) {
            item.problem(item.path() + " gives no range: add \"plusMinus\": 0.2 (a fraction), \"low\" and \"high\", "
                    + "or \"distribution\": one of " + String.join(", ", DISTRIBUTIONS) + " with its parameters");
            item.acceptAll();
            return null;
        }
        String kind = item.choice("distribution", DISTRIBUTIONS, "uniform", false);
        return switch (kind) {
            case "triangular" -> ordered(item, input, InputRange.Shape.TRIANGULAR,
                    item.number("low", "", -1e30, 1e30, false, Double.NaN, true),
                    item.number("mode", "", -1e30, 1e30, false, Double.NaN, true),
                    item.number("high", "", -1e30, 1e30, false, Double.NaN, true), basis);
            case "normal" -> new InputRange(input, InputRange.Shape.NORMAL,
                    item.number("mean", "", -1e30, 1e30, false, Double.NaN, true),
                    item.number("sd", "(greater than 0)", 0, 1e30, true, Double.NaN, true), Double.NaN, basis);
            case "log-normal" -> new InputRange(input, InputRange.Shape.LOG_NORMAL,
                    item.number("median", "(greater than 0)", 0, 1e30, true, Double.NaN, true),
                    item.number("geometricSd", "(greater than 1)", 1, 100, true, Double.NaN, true), Double.NaN, basis);
            default -> ordered(item, input, InputRange.Shape.UNIFORM,
                    item.number("low", "", -1e30, 1e30, false, Double.NaN, true), Double.NaN,
                    item.number("high", "", -1e30, 1e30, false, Double.NaN, true), basis);
        };
    }

    /** A uniform (mode NaN) or triangular range whose ends are in order. */
    private static InputRange ordered(FieldReader item, String input, InputRange.Shape shape, double low, double mode,
                                      double high, String basis) {
        if (Double.isNaN(low) || Double.isNaN(high) || (shape == InputRange.Shape.TRIANGULAR && Double.isNaN(mode))) {
            return null;
        }
        if (!(low < high)) {
            item.problem(item.path() + ": low must be below high; got " + FieldReader.format(low) + " and "
                    + FieldReader.format(high));
            return null;
        }
        if (shape == InputRange.Shape.TRIANGULAR) {
            if (!(mode >= low && mode <= high)) {
                item.problem(item.path() + ": mode must lie from low to high; got " + FieldReader.format(mode));
                return null;
            }
            return new InputRange(input, shape, low, mode, high, basis);
        }
        return new InputRange(input, shape, low, high, Double.NaN, basis);
    }

    /** Why a path cannot be ranged, or null when it can. */
    static String pathProblem(String input, JsonNode root) {
        if (input.isEmpty()) {
            return "must name a numeric field, such as flow.bedSlope";
        }
        String pointer = pointer(input);
        if (pointer == null) {
            return "\"" + Printable.escape(input) + "\" is not a field path: write it as section.field, such as "
                    + "flow.bedSlope or forecast.stations[0].distance";
        }
        String section = input.substring(0, input.indexOf('.') < 0 ? input.length() : input.indexOf('.'));
        if (!RANGED_SECTIONS.contains(section)) {
            return input + " cannot carry a range: only numbers in " + String.join(", ", RANGED_SECTIONS)
                    + " are inputs (the simulation's settings are how the answer is computed)";
        }
        JsonNode value = root.at(pointer);
        if (value.isNumber()) {
            return null;
        }
        boolean tank = root.path("flow").path("kind").asText("").equals("tank");
        if (value.isMissingNode() && tank && TANK_RULE_VALUES.contains(input)) {
            return null;
        }
        if (value.isMissingNode()) {
            return input + " is not in this scenario: a range needs a value to vary (give " + input + " first"
                    + (tank ? ", or range one of the tank's rule values " + String.join(", ", TANK_RULE_VALUES) : "")
                    + ")";
        }
        return input + " is not a number (it is " + FieldReader.shown(value) + "); only numbers carry a range";
    }

    /** The JSON pointer of a path such as {@code forecast.stations[0].distance}, or null when it is not one. */
    static String pointer(String input) {
        StringBuilder out = new StringBuilder();
        for (String segment : input.split("\\.", -1)) {
            Matcher m = SEGMENT.matcher(segment);
            if (!m.matches()) {
                return null;
            }
            out.append('/').append(m.group(1));
            if (m.group(2) != null) {
                out.append('/').append(Integer.parseInt(m.group(2)));
            }
        }
        return input.contains(".") ? out.toString() : null;
    }
}
