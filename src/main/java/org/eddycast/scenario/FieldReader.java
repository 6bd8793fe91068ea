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
    private final java.util.Set<String> known = new java.util.LinkedHashSet<>();

    FieldReader(JsonNode node, String path, List<String> problems) {
        this.node = node;
        this.path = path;
        this.problems = problems;
    }

    static FieldReader root(JsonNode node, List<String> problems) {
        return new FieldReader(node, "", problems);
    }

    String name(String field) {
        known.add(field);
        return path.isEmpty() ? field : path + "." + field;
    }

    /**
     * Marks every field of this object as known: used when the object's kind is itself wrong, so that its other
     * fields are not each reported as "not used here" on top of the one real problem.
     */
    void acceptAll() {
        node.fieldNames().forEachRemaining(known::add);
    }

    /** Marks fields as known without reading them (fields another route of the same object reads). */
    void allow(String... fields) {
        known.addAll(List.of(fields));
    }

    /**
     * Reports every field of this object that nothing asked for: a misspelt optional field would otherwise be
     * ignored without a word and silently change the result.
     */
    void rejectUnknown() {
        java.util.Iterator<String> names = node.fieldNames();
        while (names.hasNext()) {
            String field = names.next();
            if (!known.contains(field)) {
                String nearest = nearest(field);
                String shown = field.matches("[A-Za-z_][A-Za-z0-9_]*") ? field : "\"" + Printable.escape(field) + "\"";
                problems.add((path.isEmpty() ? shown : path + "." + shown) + " is not used here"
                        + (nearest == null ? "" : "; did you mean " + nearest + "?")
                        + " (fields used here: " + String.join(", ", known) + ")");
            }
        }
    }

    private String nearest(String field) {
        String best = null;
        int bestDistance = Integer.MAX_VALUE;
        for (String k : known) {
            int d = distance(field.toLowerCase(Locale.ROOT), k.toLowerCase(Locale.ROOT));
            if (d < bestDistance) {
                bestDistance = d;
                best = k;
            }
        }
        return bestDistance <= Math.max(2, field.length() / 4) ? best : null;
    }

    /** Levenshtein edit distance. */
    static int distance(String a, String b) {
        int[] previous = new int[b.length() + 1];
        int[] current = new int[b.length() + 1];
        for (int j = 0; j <= b.length(); j++) {
            previous[j] = j;
        }
        for (int i = 1; i <= a.length(); i++) {
            current[0] = i;
            for (int j = 1; j <= b.length(); j++) {
                int substitution = previous[j - 1] + (a.charAt(i - 1) == b.charAt(j - 1) ? 0 : 1);
                current[j] = Math.min(substitution, Math.min(previous[j] + 1, current[j - 1] + 1));
            }
            int[] swap = previous;
            previous = current;
            current = swap;
        }
        return previous[b.length()];
    }

    String path() {
        return path.isEmpty() ? "(top level)" : path;
    }

    /** A true/false value, or the default when absent. */
    boolean bool(String field, boolean fallback) {
        known.add(field);
        JsonNode v = node.get(field);
        if (v == null || v.isNull()) {
            return fallback;
        }
        if (!v.isBoolean()) {
            problems.add(name(field) + " must be true or false; got " + shown(v));
            return fallback;
        }
        return v.asBoolean();
    }

    boolean has(String field) {
        known.add(field);
        return node.hasNonNull(field);
    }

    void problem(String message) {
        problems.add(message);
    }

    /** The nested object, or null (with a problem recorded) when it is missing or not an object. */
    FieldReader object(String field, boolean required) {
        known.add(field);
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

    /** The objects of an array field, each read by its own reader; empty (with a problem) when not an array. */
    List<FieldReader> objects(String field) {
        known.add(field);
        JsonNode child = node.get(field);
        List<FieldReader> list = new java.util.ArrayList<>();
        if (child == null || !child.isArray()) {
            problems.add(name(field) + " must be a list [ {...}, ... ]");
            return list;
        }
        for (int i = 0; i < child.size(); i++) {
            JsonNode item = child.get(i);
            String at = name(field) + "[" + i + "]";
            if (!item.isObject()) {
                problems.add(at + " must be an object { ... }");
                continue;
            }
            list.add(new FieldReader(item, at, problems));
        }
        return list;
    }

    /** A number in [min, max] (inclusive unless open), or the default when absent and not required. */
    double number(String field, String unit, double min, double max, boolean openMin, double fallback,
                  boolean required) {
        JsonNode v = node.get(field);
        known.add(field);
        if (v == null || v.isNull()) {
            if (required) {
                problems.add(name(field) + " is missing: it must be a number " + range(min, max, openMin, unit));
            }
            return fallback;
        }
        if (!v.isNumber()) {
            problems.add(name(field) + " must be a number " + range(min, max, openMin, unit) + "; got " + shown(v));
            return fallback;
        }
        double x = v.asDouble();
        if (x != 0 && Math.abs(x) < Double.MIN_NORMAL) {
            // a subnormal number has lost its precision, and products of it underflow to zero further on
            problems.add(name(field) + " " + format(x) + " is too small to compute with (below "
                    + format(Double.MIN_NORMAL) + "); check its unit: it must be " + range(min, max, openMin, unit));
            return fallback;
        }
        boolean below = openMin ? !(x > min) : !(x >= min);
        if (below || !(x <= max)) {
            problems.add(name(field) + " must be " + range(min, max, openMin, unit) + "; got " + format(x));
            return fallback;
        }
        return x;
    }

    /** A whole number in [min, max]. */
    long integer(String field, long min, long max, long fallback, boolean required) {
        known.add(field);
        JsonNode v = node.get(field);
        String range = "a whole number from " + min + " to " + max;
        if (v == null || v.isNull()) {
            if (required) {
                problems.add(name(field) + " is missing: it must be " + range);
            }
            return fallback;
        }
        if (!v.isIntegralNumber() && !(v.isNumber() && Double.isFinite(v.asDouble())
                && v.asDouble() == Math.rint(v.asDouble()))) {
            problems.add(name(field) + " must be " + range + "; got " + shown(v));
            return fallback;
        }
        // compared exactly, before any conversion: a long would wrap 2^64 + 512 to 512 and clamp 1e30
        java.math.BigDecimal exact = v.decimalValue();
        if (exact.compareTo(java.math.BigDecimal.valueOf(min)) < 0
                || exact.compareTo(java.math.BigDecimal.valueOf(max)) > 0) {
            problems.add(name(field) + " must be " + range + "; got " + shown(v));
            return fallback;
        }
        return exact.longValueExact();
    }

    /**
     * A number strictly between min and max, or the default when absent and not required: for quantities whose
     * formulas fail at both ends (a slope of 1 is a vertical bed).
     */
    double openNumber(String field, String unit, double min, double max, double fallback, boolean required) {
        double x = number(field, unit, min, Double.POSITIVE_INFINITY, true, fallback, required);
        if (node.hasNonNull(field) && x == x && !(x < max)) {
            problems.add(name(field) + " must be between " + format(min) + " and " + format(max)
                    + " (both exclusive) " + unit + "; got " + format(x));
            return fallback;
        }
        return x;
    }

    /** A JSON value as it may be shown in a message: long values shortened, control characters escaped. */
    static String shown(JsonNode v) {
        String s = v.toString();
        if (s.length() > 60) {
            s = s.substring(0, 57) + "...";
        }
        return Printable.escape(s);
    }

    /** A string, or the default when absent and not required. */
    String text(String field, String fallback, boolean required) {
        known.add(field);
        JsonNode v = node.get(field);
        if (v == null || v.isNull()) {
            if (required) {
                problems.add(name(field) + " is missing: it must be a text in quotes");
            }
            return fallback;
        }
        if (!v.isTextual()) {
            problems.add(name(field) + " must be a text in quotes; got " + shown(v));
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
            problems.add(name(field) + " must be one of " + String.join(", ", allowed) + "; got \""
                    + Printable.escape(s.length() > 60 ? s.substring(0, 57) + "..." : s) + "\"");
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
