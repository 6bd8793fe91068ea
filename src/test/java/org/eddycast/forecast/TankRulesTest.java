package org.eddycast.forecast;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Map;
import java.util.function.Function;
import java.util.stream.Collectors;

import org.eddycast.scenario.Derivation;
import org.eddycast.scenario.ImpellerType;
import org.eddycast.scenario.SpectrumSpec;
import org.eddycast.scenario.TankDesign;
import org.eddycast.scenario.TurbulenceStatistics;
import org.junit.jupiter.api.Test;

class TankRulesTest {

    // An invented pilot tank: T = H = 1 m, D = T/3, N = 3 rev/s, Po = 5, baffled, water.
    private static final TankDesign PILOT = new TankDesign(1.0, 1.0, 1.0 / 3.0, 3.0, 5.0, null, null, true);

    @Test
    void meanDissipationOnAWorkedExample() {
        // Definition of the power number, P = Po rho N^3 D^5, spread over the liquid mass rho V:
        // V = pi / 4 = 0.785398 m^3; eps = 5 * 27 * (1/3)^5 / 0.785398 = 0.555556 / 0.785398 = 0.707355 W/kg.
        ModeledTurbulence model = TankRules.STANDARD.model(PILOT);
        assertEquals(0.707355, model.statistics().dissipationRate(), 1e-6);
        assertTrue(model.warnings().isEmpty(), model.warnings().toString());
    }

    @Test
    void scalesFollowTheStatedRules() {
        TurbulenceStatistics s = TankRules.STANDARD.model(PILOT).statistics();
        double eps = 0.707355;
        // L = 0.1 D (common practice); u' from eps = C_eps u'^3 / L with C_eps = 0.5 (Sreenivasan 1998, Phys.
        // Fluids 10:528, from memory): u' = (0.707355 * 0.033333 / 0.5)^(1/3) = 0.047157^(1/3) = 0.36128 m/s.
        assertEquals(1.0 / 30.0, s.integralLength(), 1e-12);
        assertEquals(0.36128, s.rmsVelocity(), 1e-5);
        assertEquals(0.5, eps * s.integralLength() / Math.pow(s.rmsVelocity(), 3), 1e-6);
        assertEquals(s.integralLength() / s.rmsVelocity(), s.correlationTime(), 1e-15);
        // Kolmogorov 1941: eta = (nu^3 / eps)^(1/4) = (1.0034e-6^3 / 0.707355)^(1/4) = (1.01024e-18 / 0.707355)^(1/4) = 3.4570e-5 m.
        Map<String, Derivation> steps = byQuantity(s);
        assertEquals(3.4570e-5, steps.get("Kolmogorov length").value(), 1e-8);
        assertEquals(SpectrumSpec.Model.POWER_LAW, s.spectrum().model());
        assertEquals(-5.0 / 3.0, s.spectrum().slope(), 1e-15);
        assertEquals(s.integralLength() / (60 * 3.4570e-5), s.spectrum().wavenumberRatio(), 1e-2);
        assertEquals(3, s.dimensions());
        assertEquals(0.0, s.meanVelocity());
    }

    @Test
    void everyValueHasADerivationWithASource() {
        TurbulenceStatistics s = TankRules.STANDARD.model(PILOT).statistics();
        Map<String, Derivation> steps = byQuantity(s);
        for (String q : new String[] {"liquid volume", "power number", "mean dissipation rate",
                "impeller Reynolds number", "integral length", "rms velocity", "correlation time",
                "Kolmogorov length", "spectrum band ratio", "mean velocity", "dimensions", "kinematic viscosity"}) {
            assertTrue(steps.containsKey(q), q);
            assertTrue(!steps.get(q).source().isBlank() && !steps.get(q).rule().isBlank(), q);
        }
        assertEquals(s.rmsVelocity(), steps.get("rms velocity").value(), 0.0);
        assertEquals(s.integralLength(), steps.get("integral length").value(), 0.0);
        assertEquals(s.correlationTime(), steps.get("correlation time").value(), 0.0);
    }

    @Test
    void typicalPowerNumberIsUsedAndMarkedFromMemory() {
        TankDesign design = new TankDesign(1.0, 1.0, 0.4, 2.0, null, ImpellerType.PITCHED_BLADE_TURBINE, null, true);
        Derivation po = byQuantity(TankRules.STANDARD.model(design).statistics()).get("power number");
        assertEquals(1.27, po.value(), 0.0);
        assertTrue(po.source().contains("from memory"));
    }

    @Test
    void slowViscousUnbaffledTankIsWarnedAbout() {
        // Re = N D^2 / nu = 1 * 0.09 / 1e-4 = 900: not turbulent (below 1e4, common practice). No baffles.
        // And L = 0.03 m is only about 11 Kolmogorov lengths, (1e-12 / eps)^(1/4) with eps = 0.0155 W/kg:
        // no room for an inertial range.
        TankDesign design = new TankDesign(1.0, 1.0, 0.3, 1.0, 5.0, null, 1e-4, false);
        ModeledTurbulence model = TankRules.STANDARD.model(design);
        assertEquals(3, model.warnings().size(), model.warnings().toString());
        assertTrue(model.warnings().get(0).contains("not fully turbulent"));
        assertTrue(model.warnings().get(1).contains("no baffles"));
        assertTrue(model.warnings().get(2).contains("no inertial range"));
        assertEquals(1.0, model.statistics().spectrum().wavenumberRatio(), 0.0);
    }

    @Test
    void badDesignNamesTheFieldTheUnitAndTheRange() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> new TankDesign(1.0, 1.0, 0.3, -2.0, 5.0, null, null, true));
        assertEquals("flow.impellerSpeed must be > 0 rev/s; got -2", e.getMessage());
        e = assertThrows(IllegalArgumentException.class,
                () -> new TankDesign(1.0, 1.0, 1.2, 2.0, 5.0, null, null, true));
        assertEquals("flow.impellerDiameter must be > 0 and < 1 m; got 1.2", e.getMessage());
        e = assertThrows(IllegalArgumentException.class,
                () -> new TankDesign(1.0, 1.0, 0.3, 2.0, null, null, null, true));
        assertEquals("flow.powerNumber or flow.impellerType must be given", e.getMessage());
        e = assertThrows(IllegalArgumentException.class,
                () -> new TankDesign(Double.NaN, 1.0, 0.3, 2.0, 5.0, null, null, true));
        assertEquals("flow.tankDiameter must be > 0 m; got NaN", e.getMessage());
    }

    static Map<String, Derivation> byQuantity(TurbulenceStatistics s) {
        return s.derivations().stream().collect(Collectors.toMap(Derivation::quantity, Function.identity()));
    }
}
