package org.eddycast.sheet;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.eddycast.engine.DisplayFormat;
import org.eddycast.report.SummaryContent;
import org.eddycast.scenario.DisplayUnits;
import org.eddycast.uncertainty.UncertaintySummary;
import org.eddycast.uncertainty.UncertaintySummary.FigureRange;
import org.eddycast.uncertainty.UncertaintySummary.RangedInput;
import org.eddycast.uncertainty.UncertaintySummary.SensitivityIndex;

/** An uncertainty summary as text tables, the same in the window and on the sheet. */
public final class UncertaintyTables {

    private UncertaintyTables() {
    }

    /**
     * Each headline figure: its single run, Monte Carlo interval, input range, mean over the inputs, and how much
     * of the range's variance is the sampled runs' own Monte Carlo noise rather than the inputs.
     */
    public static SummaryContent.Table figures(UncertaintySummary u) {
        return figures(u, DisplayUnits.si());
    }

    /** As {@link #figures(UncertaintySummary)}, each value in the scenario's display units with its unit. */
    public static SummaryContent.Table figures(UncertaintySummary u, DisplayUnits units) {
        DisplayFormat format = new DisplayFormat(units);
        List<List<String>> rows = new ArrayList<>();
        for (FigureRange f : u.figures()) {
            rows.add(List.of(f.label(), format.ofUnit(f.unit(), f.nominal()),
                    range(format, f.unit(), f.mcLow(), f.mcHigh()), range(format, f.unit(), f.p05(), f.p95()),
                    format.ofUnit(f.unit(), f.mean()), noise(f.noiseShare())));
        }
        return new SummaryContent.Table(List.of("figure", "single run", "Monte Carlo 95% interval",
                "input range, 5th to 95th percentile", "mean over the inputs", "share of the range from noise"),
                rows);
    }

    private static String range(DisplayFormat format, String unit, double low, double high) {
        if (!Double.isFinite(low) || !Double.isFinite(high)) {
            return "none";
        }
        return format.ofUnit(unit, low) + " to " + format.ofUnit(unit, high);
    }

    /** The sampled runs' own noise as a share of the range's variance: "12%", or "n/a". */
    static String noise(double share) {
        return Double.isNaN(share) ? "n/a" : String.format(Locale.ROOT, "%.0f%%", 100 * share);
    }

    /**
     * The ranged inputs, largest total index first: range, both indices with their intervals, basis of the
     * range; inputs without indices follow in the design's order with those cells empty.
     */
    public static SummaryContent.Table inputs(UncertaintySummary u) {
        List<List<String>> rows = new ArrayList<>();
        List<String> ranked = new ArrayList<>();
        for (SensitivityIndex s : SensitivityChart.ranked(u)) {
            RangedInput in = u.inputs().stream().filter(i -> i.input().equals(s.input())).findFirst().orElse(null);
            rows.add(List.of(s.input(), in == null ? "" : in.distribution(), index(s.first(), s.firstHalfWidth()),
                    index(s.total(), s.totalHalfWidth()), in == null ? "" : in.basis()));
            ranked.add(s.input());
        }
        for (RangedInput in : u.inputs()) {
            if (!ranked.contains(in.input())) {
                rows.add(List.of(in.input(), in.distribution(), "", "", in.basis()));
            }
        }
        return new SummaryContent.Table(List.of("input", "range", "first-order index [95% interval]",
                "total index [95% interval]", "basis of the range"), rows);
    }

    /** "0.31 [0.28, 0.34]": two lines in a table. */
    static String index(double value, double halfWidth) {
        return String.format(Locale.ROOT, "%.2f [%.2f, %.2f]", value, value - halfWidth, value + halfWidth);
    }
}
