package org.eddycast.forecast;

import java.util.List;

/**
 * A forecast in physical units: the width of a released cloud per axis over time (or over distance
 * downstream), its peak concentration, the times or distances to mixed, the handbook estimates side by side,
 * and the assumptions and cautions that go with it.
 *
 * @param inDistance     true when the grid is distance downstream (m), false when it is time (s)
 * @param grid           the forecast grid (s or m)
 * @param times          the time of each grid point (s)
 * @param measure        the width measure every width uses
 * @param edgeFraction   the fraction of the peak at the visible edge (used by the visible-edge measure)
 * @param width          width per axis at each grid point (m), [axis][point]
 * @param widthLow       low end of the 95% band (m)
 * @param widthHigh      high end of the 95% band (m)
 * @param simulatedUntil the time up to which widths come from the simulated curve (s); beyond, from 2 D t
 * @param peakConcentration peak concentration of the instantaneous release at each grid point (kg/m^3)
 * @param mixing         times or distances to mixed
 * @param handbook       simulation against handbook, one comparison each
 * @param assumptions    what the forecast assumed, generated from what was used
 * @param cautions       the cautions
 * @param plumeConcentration for a continuous release in a channel, the largest concentration in the
 *                       cross-section at each grid distance (kg/m^3; Gaussian plume with walls by images);
 *                       empty when there is no continuous release
 */
public record Forecast(boolean inDistance, double[] grid, double[] times, WidthMeasure measure, double edgeFraction,
                       double[][] width, double[][] widthLow, double[][] widthHigh, double simulatedUntil,
                       double[] peakConcentration, List<MixingFigure> mixing, List<Comparison> handbook,
                       List<String> assumptions, List<String> cautions, double[] plumeConcentration) {

    /**
     * A time or distance to mixed.
     *
     * @param name   what it is, for example "blend time (every point within 5% of the final value)"
     * @param value  the value from the simulated diffusivities
     * @param low    with the diffusivities at the favourable end of their intervals
     * @param high   with the diffusivities at the unfavourable end
     * @param unit   "s" or "m"
     * @param method how it was computed
     */
    public record MixingFigure(String name, double value, double low, double high, String unit, String method) {
    }

    public Forecast {
        grid = grid.clone();
        times = times.clone();
        width = deep(width);
        widthLow = deep(widthLow);
        widthHigh = deep(widthHigh);
        peakConcentration = peakConcentration.clone();
        mixing = List.copyOf(mixing);
        handbook = List.copyOf(handbook);
        assumptions = List.copyOf(assumptions);
        cautions = List.copyOf(cautions);
        plumeConcentration = plumeConcentration.clone();
    }

    @Override
    public double[] plumeConcentration() {
        return plumeConcentration.clone();
    }

    private static double[][] deep(double[][] a) {
        double[][] c = new double[a.length][];
        for (int i = 0; i < a.length; i++) {
            c[i] = a[i].clone();
        }
        return c;
    }

    @Override
    public double[] grid() {
        return grid.clone();
    }

    @Override
    public double[] times() {
        return times.clone();
    }

    @Override
    public double[][] width() {
        return deep(width);
    }

    @Override
    public double[][] widthLow() {
        return deep(widthLow);
    }

    @Override
    public double[][] widthHigh() {
        return deep(widthHigh);
    }

    @Override
    public double[] peakConcentration() {
        return peakConcentration.clone();
    }

    /** The factor from standard deviation to the chosen width. */
    public double widthFactor() {
        return factor(measure, edgeFraction);
    }

    /** The factor from standard deviation to a width of the given measure. */
    public static double factor(WidthMeasure measure, double edgeFraction) {
        return switch (measure) {
            case STANDARD_DEVIATION -> 1.0;
            case FULL_WIDTH_AT_HALF_MAXIMUM -> 2 * Math.sqrt(2 * Math.log(2));
            case VISIBLE_EDGE -> 2 * Math.sqrt(2 * Math.log(1 / edgeFraction));
        };
    }
}
