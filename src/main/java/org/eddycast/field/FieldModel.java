package org.eddycast.field;

import java.util.random.RandomGenerator;

/**
 * A recipe for realizations of a velocity field that is a sum of shear modes, in dimensionless units.
 * Implementations are immutable and may be shared by threads; each thread realizes into its own
 * {@link ShearModeField}.
 */
public interface FieldModel {

    int dimensions();

    int modeCount();

    /**
     * Fills {@code target} with a fresh realization: wavevectors, polarizations, correlation times and the
     * coefficients drawn from their stationary law (or set, for a steady flow).
     */
    void realize(ShearModeField target, RandomGenerator rng);

    /** Expected variance of velocity component {@code axis} (dimensionless), averaged over realizations. */
    double componentVariance(int axis);

    /** Side of the cube in which particles start, in the model's length unit (a period for periodic flows). */
    double startRegion();

    /**
     * The shortest time scale of the field (dimensionless): the time step should be a small fraction of it.
     * For a random field, 1 / (k_max u'); for a periodic flow, 1 / (k U).
     */
    double shortestTimeScale();

    /** A one-line description for reports. */
    String describe();
}
