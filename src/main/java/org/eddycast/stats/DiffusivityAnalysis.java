package org.eddycast.stats;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/**
 * Eddy diffusivity per axis from the mean-square-displacement moments, with the Lagrangian time scale and the
 * checks that say whether the run was long and large enough. Dimensionless in, dimensionless out.
 *
 * <p>Rules (each stated in the warnings it produces):
 * <ul>
 *   <li>The estimate is half the least-squares slope over the late window [T/2, T].</li>
 *   <li>Lagrangian time scale T_L = (D - D0) / u_i'^2, with u_i'^2 the Eulerian variance of the component
 *       (equal to the Lagrangian one for homogeneous incompressible flow); Taylor's formula gives
 *       D - D0 = u'^2 T_L (Taylor 1921, Proc. London Math. Soc. s2-20:196).</li>
 *   <li>Settled: the estimate over [T/4, T/2] agrees with the late one within three standard errors of their
 *       difference, or within 1%. Otherwise the running estimate still drifts; the advice is to run at least
 *       twice as long and at least 20 T_L.</li>
 *   <li>Long enough: T/2 at least {@value #MIN_WINDOW_START_IN_TL} T_L, where an exponential velocity
 *       correlation leaves a bias below 1% (e^-5).</li>
 *   <li>Enough blocks: at least {@value #MIN_BLOCKS} independent blocks for a trustworthy interval.</li>
 * </ul>
 */
public final class DiffusivityAnalysis {

    static final double MIN_WINDOW_START_IN_TL = 5;
    static final int MIN_BLOCKS = 20;
    /** The run length advised when a run is short or unsettled, in Lagrangian time scales. */
    static final double RECOMMENDED_RUN_IN_TL = 20;

    private final List<AxisEstimate> axes;
    private final List<String> warnings;

    private DiffusivityAnalysis(List<AxisEstimate> axes, List<String> warnings) {
        this.axes = List.copyOf(axes);
        this.warnings = List.copyOf(warnings);
    }

    /**
     * @param m                 the moments
     * @param componentVariance Eulerian velocity variance per axis (dimensionless)
     * @param d0                molecular diffusivity per axis (dimensionless)
     * @param timeUnit          seconds per unit time, for the wording of warnings
     */
    public static DiffusivityAnalysis of(DisplacementMoments m, double[] componentVariance, double[] d0,
                                         double timeUnit) {
        double end = m.time(m.records() - 1);
        List<AxisEstimate> axes = new ArrayList<>();
        List<String> warnings = new ArrayList<>();
        double longestTl = 0;
        for (int a = 0; a < m.axes(); a++) {
            SlopeEstimate late = LateWindowSlopeEstimator.estimate(m, a, end / 2, end);
            SlopeEstimate early = LateWindowSlopeEstimator.estimate(m, a, end / 4, end / 2);
            SlopeEstimate diff = LateWindowSlopeEstimator.difference(m, a, end / 4, end / 2, end / 2, end);
            double var = componentVariance[a];
            double tl = var > 0 ? (late.value() - d0[a]) / var : Double.NaN;
            boolean settled = !(Math.abs(diff.value()) > 3 * diff.standardError()
                    && Math.abs(diff.value()) > 0.01 * Math.abs(late.value()));
            if (!(late.value() > 0) || !Double.isFinite(late.value())) {
                // no cloud shrinks: a slope that is not positive is noise, not a diffusivity
                warnings.add(String.format(Locale.ROOT, "the %s diffusivity is not determined: the late-window "
                        + "slope came out %.4g, not a positive number, so the estimate is noise; run more particles "
                        + "or longer (at least %.4g s)", axisName(a), late.value(), timeUnit * 2 * end));
                settled = false;
                tl = Double.NaN;
            } else if (var > 0 && !(tl > 0)) {
                warnings.add(String.format(Locale.ROOT, "the %s Lagrangian time scale is not determined: the "
                        + "turbulent part of the diffusivity, D - D0, came out %.3g times D0, not positive, so it is "
                        + "lost in the estimate's noise (molecular diffusion dominates at a small Peclet number)",
                        axisName(a), (late.value() - d0[a]) / d0[a]));
                tl = Double.NaN;
            }
            if (Double.isFinite(tl)) {
                longestTl = Math.max(longestTl, tl);
            }
            axes.add(new AxisEstimate(a, late, tl, settled, early));
            if (!settled) {
                warnings.add(String.format(Locale.ROOT,
                        "the %s estimate has not settled: over the earlier window [T/4, T/2] it was %.4g, over "
                                + "[T/2, T] %.4g (a change of %.1f%%, beyond three standard errors). Run at least "
                                + "%.4g s.", axisName(a), early.value(), late.value(),
                        100 * (late.value() - early.value()) / late.value(),
                        timeUnit * Math.max(2 * end, RECOMMENDED_RUN_IN_TL * Math.max(tl, 0))));
            }
        }
        if (longestTl > 0 && end / 2 < MIN_WINDOW_START_IN_TL * longestTl) {
            warnings.add(String.format(Locale.ROOT,
                    "the run is short: the late window starts at %.4g s, less than %.0f Lagrangian time scales "
                            + "(T_L = %.4g s), so the early ballistic growth may still bias the slope. Run at least "
                            + "%.4g s.", timeUnit * end / 2, MIN_WINDOW_START_IN_TL, timeUnit * longestTl,
                    timeUnit * RECOMMENDED_RUN_IN_TL * longestTl));
        }
        if (m.count() < MIN_BLOCKS) {
            warnings.add(String.format(Locale.ROOT,
                    "only %d independent blocks of %d particles: the 95%% interval is unreliable below %d; "
                            + "use at least %d particles", m.count(), m.particlesPerBlock(), MIN_BLOCKS,
                    (long) MIN_BLOCKS * m.particlesPerBlock()));
        }
        return new DiffusivityAnalysis(axes, warnings);
    }

    static String axisName(int a) {
        return a == 0 ? "x" : a == 1 ? "y" : "z";
    }

    public List<AxisEstimate> axes() {
        return axes;
    }

    public List<String> warnings() {
        return warnings;
    }

    /** The largest relative 95% half-width over the axes that carry turbulent diffusion. */
    public double worstRelativeHalfWidth() {
        double worst = 0;
        for (AxisEstimate a : axes) {
            double r = a.diffusivity().relativeHalfWidth();
            if (Double.isNaN(r)) {
                return Double.POSITIVE_INFINITY;
            }
            worst = Math.max(worst, r);
        }
        return worst;
    }
}
