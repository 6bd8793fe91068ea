package org.eddycast.engine;

import java.time.Instant;
import java.util.List;
import org.eddycast.forecast.Forecast;
import org.eddycast.scenario.Scenario;
import org.eddycast.scenario.TurbulenceStatistics;
import org.eddycast.transport.TransportResult;
import org.eddycast.uncertainty.UncertaintySummary;

/**
 * Everything one scenario produced: the scenario itself, its resolved flow, the diffusivity result, the tool
 * version and when it finished, the forecast in physical units (null when a diffusivity it needs is not
 * determined), the warnings shown before the run ({@link Engine#preflight}), and what the transport stage found
 * in the real geometry (null for flows given directly or measured), and the answers the outputs open with
 * (the headline, the release as taken, the stations and the dose plan), and, for a scenario whose inputs carry
 * ranges, how sure its headline figures are (null otherwise).
 */
public record StudyResult(Scenario scenario, ResolvedFlow flow, DiffusivityResult diffusivity, Forecast forecast,
                          String toolVersion, Instant finished, List<String> preflight, TransportResult transport,
                          Answers answers, UncertaintySummary uncertainty) {

    public StudyResult {
        preflight = List.copyOf(preflight);
    }

    /** A result whose answers are built from the rest. */
    public StudyResult(Scenario scenario, ResolvedFlow flow, DiffusivityResult diffusivity, Forecast forecast,
                       String toolVersion, Instant finished, List<String> preflight, TransportResult transport) {
        this(scenario, flow, diffusivity, forecast, toolVersion, finished, preflight, transport,
                AnswerBuilder.build(scenario, diffusivity, transport), null);
    }

    /** The same result with its inputs' uncertainty. */
    public StudyResult withUncertainty(UncertaintySummary u) {
        return new StudyResult(scenario, flow, diffusivity, forecast, toolVersion, finished, preflight, transport,
                answers, u);
    }

    /** The turbulence statistics (null for a verification flow). */
    public TurbulenceStatistics turbulence() {
        return flow.turbulence();
    }
}
