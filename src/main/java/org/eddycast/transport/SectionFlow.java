package org.eddycast.transport;

/**
 * The flow in a channel's cross-section as local rules: at distance y across from the left water's edge and
 * relative height zeta above the bed (0 at the bed, 1 at the surface), the mean downstream velocity and the
 * diffusivity per axis, molecular part included. A rectangular section whose rules do not depend on y says so
 * with {@link #uniformAcross()}.
 */
public interface SectionFlow {

    /** Local depth (m), greater than 0 for 0 &lt;= y &lt;= width(). */
    double depth(double y);

    /** Surface width (m). */
    double width();

    /** Mean downstream velocity (m/s). */
    double velocity(double y, double zeta);

    /** Diffusivity of axis 0 (downstream), 1 (across) or 2 (vertical) (m^2/s). */
    double diffusivity(int axis, double y, double zeta);

    /** True when nothing depends on y. */
    boolean uniformAcross();
}
