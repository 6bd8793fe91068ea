package org.eddycast.measure;

/**
 * A straight line fitted to a spectrum in log-log coordinates over a frequency band, and the level of the
 * Kolmogorov -5/3 line through the same band.
 *
 * @param lowFrequency        lowest spectral frequency in the band (Hz)
 * @param highFrequency       highest spectral frequency in the band (Hz)
 * @param slope               fitted slope of log E against log f
 * @param slopeStandardError  its standard error from the fit's residuals (indicative: neighbouring Welch
 *                            estimates are correlated)
 * @param intercept           fitted log10 E at f = 1 Hz
 * @param compensatedLevel    mean of E(f) f^(5/3) over the band ((m/s)^2 Hz^(2/3)): the level of the -5/3 line
 * @param points              spectral estimates in the band
 * @param automatic           true when the band was found by {@link InertialRangeFitter}'s rule, false when given
 * @param inertialRangeFound  false when the automatic rule found no stretch with a slope near -5/3 and fell back
 *                            to the whole candidate range
 */
public record InertialRangeFit(double lowFrequency, double highFrequency, double slope, double slopeStandardError,
                               double intercept, double compensatedLevel, int points, boolean automatic,
                               boolean inertialRangeFound) {

    /** The fitted line at frequency f (Hz). */
    public double lineAt(double f) {
        return Math.pow(10, intercept + slope * Math.log10(f));
    }

    /** The Kolmogorov line (slope -5/3 through the band's compensated level) at frequency f (Hz). */
    public double kolmogorovLineAt(double f) {
        return compensatedLevel * Math.pow(f, -5.0 / 3.0);
    }

    /** The band in words. */
    public String describe() {
        return String.format(java.util.Locale.ROOT, "%.4g to %.4g Hz (%d spectral estimates, %s)", lowFrequency,
                highFrequency, points, automatic ? (inertialRangeFound ? "found automatically"
                        : "no -5/3 stretch found, whole candidate range") : "given by the user");
    }
}
