package org.eddycast.report;

import org.eddycast.scenario.Printable;

import java.util.Locale;
import org.eddycast.engine.DiffusivityResult;
import org.eddycast.engine.StudyResult;
import org.eddycast.forecast.Comparison;
import org.eddycast.forecast.Forecast;
import org.eddycast.scenario.DisplayUnits;
import org.eddycast.stats.AxisEstimate;
import org.eddycast.stats.SlopeEstimate;

/** A short human summary of a study for the terminal. */
public final class TextSummary {

    private TextSummary() {
    }

    public static String of(StudyResult s) {
        DiffusivityResult r = s.diffusivity();
        StringBuilder sb = new StringBuilder();
        if (s.answers() != null) {
            sb.append(s.answers().headline()).append('\n');
        }
        if (s.uncertainty() != null) {
            sb.append(UncertaintyText.headlineLine(s.uncertainty(), s.scenario().forecast().units())).append('\n');
        }
        sb.append(String.format(Locale.ROOT, "eddycast %s, seed %d: %s%n", s.toolVersion(),
                s.scenario().simulation().seed(), Printable.escape(s.scenario().name())));
        if (s.answers() != null) {
            AnswersText.append(sb, s.answers());
        }
        if (s.uncertainty() != null) {
            UncertaintyText.append(sb, s.uncertainty(), s.scenario().forecast().units());
        }
        for (String w : s.preflight()) {
            sb.append("  WARNING (before the run): ").append(w).append('\n');
        }
        sb.append("  field: ").append(r.fieldDescription()).append('\n');
        sb.append(String.format(Locale.ROOT, "  Kubo number %s, Peclet number %s%n", number(r.kubo()),
                number(r.peclet())));
        sb.append("  eddy diffusivity (m^2/s, 95% interval):\n");
        for (AxisEstimate a : r.axes()) {
            SlopeEstimate e = a.diffusivity();
            if (!a.determined()) {
                sb.append("    ").append(a.axisName()).append("  not determined (see the warnings)\n");
                continue;
            }
            sb.append(String.format(Locale.ROOT, "    %s  %.4g  [%.4g, %.4g]  (+-%.1f%%)   Lagrangian time scale %s%n",
                    a.axisName(), e.value(), e.low(), e.high(), 100 * e.relativeHalfWidth(),
                    Double.isFinite(a.lagrangianTimeScale()) ? String.format(Locale.ROOT, "%.4g s",
                            a.lagrangianTimeScale()) : "not determined"));
        }
        sb.append(String.format(Locale.ROOT, "  %d particles in %d blocks, %d steps of %.4g s (%.4g s simulated), "
                        + "%d threads, %.1f s%s%n", r.particles(), r.blocks(), r.steps(), r.timeStep(), r.duration(),
                r.threads(), r.elapsedSeconds(), r.fromCache() ? " (reused)" : ""));
        if (s.turbulence() != null && !s.turbulence().derivations().isEmpty()) {
            sb.append("  turbulence statistics from the ").append(s.scenario().flow().kind()).append(" route:\n");
            for (org.eddycast.scenario.Derivation d : s.turbulence().derivations()) {
                sb.append(String.format(Locale.ROOT, "    %-26s %10.4g %-6s %s%n", d.quantity(), d.value(), d.unit(),
                        d.source()));
            }
        }
        for (String w : s.flow().warnings()) {
            if (!s.preflight().contains(w)) {
                sb.append("  WARNING (flow): ").append(w).append('\n');
            }
        }
        if (s.transport() != null) {
            TransportText.append(sb, s.transport());
        }
        Forecast f = s.forecast();
        if (f == null) {
            sb.append("  forecast: not determined (a diffusivity it needs is not determined; see the warnings)\n");
        }
        if (f != null) {
            sb.append(String.format(Locale.ROOT, "  forecast (%s; %s):%n", f.inDistance() ? "distance downstream"
                    : "time", f.measure().label()));
            DisplayUnits u = s.scenario().forecast().units();
            sb.append(String.format(Locale.ROOT, "    %12s %12s %12s %12s %14s%n", f.inDistance()
                    ? "distance " + u.distance() : "time " + u.time(), "width x m", "width y m", "width z m",
                    "peak " + (u.concentration().equals("kg/m3") ? "kg/m^3" : u.concentration())));
            double[] grid = f.grid();
            double[][] w = f.width();
            double[] peak = f.peakConcentration();
            for (int j = 9; j < grid.length; j += 10) {
                sb.append(String.format(Locale.ROOT, "    %12.4g %12.4g %12.4g %12.4g %14.4g%n",
                        f.inDistance() ? u.distance(grid[j]) : u.time(grid[j]), w[0][j], w[1][j], w[2][j],
                        u.concentration(peak[j])));
            }
            for (SummaryContent.Row m : SummaryContent.forecastRows(f, u).subList(1, f.mixing().size() + 1)) {
                sb.append("  ").append(m.quantity()).append(": ").append(m.value()).append(' ').append(m.unit())
                        .append(' ').append(m.interval()).append('\n');
            }
            for (Comparison c : f.handbook()) {
                sb.append(String.format(Locale.ROOT, "  handbook %s: %.4g %s (%s); simulated %.4g, ratio %.2f, %s%n",
                        c.estimate().name(), c.estimate().value(), c.estimate().unit(), c.estimate().sourceText(),
                        c.forecast(), c.ratio(), c.agree() ? "agree within the stated uncertainty" : "disagree"));
            }
            sb.append("  assumptions:\n");
            for (String a : f.assumptions()) {
                sb.append("    - ").append(a).append('\n');
            }
            sb.append("  (the full forecast grid with its 95% bands is in the JSON output, --json)\n");
        }
        for (String n : r.notes()) {
            sb.append("  note: ").append(n).append('\n');
        }
        for (String w : r.warnings()) {
            sb.append("  WARNING: ").append(w).append('\n');
        }
        sb.append("  cautions:\n");
        for (String c : org.eddycast.forecast.Cautions.ALL) {
            sb.append("    - ").append(c).append('\n');
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
