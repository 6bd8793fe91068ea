package org.eddycast.scenario;

/**
 * A place where the forecast reads the concentration against time: in a channel, a distance downstream of the
 * release and, optionally, a position across it.
 *
 * @param distance distance downstream of the release (m), positive
 * @param across   position across from the left water's edge (m), NaN for the cross-section mean
 */
public record Station(double distance, double across) {
}
