package org.eddycast.report;

import java.util.ArrayList;
import java.util.List;
import java.util.function.DoubleUnaryOperator;
import org.eddycast.engine.Answers;
import org.eddycast.engine.DisplayFormat;
import org.eddycast.forecast.Comparison;
import org.eddycast.forecast.Forecast;
import org.eddycast.forecast.WidthMeasure;
import org.eddycast.measure.Autocorrelation;
import org.eddycast.measure.InertialRangeFit;
import org.eddycast.measure.LogBinnedSpectrum;
import org.eddycast.measure.RecordAnalysis;
import org.eddycast.scenario.DisplayUnits;
import org.eddycast.stats.AxisEstimate;
import org.eddycast.transport.StationCurve;

/** Builds the chart specs the panel and the summary sheet show. Pure data; no drawing. */
public final class ChartSpecs {

    /** Two-sided 95% normal quantile, for the pointwise band of a mean over many independent blocks. */
    static final double Z95 = 1.959964;

    private static final String[] AXES = {"x", "y", "z"};

    private ChartSpecs() {
    }

    /** The cloud's variance per axis over time, with a pointwise 95% band (mean +- 1.96 standard errors). */
    public static ChartSpec spread(SpreadCurves c, String title) {
        List<ChartSpec.Curve> curves = new ArrayList<>();
        double[] t = c.times();
        for (int a = 0; a < c.axes(); a++) {
            double[] m = c.meanSquareDisplacement(a);
            double[] e = c.standardError(a);
            double[] low = new double[m.length];
            double[] high = new double[m.length];
            for (int j = 0; j < m.length; j++) {
                double half = Double.isNaN(e[j]) ? 0 : Z95 * e[j];
                low[j] = m[j] - half;
                high[j] = m[j] + half;
            }
            curves.add(new ChartSpec.Curve("variance along " + AXES[a], t, m, low, high, false));
        }
        return new ChartSpec(title, "time (s)", "mean-square displacement (m\u00b2)", false, false, curves);
    }

    /**
     * The running diffusivity: half the slope of the mean-square displacement between neighbouring record times,
     * per axis, with the final late-window estimates as dashed lines when given. It settles to a plateau once the
     * time exceeds a few Lagrangian time scales (Taylor 1921).
     */
    public static ChartSpec settling(SpreadCurves c, List<AxisEstimate> estimates) {
        List<ChartSpec.Curve> curves = new ArrayList<>();
        double[] t = c.times();
        for (int a = 0; a < c.axes(); a++) {
            double[] m = c.meanSquareDisplacement(a);
            int n = Math.max(0, t.length - 1);
            double[] mid = new double[n];
            double[] d = new double[n];
            for (int j = 0; j < n; j++) {
                mid[j] = 0.5 * (t[j] + t[j + 1]);
                d[j] = 0.5 * (m[j + 1] - m[j]) / (t[j + 1] - t[j]);
            }
            // each axis keeps one colour: its running value and its estimate agree
            curves.add(new ChartSpec.Curve("running value along " + AXES[a], mid, d, null, null, false, a));
        }
        if (estimates != null && t.length > 1) {
            for (int a = 0; a < estimates.size(); a++) {
                AxisEstimate e = estimates.get(a);
                double[] x = {e.diffusivity().windowStart(), e.diffusivity().windowEnd()};
                double v = e.diffusivity().value();
                curves.add(new ChartSpec.Curve("estimate " + e.axisName() + " (95% interval)", x,
                        new double[] {v, v}, new double[] {e.diffusivity().low(), e.diffusivity().low()},
                        new double[] {e.diffusivity().high(), e.diffusivity().high()}, true, a));
            }
        }
        return new ChartSpec("Running eddy diffusivity", "time (s)", "eddy diffusivity (m\u00b2/s)", false, false,
                curves);
    }

    /** The record's spectrum (log-binned) with the fitted inertial range, when there is one. */
    public static ChartSpec spectrum(RecordAnalysis a) {
        LogBinnedSpectrum b = a.binnedSpectrum();
        List<ChartSpec.Curve> curves = new ArrayList<>();
        curves.add(ChartSpec.Curve.line("spectrum of " + a.streamwiseSignal(), b.centres(), b.densities(), false));
        a.fit().ifPresent(f -> curves.add(fitLine(f)));
        return new ChartSpec("Velocity spectrum of the record", "frequency (Hz)", "spectral density (m\u00b2/s)",
                true, true, curves);
    }

    private static ChartSpec.Curve fitLine(InertialRangeFit f) {
        int n = 20;
        double[] x = new double[n];
        double[] y = new double[n];
        double r = Math.log(f.highFrequency() / f.lowFrequency());
        for (int j = 0; j < n; j++) {
            x[j] = f.lowFrequency() * Math.exp(r * j / (n - 1));
            y[j] = f.lineAt(x[j]);
        }
        return ChartSpec.Curve.line(String.format(java.util.Locale.ROOT, "fitted inertial range, slope %.2f",
                f.slope()), x, y, true);
    }

    /** The record's autocorrelation coefficient against lag. */
    public static ChartSpec autocorrelation(RecordAnalysis a) {
        Autocorrelation r = a.autocorrelation();
        return new ChartSpec("Autocorrelation of the record", "lag (s)", "autocorrelation coefficient (-)", false,
                false, List.of(ChartSpec.Curve.line("streamwise velocity", r.lagTimes(), r.values(), false)));
    }

    /** Palette index of the marker for the end of the simulated part. */
    static final int MARKER_COLOUR = 5;

    /** The horizontal axis label of a forecast chart, with its unit. */
    public static String gridLabel(Forecast f) {
        return gridLabel(f, DisplayUnits.si());
    }

    /** The horizontal axis label of a forecast chart in the display units. */
    public static String gridLabel(Forecast f, DisplayUnits u) {
        return f.inDistance() ? "distance downstream (" + u.distance() + ")" : "time after release (" + u.time() + ")";
    }

    /** The plume width chart with its grid in the display units (widths stay in metres). */
    public static ChartSpec width(Forecast f, String title, DisplayUnits u) {
        return converted(width(f, title), gridUnit(f, u), gridLabel(f, u), v -> v, null);
    }

    /** The peak concentration chart in the display units. */
    public static ChartSpec peak(Forecast f, DisplayUnits u) {
        return converted(peak(f), gridUnit(f, u), gridLabel(f, u), u::concentration,
                "peak concentration (" + SummaryContent.concentrationLabel(u) + ")");
    }

    private static DoubleUnaryOperator gridUnit(Forecast f, DisplayUnits u) {
        return f.inDistance() ? u::distance : u::time;
    }

    /** A chart with its x values (and y values, band included) converted, and its labels replaced (null keeps). */
    static ChartSpec converted(ChartSpec c, DoubleUnaryOperator x, String xLabel, DoubleUnaryOperator y,
                               String yLabel) {
        List<ChartSpec.Curve> curves = new ArrayList<>();
        for (ChartSpec.Curve k : c.curves()) {
            // every curve, the end-of-simulation marker included, is in the plot's units
            curves.add(new ChartSpec.Curve(k.name(), map(k.x(), x), map(k.y(), y), map(k.low(), y),
                    map(k.high(), y), k.dashed(), k.colour()));
        }
        return new ChartSpec(c.title(), xLabel == null ? c.xLabel() : xLabel, yLabel == null ? c.yLabel() : yLabel,
                c.logX(), c.logY(), curves);
    }

    private static double[] slice(double[] v, int first, int last) {
        return java.util.Arrays.copyOfRange(v, first, last + 1);
    }

    private static double[] map(double[] v, DoubleUnaryOperator f) {
        if (v == null) {
            return null;
        }
        double[] out = new double[v.length];
        for (int j = 0; j < v.length; j++) {
            out[j] = f.applyAsDouble(v[j]);
        }
        return out;
    }

    /**
     * The concentration against time at each station for the scenario's release, with its 95% band, in the display
     * units; the detection limit, when given, as a dashed line. Linear axes: a passage is read as a hump.
     */
    public static ChartSpec stations(Answers a) {
        DisplayUnits u = a.units();
        // the time axis spans the passages (every value above a thousandth of its station's peak), with a quarter
        // of that span either side: a run lasts until its furthest place is passed, which can dwarf a near passage
        double from = Double.POSITIVE_INFINITY;
        double to = 0;
        for (Answers.StationAnswer s : a.stations()) {
            double[] t = s.curve().times();
            double[] c = s.curve().concentration();
            double floor = 1e-3 * s.curve().peak();
            for (int j = 0; j < t.length; j++) {
                if (c[j] > floor) {
                    from = Math.min(from, t[j]);
                    to = Math.max(to, t[j]);
                }
            }
        }
        double margin = 0.25 * (to - from);
        double start = Math.max(0, from - margin);
        double end = to + margin;
        List<ChartSpec.Curve> curves = new ArrayList<>();
        int colour = 0;
        DisplayFormat f = new DisplayFormat(u);
        for (Answers.StationAnswer s : a.stations()) {
            StationCurve c = s.curve();
            double[] t = c.times();
            int first = 0;
            while (first < t.length - 1 && t[first + 1] < start) {
                first++;
            }
            int last = t.length - 1;
            while (last > first && t[last - 1] > end) {
                last--;
            }
            String where = f.distance(c.distance()) + (c.sectionMean() ? "" : ", " + f.distance(c.across())
                    + " across");
            curves.add(new ChartSpec.Curve("at " + where + " (95% band)", map(slice(t, first, last), u::time),
                    map(slice(c.concentration(), first, last), u::concentration),
                    map(slice(c.low(), first, last), u::concentration),
                    map(slice(c.high(), first, last), u::concentration), false, colour++));
        }
        double limit = a.stations().isEmpty() ? Double.NaN : a.stations().get(0).passage().threshold();
        if (!Double.isNaN(limit) && end > start) {
            double y = u.concentration(limit);
            curves.add(new ChartSpec.Curve("detection limit", new double[] {u.time(start), u.time(end)},
                    new double[] {y, y}, null, null, true, MARKER_COLOUR));
        }
        return new ChartSpec("Concentration at the stations", "time after release (" + u.time() + ")",
                "concentration at the station (" + SummaryContent.concentrationLabel(u) + ")", false, false, curves);
    }

    /** The width measure's name, for labels: the visible edge says at which fraction of the peak it lies. */
    public static String measureName(Forecast f) {
        if (f.measure() == WidthMeasure.VISIBLE_EDGE) {
            return String.format(java.util.Locale.ROOT, "visible-edge width at %s%% of the peak",
                    SummaryContent.number(100 * f.edgeFraction()));
        }
        return f.measure().label();
    }

    /**
     * Plume width per axis over time or distance with its 95% band, a dashed vertical marker where the simulated
     * curve ends (beyond it widths follow sigma^2(T) + 2 D (t - T)), and dashed handbook curves where a handbook
     * diffusivity applies: width = factor sqrt(2 eps t) (Fischer et al. 1979, Mixing in Inland and Coastal
     * Waters, ch. 2: a constant diffusivity spreads a cloud as sigma^2 = 2 eps t). A longitudinal dispersion
     * coefficient holds only once the tracer is mixed across the section, so its curve starts at the first
     * mixing figure when that lies on the grid, and is left out otherwise. Both axes logarithmic.
     */
    public static ChartSpec width(Forecast f, String title) {
        double[] grid = f.grid();
        double[] times = f.times();
        double[][] w = f.width();
        double[][] lo = f.widthLow();
        double[][] hi = f.widthHigh();
        List<ChartSpec.Curve> curves = new ArrayList<>();
        double top = 0;
        double bottom = Double.POSITIVE_INFINITY;
        for (int a = 0; a < w.length; a++) {
            double[] low = new double[grid.length];
            for (int j = 0; j < grid.length; j++) {
                // a log axis cannot show zero: the band's floor is a thousandth of the width
                low[j] = Math.max(lo[a][j], 1e-3 * w[a][j]);
                top = Math.max(top, hi[a][j]);
                bottom = Math.min(bottom, w[a][j]);
            }
            curves.add(new ChartSpec.Curve("width along " + AXES[a] + " (95% band)", grid, w[a], low, hi[a], false,
                    a));
        }
        double factor = f.widthFactor();
        double mixedFrom = f.mixing().isEmpty() ? Double.NaN : f.mixing().get(0).value();
        for (Comparison c : f.handbook()) {
            int axis = handbookAxis(c);
            if (axis < 0) {
                continue;
            }
            double eps = c.estimate().value();
            boolean afterMixing = c.estimate().process() == org.eddycast.forecast.MixingProcess.LONGITUDINAL_DISPERSION;
            List<double[]> points = new ArrayList<>();
            for (int j = 0; j < grid.length; j++) {
                if (afterMixing && !(grid[j] >= mixedFrom)) {
                    continue;
                }
                points.add(new double[] {grid[j], factor * Math.sqrt(2 * eps * times[j])});
            }
            // a curve over the last grid point or two is a pair of dashes in a corner: the handbook table
            // compares that estimate instead
            if (points.size() < 4) {
                continue;
            }
            double[] x = points.stream().mapToDouble(p -> p[0]).toArray();
            double[] y = points.stream().mapToDouble(p -> p[1]).toArray();
            curves.add(new ChartSpec.Curve("handbook along " + AXES[axis] + ": " + c.estimate().formula()
                    + (afterMixing ? ", once mixed across" : ""), x, y, null, null, true, axis));
        }
        endMarker(f, bottom, top).ifPresent(curves::add);
        return new ChartSpec(title + " (" + measureName(f) + ")", gridLabel(f),
                "plume width, " + SummaryContent.shortMeasure(f) + " (m)", true, true, curves);
    }

    /** The peak concentration of the instantaneous release over time or distance, with the simulation's end. */
    public static ChartSpec peak(Forecast f) {
        double[] p = f.peakConcentration();
        double top = 0;
        double bottom = Double.POSITIVE_INFINITY;
        for (double v : p) {
            if (v > 0 && Double.isFinite(v)) {
                top = Math.max(top, v);
                bottom = Math.min(bottom, v);
            }
        }
        List<ChartSpec.Curve> curves = new ArrayList<>();
        curves.add(new ChartSpec.Curve("peak concentration of the released mass", f.grid(), p, null, null, false,
                0));
        if (top > 0) {
            endMarker(f, bottom, top).ifPresent(curves::add);
        }
        return new ChartSpec("Peak concentration", gridLabel(f), "peak concentration (kg/m\u00b3)", true, true,
                curves);
    }

    /**
     * One width curve per option, overlaid: across the channel (y) when every option is a channel, along x
     * otherwise; over distance when every option's grid is a distance, over time otherwise.
     */
    public static ChartSpec optionWidths(List<String> names, List<Forecast> forecasts) {
        boolean allDistance = forecasts.stream().allMatch(Forecast::inDistance);
        int axis = allDistance ? 1 : 0;
        List<ChartSpec.Curve> curves = new ArrayList<>();
        for (int o = 0; o < forecasts.size(); o++) {
            Forecast f = forecasts.get(o);
            double[] x = allDistance ? f.grid() : f.times();
            double[] w = f.width()[axis];
            double[] lo = f.widthLow()[axis];
            for (int j = 0; j < lo.length; j++) {
                lo[j] = Math.max(lo[j], 1e-3 * w[j]);
            }
            curves.add(new ChartSpec.Curve(names.get(o) + " (" + SummaryContent.shortMeasure(f) + ")", x, w, lo,
                    f.widthHigh()[axis], false, o));
        }
        return new ChartSpec("Options compared: plume width along " + AXES[axis] + " (95% bands)",
                allDistance ? "distance downstream (m)" : "time after release (s)", "plume width (m)", true, true,
                curves);
    }

    /** The axis a handbook diffusivity describes, or -1 when it is not a diffusivity along one axis. */
    static int handbookAxis(Comparison c) {
        if (!"m^2/s".equals(c.estimate().unit())) {
            return -1;
        }
        return switch (c.estimate().process()) {
            case LONGITUDINAL_DISPERSION -> 0;
            case TRANSVERSE_MIXING -> 1;
            case VERTICAL_MIXING -> 2;
            default -> -1;
        };
    }

    /** The marker where the simulated part ends; none when it ends outside the grid. */
    private static java.util.Optional<ChartSpec.Curve> endMarker(Forecast f, double bottom, double top) {
        double[] grid = f.grid();
        double[] times = f.times();
        double end = f.inDistance() ? f.simulatedUntil() * grid[grid.length - 1] / times[times.length - 1]
                : f.simulatedUntil();
        if (!(end > grid[0] && end < grid[grid.length - 1])) {
            return java.util.Optional.empty();
        }
        return java.util.Optional.of(new ChartSpec.Curve("end of the simulated part (beyond: 2 D t)", new double[] {end, end},
                new double[] {bottom, top}, null, null, true, MARKER_COLOUR));
    }
}
