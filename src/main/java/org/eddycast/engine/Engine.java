package org.eddycast.engine;

import java.time.Instant;
import java.util.ArrayList;
import java.util.List;
import org.eddycast.forecast.ChannelRules;
import org.eddycast.forecast.Forecast;
import org.eddycast.stats.AxisEstimate;
import org.eddycast.forecast.ModeledTurbulence;
import org.eddycast.forecast.TankRules;
import org.eddycast.measure.AnalysisOptions;
import org.eddycast.measure.RecordAnalysis;
import org.eddycast.measure.RecordAnalyzer;
import org.eddycast.particles.Cancellation;
import org.eddycast.particles.RunListener;
import org.eddycast.scenario.ChannelFlow;
import org.eddycast.scenario.DirectFlow;
import org.eddycast.scenario.MeasuredFlow;
import org.eddycast.scenario.Scenario;
import org.eddycast.scenario.TankFlow;
import org.eddycast.transport.TransportResult;

/**
 * The one entry point the panel, the command line and the report share: a scenario in, a study result out.
 * Knows nothing of any user interface.
 */
public final class Engine {

    /** The share of a staged run's progress bar that the field stage takes. */
    static final double FIELD_SHARE = 0.3;

    private Engine() {
    }

    /** The number of worker threads to use by default: every core. */
    public static int defaultThreads() {
        return Runtime.getRuntime().availableProcessors();
    }

    /**
     * Turns the scenario's flow into turbulence statistics: given directly, modeled from a tank's or a
     * channel's design data, or analysed from a measured record.
     *
     * @throws org.eddycast.measure.RecordFormatException for a record that cannot be read
     */
    public static ResolvedFlow resolve(Scenario s) {
        if (s.flow() instanceof DirectFlow d) {
            return new ResolvedFlow(CaseBuilder.direct(d), List.of(),
                    List.of("turbulence statistics given directly by the user"), null);
        }
        if (s.flow() instanceof TankFlow t) {
            return modeled(TankRules.STANDARD.model(t.design()), Plausibility.warnings(s));
        }
        if (s.flow() instanceof ChannelFlow c) {
            return modeled(ChannelRules.STANDARD.model(c.design()), Plausibility.warnings(s));
        }
        if (s.flow() instanceof MeasuredFlow m) {
            return measured(m);
        }
        return new ResolvedFlow(null, List.of(), List.of(), null);
    }

    private static ResolvedFlow modeled(ModeledTurbulence m, List<String> implausible) {
        List<String> warnings = new ArrayList<>(implausible);
        warnings.addAll(m.warnings());
        return new ResolvedFlow(m.statistics(), warnings, m.assumptions(), null);
    }

    private static ResolvedFlow measured(MeasuredFlow m) {
        AnalysisOptions options = AnalysisOptions.defaults().withDespike(m.despike()).withDetrend(m.detrend())
                .withKinematicViscosity(m.kinematicViscosity());
        if (!Double.isNaN(m.samplingRate())) {
            options = options.withSamplingRate(m.samplingRate());
        }
        RecordAnalysis a = RecordAnalyzer.analyze(m.resolved(), options);
        return new ResolvedFlow(m.modelSpectrum() ? a.statisticsWithModelSpectrum() : a.statistics(), a.warnings(),
                List.of("turbulence statistics measured at one point and assumed to hold throughout the flow"), a);
    }

    /** The dimensionless case of a scenario. */
    public static DimensionlessCase dimensionlessCase(Scenario s) {
        return CaseBuilder.build(s, resolve(s).turbulence());
    }

    /**
     * Checks a scenario before it runs, without simulating anything: the warnings a user should see before
     * spending the run's time. A design outside the range its rules were made for ({@link Plausibility}); and a
     * time step above {@link CaseBuilder#MAX_STEP_FRACTION} of the field's shortest resolved time scale (the
     * smaller of the correlation time and the inverse rms velocity gradient), which biases the answer, so the
     * warning names simulation.timeStep, the limit and a step to use. An empty list means nothing to report; a
     * time step left out is chosen safely by the engine and never warned about. The command line, the window
     * and the JSON result all show it.
     *
     * @throws org.eddycast.scenario.ScenarioException for a scenario the engine cannot run
     * @throws org.eddycast.measure.RecordFormatException for a record that cannot be read
     */
    public static List<String> preflight(Scenario s) {
        return preflight(s, dimensionlessCase(s));
    }

    private static List<String> preflight(Scenario s, DimensionlessCase c) {
        List<String> warnings = new ArrayList<>(Plausibility.warnings(s));
        String warning = CaseBuilder.timeStepWarning(c);
        if (warning != null) {
            warnings.add(warning);
        }
        return List.copyOf(warnings);
    }

    /**
     * Runs a scenario.
     *
     * @throws org.eddycast.scenario.ScenarioException          for a scenario the engine cannot run
     * @throws org.eddycast.particles.RunCancelledException    when cancelled
     * @throws org.eddycast.particles.NumericalBlowupException when the time step is far too large
     */
    public static StudyResult run(Scenario s, int threads, RunListener listener, Cancellation cancel) {
        return run(s, threads, listener, cancel, true);
    }

    /**
     * Runs a scenario, with or without the transport stage of a modeled channel or tank (without it, the forecast
     * is that of homogeneous turbulence, as for the other routes).
     */
    public static StudyResult run(Scenario s, int threads, RunListener listener, Cancellation cancel,
                                  boolean transportStage) {
        return run(s, threads, listener, cancel, transportStage, SimulationCache.shared()::run);
    }

    /** How a run obtains its field stage's result for a dimensionless case: simulated, or reused and rescaled. */
    @FunctionalInterface
    public interface FieldStage {
        /** The field stage's result for the case. */
        DiffusivityResult run(DimensionlessCase c, int threads, RunListener listener, Cancellation cancel);
    }

    /**
     * Runs a scenario with a given source of field-stage results (a sweep shares them between its runs in a way
     * that does not depend on which runs a process makes).
     */
    public static StudyResult run(Scenario s, int threads, RunListener listener, Cancellation cancel,
                                  boolean transportStage, FieldStage field) {
        ResolvedFlow flow = resolve(s);
        DimensionlessCase c = CaseBuilder.build(s, flow.turbulence());
        List<String> preflight = preflight(s, c);
        boolean staged = transportStage && (s.flow() instanceof ChannelFlow || s.flow() instanceof TankFlow);
        double fieldShare = staged ? FIELD_SHARE : 1.0;
        DiffusivityResult r = field.run(c, threads,
                (fraction, partial) -> listener.progress(fieldShare * fraction, partial), cancel);
        // a forecast from a diffusivity that is not determined (negative, or not a number) would be nonsense
        boolean determined = r.axes().stream().allMatch(AxisEstimate::determined);
        if (!determined) {
            return new StudyResult(s, flow, r, null, ToolVersion.get(), Instant.now(), preflight, null,
                    AnswerBuilder.build(s, r, null), null);
        }
        TransportResult transport = !staged ? null : TransportStudy.run(s, flow, r, threads,
                fraction -> listener.progress(fieldShare + (1 - fieldShare) * fraction, null), cancel);
        return new StudyResult(s, flow, r, ForecastBuilder.build(s, flow, r, transport), ToolVersion.get(),
                Instant.now(), preflight, transport, AnswerBuilder.build(s, r, transport), null);
    }
}
