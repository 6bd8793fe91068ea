package org.eddycast.forecast;

/**
 * Spreading along an axis bounded by one reflecting (zero-flux) wall, by the method of images: the free-space
 * Gaussian plus the Gaussian of an image source mirrored in the wall,
 * p(x, t) = g(x - x0) + g(x - (2 w - x0)), where g is the free-space density
 * (Crank 1975, The Mathematics of Diffusion, 2nd ed., Oxford University Press; Fischer, List, Koh,
 * Imberger &amp; Brooks 1979, Mixing in Inland and Coastal Waters, Academic Press, ch. 2, from memory).
 *
 * <p>The fluid lies on one side of the wall ({@code fluidAbove}: x &gt;= wall, otherwise x &lt;= wall); the
 * density is 0 on the other side. A release on the wall doubles the free-space density there.
 *
 * <p>Peak: the sum of two equal Gaussians is symmetric about the wall and, on one side of it, rises to a
 * single maximum (at the wall while the release is within about one standard deviation of it, between the
 * wall and the release point later), so a unimodal search between wall and release finds it.
 *
 * @param wall        wall position w (m)
 * @param fluidAbove  true when the fluid lies at x &gt;= w
 * @param release     release position x0 (m), on the fluid side
 * @param diffusivity D (m^2/s), greater than 0
 */
public record OneWallAxis(double wall, boolean fluidAbove, double release, double diffusivity)
        implements AxisDensity {

    public OneWallAxis {
        Checks.finite("wall", wall, "m");
        Checks.finite("release", release, "m");
        Checks.positive("diffusivity", diffusivity, "m^2/s");
        if (fluidAbove ? release < wall : release > wall) {
            throw new IllegalArgumentException("release must lie on the fluid side of the wall at " + wall
                    + " m (" + (fluidAbove ? ">=" : "<=") + " " + wall + " m); got " + release);
        }
    }

    @Override
    public double density(double x, double t) {
        Checks.positive("t", t, "s");
        if (fluidAbove ? x < wall : x > wall) {
            return 0.0;
        }
        double image = 2.0 * wall - release;
        return AxisDensity.gaussian(x - release, diffusivity, t) + AxisDensity.gaussian(x - image, diffusivity, t);
    }

    @Override
    public double peakDensity(double t) {
        Checks.positive("t", t, "s");
        double lo = Math.min(wall, release);
        double hi = Math.max(wall, release);
        return UnimodalMaximum.of(x -> density(x, t), lo, hi, release);
    }

    @Override
    public double lowestDensity(double t) {
        return 0.0;
    }

    @Override
    public double lowerBound() {
        return fluidAbove ? wall : Double.NEGATIVE_INFINITY;
    }

    @Override
    public double upperBound() {
        return fluidAbove ? Double.POSITIVE_INFINITY : wall;
    }
}
