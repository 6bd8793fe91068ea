package org.eddycast.report;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.util.Map;
import org.eddycast.forecast.Cautions;
import org.eddycast.uncertainty.UncertaintySummary;
import org.eddycast.uncertainty.UncertaintySummary.FigureRange;
import org.eddycast.uncertainty.UncertaintySummary.RangedInput;
import org.eddycast.uncertainty.UncertaintySummary.SensitivityIndex;

/**
 * The inputs' uncertainty in the result JSON: an {@code uncertainty} object with every ranged input and every
 * headline figure's two intervals, a {@code sensitivity} list ordered by total index, and an {@code inputRange}
 * beside the Monte Carlo interval of each headline figure where the result already carries it.
 */
public final class UncertaintyJson {

    /** Where each figure's Monte Carlo interval sits in the result JSON (JSON pointers). */
    private static final Map<String, String> PLACES = Map.of(
            "stationPeak", "/headline/stations/0",
            "longitudinalDispersion", "/transport/longitudinalDispersion",
            "distanceToMixedWidth", "/transport/mixingDistance/width",
            "blendTime95", "/transport/blendTime/p95",
            "eddyDiffusivity", "/eddyDiffusivity/x");

    private UncertaintyJson() {
    }

    /** Adds the summary to a result's JSON tree. */
    static void write(ObjectNode root, UncertaintySummary u) {
        summary(root.putObject("uncertainty"), u);
        sensitivity(root, u);
        for (FigureRange f : u.figures()) {
            String place = PLACES.get(f.key());
            JsonNode target = place == null ? null : root.at(place);
            if (target instanceof ObjectNode o) {
                ObjectNode range = o.putObject("inputRange");
                range.put("figure", f.key());
                inputRange(range, f);
            }
        }
    }

    /**
     * A sweep's result file: the scenario's name, the sweep's fingerprint, the summary, the ranking and the
     * cautions. Nothing in it depends on when or how the sweep was split, so merged shards give the same text.
     */
    public static String sweepResult(String scenario, String fingerprint, UncertaintySummary u) {
        ObjectNode root = ResultJson.MAPPER.createObjectNode();
        root.put("tool", "eddycast");
        root.put("scenario", scenario);
        root.put("fingerprint", fingerprint);
        summary(root.putObject("uncertainty"), u);
        sensitivity(root, u);
        Cautions.ALL.forEach(root.putArray("cautions")::add);
        try {
            return ResultJson.MAPPER.writeValueAsString(root) + "\n";
        } catch (com.fasterxml.jackson.core.JsonProcessingException e) {
            throw new IllegalStateException(e);
        }
    }

    /** The summary's fields into an object (the sweep's result file holds the same). */
    public static void summary(ObjectNode node, UncertaintySummary u) {
        node.put("baseSamples", u.baseSamples());
        node.put("runs", u.runs());
        node.put("particlesPerRun", u.particles());
        ArrayNode inputs = node.putArray("inputs");
        for (RangedInput r : u.inputs()) {
            ObjectNode o = inputs.addObject();
            o.put("input", r.input());
            ResultJson.number(o, "nominal", r.nominal());
            o.put("distribution", r.distribution());
            if (!r.basis().isEmpty()) {
                o.put("basis", r.basis());
            }
        }
        ArrayNode figures = node.putArray("figures");
        for (FigureRange f : u.figures()) {
            ObjectNode o = figures.addObject();
            o.put("key", f.key());
            o.put("label", f.label());
            o.put("unit", f.unit());
            ResultJson.number(o, "value", f.nominal());
            ObjectNode mc = o.putObject("monteCarlo");
            mc.put("covers", "the particles' noise in the scenario's own run (95%)");
            ResultJson.number(mc, "low", f.mcLow());
            ResultJson.number(mc, "high", f.mcHigh());
            inputRange(o.putObject("inputRange"), f);
            ResultJson.number(o, "mean", f.mean());
            ResultJson.number(o, "median", f.p50());
            ResultJson.number(o, "noiseShare", f.noiseShare());
        }
        node.put("sensitivityOf", u.figures().get(0).key());
        node.put("advice", u.advice());
        ArrayNode notes = node.putArray("notes");
        u.notes().forEach(notes::add);
    }

    /** The ranking as a top-level {@code sensitivity} list. */
    public static void sensitivity(ObjectNode root, UncertaintySummary u) {
        ArrayNode list = root.putArray("sensitivity");
        for (SensitivityIndex s : u.sensitivity()) {
            ObjectNode o = list.addObject();
            o.put("input", s.input());
            ResultJson.number(o, "first", s.first());
            ResultJson.number(o, "firstHalfWidth", s.firstHalfWidth());
            ResultJson.number(o, "total", s.total());
            ResultJson.number(o, "totalHalfWidth", s.totalHalfWidth());
        }
    }

    private static void inputRange(ObjectNode o, FigureRange f) {
        o.put("covers", "5th to 95th percentile over the inputs' ranges");
        ResultJson.number(o, "p05", f.p05());
        ResultJson.number(o, "p95", f.p95());
    }
}
