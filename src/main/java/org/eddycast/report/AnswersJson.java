package org.eddycast.report;

import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import org.eddycast.engine.Answers;
import org.eddycast.scenario.DisplayUnits;
import org.eddycast.transport.Passage;
import org.eddycast.transport.StationCurve;

/**
 * The answers as the JSON objects {@code headline}, {@code release}, {@code stations} and {@code dosePlan}.
 * Values are SI (kg/m^3, s, m, kg); {@code unit} names the display unit the headline text uses and
 * {@code siUnit} the unit of the numbers.
 */
final class AnswersJson {

    private AnswersJson() {
    }

    static void write(ObjectNode root, Answers a) {
        ObjectNode headline = root.putObject("headline");
        headline.put("text", a.headline());
        ArrayNode list = headline.putArray("stations");
        for (Answers.StationAnswer s : a.stations()) {
            Passage p = s.passage();
            ObjectNode o = list.addObject();
            ResultJson.number(o, "position", p.distance());
            ResultJson.number(o, "across", p.across());
            ResultJson.number(o, "arrival", p.arrival());
            ResultJson.number(o, "peakTime", p.peakTime());
            ResultJson.number(o, "peak", p.peak());
            ResultJson.number(o, "peakLow", p.peakLow());
            ResultJson.number(o, "peakHigh", p.peakHigh());
            ResultJson.number(o, "aboveThresholdFor", p.aboveThresholdFor());
            ResultJson.number(o, "fallsBack", p.fallsBack());
            ResultJson.number(o, "detectionLimit", p.threshold());
            o.put("stillAboveAtEnd", p.stillAboveAtEnd());
            units(o.putObject("unit"), a.units());
            siUnits(o.putObject("siUnit"));
        }
        Answers.ReleaseFacts r = a.release();
        ObjectNode release = root.putObject("release");
        ResultJson.number(release, "mass", r.mass());
        ResultJson.number(release, "volume", r.volume());
        ResultJson.number(release, "stockConcentration", r.stockConcentration());
        release.put("mode", r.mode());
        ResultJson.number(release, "duration", r.duration());
        release.put("assumed", r.assumed());
        ObjectNode ru = release.putObject("unit");
        ru.put("mass", "kg");
        ru.put("volume", "m^3");
        ru.put("stockConcentration", "kg/m^3");
        ru.put("duration", "s");
        ArrayNode stations = root.putArray("stations");
        for (Answers.StationAnswer s : a.stations()) {
            StationCurve c = s.curve();
            ObjectNode o = stations.addObject();
            ResultJson.number(o, "distance", c.distance());
            ResultJson.number(o, "across", c.across());
            o.put("reads", c.sectionMean() ? "cross-section mean" : "the strip across that holds the position");
            o.put("cappedAtStockConcentration", s.capped());
            ResultJson.array(o, "time", c.times());
            ResultJson.array(o, "concentration", c.concentration());
            ResultJson.array(o, "low", c.low());
            ResultJson.array(o, "high", c.high());
            ResultJson.array(o, "binWidth", c.binWidth());
            o.put("band", "95% Student-t over independent blocks of particles");
            ObjectNode u = o.putObject("unit");
            u.put("time", "s");
            u.put("concentration", "kg/m^3");
            u.put("distance", "m");
        }
        if (a.dosePlan() != null) {
            Answers.DosePlan d = a.dosePlan();
            ObjectNode o = root.putObject("dosePlan");
            ResultJson.number(o, "station", d.station());
            ResultJson.number(o, "targetPeak", d.targetPeak());
            ResultJson.number(o, "mass", d.mass());
            ResultJson.number(o, "capDistance", d.capDistance());
            ResultJson.number(o, "cap", d.capLimit());
            ResultJson.number(o, "peakAtCap", d.peakAtCap());
            o.put("exceedsCap", d.exceedsCap());
            ObjectNode u = o.putObject("unit");
            u.put("station", "m");
            u.put("targetPeak", "kg/m^3");
            u.put("mass", "kg");
        }
        ArrayNode notes = root.putArray("answerNotes");
        a.notes().forEach(notes::add);
        ArrayNode warnings = root.putArray("answerWarnings");
        a.warnings().forEach(warnings::add);
    }

    private static void units(ObjectNode o, DisplayUnits u) {
        o.put("concentration", u.concentration());
        o.put("time", u.time());
        o.put("distance", u.distance());
    }

    private static void siUnits(ObjectNode o) {
        o.put("concentration", "kg/m^3");
        o.put("time", "s");
        o.put("distance", "m");
    }
}
