package org.eddycast.forecast;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/**
 * Taylor's long-time estimate of the eddy diffusivity, D = D0 + u'^2 T_L (Taylor 1921, "Diffusion by continuous
 * movements", Proc. London Math. Soc. s2-20:196-212), with the Lagrangian time scale T_L taken as the Eulerian
 * correlation time tau of the turbulence statistics the user gave or measured.
 *
 * <p>Why tau and not the field stage's own T_L: the field stage defines T_L = (D - D0) / u'^2 from the simulated
 * D, so u'^2 T_L + D0 would return the simulated value by construction and could never disagree. With tau the
 * estimate is an outside one: exact when the Kubo number u' tau / L is small (a particle stays in its eddy while
 * the eddy decorrelates, so its velocity forgets itself on the Eulerian time). At larger Kubo numbers a particle
 * is swept out of its eddy sooner, T_L falls below tau, and the simulated value lies below this estimate; the
 * ratio measures that gap. Frozen turbulence (tau infinite) has no such estimate.
 */
public final class TaylorEstimate {

    /** Kubo number above which the estimate is flagged as outside its limit. */
    public static final double SMALL_KUBO = 0.3;

    private TaylorEstimate() {
    }

    /**
     * @param rmsVelocity     u', rms of one velocity component (m/s)
     * @param correlationTime tau (s), finite and positive
     * @param integralLength  L (m)
     * @param molecular       D0 (m^2/s)
     */
    public static HandbookEstimate longTime(double rmsVelocity, double correlationTime, double integralLength,
                                            double molecular) {
        Checks.positive("rmsVelocity", rmsVelocity, "m/s");
        Checks.positive("correlationTime", correlationTime, "s");
        Checks.positive("integralLength", integralLength, "m");
        double kubo = rmsVelocity * correlationTime / integralLength;
        List<String> warnings = new ArrayList<>();
        if (kubo > SMALL_KUBO) {
            warnings.add(String.format(Locale.ROOT, "Kubo number u' tau / L = %.2f is not small: particles leave"
                    + " their eddies before the eddies decorrelate, so the Lagrangian time scale is shorter than"
                    + " tau and the simulated diffusivity is expected below this estimate", kubo));
        }
        return new HandbookEstimate("eddy diffusivity, Taylor's long-time limit with T_L = tau",
                MixingProcess.TURBULENT_DISPERSION, molecular + rmsVelocity * rmsVelocity * correlationTime, "m^2/s",
                "D = D0 + u'^2 T_L, T_L = tau", Sources.TAYLOR_1921, Confidence.CONFIRMED,
                "long times (t >> T_L), homogeneous stationary turbulence; T_L = tau holds as u' tau / L -> 0",
                Uncertainty.percent(0, "exact in its limit; the gap at finite Kubo number is measured, not"
                        + " allowed for"), warnings);
    }
}
