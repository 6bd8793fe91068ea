package org.eddycast.engine;

import java.util.List;
import org.eddycast.field.FieldModel;
import org.eddycast.particles.Integrator;

/**
 * Everything a simulation needs, in dimensionless units, and the scales that turn its answer back into
 * metres and seconds. Two scenarios with the same dimensionless case share one simulation.
 *
 * @param model       the field
 * @param integrator  the drift scheme
 * @param d0          molecular diffusivity per axis (length 3)
 * @param timeStep    the time step
 * @param steps       number of steps
 * @param groupSize   particles per realization
 * @param particles   particles asked for
 * @param maxParticles the most particles a precision target may use
 * @param precisionTarget relative 95% half-width to reach, or NaN
 * @param seed        the seed
 * @param scales      the physical units
 * @param kubo        Kubo number u' tau / L (infinite when frozen)
 * @param peclet      Peclet number u' L / D0
 * @param notes       how values not given were chosen
 * @param key         a text that identifies the case for caching
 */
public record DimensionlessCase(FieldModel model, Integrator integrator, double[] d0, double timeStep, int steps,
                                int groupSize, int particles, int maxParticles, double precisionTarget, long seed,
                                Scales scales, double kubo, double peclet, List<String> notes, String key) {

    public DimensionlessCase {
        d0 = d0.clone();
        notes = List.copyOf(notes);
    }

    @Override
    public double[] d0() {
        return d0.clone();
    }

    /** Simulated time. */
    public double duration() {
        return steps * timeStep;
    }
}
