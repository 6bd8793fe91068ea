package org.eddycast.forecast;

import java.util.List;

/**
 * The outcome of setting a forecast beside a handbook estimate. Both values are shown as they came: neither
 * is adjusted toward the other.
 *
 * @param forecast       the value from the simulation (same unit as the estimate)
 * @param forecastLow    low end of its 95% interval
 * @param forecastHigh   high end of its 95% interval
 * @param estimate       the handbook estimate
 * @param ratio          forecast / estimate value
 * @param agree          true when the forecast's interval overlaps the estimate's uncertainty band
 * @param summary        one paragraph in plain words
 * @param likelyReasons  when they disagree, the likely reasons in plain words; empty when they agree
 */
public record Comparison(double forecast, double forecastLow, double forecastHigh, HandbookEstimate estimate,
                         double ratio, boolean agree, String summary, List<String> likelyReasons) {

    public Comparison {
        likelyReasons = List.copyOf(likelyReasons);
    }
}
