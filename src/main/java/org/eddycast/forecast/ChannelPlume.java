package org.eddycast.forecast;

/**
 * Steady plume from a continuous point source of strength q (kg/s) in a straight channel with mean velocity U:
 * the tracer released during dt travels as a puff, and with travel time t = x / U and longitudinal spreading
 * neglected, C(x, y, z) = (q / U) p_y(y, x / U) p_z(z, x / U), each factor the density of one axis
 * (Fischer, List, Koh, Imberger &amp; Brooks 1979, Mixing in Inland and Coastal Waters, Academic Press,
 * ch. 5, from memory; Crank 1975, The Mathematics of Diffusion, 2nd ed., Oxford University Press).
 *
 * <p>Coordinates: x downstream of the source, z up from the bed (0 to h). Across the channel, y runs from one
 * bank (0 to W) when the width is finite; the bed and surface, and the banks when the width is given, reflect
 * by the image or cosine series, whichever is cheaper ({@link TwoWallAxis}). With an infinite width
 * y is unbounded.
 *
 * <p>Widths ({@link #lateralSigma}, {@link #verticalSigma}) are the free-space values sqrt(2 eps x / U): they
 * hold until the plume reaches the walls. Special cases: x must be greater than 0; the slender-plume form
 * fails within a few eps / U of the source.
 */
public final class ChannelPlume {

    private final double releaseRate;
    private final double meanVelocity;
    private final double depth;
    private final double width;
    private final double transverseMixing;
    private final double verticalMixing;
    private final AxisDensity across;
    private final AxisDensity vertical;

    /**
     * @param releaseRate      q (kg/s), greater than 0
     * @param meanVelocity     U (m/s), greater than 0
     * @param depth            h (m), greater than 0
     * @param width            W (m), greater than 0, or positive infinity for no banks
     * @param transverseMixing eps_t (m^2/s), greater than 0
     * @param verticalMixing   eps_z (m^2/s), greater than 0
     * @param releaseY         source position across (m): from one bank, 0 to W; any value when W is infinite
     * @param releaseZ         source height above the bed (m), 0 to h
     */
    public ChannelPlume(double releaseRate, double meanVelocity, double depth, double width,
                        double transverseMixing, double verticalMixing, double releaseY, double releaseZ) {
        this.releaseRate = Checks.positive("releaseRate", releaseRate, "kg/s");
        this.meanVelocity = Checks.positive("meanVelocity", meanVelocity, "m/s");
        this.depth = Checks.positive("depth", depth, "m");
        if (!(width > 0)) {
            throw new IllegalArgumentException("width must be > 0 m (or infinite for no banks); got " + width);
        }
        this.width = width;
        this.transverseMixing = Checks.positive("transverseMixing", transverseMixing, "m^2/s");
        this.verticalMixing = Checks.positive("verticalMixing", verticalMixing, "m^2/s");
        this.across = Double.isInfinite(width)
                ? new FreeAxis(releaseY, transverseMixing)
                : new TwoWallAxis(0.0, width, releaseY, transverseMixing);
        this.vertical = new TwoWallAxis(0.0, depth, releaseZ, verticalMixing);
    }

    /** Concentration (kg/m^3) at x (m) downstream, y (m) across, z (m) above the bed. */
    public double concentration(double x, double y, double z) {
        double t = travelTime(x);
        return releaseRate / meanVelocity * across.density(y, t) * vertical.density(z, t);
    }

    /** Concentration averaged over the depth (kg/m^3) at x downstream and y across. */
    public double depthAveragedConcentration(double x, double y) {
        return releaseRate / (meanVelocity * depth) * across.density(y, travelTime(x));
    }

    /** The largest concentration (kg/m^3) in the cross-section at x downstream. */
    public double peakConcentration(double x) {
        double t = travelTime(x);
        return releaseRate / meanVelocity * across.peakDensity(t) * vertical.peakDensity(t);
    }

    /** Lateral standard deviation sqrt(2 eps_t x / U) (m), free-space value. */
    public double lateralSigma(double x) {
        return Math.sqrt(2.0 * transverseMixing * travelTime(x));
    }

    /** Vertical standard deviation sqrt(2 eps_z x / U) (m), free-space value. */
    public double verticalSigma(double x) {
        return Math.sqrt(2.0 * verticalMixing * travelTime(x));
    }

    /** Lateral width (m) by the chosen measure. */
    public double lateralWidth(WidthMeasure measure, double x) {
        return measure.width(lateralSigma(x));
    }

    /** Vertical width (m) by the chosen measure. */
    public double verticalWidth(WidthMeasure measure, double x) {
        return measure.width(verticalSigma(x));
    }

    /** Distance (m) to mixed across the width (5% criterion); the width must be finite. */
    public double distanceToMixedAcrossWidth() {
        if (Double.isInfinite(width)) {
            throw new IllegalStateException("no distance to mixed across the width: the width is not given");
        }
        return ChannelMixingDistance.acrossWidth(meanVelocity, width, transverseMixing, across.release());
    }

    /** Distance (m) to mixed over the depth (5% criterion). */
    public double distanceToMixedOverDepth() {
        return ChannelMixingDistance.overDepth(meanVelocity, depth, verticalMixing, vertical.release());
    }

    /** Travel time x / U (s). */
    public double travelTime(double x) {
        Checks.positive("x", x, "m");
        return x / meanVelocity;
    }

    public double depth() {
        return depth;
    }

    public double width() {
        return width;
    }
}
