package org.eddycast.report;

import java.time.ZoneId;
import java.time.format.DateTimeFormatter;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.eddycast.engine.DiffusivityResult;
import org.eddycast.engine.StudyResult;
import org.eddycast.forecast.Cautions;
import org.eddycast.forecast.Comparison;
import org.eddycast.forecast.Forecast;
import org.eddycast.forecast.HandbookEstimate;
import org.eddycast.scenario.ChannelDesign;
import org.eddycast.scenario.ChannelFlow;
import org.eddycast.scenario.DirectFlow;
import org.eddycast.scenario.DisplayUnits;
import org.eddycast.scenario.MeasuredFlow;
import org.eddycast.scenario.Scenario;
import org.eddycast.scenario.TankDesign;
import org.eddycast.scenario.TankFlow;
import org.eddycast.scenario.TurbulenceStatistics;
import org.eddycast.stats.AxisEstimate;
import org.eddycast.stats.SlopeEstimate;

/**
 * What the summary sheet and the results tables say about one study (or about design options side by side), as
 * text with its units. A study without a forecast leaves the forecast parts empty and the sheet says so rather
 * than inventing numbers.
 *
 * @param title        the sheet's title
 * @param scenarioName the scenario's name
 * @param route        the flow route in words
 * @param date         when the result was computed (local date and time)
 * @param toolVersion  the tool's version
 * @param inputs       inputs with their units
 * @param results      results with their 95% intervals and units
 * @param forecast     forecast figures: the width measure, the times or distances to mixed with their
 *                     intervals, how far the simulated part reaches
 * @param forecastTable widths and peak concentration at a subset of the forecast grid, units in the headers
 * @param handbook     handbook estimates beside the simulated values, with ratio and agreement
 * @param handbookNotes each comparison in plain words, with the likely reasons when they disagree
 * @param sideBySide   design options side by side (empty for a single study)
 * @param verdict      the options' verdict in plain words ("" for a single study)
 * @param assumptions  assumptions, warnings and notes
 * @param cautions     the cautions every forecast carries
 * @param references   the methods' published sources
 */
public record SummaryContent(String title, String scenarioName, String route, String date, String toolVersion,
                             List<Row> inputs, List<Row> results, List<Row> forecast, Table forecastTable,
                             Table handbook, List<String> handbookNotes, Table sideBySide, String verdict,
                             List<String> assumptions, List<String> cautions, List<String> references) {

    /** One line of a table: a quantity, its value, its interval ("" for none) and its unit. */
    public record Row(String quantity, String value, String interval, String unit) {
    }

    /**
     * A table of text with its header; every row has the header's length.
     *
     * @param header the column headings, with units
     * @param rows   the cells
     */
    public record Table(List<String> header, List<List<String>> rows) {

        /** A table with no columns and no rows. */
        public static final Table EMPTY = new Table(List.of(), List.of());

        public Table {
            header = List.copyOf(header);
            rows = rows.stream().map(List::copyOf).toList();
            for (List<String> r : rows) {
                if (r.size() != header.size()) {
                    throw new IllegalArgumentException("a table row has " + r.size() + " cells but the header has "
                            + header.size() + " columns: " + r);
                }
            }
        }

        public boolean isEmpty() {
            return rows.isEmpty();
        }
    }

    /** The method references every sheet lists. */
    public static final List<String> REFERENCES = List.of(
            "Taylor, G. I. (1921). Diffusion by continuous movements. Proc. London Math. Soc. s2-20, 196-212.",
            "Kraichnan, R. H. (1970). Diffusion by a random velocity field. Phys. Fluids 13, 22-31.",
            "Pope, S. B. (2000). Turbulent Flows. Cambridge University Press (model spectrum, sec. 6.5.3).",
            "McLachlan, R. I. & Quispel, G. R. W. (2002). Splitting methods. Acta Numerica 11, 341-434.",
            "Fischer, H. B. et al. (1979). Mixing in Inland and Coastal Waters. Academic Press.",
            "Welch, P. D. (1967). The use of fast Fourier transform for the estimation of power spectra. "
                    + "IEEE Trans. Audio Electroacoust. AU-15, 70-73.");

    public SummaryContent {
        inputs = List.copyOf(inputs);
        results = List.copyOf(results);
        forecast = List.copyOf(forecast);
        handbookNotes = List.copyOf(handbookNotes);
        verdict = verdict == null ? "" : verdict;
        assumptions = List.copyOf(assumptions);
        cautions = List.copyOf(cautions);
        references = List.copyOf(references);
    }

    /** The content of one study's sheet. */
    public static SummaryContent of(StudyResult s) {
        DiffusivityResult r = s.diffusivity();
        Forecast f = s.forecast();
        List<String> assumptions = new ArrayList<>(f != null ? f.assumptions() : s.flow().assumptions());
        s.preflight().forEach(w -> assumptions.add("Warning (before the run): " + w));
        s.flow().warnings().stream().filter(w -> !s.preflight().contains(w))
                .forEach(w -> assumptions.add("Warning: " + w));
        r.warnings().forEach(w -> assumptions.add("Warning: " + w));
        r.notes().forEach(n -> assumptions.add("Note: " + n));
        if (f == null) {
            return new SummaryContent("Tracer spreading: screening summary", s.scenario().name(),
                    routeWords(s.scenario()), date(s), s.toolVersion(), inputs(s), results(s), List.of(),
                    Table.EMPTY, Table.EMPTY, List.of(), Table.EMPTY, "", assumptions, Cautions.ALL, REFERENCES);
        }
        return new SummaryContent("Tracer spreading: screening summary", s.scenario().name(),
                routeWords(s.scenario()), date(s), s.toolVersion(), inputs(s), results(s),
                forecastRows(f, s.scenario().forecast().units()), forecastTable(f, s.scenario().forecast().units()),
                handbookTable(f), handbookNotes(f), Table.EMPTY, "", assumptions, f.cautions(),
                REFERENCES);
    }

    /**
     * Design options side by side: each option's inputs, eddy diffusivities (an asterisk where the 95% interval
     * does not overlap the first option's) and first mixing figure; the verdict; every option's assumptions once.
     */
    public static SummaryContent ofOptions(List<String> names, List<StudyResult> options) {
        OptionComparison c = OptionComparison.of(names, options);
        List<String> header = new ArrayList<>();
        header.add("quantity");
        header.addAll(names);
        List<List<String>> rows = new ArrayList<>();
        rows.add(sideRow("flow route", options.stream().map(o -> routeWords(o.scenario())).toList()));
        rows.add(sideRow("scenario", options.stream().map(o -> o.scenario().name()).toList()));
        List<List<Row>> inputs = options.stream().map(SummaryContent::inputs).toList();
        List<String> quantities = new ArrayList<>();
        inputs.forEach(list -> list.forEach(row -> {
            if (!quantities.contains(row.quantity())) {
                quantities.add(row.quantity());
            }
        }));
        for (String q : quantities) {
            List<String> cells = new ArrayList<>();
            for (List<Row> list : inputs) {
                cells.add(list.stream().filter(row -> row.quantity().equals(q)).findFirst()
                        .map(row -> (row.value() + " " + row.unit()).trim()).orElse("\u2014"));
            }
            rows.add(sideRow(q, cells));
        }
        for (int a = 0; a < c.axes().size(); a++) {
            List<String> cells = new ArrayList<>();
            for (int o = 0; o < options.size(); o++) {
                var e = c.values().get(o).get(a);
                cells.add(number(e.value()) + " [" + number(e.low()) + ", " + number(e.high()) + "] m\u00b2/s"
                        + (c.differs().get(o).get(a) ? " *" : ""));
            }
            rows.add(sideRow("eddy diffusivity along " + c.axes().get(a), cells));
        }
        List<String> mixing = new ArrayList<>();
        boolean anyMixing = false;
        // one mixing figure for every option (a blend time, a distance to mixed) names the row itself
        String common = OptionVerdict.commonMixingName(options);
        for (StudyResult o : options) {
            Forecast f = o.forecast();
            if (f == null || f.mixing().isEmpty()) {
                mixing.add("\u2014");
            } else {
                Forecast.MixingFigure m = f.mixing().get(0);
                mixing.add((common == null ? m.name() + ": " : "") + number(m.value()) + " [" + number(m.low())
                        + ", " + number(m.high()) + "] " + m.unit());
                anyMixing = true;
            }
        }
        if (anyMixing) {
            rows.add(sideRow(common != null ? common : "time or distance to mixed", mixing));
        }
        List<String> assumptions = new ArrayList<>();
        for (StudyResult o : options) {
            List<String> own = o.forecast() != null ? o.forecast().assumptions() : o.flow().assumptions();
            for (String a : own) {
                if (!assumptions.contains(a)) {
                    assumptions.add(a);
                }
            }
        }
        List<String> cautions = options.get(0).forecast() != null ? options.get(0).forecast().cautions()
                : Cautions.ALL;
        return new SummaryContent("Design options compared: screening summary", String.join(" / ", names),
                String.join("; ", options.stream().map(o -> routeWords(o.scenario())).distinct().toList()),
                date(options.get(options.size() - 1)), options.get(0).toolVersion(), List.of(), List.of(), List.of(),
                Table.EMPTY, Table.EMPTY, List.of(), new Table(header, rows), c.verdict(), assumptions, cautions,
                REFERENCES);
    }

    private static List<String> sideRow(String quantity, List<String> cells) {
        List<String> row = new ArrayList<>();
        row.add(quantity);
        row.addAll(cells);
        return row;
    }

    private static String date(StudyResult s) {
        return DateTimeFormatter.ofPattern("yyyy-MM-dd HH:mm", Locale.ROOT)
                .format(s.finished().atZone(ZoneId.systemDefault()));
    }

    /** Rows of the forecast table: this many grid points, spread evenly over the (geometric) grid. */
    static final int TABLE_POINTS = 8;

    /** The width measure, each time or distance to mixed with its interval, and how far the simulation reaches. */
    static List<Row> forecastRows(Forecast f) {
        return forecastRows(f, DisplayUnits.si());
    }

    /** The same in the scenario's display units: times and distances to mixed, how far the simulation reaches. */
    static List<Row> forecastRows(Forecast f, DisplayUnits u) {
        List<Row> rows = new ArrayList<>();
        rows.add(new Row("width measure", ChartSpecs.measureName(f), "", ""));
        for (Forecast.MixingFigure m : f.mixing()) {
            java.util.function.DoubleUnaryOperator to = m.unit().equals("m") ? u::distance
                    : m.unit().equals("s") ? u::time : v -> v;
            String unit = m.unit().equals("m") ? u.distance() : m.unit().equals("s") ? u.time() : m.unit();
            rows.add(new Row(m.name(), number(to.applyAsDouble(m.value())), "[" + number(to.applyAsDouble(m.low()))
                    + ", " + number(to.applyAsDouble(m.high())) + "]", unit));
        }
        rows.add(new Row("widths simulated up to (beyond: sigma\u00b2 + 2 D t)", number(u.time(f.simulatedUntil())),
                "", u.time()));
        return rows;
    }

    /**
     * Widths per axis with their 95% bands and the peak concentration at {@link #TABLE_POINTS} points of the
     * grid, in SI units; the last column says whether a width comes from the simulated curve or from 2 D t beyond
     * it.
     */
    public static Table forecastTable(Forecast f) {
        return forecastTable(f, DisplayUnits.si());
    }

    /**
     * The same with the grid's distances and times and the concentrations in the display units (headers name
     * them); widths stay in metres, the scale of a plume's width whatever the reach.
     */
    public static Table forecastTable(Forecast f, DisplayUnits u) {
        double[] grid = f.grid();
        double[] times = f.times();
        double[][] w = f.width();
        double[][] lo = f.widthLow();
        double[][] hi = f.widthHigh();
        double[] peak = f.peakConcentration();
        String measure = shortMeasure(f);
        List<String> header = new ArrayList<>();
        header.add(f.inDistance() ? "distance downstream (" + u.distance() + ")" : "time (" + u.time() + ")");
        if (f.inDistance()) {
            header.add("time (" + u.time() + ")");
        }
        String[] axes = {"x", "y", "z"};
        for (int a = 0; a < w.length; a++) {
            header.add("width along " + axes[a] + ", " + measure + " (m) [95% band]");
        }
        header.add("peak concentration (" + concentrationLabel(u) + ")");
        header.add("width from");
        List<List<String>> rows = new ArrayList<>();
        int n = grid.length;
        int points = Math.min(TABLE_POINTS, n);
        for (int k = 0; k < points; k++) {
            int j = (int) Math.round((k + 1) * (double) n / points) - 1;
            List<String> row = new ArrayList<>();
            row.add(number(f.inDistance() ? u.distance(grid[j]) : u.time(grid[j])));
            if (f.inDistance()) {
                row.add(number(u.time(times[j])));
            }
            for (int a = 0; a < w.length; a++) {
                row.add(number(w[a][j]) + " [" + number(lo[a][j]) + ", " + number(hi[a][j]) + "]");
            }
            row.add(number(u.concentration(peak[j])));
            row.add(times[j] <= f.simulatedUntil() ? "simulation" : "2 D t beyond it");
            rows.add(row);
        }
        return new Table(header, rows);
    }

    /** A display unit of concentration as a heading shows it: kg/m\u00b3, mg/L or ug/L. */
    public static String concentrationLabel(DisplayUnits u) {
        return u.concentration().equals("kg/m3") ? "kg/m\u00b3" : u.concentration();
    }

    /** The width measure in a few words for column headings (FWHM: full width at half maximum). */
    public static String shortMeasure(Forecast f) {
        return switch (f.measure()) {
            case STANDARD_DEVIATION -> "standard deviation";
            case FULL_WIDTH_AT_HALF_MAXIMUM -> "FWHM";
            case VISIBLE_EDGE -> "edge at " + number(100 * f.edgeFraction()) + "% of peak";
        };
    }

    /** Each handbook estimate beside the simulated value: value with its range, ratio, agreement. */
    public static Table handbookTable(Forecast f) {
        List<List<String>> rows = new ArrayList<>();
        for (Comparison c : f.handbook()) {
            HandbookEstimate e = c.estimate();
            String unit = unit(e.unit());
            rows.add(List.of(e.name(), e.formula() + "; " + e.sourceText(),
                    number(e.value()) + " " + unit + " [" + number(e.low()) + ", " + number(e.high()) + "]",
                    number(c.forecast()) + " " + unit + " [" + number(c.forecastLow()) + ", "
                            + number(c.forecastHigh()) + "]",
                    String.format(Locale.ROOT, "%.2f", c.ratio()),
                    c.agree() ? "yes, within the stated uncertainty" : "no"));
        }
        return new Table(List.of("handbook estimate", "formula and source", "handbook value [range]",
                "simulated [95% interval]", "ratio to handbook", "agree"), rows);
    }

    /** Each comparison's plain summary, followed by its likely reasons when the values disagree. */
    public static List<String> handbookNotes(Forecast f) {
        List<String> notes = new ArrayList<>();
        for (Comparison c : f.handbook()) {
            StringBuilder sb = new StringBuilder(capitalized(c.estimate().name())).append(": ").append(c.summary());
            if (!c.likelyReasons().isEmpty()) {
                sb.append(" Likely reasons: ").append(String.join(" ", c.likelyReasons()));
            }
            notes.add(unit(sb.toString()));
        }
        return notes;
    }

    /** The scenario's width-measure key in words. */
    static String measureWords(String key) {
        return switch (key) {
            case "standard-deviation" -> "standard deviation";
            case "fwhm" -> "full width at half maximum";
            case "visible-edge" -> "visible-edge width";
            default -> key;
        };
    }

    /** Units as printed: m^2/s becomes m\u00b2/s. */
    public static String unit(String u) {
        return u.replace("^2", "\u00b2").replace("^3", "\u00b3");
    }

    private static String capitalized(String s) {
        return s.isEmpty() ? s : Character.toUpperCase(s.charAt(0)) + s.substring(1);
    }

    static String routeWords(Scenario s) {
        return switch (s.flow().kind()) {
            case "direct" -> "turbulence statistics given directly";
            case "tank" -> "stirred tank, modeled from design data";
            case "channel" -> "open channel, modeled from design data";
            case "measured" -> "measured velocity record";
            default -> "verification flow (" + s.flow().kind() + ")";
        };
    }

    private static List<Row> inputs(StudyResult s) {
        Scenario sc = s.scenario();
        List<Row> rows = new ArrayList<>();
        if (sc.flow() instanceof DirectFlow d) {
            rows.add(row("rms velocity u'", d.rmsVelocity(), "m/s"));
            rows.add(row("integral length L", d.integralLength(), "m"));
            rows.add(row("correlation time", d.correlationTime(), "s"));
            rows.add(row("mean velocity U", d.meanVelocity(), "m/s"));
        } else if (sc.flow() instanceof TankFlow t) {
            TankDesign d = t.design();
            rows.add(row("tank diameter T", d.tankDiameter(), "m"));
            rows.add(row("liquid height H", d.liquidHeight(), "m"));
            rows.add(row("impeller diameter D", d.impellerDiameter(), "m"));
            DisplayUnits units = sc.forecast().units();
            rows.add(row("impeller speed N", units.speed(d.impellerSpeed()), units.speed()));
            if (d.impellerType() != null) {
                rows.add(new Row("impeller", d.impellerType().description(), "", ""));
            }
            if (d.powerNumber() != null) {
                rows.add(row("power number Po", d.powerNumber(), "-"));
            }
            rows.add(new Row("wall baffles", d.baffled() ? "yes" : "no", "", ""));
        } else if (sc.flow() instanceof ChannelFlow c) {
            ChannelDesign d = c.design();
            rows.add(row("depth h", d.depth(), "m"));
            rows.add(row("width W", d.width(), "m"));
            rows.add(row("mean velocity U", d.meanVelocity(), "m/s"));
            if (d.bedSlope() != null) {
                rows.add(row("bed slope S", d.bedSlope(), "m/m"));
            }
            if (d.shearVelocity() != null) {
                rows.add(row("shear velocity u*", d.shearVelocity(), "m/s"));
            }
            if (d.manningN() != null) {
                rows.add(row("Manning's n", d.manningN(), "s/m^(1/3)"));
            }
        } else if (sc.flow() instanceof MeasuredFlow m) {
            rows.add(new Row("velocity record", m.record(), "", "file"));
            rows.add(new Row("spectrum", m.modelSpectrum() ? "model spectrum" : "fitted power law", "", ""));
        }
        rows.add(new Row("substance", sc.substance().name().isEmpty() ? "(not named)" : sc.substance().name(), "",
                ""));
        rows.add(row("molecular diffusivity D0", sc.substance().molecularDiffusivity(), "m\u00b2/s"));
        rows.add(row("mass released", sc.release().mass(), "kg"));
        rows.add(new Row("release point", releasePoint(sc), "", ""));
        if (!Double.isNaN(sc.release().rate())) {
            rows.add(row("release rate", sc.release().rate(), "kg/s"));
        }
        rows.add(new Row("width measure", measureWords(sc.forecast().widthMeasure()), "", ""));
        rows.add(row("particles", sc.simulation().particles(), "-"));
        rows.add(new Row("seed", Long.toString(sc.simulation().seed()), "", "-"));
        return rows;
    }

    /** Where the tracer is released, in words: the bank or the centre-line of a channel, a point in a tank. */
    static String releasePoint(Scenario sc) {
        if (sc.flow() instanceof ChannelFlow) {
            return sc.release().atBank() ? "at the bank" : "on the centre-line";
        }
        double[] p = sc.release().position();
        if (sc.flow() instanceof TankFlow) {
            return p == null ? "centre of the tank" : String.format(Locale.ROOT, "x %s, y %s, z %s m from a corner",
                    number(p[0]), number(p[1]), number(p[2]));
        }
        return "a point in open water";
    }

    private static List<Row> results(StudyResult s) {
        DiffusivityResult r = s.diffusivity();
        List<Row> rows = new ArrayList<>();
        for (AxisEstimate a : r.axes()) {
            SlopeEstimate e = a.diffusivity();
            rows.add(a.determined() ? new Row("eddy diffusivity along " + a.axisName(), number(e.value()),
                    "[" + number(e.low()) + ", " + number(e.high()) + "]", "m\u00b2/s")
                    : new Row("eddy diffusivity along " + a.axisName(), "not determined", "", "m\u00b2/s"));
        }
        for (AxisEstimate a : r.axes()) {
            rows.add(a.timeScaleDetermined() ? row("Lagrangian time scale along " + a.axisName(),
                    a.lagrangianTimeScale(), "s")
                    : new Row("Lagrangian time scale along " + a.axisName(), "not determined", "", "s"));
        }
        TurbulenceStatistics t = s.turbulence();
        if (t != null) {
            rows.add(row("rms velocity u' used", t.rmsVelocity(), "m/s"));
            rows.add(row("integral length L used", t.integralLength(), "m"));
            rows.add(row("correlation time used", t.correlationTime(), "s"));
            if (!Double.isNaN(t.dissipationRate())) {
                rows.add(row("dissipation rate", t.dissipationRate(), "W/kg"));
            }
        }
        rows.add(row("Kubo number", r.kubo(), "-"));
        rows.add(row("P\u00e9clet number", r.peclet(), "-"));
        rows.add(row("particles followed", r.particles(), "-"));
        rows.add(row("simulated time", r.duration(), "s"));
        rows.add(row("time step", r.timeStep(), "s"));
        return rows;
    }

    private static Row row(String quantity, double v, String unit) {
        return new Row(quantity, number(v), "", unit);
    }

    /** Four significant figures; "infinite" and "n/a" where a number has none. */
    public static String number(double v) {
        if (Double.isNaN(v)) {
            return "n/a";
        }
        if (Double.isInfinite(v)) {
            return v > 0 ? "infinite" : "-infinite";
        }
        if (v == Math.rint(v) && Math.abs(v) < 1e7) {
            return Long.toString((long) v);
        }
        double a = Math.abs(v);
        if (a >= 1e-3 && a < 1e5) {
            return new java.math.BigDecimal(v).round(new java.math.MathContext(4)).stripTrailingZeros()
                    .toPlainString();
        }
        return String.format(Locale.ROOT, "%.4g", v);
    }
}
