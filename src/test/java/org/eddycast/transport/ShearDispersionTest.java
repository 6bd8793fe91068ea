package org.eddycast.transport;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.function.DoubleUnaryOperator;
import org.eddycast.docs.ValidationLog;
import org.junit.jupiter.api.Test;

/**
 * The longitudinal dispersion coefficient that comes out of the transport stage's particles, against exact
 * shear-dispersion results. Each check passes when the exact value lies inside the particles' 95% interval
 * (over 32 independent blocks, Student's t), so the tolerance is the estimate's own standard error.
 */
class ShearDispersionTest {

    /**
     * Laminar flow between parallel plates, gap h: K = D0 + h^2 U^2 / (210 D0) (Aris 1956, "On the dispersion of
     * a solute in a fluid flowing through a tube", Proc. R. Soc. A 235:67-77).
     */
    @Test
    void laminarFlowBetweenPlatesMatchesTaylorAris() {
        double u = 10;
        double d0 = 1;
        double h = 1;
        double exact = d0 + h * h * u * u / (210 * d0);
        Estimate k = laminar(zeta -> 6 * u * (zeta - zeta * zeta), u, d0, h);
        check("laminar flow between parallel plates (Taylor-Aris)",
                "Aris 1956, Proc. R. Soc. A 235:67: K = D0 + h^2 U^2 / (210 D0)", exact, k);
    }

    /**
     * A laminar film of depth h on a bed, free surface above: half of the plate flow of gap 2h, so
     * K = D0 + 2 h^2 U^2 / (105 D0) (derived from Aris 1956 with the gap 2h: (2h)^2 / 210 = 2 h^2 / 105).
     */
    @Test
    void laminarFilmMatchesHalfOfTheSymmetricPlateFlow() {
        double u = 5;
        double d0 = 1;
        double h = 1;
        double exact = d0 + 2 * h * h * u * u / (105 * d0);
        Estimate k = laminar(zeta -> 1.5 * u * (2 * zeta - zeta * zeta), u, d0, h);
        check("laminar open-channel film (Taylor-Aris, half of a plate flow of gap 2h)",
                "derived from Aris 1956, Proc. R. Soc. A 235:67: K = D0 + 2 h^2 U^2 / (105 D0)", exact, k);
    }

    private static Estimate laminar(DoubleUnaryOperator profile, double u, double d0, double h) {
        ChannelTransport model = new ChannelTransport(SectionRuns.section(1, h,
                (y, zeta) -> profile.applyAsDouble(zeta), (y, z) -> d0, (y, z) -> d0, (y, z) -> d0, true), u);
        // The slowest mode over the depth decays as exp(-pi^2 D0 t / h^2): after t = 0.5 h^2 / D0 it is e^-5.
        TransportSettings s = new TransportSettings(32, 2560, 2e-3, 2000, 20, 7);
        CloudMoments m = SectionRuns.run(model, SectionRuns.evenlyOverSection(model), s, 2);
        Estimate k = DispersionEstimator.halfSlope(m, 0, 0.5, 4.0);
        assertTrue(k.high() - k.low() <= 0.03 * k.value(), "interval at most 3% wide: " + k);
        return k;
    }

    /**
     * Elder's channel: the log law u = U + (u* / kappa)(1 + ln zeta), K_z = kappa u* z (1 - z/h) and K_x = K_z give
     * K = (I / kappa^3 + kappa / 6) h u* with I = int_0^1 zeta ln^2 zeta / (1 - zeta) dzeta (Elder 1959,
     * J. Fluid Mech. 5:544; his 0.404 from memory). The test recomputes I by quadrature of Taylor's
     * shear-dispersion integral K = int (1/K_z) (int_0^zeta (u - U) dzeta')^2 dzeta, with int_0^zeta (1 + ln s) ds
     * = zeta ln zeta.
     */
    @Test
    void loglawChannelMatchesElder() {
        double kappa = 0.41;
        double integral = quadrature(z -> z * Math.log(z) * Math.log(z) / (1 - z));
        assertEquals(0.404, integral, 0.0015, "Elder's constant by quadrature (0.404 from memory)");
        double exact = integral / Math.pow(kappa, 3) + kappa / 6;
        ChannelTransport model = new ChannelTransport(SectionRuns.section(1, 1,
                (y, zeta) -> 3 + (1 + Math.log(Math.max(zeta, 1e-6))) / kappa,
                (y, z) -> kappa * z * (1 - z), (y, z) -> 0.1, (y, z) -> kappa * z * (1 - z), true), 3);
        TransportSettings s = new TransportSettings(32, 256, 0.01, 10000, 50, 11);
        CloudMoments m = SectionRuns.run(model, SectionRuns.evenlyOverSection(model), s, 2);
        Estimate k = DispersionEstimator.halfSlope(m, 0, 40, 100);
        check("Elder's log-law channel, K_L / (h u*)",
                "Elder 1959, J. Fluid Mech. 5:544; constant recomputed by quadrature of Taylor's integral", exact, k);
    }

    /**
     * Fischer's triple integral for a lateral profile: with uniform depth and transverse diffusivity eps_t,
     * K = (1 / (W eps_t)) int_0^W (int_0^y u''(y') dy')^2 dy (Fischer 1967, "The mechanics of dispersion in
     * natural streams", J. Hydraul. Div. ASCE 93(6):187-216; form from memory), evaluated here by quadrature for
     * u'' = U1 cos(pi y / W). The depth is shallow and well mixed, so the lateral shear dominates.
     */
    @Test
    void lateralShearMatchesFischersTripleIntegral() {
        double w = 1;
        double eps = 0.01;
        double u1 = 0.5;
        double inner = quadrature(y -> Math.pow(u1 * w / Math.PI * Math.sin(Math.PI * y), 2));
        double exact = inner * w / (w * eps);
        ChannelTransport model = new ChannelTransport(SectionRuns.section(w, 0.05,
                (y, zeta) -> 1 + u1 * Math.cos(Math.PI * y / w), (y, z) -> 0, (y, z) -> eps, (y, z) -> 0.01, false),
                1);
        TransportSettings s = new TransportSettings(32, 512, 0.05, 1200, 5, 5);
        CloudMoments m = SectionRuns.run(model, SectionRuns.evenlyOverSection(model), s, 2);
        Estimate k = DispersionEstimator.halfSlope(m, 0, 20, 60);
        boolean within = Math.abs(k.value() - exact) <= 0.10 * exact;
        ValidationLog.statistical("Fischer's triple integral, lateral shear (cosine profile)",
                "Fischer 1967, J. Hydraul. Div. ASCE 93(6):187 (form from memory); quadrature in the test", exact,
                k.value(), k.low(), k.high(), 0.9 * exact, 1.1 * exact, "within 10% of the quadrature", within);
        assertTrue(within, k + " against " + exact);
    }

    private static void check(String name, String source, double exact, Estimate k) {
        boolean inside = k.low() <= exact && exact <= k.high();
        ValidationLog.statistical(name, source, exact, k.value(), k.low(), k.high(), k.low(), k.high(),
                "exact value inside the 95% interval over 32 blocks", inside);
        assertTrue(inside, k + " against " + exact);
    }

    /** Composite Gauss-Legendre (4 points per panel, 4000 panels) over (0, 1). */
    static double quadrature(DoubleUnaryOperator f) {
        double[] x = {-0.8611363115940526, -0.3399810435848563, 0.3399810435848563, 0.8611363115940526};
        double[] w = {0.3478548451374538, 0.6521451548625461, 0.6521451548625461, 0.3478548451374538};
        int panels = 4000;
        double sum = 0;
        for (int p = 0; p < panels; p++) {
            double a = (double) p / panels;
            double half = 0.5 / panels;
            for (int i = 0; i < 4; i++) {
                sum += w[i] * half * f.applyAsDouble(a + half * (1 + x[i]));
            }
        }
        return sum;
    }
}
