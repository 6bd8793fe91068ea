package org.eddycast.scenario;

/**
 * What is released and where.
 *
 * @param mass       mass released at once (kg), for the instantaneous-release forecasts
 * @param rate       mass released per second (kg/s) for a continuous release in a channel, NaN when none
 * @param position   where in a tank (x, y, z from a corner of the equivalent box, m), or null for the centre;
 *                   unused in open water
 * @param atBank     in a channel: true for a release at the bank, false for the centre-line
 * @param volume     volume of the injected solution (m^3), NaN when not given; its concentration M / V caps every
 *                   reported concentration
 * @param given      false when the scenario had no release block and the mass is the assumed 1 kg
 * @param duration   for a release at a constant rate over a stated time: that time (s), the mass going in at
 *                   mass / duration per second; NaN for a slug or a continuous release
 */
public record Release(double mass, double rate, double[] position, boolean atBank, double volume, boolean given,
                      double duration) {

    /** The mode of a slug: the whole mass at once. */
    public static final String SLUG = "slug";
    /** The mode of a release at a constant rate over a stated duration. */
    public static final String OVER_DURATION = "over-duration";
    /** The mode of a release that goes on (release.rate). */
    public static final String CONTINUOUS = "continuous";

    public Release {
        position = position == null ? null : position.clone();
    }

    /** A release all at once or continuous (no stated duration). */
    public Release(double mass, double rate, double[] position, boolean atBank, double volume, boolean given) {
        this(mass, rate, position, atBank, volume, given, Double.NaN);
    }

    /** A release the scenario gave, with no volume. */
    public Release(double mass, double rate, double[] position, boolean atBank) {
        this(mass, rate, position, atBank, Double.NaN, true);
    }

    /** The injected solution's concentration M / V (kg/m^3), infinite when no volume was given. */
    public double stockConcentration() {
        return Double.isNaN(volume) ? Double.POSITIVE_INFINITY : mass / volume;
    }

    /** "continuous" with a rate, "over-duration" with a duration, otherwise "slug" (an instantaneous release). */
    public String mode() {
        return !Double.isNaN(rate) ? CONTINUOUS : Double.isNaN(duration) ? SLUG : OVER_DURATION;
    }

    @Override
    public double[] position() {
        return position == null ? null : position.clone();
    }

    /** One kilogram at once (assumed: the scenario gave no release), centre-line, no continuous release. */
    public static Release defaults() {
        return new Release(1.0, Double.NaN, null, false, Double.NaN, false);
    }
}
