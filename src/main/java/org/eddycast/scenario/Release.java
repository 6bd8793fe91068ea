package org.eddycast.scenario;

/**
 * What is released and where.
 *
 * @param mass       mass released at once (kg), for the instantaneous-release forecasts
 * @param rate       mass released per second (kg/s) for a continuous release in a channel, NaN when none
 * @param position   where in a tank (x, y, z from a corner of the equivalent box, m), or null for the centre;
 *                   unused in open water
 * @param atBank     in a channel: true for a release at the bank, false for the centre-line
 */
public record Release(double mass, double rate, double[] position, boolean atBank) {

    public Release {
        position = position == null ? null : position.clone();
    }

    @Override
    public double[] position() {
        return position == null ? null : position.clone();
    }

    /** One kilogram at once, centre-line, no continuous release. */
    public static Release defaults() {
        return new Release(1.0, Double.NaN, null, false);
    }
}
