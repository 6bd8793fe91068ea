package org.eddycast.report;

import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import org.eddycast.engine.DiffusivityResult;
import org.eddycast.engine.StudyResult;
import org.eddycast.forecast.Comparison;
import org.eddycast.forecast.Forecast;
import org.eddycast.forecast.HandbookEstimate;
import org.eddycast.scenario.Derivation;
import org.eddycast.scenario.TurbulenceStatistics;
import org.eddycast.stats.AxisEstimate;
import org.eddycast.stats.SlopeEstimate;

/** The result of a study as JSON, in SI units. */
public final class ResultJson {

    static final ObjectMapper MAPPER = new ObjectMapper().enable(SerializationFeature.INDENT_OUTPUT);

    private ResultJson() {
    }

    /** The result as a JSON tree. */
    public static ObjectNode of(StudyResult study) {
        DiffusivityResult r = study.diffusivity();
        ObjectNode root = MAPPER.createObjectNode();
        root.put("tool", "eddycast");
        root.put("toolVersion", study.toolVersion());
        root.put("scenario", study.scenario().name());
        root.put("finished", study.finished().toString());
        root.put("seed", study.scenario().simulation().seed());
        if (study.answers() != null) {
            AnswersJson.write(root, study.answers());
        }
        ObjectNode eddy = root.putObject("eddyDiffusivity");
        eddy.put("unit", "m^2/s");
        eddy.put("interval", "95% Student-t over independent blocks");
        ObjectNode tl = MAPPER.createObjectNode();
        for (AxisEstimate a : r.axes()) {
            SlopeEstimate e = a.diffusivity();
            ObjectNode axis = eddy.putObject(a.axisName());
            axis.put("determined", a.determined());
            // a value that is not determined is never written as a result (see the warnings)
            double shown = a.determined() ? 1 : Double.NaN;
            number(axis, "value", shown * e.value());
            number(axis, "low", shown * e.low());
            number(axis, "high", shown * e.high());
            number(axis, "standardError", shown * e.standardError());
            axis.put("settled", a.settled());
            number(tl, a.axisName(), a.lagrangianTimeScale());
        }
        ObjectNode lagrangian = root.putObject("lagrangianTimeScale");
        lagrangian.put("unit", "s");
        lagrangian.setAll(tl);
        ObjectNode dimensionless = root.putObject("dimensionless");
        number(dimensionless, "kubo", r.kubo());
        number(dimensionless, "peclet", r.peclet());
        number(root, "molecularDiffusivity", r.molecularDiffusivity());
        if (study.turbulence() != null) {
            root.set("turbulence", turbulence(study.turbulence()));
        }
        ObjectNode run = root.putObject("run");
        run.put("field", r.fieldDescription());
        run.put("integrator", study.scenario().simulation().integrator().key());
        run.put("particles", r.particles());
        run.put("blocks", r.blocks());
        run.put("steps", r.steps());
        number(run, "timeStep", r.timeStep());
        number(run, "duration", r.duration());
        run.put("threads", r.threads());
        number(run, "elapsedSeconds", r.elapsedSeconds());
        run.put("fromCache", r.fromCache());
        ArrayNode preflight = root.putArray("preflight");
        study.preflight().forEach(preflight::add);
        ArrayNode warnings = root.putArray("warnings");
        r.warnings().forEach(warnings::add);
        ArrayNode notes = root.putArray("notes");
        r.notes().forEach(notes::add);
        root.set("meanSquareDisplacement", curve(r));
        if (study.forecast() != null) {
            forecast(root, study.forecast(), study.scenario().release().mode());
        }
        if (study.transport() != null) {
            TransportJson.write(root, study.transport());
        }
        ArrayNode flowWarnings = root.putArray("flowWarnings");
        study.flow().warnings().forEach(flowWarnings::add);
        if (study.uncertainty() != null) {
            UncertaintyJson.write(root, study.uncertainty());
        }
        return root;
    }

    /** The result as indented JSON text. */
    public static String text(StudyResult study) {
        try {
            return MAPPER.writeValueAsString(of(study));
        } catch (com.fasterxml.jackson.core.JsonProcessingException e) {
            throw new IllegalStateException(e);
        }
    }

    static void forecast(ObjectNode root, Forecast f, String releaseMode) {
        ObjectNode node = root.putObject("forecast");
        node.put("grid", f.inDistance() ? "distance downstream (m)" : "time (s)");
        node.put("widthMeasure", f.measure().name().toLowerCase(java.util.Locale.ROOT).replace('_', '-'));
        node.put("widthMeasureDefinition", f.measure().label() + "; width = " + String.format(java.util.Locale.ROOT,
                "%.4f", f.widthFactor()) + " x standard deviation");
        node.put("simulatedUntil", f.simulatedUntil());
        array(node, f.inDistance() ? "distance" : "time", f.grid());
        array(node, "time", f.times());
        // SI throughout: the unit of every number beside it
        ObjectNode units = node.putObject("unit");
        units.put("simulatedUntil", "s");
        units.put("time", "s");
        if (f.inDistance()) {
            units.put("distance", "m");
        }
        ObjectNode widths = node.putObject("width");
        widths.put("unit", "m");
        String[] names = {"x", "y", "z"};
        for (int a = 0; a < 3; a++) {
            ObjectNode axis = widths.putObject(names[a]);
            array(axis, "value", f.width()[a]);
            array(axis, "low", f.widthLow()[a]);
            array(axis, "high", f.widthHigh()[a]);
        }
        ObjectNode peak = node.putObject("peakConcentration");
        peak.put("unit", "kg/m^3");
        peak.put("release", releaseMode.equals(org.eddycast.scenario.Release.OVER_DURATION)
                ? "over-duration (the whole mass counted as released)" : "instantaneous");
        array(peak, "value", f.peakConcentration());
        if (f.plumeConcentration().length > 0) {
            ObjectNode plume = node.putObject("continuousPlume");
            plume.put("unit", "kg/m^3");
            plume.put("what", "largest concentration in the cross-section of the steady plume of a continuous "
                    + "release, at each grid distance");
            array(plume, "value", f.plumeConcentration());
        }
        ArrayNode mixing = node.putArray("mixing");
        for (Forecast.MixingFigure m : f.mixing()) {
            ObjectNode o = mixing.addObject();
            o.put("name", m.name());
            number(o, "value", m.value());
            number(o, "low", m.low());
            number(o, "high", m.high());
            o.put("unit", m.unit());
            o.put("method", m.method());
        }
        ArrayNode handbook = root.putArray("handbook");
        for (Comparison c : f.handbook()) {
            ObjectNode o = handbook.addObject();
            HandbookEstimate e = c.estimate();
            o.put("name", e.name());
            number(o, "value", e.value());
            number(o, "low", e.low());
            number(o, "high", e.high());
            o.put("unit", e.unit());
            o.put("formula", e.formula());
            o.put("source", e.sourceText());
            o.put("validity", e.validity());
            number(o, "simulated", c.forecast());
            number(o, "ratio", c.ratio());
            o.put("agree", c.agree());
            o.put("summary", c.summary());
            ArrayNode reasons = o.putArray("likelyReasons");
            c.likelyReasons().forEach(reasons::add);
            ArrayNode w = o.putArray("warnings");
            e.warnings().forEach(w::add);
        }
        ArrayNode assumptions = root.putArray("assumptions");
        f.assumptions().forEach(assumptions::add);
        ArrayNode cautions = root.putArray("cautions");
        f.cautions().forEach(cautions::add);
    }

    static void array(ObjectNode node, String field, double[] values) {
        ArrayNode a = node.putArray(field);
        for (double v : values) {
            if (Double.isFinite(v)) {
                a.add(v);
            } else {
                a.addNull();
            }
        }
    }

    static ObjectNode turbulence(TurbulenceStatistics t) {
        ObjectNode node = MAPPER.createObjectNode();
        node.put("dimensions", t.dimensions());
        number(node, "rmsVelocity", t.rmsVelocity());
        ArrayNode rms = node.putArray("componentRms");
        for (double v : t.componentRms()) {
            rms.add(v);
        }
        number(node, "integralLength", t.integralLength());
        number(node, "correlationTime", t.correlationTime());
        number(node, "meanVelocity", t.meanVelocity());
        number(node, "dissipationRate", t.dissipationRate());
        ObjectNode spectrum = node.putObject("spectrum");
        spectrum.put("model", t.spectrum().model().key());
        number(spectrum, "slope", t.spectrum().slope());
        number(spectrum, "wavenumberRatio", t.spectrum().wavenumberRatio());
        number(spectrum, "kolmogorovLength", t.spectrum().kolmogorovLength());
        ArrayNode rules = node.putArray("derivations");
        for (Derivation d : t.derivations()) {
            ObjectNode rule = rules.addObject();
            rule.put("quantity", d.quantity());
            number(rule, "value", d.value());
            rule.put("unit", d.unit());
            rule.put("rule", d.rule());
            rule.put("source", d.source());
        }
        return node;
    }

    private static ObjectNode curve(DiffusivityResult r) {
        ObjectNode node = MAPPER.createObjectNode();
        node.put("unit", "m^2 (time in s)");
        ArrayNode times = node.putArray("time");
        for (double t : r.times()) {
            times.add(t);
        }
        String[] names = {"x", "y", "z"};
        for (int a = 0; a < r.axes().size(); a++) {
            ArrayNode values = node.putArray(names[a]);
            for (double v : r.meanSquareDisplacement(a)) {
                values.add(v);
            }
        }
        return node;
    }

    /** JSON has no NaN or infinity: those become null. */
    static void number(ObjectNode node, String field, double value) {
        if (Double.isFinite(value)) {
            node.put(field, value);
        } else {
            node.putNull(field);
        }
    }
}
