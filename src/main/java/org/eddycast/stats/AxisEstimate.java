package org.eddycast.stats;

/**
 * The eddy diffusivity along one axis and what follows from it.
 *
 * @param axis                 0, 1 or 2 (x, y, z)
 * @param diffusivity          the late-window estimate with its 95% interval
 * @param lagrangianTimeScale  T_L = (D - D0) / u_i'^2 (NaN where the axis has no velocity)
 * @param settled              false when the earlier window's estimate differs significantly
 * @param earlyWindow          the estimate over the earlier window used by the settling check
 */
public record AxisEstimate(int axis, SlopeEstimate diffusivity, double lagrangianTimeScale, boolean settled,
                           SlopeEstimate earlyWindow) {

    /** "x", "y" or "z". */
    public String axisName() {
        return switch (axis) {
            case 0 -> "x";
            case 1 -> "y";
            default -> "z";
        };
    }
}
