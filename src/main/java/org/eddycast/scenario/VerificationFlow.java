package org.eddycast.scenario;

/**
 * One of the periodic verification flows with exact or published effective diffusivities.
 *
 * @param type            which flow
 * @param dimensions      2 or 3 (Beltrami: 3)
 * @param amplitude       U (m/s)
 * @param wavenumber      k (1/m); zero allowed for a time-correlated shear (uniform velocity)
 * @param correlationTime tau (s) for the shear, {@link Double#POSITIVE_INFINITY} when steady
 * @param coefficients    Beltrami A, B, C (m/s); each defaults to the amplitude
 */
public record VerificationFlow(Type type, int dimensions, double amplitude, double wavenumber,
                               double correlationTime, double[] coefficients) implements FlowSpec {

    /** The verification flows. */
    public enum Type {
        SHEAR, CELLULAR, BELTRAMI;

        public String key() {
            return name().toLowerCase(java.util.Locale.ROOT);
        }
    }

    public VerificationFlow {
        coefficients = coefficients.clone();
    }

    @Override
    public double[] coefficients() {
        return coefficients.clone();
    }

    @Override
    public String kind() {
        return type.key();
    }
}
