package org.eddycast.scenario;

/**
 * Turbulence statistics given directly.
 *
 * @param dimensions      2 or 3
 * @param rmsVelocity     u', rms of one velocity component (m/s)
 * @param integralLength  L11, longitudinal integral length (m)
 * @param correlationTime tau (s), {@link Double#POSITIVE_INFINITY} for a frozen field
 * @param spectrum        the spectrum shape
 * @param meanVelocity    mean speed carrying the tracer (m/s), 0 for none
 */
public record DirectFlow(int dimensions, double rmsVelocity, double integralLength, double correlationTime,
                         SpectrumSpec spectrum, double meanVelocity) implements FlowSpec {

    @Override
    public String kind() {
        return "direct";
    }
}
