package org.eddycast.engine;

import java.util.ArrayList;
import java.util.List;
import org.eddycast.scenario.ConcentrationCap;
import org.eddycast.scenario.Release;
import org.eddycast.scenario.Scenario;
import org.eddycast.scenario.Station;
import org.eddycast.stats.AxisEstimate;
import org.eddycast.transport.ChannelStageResult;
import org.eddycast.transport.Estimate;
import org.eddycast.transport.Passage;
import org.eddycast.transport.StationCurve;
import org.eddycast.transport.TankStageResult;
import org.eddycast.transport.TransportResult;

/**
 * Builds the {@link Answers} of a study: the release as taken, the stations' curves for the scenario's mass
 * (capped at the injected solution's concentration), their passages, the dose plan by linearity, and the
 * headline sentence.
 */
final class AnswerBuilder {

    private AnswerBuilder() {
    }

    static Answers build(Scenario s, DiffusivityResult r, TransportResult transport) {
        Release release = s.release();
        double stock = release.stockConcentration();
        Answers.ReleaseFacts facts = new Answers.ReleaseFacts(release.mass(), release.volume(),
                Double.isFinite(stock) ? stock : Double.NaN, release.mode(),
                switch (release.mode()) {
                    case Release.SLUG -> 0;
                    case Release.OVER_DURATION -> release.duration();
                    default -> Double.NaN;
                }, !release.given());
        DisplayFormat f = new DisplayFormat(s.forecast().units());
        List<String> notes = new ArrayList<>();
        List<String> warnings = new ArrayList<>();
        if (!release.given()) {
            notes.add("the scenario gives no release: 1 kg released at once was assumed; every concentration"
                    + " scales with the mass");
        }
        if (s.substance().loss().present() && transport instanceof ChannelStageResult) {
            notes.add("the substance is lost at first order with a half-life of "
                    + f.time(s.substance().loss().halfLife()) + ": every station's concentrations and the dose plan"
                    + " include the loss");
        }
        List<Answers.StationAnswer> stations = new ArrayList<>();
        Answers.DosePlan plan = null;
        String headline;
        if (transport instanceof ChannelStageResult c) {
            // per kg released, with the substance's first-order loss (each parcel decays from the moment it goes
            // in, so before the window over the release's duration): the dose plan then accounts for both
            List<StationCurve> unit = ReleaseOverDuration.curves(
                    FirstOrderDecay.apply(c.stations(), s.substance().loss()), release);
            if (release.mode().equals(Release.OVER_DURATION)) {
                notes.add("the release goes in over " + f.time(release.duration()) + " at "
                        + DisplayFormat.round(release.mass() / release.duration()) + " kg/s: each station's curve is"
                        + " the slug's averaged over a sliding window of that length");
            }
            int asked = s.forecast().stations().size();
            for (int k = 0; k < asked; k++) {
                stations.add(station(unit.get(k), release.mass(), stock, s.forecast().detectionLimit()));
            }
            for (Answers.StationAnswer a : stations) {
                double limit = s.forecast().detectionLimit();
                double resolved = finest(a.curve());
                if (limit < resolved) {
                    warnings.add("at " + f.distance(a.curve().distance()) + " the detection limit "
                            + f.concentration(limit) + " is below what the particles resolve there (one particle in"
                            + " the bin stands for " + f.concentration(resolved) + "): the arrival, the time above"
                            + " the limit and the fall back are set by the particles' tails; run more particles or"
                            + " read them as rough");
                }
                if (a.capped()) {
                    notes.add("at " + f.distance(a.curve().distance()) + " the injected solution's concentration"
                            + " (mass over volume, " + f.concentration(stock) + ") capped the station curve");
                }
            }
            ConcentrationCap cap = s.forecast().cap();
            StationCurve capCurve = cap == null ? null : curveAt(unit, s.forecast().stations(), cap.distance());
            if (!Double.isNaN(s.forecast().targetPeak()) && !unit.isEmpty()) {
                plan = plan(s, unit.get(0), capCurve);
                if (plan.exceedsCap()) {
                    warnings.add("the planned dose of " + DisplayFormat.round(plan.mass()) + " kg would peak at "
                            + f.concentration(plan.peakAtCap()) + " at " + f.distance(plan.capDistance())
                            + ", above the cap of " + f.concentration(plan.capLimit()) + " given there: lower the"
                            + " target or move the station");
                }
            }
            if (capCurve != null) {
                double peak = Math.min(capCurve.peak() * release.mass(), stock);
                if (peak > cap.concentration()) {
                    warnings.add("the release of " + DisplayFormat.round(release.mass()) + " kg peaks at "
                            + f.concentration(peak) + " at " + f.distance(cap.distance()) + ", above the cap of "
                            + f.concentration(cap.concentration()) + " given there");
                }
            }
            headline = channelHeadline(f, stations, c);
        } else if (transport instanceof TankStageResult t) {
            headline = tankHeadline(f, t);
        } else {
            headline = diffusivityHeadline(r);
        }
        return new Answers(headline, facts, stations, plan, notes, warnings, s.forecast().units());
    }

    /** A station's curve for the scenario's mass, capped at the stock concentration, and its passage. */
    static Answers.StationAnswer station(StationCurve unitCurve, double mass, double stock, double threshold) {
        StationCurve scaled = unitCurve.scaled(mass);
        boolean capped = scaled.peak() > stock;
        StationCurve curve = capped ? scaled.capped(stock) : scaled;
        return new Answers.StationAnswer(curve, Passage.of(curve, threshold), capped);
    }

    /** The smallest concentration the curve resolves near its passage: one particle in the bin at the peak. */
    static double finest(StationCurve c) {
        double[] v = c.concentration();
        int top = 0;
        for (int j = 1; j < v.length; j++) {
            if (v[j] > v[top]) {
                top = j;
            }
        }
        return c.oneParticle()[top];
    }

    private static StationCurve curveAt(List<StationCurve> curves, List<Station> asked, double distance) {
        for (StationCurve c : curves) {
            if (c.distance() == distance && c.sectionMean()) {
                return c;
            }
        }
        return null;
    }

    /**
     * The mass giving the target peak at the first station: the curve is linear in the mass, so M = target /
     * (peak per kg). The stock concentration of the planned dose is left aside: a planned dose is diluted as
     * needed.
     */
    static Answers.DosePlan plan(Scenario s, StationCurve first, StationCurve capCurve) {
        double target = s.forecast().targetPeak();
        double perKg = first.peak();
        double mass = perKg > 0 ? target / perKg : Double.NaN;
        ConcentrationCap cap = s.forecast().cap();
        double atCap = capCurve == null ? Double.NaN : capCurve.peak() * mass;
        return new Answers.DosePlan(first.distance(), target, mass, cap == null ? Double.NaN : cap.distance(),
                cap == null ? Double.NaN : cap.concentration(), atCap);
    }

    private static String channelHeadline(DisplayFormat f, List<Answers.StationAnswer> stations,
                                          ChannelStageResult c) {
        List<String> parts = new ArrayList<>();
        for (Answers.StationAnswer a : stations) {
            Passage p = a.passage();
            StringBuilder sb = new StringBuilder(f.distance(p.distance())).append(" downstream");
            if (!Double.isNaN(p.across())) {
                sb.append(", ").append(f.distance(p.across())).append(" from the left water's edge");
            }
            sb.append(": peak ").append(f.concentration(p.peak())).append(" at ").append(f.time(p.peakTime()));
            if (!Double.isNaN(p.threshold())) {
                if (Double.isNaN(p.arrival())) {
                    sb.append(", never above ").append(f.concentration(p.threshold()));
                } else {
                    sb.append(", above ").append(f.concentration(p.threshold())).append(" for ")
                            .append(p.stillAboveAtEnd() ? "at least " : "").append(f.time(p.aboveThresholdFor()));
                }
            }
            parts.add(sb.toString());
        }
        Estimate mixed = c.distanceToMixedWidth();
        parts.add(mixed.determined() ? "mixed across the width after " + f.distance(mixed.value())
                : "not mixed across the width within the run");
        String text = String.join("; ", parts);
        return Character.toUpperCase(text.charAt(0)) + text.substring(1) + ".";
    }

    private static String tankHeadline(DisplayFormat f, TankStageResult t) {
        Estimate p95 = t.blendTime95();
        if (!p95.determined()) {
            return "95% blend time: not determined within the run (see the warnings).";
        }
        String interval = Double.isFinite(p95.low()) && Double.isFinite(p95.high())
                ? " [" + DisplayFormat.round(f.unitsTime(p95.low())) + ", " + f.time(p95.high()) + "]" : "";
        return "95% blend time " + f.time(p95.value()) + interval + ", "
                + DisplayFormat.round(p95.value() / t.circulationTime()) + " circulation times.";
    }

    private static String diffusivityHeadline(DiffusivityResult r) {
        double sum = 0;
        double low = 0;
        double high = 0;
        for (AxisEstimate a : r.axes()) {
            if (!a.determined()) {
                return "Eddy diffusivity: not determined (see the warnings).";
            }
            sum += a.diffusivity().value();
            low += a.diffusivity().low();
            high += a.diffusivity().high();
        }
        int n = r.axes().size();
        return "Eddy diffusivity " + DisplayFormat.round(sum / n) + " m^2/s [" + DisplayFormat.round(low / n) + ", "
                + DisplayFormat.round(high / n) + "], the mean over the axes.";
    }
}
