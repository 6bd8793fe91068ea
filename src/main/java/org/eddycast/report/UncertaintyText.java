package org.eddycast.report;

import java.util.Locale;
import org.eddycast.engine.DisplayFormat;
import org.eddycast.scenario.DisplayUnits;
import org.eddycast.uncertainty.UncertaintySummary;
import org.eddycast.uncertainty.UncertaintySummary.FigureRange;
import org.eddycast.uncertainty.UncertaintySummary.RangedInput;
import org.eddycast.uncertainty.UncertaintySummary.SensitivityIndex;

/** The inputs' uncertainty in words: each figure's two intervals, the ranking and the advice. */
public final class UncertaintyText {

    private UncertaintyText() {
    }

    /**
     * The one line that follows the headline: the main figure's two intervals, each named for what it covers, and
     * the input it is most sensitive to.
     */
    public static String headlineLine(UncertaintySummary u, DisplayUnits units) {
        FigureRange m = u.mainFigure();
        DisplayFormat f = new DisplayFormat(units);
        String line = String.format(Locale.ROOT, "How sure: %s %s; particles' noise %s; over the inputs' ranges "
                + "5-95%% %s", m.label(), value(f, m.unit(), m.nominal()), interval(f, m.unit(), m.mcLow(), m.mcHigh()),
                interval(f, m.unit(), m.p05(), m.p95()));
        if (!u.sensitivity().isEmpty()) {
            SensitivityIndex top = u.sensitivity().get(0);
            line += String.format(Locale.ROOT, "; most sensitive to %s (total index %.2f)", top.input(), top.total());
        }
        return line + ".";
    }

    /**
     * What a sweep's result says in two lines: the main figure's range over the inputs (the sweep has no single
     * run of its own beside it) and the advice.
     */
    public static String resultLines(UncertaintySummary u, DisplayUnits units) {
        FigureRange m = u.mainFigure();
        DisplayFormat f = new DisplayFormat(units);
        return String.format(Locale.ROOT, "%s over the inputs' ranges, 5-95%%: %s, median %s%n%s%n", m.label(),
                interval(f, m.unit(), m.p05(), m.p95()), value(f, m.unit(), m.p50()), u.advice());
    }

    /** Appends the block that follows the answers. */
    public static void append(StringBuilder sb, UncertaintySummary u, DisplayUnits units) {
        DisplayFormat f = new DisplayFormat(units);
        sb.append(String.format(Locale.ROOT, "  input uncertainty (%d inputs, %d runs of %d particles):%n",
                u.inputs().size(), u.runs(), u.particles()));
        for (RangedInput r : u.inputs()) {
            sb.append(String.format(Locale.ROOT, "    %-28s %s%s%n", r.input(), r.distribution(),
                    r.basis().isEmpty() ? "" : " (" + r.basis() + ")"));
        }
        for (FigureRange m : u.figures()) {
            sb.append(String.format(Locale.ROOT, "    %s %s: particles' noise %s; inputs' range 5-95%% %s, median %s%s%n",
                    m.label(), value(f, m.unit(), m.nominal()), interval(f, m.unit(), m.mcLow(), m.mcHigh()),
                    interval(f, m.unit(), m.p05(), m.p95()), value(f, m.unit(), m.p50()),
                    Double.isFinite(m.noiseShare()) ? String.format(Locale.ROOT, " (%.0f%% of its variance is the "
                            + "sampled runs' noise)", 100 * m.noiseShare()) : ""));
        }
        if (!u.sensitivity().isEmpty()) {
            sb.append("    share of the variance of the ").append(u.mainFigure().label())
                    .append(" (Sobol indices, first-order / total, 95% half-widths):\n");
            for (SensitivityIndex s : u.sensitivity()) {
                sb.append(String.format(Locale.ROOT, "      %-28s %5.2f +-%.2f   %5.2f +-%.2f%n", s.input(), s.first(),
                        s.firstHalfWidth(), s.total(), s.totalHalfWidth()));
            }
        }
        if (!u.advice().isEmpty()) {
            sb.append("    ").append(u.advice()).append('\n');
        }
        for (String n : u.notes()) {
            sb.append("    note: ").append(n).append('\n');
        }
    }

    private static String value(DisplayFormat f, String unit, double v) {
        return f.ofUnit(unit, v);
    }

    private static String interval(DisplayFormat f, String unit, double low, double high) {
        if (!Double.isFinite(low) || !Double.isFinite(high)) {
            return "not determined";
        }
        return "[" + value(f, unit, low) + ", " + value(f, unit, high) + "]";
    }
}
