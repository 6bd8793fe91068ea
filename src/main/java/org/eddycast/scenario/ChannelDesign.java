package org.eddycast.scenario;

/**
 * A straight open channel in uniform flow as the user describes it, in SI units. Plain data: the rules that
 * turn it into turbulence statistics live in the forecast package.
 *
 * <p>Exactly one of {@code bedSlope}, {@code shearVelocity} and {@code manningN} is given (the others null).
 * {@code kinematicViscosity} may be null for water at 20 C (1.0034e-6 m^2/s, IAPWS 2008).
 *
 * @param depth              h (m), greater than 0
 * @param width              W (m), greater than 0
 * @param meanVelocity       U (m/s), greater than 0
 * @param bedSlope           S (m/m), greater than 0 and less than 1, or null
 * @param shearVelocity      u* (m/s), greater than 0, or null
 * @param manningN           Manning's n (s/m^(1/3)), greater than 0 and less than 1, or null
 * @param kinematicViscosity nu (m^2/s), greater than 0, or null for water at 20 C
 * @param section            the cross-section's shape; null for a rectangle {@code width} by {@code depth}.
 *                           For other shapes {@code width} is the surface width and {@code depth} the greatest
 *                           depth
 */
public record ChannelDesign(double depth, double width, double meanVelocity, Double bedSlope,
                            Double shearVelocity, Double manningN, Double kinematicViscosity,
                            ChannelSection section) {

    /** A rectangular channel. */
    public ChannelDesign(double depth, double width, double meanVelocity, Double bedSlope, Double shearVelocity,
                         Double manningN, Double kinematicViscosity) {
        this(depth, width, meanVelocity, bedSlope, shearVelocity, manningN, kinematicViscosity, null);
    }

    public ChannelDesign {
        DesignChecks.positive("flow.depth", depth, "m");
        DesignChecks.positive("flow.width", width, "m");
        DesignChecks.positive("flow.meanVelocity", meanVelocity, "m/s");
        int given = (bedSlope != null ? 1 : 0) + (shearVelocity != null ? 1 : 0) + (manningN != null ? 1 : 0);
        if (given != 1) {
            throw new IllegalArgumentException("flow: give exactly one of bedSlope (m/m), shearVelocity (m/s)"
                    + " or manningN (s/m^(1/3)); got " + given);
        }
        if (bedSlope != null) {
            DesignChecks.openRange("flow.bedSlope", bedSlope, 0, 1, "m/m");
        }
        if (shearVelocity != null) {
            DesignChecks.positive("flow.shearVelocity", shearVelocity, "m/s");
        }
        if (manningN != null) {
            DesignChecks.openRange("flow.manningN", manningN, 0, 1, "s/m^(1/3)");
        }
        if (kinematicViscosity == null) {
            kinematicViscosity = TankDesign.WATER_20C_KINEMATIC_VISCOSITY;
        }
        DesignChecks.positive("flow.kinematicViscosity", kinematicViscosity, "m^2/s");
        if (section == null) {
            section = new ChannelSection.Rectangular(width, depth);
        }
    }

    /** A channel described by its bed slope, water at 20 C. */
    public static ChannelDesign withBedSlope(double depth, double width, double meanVelocity, double bedSlope) {
        return new ChannelDesign(depth, width, meanVelocity, bedSlope, null, null, null);
    }

    /** A channel described by its shear velocity, water at 20 C. */
    public static ChannelDesign withShearVelocity(double depth, double width, double meanVelocity,
                                                  double shearVelocity) {
        return new ChannelDesign(depth, width, meanVelocity, null, shearVelocity, null, null);
    }

    /** A channel described by Manning's n, water at 20 C. */
    public static ChannelDesign withManningN(double depth, double width, double meanVelocity, double manningN) {
        return new ChannelDesign(depth, width, meanVelocity, null, null, manningN, null);
    }

    /** Hydraulic radius A / P (m): W h / (W + 2 h) for a rectangle. */
    public double hydraulicRadius() {
        return section.hydraulicRadius();
    }

    /** Mean depth A / W (m): the depth for a rectangle. */
    public double meanDepth() {
        return section.meanDepth();
    }

    /** Discharge U A (m^3/s). */
    public double discharge() {
        return meanVelocity * section.area();
    }
}
