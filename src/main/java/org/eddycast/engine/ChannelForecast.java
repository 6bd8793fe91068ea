package org.eddycast.engine;

import java.util.ArrayList;
import java.util.List;
import org.eddycast.forecast.Cautions;
import org.eddycast.forecast.ChannelHandbook;
import org.eddycast.forecast.ChannelMixingDistance;
import org.eddycast.forecast.ChannelPlume;
import org.eddycast.forecast.ChannelRules;
import org.eddycast.forecast.Comparison;
import org.eddycast.forecast.Forecast;
import org.eddycast.forecast.ForecastComparison;
import org.eddycast.forecast.HandbookEstimate;
import org.eddycast.forecast.WidthMeasure;
import org.eddycast.scenario.ChannelDesign;
import org.eddycast.scenario.Release;
import org.eddycast.scenario.Scenario;
import org.eddycast.transport.ChannelStageResult;
import org.eddycast.transport.Estimate;

/**
 * The forecast of a channel from the transport stage: widths per axis from the particles' variances (across
 * and over the depth they level off at the section's own spread, never beyond it), along the channel the
 * simulated variance and, past the run, sigma_x^2(T) + 2 K_L (t - T); the peak concentration of the slug as the
 * cross-section mean at the cloud's centre, M / (A sqrt(2 pi) sigma_x), times the section's largest-to-mean
 * ratio counted from the particles; distances to mixed from the particles; the handbook estimates beside the
 * particles' coefficients.
 */
final class ChannelForecast {

    private static final int POINTS = 80;

    private ChannelForecast() {
    }

    static Forecast build(Scenario s, ResolvedFlow flow, ChannelDesign ch, ChannelStageResult t, WidthMeasure measure) {
        Release release = s.release();
        double u = ch.meanVelocity();
        double[] recordTimes = t.times();
        double end = t.duration();
        double horizon = s.forecast().horizon();
        Estimate across = t.distanceToMixedWidth();
        Estimate depth = t.distanceToMixedDepth();
        if (Double.isNaN(horizon) && !Double.isNaN(s.forecast().horizonDistance())) {
            horizon = s.forecast().horizonDistance() / u;
        }
        if (Double.isNaN(horizon)) {
            horizon = across.determined() ? Math.max(1.5 * across.value() / u, end) : end;
        }
        // the grid starts at the first record (no point nearer the release than the run resolved), runs out to
        // the furthest station and the horizon, and puts every station on a grid point
        double[] marks = ForecastBuilder.channelMarks(s.forecast(), u);
        double first = recordTimes[0];
        horizon = Math.max(horizon, ForecastBuilder.furthest(marks));
        double[] times = ForecastBuilder.grid(first, Math.max(horizon, 10 * first), marks);
        double[][] variance = t.variance();
        Estimate kl = t.longitudinalDispersion();
        double n = t.particles();
        double sampling = 1.96 * Math.sqrt(2.0 / (n - 1));
        double factor = Forecast.factor(measure, s.forecast().edgeFraction());
        double[][] width = new double[3][times.length];
        double[][] low = new double[3][times.length];
        double[][] high = new double[3][times.length];
        double[] peak = new double[times.length];
        double[] peakFactor = t.sectionPeakFactor();
        double[] extent = {Double.NaN, ch.width(), ch.section().maxDepth()};
        for (int j = 0; j < times.length; j++) {
            double time = times[j];
            for (int a = 0; a < 3; a++) {
                double v = at(recordTimes, variance[a], time);
                double vLow = v * (1 - sampling);
                double vHigh = v * (1 + sampling);
                if (a == 0 && time > end) {
                    double last = variance[0][variance[0].length - 1];
                    v = last + 2 * kl.value() * (time - end);
                    vLow = last * (1 - sampling) + 2 * kl.low() * (time - end);
                    vHigh = last * (1 + sampling) + 2 * kl.high() * (time - end);
                }
                double cap = a == 0 ? Double.POSITIVE_INFINITY : extent[a];
                width[a][j] = Math.min(cap, factor * Math.sqrt(v));
                low[a][j] = Math.min(cap, factor * Math.sqrt(Math.max(vLow, 0)));
                high[a][j] = Math.min(cap, factor * Math.sqrt(vHigh));
            }
            double sigmaX = Math.sqrt(Math.max(at(recordTimes, variance[0], Math.min(time, end))
                    + (time > end ? 2 * kl.value() * (time - end) : 0), 1e-30));
            peak[j] = release.mass() / (t.area() * Math.sqrt(2 * Math.PI) * sigmaX)
                    * at(recordTimes, peakFactor, Math.min(time, end));
        }
        double[] grid = new double[times.length];
        for (int j = 0; j < grid.length; j++) {
            grid[j] = u * times[j];
        }
        List<Forecast.MixingFigure> mixing = new ArrayList<>();
        String where = release.atBank() ? "release at the left water's edge" : "release on the centre-line";
        if (across.determined()) {
            mixing.add(new Forecast.MixingFigure("distance to mixed across the width (within 5%)", across.value(),
                    finiteOr(across.low(), across.value()), finiteOr(across.high(), across.value()), "m",
                    "particles of the transport stage, " + where + noteOf(across)));
        }
        if (depth.determined()) {
            mixing.add(new Forecast.MixingFigure("distance to mixed over the depth (within 5%)", depth.value(),
                    finiteOr(depth.low(), depth.value()), finiteOr(depth.high(), depth.value()), "m",
                    "particles of the transport stage, release at the surface" + noteOf(depth)));
        }
        double shear = ChannelRules.shearVelocity(ch).value();
        double h = ch.meanDepth();
        double w = ch.width();
        List<HandbookEstimate> estimates = ChannelHandbook.all(h, w, u, shear);
        List<Comparison> handbook = new ArrayList<>();
        Estimate kz = t.verticalDiffusivity();
        Estimate ky = t.transverseDiffusivity();
        handbook.add(ForecastComparison.compare(kz.value(), kz.low(), kz.high(), estimates.get(0)));
        handbook.add(ForecastComparison.compare(ky.value(), ky.low(), ky.high(), estimates.get(1)));
        handbook.add(ForecastComparison.compare(ky.value(), ky.low(), ky.high(), estimates.get(2)));
        handbook.add(ForecastComparison.compare(kl.value(), kl.low(), kl.high(), estimates.get(3)));
        handbook.add(ForecastComparison.compare(kl.value(), kl.low(), kl.high(), estimates.get(4)));
        double fromBank = release.atBank() ? 0 : w / 2;
        double handbookAcross = ChannelMixingDistance.acrossWidth(u, w, estimates.get(1).value(), fromBank);
        mixing.add(new Forecast.MixingFigure("distance to mixed across the width with the handbook eps_t "
                + "(straight channel)", handbookAcross, handbookAcross, handbookAcross, "m",
                "cosine series across the width with eps_t = 0.15 h u* (Fischer et al. 1979)"));
        List<String> assumptions = new ArrayList<>(flow.assumptions());
        assumptions.add(FirstOrderDecay.CONSERVATIVE);
        assumptions.add("particles carried by the mean velocity over the section and spread by the local"
                + " turbulent diffusivity (random-displacement model), reflected at the bed, the surface and the"
                + " banks");
        assumptions.add("section: " + ch.section().kind() + ", surface width " + ForecastBuilder.fmt(w)
                + " m, greatest depth " + ForecastBuilder.fmt(ch.section().maxDepth()) + " m, area "
                + ForecastBuilder.fmt(ch.section().area()) + " m^2");
        assumptions.add("widths across and over the depth come from the particles and stop at the section's"
                + " width and depth: a cloud mixed across fills the section");
        assumptions.add("distance downstream x = U t with U = " + ForecastBuilder.fmt(u) + " m/s, the section mean");
        assumptions.add("peak concentration: the cross-section mean at the cloud's centre, M / (A sqrt(2 pi)"
                + " sigma_x), times the largest-to-mean ratio over " + "the section's cells counted from the"
                + " particles; along the channel beyond the run, sigma_x^2 grows as 2 K_L t");
        double[] plumePeak = new double[0];
        if (!Double.isNaN(release.rate())) {
            ChannelPlume plume = new ChannelPlume(release.rate(), u, ch.section().maxDepth(), w, ky.value(),
                    kz.value(), fromBank, ch.section().maxDepth());
            plumePeak = new double[grid.length];
            for (int j = 0; j < grid.length; j++) {
                plumePeak[j] = plume.peakConcentration(grid[j]);
            }
            assumptions.add("continuous release at the surface: a steady Gaussian plume with the section-mean"
                    + " diffusivities of the transport stage, bed, surface and banks reflecting (method of images)");
        }
        return new Forecast(true, grid, times, measure, s.forecast().edgeFraction(), width, low, high, end, peak,
                mixing, handbook, assumptions, Cautions.ALL, plumePeak);
    }

    private static double finiteOr(double v, double fallback) {
        return Double.isFinite(v) ? v : fallback;
    }

    private static String noteOf(Estimate e) {
        return e.note().isEmpty() ? "" : "; " + e.note();
    }

    /** Linear interpolation of a record curve at time t (held at the ends). */
    static double at(double[] times, double[] values, double t) {
        if (t <= times[0]) {
            return values[0];
        }
        for (int k = 1; k < times.length; k++) {
            if (t <= times[k]) {
                double f = (t - times[k - 1]) / (times[k] - times[k - 1]);
                return values[k - 1] + f * (values[k] - values[k - 1]);
            }
        }
        return values[values.length - 1];
    }
}
