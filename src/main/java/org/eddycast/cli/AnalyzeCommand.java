package org.eddycast.cli;

import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.Locale;
import java.util.concurrent.Callable;
import org.eddycast.measure.AnalysisOptions;
import org.eddycast.measure.ComponentStatistics;
import org.eddycast.measure.RecordAnalysis;
import org.eddycast.measure.RecordAnalyzer;
import org.eddycast.scenario.AtomicFiles;
import org.eddycast.scenario.DirectFlow;
import org.eddycast.scenario.Derivation;
import org.eddycast.scenario.ForecastSettings;
import org.eddycast.scenario.Release;
import org.eddycast.scenario.Scenario;
import org.eddycast.scenario.ScenarioReader;
import org.eddycast.scenario.ScenarioWriter;
import org.eddycast.scenario.SimulationSettings;
import org.eddycast.scenario.Substance;
import org.eddycast.scenario.TurbulenceStatistics;
import org.eddycast.particles.Integrator;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/**
 * {@code analyze RECORD.csv}: read, clean and analyse a velocity record, print its statistics and write a flow
 * description (or a whole scenario) that {@code run} accepts.
 */
@Command(name = "analyze", mixinStandardHelpOptions = true,
        description = "Analyse a measured velocity record into turbulence statistics (rms, integral scales, "
                + "spectrum slope, dissipation) and write them as a flow description.")
final class AnalyzeCommand implements Callable<Integer> {

    @Parameters(index = "0", paramLabel = "RECORD", description = "Delimited text record: time and 1-3 velocity components.")
    Path record;

    @Option(names = "--json", paramLabel = "FILE", description = "Write the flow description (a scenario's \"flow\") as JSON.")
    Path json;

    @Option(names = "--scenario", description = "With --json: write a whole scenario instead of the flow alone.")
    boolean wholeScenario;

    @Option(names = "--sampling-rate", paramLabel = "HZ", description = "Sampling rate for a record without a time column.")
    Double samplingRate;

    @Option(names = "--no-despike", description = "Keep spikes (no phase-space despiking).")
    boolean noDespike;

    @Option(names = "--no-detrend", description = "Keep a linear trend.")
    boolean noDetrend;

    @Option(names = "--model-spectrum", description = "Describe the spectrum by the model spectrum with the measured Kolmogorov length instead of the fitted power law.")
    boolean modelSpectrum;

    @Spec
    picocli.CommandLine.Model.CommandSpec spec;

    /** The highest sampling rate, the same as a scenario's flow.samplingRate allows. */
    static final double MAX_SAMPLING_RATE = 1e6;

    /**
     * Refuses to write statistics that {@code run} would then refuse (a record with absurd time steps gives an
     * integral length of 1e299 m): the same reader judges them now, naming the field.
     */
    private void acceptedByRun(ObjectNode tree) {
        try {
            ScenarioReader.parse(tree.toString());
        } catch (org.eddycast.scenario.ScenarioException e) {
            throw new IllegalArgumentException("the statistics analysed from " + record + " are outside what run "
                    + "accepts, so nothing is written: " + e.getMessage().replace("\n", "; ") + " (check the "
                    + "record's time column and units, or --sampling-rate)", e);
        }
    }

    @Override
    public Integer call() throws Exception {
        PrintWriter out = spec.commandLine().getOut();
        if (wholeScenario && json == null) {
            throw new IllegalArgumentException("--scenario applies with --json only (it makes the file --json writes "
                    + "a whole scenario): add --json FILE, or leave --scenario out");
        }
        new OutputPlan().input("the record", record).output("--json", json).check();
        AnalysisOptions options = AnalysisOptions.defaults().withDespike(!noDespike).withDetrend(!noDetrend);
        if (samplingRate != null) {
            if (!(samplingRate > 0 && samplingRate <= MAX_SAMPLING_RATE)) {
                throw new IllegalArgumentException(String.format(Locale.ROOT, "--sampling-rate must be between 0 "
                        + "(exclusive) and %.0e Hz, as flow.samplingRate in a scenario; got %s", MAX_SAMPLING_RATE,
                        samplingRate));
            }
            options = options.withSamplingRate(samplingRate);
        }
        RecordAnalysis a = RecordAnalyzer.analyze(record, options);
        out.printf(Locale.ROOT, "record %s: mean speed %.4g m/s, rms velocity u' %.4g m/s (intensity %.3g)%n",
                record, a.meanSpeed(), a.rmsVelocity(), a.turbulenceIntensity());
        for (ComponentStatistics c : a.components()) {
            out.printf(Locale.ROOT, "  %-6s mean %9.4g m/s   rms %9.4g m/s%n", c.component(), c.mean(), c.rms());
        }
        for (String line : a.cleaning().lines()) {
            out.println("  cleaning: " + line);
        }
        a.fit().ifPresent(f -> out.println("  inertial range: " + f.describe()));
        out.println("  derived:");
        for (Derivation d : a.derivations()) {
            // a value the record cannot give (no inertial range, say) is not printed as a number
            String value = Double.isFinite(d.value()) ? String.format(Locale.ROOT, "%11.4g", d.value())
                    : "not determined";
            out.printf(Locale.ROOT, "    %-28s %11s %-8s %s [%s]%n", d.quantity(), value, d.unit(), d.rule(),
                    d.source());
        }
        for (String w : a.warnings()) {
            out.println("  WARNING: " + w);
        }
        if (json != null) {
            TurbulenceStatistics t = modelSpectrum ? a.statisticsWithModelSpectrum() : a.statistics();
            DirectFlow flow = new DirectFlow(t.dimensions(), t.rmsVelocity(), t.integralLength(), t.correlationTime(),
                    t.spectrum(), t.meanVelocity());
            Scenario s = new Scenario(Scenario.FORMAT_VERSION, "from record " + record.getFileName(),
                    "turbulence statistics analysed from the record " + record.getFileName(), flow,
                    new Substance("", 1e-9), Release.defaults(), ForecastSettings.defaults(),
                    new SimulationSettings(ScenarioReader.DEFAULT_PARTICLES, ScenarioReader.DEFAULT_GROUP_SIZE,
                            ScenarioReader.DEFAULT_MODES, Integrator.STRANG, Double.NaN, Double.NaN, 1, Double.NaN,
                            16 * ScenarioReader.DEFAULT_PARTICLES));
            ObjectNode tree = ScenarioWriter.tree(s);
            acceptedByRun(tree);
            String text;
            ObjectMapper mapper = new ObjectMapper().enable(SerializationFeature.INDENT_OUTPUT);
            if (wholeScenario) {
                text = mapper.writeValueAsString(tree);
            } else {
                text = mapper.writeValueAsString(tree.get("flow"));
            }
            AtomicFiles.writeString(json, text + "\n");
            out.println((wholeScenario ? "scenario" : "flow description") + " written to " + json
                    + (wholeScenario ? " (substance set to 1e-9 m^2/s: edit it for your tracer)" : ""));
        }
        return 0;
    }
}
