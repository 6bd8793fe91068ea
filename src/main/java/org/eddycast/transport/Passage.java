package org.eddycast.transport;

/**
 * What a station's curve says about the cloud's passage, in SI units. Crossings of the detection threshold are
 * placed by linear interpolation between record times; without a threshold (NaN) the arrival, the time above
 * it and the time it falls back are NaN. A curve that never rises above the threshold has NaN times too, and a
 * cloud still above it at the end of the run has a NaN fall-back time and a time above it counted to the end
 * (a lower bound).
 *
 * @param distance         the station's distance downstream (m)
 * @param across           its position across (m), NaN for the cross-section mean
 * @param threshold        the detection threshold (kg/m^3), NaN for none
 * @param arrival          first time the curve rises above the threshold (s)
 * @param peakTime         time of the largest value (s)
 * @param peak             the largest value (kg/m^3)
 * @param peakLow          lower end of its 95% interval at that time (kg/m^3)
 * @param peakHigh         upper end (kg/m^3)
 * @param aboveThresholdFor time from the arrival to the fall back below the threshold (s)
 * @param fallsBack        last time the curve falls back below the threshold (s)
 * @param stillAboveAtEnd  true when the curve is still above the threshold at the last record
 */
public record Passage(double distance, double across, double threshold, double arrival, double peakTime,
                      double peak, double peakLow, double peakHigh, double aboveThresholdFor, double fallsBack,
                      boolean stillAboveAtEnd) {

    /** The passage read from a curve. */
    public static Passage of(StationCurve curve, double threshold) {
        double[] t = curve.times();
        double[] c = curve.concentration();
        int top = 0;
        for (int j = 1; j < c.length; j++) {
            if (c[j] > c[top]) {
                top = j;
            }
        }
        double arrival = Double.NaN;
        double fallsBack = Double.NaN;
        boolean stillAbove = false;
        if (!Double.isNaN(threshold) && c[top] > threshold) {
            for (int j = 0; j < c.length; j++) {
                if (c[j] > threshold) {
                    arrival = j == 0 ? t[0] : crossing(t[j - 1], c[j - 1], t[j], c[j], threshold);
                    break;
                }
            }
            int last = c.length - 1;
            while (c[last] <= threshold) {
                last--;
            }
            if (last == c.length - 1) {
                stillAbove = true;
            } else {
                fallsBack = crossing(t[last], c[last], t[last + 1], c[last + 1], threshold);
            }
        }
        double end = stillAbove ? t[t.length - 1] : fallsBack;
        double above = Double.isNaN(arrival) ? Double.NaN : end - arrival;
        return new Passage(curve.distance(), curve.across(), threshold, arrival, t[top], c[top], curve.low()[top],
                curve.high()[top], above, fallsBack, stillAbove);
    }

    private static double crossing(double t0, double c0, double t1, double c1, double level) {
        if (c1 == c0) {
            return t1;
        }
        return t0 + (level - c0) / (c1 - c0) * (t1 - t0);
    }
}
