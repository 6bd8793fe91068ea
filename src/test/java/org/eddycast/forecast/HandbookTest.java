package org.eddycast.forecast;

import org.eddycast.docs.ValidationLog;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.eddycast.scenario.ImpellerType;
import org.eddycast.scenario.TankDesign;
import org.junit.jupiter.api.Test;

class HandbookTest {

    private static final double H = 1.5;
    private static final double U_STAR = 0.05;

    @Test
    void verticalMixingIsKappaHUStarOverSix() {
        // Fischer, List, Koh, Imberger & Brooks 1979, Mixing in Inland and Coastal Waters, ch. 5 (derived):
        // with the log law du/dz = u* / (kappa z) and the linear stress tau = rho u*^2 (1 - z/h), the eddy
        // viscosity is nu_t = tau / (rho du/dz) = kappa u* z (1 - z/h). Taking eps_z = nu_t (Reynolds analogy)
        // and averaging over the depth gives kappa u* h * integral_0^1 s (1 - s) ds = kappa h u* / 6, 0.0667 h u*
        // with kappa = 0.4. The depth average is done here by quadrature; 0.067 is that value rounded, so 1%.
        double byQuadrature = Quadrature.integrate(z -> 0.4 * U_STAR * z * (1 - z / H), 0, H, 4) / H;
        assertEquals(0.4 * H * U_STAR / 6.0, byQuadrature, 1e-12);
        HandbookEstimate estimate = ChannelHandbook.verticalMixing(H, U_STAR);
        assertEquals(byQuadrature, estimate.value(), 0.01 * byQuadrature);
        assertEquals(Confidence.DERIVED, estimate.confidence());
    }

    @Test
    void transverseAndElderCoefficients() {
        // Fischer et al. 1979, ch. 5 (from memory): 0.15 h u* straight, range 0.1-0.2; 0.6 h u* +-50% natural.
        HandbookEstimate straight = ChannelHandbook.transverseMixingStraight(H, U_STAR);
        assertEquals(0.15 * 1.5 * 0.05, straight.value(), 1e-15);
        // The stated band must hold the published range 0.1 to 0.2 h u* (to within rounding of 33%).
        assertEquals(0.1 * H * U_STAR, straight.low(), 0.01 * H * U_STAR);
        assertEquals(0.2 * H * U_STAR, straight.high(), 0.01 * H * U_STAR);
        HandbookEstimate natural = ChannelHandbook.transverseMixingNatural(H, U_STAR);
        assertEquals(0.045, natural.value(), 1e-15);
        assertEquals(0.0225, natural.low(), 1e-15);
        assertEquals(0.0675, natural.high(), 1e-15);
        // Elder 1959, J. Fluid Mech. 5:544 (constant from memory): K = 5.93 h u* = 0.44475 m^2/s here.
        assertEquals(0.44475, ChannelHandbook.elderLongitudinal(H, U_STAR).value(), 1e-12);
    }

    @Test
    void fischerLongitudinalOnAWorkedExample() {
        // Fischer 1975, J. Environ. Eng. Div. ASCE 101:453 (from memory): K = 0.011 U^2 W^2 / (h u*).
        // U = 0.5 m/s, W = 30 m, h = 1.5 m, u* = 0.05 m/s: 0.011 * 0.25 * 900 / 0.075 = 33.0 m^2/s,
        // within a factor of about 4: 8.25 to 132 m^2/s.
        HandbookEstimate k = ChannelHandbook.fischerLongitudinal(0.5, 30.0, H, U_STAR);
        assertEquals(33.0, k.value(), 1e-9);
        assertEquals(8.25, k.low(), 1e-9);
        assertEquals(132.0, k.high(), 1e-9);
        assertTrue(k.withinValidity());
        assertEquals(List.of(), k.warnings());
        // A narrow channel carries a warning on every estimate.
        List<HandbookEstimate> narrow = ChannelHandbook.all(2.0, 6.0, 0.5, U_STAR);
        assertEquals(5, narrow.size());
        narrow.forEach(e -> assertEquals(1, e.warnings().size(), e.name()));
    }

    @Test
    void grenvilleBlendTimeOnAWorkedExample() {
        // Grenville 1992; Grenville & Nienow 2004, Handbook of Industrial Mixing, ch. 9 (from memory):
        // N theta_95 = 5.20 Po^(-1/3) (T/D)^2. T/D = 3, Po = 5: 5.20 * 0.584804 * 9 = 27.369; N = 3 rev/s
        // gives theta_95 = 9.123 s. Re = N D^2 / nu = 3 * (1/3)^2 / 1.0034e-6 = 3.32e5, Re Po^(1/3) = 5.7e5,
        // well inside the turbulent range: no warning.
        HandbookEstimate theta = TankBlendCorrelation.blendTime(3.0, 5.0, 1.0, 1.0 / 3.0, 1.0, 1.0034e-6, true, 1);
        ValidationLog.exact("95% blend time correlation, N theta_95 at T/D = 3, Po = 5",
                "Grenville 1992; Grenville & Nienow 2004, Handbook of Industrial Mixing, ch. 9 (from memory)", 27.369,
                3.0 * theta.value(), 1e-3, "worked value 5.20 Po^(-1/3) (T/D)^2 to 1e-3");
        assertEquals(27.369, 3.0 * theta.value(), 1e-3);
        assertTrue(theta.withinValidity(), theta.warnings().toString());
        assertEquals(MixingProcess.TANK_BLEND_TIME, theta.process());
    }

    @Test
    void grenvilleReportsEachBrokenCondition() {
        // Validity of the correlation (Grenville & Nienow 2004, from memory): H = T, baffled, one impeller,
        // Re Po^(1/3) > 6370. A slow, tall, unbaffled, two-impeller case in a viscous liquid breaks all four.
        HandbookEstimate theta = TankBlendCorrelation.blendTime(0.5, 5.0, 1.0, 0.3, 2.0, 1e-4, false, 2);
        assertEquals(4, theta.warnings().size(), theta.warnings().toString());
        assertEquals(5.20 * Math.cbrt(0.2) * (1 / 0.09) / 0.5, theta.value(), 1e-9);
    }

    @Test
    void grenvilleFromADesignUsesTheTypicalPowerNumber() {
        TankDesign design = new TankDesign(1.0, 1.0, 1.0 / 3.0, 3.0, null, ImpellerType.DISC_TURBINE, null, true);
        HandbookEstimate theta = TankBlendCorrelation.blendTime(design);
        assertEquals(27.369 / 3.0, theta.value(), 1e-3);
    }

    @Test
    void taylorDispersionClosedFormMatchesItsIntegral() {
        // Taylor 1921, Diffusion by continuous movements, Proc. London Math. Soc. s2-20:196:
        // sigma^2(t) = 2 u'^2 integral_0^t (t - s) R_L(s) ds, R_L = exp(-s/T_L); the closed form is checked
        // against the integral by quadrature, and against the two limits u'^2 t^2 and 2 u'^2 T_L (t - T_L).
        TaylorDispersion taylor = new TaylorDispersion(0.3, 2.0);
        for (double t : new double[] {0.1, 1.0, 5.0, 30.0}) {
            double integral = 2 * 0.09 * Quadrature.integrate(s -> (t - s) * Math.exp(-s / 2.0), 0, t, 20);
            assertEquals(integral, taylor.variance(t), 1e-12 * integral);
        }
        double early = 1e-4;
        // Ballistic: sigma^2 / (u'^2 t^2) = 1 - t / (3 T_L) + ..., so 1e-4 of T_L agrees to 2e-5.
        assertEquals(1.0, taylor.variance(early) / taylor.shortTimeVariance(early), 2e-5);
        double late = 60.0;
        // Diffusive: the remainder is 2 u'^2 T_L^2 exp(-t/T_L), e^-30 here.
        assertEquals(2 * 0.09 * 2.0 * (late - 2.0), taylor.variance(late), 1e-12);
        assertEquals(0.18, taylor.eddyDiffusivity(), 1e-15);
        assertEquals(taylor.longTimeVariance(late), 2 * 0.18 * late, 1e-12);
    }
}
