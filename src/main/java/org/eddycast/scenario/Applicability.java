package org.eddycast.scenario;

import com.fasterxml.jackson.databind.JsonNode;
import java.util.List;

/**
 * Fields that are valid JSON and valid values but do not apply to the rest of the scenario: each is refused
 * with what it applies to, because a field that is silently ignored changes nothing while the user believes it
 * did. The rules look only at the document, so they hold whatever section reads the field.
 *
 * <ul>
 *   <li>{@code flow.spectrum.kolmogorovLength} belongs to the model spectrum; {@code slope} and
 *       {@code wavenumberRatio} to the power-law band.</li>
 *   <li>{@code release.position} places the dose in a tank; a channel's release is placed by
 *       {@code release.location} (centre-line or bank); other flows are unbounded and use neither.</li>
 *   <li>{@code forecast.stations}, {@code forecast.targetPeak} and {@code forecast.cap} are distances
 *       downstream: a channel only.</li>
 *   <li>{@code release.rate} is a continuous source in a channel (the steady plume); a tank forecast has no
 *       continuous source. Given alone it would leave the instantaneous-release peaks for a mass nobody gave,
 *       so {@code release.mass} must be given beside it.</li>
 *   <li>{@code release.duration} spreads {@code release.mass} evenly over a stated time, seen in a channel's
 *       station curves: a channel only, with the mass, and never with a rate that goes on.</li>
 * </ul>
 */
final class Applicability {

    private Applicability() {
    }

    /** Adds a problem for every field of {@code root} that does not apply. */
    static void check(JsonNode root, List<String> problems) {
        JsonNode flow = root.path("flow");
        String kind = flow.path("kind").asText("");
        JsonNode spectrum = flow.path("spectrum");
        if (kind.equals("direct") && spectrum.isObject()) {
            boolean model = spectrum.path("model").asText("power-law").equals("model");
            if (model) {
                for (String f : List.of("slope", "wavenumberRatio")) {
                    if (spectrum.has(f)) {
                        problems.add("flow.spectrum." + f + " applies to the power-law spectrum only; remove it "
                                + "for the model spectrum (it is shaped by flow.spectrum.kolmogorovLength)");
                    }
                }
            } else if (spectrum.has("kolmogorovLength")) {
                problems.add("flow.spectrum.kolmogorovLength applies to the model spectrum only; remove it, or set "
                        + "flow.spectrum.model to \"model\" (the power-law band is shaped by slope and "
                        + "wavenumberRatio)");
            }
        }
        JsonNode forecast = root.path("forecast");
        if (forecast.isObject() && !kind.isEmpty() && !kind.equals("channel")) {
            for (String f : List.of("stations", "targetPeak", "cap", "horizonDistance")) {
                if (forecast.has(f)) {
                    problems.add("forecast." + f + " applies to a channel only (" + (f.equals("horizonDistance")
                            ? "a distance downstream; elsewhere give forecast.horizon in s"
                            : "stations are distances downstream") + "); remove it");
                }
            }
        }
        if (forecast.isObject() && forecast.has("probes") && !kind.isEmpty() && !kind.equals("tank")) {
            problems.add("forecast.probes applies to a tank only (probes stand at points in the tank); remove it");
        }
        JsonNode release = root.path("release");
        if (!release.isObject() || kind.isEmpty()) {
            return;
        }
        if (release.has("position") && !kind.equals("tank")) {
            problems.add("release.position applies to a tank only; remove it" + (kind.equals("channel")
                    ? " and place a channel's release with release.location (centre-line or bank)"
                    : " (this flow has no walls: the release is its origin)"));
        }
        if (release.has("location") && !kind.equals("channel")) {
            problems.add("release.location applies to a channel only; remove it" + (kind.equals("tank")
                    ? " and place a tank's dose with release.position { x, y, z } in m" : ""));
        }
        if (release.has("duration")) {
            if (!kind.equals("channel")) {
                problems.add("release.duration (a constant rate over a stated time) applies to a channel only, where"
                        + " the stations' curves show it; remove it");
            } else if (release.has("rate")) {
                problems.add("release.duration and release.rate: give release.mass with release.duration for a"
                        + " release at mass / duration per second that stops, or release.rate alone (with the mass"
                        + " of one dose) for one that goes on; not both");
            } else if (!release.has("mass")) {
                problems.add("release.mass is missing: a release over release.duration spreads that mass evenly over"
                        + " the duration (give the total in kg)");
            }
        }
        if (release.has("rate")) {
            if (!kind.equals("channel")) {
                problems.add("release.rate (a continuous source) applies to a channel only; remove it and give "
                        + "the dose as release.mass in kg");
            } else if (!release.has("mass")) {
                problems.add("release.mass is missing: with release.rate the forecast also gives the peaks of an "
                        + "instantaneous release, which need its mass in kg (give the mass of one dose)");
            }
        }
    }
}
