package org.eddycast.forecast;

import java.util.List;

/**
 * Taylor's single-particle dispersion for stationary homogeneous turbulence with an exponential Lagrangian
 * velocity correlation R_L(s) = exp(-s / T_L): sigma^2(t) = 2 u'^2 T_L [t - T_L (1 - exp(-t / T_L))]
 * (Taylor 1921, Diffusion by continuous movements, Proc. London Math. Soc. s2-20:196). It grows as u'^2 t^2
 * for t much less than T_L (ballistic) and as 2 u'^2 T_L t for t much greater (diffusive, eddy diffusivity
 * u'^2 T_L).
 *
 * <p>For small t/T_L the bracket is evaluated with {@code expm1} so that the ballistic limit keeps full
 * precision. t = 0 gives 0.
 *
 * @param rmsVelocity    u' (m/s), greater than 0
 * @param lagrangianTime T_L (s), greater than 0
 */
public record TaylorDispersion(double rmsVelocity, double lagrangianTime) {

    public TaylorDispersion {
        Checks.positive("rmsVelocity", rmsVelocity, "m/s");
        Checks.positive("lagrangianTime", lagrangianTime, "s");
    }

    /** sigma^2(t) (m^2). */
    public double variance(double t) {
        Checks.nonNegative("t", t, "s");
        double ratio = t / lagrangianTime;
        // t - T_L (1 - e^{-t/T_L}) = T_L (ratio + expm1(-ratio)), accurate as ratio -> 0.
        return 2.0 * rmsVelocity * rmsVelocity * lagrangianTime * lagrangianTime * (ratio + Math.expm1(-ratio));
    }

    /** The ballistic limit u'^2 t^2 (m^2). */
    public double shortTimeVariance(double t) {
        Checks.nonNegative("t", t, "s");
        return rmsVelocity * rmsVelocity * t * t;
    }

    /** The diffusive limit 2 u'^2 T_L t (m^2). */
    public double longTimeVariance(double t) {
        Checks.nonNegative("t", t, "s");
        return 2.0 * eddyDiffusivity() * t;
    }

    /** The long-time eddy diffusivity u'^2 T_L (m^2/s). */
    public double eddyDiffusivity() {
        return rmsVelocity * rmsVelocity * lagrangianTime;
    }

    /** The long-time eddy diffusivity as a handbook estimate. */
    public HandbookEstimate diffusivityEstimate() {
        return new HandbookEstimate("eddy diffusivity (Taylor, exponential correlation)",
                MixingProcess.TURBULENT_DISPERSION, eddyDiffusivity(), "m^2/s", "D = u'^2 T_L",
                Sources.TAYLOR_1921, Confidence.CONFIRMED,
                "stationary homogeneous turbulence, exponential Lagrangian correlation, t much greater than T_L",
                Uncertainty.percent(0, "exact under its assumptions; the uncertainty lies in u' and T_L"),
                List.of());
    }
}
