package org.eddycast.engine;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Map;
import java.util.stream.Stream;
import org.eddycast.docs.ValidationLog;
import org.eddycast.particles.Cancellation;
import org.eddycast.particles.RunListener;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * Every built-in verification case against its exact or published value, written here as a literal from the
 * analytic formula (U = k = 1, D0 = 1/4 for the shears, tau = 1), not taken from the code under test:
 * <ul>
 *   <li>steady shear u = (sin y, 0): D = D0 + U^2 / (2 D0 k^2) = 0.25 + 2 = 2.25;</li>
 *   <li>time-correlated shear: D = D0 + U^2 tau / (1 + D0 k^2 tau) = 0.25 + 1 / 1.25 = 1.05;</li>
 *   <li>uniform Ornstein-Uhlenbeck velocity: D = D0 + u'^2 tau = 1.25;</li>
 * </ul>
 * all by Taylor's formula (Taylor 1921, "Diffusion by continuous movements", Proc. London Math. Soc.
 * s2-20:196); the cellular flow at D0 = 0.01: D = 1.0693 sqrt(D0) = 0.10693, from the cell problem solved in
 * {@code field.CellularConstantTest} (large-Peclet law: Shraiman 1987, Phys. Rev. A 36:261; Rosenbluth et al.
 * 1987, Phys. Fluids 30:2636). Pass: within three standard errors (over independent blocks) plus a bias bound
 * computed here, and a 95% interval no wider than 3% of the value. The seed {@link VerificationSuite#SEED} was
 * fixed before any outcome was seen.
 */
class VerificationSuiteTest {

    private static final Map<String, Double> EXPECTED = Map.of(
            "steady shear, D_xx", 2.25,
            "time-correlated shear, D_xx", 1.05,
            "uniform Ornstein-Uhlenbeck velocity, D_xx", 1.25,
            "cellular flow at Peclet 100, D_xx", 0.10693,
            "cellular flow at Peclet 100, D_yy", 0.10693);

    /**
     * The bias bound of a shear case, written out: a velocity correlation e^(-a n) sampled at steps dt
     * (a = rate dt) sums to the integral times (a / 2) coth(a / 2) = 1 + a^2 / 12 - ..., so the turbulent part
     * D - D0 comes out high by a^2 / 12 of itself; a late window [T/2, T] misses about exp(-T / (2 T_L)) of the
     * value. Doubled for safety, as the suite states. The cellular cases carry the suite's stated 0.5%, from the
     * time-step study in CellularTimeStepBiasTest.
     */
    private static double biasBound(VerificationCase c, double expected) {
        double d0 = c.d0();
        double dt = c.timeStep();
        double duration = dt * c.steps();
        return switch (c.name()) {
            case "steady shear, D_xx" -> 2 * ((expected - d0) * Math.pow(d0 * dt, 2) / 12
                    + expected * Math.exp(-duration / (2 * 4.0)));
            case "time-correlated shear, D_xx" -> 2 * ((expected - d0) * Math.pow((1 + d0) * dt, 2) / 12
                    + expected * Math.exp(-duration / (2 * 0.8)));
            case "uniform Ornstein-Uhlenbeck velocity, D_xx" -> 2 * ((expected - d0) * dt * dt / 12
                    + expected * Math.exp(-duration / 2));
            default -> 0.005 * expected;
        };
    }

    static Stream<VerificationCase> cases() {
        return VerificationSuite.cases().stream();
    }

    @Test
    void suiteCarriesTheAnalyticValues() {
        assertEquals(EXPECTED.size(), VerificationSuite.cases().size());
        for (VerificationCase c : VerificationSuite.cases()) {
            double expected = EXPECTED.get(c.name());
            assertEquals(expected, c.expected(), 1e-12, c.name());
            assertEquals(biasBound(c, expected), c.biasBound(), 0.01 * c.biasBound(), c.name() + ": bias bound");
        }
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("cases")
    void reproducesTheKnownDiffusivity(VerificationCase c) {
        double expected = EXPECTED.get(c.name());
        VerificationSuite.Outcome o = VerificationSuite.run(c, 2, RunListener.NONE, new Cancellation());
        double allowed = 3 * o.estimate().standardError() + biasBound(c, expected);
        boolean within = Math.abs(o.estimate().value() - expected) <= allowed;
        boolean narrow = o.estimate().high() - o.estimate().low() <= VerificationCase.MAX_RELATIVE_WIDTH * expected;
        ValidationLog.statistical(c.name() + " (dimensionless)", c.source(), expected, o.estimate().value(),
                o.estimate().low(), o.estimate().high(), expected - allowed, expected + allowed,
                "3 standard errors over independent blocks plus the bias bound (" + c.biasReason()
                        + "); 95% interval at most " + Math.round(100 * VerificationCase.MAX_RELATIVE_WIDTH)
                        + "% of the value", within && narrow);
        assertTrue(within, c.name() + ": expected " + expected + ", estimate " + o.estimate());
        assertTrue(narrow, c.name() + ": interval wider than 3%: " + o.estimate());
        assertTrue(o.passed(), c.name() + ": the suite's own verdict (" + o.reason() + ")");
    }
}
