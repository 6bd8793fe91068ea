package org.eddycast.scenario;

import org.eddycast.particles.Integrator;

/**
 * How the particle simulation runs.
 *
 * @param particles       particles to follow (rounded up to whole blocks)
 * @param groupSize       particles sharing one realization of the field
 * @param modes           Fourier modes per realization
 * @param integrator      the drift scheme
 * @param timeStep        time step (s)
 * @param duration        simulated time (s)
 * @param seed            the seed; the same seed gives the same answer
 * @param precisionTarget keep adding particles until every axis' 95% half-width is below this fraction of its
 *                        value (NaN: run the stated particles only)
 * @param maxParticles    the most particles the precision target may use
 */
public record SimulationSettings(int particles, int groupSize, int modes, Integrator integrator, double timeStep,
                                 double duration, long seed, double precisionTarget, int maxParticles) {

    /** True when a precision target is set. */
    public boolean hasPrecisionTarget() {
        return !Double.isNaN(precisionTarget);
    }

    /** The fewest time steps a run may have: the estimator's two windows [T/4, T/2] and [T/2, T] need records. */
    public static final long MIN_STEPS = 16;
    /** The most time steps a run may have. */
    public static final long MAX_STEPS = 100_000_000L;

    /** Number of time steps (duration over time step, rounded), in 64 bits; NaN settings give 0. */
    public long steps() {
        return Math.round(duration / timeStep);
    }
}
