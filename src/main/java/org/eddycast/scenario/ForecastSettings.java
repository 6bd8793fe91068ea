package org.eddycast.scenario;

/**
 * What the forecast reports.
 *
 * @param horizon      forecast time (s); NaN to choose from the flow (the time to mixed, or the simulated time)
 * @param widthMeasure "standard-deviation", "fwhm" or "visible-edge"
 * @param edgeFraction the fraction of the peak that marks the visible edge (0 to 1, exclusive)
 */
public record ForecastSettings(double horizon, String widthMeasure, double edgeFraction) {

    /** The width measure names scenario files use. */
    public static final java.util.List<String> WIDTH_MEASURES = java.util.List.of("standard-deviation", "fwhm",
            "visible-edge");

    /** Horizon chosen by the tool, full width at half maximum, edge at 10% of the peak. */
    public static ForecastSettings defaults() {
        return new ForecastSettings(Double.NaN, "fwhm", 0.1);
    }
}
