package org.eddycast.ui;

import java.util.List;
import org.eddycast.scenario.ImpellerType;

/** The form's sections and fields, in order, as plain data. */
public final class FormLayout {

    /** A titled group of fields. */
    public record Section(String key, List<FieldSpec> fields) {
        public Section {
            fields = List.copyOf(fields);
        }
    }

    /** The flow routes in the order the route chooser shows them. */
    public static final List<String> ROUTES = List.of("direct", "tank", "channel", "measured");

    private static final List<String> IMPELLERS = java.util.Arrays.stream(ImpellerType.values())
            .map(ImpellerType::key).toList();

    /** Every section of the form. */
    public static final List<Section> SECTIONS = List.of(
            new Section("section.scenario", List.of(FieldSpec.text("name", null, false))),
            new Section("section.flow", List.of(
                    FieldSpec.number("flow.rmsVelocity", "m/s", "direct", false),
                    FieldSpec.number("flow.integralLength", "m", "direct", false),
                    FieldSpec.number("flow.correlationTime", "s", "direct", true),
                    FieldSpec.number("flow.meanVelocity", "m/s", "direct", true),
                    FieldSpec.number("flow.spectrum.slope", "", "direct", true),
                    FieldSpec.number("flow.spectrum.wavenumberRatio", "", "direct", true),
                    FieldSpec.number("flow.tankDiameter", "m", "tank", false),
                    FieldSpec.number("flow.liquidHeight", "m", "tank", false),
                    FieldSpec.number("flow.impellerDiameter", "m", "tank", false),
                    FieldSpec.number("flow.impellerSpeed", "rev/s", "tank", false),
                    FieldSpec.choice("flow.impellerType", "tank", IMPELLERS),
                    FieldSpec.flag("flow.baffled", "tank"),
                    FieldSpec.number("flow.pumpingNumber", "", "tank", true),
                    FieldSpec.number("flow.clearance", "m", "tank", true),
                    FieldSpec.number("flow.throughflow", "m\u00b3/s", "tank", true),
                    FieldSpec.number("flow.depth", "m", "channel", false),
                    FieldSpec.number("flow.width", "m", "channel", false),
                    new FieldSpec("flow.meanVelocity", FieldSpec.Kind.NUMBER, "m/s", "channel", false, List.of()),
                    FieldSpec.number("flow.bedSlope", "m/m", "channel", true),
                    FieldSpec.number("flow.shearVelocity", "m/s", "channel", true),
                    FieldSpec.number("flow.manningN", "s/m^(1/3)", "channel", true),
                    FieldSpec.text("flow.record", "measured", false),
                    FieldSpec.choice("flow.spectrum", "measured", List.of("power-law", "model")),
                    FieldSpec.number("flow.samplingRate", "Hz", "measured", true),
                    FieldSpec.flag("flow.despike", "measured"),
                    FieldSpec.flag("flow.detrend", "measured"))),
            new Section("section.release", List.of(
                    FieldSpec.text("substance.name", null, true),
                    FieldSpec.number("substance.molecularDiffusivity", "m\u00b2/s", null, false),
                    FieldSpec.number("substance.halfLife", "s", null, true),
                    FieldSpec.number("release.mass", "kg", null, true),
                    FieldSpec.number("release.duration", "s", "channel", true),
                    FieldSpec.number("release.rate", "kg/s", "channel", true),
                    FieldSpec.choice("release.location", "channel", List.of("centre-line", "bank")),
                    FieldSpec.number("release.position.x", "m", "tank", true),
                    FieldSpec.number("release.position.y", "m", "tank", true),
                    FieldSpec.number("release.position.z", "m", "tank", true))),
            new Section("section.forecast", List.of(
                    FieldSpec.number("forecast.horizon", "s", null, true),
                    FieldSpec.number("forecast.horizonDistance", "m", "channel", true),
                    // the scenario file's default (full width at half maximum) first, so an empty form shows it
                    FieldSpec.choice("forecast.widthMeasure", null, List.of("fwhm", "standard-deviation",
                            "visible-edge")),
                    FieldSpec.number("forecast.edgeFraction", "", null, true))),
            new Section("section.uncertainty", List.of(
                    new FieldSpec("uncertainty.ranges", FieldSpec.Kind.RANGES, "", null, true, List.of()),
                    FieldSpec.integer("uncertainty.baseSamples", null, true),
                    FieldSpec.integer("uncertainty.particles", null, true))),
            new Section("section.accuracy", List.of(
                    FieldSpec.integer("simulation.particles", null, true),
                    FieldSpec.number("simulation.precisionTarget", "", null, true),
                    FieldSpec.number("simulation.duration", "s", null, true),
                    FieldSpec.number("simulation.timeStep", "s", null, true),
                    FieldSpec.integer("simulation.seed", null, true))));

    private FormLayout() {
    }
}
