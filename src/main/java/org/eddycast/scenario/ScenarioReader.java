package org.eddycast.scenario;

import com.fasterxml.jackson.core.JsonLocation;
import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.DeserializationFeature;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.eddycast.particles.Integrator;

/**
 * Reads and validates scenario files (JSON, SI units). Every problem is reported at once, each naming its
 * field and what would be valid; a syntax error names its line and column.
 */
public final class ScenarioReader {

    /** Default particles. */
    public static final int DEFAULT_PARTICLES = 16384;
    /** Default particles per realization. */
    public static final int DEFAULT_GROUP_SIZE = 64;
    /** Default Fourier modes per realization. */
    public static final int DEFAULT_MODES = 64;
    /** The most particles a scenario may ask for. */
    public static final int MAX_PARTICLES = 50_000_000;

    private static final ObjectMapper MAPPER = new ObjectMapper()
            .enable(DeserializationFeature.FAIL_ON_TRAILING_TOKENS);

    private ScenarioReader() {
    }

    /** Reads a scenario file. */
    public static Scenario read(Path file) throws IOException {
        return parse(Files.readString(file, StandardCharsets.UTF_8));
    }

    /** Parses and validates scenario text. */
    public static Scenario parse(String json) {
        JsonNode root;
        try {
            root = MAPPER.readTree(json);
        } catch (JsonProcessingException e) {
            JsonLocation at = e.getLocation();
            String where = at == null ? "" : String.format(Locale.ROOT, "line %d, column %d: ", at.getLineNr(),
                    at.getColumnNr());
            throw new ScenarioException(where + "not valid JSON (" + e.getOriginalMessage() + ")");
        }
        if (root == null || !root.isObject()) {
            throw new ScenarioException("a scenario must be a JSON object { \"version\": 1, \"name\": ..., \"flow\": ... }");
        }
        List<String> problems = new ArrayList<>();
        FieldReader top = FieldReader.root(root, problems);
        int version = (int) top.integer("version", 1, Integer.MAX_VALUE, Scenario.FORMAT_VERSION, true);
        if (version > Scenario.FORMAT_VERSION) {
            problems.add("version " + version + " is newer than this program reads (" + Scenario.FORMAT_VERSION
                    + "); update the program");
        }
        String name = top.text("name", "unnamed scenario", false);
        String description = top.text("description", "", false);
        FieldReader flowNode = top.object("flow", true);
        FlowSpec flow = flowNode == null ? null : readFlow(flowNode);
        FieldReader substanceNode = top.object("substance", true);
        Substance substance = substanceNode == null ? null : readSubstance(substanceNode);
        FieldReader simulationNode = top.object("simulation", false);
        SimulationSettings simulation = readSimulation(simulationNode, flow);
        if (!problems.isEmpty()) {
            throw new ScenarioException(problems);
        }
        return new Scenario(version, name, description, flow, substance, simulation);
    }

    private static FlowSpec readFlow(FieldReader f) {
        String kind = f.choice("kind", List.of("direct", "shear", "cellular", "beltrami"), null, true);
        if (kind == null) {
            return null;
        }
        int dims = (int) f.integer("dimensions", 2, 3, kind.equals("beltrami") ? 3 : ("direct".equals(kind) ? 3 : 2),
                false);
        if (kind.equals("direct")) {
            return readDirect(f, dims);
        }
        if (kind.equals("beltrami") && dims != 3) {
            f.problem(f.name("dimensions") + " must be 3 for the Beltrami flow; got " + dims);
        }
        double amplitude = f.number("amplitude", "m/s", 0, 1e3, true, 1, true);
        boolean shear = kind.equals("shear");
        double wavenumber = f.number("wavenumber", "1/m", 0, 1e6, !shear, 1, true);
        double tau = Double.POSITIVE_INFINITY;
        if (f.has("correlationTime")) {
            if (!shear) {
                f.problem(f.name("correlationTime") + " applies to the shear flow only; remove it for " + kind);
            } else {
                tau = f.number("correlationTime", "s", 0, 1e9, true, 1, true);
            }
        }
        if (shear && wavenumber == 0 && Double.isInfinite(tau)) {
            f.problem(f.name("wavenumber") + " must be > 0 1/m for a steady shear (zero needs a correlationTime)");
        }
        double[] coefficients = {amplitude, amplitude, amplitude};
        if (f.has("coefficients")) {
            FieldReader c = f.object("coefficients", true);
            if (!kind.equals("beltrami")) {
                f.problem(f.name("coefficients") + " applies to the Beltrami flow only");
            } else if (c != null) {
                coefficients[0] = c.number("a", "m/s", -1e3, 1e3, false, amplitude, false);
                coefficients[1] = c.number("b", "m/s", -1e3, 1e3, false, amplitude, false);
                coefficients[2] = c.number("c", "m/s", -1e3, 1e3, false, amplitude, false);
            }
        }
        VerificationFlow.Type type = VerificationFlow.Type.valueOf(kind.toUpperCase(Locale.ROOT));
        return new VerificationFlow(type, dims, amplitude, wavenumber, tau, coefficients);
    }

    private static DirectFlow readDirect(FieldReader f, int dims) {
        double rms = f.number("rmsVelocity", "m/s", 0, 100, true, 1, true);
        double length = f.number("integralLength", "m", 0, 1e5, true, 1, true);
        double tau = f.has("correlationTime")
                ? f.number("correlationTime", "s", 0, 1e9, true, 1, true) : Double.POSITIVE_INFINITY;
        double mean = f.number("meanVelocity", "m/s", 0, 100, false, 0, false);
        SpectrumSpec spectrum = SpectrumSpec.powerLaw(SpectrumSpec.KOLMOGOROV_SLOPE, 16);
        FieldReader s = f.object("spectrum", false);
        if (s != null) {
            String model = s.choice("model", List.of("power-law", "model"), "power-law", false);
            if (model.equals("power-law")) {
                double slope = s.number("slope", "", -10, 10, false, SpectrumSpec.KOLMOGOROV_SLOPE, false);
                double ratio = s.number("wavenumberRatio", "", 1, 1e6, false, 16, false);
                spectrum = SpectrumSpec.powerLaw(slope, ratio);
            } else {
                double eta = s.number("kolmogorovLength", "m", 0, 1e3, true, Double.NaN, true);
                if (eta > 0 && length > 0 && length / eta < org.eddycast.field.PopeModelSpectrum.MIN_RATIO) {
                    s.problem(s.name("kolmogorovLength") + " must be at most integralLength / 15 = "
                            + FieldReader.format(length / org.eddycast.field.PopeModelSpectrum.MIN_RATIO) + " m for the model spectrum; got "
                            + FieldReader.format(eta));
                }
                spectrum = SpectrumSpec.modelSpectrum(eta);
            }
        }
        return new DirectFlow(dims, rms, length, tau, spectrum, mean);
    }

    private static Substance readSubstance(FieldReader s) {
        String name = s.text("name", "", false);
        double d0 = s.number("molecularDiffusivity", "m^2/s", 0, 1.0, true, 1e-9, true);
        return new Substance(name, d0);
    }

    private static SimulationSettings readSimulation(FieldReader s, FlowSpec flow) {
        // timeStep and duration may be left out for turbulent flows: the engine then chooses them from the
        // flow's time scales and says so.
        if (s == null) {
            if (flow instanceof VerificationFlow) {
                throw new ScenarioException("simulation is missing: verification flows need simulation.timeStep "
                        + "and simulation.duration (s)");
            }
            return new SimulationSettings(DEFAULT_PARTICLES, DEFAULT_GROUP_SIZE, DEFAULT_MODES, Integrator.STRANG,
                    Double.NaN, Double.NaN, 1, Double.NaN, 16 * DEFAULT_PARTICLES);
        }
        int particles = (int) s.integer("particles", 64, MAX_PARTICLES, DEFAULT_PARTICLES, false);
        int group = (int) s.integer("groupSize", 1, 65536, DEFAULT_GROUP_SIZE, false);
        int modes = (int) s.integer("modes", 1, 4096, DEFAULT_MODES, false);
        List<String> keys = new ArrayList<>();
        for (Integrator i : Integrator.values()) {
            keys.add(i.key());
        }
        Integrator integrator = Integrator.fromKey(s.choice("integrator", keys, "strang", false));
        double dt = s.number("timeStep", "s", 0, 1e9, true, Double.NaN, false);
        double duration = s.number("duration", "s", 0, 1e12, true, Double.NaN, false);
        if (dt > 0 && duration > 0 && duration / dt < 2) {
            s.problem(s.name("duration") + " must be at least two time steps (" + FieldReader.format(2 * dt)
                    + " s); got " + FieldReader.format(duration));
        }
        if (dt > 0 && duration > 0 && duration / dt > 1e8) {
            s.problem(s.name("timeStep") + " gives " + FieldReader.format(duration / dt)
                    + " steps; at most 1e8 are allowed: raise the time step or shorten the duration");
        }
        long seed = s.integer("seed", Long.MIN_VALUE, Long.MAX_VALUE, 1, false);
        double target = s.number("precisionTarget", "(fraction)", 0, 0.5, true, Double.NaN, false);
        int maxParticles = (int) s.integer("maxParticles", particles, MAX_PARTICLES,
                Math.min(MAX_PARTICLES, 16L * particles), false);
        if (flow instanceof VerificationFlow && (Double.isNaN(dt) || Double.isNaN(duration))) {
            s.problem(s.name(Double.isNaN(dt) ? "timeStep" : "duration")
                    + " is missing: verification flows need a time step and a duration in s");
        }
        return new SimulationSettings(particles, group, modes, integrator, dt, duration, seed, target, maxParticles);
    }
}
