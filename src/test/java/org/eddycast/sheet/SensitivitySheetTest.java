package org.eddycast.sheet;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import org.apache.pdfbox.Loader;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.text.PDFTextStripper;
import org.eddycast.engine.Engine;
import org.eddycast.engine.StudyResult;
import org.eddycast.particles.Cancellation;
import org.eddycast.particles.RunListener;
import org.eddycast.report.SummaryContent;
import org.eddycast.scenario.ScenarioReader;
import org.eddycast.uncertainty.ExampleUncertainty;
import org.eddycast.uncertainty.UncertaintySummary;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

/** The sheet carries the inputs' ranking and the advice when the study has an uncertainty part, else not. */
class SensitivitySheetTest {

    private static StudyResult result;

    @BeforeAll
    static void run() {
        // an invented tiny scenario: the sheet needs a result to hang the ranking on
        String tiny = """
                { "version": 1, "name": "Tiny ranked flow",
                  "flow": { "kind": "direct", "dimensions": 3, "rmsVelocity": 0.04, "integralLength": 0.25,
                            "correlationTime": 5.0 },
                  "substance": { "name": "fluorescein", "molecularDiffusivity": 4.25e-10 },
                  "simulation": { "particles": 512, "groupSize": 32, "modes": 16, "timeStep": 0.5,
                                  "duration": 60, "seed": 9 } }
                """;
        result = Engine.run(ScenarioReader.parse(tiny), 2, RunListener.NONE, new Cancellation());
    }

    private static String pdfText(SummarySheetLayout layout, String name) throws Exception {
        Path pdf = Path.of("target", "screenshots", name);
        Files.createDirectories(pdf.getParent());
        SummarySheetPdf.write(layout, pdf);
        try (PDDocument doc = Loader.loadPDF(pdf.toFile())) {
            assertEquals(layout.pageCount(), doc.getNumberOfPages());
            return new PDFTextStripper().getText(doc).replaceAll("\\s+", " ");
        }
    }

    @Test
    void aStudyWithAnUncertaintyPartShowsTheRankingAndTheAdvice() throws Exception {
        UncertaintySummary u = ExampleUncertainty.blendTimeStudy();
        SummarySheetLayout layout = SummarySheetPdf.layout(result.withUncertainty(u));
        assertTrue(layout.rankingPage() == 0 || layout.rankingPage() == 1, "page " + layout.rankingPage());
        String text = pdfText(layout, "sheet-sensitivity.pdf");
        assertTrue(text.contains("Uncertain inputs: how wide the answer is"), "the section heading");
        UncertaintySummary.FigureRange f = u.mainFigure();
        org.eddycast.engine.DisplayFormat shown =
                new org.eddycast.engine.DisplayFormat(result.scenario().forecast().units());
        assertTrue(text.contains(shown.ofUnit(f.unit(), f.p05()) + " to " + shown.ofUnit(f.unit(), f.p95())),
                "the figure's input range, in the display units");
        assertTrue(text.contains(shown.ofUnit(f.unit(), f.mcLow()) + " to " + shown.ofUnit(f.unit(), f.mcHigh())),
                "the figure's Monte Carlo interval beside it");
        if (layout.rankingPage() == 1) {
            assertTrue(layout.pageOneText().contains(u.advice()), "the advice stays on page 1");
        }
        assertTrue(text.contains(SensitivityChart.title(u)), "the chart's title names the figure");
        for (UncertaintySummary.SensitivityIndex s : u.sensitivity()) {
            assertTrue(text.contains(s.input()), "input " + s.input());
        }
        assertTrue(text.contains("most sensitive to flow.impeller.powerNumber"), "the advice");
    }

    @Test
    void aStudyWithoutOneHasNoRanking() throws Exception {
        SummarySheetLayout layout = SummarySheetPdf.layout(result);
        assertEquals(-1, layout.rankingPage());
        assertFalse(pdfText(layout, "sheet-no-sensitivity.pdf").contains("Uncertain inputs"));
        SummarySheetLayout unranked = SummarySheetPdf.layout(result.withUncertainty(
                ExampleUncertainty.withoutRanking()));
        assertEquals(-1, unranked.rankingPage(), "no indices, no ranking");
    }
}
