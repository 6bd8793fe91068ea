package org.eddycast.scenario;

import java.util.List;

/**
 * The turbulence statistics the engine needs, in SI units, whichever route produced them (given directly,
 * modeled from design data, or measured from a velocity record).
 *
 * @param dimensions       2 or 3
 * @param rmsVelocity      u', the rms of one velocity component (m/s); the simulated field is isotropic with it
 * @param componentRms     rms velocity per component (m/s), length {@code dimensions}; informative, may repeat u'
 * @param integralLength   L11, the longitudinal integral length (m)
 * @param correlationTime  tau, the Eulerian correlation time of the Fourier amplitudes (s); infinite for frozen
 * @param spectrum         the spectrum shape
 * @param meanVelocity     the mean flow speed carrying the tracer downstream (m/s); 0 where there is none
 * @param dissipationRate  mean dissipation rate (W/kg), NaN when unknown
 * @param derivations      how each value was obtained, with sources; empty for values given directly
 */
public record TurbulenceStatistics(int dimensions, double rmsVelocity, double[] componentRms,
                                   double integralLength, double correlationTime, SpectrumSpec spectrum,
                                   double meanVelocity, double dissipationRate, List<Derivation> derivations) {

    public TurbulenceStatistics {
        componentRms = componentRms.clone();
        derivations = List.copyOf(derivations);
    }

    @Override
    public double[] componentRms() {
        return componentRms.clone();
    }

    /** True when the amplitudes do not decorrelate in time (a frozen field). */
    public boolean frozen() {
        return Double.isInfinite(correlationTime);
    }
}
