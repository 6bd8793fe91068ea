package org.eddycast.forecast;

/**
 * Spreading between two parallel reflecting walls with bounded work at every time: the density is summed by
 * whichever of its two exact series needs fewer terms, the image series of {@link TwoWallImageAxis} early and
 * the cosine series of {@link TwoWallCosineAxis} late (Crank 1975, The Mathematics of Diffusion, 2nd ed.,
 * Oxford University Press, ch. 2 and 4).
 *
 * <p>Why the work is bounded: with c = pi^2 D t / L^2, the cosine series needs about sqrt(ln(1/eps) / c) terms
 * for a relative error eps, the image series about sqrt(c ln(1/eps)) / pi levels. Their product is about
 * ln(1/eps) / pi whatever c is, so the cheaper one never needs more than about sqrt(ln(1/eps)), a handful of
 * terms at eps = 1e-10; the switch is at c = 1. Either series alone grows without bound: the cosine series at
 * early times in a wide channel (1e5 m wide, a second after release: about 1e8 terms per value), the image
 * series far downstream in a shallow one.
 *
 * <p>The peak is searched only within ten free-space standard deviations sqrt(2 D t) of the release (clipped
 * to the walls): every term outside that bracket, the release's own and its images', is below e^-50 of the
 * peak, so the maximum lies inside it, and the search does not lose a narrow early peak in a wide gap.
 *
 * @param lower       lower wall a (m)
 * @param upper       upper wall b (m), greater than a
 * @param release     release position x0 (m), a &lt;= x0 &lt;= b
 * @param diffusivity D (m^2/s), greater than 0
 */
public record TwoWallAxis(double lower, double upper, double release, double diffusivity) implements AxisDensity {

    /** Above this c = pi^2 D t / L^2 the cosine series is the cheaper one. */
    static final double SWITCH = 1.0;
    /** Half-width of the peak search in free-space standard deviations. */
    private static final double BRACKET_SIGMAS = 10;

    public TwoWallAxis {
        TwoWallChecks.check(lower, upper, release, diffusivity, TwoWallCosineAxis.DEFAULT_TOLERANCE);
    }

    /** The exact series that is cheaper at time t (s). */
    AxisDensity seriesAt(double t) {
        Checks.positive("t", t, "s");
        double gap = upper - lower;
        double c = Math.PI * Math.PI * diffusivity * t / (gap * gap);
        return c < SWITCH ? new TwoWallImageAxis(lower, upper, release, diffusivity)
                : new TwoWallCosineAxis(lower, upper, release, diffusivity);
    }

    @Override
    public double density(double x, double t) {
        return seriesAt(t).density(x, t);
    }

    @Override
    public double peakDensity(double t) {
        AxisDensity series = seriesAt(t);
        double reach = BRACKET_SIGMAS * Math.sqrt(2 * diffusivity * t);
        double from = Math.max(lower, release - reach);
        double to = Math.min(upper, release + reach);
        return UnimodalMaximum.of(x -> series.density(x, t), from, to, release);
    }

    @Override
    public double lowestDensity(double t) {
        AxisDensity series = seriesAt(t);
        return Math.min(series.density(lower, t), series.density(upper, t));
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
