package org.eddycast.measure;

/**
 * Dissipation rate from an inertial-range spectrum level, and the Kolmogorov length.
 *
 * <p>Kolmogorov's 1-D longitudinal spectrum E11(k1) = C1 eps^(2/3) k1^(-5/3) (Kolmogorov, A. N. (1941), "The
 * local structure of turbulence in incompressible viscous fluid for very large Reynolds numbers", Doklady
 * Akademii Nauk SSSR 30:301-305), with C1 = 0.53 measured (Sreenivasan, K. R. (1995), "On the universality
 * of the Kolmogorov constant", Physics of Fluids 7(11):2778-2784). A probe gives a frequency spectrum E(f);
 * Taylor's frozen-turbulence hypothesis (Taylor, G. I. (1938), "The spectrum of turbulence", Proceedings of
 * the Royal Society of London A 164:476-490) maps it with k1 = 2 pi f / U and E11(k1) = U E(f) / (2 pi). With
 * the level K = E(f) f^(5/3) of the -5/3 line this gives eps = (2 pi / U) (K / C1)^(3/2).
 *
 * <p>The Kolmogorov length is eta = (nu^3 / eps)^(1/4) (Kolmogorov 1941).
 *
 * <p>Special cases: a non-positive level or convection speed gives NaN.
 */
public final class KolmogorovScales {

    /** Kolmogorov's constant of the 1-D longitudinal spectrum, 0.53 (Sreenivasan 1995). */
    public static final double C1 = 0.53;

    /** Kinematic viscosity of water at 20 C and 0.1 MPa, 1.0034e-6 m^2/s (IAPWS 2008; Huber et al. 2009). */
    public static final double WATER_VISCOSITY_20C = 1.0034e-6;

    private KolmogorovScales() {
    }

    /**
     * Dissipation rate (W/kg) from the level K of the -5/3 line in the frequency spectrum.
     *
     * @param compensatedLevel K = E(f) f^(5/3), ((m/s)^2 Hz^(2/3))
     * @param convectionSpeed  the speed carrying the eddies past the probe (m/s)
     */
    public static double dissipationRate(double compensatedLevel, double convectionSpeed) {
        if (!(compensatedLevel > 0) || !(convectionSpeed > 0)) {
            return Double.NaN;
        }
        return 2 * Math.PI / convectionSpeed * Math.pow(compensatedLevel / C1, 1.5);
    }

    /** The level K of the -5/3 frequency spectrum that a dissipation rate gives: the inverse of the above. */
    public static double compensatedLevel(double dissipationRate, double convectionSpeed) {
        return C1 * Math.pow(dissipationRate * convectionSpeed / (2 * Math.PI), 2.0 / 3.0);
    }

    /** Kolmogorov length eta = (nu^3 / eps)^(1/4) (m); NaN when eps is not positive. */
    public static double kolmogorovLength(double kinematicViscosity, double dissipationRate) {
        if (!(dissipationRate > 0) || !(kinematicViscosity > 0)) {
            return Double.NaN;
        }
        return Math.pow(kinematicViscosity * kinematicViscosity * kinematicViscosity / dissipationRate, 0.25);
    }
}
