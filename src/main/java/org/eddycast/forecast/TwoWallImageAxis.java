package org.eddycast.forecast;

/**
 * Spreading between two parallel reflecting walls at a and b = a + L, by the method of images: the release and
 * its mirror image are repeated with period 2L,
 * p(x, t) = sum over all integers n of [ g(x - x0 - 2 n L) + g(x + x0 - 2 a - 2 n L) ],
 * where g is the free-space Gaussian density (Crank 1975, The Mathematics of Diffusion, 2nd ed., Oxford
 * University Press; Fischer, List, Koh, Imberger &amp; Brooks 1979, Mixing in Inland and Coastal
 * Waters, Academic Press, ch. 2, from memory).
 *
 * <p>Truncation: the series is summed over |n| &lt;= N with N the first level at which a bound on everything
 * left out is below {@code tolerance} times the uniform density 1/L. With x and x0 inside the gap, every
 * omitted image lies at least 2 N L away, in four sequences whose members are 2L apart, so the omitted sum is
 * at most 4 g(2 N L) / (1 - q) with q = exp(-(2 N + 1) L^2 / (D t)), the largest ratio of consecutive terms.
 *
 * <p>Cost grows with sqrt(D t) / L: the series suits early times; {@link TwoWallCosineAxis} gives the same
 * density and suits late times. t must be greater than 0.
 *
 * @param lower       lower wall a (m)
 * @param upper       upper wall b (m), greater than a
 * @param release     release position x0 (m), a &lt;= x0 &lt;= b
 * @param diffusivity D (m^2/s), greater than 0
 * @param tolerance   bound on the truncation error as a fraction of 1/L, strictly between 0 and 1
 */
public record TwoWallImageAxis(double lower, double upper, double release, double diffusivity, double tolerance)
        implements AxisDensity {

    /** The truncation tolerance used when none is given: 1e-10 of the uniform density. */
    public static final double DEFAULT_TOLERANCE = 1e-10;

    public TwoWallImageAxis {
        TwoWallChecks.check(lower, upper, release, diffusivity, tolerance);
    }

    /** Walls at a and b, default tolerance. */
    public TwoWallImageAxis(double lower, double upper, double release, double diffusivity) {
        this(lower, upper, release, diffusivity, DEFAULT_TOLERANCE);
    }

    /** The gap L = b - a (m). */
    public double gap() {
        return upper - lower;
    }

    @Override
    public double density(double x, double t) {
        Checks.positive("t", t, "s");
        if (x < lower || x > upper) {
            return 0.0;
        }
        double gap = upper - lower;
        double xi = x - lower;
        double xi0 = release - lower;
        double sum = AxisDensity.gaussian(xi - xi0, diffusivity, t) + AxisDensity.gaussian(xi + xi0, diffusivity, t);
        double allowed = tolerance / gap;
        for (int n = 1; ; n++) {
            double shift = 2.0 * n * gap;
            sum += AxisDensity.gaussian(xi - xi0 - shift, diffusivity, t)
                    + AxisDensity.gaussian(xi - xi0 + shift, diffusivity, t)
                    + AxisDensity.gaussian(xi + xi0 - shift, diffusivity, t)
                    + AxisDensity.gaussian(xi + xi0 + shift, diffusivity, t);
            if (omittedBound(n, gap, t) <= allowed) {
                return sum;
            }
        }
    }

    /** Bound on the images left out when |n| &lt;= levels are summed (see the class comment). */
    private double omittedBound(int levels, double gap, double t) {
        double q = Math.exp(-(2.0 * levels + 1.0) * gap * gap / (diffusivity * t));
        return 4.0 * AxisDensity.gaussian(2.0 * levels * gap, diffusivity, t) / (1.0 - q);
    }

    @Override
    public double peakDensity(double t) {
        Checks.positive("t", t, "s");
        return UnimodalMaximum.of(x -> density(x, t), lower, upper, release);
    }

    @Override
    public double lowestDensity(double t) {
        Checks.positive("t", t, "s");
        return Math.min(density(lower, t), density(upper, t));
    }

    @Override
    public double lowerBound() {
        return lower;
    }

    @Override
    public double upperBound() {
        return upper;
    }
}
