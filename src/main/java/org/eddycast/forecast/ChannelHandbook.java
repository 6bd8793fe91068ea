package org.eddycast.forecast;

import java.util.ArrayList;
import java.util.List;

/**
 * Handbook mixing coefficients for open channels, from the depth h, width W, mean velocity U and shear
 * velocity u*, each as a {@link HandbookEstimate} with its source, validity and uncertainty.
 *
 * <ul>
 *   <li>vertical: eps_z = 0.067 h u*, the depth average of the eddy viscosity kappa u* z (1 - z/h) of a
 *       logarithmic profile, kappa h u* / 6 with kappa = 0.4 (Fischer, List, Koh, Imberger &amp; Brooks 1979,
 *       Mixing in Inland and Coastal Waters, Academic Press, ch. 5; derived);</li>
 *   <li>transverse: eps_t = 0.15 h u* in straight laboratory channels (range 0.1 to 0.2) and 0.6 h u*
 *       (+-50%) in natural streams (same source, from memory);</li>
 *   <li>longitudinal: Elder's K = 5.93 h u* for a wide two-dimensional channel with a logarithmic profile
 *       (Elder 1959, The dispersion of marked fluid in turbulent shear flow, J. Fluid Mech. 5:544; constant
 *       from memory), and Fischer's K = 0.011 U^2 W^2 / (h u*) for natural rivers, within a factor of about 4
 *       (Fischer 1975, J. Environ. Eng. Div. ASCE 101:453; from memory).</li>
 * </ul>
 *
 * <p>Special cases: the channel formulas assume a wide channel; below W/h = 5 every estimate carries a
 * warning. All arguments must be finite and greater than 0.
 */
public final class ChannelHandbook {

    /** The von Karman constant used in the derivation of the vertical coefficient (common practice). */
    public static final double VON_KARMAN = 0.4;

    /** Below this width-to-depth ratio the channel is not treated as wide (common practice). */
    public static final double WIDE_CHANNEL_ASPECT = 5.0;

    private ChannelHandbook() {
    }

    /** eps_z = 0.067 h u* (m^2/s). */
    public static HandbookEstimate verticalMixing(double depth, double shearVelocity) {
        check(depth, shearVelocity);
        return new HandbookEstimate("vertical mixing coefficient", MixingProcess.VERTICAL_MIXING,
                0.067 * depth * shearVelocity, "m^2/s", "eps_z = 0.067 h u* (= kappa h u* / 6, kappa = 0.4)",
                Sources.FISCHER_1979, Confidence.DERIVED,
                "uniform flow with a logarithmic velocity profile; tracer and momentum mixed alike",
                Uncertainty.percent(25, "our allowance for kappa and departures from the log law"), List.of());
    }

    /** eps_t = 0.15 h u* for straight channels (m^2/s). */
    public static HandbookEstimate transverseMixingStraight(double depth, double shearVelocity) {
        check(depth, shearVelocity);
        return new HandbookEstimate("transverse mixing coefficient (straight channel)",
                MixingProcess.TRANSVERSE_MIXING, 0.15 * depth * shearVelocity, "m^2/s", "eps_t = 0.15 h u*",
                Sources.FISCHER_1979, Confidence.FROM_MEMORY,
                "straight, wide laboratory channels (measured range 0.1 to 0.2 h u*)",
                Uncertainty.percent(33, "range 0.1 to 0.2 h u*, Fischer et al. 1979 (from memory)"), List.of());
    }

    /** eps_t = 0.6 h u* for natural streams (m^2/s). */
    public static HandbookEstimate transverseMixingNatural(double depth, double shearVelocity) {
        check(depth, shearVelocity);
        return new HandbookEstimate("transverse mixing coefficient (natural stream)",
                MixingProcess.TRANSVERSE_MIXING, 0.6 * depth * shearVelocity, "m^2/s", "eps_t = 0.6 h u*",
                Sources.FISCHER_1979, Confidence.FROM_MEMORY,
                "natural streams with gentle meanders and moderate irregularities; sharp bends give more",
                Uncertainty.percent(50, "Fischer et al. 1979 (from memory)"), List.of());
    }

    /** Elder's longitudinal dispersion coefficient K = 5.93 h u* (m^2/s). */
    public static HandbookEstimate elderLongitudinal(double depth, double shearVelocity) {
        check(depth, shearVelocity);
        return new HandbookEstimate("longitudinal dispersion coefficient (Elder)",
                MixingProcess.LONGITUDINAL_DISPERSION, 5.93 * depth * shearVelocity, "m^2/s", "K = 5.93 h u*",
                Sources.ELDER_1959, Confidence.FROM_MEMORY,
                "very wide two-dimensional channel with a logarithmic profile, after the tracer is mixed over"
                        + " the depth; leaves out the transverse shear that dominates in rivers",
                Uncertainty.factor(2, "our allowance; rivers often give far larger values"), List.of());
    }

    /** Fischer's longitudinal dispersion coefficient K = 0.011 U^2 W^2 / (h u*) (m^2/s). */
    public static HandbookEstimate fischerLongitudinal(double meanVelocity, double width, double depth,
                                                       double shearVelocity) {
        check(depth, shearVelocity);
        Checks.positive("meanVelocity", meanVelocity, "m/s");
        Checks.positive("width", width, "m");
        List<String> warnings = new ArrayList<>();
        if (width / depth < WIDE_CHANNEL_ASPECT) {
            warnings.add(notWide(width, depth));
        }
        return new HandbookEstimate("longitudinal dispersion coefficient (Fischer)",
                MixingProcess.LONGITUDINAL_DISPERSION,
                0.011 * meanVelocity * meanVelocity * width * width / (depth * shearVelocity), "m^2/s",
                "K = 0.011 U^2 W^2 / (h u*)", Sources.FISCHER_1975, Confidence.FROM_MEMORY,
                "natural rivers, after the tracer is mixed across the section",
                Uncertainty.factor(4, "Fischer 1975 (from memory)"), warnings);
    }

    /** All five estimates for one channel, in the order vertical, transverse (2), longitudinal (2). */
    public static List<HandbookEstimate> all(double depth, double width, double meanVelocity,
                                             double shearVelocity) {
        List<HandbookEstimate> list = List.of(verticalMixing(depth, shearVelocity),
                transverseMixingStraight(depth, shearVelocity), transverseMixingNatural(depth, shearVelocity),
                elderLongitudinal(depth, shearVelocity),
                fischerLongitudinal(meanVelocity, width, depth, shearVelocity));
        Checks.positive("width", width, "m");
        if (width / depth >= WIDE_CHANNEL_ASPECT) {
            return list;
        }
        List<HandbookEstimate> warned = new ArrayList<>();
        for (HandbookEstimate e : list) {
            List<String> warnings = new ArrayList<>(e.warnings());
            if (!warnings.contains(notWide(width, depth))) {
                warnings.add(notWide(width, depth));
            }
            warned.add(new HandbookEstimate(e.name(), e.process(), e.value(), e.unit(), e.formula(), e.source(),
                    e.confidence(), e.validity(), e.uncertainty(), warnings));
        }
        return List.copyOf(warned);
    }

    private static String notWide(double width, double depth) {
        return String.format("the channel is not wide (W/h = %.3g, below %.0f): side walls shape the flow",
                width / depth, WIDE_CHANNEL_ASPECT);
    }

    private static void check(double depth, double shearVelocity) {
        Checks.positive("depth", depth, "m");
        Checks.positive("shearVelocity", shearVelocity, "m/s");
    }
}
