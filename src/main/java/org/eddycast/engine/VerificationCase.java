package org.eddycast.engine;

import java.util.List;
import org.eddycast.field.FieldModel;
import org.eddycast.particles.Integrator;

/**
 * A flow with a known effective diffusivity along one axis, the simulation settings that resolve it, and where
 * the known value comes from. The check passes when the estimate lies within three standard errors plus the
 * stated time-step and finite-time bias bound of the expected value, and the 95% interval is no wider than
 * {@value #MAX_RELATIVE_WIDTH} of the value.
 *
 * @param name        a short name
 * @param source      where the expected value comes from (author, year, title)
 * @param model       the flow, dimensionless
 * @param axis        the axis checked
 * @param expected    the expected diffusivity, dimensionless
 * @param biasBound   a bound on the bias from the time step and the finite window, dimensionless
 * @param biasReason  how the bias bound was obtained
 * @param d0          molecular diffusivity (dimensionless, every axis)
 * @param integrator  the drift scheme
 * @param timeStep    the time step
 * @param steps       number of steps
 * @param groupSize   particles per realization
 * @param particles   particles
 */
public record VerificationCase(String name, String source, FieldModel model, int axis, double expected,
                               double biasBound, String biasReason, double d0, Integrator integrator,
                               double timeStep, int steps, int groupSize, int particles) {

    /** The widest accepted 95% interval, as a fraction of the value. */
    public static final double MAX_RELATIVE_WIDTH = 0.03;

    /** The dimensionless case of this check, with a fixed seed chosen before any outcome was seen. */
    public DimensionlessCase toCase(long seed) {
        return new DimensionlessCase(model, integrator, new double[] {d0, d0, d0}, timeStep, steps, groupSize,
                particles, particles, Double.NaN, seed, new Scales(1, 1), Double.POSITIVE_INFINITY, 1 / d0,
                List.of(), name);
    }
}
