package org.eddycast.sheet;

import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import org.apache.pdfbox.Loader;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.text.PDFTextStripper;
import org.eddycast.engine.Engine;
import org.eddycast.report.SummaryContent;
import org.eddycast.engine.StudyResult;
import org.eddycast.forecast.Cautions;
import org.eddycast.particles.Cancellation;
import org.eddycast.particles.RunListener;
import org.eddycast.scenario.ScenarioReader;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The sheet's PDF read back with PDFBox: the key numbers, their units and the cautions are in its text. */
class SummarySheetPdfTest {

    @TempDir
    Path tmp;

    @Test
    void pdfTextCarriesKeyNumbersUnitsAndCautions() throws Exception {
        String tiny = """
                { "version": 1, "name": "Tiny sheet flow",
                  "flow": { "kind": "direct", "dimensions": 3, "rmsVelocity": 0.04, "integralLength": 0.25,
                            "correlationTime": 5.0 },
                  "substance": { "name": "fluorescein", "molecularDiffusivity": 4.25e-10 },
                  "simulation": { "particles": 512, "groupSize": 32, "modes": 16, "timeStep": 0.5,
                                  "duration": 60, "seed": 9 } }
                """;
        StudyResult r = Engine.run(ScenarioReader.parse(tiny), 2, RunListener.NONE, new Cancellation());
        Path pdf = Path.of("target", "screenshots", "sheet-tiny.pdf");
        java.nio.file.Files.createDirectories(pdf.getParent());
        SummarySheetPdf.write(r, pdf);
        String text;
        try (PDDocument doc = Loader.loadPDF(pdf.toFile())) {
            assertTrue(doc.getNumberOfPages() >= 1);
            text = new PDFTextStripper().getText(doc).replaceAll("\\s+", " ");
        }
        assertTrue(text.contains("Tiny sheet flow"), text);
        for (var a : r.diffusivity().axes()) {
            assertTrue(text.contains(SummaryContent.number(a.diffusivity().value())), "value of " + a.axisName());
            assertTrue(text.contains("[" + SummaryContent.number(a.diffusivity().low()) + ", "
                    + SummaryContent.number(a.diffusivity().high()) + "]"), "interval of " + a.axisName());
        }
        assertTrue(text.contains("m\u00b2/s"), "diffusivity unit");
        // The given rms velocity in its own row, with its unit (not merely any "0.04" on the page).
        assertTrue(text.contains("rms velocity u' 0.04 m/s"), "input row of u'");
        assertTrue(text.contains("integral length L 0.25 m"), "input row of L");
        String firstCaution = Cautions.ALL.get(0).substring(0, 40);
        assertTrue(text.contains(firstCaution), "first caution");
        assertTrue(text.contains("Taylor, G. I. (1921)"), "method reference");
        assertFalse(r.toolVersion().isBlank(), "a version to print");
        assertTrue(text.contains("eddycast " + r.toolVersion() + " \u2014 Tiny sheet flow"), "version in the footer");
    }
}
