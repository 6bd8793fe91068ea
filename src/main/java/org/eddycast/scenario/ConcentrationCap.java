package org.eddycast.scenario;

/**
 * A concentration the user must not exceed at a named distance downstream (an intake, say). The tool carries no
 * limit of its own: the value comes from the local authority.
 *
 * @param distance      distance downstream of the release (m)
 * @param concentration the cap (kg/m^3)
 */
public record ConcentrationCap(double distance, double concentration) {
}
