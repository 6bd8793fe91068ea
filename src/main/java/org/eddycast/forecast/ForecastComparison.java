package org.eddycast.forecast;

import java.util.ArrayList;
import java.util.List;

/**
 * Sets a simulated value (a diffusivity, or a time derived from one) beside a handbook estimate and says in
 * plain words whether they agree within the estimate's stated uncertainty and, when they do not, what
 * probably explains it: anisotropy, confinement by the depth or the walls, secondary currents, bulk
 * circulation, mean-shear dispersion (which a homogeneous-turbulence model leaves out), uneven turbulence, or
 * the rules used to model the flow. It never adjusts either value.
 *
 * <p>Agreement: the forecast's 95% interval overlaps the band the estimate's uncertainty allows. Whether a
 * larger value means faster mixing follows the estimate's {@link MixingProcess} (a diffusivity: yes; a blend
 * time: no).
 */
public final class ForecastComparison {

    static final String ANISOTROPY = "Anisotropy: in a channel the vertical and cross-channel eddies are weaker"
            + " than the streamwise ones (about 0.55 and 0.7 of them), but the simulated turbulence is the same in"
            + " every direction.";
    static final String DEPTH_CONFINEMENT = "Confinement by the depth: the bed and the water surface stop the"
            + " largest eddies from carrying tracer up and down, while the simulated eddies move freely in every"
            + " direction.";
    static final String WALL_CONFINEMENT = "Confinement by the walls: near walls and in corners eddies are small"
            + " and slow, so tracer lingers there; the simulated turbulence has no walls.";
    static final String SECONDARY_CURRENTS = "Secondary currents: bends, an uneven bed and irregular banks drive"
            + " slow circulations across the channel that carry tracer sideways; homogeneous turbulence has none.";
    static final String BULK_CIRCULATION = "Bulk circulation: the impeller pumps liquid round the whole tank in"
            + " large loops, carrying tracer across it faster than eddies alone; the simulation has turbulence but"
            + " no such mean flow.";
    static final String SHEAR_DISPERSION = "Mean-shear dispersion: water near the surface and mid-channel moves"
            + " faster than water near the bed and banks, which stretches a tracer cloud along the channel far"
            + " more than turbulence does; a homogeneous-turbulence model leaves this out.";
    static final String UNEVEN_TURBULENCE = "Uneven turbulence: near the impeller it is many times stronger than"
            + " the tank average the simulation used, and far from it much weaker; the slowest region sets the"
            + " blend time.";
    static final String RULES = "Modeling rules: the turbulence statistics came from rules of thumb (integral"
            + " length, rms velocity) that a different, equally defensible choice would change; check the"
            + " derivations listed with them.";

    private ForecastComparison() {
    }

    /** Compares a forecast without an interval. */
    public static Comparison compare(double forecast, HandbookEstimate estimate) {
        return compare(forecast, forecast, forecast, estimate);
    }

    /**
     * Compares a forecast with its 95% interval to a handbook estimate.
     *
     * @param forecast     the simulated value, in the estimate's unit, greater than 0
     * @param forecastLow  low end of its 95% interval, at most the forecast
     * @param forecastHigh high end of its 95% interval, at least the forecast
     * @param estimate     the handbook estimate
     */
    public static Comparison compare(double forecast, double forecastLow, double forecastHigh,
                                     HandbookEstimate estimate) {
        Checks.positive("forecast", forecast, estimate.unit());
        if (!(forecastLow <= forecast && forecast <= forecastHigh)) {
            throw new IllegalArgumentException("the forecast interval must contain the forecast " + forecast
                    + "; got [" + forecastLow + ", " + forecastHigh + "]");
        }
        double ratio = forecast / estimate.value();
        boolean agree = forecastHigh >= estimate.low() && forecastLow <= estimate.high();
        boolean larger = forecastLow > estimate.high();
        boolean faster = larger == estimate.process().largerIsFaster();
        List<String> reasons = agree ? List.of() : reasons(estimate, faster);
        String summary = summary(forecast, estimate, ratio, agree, faster);
        return new Comparison(forecast, forecastLow, forecastHigh, estimate, ratio, agree, summary, reasons);
    }

    private static List<String> reasons(HandbookEstimate estimate, boolean forecastMixesFaster) {
        List<String> reasons = new ArrayList<>(switch (estimate.process()) {
            case VERTICAL_MIXING -> forecastMixesFaster ? List.of(DEPTH_CONFINEMENT, ANISOTROPY) : List.<String>of();
            case TRANSVERSE_MIXING -> forecastMixesFaster
                    ? List.of(ANISOTROPY, DEPTH_CONFINEMENT)
                    : List.of(SECONDARY_CURRENTS);
            case LONGITUDINAL_DISPERSION -> forecastMixesFaster ? List.<String>of() : List.of(SHEAR_DISPERSION);
            case TANK_BLEND_TIME -> forecastMixesFaster
                    ? List.of(WALL_CONFINEMENT, UNEVEN_TURBULENCE)
                    : List.of(BULK_CIRCULATION, UNEVEN_TURBULENCE);
            case TURBULENT_DISPERSION -> List.<String>of();
        });
        reasons.add(RULES);
        if (!estimate.withinValidity()) {
            reasons.add("Handbook validity: the formula is used outside the conditions it was fitted for ("
                    + String.join("; ", estimate.warnings()) + ").");
        }
        return reasons;
    }

    private static String summary(double forecast, HandbookEstimate estimate, double ratio, boolean agree,
                                  boolean faster) {
        String head = String.format("The forecast %s is %.3g %s, %.2g times the handbook value %.3g %s (%s: %s,"
                        + " %s).", estimate.process().label(), forecast, estimate.unit(), ratio, estimate.value(),
                estimate.unit(), estimate.sourceText(), estimate.formula(), estimate.uncertainty().describe());
        String verdict = agree
                ? " They agree within the stated uncertainty."
                : " They disagree beyond the stated uncertainty: the forecast mixes "
                        + (faster ? "faster" : "more slowly") + " than the handbook says.";
        return head + verdict + " Neither value has been adjusted to match the other.";
    }
}
