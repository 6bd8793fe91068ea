package org.eddycast.field;

/**
 * The shape of an isotropic energy spectrum E(k), up to a constant factor, in its own wavenumber units.
 * The engine rescales wavenumbers afterwards so that the longitudinal integral length is one.
 */
public interface SpectrumShape {

    /** Unnormalised energy density at wavenumber k > 0. */
    double density(double k);

    /** Smallest wavenumber carrying energy worth simulating. */
    double lowerWavenumber();

    /** Largest wavenumber carrying energy worth simulating. */
    double upperWavenumber();

    /** A one-line description for reports, for example "power law k^-1.667 over a band of ratio 16". */
    String describe();
}
