package org.eddycast.engine;

import java.time.Instant;
import org.eddycast.forecast.Forecast;
import org.eddycast.scenario.Scenario;
import org.eddycast.scenario.TurbulenceStatistics;
import org.eddycast.transport.TransportResult;

/**
 * Everything one scenario produced: the scenario itself, its resolved flow, the diffusivity result, the tool
 * version and when it finished, the forecast in physical units, and what the transport stage found in the real
 * geometry (null for flows given directly or measured).
 */
public record StudyResult(Scenario scenario, ResolvedFlow flow, DiffusivityResult diffusivity, Forecast forecast,
                          String toolVersion, Instant finished, TransportResult transport) {

    /** A result with no transport stage. */
    public StudyResult(Scenario scenario, ResolvedFlow flow, DiffusivityResult diffusivity, Forecast forecast,
                       String toolVersion, Instant finished) {
        this(scenario, flow, diffusivity, forecast, toolVersion, finished, null);
    }

    /** The turbulence statistics (null for a verification flow). */
    public TurbulenceStatistics turbulence() {
        return flow.turbulence();
    }
}
