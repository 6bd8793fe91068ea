package org.eddycast.forecast;

/**
 * Local turbulence over the depth of an open channel in uniform flow, at relative height zeta = z / h above
 * the bed, for a local shear velocity u* and depth h: the rules the transport stage evaluates at every point
 * of the section.
 * <ul>
 *   <li>mean velocity: the log law u = U + (u* / kappa) (1 + ln zeta), whose depth mean is U (the profile of
 *       Elder 1959, "The dispersion of marked fluid in turbulent shear flow", J. Fluid Mech. 5:544-560), kappa
 *       = {@value #KAPPA} (von Karman's constant, from memory); zeta is floored at {@value #ZETA_FLOOR} where
 *       the logarithm stops being physical;</li>
 *   <li>rms velocities c_i u* e^(-zeta) with c = 2.30, 1.63, 1.27 (Nezu &amp; Nakagawa 1993, Turbulence in
 *       Open-Channel Flows, IAHR Monograph, from memory; fitted for 0.1 &lt; zeta &lt; 0.9 and extended to bed and
 *       surface);</li>
 *   <li>dissipation rate: the log-law equilibrium u*^3 (1 - zeta) / (kappa zeta h) (production = dissipation
 *       with the linear shear stress, derived) near the bed and the outer-region fit E1 (u*^3 / h)
 *       zeta^(-1/2) e^(-3 zeta), E1 = {@value #OUTER_DISSIPATION} (Nezu &amp; Nakagawa 1993, from memory)
 *       above, joined as the power mean (a^4 + b^4)^(1/4): the larger of the two, smoothed where they cross
 *       (near zeta = 0.06), because a kink in the diffusivity would put a jump in the drift;</li>
 *   <li>integral length L = C_eps u'^3 / eps, the same rule the tank route uses, with u' the root of the mean
 *       component variance and C_eps = 0.5 (Sreenivasan 1998, Phys. Fluids 10:528, from memory). It grows
 *       as kappa zeta h near the bed and reaches about 0.29 h at the surface;</li>
 *   <li>turbulent diffusivity per axis K_i = sigma_i^2 T_L with the Lagrangian time scale T_L = F L / u'
 *       (Taylor 1921, "Diffusion by continuous movements", Proc. London Math. Soc. s2-20:196), where F = D /
 *       (u' L) is the factor the random Fourier field gives for the local Kubo number and spectrum. With the
 *       correlation time L / u' at every height the Kubo number is the same everywhere, so one field
 *       simulation serves the whole section.</li>
 * </ul>
 * Not modeled: the damping of vertical motion at the free surface, secondary currents, and the larger
 * horizontal eddies of wide channels; they are why transverse mixing measured in straight channels (about
 * 0.15 h u*, Fischer et al. 1979) exceeds what depth-limited turbulence alone gives.
 */
public final class ChannelProfiles {

    /** Von Karman's constant (from memory: 0.40 to 0.41 in the literature). */
    public static final double KAPPA = 0.41;
    /** Nezu and Nakagawa's rms coefficients (streamwise, spanwise, vertical), from memory. */
    public static final double[] INTENSITY = ChannelRules.INTENSITY_COEFFICIENTS;
    /** Nezu and Nakagawa's outer-region dissipation coefficient E1 (from memory). */
    public static final double OUTER_DISSIPATION = 9.8;
    /** The relative height below which the log law is not evaluated. */
    public static final double ZETA_FLOOR = 1e-4;
    /** The layers at the bed and the surface over which the diffusivity is levelled (fraction of the depth). */
    public static final double WALL_LAYER = 0.02;
    /** The relative height below which the dissipation rate is not evaluated (it grows as 1 / zeta). */
    static final double DISSIPATION_FLOOR = 1e-8;
    /** The root of the mean of the squared rms coefficients: u' / (u* e^(-zeta)). */
    public static final double RMS_COEFFICIENT = Math.sqrt((INTENSITY[0] * INTENSITY[0] + INTENSITY[1] * INTENSITY[1]
            + INTENSITY[2] * INTENSITY[2]) / 3);

    private final double dissipationConstant;
    private final double fieldFactor;

    /**
     * @param dissipationConstant C_eps in L = C_eps u'^3 / eps, greater than 0
     * @param fieldFactor         F = D / (u' L) from the random Fourier field, greater than 0
     */
    public ChannelProfiles(double dissipationConstant, double fieldFactor) {
        Checks.positive("dissipationConstant", dissipationConstant, "");
        Checks.positive("fieldFactor", fieldFactor, "");
        this.dissipationConstant = dissipationConstant;
        this.fieldFactor = fieldFactor;
    }

    public double fieldFactor() {
        return fieldFactor;
    }

    /** Log-law velocity (m/s) at zeta for depth-mean velocity U and shear velocity u*. */
    public static double velocity(double zeta, double meanVelocity, double shearVelocity) {
        return meanVelocity + shearVelocity / KAPPA * (1 + Math.log(Math.max(zeta, ZETA_FLOOR)));
    }

    /** rms velocity of component i (m/s). */
    public static double rms(int component, double zeta, double shearVelocity) {
        return INTENSITY[component] * shearVelocity * Math.exp(-zeta);
    }

    /** Dissipation rate (W/kg) at zeta. */
    public static double dissipation(double zeta, double depth, double shearVelocity) {
        double z = Math.max(zeta, DISSIPATION_FLOOR);
        double scale = shearVelocity * shearVelocity * shearVelocity / depth;
        double wall = (1 - Math.min(z, 1)) / (KAPPA * z);
        double outer = OUTER_DISSIPATION * Math.exp(-3 * z) / Math.sqrt(z);
        double w2 = wall * wall;
        double o2 = outer * outer;
        return scale * Math.sqrt(Math.sqrt(w2 * w2 + o2 * o2));
    }

    /** Integral length (m) at zeta. */
    public double integralLength(double zeta, double depth, double shearVelocity) {
        double u = RMS_COEFFICIENT * shearVelocity * Math.exp(-zeta);
        return dissipationConstant * u * u * u / dissipation(zeta, depth, shearVelocity);
    }

    /**
     * Turbulent diffusivity of axis i (m^2/s) at zeta, without the molecular part. Within
     * {@value #WALL_LAYER} of the depth from the bed and from the surface it is joined to a level value by a
     * parabola with the same value and slope where they meet, so its slope is zero at both: a random
     * displacement reflected at a boundary where the diffusivity's slope is not zero is biased (Ross &amp;
     * Sharples 2004, "Recipe for 1-D Lagrangian particle tracking models in space-varying diffusivity",
     * Limnol. Oceanogr. Methods 2:289, from memory). The layer is thinner than the roughness layer where the log
     * law stops holding anyway.
     */
    public double diffusivity(int axis, double zeta, double depth, double shearVelocity) {
        double b = WALL_LAYER;
        if (zeta < b || zeta > 1 - b) {
            double edge = zeta < b ? b : 1 - b;
            double d = 1e-6;
            double value = rawDiffusivity(axis, edge, depth, shearVelocity);
            double slope = (rawDiffusivity(axis, edge + d, depth, shearVelocity)
                    - rawDiffusivity(axis, edge - d, depth, shearVelocity)) / (2 * d);
            double distance = zeta < b ? b - zeta : zeta - (1 - b);
            double outward = zeta < b ? -slope : slope;
            // K(edge + s) with s the distance past the edge: value + outward s - outward s^2 / (2 b)
            return value + outward * distance - outward * distance * distance / (2 * b);
        }
        return rawDiffusivity(axis, zeta, depth, shearVelocity);
    }

    private double rawDiffusivity(int axis, double zeta, double depth, double shearVelocity) {
        double u = RMS_COEFFICIENT * shearVelocity * Math.exp(-zeta);
        double sigma = rms(axis, zeta, shearVelocity);
        return fieldFactor * sigma * sigma * integralLength(zeta, depth, shearVelocity) / u;
    }

    /** Depth mean of the turbulent diffusivity of axis i over 0 &lt; zeta &lt; 1 (m^2/s), by the midpoint rule. */
    public double depthMeanDiffusivity(int axis, double depth, double shearVelocity) {
        int n = 4000;
        double sum = 0;
        for (int j = 0; j < n; j++) {
            sum += diffusivity(axis, (j + 0.5) / n, depth, shearVelocity);
        }
        return sum / n;
    }
}
