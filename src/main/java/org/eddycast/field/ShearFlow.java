package org.eddycast.field;

import java.util.Locale;
import java.util.random.RandomGenerator;

/**
 * The periodic shear verification flow u = (A(t) cos(k y) + B(t) sin(k y), 0[, 0]), in units where the
 * amplitude U is one and, for k &gt; 0, the wavenumber is one.
 *
 * <p>Steady (tau infinite): u = (U sin(k y), 0). Time-correlated: A and B independent Ornstein-Uhlenbeck
 * processes of variance U^2 and correlation time tau. With wavenumber zero the flow is a spatially uniform
 * Ornstein-Uhlenbeck velocity (then the time unit is tau and the length unit U tau).
 *
 * <p>Exact long-time diffusivities follow from Taylor's formula (Taylor 1921, "Diffusion by continuous
 * movements", Proc. London Math. Soc. s2-20:196-212): see {@link #exactDiffusivity(double)}.
 */
public final class ShearFlow implements FieldModel {

    private final int dimensions;
    private final double wavenumber;
    private final double correlationTime;

    /**
     * @param dimensions      2 or 3
     * @param wavenumber      1 (a shear) or 0 (uniform velocity), dimensionless
     * @param correlationTime dimensionless tau, or infinite for the steady flow (wavenumber must then be 1)
     */
    public ShearFlow(int dimensions, double wavenumber, double correlationTime) {
        if (dimensions != 2 && dimensions != 3) {
            throw new IllegalArgumentException("dimensions must be 2 or 3; got " + dimensions);
        }
        if (wavenumber == 0 && Double.isInfinite(correlationTime)) {
            throw new IllegalArgumentException("a steady shear needs a wavenumber above zero");
        }
        this.dimensions = dimensions;
        this.wavenumber = wavenumber;
        this.correlationTime = correlationTime;
    }

    public boolean steady() {
        return Double.isInfinite(correlationTime);
    }

    @Override
    public int dimensions() {
        return dimensions;
    }

    @Override
    public int modeCount() {
        return 1;
    }

    @Override
    public void realize(ShearModeField target, RandomGenerator rng) {
        double[] k = {0, wavenumber, 0};
        double[] e1 = {1, 0, 0};
        if (steady()) {
            target.setMode(0, k, e1, null, 0.0, Double.POSITIVE_INFINITY);
            target.setCoefficients(0, 0.0, 0.0, 1.0, 0.0);
        } else {
            target.setMode(0, k, e1, null, 1.0, correlationTime);
            target.drawStationaryCoefficients(rng);
        }
    }

    /**
     * The exact long-time diffusivity along x for molecular diffusivity d0 (dimensionless).
     *
     * <p>Taylor (1921): D = d0 + integral_0^inf R(t) dt with the Lagrangian velocity correlation R. The
     * particle's y is a Brownian motion (no velocity across the shear), so with y(t) - y(0) ~ N(0, 2 d0 t):
     * steady, R(t) = U^2 &lt;sin(k y0) sin(k y_t)&gt; = (U^2/2) e^(-d0 k^2 t), giving D = d0 + U^2 / (2 d0 k^2);
     * time-correlated, R(t) = U^2 e^(-t/tau) &lt;cos(k (y_t - y_0))&gt; = U^2 e^(-t/tau) e^(-d0 k^2 t),
     * giving D = d0 + U^2 tau / (1 + d0 k^2 tau).
     */
    public double exactDiffusivity(double d0) {
        double k2 = wavenumber * wavenumber;
        return steady() ? d0 + 1.0 / (2 * d0 * k2) : d0 + correlationTime / (1 + d0 * k2 * correlationTime);
    }

    /**
     * The long-time diffusivity of the time-discrete flow with step dt (drift frozen over each step), for
     * bounding the time-step bias: with lag-n velocity correlation C rho^n, the variance grows per unit time
     * as (C dt / 2) coth(a / 2) with rho = e^(-a), which exceeds the continuous value by a relative
     * a^2 / 12 + O(a^4) (a = (1/tau + d0 k^2) dt).
     */
    public double discreteDiffusivity(double d0, double dt) {
        double k2 = wavenumber * wavenumber;
        double rate = steady() ? d0 * k2 : 1.0 / correlationTime + d0 * k2;
        double variance = steady() ? 0.5 : 1.0;
        double a = rate * dt;
        return d0 + variance * dt / 2 / Math.tanh(a / 2);
    }

    @Override
    public double componentVariance(int axis) {
        return axis == 0 ? (steady() ? 0.5 : 1.0) : 0.0;
    }

    @Override
    public double startRegion() {
        return wavenumber == 0 ? 1.0 : 2 * Math.PI / wavenumber;
    }

    @Override
    public double shortestTimeScale() {
        return steady() ? 1.0 : Math.min(1.0, correlationTime);
    }

    @Override
    public String describe() {
        String time = steady() ? "steady" : String.format(Locale.ROOT, "Ornstein-Uhlenbeck amplitudes, tau = %.4g",
                correlationTime);
        return wavenumber == 0 ? "spatially uniform velocity, " + time : "periodic shear flow, " + time;
    }
}
