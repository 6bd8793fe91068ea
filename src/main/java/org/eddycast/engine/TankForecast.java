package org.eddycast.engine;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.eddycast.forecast.Cautions;
import org.eddycast.forecast.Comparison;
import org.eddycast.forecast.Forecast;
import org.eddycast.forecast.ForecastComparison;
import org.eddycast.forecast.HandbookEstimate;
import org.eddycast.forecast.TankBlendCorrelation;
import org.eddycast.forecast.TankFlowRules;
import org.eddycast.forecast.WidthMeasure;
import org.eddycast.scenario.Scenario;
import org.eddycast.scenario.TankDesign;
import org.eddycast.transport.Estimate;
import org.eddycast.transport.TankStageResult;

/**
 * The forecast of a stirred tank from the transport stage: the cloud's widths from the particles (they level
 * off at the tank's own spread), the largest concentration as the final value M / V times the largest-to-mean
 * ratio over the cells, the blend times over the cells and at the probes, and Grenville's correlation beside
 * the 95% blend time.
 */
final class TankForecast {

    /** Residence time over blend time above which a continuous tank mixes near-ideally (Roussinova & Kresta 2008). */
    static final double RESIDENCE_OVER_BLEND = 10;

    private TankForecast() {
    }

    static Forecast build(Scenario s, ResolvedFlow flow, TankDesign tank, TankStageResult t) {
        double[] recordTimes = t.times();
        double end = recordTimes[recordTimes.length - 1];
        Estimate p95 = t.blendTime95();
        double horizon = s.forecast().horizon();
        if (Double.isNaN(horizon)) {
            horizon = p95.determined() ? Math.min(end, 2 * p95.value()) : end;
        }
        double[] times = ForecastBuilder.grid(recordTimes[0], Math.max(horizon, 10 * recordTimes[0]));
        WidthMeasure measure = ForecastBuilder.measure(s.forecast().widthMeasure());
        double factor = Forecast.factor(measure, s.forecast().edgeFraction());
        double[][] variance = t.variance();
        double sampling = 1.96 * Math.sqrt(2.0 / (t.particles() - 1));
        double[][] width = new double[3][times.length];
        double[][] low = new double[3][times.length];
        double[][] high = new double[3][times.length];
        double[] peak = new double[times.length];
        double finalConcentration = s.release().mass() / tank.volume();
        for (int j = 0; j < times.length; j++) {
            double time = Math.min(times[j], end);
            for (int a = 0; a < 3; a++) {
                double v = ChannelForecast.at(recordTimes, variance[a], time);
                width[a][j] = factor * Math.sqrt(v);
                low[a][j] = factor * Math.sqrt(v * (1 - sampling));
                high[a][j] = factor * Math.sqrt(v * (1 + sampling));
            }
            peak[j] = finalConcentration * ChannelForecast.at(recordTimes, t.peakFactor(), time);
        }
        List<Forecast.MixingFigure> mixing = new ArrayList<>();
        String[] labels = {"90%", "95%", "99%"};
        for (int i = 0; i < labels.length; i++) {
            Estimate e = t.blendTimes().get(i);
            if (e.determined()) {
                int level = (int) Math.round(100 * (1 - TankStageResult.LEVELS[i]));
                mixing.add(new Forecast.MixingFigure("blend time " + labels[i] + " (every cell within " + level
                        + "% of the final value)", e.value(), finite(e.low(), e.value()), finite(e.high(), e.value()),
                        "s", "particles of the transport stage over equal-volume cells" + note(e)));
            }
        }
        for (TankStageResult.Probe probe : t.probes()) {
            Estimate e = probe.blendTimes().get(1);
            if (e.determined()) {
                mixing.add(new Forecast.MixingFigure("blend time 95% at the probe " + probe.name(), e.value(),
                        finite(e.low(), e.value()), finite(e.high(), e.value()), "s",
                        String.format(Locale.ROOT, "reading of a sphere of radius %.2g m", probe.radius()) + note(e)));
            }
        }
        List<String> residence = new ArrayList<>();
        if (tank.throughflow() != null) {
            double tau = tank.volume() / tank.throughflow();
            mixing.add(new Forecast.MixingFigure("mean residence time V / Q_in", tau, tau, tau, "s",
                    "liquid volume over the throughflow"));
            if (p95.determined()) {
                double ratio = tau / p95.value();
                residence.add(String.format(Locale.ROOT, "flow-through tank: the mean residence time %.4g s is %.3g"
                        + " times the 95%% blend time; near-ideal mixing wants at least %.0f (Roussinova & Kresta"
                        + " 2008, Ind. Eng. Chem. Res. 47:3532)%s", tau, ratio, RESIDENCE_OVER_BLEND,
                        ratio < RESIDENCE_OVER_BLEND ? ": WARNING, below it, part of the feed leaves unmixed" : ""));
            }
        }
        List<Comparison> handbook = new ArrayList<>();
        HandbookEstimate grenville = TankBlendCorrelation.blendTime(tank);
        if (p95.determined()) {
            handbook.add(ForecastComparison.compare(p95.value(), finite(p95.low(), p95.value()),
                    finite(p95.high(), p95.value()), grenville));
        }
        List<String> assumptions = new ArrayList<>(flow.assumptions());
        assumptions.add(FirstOrderDecay.CONSERVATIVE);
        assumptions.add(String.format(Locale.ROOT, "mean flow: %s circulation from a stream function carrying the"
                + " impeller discharge N_Q N D^3 = %.3g m^3/s through the impeller; each loop carries %.3g m^3/s"
                + " (the rest is entrained flow)", TankFlowRules.radialFlow(tank) ? "two-loop (radial impeller)"
                : "one-loop (axial impeller)", t.discharge(), t.loopFlow()));
        assumptions.add(String.format(Locale.ROOT, "turbulence: %.0f%% of the power dissipated in the impeller"
                + " zone, the rest evenly in the bulk; the impeller zone's liquid turns at %.0f%% of the impeller's"
                + " speed", 100 * TankFlowRules.IMPELLER_ZONE_SHARE, 100 * TankFlowRules.ZONE_SWIRL_FRACTION));
        assumptions.add("particles spread by the local turbulent diffusivity (random-displacement model) and"
                + " reflected at the wall, the bottom and the surface; baffles, shaft and impeller blades are not"
                + " resolved");
        assumptions.add("blend: every one of the tank's equal-volume cells within the stated fraction of the final"
                + " value; counting noise removed");
        assumptions.addAll(residence);
        if (tank.throughflow() != null) {
            assumptions.add("the blend time is that of a batch: the throughflow's own inlet and outlet jets are not"
                    + " in the circulation");
        }
        return new Forecast(false, times, times, measure, s.forecast().edgeFraction(), width, low, high, end, peak,
                mixing, handbook, assumptions, Cautions.ALL, new double[0]);
    }

    private static double finite(double v, double fallback) {
        return Double.isFinite(v) ? v : fallback;
    }

    private static String note(Estimate e) {
        return e.note().isEmpty() ? "" : "; " + e.note();
    }
}
