package org.eddycast.engine;

import java.util.List;
import org.eddycast.scenario.DisplayUnits;
import org.eddycast.transport.Passage;
import org.eddycast.transport.StationCurve;

/**
 * The answers a practitioner writes down, in SI units: the release as the forecast took it, the passage at each
 * station, the dose plan, and the headline sentence (in the scenario's display units) that every output opens
 * with.
 *
 * @param headline the answer to the scenario's question in one sentence
 * @param release  the release
 * @param stations each station's curve and passage (a channel with stations; empty otherwise)
 * @param dosePlan the mass for a target peak, or null when none was asked
 * @param notes    what the reader must know about these figures (an assumed mass, a cap that applied)
 * @param warnings a planned dose above the user's cap
 * @param units    the display units of the headline
 */
public record Answers(String headline, ReleaseFacts release, List<StationAnswer> stations, DosePlan dosePlan,
                      List<String> notes, List<String> warnings, DisplayUnits units) {

    public Answers {
        stations = List.copyOf(stations);
        notes = List.copyOf(notes);
        warnings = List.copyOf(warnings);
    }

    /**
     * The release as the forecast took it.
     *
     * @param mass               released mass (kg)
     * @param volume             volume of the injected solution (m^3), NaN when not given
     * @param stockConcentration mass over volume (kg/m^3), NaN when no volume was given
     * @param mode               "slug" (instantaneous), "over-duration" (a constant rate over a stated time) or
     *                           "continuous"
     * @param duration           duration of the release (s): 0 for a slug, the stated time for "over-duration", NaN
     *                           for a continuous release
     * @param assumed            true when the scenario gave no release and 1 kg was assumed
     */
    public record ReleaseFacts(double mass, double volume, double stockConcentration, String mode, double duration,
                               boolean assumed) {
    }

    /**
     * One station's answer.
     *
     * @param curve   the concentration against time for the scenario's mass, capped at the stock concentration
     * @param passage what the curve says: arrival, peak, time above the detection limit
     * @param capped  true when the stock concentration capped some value of the curve
     */
    public record StationAnswer(StationCurve curve, Passage passage, boolean capped) {
    }

    /**
     * The mass that gives a target peak at the first station: concentrations are linear in the mass.
     *
     * @param station    the station's distance downstream (m)
     * @param targetPeak the peak wanted there (kg/m^3)
     * @param mass       the mass to release (kg)
     * @param capDistance where the user's cap applies (m), NaN for none
     * @param capLimit   the cap (kg/m^3), NaN for none
     * @param peakAtCap  the planned dose's peak at the cap's distance (kg/m^3), NaN for none
     */
    public record DosePlan(double station, double targetPeak, double mass, double capDistance, double capLimit,
                           double peakAtCap) {

        /** True when the planned dose's peak at the cap's place exceeds the cap. */
        public boolean exceedsCap() {
            return peakAtCap > capLimit;
        }
    }
}
