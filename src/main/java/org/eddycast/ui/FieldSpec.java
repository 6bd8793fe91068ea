package org.eddycast.ui;

import java.util.List;

/**
 * One input of the scenario form, as plain data: where its value goes in the scenario file, what kind of value
 * it takes, its unit, the flow route it belongs to (null for every route) and whether it may be left empty.
 * The label and the tooltip come from {@code form.properties} under the key {@code path}.
 *
 * @param path     the scenario-file path, for example "flow.tankDiameter"
 * @param kind     the kind of value
 * @param unit     the unit shown beside the field ("" for none)
 * @param route    the flow route the field belongs to ("direct", "tank", ...), or null
 * @param optional true when an empty field is left out of the scenario
 * @param choices  the allowed values of a choice field (empty otherwise)
 */
public record FieldSpec(String path, Kind kind, String unit, String route, boolean optional, List<String> choices) {

    /** The kinds of value a field takes. */
    public enum Kind { NUMBER, INTEGER, TEXT, CHOICE, FLAG, RANGES }

    public FieldSpec {
        choices = List.copyOf(choices);
    }

    static FieldSpec number(String path, String unit, String route, boolean optional) {
        return new FieldSpec(path, Kind.NUMBER, unit, route, optional, List.of());
    }

    static FieldSpec integer(String path, String route, boolean optional) {
        return new FieldSpec(path, Kind.INTEGER, "", route, optional, List.of());
    }

    static FieldSpec text(String path, String route, boolean optional) {
        return new FieldSpec(path, Kind.TEXT, "", route, optional, List.of());
    }

    static FieldSpec choice(String path, String route, List<String> choices) {
        return new FieldSpec(path, Kind.CHOICE, "", route, false, choices);
    }

    static FieldSpec flag(String path, String route) {
        return new FieldSpec(path, Kind.FLAG, "", route, false, List.of());
    }

    /** The last part of the path: the key inside its JSON object. */
    public String key() {
        return path.substring(path.lastIndexOf('.') + 1);
    }

    /** The path of the JSON object holding the value, for example "flow.spectrum". */
    public String parent() {
        int dot = path.lastIndexOf('.');
        return dot < 0 ? "" : path.substring(0, dot);
    }
}
