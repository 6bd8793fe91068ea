package org.eddycast.scenario;

/**
 * A virtual probe in a tank, placed as the feed point is: x and y from one corner of the square of the tank's
 * cross-section area (the axis at half its side), z above the bottom, all in metres.
 */
public record ProbePoint(double x, double y, double z) {
}
