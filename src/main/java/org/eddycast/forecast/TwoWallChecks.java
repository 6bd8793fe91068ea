package org.eddycast.forecast;

/** Argument checks shared by the two series for a gap between two reflecting walls. */
final class TwoWallChecks {

    private TwoWallChecks() {
    }

    static void check(double lower, double upper, double release, double diffusivity, double tolerance) {
        Checks.finite("lower wall", lower, "m");
        Checks.finite("upper wall", upper, "m");
        if (!(upper > lower)) {
            throw new IllegalArgumentException("upper wall must be greater than the lower wall (" + lower
                    + " m); got " + upper);
        }
        Checks.within("release", release, lower, upper, "m");
        Checks.positive("diffusivity", diffusivity, "m^2/s");
        Checks.openFraction("tolerance", tolerance);
    }
}
