package org.eddycast.propagation;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.eddycast.forecast.TankFlowRules;
import org.eddycast.forecast.TankRules;
import org.eddycast.scenario.InputRange;
import org.eddycast.scenario.MeasuredFlow;
import org.eddycast.scenario.Scenario;
import org.eddycast.scenario.ScenarioException;
import org.eddycast.scenario.ScenarioReader;
import org.eddycast.scenario.ScenarioWriter;
import org.eddycast.scenario.TankDesign;
import org.eddycast.scenario.TankFlow;
import org.eddycast.scenario.UncertaintySettings;

/**
 * Makes the scenario of one sampled point: the base scenario with each ranged input set to the point's value and
 * the sweep's particle count, read back through the scenario reader so that every value passes the same checks a
 * user's file does. The sampled scenario carries no ranges of its own.
 */
public final class ScenarioSampler {

    private final Scenario base;
    private final ObjectNode tree;
    private final List<String> inputs = new ArrayList<>();
    private final List<String> pointers = new ArrayList<>();
    private final double[] nominal;

    /** A sampler for the scenario's own ranges. */
    public ScenarioSampler(Scenario scenario) {
        this.base = scenario;
        UncertaintySettings u = scenario.uncertainty();
        this.tree = ScenarioWriter.tree(scenario.withUncertainty(UncertaintySettings.none()));
        if (scenario.flow() instanceof MeasuredFlow m) {
            // the sampled scenario is read without its file's folder, so its record is named in full
            ((ObjectNode) tree.get("flow")).put("record", m.resolved().toAbsolutePath().toString());
        }
        ((ObjectNode) tree.get("simulation")).put("particles", u.particles());
        nominal = new double[u.ranges().size()];
        for (int i = 0; i < nominal.length; i++) {
            String input = u.ranges().get(i).input();
            inputs.add(input);
            pointers.add(pointer(input));
            nominal[i] = nominalValue(scenario, tree.at(pointers.get(i)), input);
        }
    }

    /** The ranged inputs' paths, in the design's column order. */
    public List<String> inputs() {
        return List.copyOf(inputs);
    }

    /** The value each input has in the scenario itself (for a tank's rule value left out, the rule's value). */
    public double[] nominal() {
        return nominal.clone();
    }

    /** The ranges as given. */
    public List<InputRange> ranges() {
        return base.uncertainty().ranges();
    }

    /**
     * The scenario at one point.
     *
     * @throws ScenarioException naming the inputs and values when the point gives a scenario that cannot run
     */
    public Scenario at(double[] values) {
        ObjectNode copy = tree.deepCopy();
        for (int i = 0; i < values.length; i++) {
            set(copy, pointers.get(i), values[i]);
        }
        try {
            return ScenarioReader.parse(copy.toString(), Path.of("").toAbsolutePath());
        } catch (ScenarioException e) {
            StringBuilder point = new StringBuilder();
            for (int i = 0; i < values.length; i++) {
                point.append(i == 0 ? "" : ", ").append(inputs.get(i)).append(" = ")
                        .append(String.format(Locale.ROOT, "%.6g", values[i]));
            }
            throw new ScenarioException("the input ranges reach a scenario that cannot run (" + point + "): "
                    + String.join("; ", e.problems()) + ". Narrow the ranges so that every value is valid.");
        }
    }

    private static void set(ObjectNode root, String pointer, double value) {
        int slash = pointer.lastIndexOf('/');
        JsonNode parent = root.at(pointer.substring(0, slash));
        String field = pointer.substring(slash + 1);
        if (parent instanceof ObjectNode o) {
            o.put(field, value);
        } else if (parent instanceof com.fasterxml.jackson.databind.node.ArrayNode a) {
            a.set(Integer.parseInt(field), a.numberNode(value));
        } else {
            throw new IllegalStateException("no place for " + pointer);
        }
    }

    private static double nominalValue(Scenario s, JsonNode value, String input) {
        if (value.isNumber()) {
            return value.asDouble();
        }
        if (s.flow() instanceof TankFlow t) {
            TankDesign d = t.design();
            switch (input) {
                case "flow.powerNumber":
                    return TankRules.typicalPowerNumber(d.impellerType()).value();
                case "flow.pumpingNumber":
                    return TankFlowRules.pumpingNumber(d).value();
                case "flow.clearance":
                    return d.tankDiameter() / 3;
                default:
                    break;
            }
        }
        throw new ScenarioException(input + " has no value in this scenario to range");
    }

    /** The JSON pointer of a path such as {@code forecast.stations[0].distance}. */
    static String pointer(String input) {
        return "/" + input.replaceAll("\\[(\\d+)]", ".$1").replace('.', '/');
    }
}
