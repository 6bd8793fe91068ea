package org.eddycast.forecast;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Map;

import org.eddycast.scenario.ChannelDesign;
import org.eddycast.scenario.Derivation;
import org.eddycast.scenario.TurbulenceStatistics;
import org.junit.jupiter.api.Test;

class ChannelRulesTest {

    private static final double G = 9.80665;

    @Test
    void slopeGivesSqrtGhSInAWideChannel() {
        // Chow 1959, Open-Channel Hydraulics (from memory): u* = sqrt(g R S), R -> h when W >> h.
        // h = 1 m, W = 1000 m, S = 1e-4: sqrt(9.80665 * 1 * 1e-4) = 0.031316 m/s; R = 0.998 h shifts it by 0.1%.
        ChannelDesign wide = ChannelDesign.withBedSlope(1.0, 1000.0, 0.5, 1e-4);
        double uStar = ChannelRules.shearVelocity(wide).value();
        assertEquals(Math.sqrt(G * 1.0 * 1e-4), uStar, 1.5e-3 * uStar);
        assertEquals(1000.0 / 1002.0, wide.hydraulicRadius(), 1e-12);
    }

    @Test
    void manningRouteAgreesWithTheSlopeRoute() {
        // Manning 1891 (from memory): U = R^(2/3) S^(1/2) / n. Pick n and S, compute U from Manning, then the
        // Manning route for u* must equal sqrt(g R S).
        double h = 2.0;
        double w = 20.0;
        double n = 0.035;
        double s = 5e-4;
        double r = w * h / (w + 2 * h);
        double u = Math.pow(r, 2.0 / 3.0) * Math.sqrt(s) / n;
        double fromManning = ChannelRules.shearVelocity(ChannelDesign.withManningN(h, w, u, n)).value();
        double fromSlope = ChannelRules.shearVelocity(ChannelDesign.withBedSlope(h, w, u, s)).value();
        assertEquals(fromSlope, fromManning, 1e-12);
    }

    @Test
    void nezuNakagawaDepthAveragesByQuadrature() {
        // Nezu & Nakagawa 1993, Turbulence in Open-Channel Flows (from memory): u'/u* = 2.30 e^(-y/h),
        // spanwise 1.63 e^(-y/h), vertical 1.27 e^(-y/h). The depth average used is the root of the mean
        // variance over 0 < y/h < 1, computed here by quadrature: 1.5123, 1.0718, 0.8351 u*.
        double uStar = 0.06;
        ChannelDesign design = ChannelDesign.withShearVelocity(1.5, 30.0, 0.8, uStar);
        TurbulenceStatistics s = ChannelRules.STANDARD.model(design).statistics();
        double[] c = {2.30, 1.63, 1.27};
        double meanVariance = 0.0;
        for (int i = 0; i < 3; i++) {
            double ci = c[i];
            double variance = Quadrature.integrate(y -> Math.pow(ci * Math.exp(-y), 2), 0, 1, 4);
            assertEquals(Math.sqrt(variance) * uStar, s.componentRms()[i], 1e-12);
            meanVariance += variance / 3.0;
        }
        assertEquals(1.5123, s.componentRms()[0] / uStar, 1e-4);
        // u' of the isotropic field: root of the mean component variance, 1.1737 u*.
        assertEquals(Math.sqrt(meanVariance) * uStar, s.rmsVelocity(), 1e-12);
        assertEquals(1.1737, s.rmsVelocity() / uStar, 1e-4);
    }

    @Test
    void scalesAndDissipationFollowTheStatedRules() {
        ChannelDesign design = ChannelDesign.withShearVelocity(1.5, 30.0, 0.8, 0.06);
        TurbulenceStatistics s = ChannelRules.STANDARD.model(design).statistics();
        assertEquals(0.75, s.integralLength(), 1e-15);
        assertEquals(0.75 / s.rmsVelocity(), s.correlationTime(), 1e-15);
        assertEquals(0.8, s.meanVelocity(), 0.0);
        // Uniform flow: the work of gravity g S U is all dissipated; with u*^2 = g R S, eps = u*^2 U / R.
        double r = 30.0 * 1.5 / 33.0;
        assertEquals(0.0036 * 0.8 / r, s.dissipationRate(), 1e-15);
        Map<String, Derivation> steps = TankRulesTest.byQuantity(s);
        for (String q : new String[] {"hydraulic radius", "shear velocity", "Froude number", "Reynolds number",
                "rms velocity", "integral length", "correlation time", "mean dissipation rate", "Kolmogorov length",
                "spectrum band ratio", "mean velocity", "dimensions", "kinematic viscosity"}) {
            assertTrue(steps.containsKey(q), q);
        }
    }

    @Test
    void narrowFastChannelIsWarnedAbout() {
        // W/h = 3 (< 5, not wide) and Fr = 3 / sqrt(9.80665 * 1) = 0.96 (> 0.8, near critical).
        ModeledTurbulence model = ChannelRules.STANDARD.model(ChannelDesign.withBedSlope(1.0, 3.0, 3.0, 0.01));
        assertEquals(2, model.warnings().size(), model.warnings().toString());
        assertTrue(ChannelRules.STANDARD.model(ChannelDesign.withBedSlope(1.0, 30.0, 0.5, 1e-4)).warnings()
                .isEmpty());
    }

    @Test
    void badDesignNamesTheFieldTheUnitAndTheRange() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> new ChannelDesign(1.0, 10.0, 0.5, 1e-4, 0.05, null, null));
        assertEquals("flow: give exactly one of bedSlope (m/m), shearVelocity (m/s) or manningN (s/m^(1/3));"
                + " got 2", e.getMessage());
        e = assertThrows(IllegalArgumentException.class, () -> ChannelDesign.withBedSlope(-1.0, 10.0, 0.5, 1e-4));
        assertEquals("flow.depth must be > 0 m; got -1", e.getMessage());
        e = assertThrows(IllegalArgumentException.class, () -> ChannelDesign.withManningN(1.0, 10.0, 0.5, 2.0));
        assertEquals("flow.manningN must be > 0 and < 1 s/m^(1/3); got 2", e.getMessage());
    }
}
