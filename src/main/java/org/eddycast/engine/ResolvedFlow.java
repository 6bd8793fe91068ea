package org.eddycast.engine;

import java.util.List;
import org.eddycast.measure.RecordAnalysis;
import org.eddycast.scenario.TurbulenceStatistics;

/**
 * A scenario's flow turned into turbulence statistics, with what the user must know about how.
 *
 * @param turbulence  the statistics (null for a verification flow)
 * @param warnings    warnings of the rules or the record analysis
 * @param assumptions assumptions the rules made
 * @param analysis    the record analysis for a measured flow, null otherwise
 */
public record ResolvedFlow(TurbulenceStatistics turbulence, List<String> warnings, List<String> assumptions,
                           RecordAnalysis analysis) {

    public ResolvedFlow {
        warnings = List.copyOf(warnings);
        assumptions = List.copyOf(assumptions);
    }
}
