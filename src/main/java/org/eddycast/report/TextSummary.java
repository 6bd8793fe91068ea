package org.eddycast.report;

import java.util.Locale;
import org.eddycast.engine.DiffusivityResult;
import org.eddycast.engine.StudyResult;
import org.eddycast.stats.AxisEstimate;
import org.eddycast.stats.SlopeEstimate;

/** A short human summary of a study for the terminal. */
public final class TextSummary {

    private TextSummary() {
    }

    public static String of(StudyResult s) {
        DiffusivityResult r = s.diffusivity();
        StringBuilder sb = new StringBuilder();
        sb.append(String.format(Locale.ROOT, "eddycast %s: %s%n", s.toolVersion(), s.scenario().name()));
        sb.append("  field: ").append(r.fieldDescription()).append('\n');
        sb.append(String.format(Locale.ROOT, "  Kubo number %s, Peclet number %s%n", number(r.kubo()),
                number(r.peclet())));
        sb.append("  eddy diffusivity (m^2/s, 95% interval):\n");
        for (AxisEstimate a : r.axes()) {
            SlopeEstimate e = a.diffusivity();
            sb.append(String.format(Locale.ROOT, "    %s  %.4g  [%.4g, %.4g]  (+-%.1f%%)   Lagrangian time scale %s%n",
                    a.axisName(), e.value(), e.low(), e.high(), 100 * e.relativeHalfWidth(),
                    Double.isFinite(a.lagrangianTimeScale()) ? String.format(Locale.ROOT, "%.4g s",
                            a.lagrangianTimeScale()) : "n/a"));
        }
        sb.append(String.format(Locale.ROOT, "  %d particles in %d blocks, %d steps of %.4g s (%.4g s simulated), "
                        + "%d threads, %.1f s%s%n", r.particles(), r.blocks(), r.steps(), r.timeStep(), r.duration(),
                r.threads(), r.elapsedSeconds(), r.fromCache() ? " (reused)" : ""));
        for (String n : r.notes()) {
            sb.append("  note: ").append(n).append('\n');
        }
        for (String w : r.warnings()) {
            sb.append("  WARNING: ").append(w).append('\n');
        }
        return sb.toString();
    }

    static String number(double v) {
        if (Double.isInfinite(v)) {
            return "infinite";
        }
        return String.format(Locale.ROOT, "%.4g", v);
    }
}
