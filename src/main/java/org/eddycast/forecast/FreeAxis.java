package org.eddycast.forecast;

/**
 * Spreading along an axis without walls: the Gaussian density
 * p(x, t) = exp(-(x - x0)^2 / (4 D t)) / sqrt(4 pi D t), standard deviation sqrt(2 D t)
 * (Crank 1975, The Mathematics of Diffusion, 2nd ed., Oxford University Press).
 *
 * <p>Special cases: D = 0 is not allowed (the density would be a point); t must be greater than 0.
 *
 * @param release     release position x0 (m)
 * @param diffusivity D (m^2/s), greater than 0
 */
public record FreeAxis(double release, double diffusivity) implements AxisDensity {

    public FreeAxis {
        Checks.finite("release", release, "m");
        Checks.positive("diffusivity", diffusivity, "m^2/s");
    }

    @Override
    public double density(double x, double t) {
        Checks.positive("t", t, "s");
        return AxisDensity.gaussian(x - release, diffusivity, t);
    }

    @Override
    public double peakDensity(double t) {
        Checks.positive("t", t, "s");
        return 1.0 / Math.sqrt(4.0 * Math.PI * diffusivity * t);
    }

    @Override
    public double lowestDensity(double t) {
        return 0.0;
    }

    /** The standard deviation sqrt(2 D t) (m) at time t. */
    public double sigma(double t) {
        Checks.positive("t", t, "s");
        return Math.sqrt(2.0 * diffusivity * t);
    }

    @Override
    public double lowerBound() {
        return Double.NEGATIVE_INFINITY;
    }

    @Override
    public double upperBound() {
        return Double.POSITIVE_INFINITY;
    }
}
