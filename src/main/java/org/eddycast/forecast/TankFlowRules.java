package org.eddycast.forecast;

import org.eddycast.scenario.Derivation;
import org.eddycast.scenario.ImpellerType;
import org.eddycast.scenario.TankDesign;

/**
 * Rules for a stirred tank's mean flow and the spread of its dissipation, each with its source:
 * <ul>
 *   <li>the pumping (flow) number N_Q = Q / (N D^3) by impeller type: disc turbine 0.75, 45-degree pitched
 *       blade 0.79, narrow hydrofoil 0.55, marine propeller 0.5 (Hemrajani &amp; Tatterson 2004, Handbook of
 *       Industrial Mixing, ch. 6, from memory; published values vary with D/T and clearance by 10 to 20%);</li>
 *   <li>the flow pattern: a disc turbine discharges radially (two loops), the others axially (one loop)
 *       (common practice);</li>
 *   <li>the share of the power dissipated in the impeller zone: {@value #IMPELLER_ZONE_SHARE} (Cutter 1966,
 *       AIChE J. 12:35, from memory: about 20% in the impeller's swept volume and 50% in its discharge stream,
 *       the rest in the bulk);</li>
 *   <li>the swirl of the impeller zone: the liquid there turns at {@value #ZONE_SWIRL_FRACTION} of the
 *       impeller's angular speed (common practice, from memory; baffles stop it in the bulk);</li>
 *   <li>the mean velocity gradient G = sqrt(P / (mu V)) = sqrt(Po N^3 D^5 / (nu V)) (Camp &amp; Stein 1943,
 *       J. Boston Soc. Civ. Eng. 30:219, from memory).</li>
 * </ul>
 */
public final class TankFlowRules {

    /** Share of the power dissipated in the impeller zone (Cutter 1966, from memory). */
    public static final double IMPELLER_ZONE_SHARE = 0.7;
    /** Angular speed of the impeller zone's liquid over the impeller's (common practice, from memory). */
    public static final double ZONE_SWIRL_FRACTION = 0.5;

    private TankFlowRules() {
    }

    /** The pumping number used for a design: the given one, else the impeller type's typical value. */
    public static Derivation pumpingNumber(TankDesign design) {
        if (design.pumpingNumber() != null) {
            return new Derivation("pumping number", design.pumpingNumber(), "", "N_Q as given", "given");
        }
        if (design.impellerType() == null) {
            throw new IllegalArgumentException("flow.pumpingNumber: give the impeller's pumping number N_Q, or"
                    + " flow.impellerType for its typical value; the tank's circulation needs one");
        }
        String source = Sources.HEMRAJANI_TATTERSON_2004.cite() + " (from memory)";
        return switch (design.impellerType()) {
            case DISC_TURBINE -> new Derivation("pumping number", 0.75, "", "typical turbulent value, disc turbine",
                    source);
            case PITCHED_BLADE_TURBINE -> new Derivation("pumping number", 0.79, "",
                    "typical turbulent value, 45-degree pitched-blade turbine", source);
            case HYDROFOIL -> new Derivation("pumping number", 0.55, "",
                    "typical turbulent value, narrow hydrofoil", source);
            case MARINE_PROPELLER -> new Derivation("pumping number", 0.5, "",
                    "typical turbulent value, marine propeller", source);
        };
    }

    /** True for a radial-flow impeller (two circulation loops). */
    public static boolean radialFlow(TankDesign design) {
        return design.impellerType() == ImpellerType.DISC_TURBINE;
    }

    /** The impeller's discharge N_Q N D^3 (m^3/s). */
    public static double discharge(TankDesign design, double pumpingNumber) {
        double d = design.impellerDiameter();
        return pumpingNumber * design.impellerSpeed() * d * d * d;
    }

    /** Mean velocity gradient G = sqrt(Po N^3 D^5 / (nu V)) (1/s). */
    public static double velocityGradient(TankDesign design, double powerNumber) {
        return Math.sqrt(TankRules.meanDissipation(design, powerNumber) / design.kinematicViscosity());
    }
}
