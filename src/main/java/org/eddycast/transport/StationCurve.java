package org.eddycast.transport;

/**
 * The concentration against time at one station of a channel, with its 95% band over independent blocks, in SI
 * units.
 *
 * @param distance      the station's distance downstream of the release (m)
 * @param across        its position across from the left water's edge (m), NaN for the cross-section mean
 * @param times         record times (s)
 * @param concentration the concentration at each record (kg/m^3)
 * @param low           lower end of its 95% interval (kg/m^3, at least 0)
 * @param high          upper end of its 95% interval (kg/m^3)
 * @param binWidth      the along-flow bin width each record's count was taken over (m)
 * @param oneParticle   the concentration a single particle in the bin stands for at each record (kg/m^3): the
 *                      smallest value the curve resolves above zero
 */
public record StationCurve(double distance, double across, double[] times, double[] concentration, double[] low,
                           double[] high, double[] binWidth, double[] oneParticle) {

    public StationCurve {
        times = times.clone();
        concentration = concentration.clone();
        low = low.clone();
        high = high.clone();
        binWidth = binWidth.clone();
        oneParticle = oneParticle.clone();
    }

    @Override
    public double[] oneParticle() {
        return oneParticle.clone();
    }

    @Override
    public double[] times() {
        return times.clone();
    }

    @Override
    public double[] concentration() {
        return concentration.clone();
    }

    @Override
    public double[] low() {
        return low.clone();
    }

    @Override
    public double[] high() {
        return high.clone();
    }

    @Override
    public double[] binWidth() {
        return binWidth.clone();
    }

    /** True when the curve is the cross-section mean (no position across given). */
    public boolean sectionMean() {
        return Double.isNaN(across);
    }

    /** The same curve for a release scaled by a positive factor: concentrations are linear in the mass. */
    public StationCurve scaled(double factor) {
        return multiplied(j -> factor);
    }

    /**
     * The same curve for a tracer lost at first order with rate {@code k} (1/s): each value times exp(-k t) at
     * its record time t, the solution of dc/dt = -k c. Its peak is read again from the new values.
     */
    public StationCurve decayed(double k) {
        return multiplied(j -> Math.exp(-k * times[j]));
    }

    /** Every value (curve, band, one-particle resolution) at record j times {@code factor(j)}. */
    private StationCurve multiplied(java.util.function.IntToDoubleFunction factor) {
        double[] c = concentration.clone();
        double[] l = low.clone();
        double[] h = high.clone();
        double[] one = oneParticle.clone();
        for (int j = 0; j < c.length; j++) {
            double f = factor.applyAsDouble(j);
            c[j] *= f;
            l[j] *= f;
            h[j] *= f;
            one[j] *= f;
        }
        return new StationCurve(distance, across, times, c, l, h, binWidth, one);
    }

    /** The same curve with every value held at most at {@code cap} (kg/m^3). */
    public StationCurve capped(double cap) {
        double[] c = concentration.clone();
        double[] l = low.clone();
        double[] h = high.clone();
        for (int j = 0; j < c.length; j++) {
            c[j] = Math.min(c[j], cap);
            l[j] = Math.min(l[j], cap);
            h[j] = Math.min(h[j], cap);
        }
        return new StationCurve(distance, across, times, c, l, h, binWidth, oneParticle);
    }

    /** The largest concentration on the curve (kg/m^3). */
    public double peak() {
        double p = 0;
        for (double c : concentration) {
            p = Math.max(p, c);
        }
        return p;
    }
}
