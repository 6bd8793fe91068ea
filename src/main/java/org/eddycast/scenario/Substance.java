package org.eddycast.scenario;

/**
 * The released substance.
 *
 * @param name                 what it is, for reports (may be empty)
 * @param molecularDiffusivity D0 in water (m^2/s)
 * @param loss                 its first-order loss, {@link FirstOrderLoss#NONE} for a conservative tracer
 */
public record Substance(String name, double molecularDiffusivity, FirstOrderLoss loss) {

    /** A conservative substance. */
    public Substance(String name, double molecularDiffusivity) {
        this(name, molecularDiffusivity, FirstOrderLoss.NONE);
    }
}
