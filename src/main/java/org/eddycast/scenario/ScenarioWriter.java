package org.eddycast.scenario;

import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.IOException;
import java.nio.file.Path;

/**
 * Writes scenarios in the format {@link ScenarioReader} reads (the current format version), atomically.
 * Reading what this writes gives back an equal scenario.
 */
public final class ScenarioWriter {

    private static final ObjectMapper MAPPER = new ObjectMapper().enable(SerializationFeature.INDENT_OUTPUT);

    private ScenarioWriter() {
    }

    /** Writes the scenario to a file (temporary file, then move). */
    public static void write(Scenario s, Path file) throws IOException {
        AtomicFiles.writeString(file, text(s) + "\n");
    }

    /** The scenario as JSON text. */
    public static String text(Scenario s) {
        try {
            return MAPPER.writeValueAsString(tree(s));
        } catch (JsonProcessingException e) {
            throw new IllegalStateException(e);
        }
    }

    /** The scenario as a JSON tree. */
    public static ObjectNode tree(Scenario s) {
        ObjectNode root = MAPPER.createObjectNode();
        root.put("version", Scenario.FORMAT_VERSION);
        root.put("name", s.name());
        if (!s.description().isEmpty()) {
            root.put("description", s.description());
        }
        flow(root.putObject("flow"), s.flow());
        ObjectNode substance = root.putObject("substance");
        if (!s.substance().name().isEmpty()) {
            substance.put("name", s.substance().name());
        }
        substance.put("molecularDiffusivity", s.substance().molecularDiffusivity());
        FirstOrderLoss loss = s.substance().loss();
        if (loss.present()) {
            if (loss.givenAsHalfLife()) {
                substance.put("halfLife", loss.halfLife());
            } else {
                substance.put("decayRate", loss.rate());
            }
        }
        if (s.release().given()) {
            release(root.putObject("release"), s.release(), s.flow());
        }
        ObjectNode forecast = root.putObject("forecast");
        optional(forecast, "horizon", s.forecast().horizon());
        optional(forecast, "horizonDistance", s.forecast().horizonDistance());
        forecast.put("widthMeasure", s.forecast().widthMeasure());
        forecast.put("edgeFraction", s.forecast().edgeFraction());
        stations(forecast, s.forecast());
        simulation(root.putObject("simulation"), s.simulation());
        if (s.uncertainty().ranged()) {
            uncertainty(root.putObject("uncertainty"), s.uncertainty());
        }
        return root;
    }

    private static void flow(ObjectNode n, FlowSpec flow) {
        n.put("kind", flow.kind());
        if (flow instanceof DirectFlow d) {
            n.put("dimensions", d.dimensions());
            n.put("rmsVelocity", d.rmsVelocity());
            n.put("integralLength", d.integralLength());
            optional(n, "correlationTime", d.correlationTime());
            if (d.meanVelocity() != 0) {
                n.put("meanVelocity", d.meanVelocity());
            }
            ObjectNode sp = n.putObject("spectrum");
            sp.put("model", d.spectrum().model().key());
            if (d.spectrum().model() == SpectrumSpec.Model.POWER_LAW) {
                sp.put("slope", d.spectrum().slope());
                sp.put("wavenumberRatio", d.spectrum().wavenumberRatio());
            } else {
                sp.put("kolmogorovLength", d.spectrum().kolmogorovLength());
            }
        } else if (flow instanceof TankFlow t) {
            TankDesign d = t.design();
            n.put("tankDiameter", d.tankDiameter());
            n.put("liquidHeight", d.liquidHeight());
            n.put("impellerDiameter", d.impellerDiameter());
            n.put("impellerSpeed", d.impellerSpeed());
            if (d.powerNumber() != null) {
                n.put("powerNumber", d.powerNumber());
            }
            if (d.impellerType() != null) {
                n.put("impellerType", d.impellerType().key());
            }
            n.put("kinematicViscosity", d.kinematicViscosity());
            n.put("baffled", d.baffled());
            if (d.pumpingNumber() != null) {
                n.put("pumpingNumber", d.pumpingNumber());
            }
            if (d.clearance() != null) {
                n.put("clearance", d.clearance());
            }
            if (d.throughflow() != null) {
                n.put("throughflow", d.throughflow());
            }
        } else if (flow instanceof ChannelFlow c) {
            ChannelDesign d = c.design();
            n.put("depth", d.depth());
            n.put("width", d.width());
            n.put("meanVelocity", d.meanVelocity());
            if (d.bedSlope() != null) {
                n.put("bedSlope", d.bedSlope());
            }
            if (d.shearVelocity() != null) {
                n.put("shearVelocity", d.shearVelocity());
            }
            if (d.manningN() != null) {
                n.put("manningN", d.manningN());
            }
            n.put("kinematicViscosity", d.kinematicViscosity());
            if (d.section() instanceof ChannelSection.Trapezoidal trapezoid) {
                ObjectNode sec = n.putObject("section");
                sec.put("kind", "trapezoidal");
                sec.put("sideSlope", trapezoid.sideSlope());
            } else if (d.section() instanceof ChannelSection.Surveyed survey) {
                ObjectNode sec = n.putObject("section");
                sec.put("kind", "surveyed");
                com.fasterxml.jackson.databind.node.ArrayNode list = sec.putArray("verticals");
                double[] offsets = survey.offsets();
                double[] depths = survey.depths();
                double[] velocities = survey.velocities();
                for (int i = 0; i < offsets.length; i++) {
                    ObjectNode v = list.addObject();
                    v.put("offset", offsets[i]);
                    v.put("depth", depths[i]);
                    v.put("velocity", velocities[i]);
                }
            }
        } else if (flow instanceof MeasuredFlow m) {
            n.put("record", m.record());
            n.put("spectrum", m.modelSpectrum() ? "model" : "power-law");
            optional(n, "samplingRate", m.samplingRate());
            n.put("despike", m.despike());
            n.put("detrend", m.detrend());
            n.put("kinematicViscosity", m.kinematicViscosity());
        } else if (flow instanceof VerificationFlow v) {
            n.put("dimensions", v.dimensions());
            n.put("amplitude", v.amplitude());
            n.put("wavenumber", v.wavenumber());
            optional(n, "correlationTime", v.correlationTime());
            if (v.type() == VerificationFlow.Type.BELTRAMI) {
                ObjectNode c = n.putObject("coefficients");
                c.put("a", v.coefficients()[0]);
                c.put("b", v.coefficients()[1]);
                c.put("c", v.coefficients()[2]);
            }
        }
    }

    /** Stations, limits, the dose plan's target and the display units, each only when given. */
    private static void stations(ObjectNode n, ForecastSettings f) {
        if (!f.stations().isEmpty()) {
            com.fasterxml.jackson.databind.node.ArrayNode list = n.putArray("stations");
            for (Station st : f.stations()) {
                ObjectNode o = list.addObject();
                o.put("distance", st.distance());
                optional(o, "across", st.across());
            }
        }
        if (!f.probes().isEmpty()) {
            com.fasterxml.jackson.databind.node.ArrayNode list = n.putArray("probes");
            for (ProbePoint p : f.probes()) {
                ObjectNode o = list.addObject();
                o.put("x", p.x());
                o.put("y", p.y());
                o.put("z", p.z());
            }
        }
        optional(n, "detectionLimit", f.detectionLimit());
        optional(n, "targetPeak", f.targetPeak());
        if (f.cap() != null) {
            ObjectNode c = n.putObject("cap");
            c.put("distance", f.cap().distance());
            c.put("concentration", f.cap().concentration());
        }
        if (!f.units().equals(DisplayUnits.si())) {
            ObjectNode u = n.putObject("units");
            u.put("concentration", f.units().concentration());
            u.put("time", f.units().time());
            u.put("distance", f.units().distance());
            u.put("speed", f.units().speed());
        }
    }

    /** The release's fields that apply to the flow (see {@link Applicability}): the reader refuses the others. */
    private static void release(ObjectNode n, Release r, FlowSpec flow) {
        n.put("mass", r.mass());
        optional(n, "volume", r.volume());
        if (flow instanceof ChannelFlow) {
            optional(n, "rate", r.rate());
            optional(n, "duration", r.duration());
            n.put("location", r.atBank() ? "bank" : "centre-line");
        }
        if (r.position() != null && flow instanceof TankFlow) {
            ObjectNode p = n.putObject("position");
            p.put("x", r.position()[0]);
            p.put("y", r.position()[1]);
            p.put("z", r.position()[2]);
        }
    }

    private static void uncertainty(ObjectNode n, UncertaintySettings u) {
        com.fasterxml.jackson.databind.node.ArrayNode list = n.putArray("ranges");
        for (InputRange r : u.ranges()) {
            ObjectNode item = list.addObject();
            item.put("input", r.input());
            switch (r.shape()) {
                case PLUS_MINUS -> item.put("plusMinus", r.a());
                case RULE -> item.put("spread", "rule");
                case UNIFORM -> {
                    item.put("low", r.a());
                    item.put("high", r.b());
                }
                case TRIANGULAR -> {
                    item.put("distribution", "triangular");
                    item.put("low", r.a());
                    item.put("mode", r.b());
                    item.put("high", r.c());
                }
                case NORMAL -> {
                    item.put("distribution", "normal");
                    item.put("mean", r.a());
                    item.put("sd", r.b());
                }
                case LOG_NORMAL -> {
                    item.put("distribution", "log-normal");
                    item.put("median", r.a());
                    item.put("geometricSd", r.b());
                }
            }
            if (!r.basis().isEmpty()) {
                item.put("basis", r.basis());
            }
        }
        n.put("baseSamples", u.baseSamples());
        n.put("particles", u.particles());
    }

    private static void simulation(ObjectNode n, SimulationSettings s) {
        n.put("particles", s.particles());
        n.put("groupSize", s.groupSize());
        n.put("modes", s.modes());
        n.put("integrator", s.integrator().key());
        optional(n, "timeStep", s.timeStep());
        optional(n, "duration", s.duration());
        n.put("seed", s.seed());
        optional(n, "precisionTarget", s.precisionTarget());
        n.put("maxParticles", s.maxParticles());
    }

    /** NaN and infinity mean "not given": the field is left out. */
    private static void optional(ObjectNode n, String field, double value) {
        if (Double.isFinite(value)) {
            n.put(field, value);
        }
    }
}
