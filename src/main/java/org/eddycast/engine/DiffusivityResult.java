package org.eddycast.engine;

import java.util.List;
import org.eddycast.stats.AxisEstimate;
import org.eddycast.stats.DisplacementMoments;

/**
 * The answer of one simulation in physical units, with the dimensionless moments it came from.
 *
 * @param axes              per-axis estimates in m^2/s (interval included) and T_L in s
 * @param moments           the dimensionless moments (times in units of {@code scales().time()})
 * @param scales            the units of the case
 * @param kubo              Kubo number
 * @param peclet            Peclet number
 * @param molecularDiffusivity D0 (m^2/s)
 * @param componentVariance Eulerian velocity variance per axis (m^2/s^2)
 * @param particles         particles followed
 * @param blocks            independent blocks
 * @param steps             time steps
 * @param timeStep          time step (s)
 * @param threads           worker threads used
 * @param elapsedSeconds    wall-clock time of the simulation
 * @param fromCache         true when the simulation was reused from an identical dimensionless case
 * @param fieldDescription  what field was simulated
 * @param warnings          what the user must know about this estimate
 * @param notes             how values not given were chosen
 */
public record DiffusivityResult(List<AxisEstimate> axes, DisplacementMoments moments, Scales scales, double kubo,
                                double peclet, double molecularDiffusivity, double[] componentVariance,
                                long particles, long blocks, int steps, double timeStep, int threads,
                                double elapsedSeconds, boolean fromCache, String fieldDescription,
                                List<String> warnings, List<String> notes) {

    public DiffusivityResult {
        axes = List.copyOf(axes);
        moments = moments.copy();
        componentVariance = componentVariance.clone();
        warnings = List.copyOf(warnings);
        notes = List.copyOf(notes);
    }

    @Override
    public DisplacementMoments moments() {
        return moments.copy();
    }

    @Override
    public double[] componentVariance() {
        return componentVariance.clone();
    }

    /**
     * The same simulation in other units (a scenario with the same dimensionless case), marked as reused.
     *
     * @param to    the new units
     * @param notes the new case's notes
     */
    public DiffusivityResult rescaled(Scales to, List<String> notes) {
        double dRatio = to.diffusivity() / scales.diffusivity();
        double tRatio = to.time() / scales.time();
        List<AxisEstimate> converted = new java.util.ArrayList<>();
        for (AxisEstimate a : axes) {
            converted.add(new AxisEstimate(a.axis(), a.diffusivity().scaled(dRatio, tRatio),
                    a.lagrangianTimeScale() * tRatio, a.settled(), a.earlyWindow().scaled(dRatio, tRatio)));
        }
        double vRatio = (to.velocity() * to.velocity()) / (scales.velocity() * scales.velocity());
        double[] variance = componentVariance.clone();
        for (int i = 0; i < variance.length; i++) {
            variance[i] *= vRatio;
        }
        return new DiffusivityResult(converted, moments, to, kubo, peclet, molecularDiffusivity * dRatio, variance,
                particles, blocks, steps, timeStep * tRatio, threads, elapsedSeconds, true, fieldDescription,
                warnings, notes);
    }

    /** Simulated duration in seconds. */
    public double duration() {
        return steps * timeStep;
    }

    /** Record times in seconds. */
    public double[] times() {
        double[] t = moments.times();
        for (int j = 0; j < t.length; j++) {
            t[j] *= scales.time();
        }
        return t;
    }

    /** Mean-square displacement along the axis at each record time (m^2). */
    public double[] meanSquareDisplacement(int axis) {
        double l2 = scales.length() * scales.length();
        double[] v = new double[moments.records()];
        for (int j = 0; j < v.length; j++) {
            v[j] = moments.mean(axis, j) * l2;
        }
        return v;
    }

    /** Standard error of the mean-square displacement at each record time (m^2). */
    public double[] meanSquareDisplacementError(int axis) {
        double l2 = scales.length() * scales.length();
        double[] v = new double[moments.records()];
        for (int j = 0; j < v.length; j++) {
            v[j] = Math.sqrt(moments.covariance(axis, j, j) / moments.count()) * l2;
        }
        return v;
    }
}
