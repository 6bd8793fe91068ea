package org.eddycast.engine;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Locale;
import org.eddycast.docs.ValidationLog;
import org.eddycast.forecast.TankBlendCorrelation;
import org.eddycast.particles.Cancellation;
import org.eddycast.scenario.ImpellerType;
import org.eddycast.scenario.TankDesign;
import org.eddycast.transport.Estimate;
import org.eddycast.transport.TankStage;
import org.eddycast.transport.TankStageResult;
import org.eddycast.transport.TankTransport;
import org.junit.jupiter.api.Test;

/**
 * The 95% blend time out of the tank's transport stage beside Grenville's correlation N theta_95 =
 * 5.20 Po^(-1/3) (T/D)^2 (Grenville 1992; Grenville &amp; Nienow 2004, Handbook of Industrial Mixing, ch. 9;
 * constant from memory), for H = T, baffled, turbulent tanks: two impellers (Po 0.3 and 5) at D/T = 0.25
 * and 0.5. The ratios and the fitted exponent of T/D go into the validation record as measured, against the
 * +-50% and 2.0 +- 0.4 the correlation's users would accept; they are findings, not assertions, because no
 * constant is tuned to meet them. Asserted: the speed scaling N theta = constant, which holds exactly because
 * the stage works in the tank's own units.
 */
class TankBlendTimeTest {

    private static final double FIELD_FACTOR = 0.41;

    private static TankStageResult run(TankDesign tank, int particles, double molecular) {
        TankTransport model = TankStudy.model(tank, FIELD_FACTOR, molecular);
        double t = tank.tankDiameter();
        TankStage.Request q = new TankStage.Request(model, new double[] {0, 0, 0.9 * tank.liquidHeight() / t},
                List.of(), List.of(), 0.1, tank.impellerDiameter() / t, 0, particles, 17, t,
                1 / tank.impellerSpeed());
        return TankStage.run(q, 1, 1, 2, f -> { }, new Cancellation());
    }

    @Test
    void blendTimeBesideGrenvilleAcrossImpellersAndSizes() {
        // the two ends of the power-number range: a disc turbine (Po 5, radial) and a hydrofoil (Po 0.3, axial)
        ImpellerType[] types = {ImpellerType.DISC_TURBINE, ImpellerType.HYDROFOIL};
        double[] ratios = {0.25, 0.5};
        for (ImpellerType type : types) {
            double[] theta = new double[ratios.length];
            for (int i = 0; i < ratios.length; i++) {
                TankDesign tank = new TankDesign(2.5, 2.5, ratios[i] * 2.5, 1.0, null, type, null, true);
                Estimate e = run(tank, 4096, 0).blendTime95();
                double grenville = TankBlendCorrelation.blendTime(tank).value();
                theta[i] = e.value();
                double ratio = e.value() / grenville;
                ValidationLog.statistical(String.format(Locale.ROOT, "95%% blend time over Grenville, %s, D/T = %.2f",
                        type.key(), ratios[i]), "Grenville & Nienow 2004, Handbook of Industrial Mixing, ch. 9"
                        + " (constant from memory)", 1, ratio, e.low() / grenville, e.high() / grenville, 0.5, 1.5,
                        "within +-50% of the correlation (a finding when not met; nothing is tuned)",
                        Math.abs(ratio - 1) <= 0.5);
                assertTrue(e.determined() && e.value() > 0, type + " " + ratios[i] + ": " + e);
            }
            double exponent = Math.log(theta[0] / theta[1]) / Math.log(ratios[1] / ratios[0]);
            ValidationLog.statistical("exponent of T/D in the 95% blend time, " + type.key(),
                    "Grenville & Nienow 2004, Handbook of Industrial Mixing, ch. 9: (T/D)^2 (from memory)", 2,
                    exponent, Double.NaN, Double.NaN, 1.6, 2.4, "within 2.0 +- 0.4 (a finding when not met)",
                    Math.abs(exponent - 2) <= 0.4);
        }
    }

    /** Doubling the speed halves every time: the stage works in units of the tank and one revolution. */
    @Test
    void blendTimeScalesExactlyAsOneOverSpeed() {
        TankDesign slow = new TankDesign(2.0, 2.0, 0.67, 1.5, null, ImpellerType.PITCHED_BLADE_TURBINE, null, true);
        TankDesign fast = new TankDesign(2.0, 2.0, 0.67, 3.0, null, ImpellerType.PITCHED_BLADE_TURBINE, null, true);
        TankStageResult a = run(slow, 1024, 0);
        TankStageResult b = run(fast, 1024, 0);
        for (int i = 0; i < 3; i++) {
            double na = 1.5 * a.blendTimes().get(i).value();
            double nb = 3.0 * b.blendTimes().get(i).value();
            assertEquals(na, nb, 1e-12 * na, "N theta at level " + TankStageResult.LEVELS[i]);
        }
    }
}
