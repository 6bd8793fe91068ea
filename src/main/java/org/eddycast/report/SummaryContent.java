package org.eddycast.report;

import java.time.ZoneId;
import java.time.format.DateTimeFormatter;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.eddycast.engine.DiffusivityResult;
import org.eddycast.engine.StudyResult;
import org.eddycast.forecast.Cautions;
import org.eddycast.scenario.ChannelDesign;
import org.eddycast.scenario.ChannelFlow;
import org.eddycast.scenario.DirectFlow;
import org.eddycast.scenario.MeasuredFlow;
import org.eddycast.scenario.Scenario;
import org.eddycast.scenario.TankDesign;
import org.eddycast.scenario.TankFlow;
import org.eddycast.scenario.TurbulenceStatistics;
import org.eddycast.stats.AxisEstimate;
import org.eddycast.stats.SlopeEstimate;

/**
 * What the summary sheet and the results table say about one study, as text rows with their units. The
 * forecast (plume width, peak concentration, time or distance to mixed) and the handbook comparison are seams:
 * their lists stay empty until the forecast layer supplies them, and the sheet then says so rather than
 * inventing numbers.
 *
 * @param title        the sheet's title
 * @param scenarioName the scenario's name
 * @param route        the flow route in words
 * @param date         when the result was computed (local date and time)
 * @param toolVersion  the tool's version
 * @param inputs       inputs with their units
 * @param results      results with their 95% intervals and units
 * @param forecast     forecast rows (empty until the forecast layer supplies them)
 * @param handbook     handbook estimates side by side (empty until the forecast layer supplies them)
 * @param assumptions  assumptions, warnings and notes
 * @param cautions     the cautions every forecast carries
 * @param references   the methods' published sources
 */
public record SummaryContent(String title, String scenarioName, String route, String date, String toolVersion,
                             List<Row> inputs, List<Row> results, List<Row> forecast, List<Row> handbook,
                             List<String> assumptions, List<String> cautions, List<String> references) {

    /** One line of a table: a quantity, its value, its interval ("" for none) and its unit. */
    public record Row(String quantity, String value, String interval, String unit) {
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
        handbook = List.copyOf(handbook);
        assumptions = List.copyOf(assumptions);
        cautions = List.copyOf(cautions);
        references = List.copyOf(references);
    }

    /** The content of one study's sheet. */
    public static SummaryContent of(StudyResult s) {
        DiffusivityResult r = s.diffusivity();
        List<String> assumptions = new ArrayList<>(s.flow().assumptions());
        s.flow().warnings().forEach(w -> assumptions.add("Warning: " + w));
        r.warnings().forEach(w -> assumptions.add("Warning: " + w));
        r.notes().forEach(n -> assumptions.add("Note: " + n));
        String date = DateTimeFormatter.ofPattern("yyyy-MM-dd HH:mm", Locale.ROOT)
                .format(s.finished().atZone(ZoneId.systemDefault()));
        return new SummaryContent("Tracer spreading: screening summary", s.scenario().name(),
                routeWords(s.scenario()), date, s.toolVersion(), inputs(s), results(s), List.of(), List.of(),
                assumptions, Cautions.ALL, REFERENCES);
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
            rows.add(row("impeller speed N", d.impellerSpeed(), "rev/s"));
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
        if (!Double.isNaN(sc.release().rate())) {
            rows.add(row("release rate", sc.release().rate(), "kg/s"));
        }
        rows.add(new Row("width measure", sc.forecast().widthMeasure(), "", ""));
        rows.add(row("particles", sc.simulation().particles(), "-"));
        rows.add(new Row("seed", Long.toString(sc.simulation().seed()), "", "-"));
        return rows;
    }

    private static List<Row> results(StudyResult s) {
        DiffusivityResult r = s.diffusivity();
        List<Row> rows = new ArrayList<>();
        for (AxisEstimate a : r.axes()) {
            SlopeEstimate e = a.diffusivity();
            rows.add(new Row("eddy diffusivity along " + a.axisName(), number(e.value()),
                    "[" + number(e.low()) + ", " + number(e.high()) + "]", "m\u00b2/s"));
        }
        for (AxisEstimate a : r.axes()) {
            rows.add(row("Lagrangian time scale along " + a.axisName(), a.lagrangianTimeScale(), "s"));
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
