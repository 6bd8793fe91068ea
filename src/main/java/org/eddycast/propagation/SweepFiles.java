package org.eddycast.propagation;

import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.eddycast.scenario.AtomicFiles;
import org.eddycast.scenario.TextFiles;

/**
 * A sweep part as a file: the responses of its rows, written so that reading gives back the same doubles to the
 * bit (a double's shortest decimal form reads back exactly), and written atomically.
 */
public final class SweepFiles {

    /** The part-file format this build writes and reads. */
    static final int PART_FORMAT = 1;
    private static final ObjectMapper MAPPER = new ObjectMapper().enable(SerializationFeature.INDENT_OUTPUT);

    private SweepFiles() {
    }

    /** Writes a part (temporary file, then move). */
    public static void write(SweepPart part, Path file) throws IOException {
        AtomicFiles.writeString(file, text(part) + "\n");
    }

    /** A part as JSON text. */
    public static String text(SweepPart part) {
        ObjectNode root = MAPPER.createObjectNode();
        root.put("sweepPart", PART_FORMAT);
        root.put("fingerprint", part.fingerprint());
        try {
            root.set("scenario", MAPPER.readTree(part.scenario()));
        } catch (JsonProcessingException e) {
            throw new IllegalStateException(e);
        }
        root.put("baseSamples", part.baseSamples());
        part.inputs().forEach(root.putArray("inputs")::add);
        part.figures().forEach(root.putArray("figures")::add);
        root.put("rows", part.rows());
        root.put("from", part.from());
        rows(root.putArray("responses"), part.responses());
        rows(root.putArray("halfWidths"), part.halfWidths());
        try {
            return MAPPER.writeValueAsString(root);
        } catch (JsonProcessingException e) {
            throw new IllegalStateException(e);
        }
    }

    private static void rows(ArrayNode list, double[][] rows) {
        for (double[] row : rows) {
            ArrayNode values = list.addArray();
            for (double v : row) {
                if (Double.isFinite(v)) {
                    values.add(v);
                } else {
                    values.addNull();
                }
            }
        }
    }

    /**
     * Reads a part.
     *
     * @throws IOException naming the file and what is wrong with it
     */
    public static SweepPart read(Path file) throws IOException {
        String text = TextFiles.readUtf8(file, "sweep part");
        try {
            return parse(text);
        } catch (IllegalArgumentException e) {
            throw new IOException(file + ": " + e.getMessage(), e);
        }
    }

    /** Parses a part's text. */
    public static SweepPart parse(String text) {
        JsonNode root;
        try {
            root = MAPPER.readTree(text);
        } catch (JsonProcessingException e) {
            throw new IllegalArgumentException("not a sweep part: not valid JSON (" + e.getOriginalMessage() + ")");
        }
        if (root == null || !root.path("sweepPart").isInt() || root.path("sweepPart").asInt() != PART_FORMAT) {
            throw new IllegalArgumentException("not a sweep part of format " + PART_FORMAT + " (write parts with "
                    + "\"sweep SCENARIO.json --shard K/N --out PART.json\")");
        }
        List<String> inputs = strings(root.path("inputs"));
        List<String> figures = strings(root.path("figures"));
        double[][] responses = rows(root, "responses", figures.size());
        double[][] halfWidths = rows(root, "halfWidths", figures.size());
        if (halfWidths.length != responses.length) {
            throw new IllegalArgumentException("halfWidths must hold as many rows as responses");
        }
        int total = root.path("rows").asInt(-1);
        int from = root.path("from").asInt(-1);
        if (from < 0 || total < 0 || from + responses.length > total) {
            throw new IllegalArgumentException("rows " + from + " to " + (from + responses.length) + " do not fit in "
                    + total + " rows");
        }
        if (!root.path("scenario").isObject()) {
            throw new IllegalArgumentException("the part holds no scenario");
        }
        return new SweepPart(root.path("fingerprint").asText(""), root.path("scenario").toString(),
                root.path("baseSamples").asInt(), inputs, figures,
                total, from, responses, halfWidths);
    }

    private static double[][] rows(JsonNode root, String field, int width) {
        JsonNode rows = root.path(field);
        if (!rows.isArray()) {
            throw new IllegalArgumentException(field + " must be a list of rows");
        }
        double[][] out = new double[rows.size()][];
        for (int i = 0; i < rows.size(); i++) {
            JsonNode row = rows.get(i);
            if (!row.isArray() || row.size() != width) {
                throw new IllegalArgumentException(field + "[" + i + "] must hold " + width + " values");
            }
            out[i] = new double[width];
            for (int f = 0; f < width; f++) {
                JsonNode v = row.get(f);
                if (!v.isNull() && !v.isNumber()) {
                    throw new IllegalArgumentException(field + "[" + i + "][" + f + "] must be a number or null");
                }
                out[i][f] = v.isNull() ? Double.NaN : v.asDouble();
            }
        }
        return out;
    }

    private static List<String> strings(JsonNode list) {
        List<String> out = new ArrayList<>();
        if (list.isArray()) {
            list.forEach(n -> out.add(n.asText()));
        }
        return out;
    }
}
