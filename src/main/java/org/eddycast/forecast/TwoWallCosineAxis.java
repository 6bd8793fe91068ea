package org.eddycast.forecast;

/**
 * Spreading between two parallel reflecting walls at a and b = a + L, by the eigenfunction (cosine) series of
 * the diffusion equation with zero-flux walls:
 * p(x, t) = (1/L) [ 1 + 2 sum over n &gt;= 1 of cos(n pi (x - a) / L) cos(n pi (x0 - a) / L)
 * exp(-n^2 pi^2 D t / L^2) ]
 * (Crank 1975, The Mathematics of Diffusion, 2nd ed., Oxford University Press; Carslaw &amp; Jaeger
 * 1959, Conduction of Heat in Solids, 2nd ed., Oxford University Press, from memory). It is the same
 * density as the image series of {@link TwoWallImageAxis}; each mode decays separately, which makes it the
 * natural form for the approach to the mixed state 1/L.
 *
 * <p>Truncation: the series stops after the first N with 2 exp(-(N+1)^2 c) / (1 - exp(-(2N+3) c)) below
 * {@code tolerance}, c = pi^2 D t / L^2, a bound on the omitted terms relative to 1/L. The number of terms
 * grows like L / sqrt(D t): the series suits late times; at early times use the image series.
 *
 * <p>Shape, used by {@link #peakDensity} and {@link #lowestDensity}: for t &gt; 0 the density has a single
 * maximum and its smallest value at one of the walls. Its slope solves the diffusion equation with zero value at
 * both walls, starting from a dipole at x0 (one sign change); by the variation-diminishing property of the
 * heat equation the slope keeps at most one sign change, positive then negative, so the density rises then
 * falls.
 *
 * @param lower       lower wall a (m)
 * @param upper       upper wall b (m), greater than a
 * @param release     release position x0 (m), a &lt;= x0 &lt;= b
 * @param diffusivity D (m^2/s), greater than 0
 * @param tolerance   bound on the truncation error as a fraction of 1/L, strictly between 0 and 1
 */
public record TwoWallCosineAxis(double lower, double upper, double release, double diffusivity, double tolerance)
        implements AxisDensity {

    /** The truncation tolerance used when none is given: 1e-10 of the uniform density. */
    public static final double DEFAULT_TOLERANCE = 1e-10;

    public TwoWallCosineAxis {
        TwoWallChecks.check(lower, upper, release, diffusivity, tolerance);
    }

    /** Walls at a and b, default tolerance. */
    public TwoWallCosineAxis(double lower, double upper, double release, double diffusivity) {
        this(lower, upper, release, diffusivity, DEFAULT_TOLERANCE);
    }

    /** The gap L = b - a (m). */
    public double gap() {
        return upper - lower;
    }

    @Override
    public double density(double x, double t) {
        return relativeDensity(x, t) / gap();
    }

    /**
     * The density over its final uniform value 1/L (dimensionless): 1 when mixed, 0 outside the gap.
     * For t &gt; 0.
     */
    public double relativeDensity(double x, double t) {
        Checks.positive("t", t, "s");
        if (x < lower || x > upper) {
            return 0.0;
        }
        double gap = upper - lower;
        double c = Math.PI * Math.PI * diffusivity * t / (gap * gap);
        double phase = Math.PI * (x - lower) / gap;
        double phase0 = Math.PI * (release - lower) / gap;
        double sum = 1.0;
        for (int n = 1; ; n++) {
            sum += 2.0 * Math.cos(n * phase) * Math.cos(n * phase0) * Math.exp(-(double) n * n * c);
            double omitted = 2.0 * Math.exp(-(n + 1.0) * (n + 1.0) * c) / (1.0 - Math.exp(-(2.0 * n + 3.0) * c));
            if (omitted <= tolerance) {
                return sum;
            }
        }
    }

    /** The largest relative density over the gap at time t. */
    public double peakRelativeDensity(double t) {
        Checks.positive("t", t, "s");
        return UnimodalMaximum.of(x -> relativeDensity(x, t), lower, upper, release);
    }

    /** The smallest relative density over the gap at time t: at one of the walls (see the class comment). */
    public double lowestRelativeDensity(double t) {
        return Math.min(relativeDensity(lower, t), relativeDensity(upper, t));
    }

    @Override
    public double peakDensity(double t) {
        return peakRelativeDensity(t) / gap();
    }

    @Override
    public double lowestDensity(double t) {
        return lowestRelativeDensity(t) / gap();
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
