package org.eddycast.forecast;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
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
    void midDepthStatisticsFollowTheStatedRules() {
        // The field stage simulates the turbulence at mid-depth, z/h = 0.5: Nezu & Nakagawa 1993, Turbulence in
        // Open-Channel Flows (from memory): u'/u* = 2.30 e^(-z/h), spanwise 1.63 e^(-z/h), vertical 1.27 e^(-z/h).
        double uStar = 0.06;
        double h = 1.5;
        ChannelDesign design = ChannelDesign.withShearVelocity(h, 30.0, 0.8, uStar);
        TurbulenceStatistics s = ChannelRules.STANDARD.model(design).statistics();
        double[] c = {2.30, 1.63, 1.27};
        double meanVariance = 0.0;
        for (int i = 0; i < 3; i++) {
            assertEquals(c[i] * Math.exp(-0.5) * uStar, s.componentRms()[i], 1e-12);
            meanVariance += Math.pow(c[i] * Math.exp(-0.5) * uStar, 2) / 3.0;
        }
        assertEquals(Math.sqrt(meanVariance), s.rmsVelocity(), 1e-12);
        // Dissipation at mid-depth: the log-law equilibrium u*^3 (1 - z/h) / (kappa z) = 2.4390 u*^3 / h and Nezu &
        // Nakagawa's 9.8 (z/h)^(-1/2) e^(-3 z/h) u*^3 / h = 3.0921 u*^3 / h, joined as (a^4 + b^4)^(1/4) = 3.3559;
        // L = C_eps u'^3 / eps with C_eps = 0.5 (Sreenivasan 1998, from memory).
        double wall = 0.5 / (0.41 * 0.5);
        double outer = 9.8 * Math.exp(-1.5) / Math.sqrt(0.5);
        double eps = Math.pow(Math.pow(wall, 4) + Math.pow(outer, 4), 0.25) * uStar * uStar * uStar / h;
        assertEquals(3.3559, eps * h / Math.pow(uStar, 3), 1e-4);
        double length = 0.5 * Math.pow(s.rmsVelocity(), 3) / eps;
        assertEquals(length, s.integralLength(), 1e-12 * length);
        assertEquals(length / s.rmsVelocity(), s.correlationTime(), 1e-12);
    }

    @Test
    void scalesAndDissipationFollowTheStatedRules() {
        ChannelDesign design = ChannelDesign.withShearVelocity(1.5, 30.0, 0.8, 0.06);
        TurbulenceStatistics s = ChannelRules.STANDARD.model(design).statistics();
        assertEquals(0.8, s.meanVelocity(), 0.0);
        Map<String, Derivation> steps = TankRulesTest.byQuantity(s);
        for (String q : new String[] {"hydraulic radius", "shear velocity", "Froude number", "Reynolds number",
                "rms velocity at mid-depth", "integral length at mid-depth", "correlation time",
                "section-mean dissipation rate", "Kolmogorov length", "spectrum band ratio", "mean velocity",
                "dimensions", "kinematic viscosity"}) {
            assertTrue(steps.containsKey(q), q);
        }
        // Uniform flow: the work of gravity g S U is all dissipated; with u*^2 = g R S, eps = u*^2 U / R.
        double r = 30.0 * 1.5 / 33.0;
        assertEquals(0.0036 * 0.8 / r, steps.get("section-mean dissipation rate").value(), 1e-15);
    }

    @Test
    void narrowFastChannelIsWarnedAbout() {
        // W/h = 3 (< 5, not wide) and Fr = 3 / sqrt(9.80665 * 1) = 0.96 (> 0.8, near critical).
        ModeledTurbulence model = ChannelRules.STANDARD.model(ChannelDesign.withBedSlope(1.0, 3.0, 3.0, 0.01));
        assertEquals(2, model.warnings().size(), model.warnings().toString());
        assertTrue(ChannelRules.STANDARD.model(ChannelDesign.withBedSlope(1.0, 30.0, 0.5, 1e-4)).warnings()
                .isEmpty());
    }

    private static List<String> warningsAbout(ChannelDesign design, String subject) {
        return ChannelRules.STANDARD.model(design).warnings().stream().filter(w -> w.contains(subject)).toList();
    }

    /**
     * Each warning just below and just above its threshold (1% either side), with its text: Froude number
     * U / sqrt(g h) above 0.8 (common practice), W/h below 5 (Fischer et al. 1979, Mixing in Inland and Coastal
     * Waters, ch. 5, from memory), Reynolds number U R / nu below 2000 (Chow 1959, Open-Channel Hydraulics,
     * from memory).
     */
    @Test
    void froudeWarningEitherSideOfItsThreshold() {
        double critical = 0.8 * Math.sqrt(G * 1.0);
        assertEquals(List.of(), warningsAbout(ChannelDesign.withShearVelocity(1.0, 30.0, 0.99 * critical, 0.05),
                "Froude"), "Fr = 0.792");
        assertEquals(List.of(String.format("the Froude number %.3g is high (above 0.8): near or past critical flow,"
                        + " surface waves and jumps make the uniform-flow rules doubtful", 0.808)),
                warningsAbout(ChannelDesign.withShearVelocity(1.0, 30.0, 1.01 * critical, 0.05), "Froude"),
                "Fr = 0.808");
    }

    @Test
    void narrowChannelWarningEitherSideOfItsThreshold() {
        assertEquals(List.of(), warningsAbout(ChannelDesign.withShearVelocity(1.0, 5.05, 0.5, 0.05), "not wide"));
        assertEquals(List.of(String.format("the channel is not wide (W/h = %.3g, below 5): side walls and"
                        + " secondary currents shape the flow, and the wide-channel rules are doubtful", 4.95)),
                warningsAbout(ChannelDesign.withShearVelocity(1.0, 4.95, 0.5, 0.05), "not wide"));
    }

    @Test
    void reynoldsWarningEitherSideOfItsThreshold() {
        double h = 0.01;
        double w = 1.0;
        double r = w * h / (w + 2 * h);
        double atThreshold = 2000 * 1.0034e-6 / r;
        assertEquals(List.of(), warningsAbout(ChannelDesign.withShearVelocity(h, w, 1.01 * atThreshold, 0.001),
                "Reynolds"), "Re = 2020");
        assertEquals(List.of(String.format("the Reynolds number U R / nu = %.3g is below 2000: the flow may not be"
                        + " turbulent", 1980.0)),
                warningsAbout(ChannelDesign.withShearVelocity(h, w, 0.99 * atThreshold, 0.001), "Reynolds"),
                "Re = 1980");
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
