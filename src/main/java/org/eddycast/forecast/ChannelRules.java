package org.eddycast.forecast;

import java.util.ArrayList;
import java.util.List;

import org.eddycast.scenario.ChannelDesign;
import org.eddycast.scenario.Derivation;
import org.eddycast.scenario.TankDesign;
import org.eddycast.scenario.TurbulenceStatistics;

/**
 * Rules that turn an open-channel design into turbulence statistics, each value recorded as a
 * {@link Derivation}:
 * <ul>
 *   <li>hydraulic radius R = W h / (W + 2 h) of a rectangular section;</li>
 *   <li>shear velocity u*: from the bed slope, u* = sqrt(g R S) (uniform flow; Chow 1959, Open-Channel
 *       Hydraulics, McGraw-Hill, from memory); given directly; or from Manning's n: Manning's formula
 *       U = R^(2/3) S^(1/2) / n (SI units; Manning 1891, Trans. Inst. Civil Eng. Ireland 20:161, from memory)
 *       gives S = n^2 U^2 / R^(4/3), hence u* = sqrt(g R S) = n U sqrt(g) / R^(1/6);</li>
 *   <li>turbulence intensities u'/u* = 2.30 e^(-y/h), spanwise 1.63 e^(-y/h), vertical 1.27 e^(-y/h)
 *       (Nezu &amp; Nakagawa 1993, Turbulence in Open-Channel Flows, IAHR Monograph, from memory; fitted for
 *       0.1 &lt; y/h &lt; 0.9), depth-averaged as the root of the depth-mean variance over the full depth:
 *       c sqrt((1 - e^(-2)) / 2) = 0.6575 c for coefficient c (the fit is extended to the bed and surface);</li>
 *   <li>u' for the isotropic field: the root of the mean of the three component variances (1.174 u*);</li>
 *   <li>integral length L = b h with b = {@link #integralLengthOverDepth()} (0.5 by default: the largest
 *       eddies scale with the depth; common practice, an order-of-magnitude rule);</li>
 *   <li>correlation time tau = L / u' (eddy-turnover time, common practice);</li>
 *   <li>mean dissipation eps = u*^2 U / R: in uniform flow all the work of gravity, g S U per unit mass, is
 *       dissipated (derived; common practice);</li>
 *   <li>Kolmogorov length and a -5/3 band as for tanks ({@link TankRules});</li>
 *   <li>mean velocity U, dimensions 3.</li>
 * </ul>
 * Warnings: a channel narrower than 5 depths is not wide (side walls and secondary currents shape the flow);
 * a Froude number above {@link #HIGH_FROUDE} is near or past critical flow; a Reynolds number U R / nu below
 * 2000 is not fully turbulent (Chow 1959, from memory).
 *
 * @param integralLengthOverDepth              L / h, greater than 0
 * @param inertialRangeEndInKolmogorovLengths  smallest eddy of the band in Kolmogorov lengths, greater than 0
 */
public record ChannelRules(double integralLengthOverDepth, double inertialRangeEndInKolmogorovLengths) {

    /** The default rules: L = 0.5 h, band down to 60 Kolmogorov lengths. */
    public static final ChannelRules STANDARD = new ChannelRules(0.5, 60.0);

    /** Standard acceleration of gravity (m/s^2), 3rd CGPM 1901. */
    public static final double GRAVITY = 9.80665;

    /** Nezu and Nakagawa's coefficients (streamwise, spanwise, vertical), from memory. */
    public static final double[] INTENSITY_COEFFICIENTS = {2.30, 1.63, 1.27};

    /** Froude number above which the flow is treated as near critical (common practice). */
    public static final double HIGH_FROUDE = 0.8;

    /** Reynolds number U R / nu below which the flow is not fully turbulent (Chow 1959, from memory). */
    public static final double TURBULENT_REYNOLDS = 2000.0;

    public ChannelRules {
        Checks.positive("integralLengthOverDepth", integralLengthOverDepth, "");
        Checks.positive("inertialRangeEndInKolmogorovLengths", inertialRangeEndInKolmogorovLengths, "");
    }

    /** The shear velocity (m/s) with its derivation. */
    public static Derivation shearVelocity(ChannelDesign design) {
        double radius = design.hydraulicRadius();
        if (design.shearVelocity() != null) {
            return new Derivation("shear velocity", design.shearVelocity(), "m/s", "u* as given", "given");
        }
        if (design.bedSlope() != null) {
            return new Derivation("shear velocity", Math.sqrt(GRAVITY * radius * design.bedSlope()), "m/s",
                    "u* = sqrt(g R S), uniform flow", Sources.CHOW_1959.cite() + " (from memory)");
        }
        return new Derivation("shear velocity",
                design.manningN() * design.meanVelocity() * Math.sqrt(GRAVITY) / Math.pow(radius, 1.0 / 6.0),
                "m/s", "u* = n U sqrt(g) / R^(1/6), from Manning's formula U = R^(2/3) S^(1/2) / n and u* = sqrt(g R S)",
                Sources.MANNING_1891.cite() + "; " + Sources.CHOW_1959.cite() + " (from memory)");
    }

    /** Turbulence statistics for the design, with derivations, warnings and assumptions. */
    public ModeledTurbulence model(ChannelDesign design) {
        List<Derivation> steps = new ArrayList<>();
        List<String> warnings = new ArrayList<>();
        double h = design.depth();
        double u = design.meanVelocity();
        double nu = design.kinematicViscosity();
        steps.add(new Derivation("kinematic viscosity", nu, "m^2/s",
                nu == TankDesign.WATER_20C_KINEMATIC_VISCOSITY ? "water at 20 C unless given" : "as given",
                Sources.IAPWS_2008.cite()));
        double radius = design.hydraulicRadius();
        steps.add(new Derivation("hydraulic radius", radius, "m", "R = W h / (W + 2 h)", "geometry"));
        Derivation shear = shearVelocity(design);
        steps.add(shear);
        double uStar = shear.value();
        double froude = u / Math.sqrt(GRAVITY * h);
        steps.add(new Derivation("Froude number", froude, "", "Fr = U / sqrt(g h)", "definition"));
        double reynolds = u * radius / nu;
        steps.add(new Derivation("Reynolds number", reynolds, "", "Re = U R / nu", "definition"));
        if (design.width() / h < ChannelHandbook.WIDE_CHANNEL_ASPECT) {
            warnings.add(String.format("the channel is not wide (W/h = %.3g, below %.0f): side walls and secondary"
                    + " currents shape the flow, and the wide-channel rules are doubtful", design.width() / h,
                    ChannelHandbook.WIDE_CHANNEL_ASPECT));
        }
        if (froude > HIGH_FROUDE) {
            warnings.add(String.format("the Froude number %.3g is high (above %.1f): near or past critical flow,"
                    + " surface waves and jumps make the uniform-flow rules doubtful", froude, HIGH_FROUDE));
        }
        if (reynolds < TURBULENT_REYNOLDS) {
            warnings.add(String.format("the Reynolds number U R / nu = %.3g is below %.0f: the flow may not be"
                    + " turbulent", reynolds, TURBULENT_REYNOLDS));
        }
        // The field stage answers for the statistics at mid-depth; the transport stage scales its factor
        // D / (u' L) to every height with the profiles of ChannelProfiles.
        double zeta = 0.5;
        String[] names = {"streamwise", "spanwise", "vertical"};
        double[] component = new double[3];
        for (int i = 0; i < 3; i++) {
            component[i] = ChannelProfiles.rms(i, zeta, uStar);
            steps.add(new Derivation(names[i] + " rms velocity at mid-depth", component[i], "m/s",
                    String.format("%.2f u* e^(-z/h) at z/h = 0.5", INTENSITY_COEFFICIENTS[i]),
                    Sources.NEZU_NAKAGAWA_1993.cite() + " (from memory; fitted for 0.1 < z/h < 0.9)"));
        }
        double rms = ChannelProfiles.RMS_COEFFICIENT * uStar * Math.exp(-zeta);
        steps.add(new Derivation("rms velocity at mid-depth", rms, "m/s",
                "u' = root of the mean of the three component variances", "common practice"));
        double eps = ChannelProfiles.dissipation(zeta, h, uStar);
        steps.add(new Derivation("dissipation rate at mid-depth", eps, "W/kg",
                String.format("eps = %.1f (u*^3 / h) (z/h)^(-1/2) e^(-3 z/h); near the bed the log-law"
                        + " equilibrium u*^3 (1 - z/h) / (kappa z)", ChannelProfiles.OUTER_DISSIPATION),
                Sources.NEZU_NAKAGAWA_1993.cite() + " (from memory); log-law equilibrium derived"));
        double length = new ChannelProfiles(TankRules.STANDARD.dissipationConstant(), 1).integralLength(zeta, h,
                uStar);
        steps.add(new Derivation("integral length at mid-depth", length, "m",
                String.format("L = C_eps u'^3 / eps, C_eps = %.2f (the same rule as for tanks); about 0.29 h"
                        + " (z/h)^(1/2) above z/h = 0.06, kappa z near the bed",
                        TankRules.STANDARD.dissipationConstant()),
                Sources.SREENIVASAN_1998.cite() + " (from memory)"));
        double tau = length / rms;
        steps.add(new Derivation("correlation time", tau, "s", "tau = L / u' (eddy-turnover time)",
                "common practice"));
        double meanEps = uStar * uStar * u / radius;
        steps.add(new Derivation("section-mean dissipation rate", meanEps, "W/kg",
                "eps = g S U = u*^2 U / R (uniform flow: the work of gravity is all dissipated)",
                "derived; common practice"));
        SpectrumStep spectrum = SpectrumStep.of(length, nu, eps, inertialRangeEndInKolmogorovLengths, warnings);
        steps.addAll(spectrum.derivations());
        steps.add(new Derivation("mean velocity", u, "m/s", "U as given", "given"));
        steps.add(new Derivation("dimensions", 3, "", "three-dimensional turbulence", "common practice"));
        TurbulenceStatistics statistics = new TurbulenceStatistics(3, rms, component, length, tau, spectrum.spec(),
                u, eps, steps);
        List<String> assumptions = List.of(
                "the random Fourier field gives D / (u' L) for the turbulence at mid-depth; the transport stage"
                        + " applies it at every height with the local intensities and length",
                "over the depth: the log-law velocity profile; across the width: the local depth by Manning's"
                        + " formula, or the surveyed velocities",
                "straight channel in uniform flow; passive, conservative tracer");
        return new ModeledTurbulence(statistics, warnings, assumptions);
    }
}
