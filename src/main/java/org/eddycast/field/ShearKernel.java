package org.eddycast.field;

/**
 * The inner loops of the particle step: one shear mode's exact map, or its velocity, over arrays of particle
 * coordinates, for particles sharing one realization ({@link ShearModeField}) or each carrying its own
 * ({@link ModeLanes}, particle i in lane i); and the Ornstein-Uhlenbeck update of the lanes' amplitudes.
 *
 * <p>Each call does one mode for all particles, so the method is small, compiles early and its loop runs over
 * independent particles. Implementations differ only in speed and in rounding: {@link VectorShearKernel} (the
 * Vector API), {@link ScalarShearKernel} (plain loops with {@link FastSinCos}) and
 * {@link ReferenceShearKernel} (plain loops with {@link Math#sin} and {@link Math#cos}, for tests).
 * An instance may hold scratch space: one per thread.
 */
public interface ShearKernel {

    /** x &lt;- x + h (a_m cos(k_m . x) + b_m sin(k_m . x)) for points 0..n-1 (z ignored in 2D). */
    void shear(ShearModeField f, int m, double h, double[] x, double[] y, double[] z, int n);

    /** v &lt;- v + a_m cos(k_m . x) + b_m sin(k_m . x) for points 0..n-1. */
    void addVelocity(ShearModeField f, int m, double[] x, double[] y, double[] z, int n,
                     double[] vx, double[] vy, double[] vz);

    /** The shear of mode m for particle i in lane i's own realization, all lanes. */
    void shear(ModeLanes f, int m, double h, double[] x, double[] y, double[] z);

    /** The velocity of mode m for particle i in lane i's own realization, all lanes. */
    void addVelocity(ModeLanes f, int m, double[] x, double[] y, double[] z, double[] vx, double[] vy, double[] vz);

    /**
     * Advances mode m's coefficients in every lane by the exact Ornstein-Uhlenbeck transition with standard
     * normal variates {@code normals[0 .. 4 * width)} (alpha1, beta1, alpha2, beta2, each a run of width
     * values), then refreshes the lanes' amplitudes of mode m.
     */
    void advance(ModeLanes f, int m, double[] normals);

    /** A short name for reports. */
    String name();
}
