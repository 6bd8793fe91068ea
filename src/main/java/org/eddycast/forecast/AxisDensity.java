package org.eddycast.forecast;

/**
 * Where one released particle is likely to be along one axis: the probability density (1/m) at position x
 * and time t after a release at a point, spreading with a constant diffusivity D (m^2/s).
 *
 * <p>Because the diffusion equation with constant per-axis diffusivities in a free space, a half space or a
 * box with reflecting walls separates by axis, the concentration of an instantaneous point release is the
 * released mass times the product of three such densities (Crank 1975, The Mathematics of Diffusion, 2nd ed.,
 * Oxford University Press). Each density integrates to one over its domain.
 */
public interface AxisDensity {

    /** Density (1/m) at position x (m) and time t (s, greater than 0); 0 outside the domain. */
    double density(double x, double t);

    /** The largest density over the domain at time t (1/m). */
    double peakDensity(double t);

    /** The smallest density over the domain at time t (1/m); 0 for an unbounded axis. */
    double lowestDensity(double t);

    /** Release position (m). */
    double release();

    /** Diffusivity along this axis (m^2/s). */
    double diffusivity();

    /** Lower end of the domain (m), negative infinity when open. */
    double lowerBound();

    /** Upper end of the domain (m), positive infinity when open. */
    double upperBound();

    /**
     * The free-space Gaussian density exp(-d^2 / (4 D t)) / sqrt(4 pi D t) at distance d from the release.
     */
    static double gaussian(double distance, double diffusivity, double t) {
        double fourDt = 4.0 * diffusivity * t;
        return Math.exp(-distance * distance / fourDt) / Math.sqrt(Math.PI * fourDt);
    }
}
