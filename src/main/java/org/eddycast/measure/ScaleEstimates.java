package org.eddycast.measure;

import java.util.List;

import org.eddycast.scenario.Derivation;

/**
 * The turbulence scales read from a record, with how each was obtained.
 *
 * @param regime           how far frozen turbulence was trusted
 * @param convectionSpeed  speed used to turn frequencies into wavenumbers (m/s)
 * @param integralTime     integral time of the streamwise signal (s)
 * @param dissipationRate  eps (W/kg), NaN when no inertial range was fitted
 * @param integralLength   L (m)
 * @param correlationTime  correlation time of the field's amplitudes in a frame moving with the flow (s)
 * @param kolmogorovLength eta (m), NaN without a dissipation rate
 * @param wavenumberRatio  the power-law band's largest over smallest wavenumber, capped
 * @param derivations      one entry per value above, with rule and source
 * @param warnings         what needs care
 */
public record ScaleEstimates(FlowRegime regime, double convectionSpeed, double integralTime, double dissipationRate,
                             double integralLength, double correlationTime, double kolmogorovLength,
                             double wavenumberRatio, List<Derivation> derivations, List<String> warnings) {

    public ScaleEstimates {
        derivations = List.copyOf(derivations);
        warnings = List.copyOf(warnings);
    }
}
