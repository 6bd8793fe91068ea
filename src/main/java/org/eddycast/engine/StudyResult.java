package org.eddycast.engine;

import java.time.Instant;
import org.eddycast.scenario.Scenario;
import org.eddycast.scenario.TurbulenceStatistics;

/**
 * Everything one scenario produced: the scenario itself, the turbulence statistics it resolved to (null for a
 * verification flow), the diffusivity result, the tool version and when it finished.
 */
public record StudyResult(Scenario scenario, TurbulenceStatistics turbulence, DiffusivityResult diffusivity,
                          String toolVersion, Instant finished) {
}
