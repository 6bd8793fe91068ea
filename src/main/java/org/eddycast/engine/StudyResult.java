package org.eddycast.engine;

import java.time.Instant;
import org.eddycast.forecast.Forecast;
import org.eddycast.scenario.Scenario;
import org.eddycast.scenario.TurbulenceStatistics;

/**
 * Everything one scenario produced: the scenario itself, its resolved flow, the diffusivity result, the tool
 * version and when it finished, and the forecast in physical units.
 */
public record StudyResult(Scenario scenario, ResolvedFlow flow, DiffusivityResult diffusivity, Forecast forecast,
                          String toolVersion, Instant finished) {

    /** The turbulence statistics (null for a verification flow). */
    public TurbulenceStatistics turbulence() {
        return flow.turbulence();
    }
}
