package org.eddycast.forecast;

/**
 * Distance downstream of a steady point source in a straight channel after which the tracer is mixed across
 * the width (or over the depth): every point within 5% of the cross-sectional mean, by the cosine series of
 * {@link TwoWallCosineAxis} with travel time t = x / U and the worst-point rule of {@link WellMixedTime}.
 *
 * <p>Fischer, List, Koh, Imberger &amp; Brooks (1979, Mixing in Inland and Coastal Waters, Academic Press,
 * ch. 5; from memory) give about 0.1 U W^2 / eps_t for a centre-line release and 0.4 U W^2 / eps_t for a bank
 * release with the same 5% criterion. To leading order the series gives ln(40) / (4 pi^2) = 0.0934 and
 * ln(40) / pi^2 = 0.374; a bank release in width W is a centre-line release in width 2W mirrored in the bank,
 * hence the exact factor 4 between them.
 *
 * <p>Assumptions: uniform velocity U and constant mixing coefficient over the section; banks, bed and surface
 * reflect; longitudinal spreading ignored (a slender plume, valid when the travel time is much larger than
 * the longitudinal diffusion time over the same distance).
 */
public final class ChannelMixingDistance {

    private ChannelMixingDistance() {
    }

    /**
     * Distance (m) to mixed across the width.
     *
     * @param meanVelocity     U (m/s)
     * @param width            W (m)
     * @param transverseMixing eps_t (m^2/s)
     * @param releaseFromBank  distance of the source from one bank (m), 0 to W; W/2 for the centre line
     */
    public static double acrossWidth(double meanVelocity, double width, double transverseMixing,
                                     double releaseFromBank) {
        return acrossGap(meanVelocity, width, transverseMixing, releaseFromBank, WellMixedTime.DEFAULT_CRITERION);
    }

    /**
     * Distance (m) to mixed over the depth.
     *
     * @param meanVelocity   U (m/s)
     * @param depth          h (m)
     * @param verticalMixing eps_z (m^2/s)
     * @param releaseHeight  height of the source above the bed (m), 0 to h
     */
    public static double overDepth(double meanVelocity, double depth, double verticalMixing, double releaseHeight) {
        return acrossGap(meanVelocity, depth, verticalMixing, releaseHeight, WellMixedTime.DEFAULT_CRITERION);
    }

    /**
     * Distance (m) to mixed across a gap of the given size with a chosen criterion (a fraction strictly
     * between 0 and 1).
     */
    public static double acrossGap(double meanVelocity, double gap, double mixingCoefficient, double release,
                                   double criterion) {
        Checks.positive("meanVelocity", meanVelocity, "m/s");
        TwoWallCosineAxis axis = new TwoWallCosineAxis(0.0, gap, release, mixingCoefficient);
        return meanVelocity * WellMixedTime.timeToWithin(criterion, axis);
    }
}
