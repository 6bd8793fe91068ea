package org.eddycast.engine;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.eddycast.field.CellularFlow;
import org.eddycast.particles.Cancellation;
import org.eddycast.particles.Integrator;
import org.eddycast.particles.RunListener;
import org.eddycast.stats.SlopeEstimate;
import org.junit.jupiter.api.Test;

/**
 * The time-step bias of the effective diffusivity on the cellular flow psi = sin x sin y at D0 = 0.01 (Peclet
 * 100), against the cell-problem value D = 1.0693 sqrt(D0) (derived in field.CellularConstantTest; after Shraiman 1987, Phys. Rev. A
 * 36:261, and Rosenbluth et al. 1987, Phys. Fluids 30:2636).
 *
 * <p>Euler-Maruyama does not preserve area: each step pushes a particle outward across the streamlines by
 * O(dt^2), an outward drift of O(dt) per unit time, so the diffusivity comes out far too large, with a bias that
 * grows with the step. How the diffusivity responds to that drift is not linear (the drift feeds the boundary
 * layers between cells), so the observed order of the bias is measured and stated, not assumed: about 0.7 to
 * 1 over steps 0.025 to 0.1 (the strong order of the scheme itself, 1, is checked in IntegratorTest). The
 * volume-preserving splittings show no bias beyond three standard errors at a step four times the one the
 * verification case uses; with 131,072 particles a standard error is 0.8% of the value, so three of them are
 * 2.5% (measured: Lie +0.2%, Strang +1.3%). Fixed seed; each estimate's standard error is its own (over
 * independent blocks).
 */
class CellularTimeStepBiasTest {

    private static final double EXPECTED = 1.0693 * Math.sqrt(0.01);

    private static SlopeEstimate diffusivity(Integrator integrator, double dt, int particles) {
        double duration = 200;
        DimensionlessCase c = new DimensionlessCase(new CellularFlow(2), integrator, new double[] {0.01, 0.01, 0.01},
                dt, (int) Math.round(duration / dt), 64, particles, particles, Double.NaN, 77, new Scales(1, 1),
                Double.POSITIVE_INFINITY, 100, List.of(), "bias");
        return DiffusivityStudy.run(c, 2, RunListener.NONE, new Cancellation()).axes().get(0).diffusivity();
    }

    @Test
    void eulerBiasIsFirstOrderInTheStep() {
        double[] steps = {0.025, 0.05, 0.1};
        double[] bias = new double[steps.length];
        double[] se = new double[steps.length];
        for (int i = 0; i < steps.length; i++) {
            SlopeEstimate e = diffusivity(Integrator.EULER_MARUYAMA, steps[i], 8192);
            bias[i] = e.value() - EXPECTED;
            se[i] = e.standardError();
            assertTrue(bias[i] > 5 * se[i], "Euler's bias is visible at dt = " + steps[i] + ": " + bias[i]);
        }
        assertTrue(bias[0] < bias[1] && bias[1] < bias[2], "the bias grows with the step");
        // Observed order over the three steps; each bias is known to a few per cent (bias / se > 5), which moves
        // the order by about 0.1. A first-order drift gives an order near 1; the band allows the measured
        // sub-linear response of the diffusivity to it.
        double order = (Math.log(bias[2]) - Math.log(bias[0])) / Math.log(steps[2] / steps[0]);
        assertTrue(order > 0.5 && order < 1.5, "observed order of Euler's diffusivity bias: " + order);
    }

    @Test
    void splittingsShowNoBiasAtFourTimesTheCheckedStep() {
        for (Integrator integrator : new Integrator[] {Integrator.LIE, Integrator.STRANG}) {
            SlopeEstimate e = diffusivity(integrator, 0.4, 131072);
            assertEquals(EXPECTED, e.value(), 3 * e.standardError(), integrator + " at dt = 0.4");
        }
    }
}
