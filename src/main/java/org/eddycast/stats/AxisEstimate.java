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

    /**
     * True when the estimate is a diffusivity at all: a finite, positive number. A negative or undefined slope
     * (a short run, few particles, a shear with nothing to spread) is noise; outputs then say "not determined"
     * and never print it as a result.
     */
    public boolean determined() {
        return Double.isFinite(diffusivity.value()) && diffusivity.value() > 0;
    }

    /** True when the Lagrangian time scale is a finite, positive number of seconds. */
    public boolean timeScaleDetermined() {
        return Double.isFinite(lagrangianTimeScale) && lagrangianTimeScale > 0;
    }

    /** "x", "y" or "z". */
    public String axisName() {
        return switch (axis) {
            case 0 -> "x";
            case 1 -> "y";
            default -> "z";
        };
    }
}
