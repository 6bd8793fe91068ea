package org.eddycast.report;

import org.eddycast.engine.Answers;
import org.eddycast.engine.DisplayFormat;
import org.eddycast.transport.Passage;

/** The answers as lines of the text summary, in the scenario's display units. */
final class AnswersText {

    private AnswersText() {
    }

    static void append(StringBuilder sb, Answers a) {
        DisplayFormat f = new DisplayFormat(a.units());
        Answers.ReleaseFacts r = a.release();
        sb.append("  release: ").append(DisplayFormat.round(r.mass())).append(" kg, ")
                .append(switch (r.mode()) {
                    case "slug" -> "at once (a slug)";
                    case "over-duration" -> "at a constant rate over " + f.time(r.duration());
                    default -> "continuous";
                });
        if (Double.isFinite(r.volume())) {
            sb.append(", in ").append(DisplayFormat.round(r.volume())).append(" m^3 of solution (")
                    .append(f.concentration(r.stockConcentration())).append(", the cap on every concentration)");
        }
        sb.append(r.assumed() ? " (assumed)" : "").append('\n');
        for (Answers.StationAnswer s : a.stations()) {
            Passage p = s.passage();
            sb.append("  station ").append(f.distance(p.distance())).append(" downstream");
            if (!Double.isNaN(p.across())) {
                sb.append(", ").append(f.distance(p.across())).append(" across");
            }
            sb.append(": peak ").append(f.concentration(p.peak())).append(" [")
                    .append(f.concentration(p.peakLow())).append(", ").append(f.concentration(p.peakHigh()))
                    .append("] at ").append(f.time(p.peakTime()));
            if (!Double.isNaN(p.threshold())) {
                if (Double.isNaN(p.arrival())) {
                    sb.append("; never above the detection limit ").append(f.concentration(p.threshold()));
                } else {
                    sb.append("; above ").append(f.concentration(p.threshold())).append(" from ")
                            .append(f.time(p.arrival())).append(p.stillAboveAtEnd() ? " to past the end of the run"
                                    : " to " + f.time(p.fallsBack()));
                }
            }
            sb.append(s.curve().sectionMean() ? " (cross-section mean)" : " (the strip across holding it)");
            sb.append('\n');
        }
        if (a.dosePlan() != null) {
            Answers.DosePlan d = a.dosePlan();
            sb.append("  dose plan: release ").append(DisplayFormat.round(d.mass())).append(" kg for a peak of ")
                    .append(f.concentration(d.targetPeak())).append(" at ").append(f.distance(d.station()))
                    .append(" (concentrations scale with the mass)");
            if (Double.isFinite(d.peakAtCap())) {
                sb.append("; it peaks at ").append(f.concentration(d.peakAtCap())).append(" at ")
                        .append(f.distance(d.capDistance())).append(" against the cap of ")
                        .append(f.concentration(d.capLimit()));
            }
            sb.append('\n');
        }
        for (String w : a.warnings()) {
            sb.append("  WARNING: ").append(w).append('\n');
        }
        for (String n : a.notes()) {
            sb.append("  note: ").append(n).append('\n');
        }
    }
}
