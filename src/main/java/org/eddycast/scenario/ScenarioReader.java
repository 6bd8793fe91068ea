package org.eddycast.scenario;

import com.fasterxml.jackson.core.JsonLocation;
import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.DeserializationFeature;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.json.JsonMapper;
import com.fasterxml.jackson.core.StreamReadFeature;
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

    // strict: a key given twice is refused (it would otherwise silently take its last value)
    private static final ObjectMapper MAPPER = JsonMapper.builder()
            .enable(DeserializationFeature.FAIL_ON_TRAILING_TOKENS)
            .enable(StreamReadFeature.STRICT_DUPLICATE_DETECTION)
            .build();

    private ScenarioReader() {
    }

    /**
     * Reads a scenario file: UTF-8 text (a byte-order mark is accepted); another encoding, a binary file or a
     * folder is refused with what it is named.
     */
    public static Scenario read(Path file) throws IOException {
        Path folder = file.toAbsolutePath().getParent();
        return parse(TextFiles.readUtf8(file, "scenario file"), folder == null ? Path.of("") : folder);
    }

    /** Parses and validates scenario text; relative record paths are resolved against the working folder. */
    public static Scenario parse(String json) {
        return parse(json, Path.of("").toAbsolutePath());
    }

    /** Parses and validates scenario text; relative record paths are resolved against {@code folder}. */
    public static Scenario parse(String json, Path folder) {
        JsonNode root;
        if (json.startsWith("\uFEFF")) {
            json = json.substring(1);
        }
        try {
            root = MAPPER.readTree(json);
        } catch (JsonProcessingException e) {
            String duplicate = DuplicateKeys.describe(e);
            if (duplicate != null) {
                throw new ScenarioException(duplicate);
            }
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
        Applicability.check(root, problems);
        int version = (int) top.integer("version", 1, Integer.MAX_VALUE, Scenario.FORMAT_VERSION, true);
        if (version > Scenario.FORMAT_VERSION) {
            problems.add("version " + version + " is newer than this program reads (" + Scenario.FORMAT_VERSION
                    + "); update the program");
        }
        String name = top.text("name", "unnamed scenario", false);
        String description = top.text("description", "", false);
        FieldReader flowNode = top.object("flow", true);
        FlowSpec flow = flowNode == null ? null : readFlow(flowNode, folder);
        FieldReader substanceNode = top.object("substance", true);
        Substance substance = substanceNode == null ? null : readSubstance(substanceNode);
        FieldReader simulationNode = top.object("simulation", false);
        SimulationSettings simulation = readSimulation(simulationNode, flow);
        FieldReader releaseNode = top.object("release", false);
        Release release = releaseNode == null ? Release.defaults() : readRelease(releaseNode);
        FieldReader forecastNode = top.object("forecast", false);
        ForecastSettings forecast = forecastNode == null ? ForecastSettings.defaults() : readForecast(forecastNode);
        FieldReader uncertaintyNode = top.object("uncertainty", false);
        UncertaintySettings uncertainty = uncertaintyNode == null ? UncertaintySettings.none()
                : UncertaintyReader.read(uncertaintyNode, root);
        top.rejectUnknown();
        for (FieldReader section : new FieldReader[] {flowNode, substanceNode, simulationNode, releaseNode,
                forecastNode, uncertaintyNode}) {
            if (section != null) {
                section.rejectUnknown();
            }
        }
        if (!problems.isEmpty()) {
            throw new ScenarioException(problems);
        }
        Scenario scenario = new Scenario(version, name, description, flow, substance, release, forecast, simulation,
                uncertainty);
        List<String> placement = ReleasePlacement.problems(scenario);
        if (!placement.isEmpty()) {
            throw new ScenarioException(placement);
        }
        return scenario;
    }

    private static FlowSpec readFlow(FieldReader f, Path folder) {
        String kind = f.choice("kind", List.of("direct", "tank", "channel", "measured", "shear", "cellular",
                "beltrami"), null, true);
        if (kind == null) {
            // the kind is missing or wrong (already reported): its other fields cannot be judged
            f.acceptAll();
            return null;
        }
        switch (kind) {
            case "tank":
                return readTank(f);
            case "channel":
                return readChannel(f);
            case "measured":
                return readMeasured(f, folder);
            default:
                break;
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
                c.rejectUnknown();
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
                    s.problem(s.name("kolmogorovLength") + " must be at most integralLength / "
                            + FieldReader.format(org.eddycast.field.PopeModelSpectrum.MIN_RATIO) + " = "
                            + FieldReader.format(length / org.eddycast.field.PopeModelSpectrum.MIN_RATIO) + " m for the model spectrum; got "
                            + FieldReader.format(eta));
                }
                spectrum = SpectrumSpec.modelSpectrum(eta);
            }
            s.allow("slope", "wavenumberRatio", "kolmogorovLength");
            s.rejectUnknown();
        }
        return new DirectFlow(dims, rms, length, tau, spectrum, mean);
    }

    private static TankFlow readTank(FieldReader f) {
        double t = f.number("tankDiameter", "m", 0, 1e3, true, 1, true);
        double h = f.number("liquidHeight", "m", 0, 1e3, true, 1, true);
        double d = f.number("impellerDiameter", "m", 0, 1e3, true, 0.3, true);
        double n = f.number("impellerSpeed", "rev/s", 0, 1e3, true, 1, true);
        Double po = f.has("powerNumber") ? f.number("powerNumber", "", 0, 100, true, 1, true) : null;
        List<String> types = new ArrayList<>();
        for (ImpellerType i : ImpellerType.values()) {
            types.add(i.key());
        }
        String typeKey = f.choice("impellerType", types, null, false);
        ImpellerType type = typeKey == null ? null : ImpellerType.fromKey(typeKey);
        Double nu = f.has("kinematicViscosity")
                ? f.number("kinematicViscosity", "m^2/s", 0, 1, true, 1e-6, true) : null;
        boolean baffled = f.bool("baffled", true);
        Double pumping = f.has("pumpingNumber") ? f.number("pumpingNumber", "", 0, 10, true, 0.7, true) : null;
        Double clearance = f.has("clearance") ? f.number("clearance", "m", 0, h, true, h / 3, true) : null;
        Double throughflow = f.has("throughflow") ? f.number("throughflow", "m^3/s", 0, 1e6, true, 1, true) : null;
        boolean ok = true;
        if (d >= t) {
            f.problem(f.name("impellerDiameter") + " must be smaller than tankDiameter (" + FieldReader.format(t)
                    + " m); got " + FieldReader.format(d));
            ok = false;
        }
        if (type == null && pumping == null && po != null) {
            f.problem(f.name("pumpingNumber") + " or " + f.name("impellerType") + " must be given: the tank's"
                    + " circulation needs the impeller's pumping number N_Q (a number above 0) or its type (one of "
                    + String.join(", ", types) + ")");
            ok = false;
        }
        if (po == null && type == null) {
            if (!f.has("impellerType")) {
                f.problem(f.name("powerNumber") + " or " + f.name("impellerType") + " must be given (impellerType "
                        + "one of " + String.join(", ", types) + ")");
            }
            ok = false;
        }
        if (!ok) {
            return null;
        }
        try {
            return new TankFlow(new TankDesign(t, h, d, n, po, type, nu, baffled, pumping, clearance, throughflow));
        } catch (IllegalArgumentException e) {
            f.problem(e.getMessage());
            return null;
        }
    }

    private static ChannelFlow readChannel(FieldReader f) {
        FieldReader sec = f.object("section", false);
        String kind = sec == null ? "rectangular"
                : sec.choice("kind", List.of("rectangular", "trapezoidal", "surveyed"), "rectangular", true);
        boolean surveyed = kind.equals("surveyed");
        ChannelSection.Surveyed survey = null;
        double sideSlope = Double.NaN;
        if (surveyed) {
            survey = readSurvey(sec);
        } else if (kind.equals("trapezoidal")) {
            sideSlope = sec.number("sideSlope", "(horizontal per vertical)", 0, 100, true, 1, true);
        }
        if (sec != null) {
            sec.rejectUnknown();
        }
        double h = f.number("depth", "m", 0, 1e3, true, survey == null ? 1 : survey.maxDepth(), !surveyed);
        double w = f.number("width", "m", 0, 1e5, true, survey == null ? 10 : survey.width(), !surveyed);
        boolean hasDischarge = f.has("discharge");
        boolean hasVelocity = f.has("meanVelocity");
        double u = 1;
        if (hasVelocity && hasDischarge) {
            f.problem(f.path() + ": give meanVelocity (m/s) or discharge (m^3/s), not both");
        } else if (hasDischarge) {
            double q = f.number("discharge", "m^3/s", 0, 1e6, true, 1, true);
            u = Double.NaN;
            if (survey != null) {
                u = q / survey.area();
            } else if (kind.equals("trapezoidal") && w > 2 * sideSlope * h) {
                u = q / new ChannelSection.Trapezoidal(w, h, sideSlope).area();
            } else if (kind.equals("rectangular")) {
                u = q / (w * h);
            }
        } else if (hasVelocity || survey == null) {
            u = f.number("meanVelocity", "m/s", 0, 100, true, 1, true);
        } else {
            u = survey.discharge() / survey.area();
        }
        Double slope = f.has("bedSlope") ? f.openNumber("bedSlope", "m/m", 0, 1, 1e-3, true) : null;
        Double shear = f.has("shearVelocity") ? f.number("shearVelocity", "m/s", 0, 100, true, 0.05, true) : null;
        Double manning = f.has("manningN") ? f.openNumber("manningN", "s/m^(1/3)", 0, 1, 0.03, true) : null;
        Double nu = f.has("kinematicViscosity")
                ? f.number("kinematicViscosity", "m^2/s", 0, 1, true, 1e-6, true) : null;
        int given = (slope != null ? 1 : 0) + (shear != null ? 1 : 0) + (manning != null ? 1 : 0);
        if (given != 1) {
            f.problem(f.path() + ": give exactly one of bedSlope (m/m), shearVelocity (m/s) or manningN "
                    + "(s/m^(1/3)); got " + given);
            return null;
        }
        try {
            ChannelSection section = switch (kind) {
                case "trapezoidal" -> new ChannelSection.Trapezoidal(w, h, sideSlope);
                case "surveyed" -> survey;
                default -> null;
            };
            if (surveyed && survey == null) {
                return null;
            }
            return new ChannelFlow(new ChannelDesign(h, w, u, slope, shear, manning, nu, section));
        } catch (IllegalArgumentException e) {
            f.problem(e.getMessage());
            return null;
        }
    }

    private static ChannelSection.Surveyed readSurvey(FieldReader sec) {
        List<FieldReader> verticals = sec.objects("verticals");
        int n = verticals.size();
        double[] offsets = new double[n];
        double[] depths = new double[n];
        double[] velocities = new double[n];
        for (int i = 0; i < n; i++) {
            FieldReader v = verticals.get(i);
            offsets[i] = v.number("offset", "m", 0, 1e5, false, 0, true);
            depths[i] = v.number("depth", "m", 0, 1e3, false, 0, true);
            velocities[i] = v.number("velocity", "m/s", 0, 100, false, 0, true);
            v.rejectUnknown();
        }
        try {
            return new ChannelSection.Surveyed(offsets, depths, velocities);
        } catch (IllegalArgumentException e) {
            sec.problem(e.getMessage());
            return null;
        }
    }

    private static MeasuredFlow readMeasured(FieldReader f, Path folder) {
        String record = f.text("record", null, true);
        String spectrum = f.choice("spectrum", List.of("power-law", "model"), "power-law", false);
        double rate = f.has("samplingRate") ? f.number("samplingRate", "Hz", 0, 1e6, true, Double.NaN, true)
                : Double.NaN;
        boolean despike = f.bool("despike", true);
        boolean detrend = f.bool("detrend", true);
        double nu = f.number("kinematicViscosity", "m^2/s", 0, 1, true, TankDesign.WATER_20C_KINEMATIC_VISCOSITY,
                false);
        if (record == null) {
            return null;
        }
        Path resolved = folder.resolve(record).normalize();
        if (!Files.isRegularFile(resolved)) {
            f.problem(f.name("record") + " names a file that does not exist: " + resolved
                    + " (a path relative to the scenario's folder)");
        }
        return new MeasuredFlow(record, resolved, spectrum.equals("model"), rate, despike, detrend, nu);
    }

    private static Release readRelease(FieldReader r) {
        double mass = r.number("mass", "kg", 0, 1e9, true, 1.0, false);
        double rate = r.number("rate", "kg/s", 0, 1e9, true, Double.NaN, false);
        String where = r.choice("location", List.of("centre-line", "bank"), "centre-line", false);
        double[] position = null;
        FieldReader p = r.object("position", false);
        if (p != null) {
            position = new double[] {p.number("x", "m", 0, 1e5, false, 0, true), p.number("y", "m", 0, 1e5, false, 0,
                    true), p.number("z", "m", 0, 1e5, false, 0, true)};
            p.rejectUnknown();
        }
        double volume = r.number("volume", "m^3", 0, 1e6, true, Double.NaN, false);
        double duration = r.number("duration", "s", 0, 1e7, true, Double.NaN, false);
        return new Release(mass, rate, position, where.equals("bank"), volume, true, duration);
    }

    private static ForecastSettings readForecast(FieldReader r) {
        double horizon = r.number("horizon", "s", 0, 1e9, true, Double.NaN, false);
        String measure = r.choice("widthMeasure", ForecastSettings.WIDTH_MEASURES, "fwhm", false);
        double edge = r.number("edgeFraction", "", 0, 1, true, 0.1, false);
        if (edge >= 1) {
            r.problem(r.name("edgeFraction") + " must be below 1; got " + FieldReader.format(edge));
        }
        List<Station> stations = new java.util.ArrayList<>();
        if (r.has("stations")) {
            List<FieldReader> items = r.objects("stations");
            if (items.size() > MAX_STATIONS) {
                r.problem(r.name("stations") + " may hold at most " + MAX_STATIONS + " stations; got " + items.size());
            }
            for (FieldReader item : items) {
                double distance = item.number("distance", "m", 0, 1e6, true, 1, true);
                double across = item.number("across", "m", 0, 1e5, false, Double.NaN, false);
                item.rejectUnknown();
                stations.add(new Station(distance, across));
            }
        }
        double detection = r.number("detectionLimit", "kg/m^3", 0, 1e3, true, Double.NaN, false);
        double target = r.number("targetPeak", "kg/m^3", 0, 1e3, true, Double.NaN, false);
        if (!Double.isNaN(target) && stations.isEmpty()) {
            r.problem(r.name("targetPeak") + " plans the dose for a peak at the first station: give "
                    + r.name("stations") + " [{\"distance\": m}] too, or remove it");
        }
        ConcentrationCap cap = null;
        FieldReader c = r.object("cap", false);
        if (c != null) {
            cap = new ConcentrationCap(c.number("distance", "m", 0, 1e6, true, 1, true),
                    c.number("concentration", "kg/m^3", 0, 1e3, true, 1, true));
            c.rejectUnknown();
        }
        DisplayUnits units = DisplayUnits.si();
        FieldReader u = r.object("units", false);
        if (u != null) {
            units = new DisplayUnits(u.choice("concentration", DisplayUnits.CONCENTRATIONS, "kg/m3", false),
                    u.choice("time", DisplayUnits.TIMES, "s", false),
                    u.choice("distance", DisplayUnits.DISTANCES, "m", false),
                    u.choice("speed", DisplayUnits.SPEEDS, "rev/s", false));
            u.rejectUnknown();
        }
        List<ProbePoint> probes = new java.util.ArrayList<>();
        if (r.has("probes")) {
            List<FieldReader> items = r.objects("probes");
            if (items.size() > MAX_STATIONS) {
                r.problem(r.name("probes") + " may hold at most " + MAX_STATIONS + " probes; got " + items.size());
            }
            for (FieldReader item : items) {
                probes.add(new ProbePoint(item.number("x", "m", 0, 1e3, false, 0, true),
                        item.number("y", "m", 0, 1e3, false, 0, true), item.number("z", "m", 0, 1e3, false, 0, true)));
                item.rejectUnknown();
            }
        }
        double reach = r.number("horizonDistance", "m", 0, 1e7, true, Double.NaN, false);
        if (!Double.isNaN(reach) && !Double.isNaN(horizon)) {
            r.problem(r.name("horizon") + " and " + r.name("horizonDistance") + " both set the forecast's reach: keep"
                    + " one of them (a time in s, or in a channel a distance downstream in m)");
        }
        return new ForecastSettings(horizon, measure, edge, stations, detection, target, cap, units, probes, reach);
    }

    /** The most stations one forecast reads (each keeps its own counts per block and record). */
    static final int MAX_STATIONS = 10;

    private static Substance readSubstance(FieldReader s) {
        String name = s.text("name", "", false);
        double d0 = s.number("molecularDiffusivity", "m^2/s", 0, 1.0, true, 1e-9, true);
        return new Substance(name, d0, readLoss(s));
    }

    /** The most rapid first-order loss read: a half-life of a tenth of a second is already no tracer at all. */
    static final double MAX_DECAY_RATE = 10.0;

    /** substance.decayRate (1/s) or substance.halfLife (s), one of them or neither. */
    private static FirstOrderLoss readLoss(FieldReader s) {
        boolean rate = s.has("decayRate");
        boolean half = s.has("halfLife");
        double k = s.number("decayRate", "1/s", 0, MAX_DECAY_RATE, true, Double.NaN, false);
        double h = s.number("halfLife", "s", Math.log(2) / MAX_DECAY_RATE, Double.POSITIVE_INFINITY, false,
                Double.NaN, false);
        if (rate && half) {
            s.problem(s.name("decayRate") + " and " + s.name("halfLife") + " both give the first-order loss: keep one"
                    + " of them (a rate k in 1/s, or a half-life ln 2 / k in s)");
            return FirstOrderLoss.NONE;
        }
        if (!Double.isNaN(k)) {
            return FirstOrderLoss.ofRate(k);
        }
        return Double.isNaN(h) ? FirstOrderLoss.NONE : FirstOrderLoss.ofHalfLife(h);
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
        if (dt > 0 && duration > 0 && !(duration / dt >= SimulationSettings.MIN_STEPS - 0.5)) {
            s.problem(s.name("duration") + " must be at least " + SimulationSettings.MIN_STEPS + " time steps ("
                    + FieldReader.format(SimulationSettings.MIN_STEPS * dt) + " s); got " + FieldReader.format(duration));
        }
        if (dt > 0 && duration > 0 && duration / dt > SimulationSettings.MAX_STEPS + 0.5) {
            s.problem(s.name("timeStep") + " gives " + FieldReader.format(duration / dt) + " steps; at most "
                    + FieldReader.format(SimulationSettings.MAX_STEPS) + " are allowed: raise the time step or shorten "
                    + "the duration");
        }
        if (group > particles) {
            s.problem(s.name("groupSize") + " must be at most simulation.particles (" + particles + "): the particles "
                    + "would be raised to whole groups, " + 2L * org.eddycast.particles.EnsembleRunner.blockSizeFor(group)
                    + " at least; got " + group);
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
