package org.eddycast.report;

import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import org.eddycast.transport.ChannelStageResult;
import org.eddycast.transport.Estimate;
import org.eddycast.transport.TankStageResult;
import org.eddycast.transport.TransportResult;

/**
 * The transport stage's result as the JSON object {@code transport}: every coefficient, time and distance as
 * {@code {"value", "low", "high"}} with its unit, SI throughout.
 */
final class TransportJson {

    private TransportJson() {
    }

    static void write(ObjectNode root, TransportResult result) {
        ObjectNode node = root.putObject("transport");
        node.put("particles", result.particles());
        ResultJson.number(node, "elapsedSeconds", result.elapsedSeconds());
        if (result instanceof ChannelStageResult c) {
            channel(node, c);
        } else if (result instanceof TankStageResult t) {
            tank(node, t);
        }
    }

    private static void channel(ObjectNode node, ChannelStageResult c) {
        node.put("geometry", "channel");
        estimate(node, "longitudinalDispersion", c.longitudinalDispersion(), "m^2/s");
        estimate(node, "transverseDiffusivity", c.transverseDiffusivity(), "m^2/s");
        estimate(node, "verticalDiffusivity", c.verticalDiffusivity(), "m^2/s");
        ObjectNode mixing = node.putObject("mixingDistance");
        if (c.distanceToMixedDepth().determined()) {
            estimate(mixing, "depth", c.distanceToMixedDepth(), "m");
        }
        if (c.distanceToMixedWidth().determined()) {
            estimate(mixing, "width", c.distanceToMixedWidth(), "m");
        }
        ObjectNode cloud = node.putObject("cloud");
        ResultJson.array(cloud, "time", c.times());
        double[][] v = c.variance();
        ResultJson.array(cloud, "varianceX", v[0]);
        ResultJson.array(cloud, "varianceY", v[1]);
        ResultJson.array(cloud, "varianceZ", v[2]);
        ResultJson.array(cloud, "skewness", c.skewness());
        node.put("timeStep", c.timeStep());
        node.put("steps", c.steps());
        notes(node, c.warnings(), c.notes());
    }

    private static void tank(ObjectNode node, TankStageResult t) {
        node.put("geometry", "tank");
        ObjectNode blend = node.putObject("blendTime");
        String[] keys = {"p90", "p95", "p99"};
        for (int i = 0; i < keys.length; i++) {
            estimate(blend, keys[i], t.blendTimes().get(i), "s");
        }
        ResultJson.number(node, "circulationTime", t.circulationTime());
        node.put("circulationTimeUnit", "s");
        node.put("circulationTimeBasis", "liquid volume over the impeller discharge N_Q N D^3");
        ResultJson.number(node, "loopFlow", t.loopFlow());
        ResultJson.number(node, "discharge", t.discharge());
        ResultJson.number(node, "velocityGradient", t.velocityGradient());
        node.put("velocityGradientUnit", "1/s");
        Estimate p95 = t.blendTime95();
        if (p95.determined()) {
            ResultJson.number(node, "blendTimeInCirculationTimes", p95.value() / t.circulationTime());
        }
        ArrayNode probes = node.putArray("probes");
        for (TankStageResult.Probe p : t.probes()) {
            ObjectNode o = probes.addObject();
            o.put("name", p.name());
            ResultJson.array(o, "position", p.position());
            ResultJson.number(o, "radius", p.radius());
            ObjectNode pb = o.putObject("blendTime");
            for (int i = 0; i < keys.length; i++) {
                estimate(pb, keys[i], p.blendTimes().get(i), "s");
            }
            ResultJson.array(o, "reading", p.concentration());
            ResultJson.array(o, "readingLow", p.low());
            ResultJson.array(o, "readingHigh", p.high());
        }
        ResultJson.array(node, "time", t.times());
        ResultJson.array(node, "coefficientOfVariation", t.coefficientOfVariation());
        node.put("timeStep", t.timeStep());
        node.put("steps", t.steps());
        notes(node, t.warnings(), t.notes());
    }

    private static void estimate(ObjectNode parent, String key, Estimate e, String unit) {
        ObjectNode o = parent.putObject(key);
        ResultJson.number(o, "value", e.value());
        ResultJson.number(o, "low", e.low());
        ResultJson.number(o, "high", e.high());
        o.put("unit", unit);
        if (!e.note().isEmpty()) {
            o.put("note", e.note());
        }
    }

    private static void notes(ObjectNode node, java.util.List<String> warnings, java.util.List<String> notes) {
        ArrayNode w = node.putArray("warnings");
        warnings.forEach(w::add);
        ArrayNode n = node.putArray("notes");
        notes.forEach(n::add);
    }
}
