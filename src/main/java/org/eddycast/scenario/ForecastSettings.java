package org.eddycast.scenario;

import java.util.List;

/**
 * What the forecast reports.
 *
 * @param horizon        forecast time (s); NaN to choose from the flow (the time to mixed, or the simulated time)
 * @param widthMeasure   "standard-deviation", "fwhm" or "visible-edge"
 * @param edgeFraction   the fraction of the peak that marks the visible edge (0 to 1, exclusive)
 * @param stations       where to read the concentration against time (a channel only); empty for none
 * @param detectionLimit the concentration (kg/m^3) a station's arrival and passage are judged by; NaN for none
 * @param targetPeak     the peak wanted at the first station (kg/m^3), for the dose plan; NaN for none
 * @param cap            a concentration not to exceed at a named distance, or null
 * @param units          the units of the text outputs
 * @param probes         where a tank's virtual probes stand (a tank only); empty for the usual three
 * @param horizonDistance in a channel, the forecast's reach as a distance downstream (m) instead of a time; NaN
 *                       for none
 */
public record ForecastSettings(double horizon, String widthMeasure, double edgeFraction, List<Station> stations,
                               double detectionLimit, double targetPeak, ConcentrationCap cap, DisplayUnits units,
                               List<ProbePoint> probes, double horizonDistance) {

    public ForecastSettings {
        stations = stations == null ? List.of() : List.copyOf(stations);
        units = units == null ? DisplayUnits.si() : units;
        probes = probes == null ? List.of() : List.copyOf(probes);
    }

    /** Settings with the horizon as a time (or chosen by the tool). */
    public ForecastSettings(double horizon, String widthMeasure, double edgeFraction, List<Station> stations,
                            double detectionLimit, double targetPeak, ConcentrationCap cap, DisplayUnits units,
                            List<ProbePoint> probes) {
        this(horizon, widthMeasure, edgeFraction, stations, detectionLimit, targetPeak, cap, units, probes,
                Double.NaN);
    }

    /** Settings with the usual probes. */
    public ForecastSettings(double horizon, String widthMeasure, double edgeFraction, List<Station> stations,
                            double detectionLimit, double targetPeak, ConcentrationCap cap, DisplayUnits units) {
        this(horizon, widthMeasure, edgeFraction, stations, detectionLimit, targetPeak, cap, units, List.of());
    }

    /** The settings of the width forecast alone: no stations, limits or dose plan, SI units. */
    public ForecastSettings(double horizon, String widthMeasure, double edgeFraction) {
        this(horizon, widthMeasure, edgeFraction, List.of(), Double.NaN, Double.NaN, null, DisplayUnits.si());
    }

    /** The width measure names scenario files use. */
    public static final java.util.List<String> WIDTH_MEASURES = java.util.List.of("standard-deviation", "fwhm",
            "visible-edge");

    /** Horizon chosen by the tool, full width at half maximum, edge at 10% of the peak. */
    public static ForecastSettings defaults() {
        return new ForecastSettings(Double.NaN, "fwhm", 0.1);
    }
}
