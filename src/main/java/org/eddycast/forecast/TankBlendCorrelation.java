package org.eddycast.forecast;

import java.util.ArrayList;
import java.util.List;

import org.eddycast.scenario.TankDesign;

/**
 * The 95% blend-time correlation for turbulent stirred tanks, N theta_95 = 5.20 Po^(-1/3) (T/D)^2
 * (Grenville 1992, PhD thesis, Cranfield Institute of Technology; Grenville &amp; Nienow 2004, Blending of
 * miscible liquids, in Handbook of Industrial Mixing, Wiley, ch. 9; from memory).
 *
 * <p>Validity, each reported as a warning when broken: liquid height equal to the tank diameter (we allow
 * H/T from 0.9 to 1.1), baffled, a single impeller, and turbulent flow, Re Po^(1/3) &gt; 6370. The value is
 * still computed outside the range so that outputs can show it with its warning.
 */
public final class TankBlendCorrelation {

    /** Lower limit of Re Po^(1/3) for the turbulent correlation (from memory). */
    public static final double TURBULENT_LIMIT = 6370.0;

    private TankBlendCorrelation() {
    }

    /**
     * theta_95 (s).
     *
     * @param impellerSpeed      N (rev/s)
     * @param powerNumber        Po
     * @param tankDiameter       T (m)
     * @param impellerDiameter   D (m)
     * @param liquidHeight       H (m)
     * @param kinematicViscosity nu (m^2/s)
     * @param baffled            wall baffles fitted
     * @param impellers          number of impellers on the shaft
     */
    public static HandbookEstimate blendTime(double impellerSpeed, double powerNumber, double tankDiameter,
                                             double impellerDiameter, double liquidHeight,
                                             double kinematicViscosity, boolean baffled, int impellers) {
        Checks.positive("impellerSpeed", impellerSpeed, "rev/s");
        Checks.positive("powerNumber", powerNumber, "");
        Checks.positive("tankDiameter", tankDiameter, "m");
        Checks.positive("impellerDiameter", impellerDiameter, "m");
        Checks.positive("liquidHeight", liquidHeight, "m");
        Checks.positive("kinematicViscosity", kinematicViscosity, "m^2/s");
        double ratio = tankDiameter / impellerDiameter;
        double theta = 5.20 * Math.cbrt(1.0 / powerNumber) * ratio * ratio / impellerSpeed;
        List<String> warnings = new ArrayList<>();
        double aspect = liquidHeight / tankDiameter;
        if (aspect < 0.9 || aspect > 1.1) {
            warnings.add(String.format("H/T = %.3g: the correlation was fitted for H = T", aspect));
        }
        if (!baffled) {
            warnings.add("the tank has no baffles: the correlation was fitted for baffled tanks");
        }
        if (impellers != 1) {
            warnings.add(impellers + " impellers: the correlation was fitted for a single impeller");
        }
        double turbulence = impellerSpeed * impellerDiameter * impellerDiameter / kinematicViscosity
                * Math.cbrt(powerNumber);
        if (turbulence <= TURBULENT_LIMIT) {
            warnings.add(String.format("Re Po^(1/3) = %.4g is not above %.0f: not fully turbulent, outside the"
                    + " correlation", turbulence, TURBULENT_LIMIT));
        }
        return new HandbookEstimate("95% blend time", MixingProcess.TANK_BLEND_TIME, theta, "s",
                "N theta_95 = 5.20 Po^(-1/3) (T/D)^2", Sources.GRENVILLE_NIENOW_2004, Confidence.FROM_MEMORY,
                "H = T, baffled, single impeller, Re Po^(1/3) > 6370",
                Uncertainty.percent(30, "our allowance for the scatter of blend-time data"), warnings);
    }

    /** theta_95 for a tank design with one impeller, using the power number of {@link TankRules}. */
    public static HandbookEstimate blendTime(TankDesign design) {
        return blendTime(design.impellerSpeed(), TankRules.powerNumber(design).value(), design.tankDiameter(),
                design.impellerDiameter(), design.liquidHeight(), design.kinematicViscosity(), design.baffled(), 1);
    }
}
