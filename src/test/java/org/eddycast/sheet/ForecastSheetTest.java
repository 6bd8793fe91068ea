package org.eddycast.sheet;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.apache.pdfbox.Loader;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.text.PDFTextStripper;
import org.eddycast.engine.Engine;
import org.eddycast.engine.StudyResult;
import org.eddycast.forecast.Comparison;
import org.eddycast.forecast.Forecast;
import org.eddycast.particles.Cancellation;
import org.eddycast.particles.RunListener;
import org.eddycast.report.ChartSpec;
import org.eddycast.report.ChartSpecs;
import org.eddycast.report.SummaryContent;
import org.eddycast.scenario.ScenarioReader;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

/**
 * The forecast on the summary sheet and in its charts: a small channel (invented) run once, its sheet read back
 * with PDFBox, the handbook curves of the width chart checked against the handbook formula, and the comparison
 * sheet of two design options.
 */
public class ForecastSheetTest {

    /** An invented channel, 6 m wide and 1.2 m deep; few particles so the run takes seconds. */
    public static final String CHANNEL = """
            { "version": 1, "name": "Small drainage channel (test)",
              "flow": { "kind": "channel", "depth": 1.2, "width": 6.0, "meanVelocity": 0.45, "bedSlope": 2.0e-4 },
              "substance": { "name": "rhodamine WT", "molecularDiffusivity": 4.0e-10 },
              "release": { "mass": 0.2, "location": "centre-line" },
              "forecast": { "widthMeasure": "fwhm" },
              "simulation": { "particles": 512, "groupSize": 32, "modes": 16, "timeStep": 0.2, "duration": 150,
                              "seed": 33 } }
            """;

    static StudyResult channel;

    @BeforeAll
    static void runChannel() throws Exception {
        channel = Engine.run(ScenarioReader.parse(CHANNEL), 2, RunListener.NONE, new Cancellation());
    }

    @Test
    void handbookCurveIsTheWidthOfAConstantDiffusivity() {
        Forecast f = channel.forecast();
        ChartSpec spec = ChartSpecs.width(f, "Plume width");
        ChartSpec.Curve transverse = spec.curves().stream()
                .filter(c -> c.name().startsWith("handbook along y: eps_t = 0.15 h u*")).findFirst().orElseThrow();
        assertTrue(transverse.dashed());
        // Shear velocity u* = sqrt(g R S), R = h W / (W + 2 h) (Chow 1959, Open-Channel Hydraulics, from memory);
        // transverse coefficient eps_t = 0.15 h u* (Fischer et al. 1979, Mixing in Inland and Coastal Waters,
        // ch. 5, from memory); a constant diffusivity gives sigma^2 = 2 eps t (Fischer et al. 1979, ch. 2), and
        // the full width at half maximum is 2 sqrt(2 ln 2) sigma (exact for a Gaussian). Here t = x / U.
        double radius = 1.2 * 6.0 / (6.0 + 2 * 1.2);
        double shear = Math.sqrt(9.81 * radius * 2.0e-4);
        double eps = 0.15 * 1.2 * shear;
        double[] x = transverse.x();
        double[] y = transverse.y();
        for (int j = 0; j < x.length; j += 10) {
            double expected = 2 * Math.sqrt(2 * Math.log(2)) * Math.sqrt(2 * eps * x[j] / 0.45);
            // g = 9.81 here against the engine's standard gravity: 0.02% in u*, 0.01% in the width
            assertEquals(expected, y[j], 5e-4 * expected, "handbook width at x = " + x[j] + " m");
        }
        assertTrue(spec.yLabel().contains("FWHM") && spec.yLabel().endsWith("(m)"), spec.yLabel());
        assertTrue(spec.title().contains("full width at half maximum"), spec.title());
        assertEquals("distance downstream (m)", spec.xLabel());
        // longitudinal coefficients hold once the tracer is mixed across the section: no point before that
        double mixed = f.mixing().get(0).value();
        spec.curves().stream().filter(c -> c.name().contains("once mixed across"))
                .forEach(c -> assertTrue(c.x()[0] >= mixed, c.name()));
    }

    @Test
    void channelSheetCarriesForecastHandbookAndCautions() throws Exception {
        Path pdf = Path.of("target", "screenshots", "sheet-channel.pdf");
        Files.createDirectories(pdf.getParent());
        SummarySheetPdf.write(channel, pdf);
        String text = text(pdf);
        Forecast f = channel.forecast();
        Forecast.MixingFigure across = f.mixing().get(0);
        assertTrue(text.contains(across.name()), "mixing figure name");
        assertTrue(text.contains(SummaryContent.number(across.value())), "distance to mixed");
        assertTrue(text.contains("[" + SummaryContent.number(across.low()) + ", "
                + SummaryContent.number(across.high()) + "]"), "its interval");
        SummaryContent.Table table = SummaryContent.forecastTable(f);
        assertEquals(SummaryContent.forecastTable(f).rows().size(), 8);
        String lastWidth = table.rows().get(7).get(3).split(" ")[0];
        assertTrue(text.contains(lastWidth), "the forecast table's last width along y");
        assertTrue(text.contains("FWHM"), "width measure on the widths");
        for (Comparison c : f.handbook()) {
            assertTrue(text.contains(SummaryContent.number(c.estimate().value()) + " m\u00b2/s"),
                    "handbook value of " + c.estimate().name());
        }
        assertTrue(text.contains("eps_t = 0.15 h u*"), "handbook formula");
        assertTrue(text.contains("Likely reasons") || f.handbook().stream().allMatch(Comparison::agree));
        assertTrue(text.contains(f.cautions().get(0).substring(0, 40)), "first caution");
        assertTrue(text.contains(f.assumptions().get(f.assumptions().size() - 1).substring(0, 30)),
                "the forecast's own assumptions");
        assertTrue(text.contains("kg/m\u00b3"), "concentration unit");
    }

    @Test
    void comparisonSheetShowsOptionsSideBySideWithTheVerdict() throws Exception {
        StudyResult slower = run(0.04, "Gentle stirring (test)");
        StudyResult faster = run(0.08, "Strong stirring (test)");
        List<String> names = List.of("option A: gentle", "option B: strong");
        Path pdf = Path.of("target", "screenshots", "sheet-options.pdf");
        Files.createDirectories(pdf.getParent());
        SummarySheetPdf.writeOptions(names, List.of(slower, faster), pdf);
        String text = text(pdf);
        assertTrue(text.contains("option A: gentle") && text.contains("option B: strong"), "option names");
        assertTrue(text.contains("Options side by side"));
        // doubling u' at the same integral length and correlation time spreads faster (Taylor 1921: D = u'^2 T_L)
        assertTrue(text.contains("spreads the tracer faster"), text);
        assertTrue(text.contains("0.04 m/s") && text.contains("0.08 m/s"), "inputs side by side with units");
        assertTrue(text.contains("screening estimate"), "cautions");
        assertEquals(1, SummarySheetPdf.optionCharts(names, List.of(slower, faster)).size());
    }

    private static StudyResult run(double rms, String name) {
        String json = """
                { "version": 1, "name": "%s",
                  "flow": { "kind": "direct", "dimensions": 3, "rmsVelocity": %s, "integralLength": 0.25,
                            "correlationTime": 5.0 },
                  "substance": { "name": "fluorescein", "molecularDiffusivity": 4.25e-10 },
                  "simulation": { "particles": 512, "groupSize": 32, "modes": 16, "timeStep": 0.5,
                                  "duration": 60, "seed": 9 } }
                """.formatted(name, rms);
        return Engine.run(ScenarioReader.parse(json), 2, RunListener.NONE, new Cancellation());
    }

    private static String text(Path pdf) throws Exception {
        try (PDDocument doc = Loader.loadPDF(pdf.toFile())) {
            return new PDFTextStripper().getText(doc).replaceAll("\\s+", " ");
        }
    }
}
