package org.eddycast.engine;

import java.util.ArrayList;
import java.util.List;
import org.eddycast.field.CellularFlow;
import org.eddycast.field.ShearFlow;
import org.eddycast.particles.Cancellation;
import org.eddycast.particles.Integrator;
import org.eddycast.particles.RunListener;
import org.eddycast.stats.SlopeEstimate;

/**
 * The built-in verification cases: flows whose effective diffusivity is known exactly or from the literature,
 * run through the same engine as every forecast. All in dimensionless units (U = k = 1).
 */
public final class VerificationSuite {

    /** The seed of every check, fixed before any outcome was seen. */
    public static final long SEED = 20261202L;

    private VerificationSuite() {
    }

    /** One check's outcome. */
    public record Outcome(VerificationCase check, SlopeEstimate estimate, double deviationInErrors, boolean passed,
                          String reason, double elapsedSeconds) {
    }

    /** The cases, in the order they are run. */
    public static List<VerificationCase> cases() {
        List<VerificationCase> list = new ArrayList<>();
        // Steady shear u = (sin y, 0), D0 = 1/4: D = D0 + U^2 / (2 D0 k^2) = 2.25.
        ShearFlow steady = new ShearFlow(2, 1, Double.POSITIVE_INFINITY);
        double dt = 0.05;
        double d0 = 0.25;
        list.add(new VerificationCase("steady shear, D_xx",
                "Taylor 1921, Diffusion by continuous movements, Proc. London Math. Soc. s2-20:196; "
                        + "R_L(t) = (U^2/2) exp(-D0 k^2 t)",
                steady, 0, steady.exactDiffusivity(d0),
                biasBound(steady, d0, dt, 100, 4.0), "discrete-time correlation sum a^2/12 (a = D0 k^2 dt) plus the "
                        + "late-window tail exp(-T/(2 T_L))",
                d0, Integrator.STRANG, dt, 2000, 64, 196608));
        // Time-correlated shear, tau = 1: D = D0 + U^2 tau / (1 + D0 k^2 tau) = 1.05.
        ShearFlow correlated = new ShearFlow(2, 1, 1.0);
        list.add(new VerificationCase("time-correlated shear, D_xx",
                "Taylor 1921 with R_L(t) = U^2 exp(-t/tau) exp(-D0 k^2 t)",
                correlated, 0, correlated.exactDiffusivity(d0),
                biasBound(correlated, d0, dt, 40, 0.8), "discrete-time correlation sum a^2/12 "
                        + "(a = (1/tau + D0 k^2) dt) plus the late-window tail exp(-T/(2 T_L))",
                d0, Integrator.STRANG, dt, 800, 1, 131072));
        // Spatially uniform Ornstein-Uhlenbeck velocity: D = D0 + u'^2 tau = 1.25.
        ShearFlow uniform = new ShearFlow(2, 0, 1.0);
        list.add(new VerificationCase("uniform Ornstein-Uhlenbeck velocity, D_xx",
                "Taylor 1921 with R_L(t) = u'^2 exp(-t/tau)",
                uniform, 0, uniform.exactDiffusivity(d0),
                biasBound(uniform, d0, dt, 40, 1.0), "discrete-time correlation sum a^2/12 (a = dt/tau) plus "
                        + "the late-window tail exp(-T/(2 T_L))",
                d0, Integrator.STRANG, dt, 800, 1, 131072));
        // Cellular flow psi = sin x sin y at D0 = 0.01 (Peclet 100): D / sqrt(D0) = 1.0693 from the cell problem
        // (its Fourier-Galerkin solve is the test CellularConstantTest).
        CellularFlow cells = new CellularFlow(2);
        for (int axis = 0; axis < 2; axis++) {
            list.add(new VerificationCase("cellular flow at Peclet 100, D_" + (axis == 0 ? "xx" : "yy"),
                    "cell-problem value 1.0693 sqrt(D0) (derived; large-Peclet law of Shraiman 1987, Phys. Rev. A "
                            + "36:261, and Rosenbluth et al. 1987, Phys. Fluids 30:2636)",
                    cells, axis, 1.0693 * Math.sqrt(0.01), 0.005 * 1.0693 * Math.sqrt(0.01),
                    "Strang at dt = 0.1: no bias beyond three standard errors (about 7%) even at dt = 0.4 "
                            + "(CellularTimeStepBiasTest); second order scales that by (0.1/0.4)^2 to below 0.5%",
                    0.01, Integrator.STRANG, 0.1, 2000, 64, 262144));
        }
        return List.copyOf(list);
    }

    /**
     * Bias bound of a shear case: the relative excess a^2/12 of the time-discrete correlation sum (see
     * {@link ShearFlow#discreteDiffusivity}) times the value, plus the relative shortfall of the late-window
     * slope of Taylor's curve for an exponential correlation, exp(-T/(2 T_L)), doubled for safety.
     */
    static double biasBound(ShearFlow flow, double d0, double dt, double duration, double lagrangianTime) {
        double exact = flow.exactDiffusivity(d0);
        double discrete = flow.discreteDiffusivity(d0, dt);
        return 2 * (Math.abs(discrete - exact) + exact * Math.exp(-duration / (2 * lagrangianTime)));
    }

    /** Runs one case. */
    public static Outcome run(VerificationCase c, int threads, RunListener listener, Cancellation cancel) {
        DiffusivityResult r = DiffusivityStudy.run(c.toCase(SEED), threads, listener, cancel);
        SlopeEstimate e = r.axes().get(c.axis()).diffusivity();
        double deviation = Math.abs(e.value() - c.expected());
        double allowed = 3 * e.standardError() + c.biasBound();
        double width = (e.high() - e.low()) / Math.abs(e.value());
        boolean withinError = deviation <= allowed;
        boolean narrow = width <= VerificationCase.MAX_RELATIVE_WIDTH;
        String reason = withinError && narrow ? "within 3 standard errors plus the bias bound"
                : !withinError ? String.format(java.util.Locale.ROOT, "off by %.2f standard errors",
                        deviation / e.standardError())
                : String.format(java.util.Locale.ROOT, "interval %.2f%% wide, more than %.0f%%", 100 * width,
                        100 * VerificationCase.MAX_RELATIVE_WIDTH);
        return new Outcome(c, e, (e.value() - c.expected()) / e.standardError(), withinError && narrow, reason,
                r.elapsedSeconds());
    }
}
