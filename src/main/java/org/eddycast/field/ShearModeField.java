package org.eddycast.field;

import java.util.random.RandomGenerator;

/**
 * One realization of a velocity field that is a finite sum of shear modes,
 * u(x, t) = sum_m [ a_m(t) cos(k_m . x) + b_m(t) sin(k_m . x) ], with a_m and b_m normal to k_m.
 *
 * <p>Each term moves a point along a direction normal to k_m and leaves k_m . x unchanged, so the field is
 * divergence-free and one term's flow over a time h with its amplitudes held fixed is exact:
 * x &lt;- x + h (a cos(k.x) + b sin(k.x)), a map with unit Jacobian determinant. Random Fourier fields
 * (Kraichnan 1970, "Diffusion by a random velocity field", Phys. Fluids 13:22-31) and the periodic
 * verification flows are both of this form.
 *
 * <p>The amplitudes are a_m = alpha1 e1 + alpha2 e2 and b_m = beta1 e1 + beta2 e2 on an orthonormal basis
 * (e1, e2) of the plane normal to k_m (a single vector e1 where one polarization is used). Each coefficient
 * is an Ornstein-Uhlenbeck process with stationary standard deviation sigma_m and correlation time tau_m,
 * advanced by its exact transition z &lt;- z exp(-dt/tau) + sigma sqrt(1 - exp(-2 dt/tau)) xi
 * (Uhlenbeck and Ornstein 1930, "On the theory of the Brownian motion", Phys. Rev. 36:823-841); an infinite
 * tau or a zero sigma holds a coefficient fixed.
 *
 * <p>The amplitude arrays hold the amplitudes multiplied by a step scale h (1 unless set), the substep of the
 * scheme that reads them, so that the particle kernels need no multiplication by h in their inner loops;
 * {@link #amplitudes} and {@link #velocityAt} give the amplitudes themselves.
 *
 * <p>A mutable workspace owned by one thread: the particle kernels read its arrays directly.
 */
public final class ShearModeField {

    private final int dimensions;
    private final int modes;
    final double[] kx;
    final double[] ky;
    final double[] kz;
    /** The wavevector over 2 pi: the vector kernel's phase is then in turns, which it reduces by rounding alone. */
    final double[] turnKx;
    final double[] turnKy;
    final double[] turnKz;
    final double[] ax;
    final double[] ay;
    final double[] az;
    final double[] bx;
    final double[] by;
    final double[] bz;
    final double[] e1x;
    final double[] e1y;
    final double[] e1z;
    final double[] e2x;
    final double[] e2y;
    final double[] e2z;
    final double[] alpha1;
    final double[] alpha2;
    final double[] beta1;
    final double[] beta2;
    private final double[] sigma;
    private final double[] correlationTime;
    final double[] decay;
    final double[] kick;
    private final boolean[] twoPolarizations;
    private boolean anyRandomInTime;
    private double stepScale = 1.0;

    public ShearModeField(int dimensions, int modes) {
        if (dimensions != 2 && dimensions != 3) {
            throw new IllegalArgumentException("dimensions must be 2 or 3; got " + dimensions);
        }
        if (modes < 1) {
            throw new IllegalArgumentException("mode count must be at least 1; got " + modes);
        }
        this.dimensions = dimensions;
        this.modes = modes;
        kx = new double[modes];
        ky = new double[modes];
        kz = new double[modes];
        turnKx = new double[modes];
        turnKy = new double[modes];
        turnKz = new double[modes];
        ax = new double[modes];
        ay = new double[modes];
        az = new double[modes];
        bx = new double[modes];
        by = new double[modes];
        bz = new double[modes];
        e1x = new double[modes];
        e1y = new double[modes];
        e1z = new double[modes];
        e2x = new double[modes];
        e2y = new double[modes];
        e2z = new double[modes];
        alpha1 = new double[modes];
        alpha2 = new double[modes];
        beta1 = new double[modes];
        beta2 = new double[modes];
        sigma = new double[modes];
        correlationTime = new double[modes];
        decay = new double[modes];
        kick = new double[modes];
        twoPolarizations = new boolean[modes];
    }

    public int dimensions() {
        return dimensions;
    }

    public int modes() {
        return modes;
    }

    /**
     * Sets mode m's wavevector and polarization basis. e2 may be null for a single polarization.
     * The basis vectors must be unit vectors normal to k (the caller's duty; checked by the field tests).
     *
     * @param sigma stationary standard deviation of each coefficient (0 for a steady mode)
     * @param tau   correlation time of the coefficients; {@link Double#POSITIVE_INFINITY} holds them fixed
     */
    public void setMode(int m, double[] k, double[] e1, double[] e2, double sigma, double tau) {
        kx[m] = k[0];
        ky[m] = k[1];
        kz[m] = dimensions == 3 ? k[2] : 0.0;
        turnKx[m] = kx[m] * FastSinCos.ONE_OVER_TWO_PI;
        turnKy[m] = ky[m] * FastSinCos.ONE_OVER_TWO_PI;
        turnKz[m] = kz[m] * FastSinCos.ONE_OVER_TWO_PI;
        e1x[m] = e1[0];
        e1y[m] = e1[1];
        e1z[m] = dimensions == 3 ? e1[2] : 0.0;
        twoPolarizations[m] = e2 != null;
        e2x[m] = e2 == null ? 0 : e2[0];
        e2y[m] = e2 == null ? 0 : e2[1];
        e2z[m] = e2 == null || dimensions == 2 ? 0 : e2[2];
        this.sigma[m] = sigma;
        this.correlationTime[m] = tau;
        alpha1[m] = 0;
        alpha2[m] = 0;
        beta1[m] = 0;
        beta2[m] = 0;
    }

    /** Sets the coefficients of mode m directly (steady flows). */
    public void setCoefficients(int m, double alpha1, double alpha2, double beta1, double beta2) {
        this.alpha1[m] = alpha1;
        this.alpha2[m] = twoPolarizations[m] ? alpha2 : 0.0;
        this.beta1[m] = beta1;
        this.beta2[m] = twoPolarizations[m] ? beta2 : 0.0;
    }

    /** Draws every random coefficient from its stationary normal law N(0, sigma^2). */
    public void drawStationaryCoefficients(RandomGenerator rng) {
        for (int m = 0; m < modes; m++) {
            double s = sigma[m];
            alpha1[m] = s * rng.nextGaussian();
            beta1[m] = s * rng.nextGaussian();
            if (twoPolarizations[m]) {
                alpha2[m] = s * rng.nextGaussian();
                beta2[m] = s * rng.nextGaussian();
            }
        }
    }

    /** Prepares the exact Ornstein-Uhlenbeck transition for steps of length dt and refreshes the amplitudes. */
    public void prepareStep(double dt) {
        anyRandomInTime = false;
        for (int m = 0; m < modes; m++) {
            double tau = correlationTime[m];
            if (Double.isInfinite(tau) || sigma[m] == 0) {
                decay[m] = 1.0;
                kick[m] = 0.0;
            } else {
                double rho = Math.exp(-dt / tau);
                decay[m] = rho;
                kick[m] = sigma[m] * Math.sqrt(-Math.expm1(-2 * dt / tau));
                anyRandomInTime = true;
            }
        }
        refreshAmplitudes();
    }

    /**
     * Advances every coefficient by one prepared step with standard normal variates taken from
     * {@code normals[offset ..]}, four runs of one per mode (alpha1, beta1, alpha2, beta2; the last two unused
     * with one polarization), and refreshes the amplitudes. A steady mode ignores its variates.
     */
    public void advanceAmplitudes(double[] normals, int offset) {
        if (!anyRandomInTime) {
            return;
        }
        int a1 = offset;
        int b1 = offset + modes;
        int a2 = offset + 2 * modes;
        int b2 = offset + 3 * modes;
        // One run of variates per coefficient: the layout the vector form of this update reads.
        for (int m = 0; m < modes; m++) {
            alpha1[m] = decay[m] * alpha1[m] + kick[m] * normals[a1 + m];
        }
        for (int m = 0; m < modes; m++) {
            beta1[m] = decay[m] * beta1[m] + kick[m] * normals[b1 + m];
        }
        for (int m = 0; m < modes; m++) {
            alpha2[m] = decay[m] * alpha2[m] + kick[m] * normals[a2 + m];
        }
        for (int m = 0; m < modes; m++) {
            beta2[m] = decay[m] * beta2[m] + kick[m] * normals[b2 + m];
        }
        refreshAmplitudes();
    }

    /** True when some coefficient changes in time (the amplitude update has work to do). */
    public boolean randomInTime() {
        return anyRandomInTime;
    }

    /** The factor h the amplitude arrays carry. */
    public double stepScale() {
        return stepScale;
    }

    /** Stores the amplitudes multiplied by h from now on. */
    public void setStepScale(double h) {
        if (h != stepScale) {
            stepScale = h;
            refreshAmplitudes();
        }
    }

    /**
     * Copies mode m (geometry, coefficients, prepared transition) into a lane record starting at slot j; the
     * lanes compute their own amplitudes from the coefficients.
     */
    void copyMode(int m, double[] data, int j, int stride) {
        data[j + ModeLanes.KX * stride] = turnKx[m];
        data[j + ModeLanes.KY * stride] = turnKy[m];
        data[j + ModeLanes.KZ * stride] = turnKz[m];
        data[j + ModeLanes.E1X * stride] = e1x[m];
        data[j + ModeLanes.E1Y * stride] = e1y[m];
        data[j + ModeLanes.E1Z * stride] = e1z[m];
        data[j + ModeLanes.E2X * stride] = e2x[m];
        data[j + ModeLanes.E2Y * stride] = e2y[m];
        data[j + ModeLanes.E2Z * stride] = e2z[m];
        data[j + ModeLanes.ALPHA1 * stride] = alpha1[m];
        data[j + ModeLanes.ALPHA2 * stride] = alpha2[m];
        data[j + ModeLanes.BETA1 * stride] = beta1[m];
        data[j + ModeLanes.BETA2 * stride] = beta2[m];
        data[j + ModeLanes.DECAY * stride] = decay[m];
        data[j + ModeLanes.KICK * stride] = kick[m];
    }

    private void refreshAmplitudes() {
        double h = stepScale;
        for (int m = 0; m < modes; m++) {
            ax[m] = h * (alpha1[m] * e1x[m] + alpha2[m] * e2x[m]);
            ay[m] = h * (alpha1[m] * e1y[m] + alpha2[m] * e2y[m]);
            az[m] = h * (alpha1[m] * e1z[m] + alpha2[m] * e2z[m]);
        }
        for (int m = 0; m < modes; m++) {
            bx[m] = h * (beta1[m] * e1x[m] + beta2[m] * e2x[m]);
            by[m] = h * (beta1[m] * e1y[m] + beta2[m] * e2y[m]);
            bz[m] = h * (beta1[m] * e1z[m] + beta2[m] * e2z[m]);
        }
    }

    /** The velocity at one point by plain {@link Math#sin}/{@link Math#cos}: a reference for tests. */
    public void velocityAt(double[] point, double[] out) {
        out[0] = 0;
        out[1] = 0;
        if (dimensions == 3) {
            out[2] = 0;
        }
        for (int m = 0; m < modes; m++) {
            double p = kx[m] * point[0] + ky[m] * point[1] + (dimensions == 3 ? kz[m] * point[2] : 0.0);
            double c = Math.cos(p) / stepScale;
            double s = Math.sin(p) / stepScale;
            out[0] += ax[m] * c + bx[m] * s;
            out[1] += ay[m] * c + by[m] * s;
            if (dimensions == 3) {
                out[2] += az[m] * c + bz[m] * s;
            }
        }
    }

    /** Mode m's wavevector, copied into out. */
    public void wavevector(int m, double[] out) {
        out[0] = kx[m];
        out[1] = ky[m];
        if (dimensions == 3) {
            out[2] = kz[m];
        }
    }

    /** Mode m's current cos and sin amplitudes, copied into a and b. */
    public void amplitudes(int m, double[] a, double[] b) {
        a[0] = ax[m] / stepScale;
        a[1] = ay[m] / stepScale;
        b[0] = bx[m] / stepScale;
        b[1] = by[m] / stepScale;
        if (dimensions == 3) {
            a[2] = az[m] / stepScale;
            b[2] = bz[m] / stepScale;
        }
    }
}
