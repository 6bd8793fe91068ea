package org.eddycast.transport;

import org.eddycast.forecast.ChannelProfiles;
import org.eddycast.scenario.ChannelSection;

/**
 * The section flow a channel's design data give. At each vertical y: the local depth h(y) from the section
 * (depths below {@value #MIN_DEPTH_FRACTION} of the greatest raised to it, so particles can pass the water's
 * edge); the depth-averaged velocity from the survey, or by Manning's formula with the same roughness and
 * slope across the section, U(y) proportional to h(y)^(2/3) (Manning 1891, Trans. Inst. Civil Eng. Ireland
 * 20:161; Chow 1959, Open-Channel Hydraulics, McGraw-Hill: from memory), scaled so the discharge is U A; the
 * local shear velocity proportional to sqrt(h(y)) (the bed stress of uniform flow is rho g h S; common
 * practice), scaled so its mean over the width is the section's u*. Over the depth, {@link ChannelProfiles}:
 * the log law, and the diffusivities from local turbulence plus the molecular diffusivity.
 */
public final class DesignSectionFlow implements SectionFlow {

    /** Shallowest depth as a fraction of the greatest. */
    public static final double MIN_DEPTH_FRACTION = 0.02;

    private static final int VERTICALS = 257;

    private final ChannelSection section;
    private final ChannelProfiles profiles;
    private final double molecular;
    private final double minDepth;
    private final double velocityScale;
    private final double stressScale;

    /**
     * @param section       the cross-section
     * @param meanVelocity  U = Q / A (m/s)
     * @param shearVelocity the section's u* (m/s)
     * @param profiles      the rules over the depth, with the field's factor
     * @param molecular     molecular diffusivity (m^2/s)
     */
    public DesignSectionFlow(ChannelSection section, double meanVelocity, double shearVelocity,
                             ChannelProfiles profiles, double molecular) {
        this.section = section;
        this.profiles = profiles;
        this.molecular = molecular;
        this.minDepth = MIN_DEPTH_FRACTION * section.maxDepth();
        double flow = 0;
        double area = 0;
        double rootDepth = 0;
        for (int a = 0; a < VERTICALS; a++) {
            double y = section.width() * a / (VERTICALS - 1);
            double h = depth(y);
            double weight = a == 0 || a == VERTICALS - 1 ? 0.5 : 1;
            flow += weight * h * rawVelocity(y, h);
            area += weight * h;
            rootDepth += weight * Math.sqrt(h);
        }
        this.velocityScale = meanVelocity * area / flow;
        this.stressScale = shearVelocity * (VERTICALS - 1) / rootDepth;
    }

    private double rawVelocity(double y, double h) {
        return section instanceof ChannelSection.Surveyed s ? s.velocityAt(y) : Math.pow(h, 2.0 / 3);
    }

    @Override
    public double depth(double y) {
        return Math.max(minDepth, section.depthAt(Math.max(0, Math.min(section.width(), y))));
    }

    @Override
    public double width() {
        return section.width();
    }

    /** Depth-averaged velocity at y (m/s). */
    public double depthAveragedVelocity(double y) {
        return velocityScale * rawVelocity(y, depth(y));
    }

    /** Local shear velocity at y (m/s). */
    public double shearVelocity(double y) {
        return stressScale * Math.sqrt(depth(y));
    }

    @Override
    public double velocity(double y, double zeta) {
        return ChannelProfiles.velocity(zeta, depthAveragedVelocity(y), shearVelocity(y));
    }

    @Override
    public double diffusivity(int axis, double y, double zeta) {
        return molecular + profiles.diffusivity(axis, zeta, depth(y), shearVelocity(y));
    }

    @Override
    public boolean uniformAcross() {
        return section instanceof ChannelSection.Rectangular;
    }
}
