package org.eddycast.scenario;

import com.fasterxml.jackson.databind.JsonNode;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/**
 * Typed, validated access to the fields of one JSON object, collecting every problem instead of stopping at
 * the first. Each problem names the field's path, its unit and the valid range.
 */
final class FieldReader {

    private final JsonNode node;
    private final String path;
    private final List<String> problems;

    FieldReader(JsonNode node, String path, List<String> problems) {
        this.node = node;
        this.path = path;
        this.problems = problems;
    }

    static FieldReader root(JsonNode node, List<String> problems) {
        return new FieldReader(node, "", problems);
    }

    String name(String field) {
        return path.isEmpty() ? field : path + "." + field;
    }

    String path() {
        return path.isEmpty() ? "(top level)" : path;
    }

    /** A true/false value, or the default when absent. */
    boolean bool(String field, boolean fallback) {
        JsonNode v = node.get(field);
        if (v == null || v.isNull()) {
            return fallback;
        }
        if (!v.isBoolean()) {
            problems.add(name(field) + " must be true or false; got " + v);
            return fallback;
        }
        return v.asBoolean();
    }

    boolean has(String field) {
        return node.hasNonNull(field);
    }

    void problem(String message) {
        problems.add(message);
    }

    /** The nested object, or null (with a problem recorded) when it is missing or not an object. */
    FieldReader object(String field, boolean required) {
        JsonNode child = node.get(field);
        if (child == null || child.isNull()) {
            if (required) {
                problems.add(name(field) + " is missing: it must be an object { ... }");
            }
            return null;
        }
        if (!child.isObject()) {
            problems.add(name(field) + " must be an object { ... }; got " + child.getNodeType().name().toLowerCase(Locale.ROOT));
            return null;
        }
        return new FieldReader(child, name(field), problems);
    }

    /** A number in [min, max] (inclusive unless open), or the default when absent and not required. */
    double number(String field, String unit, double min, double max, boolean openMin, double fallback,
                  boolean required) {
        JsonNode v = node.get(field);
        if (v == null || v.isNull()) {
            if (required) {
                problems.add(name(field) + " is missing: it must be a number " + range(min, max, openMin, unit));
            }
            return fallback;
        }
        if (!v.isNumber()) {
            problems.add(name(field) + " must be a number " + range(min, max, openMin, unit) + "; got " + v);
            return fallback;
        }
        double x = v.asDouble();
        boolean below = openMin ? !(x > min) : !(x >= min);
        if (below || !(x <= max)) {
            problems.add(name(field) + " must be " + range(min, max, openMin, unit) + "; got " + format(x));
            return fallback;
        }
        return x;
    }

    /** A whole number in [min, max]. */
    long integer(String field, long min, long max, long fallback, boolean required) {
        JsonNode v = node.get(field);
        String range = "a whole number from " + min + " to " + max;
        if (v == null || v.isNull()) {
            if (required) {
                problems.add(name(field) + " is missing: it must be " + range);
            }
            return fallback;
        }
        if (!v.isIntegralNumber() && !(v.isNumber() && v.asDouble() == Math.rint(v.asDouble()))) {
            problems.add(name(field) + " must be " + range + "; got " + v);
            return fallback;
        }
        long x = v.asLong();
        if (x < min || x > max) {
            problems.add(name(field) + " must be " + range + "; got " + x);
            return fallback;
        }
        return x;
    }

    /** A string, or the default when absent and not required. */
    String text(String field, String fallback, boolean required) {
        JsonNode v = node.get(field);
        if (v == null || v.isNull()) {
            if (required) {
                problems.add(name(field) + " is missing: it must be a text in quotes");
            }
            return fallback;
        }
        if (!v.isTextual()) {
            problems.add(name(field) + " must be a text in quotes; got " + v);
            return fallback;
        }
        return v.asText();
    }

    /** One of the given words. */
    String choice(String field, List<String> allowed, String fallback, boolean required) {
        String s = text(field, null, required);
        if (s == null) {
            return fallback;
        }
        if (!allowed.contains(s)) {
            problems.add(name(field) + " must be one of " + String.join(", ", allowed) + "; got \"" + s + "\"");
            return fallback;
        }
        return s;
    }

    private static String range(double min, double max, boolean openMin, String unit) {
        String u = unit.isEmpty() ? "" : " " + unit;
        if (max == Double.POSITIVE_INFINITY) {
            return (openMin ? "> " : ">= ") + format(min) + u;
        }
        return "between " + format(min) + (openMin ? " (exclusive)" : "") + " and " + format(max) + u;
    }

    static String format(double x) {
        String s = String.format(Locale.ROOT, "%.6g", x);
        if (!s.contains(".")) {
            return s;
        }
        int e = s.indexOf('e');
        String mantissa = e < 0 ? s : s.substring(0, e);
        String exponent = e < 0 ? "" : s.substring(e);
        mantissa = mantissa.replaceAll("0+$", "").replaceAll("\\.$", "");
        return mantissa + exponent;
    }
}
