package org.eddycast.docs;

import java.util.Locale;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.eddycast.engine.StudyResult;
import org.eddycast.forecast.Forecast;

/**
 * The range a preset's description claims for its result, read from the sentence
 * "Expected: the QUANTITY comes out between LOW and HIGH UNIT." so that the claim users read and the value the
 * test checks are the same text. Quantities: "mean eddy diffusivity" (m^2/s, mean over the axes), "eddy
 * diffusivity along x|y|z" (m^2/s), "blend time" (s), "distance to mixed across the width" (m).
 *
 * @param quantity what is claimed
 * @param low      lowest value claimed
 * @param high     highest value claimed
 * @param unit     the unit as written
 */
record PresetClaim(String quantity, double low, double high, String unit) {

    private static final Pattern CLAIM = Pattern.compile(
            "Expected: the (.+?) comes out between ([0-9.eE+-]+) and ([0-9.eE+-]+) (m\\^2/s|s|m)\\.");

    /** The claim in a description; fails naming the description when there is none. */
    static PresetClaim parse(String description) {
        Matcher m = CLAIM.matcher(description);
        if (!m.find()) {
            throw new IllegalArgumentException("description has no 'Expected: the QUANTITY comes out between LOW and "
                    + "HIGH UNIT.' sentence: " + description);
        }
        PresetClaim c = new PresetClaim(m.group(1), Double.parseDouble(m.group(2)), Double.parseDouble(m.group(3)),
                m.group(4));
        if (!(c.low < c.high)) {
            throw new IllegalArgumentException("claimed range is empty: " + m.group());
        }
        return c;
    }

    /** The claimed quantity taken from a result, in the unit the claim names. */
    double valueOf(StudyResult r) {
        String q = quantity.toLowerCase(Locale.ROOT);
        if (q.equals("mean eddy diffusivity")) {
            requireUnit("m^2/s");
            return r.diffusivity().axes().stream().mapToDouble(a -> a.diffusivity().value()).average().orElseThrow();
        }
        if (q.startsWith("eddy diffusivity along ")) {
            requireUnit("m^2/s");
            String axis = q.substring("eddy diffusivity along ".length());
            return r.diffusivity().axes().stream().filter(a -> a.axisName().equals(axis))
                    .mapToDouble(a -> a.diffusivity().value()).findFirst()
                    .orElseThrow(() -> new IllegalArgumentException("no axis " + axis + " in the result"));
        }
        if (q.equals("blend time")) {
            requireUnit("s");
            return mixing(r, "blend time 95%");
        }
        if (q.equals("longitudinal dispersion coefficient")) {
            requireUnit("m^2/s");
            if (!(r.transport() instanceof org.eddycast.transport.ChannelStageResult c)) {
                throw new IllegalArgumentException("the result has no channel transport stage");
            }
            return c.longitudinalDispersion().value();
        }
        if (q.equals("distance to mixed across the width")) {
            requireUnit("m");
            return mixing(r, "distance to mixed across the width (");
        }
        throw new IllegalArgumentException("unknown quantity '" + quantity + "': use mean eddy diffusivity, eddy "
                + "diffusivity along x|y|z, blend time, longitudinal dispersion coefficient or distance to mixed across the"
                + " width");
    }

    private void requireUnit(String expected) {
        if (!unit.equals(expected)) {
            throw new IllegalArgumentException(quantity + " is in " + expected + ", not " + unit);
        }
    }

    private static double mixing(StudyResult r, String prefix) {
        return r.forecast().mixing().stream().filter(m -> m.name().startsWith(prefix))
                .mapToDouble(Forecast.MixingFigure::value).findFirst()
                .orElseThrow(() -> new IllegalArgumentException("the result has no mixing figure '" + prefix + "...'"));
    }
}
