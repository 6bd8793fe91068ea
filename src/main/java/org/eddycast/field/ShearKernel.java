package org.eddycast.field;

/**
 * The inner loops of the particle step: shears x &lt;- x + h (a cos(k . x) + b sin(k . x)) applied to arrays of
 * particle coordinates, either in turn (each shear moves the points before the next is evaluated: the
 * splitting schemes) or at once (every shear evaluated at the starting point and the sum added: the Euler
 * step); for particles sharing one realization ({@link ShearModeField}) or each carrying its own
 * ({@link ModeLanes}, particle i in lane i), with the substep h carried by the stored amplitudes (their step
 * scale); and the Ornstein-Uhlenbeck update of the lanes' amplitudes.
 *
 * <p>Each call takes every point through every shear of the step, so a point's coordinates stay in registers
 * from the first shear to the last. Implementations differ only in speed and in rounding:
 * {@link VectorShearKernel} (the Vector API), {@link ScalarShearKernel} (plain loops with {@link FastSinCos})
 * and {@link ReferenceShearKernel} (plain loops with {@link Math#sin} and {@link Math#cos}, for tests).
 * An instance may hold scratch space: one per thread.
 */
public interface ShearKernel {

    /**
     * Applies modes first, first +- 1, ..., last (either direction) of the shared realization, in turn, to
     * points 0..n-1 (z ignored in 2D).
     */
    void applyInTurn(ShearModeField f, int first, int last, double[] x, double[] y, double[] z, int n);

    /** Adds the sum of every mode of the shared realization, evaluated at the starting point, to points 0..n-1. */
    void applyAtOnce(ShearModeField f, double[] x, double[] y, double[] z, int n);

    /**
     * Applies modes first, first +- 1, ..., last (either direction) of each lane's own realization, in turn,
     * to the particle in that lane, every lane.
     */
    void applyInTurn(ModeLanes f, int first, int last, double[] x, double[] y, double[] z);

    /** Adds the sum of every mode of each lane's realization, evaluated at the starting point, every lane. */
    void applyAtOnce(ModeLanes f, double[] x, double[] y, double[] z);

    /**
     * Advances every coefficient of the shared realization by one prepared step and refreshes its amplitudes,
     * as {@link ShearModeField#advanceAmplitudes} (four runs of one normal variate per mode from offset).
     */
    void advance(ShearModeField f, double[] normals, int offset);

    /**
     * Advances mode m's coefficients in every lane by the exact Ornstein-Uhlenbeck transition with standard
     * normal variates {@code normals[0 .. 4 * width)} (alpha1, beta1, alpha2, beta2, each a run of width
     * values), then refreshes the lanes' scaled amplitudes of mode m.
     */
    void advance(ModeLanes f, int m, double[] normals);

    /** A short name for reports. */
    String name();
}
