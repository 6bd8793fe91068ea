package org.eddycast.forecast;

import java.util.List;

import org.eddycast.scenario.TurbulenceStatistics;

/**
 * Turbulence statistics modeled from design data, with the warnings raised on the way (for example a flow
 * that is not fully turbulent) and the assumptions every forecast built on them must state.
 *
 * @param statistics  the statistics, each value with its derivation
 * @param warnings    problems with the design or the rules for it (empty when none)
 * @param assumptions what the rules assume, in plain words
 */
public record ModeledTurbulence(TurbulenceStatistics statistics, List<String> warnings, List<String> assumptions) {

    public ModeledTurbulence {
        if (statistics == null) {
            throw new IllegalArgumentException("statistics must be given");
        }
        warnings = List.copyOf(warnings);
        assumptions = List.copyOf(assumptions);
    }
}
