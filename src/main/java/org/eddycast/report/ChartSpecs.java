package org.eddycast.report;

import java.util.ArrayList;
import java.util.List;
import org.eddycast.measure.Autocorrelation;
import org.eddycast.measure.InertialRangeFit;
import org.eddycast.measure.LogBinnedSpectrum;
import org.eddycast.measure.RecordAnalysis;
import org.eddycast.stats.AxisEstimate;

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
            curves.add(ChartSpec.Curve.line("running value along " + AXES[a], mid, d, false));
        }
        if (estimates != null && t.length > 1) {
            for (AxisEstimate e : estimates) {
                double[] x = {e.diffusivity().windowStart(), e.diffusivity().windowEnd()};
                double v = e.diffusivity().value();
                curves.add(new ChartSpec.Curve("estimate " + e.axisName() + " (95% interval)", x,
                        new double[] {v, v}, new double[] {e.diffusivity().low(), e.diffusivity().low()},
                        new double[] {e.diffusivity().high(), e.diffusivity().high()}, true));
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
}
