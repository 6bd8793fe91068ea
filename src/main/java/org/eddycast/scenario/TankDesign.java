package org.eddycast.scenario;

/**
 * A stirred tank as the user describes it, in SI units. Plain data: the rules that turn it into turbulence
 * statistics live in the forecast package.
 *
 * <p>Optional fields are null when not given: {@code powerNumber} (then {@code impellerType} must be given
 * and a typical value is used) and {@code kinematicViscosity} (then water at 20 C, 1.0034e-6 m^2/s,
 * IAPWS 2008: Huber et al. 2009, J. Phys. Chem. Ref. Data 38:101).
 *
 * @param tankDiameter       T (m), greater than 0
 * @param liquidHeight       H (m), greater than 0
 * @param impellerDiameter   D (m), greater than 0 and less than T
 * @param impellerSpeed      N (rev/s), greater than 0
 * @param powerNumber        Po (-), greater than 0, or null to use the impeller type's typical value
 * @param impellerType       impeller family, or null when the power number is given
 * @param kinematicViscosity nu (m^2/s), greater than 0, or null for water at 20 C
 * @param baffled            true when the tank has wall baffles
 * @param pumpingNumber      N_Q (-), greater than 0, or null to use the impeller type's typical value
 * @param clearance          height of the impeller above the bottom (m), between 0 and H, or null for T/3
 * @param throughflow        the flow through a continuously fed tank (m^3/s), greater than 0, or null for a batch
 */
public record TankDesign(double tankDiameter, double liquidHeight, double impellerDiameter, double impellerSpeed,
                         Double powerNumber, ImpellerType impellerType, Double kinematicViscosity,
                         boolean baffled, Double pumpingNumber, Double clearance, Double throughflow) {

    /** A batch tank (no throughflow). */
    public TankDesign(double tankDiameter, double liquidHeight, double impellerDiameter, double impellerSpeed,
                      Double powerNumber, ImpellerType impellerType, Double kinematicViscosity, boolean baffled,
                      Double pumpingNumber, Double clearance) {
        this(tankDiameter, liquidHeight, impellerDiameter, impellerSpeed, powerNumber, impellerType,
                kinematicViscosity, baffled, pumpingNumber, clearance, null);
    }

    /** A tank with the impeller type's typical pumping number and the impeller at a third of T. */
    public TankDesign(double tankDiameter, double liquidHeight, double impellerDiameter, double impellerSpeed,
                      Double powerNumber, ImpellerType impellerType, Double kinematicViscosity, boolean baffled) {
        this(tankDiameter, liquidHeight, impellerDiameter, impellerSpeed, powerNumber, impellerType,
                kinematicViscosity, baffled, null, null);
    }

    /** Kinematic viscosity of water at 20 C and 0.1 MPa (m^2/s): IAPWS 2008 (Huber et al. 2009). */
    public static final double WATER_20C_KINEMATIC_VISCOSITY = 1.0034e-6;

    public TankDesign {
        DesignChecks.positive("flow.tankDiameter", tankDiameter, "m");
        DesignChecks.positive("flow.liquidHeight", liquidHeight, "m");
        DesignChecks.openRange("flow.impellerDiameter", impellerDiameter, 0, tankDiameter, "m");
        DesignChecks.positive("flow.impellerSpeed", impellerSpeed, "rev/s");
        if (powerNumber != null) {
            DesignChecks.positive("flow.powerNumber", powerNumber, "(dimensionless)");
        } else if (impellerType == null) {
            throw new IllegalArgumentException("flow.powerNumber or flow.impellerType must be given");
        }
        if (kinematicViscosity == null) {
            kinematicViscosity = WATER_20C_KINEMATIC_VISCOSITY;
        }
        DesignChecks.positive("flow.kinematicViscosity", kinematicViscosity, "m^2/s");
        if (pumpingNumber != null) {
            DesignChecks.positive("flow.pumpingNumber", pumpingNumber, "(dimensionless)");
        }
        if (clearance != null) {
            DesignChecks.openRange("flow.clearance", clearance, 0, liquidHeight, "m");
        }
        if (throughflow != null) {
            DesignChecks.positive("flow.throughflow", throughflow, "m^3/s");
        }
    }

    /** Height of the impeller above the bottom (m): as given, else a third of the tank diameter (at most H/2). */
    public double impellerClearance() {
        return clearance != null ? clearance : Math.min(tankDiameter / 3, liquidHeight / 2);
    }

    /** Liquid volume pi T^2 H / 4 (m^3) of a flat-bottomed cylinder. */
    public double volume() {
        return Math.PI * tankDiameter * tankDiameter * liquidHeight / 4.0;
    }
}
