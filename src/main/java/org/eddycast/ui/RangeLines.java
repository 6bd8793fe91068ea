package org.eddycast.ui;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.JsonNodeFactory;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/**
 * The form's way of writing input ranges, one per line, and its translation to and from the scenario file's
 * {@code uncertainty.ranges} list:
 * <pre>
 * flow.bedSlope +-25%                  # surveyed to one figure
 * flow.meanVelocity 0.40 to 0.50
 * flow.depth normal 1.2 0.05           (mean, standard deviation)
 * flow.powerNumber triangular 1.1 1.27 1.5   (low, mode, high)
 * flow.pumpingNumber log-normal 0.79 1.1     (median, geometric standard deviation)
 * flow.powerNumber rule                (the spread the rule's source states)
 * </pre>
 * Text after {@code #} is the range's basis.
 */
final class RangeLines {

    /** What the lines gave: the list for the file, and a message per line that could not be read. */
    record Parsed(ArrayNode ranges, List<String> problems) {
    }

    private RangeLines() {
    }

    static Parsed parse(String text) {
        ArrayNode list = JsonNodeFactory.instance.arrayNode();
        List<String> problems = new ArrayList<>();
        String[] lines = text.split("\\R", -1);
        for (int i = 0; i < lines.length; i++) {
            String line = lines[i];
            String basis = "";
            int hash = line.indexOf('#');
            if (hash >= 0) {
                basis = line.substring(hash + 1).strip();
                line = line.substring(0, hash);
            }
            line = line.strip();
            if (line.isEmpty()) {
                continue;
            }
            try {
                ObjectNode range = parseLine(line);
                if (!basis.isEmpty()) {
                    range.put("basis", basis);
                }
                list.add(range);
            } catch (IllegalArgumentException e) {
                problems.add("Input ranges, line " + (i + 1) + ": " + e.getMessage());
            }
        }
        return new Parsed(list, problems);
    }

    private static ObjectNode parseLine(String line) {
        String[] w = line.split("\\s+");
        ObjectNode o = JsonNodeFactory.instance.objectNode();
        o.put("input", w[0]);
        String usage = "write \"PATH +-10%\", \"PATH LOW to HIGH\", \"PATH normal MEAN SD\", "
                + "\"PATH log-normal MEDIAN GSD\", \"PATH triangular LOW MODE HIGH\" or \"PATH rule\"";
        if (w.length == 2 && (w[1].startsWith("+-") || w[1].startsWith("\u00b1"))) {
            String f = w[1].substring(w[1].startsWith("+-") ? 2 : 1);
            boolean percent = f.endsWith("%");
            double v = number(percent ? f.substring(0, f.length() - 1) : f, "the plus-or-minus");
            o.put("plusMinus", percent ? v / 100 : v);
            return o;
        }
        if (w.length == 2 && w[1].equalsIgnoreCase("rule")) {
            o.put("spread", "rule");
            return o;
        }
        if (w.length == 4 && w[2].equalsIgnoreCase("to")) {
            o.put("low", number(w[1], "the low end"));
            o.put("high", number(w[3], "the high end"));
            return o;
        }
        String kind = w.length > 1 ? w[1].toLowerCase(Locale.ROOT) : "";
        switch (kind) {
            case "normal" -> {
                need(w, 4, usage);
                o.put("distribution", "normal");
                o.put("mean", number(w[2], "the mean"));
                o.put("sd", number(w[3], "the standard deviation"));
            }
            case "log-normal", "lognormal" -> {
                need(w, 4, usage);
                o.put("distribution", "log-normal");
                o.put("median", number(w[2], "the median"));
                o.put("geometricSd", number(w[3], "the geometric standard deviation"));
            }
            case "triangular" -> {
                need(w, 5, usage);
                o.put("distribution", "triangular");
                o.put("low", number(w[2], "the low end"));
                o.put("mode", number(w[3], "the mode"));
                o.put("high", number(w[4], "the high end"));
            }
            default -> throw new IllegalArgumentException("\"" + line + "\" is not a range: " + usage);
        }
        return o;
    }

    private static void need(String[] w, int n, String usage) {
        if (w.length != n) {
            throw new IllegalArgumentException("\"" + String.join(" ", w) + "\" has " + (w.length - 2)
                    + " numbers where " + (n - 2) + " are needed: " + usage);
        }
    }

    private static double number(String text, String what) {
        try {
            return Double.parseDouble(text.replace('\u2212', '-'));
        } catch (NumberFormatException e) {
            throw new IllegalArgumentException(what + " \"" + text + "\" is not a number");
        }
    }

    /** The file's list as lines. */
    static String format(JsonNode ranges) {
        StringBuilder sb = new StringBuilder();
        if (!ranges.isArray()) {
            return "";
        }
        for (JsonNode r : ranges) {
            sb.append(r.path("input").asText());
            String kind = r.path("distribution").asText("");
            if (r.has("spread")) {
                sb.append(" rule");
            } else if (r.has("plusMinus")) {
                sb.append(" +-").append(ScenarioForm.shortNumber(100 * r.path("plusMinus").asDouble())).append('%');
            } else if (kind.equals("normal")) {
                sb.append(" normal ").append(num(r, "mean")).append(' ').append(num(r, "sd"));
            } else if (kind.equals("log-normal")) {
                sb.append(" log-normal ").append(num(r, "median")).append(' ').append(num(r, "geometricSd"));
            } else if (kind.equals("triangular")) {
                sb.append(" triangular ").append(num(r, "low")).append(' ').append(num(r, "mode")).append(' ')
                        .append(num(r, "high"));
            } else {
                sb.append(' ').append(num(r, "low")).append(" to ").append(num(r, "high"));
            }
            if (r.has("basis")) {
                sb.append("   # ").append(r.path("basis").asText());
            }
            sb.append('\n');
        }
        return sb.toString();
    }

    private static String num(JsonNode r, String field) {
        return ScenarioForm.shortNumber(r.path(field).asDouble());
    }
}
