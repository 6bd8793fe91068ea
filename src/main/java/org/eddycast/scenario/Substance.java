package org.eddycast.scenario;

/**
 * The released substance.
 *
 * @param name                 what it is, for reports (may be empty)
 * @param molecularDiffusivity D0 in water (m^2/s)
 */
public record Substance(String name, double molecularDiffusivity) {
}
