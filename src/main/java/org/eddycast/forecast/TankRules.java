package org.eddycast.forecast;

import java.util.ArrayList;
import java.util.List;

import org.eddycast.scenario.Derivation;
import org.eddycast.scenario.ImpellerType;
import org.eddycast.scenario.SpectrumSpec;
import org.eddycast.scenario.TankDesign;
import org.eddycast.scenario.TurbulenceStatistics;

/**
 * Rules that turn a stirred-tank design into turbulence statistics for the whole tank, each value recorded as
 * a {@link Derivation}:
 * <ul>
 *   <li>volume V = pi T^2 H / 4 (flat-bottomed cylinder);</li>
 *   <li>mean dissipation eps = Po N^3 D^5 / V (the definition of the power number, all shaft power
 *       dissipated in the liquid);</li>
 *   <li>impeller Reynolds number Re = N D^2 / nu; fully turbulent above about 1e4 (common practice);</li>
 *   <li>integral length L = a D with a = {@link #integralLengthOverImpellerDiameter()} (0.1 by default: the
 *       energetic eddies of the bulk are a fraction of the impeller size; common practice, an order-of-magnitude
 *       rule);</li>
 *   <li>rms velocity from eps = C_eps u'^3 / L with C_eps = {@link #dissipationConstant()} (0.5 by default;
 *       Sreenivasan 1998, An update on the energy dissipation rate in isotropic turbulence, Phys. Fluids
 *       10:528, from memory: about 0.4 to 0.5 at high Reynolds number);</li>
 *   <li>correlation time tau = L / u', the eddy-turnover time (common practice);</li>
 *   <li>Kolmogorov length eta = (nu^3 / eps)^(1/4) (Kolmogorov 1941, Dokl. Akad. Nauk SSSR 30:301);</li>
 *   <li>spectrum: a -5/3 power-law band from the integral length down to
 *       {@link #inertialRangeEndInKolmogorovLengths()} Kolmogorov lengths (60 by default, where Pope places the
 *       start of the dissipation range: Pope 2000, Turbulent Flows, Cambridge University Press, sec. 6.1,
 *       from memory), at least a ratio of 1; smaller eddies carry little of the tracer flux.</li>
 * </ul>
 * Dimensions 3, no mean velocity (the tank holds the tracer; the impeller's bulk circulation is not a mean
 * drift the simulated field can carry). When the power number is not given, a typical turbulent value for the
 * impeller type in a baffled tank is used, each with its source.
 *
 * <p>The statistics describe homogeneous isotropic turbulence at the tank-average dissipation. Real tanks are
 * far from homogeneous: dissipation near the impeller is many times the average and the bulk circulation
 * carries tracer round the tank. The assumptions list says so in every result.
 *
 * @param integralLengthOverImpellerDiameter   L / D, greater than 0
 * @param dissipationConstant                  C_eps, greater than 0
 * @param inertialRangeEndInKolmogorovLengths  smallest eddy of the band in Kolmogorov lengths, greater than 0
 */
public record TankRules(double integralLengthOverImpellerDiameter, double dissipationConstant,
                        double inertialRangeEndInKolmogorovLengths) {

    /** The default rules: L = 0.1 D, C_eps = 0.5, band down to 60 Kolmogorov lengths. */
    public static final TankRules STANDARD = new TankRules(0.1, 0.5, 60.0);

    /** Impeller Reynolds number above which a baffled tank is taken as fully turbulent (common practice). */
    public static final double TURBULENT_REYNOLDS = 1e4;

    public TankRules {
        Checks.positive("integralLengthOverImpellerDiameter", integralLengthOverImpellerDiameter, "");
        Checks.positive("dissipationConstant", dissipationConstant, "");
        Checks.positive("inertialRangeEndInKolmogorovLengths", inertialRangeEndInKolmogorovLengths, "");
    }

    /**
     * A typical turbulent power number for an impeller type in a baffled tank, with its source. All from
     * memory: published values vary with blade thickness, clearance and the ratio D/T by 10 to 20%.
     */
    public static Derivation typicalPowerNumber(ImpellerType type) {
        if (type == null) {
            throw new IllegalArgumentException("impeller type must be given to look up a power number");
        }
        String handbook = "Hemrajani & Tatterson 2004, Mechanically stirred vessels, in Handbook of Industrial"
                + " Mixing, Wiley, ch. 6 (from memory)";
        return switch (type) {
            case DISC_TURBINE -> new Derivation("power number", 5.0, "",
                    "typical turbulent value, six-blade disc turbine, baffled tank",
                    Sources.RUSHTON_1950.cite() + " (from memory)");
            case PITCHED_BLADE_TURBINE -> new Derivation("power number", 1.27, "",
                    "typical turbulent value, four-blade 45-degree pitched-blade turbine, baffled tank", handbook);
            case MARINE_PROPELLER -> new Derivation("power number", 0.35, "",
                    "typical turbulent value, three-blade marine propeller, baffled tank", handbook);
            case HYDROFOIL -> new Derivation("power number", 0.30, "",
                    "typical turbulent value, three-blade narrow hydrofoil, baffled tank", handbook);
        };
    }

    /** The power number used for a design: the given one, else the impeller type's typical value. */
    public static Derivation powerNumber(TankDesign design) {
        if (design.powerNumber() != null) {
            return new Derivation("power number", design.powerNumber(), "", "Po as given", "given");
        }
        return typicalPowerNumber(design.impellerType());
    }

    /** Mean dissipation eps = Po N^3 D^5 / V (W/kg). */
    public static double meanDissipation(TankDesign design, double powerNumber) {
        double n = design.impellerSpeed();
        double d = design.impellerDiameter();
        return powerNumber * n * n * n * Math.pow(d, 5) / design.volume();
    }

    /** Impeller Reynolds number N D^2 / nu. */
    public static double reynoldsNumber(TankDesign design) {
        return design.impellerSpeed() * design.impellerDiameter() * design.impellerDiameter()
                / design.kinematicViscosity();
    }

    /** Turbulence statistics for the design, with derivations, warnings and assumptions. */
    public ModeledTurbulence model(TankDesign design) {
        List<Derivation> steps = new ArrayList<>();
        List<String> warnings = new ArrayList<>();
        double nu = design.kinematicViscosity();
        steps.add(new Derivation("kinematic viscosity", nu, "m^2/s",
                nu == TankDesign.WATER_20C_KINEMATIC_VISCOSITY ? "water at 20 C unless given" : "as given",
                Sources.IAPWS_2008.cite()));
        double volume = design.volume();
        steps.add(new Derivation("liquid volume", volume, "m^3", "V = pi T^2 H / 4", "geometry"));
        Derivation po = powerNumber(design);
        steps.add(po);
        double eps = meanDissipation(design, po.value());
        steps.add(new Derivation("mean dissipation rate", eps, "W/kg", "eps = Po N^3 D^5 / V",
                "definition of the power number"));
        double re = reynoldsNumber(design);
        steps.add(new Derivation("impeller Reynolds number", re, "", "Re = N D^2 / nu", "definition"));
        if (re < TURBULENT_REYNOLDS) {
            warnings.add(String.format("impeller Reynolds number %.3g is below %.0e: the flow is not fully"
                    + " turbulent, so the power number and the turbulence rules are doubtful", re,
                    TURBULENT_REYNOLDS));
        }
        if (!design.baffled()) {
            warnings.add("the tank has no baffles: the liquid swirls with the impeller, typical power numbers"
                    + " (which assume baffles) overstate the power, and blend-time correlations do not apply");
        }
        double length = integralLengthOverImpellerDiameter * design.impellerDiameter();
        steps.add(new Derivation("integral length", length, "m",
                String.format("L = %.3g D", integralLengthOverImpellerDiameter),
                "common practice (order of magnitude)"));
        double rms = Math.cbrt(eps * length / dissipationConstant);
        steps.add(new Derivation("rms velocity", rms, "m/s",
                String.format("u' = (eps L / C_eps)^(1/3), C_eps = %.3g", dissipationConstant),
                Sources.SREENIVASAN_1998.cite() + " (from memory)"));
        double tau = length / rms;
        steps.add(new Derivation("correlation time", tau, "s", "tau = L / u' (eddy-turnover time)",
                "common practice"));
        SpectrumStep spectrum = SpectrumStep.of(length, nu, eps, inertialRangeEndInKolmogorovLengths, warnings);
        steps.addAll(spectrum.derivations());
        steps.add(new Derivation("mean velocity", 0.0, "m/s",
                "0: a closed tank; bulk circulation is not a mean drift of the simulated field", "common practice"));
        steps.add(new Derivation("dimensions", 3, "", "three-dimensional turbulence", "common practice"));
        TurbulenceStatistics statistics = new TurbulenceStatistics(3, rms, new double[] {rms, rms, rms}, length,
                tau, spectrum.spec(), 0.0, eps, steps);
        List<String> assumptions = List.of(
                "the random Fourier field gives D / (u' L) for turbulence at the tank-average dissipation rate; the"
                        + " transport stage applies it at every point with the local dissipation rate",
                "passive, conservative tracer; walls reflect");
        return new ModeledTurbulence(statistics, warnings, assumptions);
    }
}
