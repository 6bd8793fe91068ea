package org.eddycast.sheet;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayOutputStream;
import java.io.PrintStream;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.logging.Handler;
import java.util.logging.Level;
import java.util.logging.LogRecord;
import java.util.logging.Logger;
import org.apache.pdfbox.Loader;
import org.apache.pdfbox.cos.COSName;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.pdmodel.PDPage;
import org.apache.pdfbox.pdmodel.PDResources;
import org.apache.pdfbox.pdmodel.font.PDFont;
import org.apache.pdfbox.pdmodel.graphics.PDXObject;
import org.apache.pdfbox.pdmodel.graphics.form.PDFormXObject;
import org.apache.pdfbox.text.PDFTextStripper;
import org.eddycast.engine.Engine;
import org.eddycast.engine.StudyResult;
import org.eddycast.particles.Cancellation;
import org.eddycast.particles.RunListener;
import org.eddycast.report.Headline;
import org.eddycast.scenario.ScenarioReader;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The sheet as a reader meets it: page 1 holds the question, the answer and every caution; every font in the
 * PDF is embedded; writing it (also through the command line's run --pdf) prints nothing on standard error and
 * logs no warning; the last page is not nearly empty.
 */
class SheetFrontPageTest {

    static StudyResult channel;

    @TempDir
    Path tmp;

    @BeforeAll
    static void runOnce() {
        channel = Engine.run(ScenarioReader.parse(ForecastSheetTest.CHANNEL), 2, RunListener.NONE,
                new Cancellation());
    }

    @Test
    void pageOneHoldsTheQuestionTheHeadlineAndTheCautions() throws Exception {
        Path pdf = Path.of("target", "screenshots", "sheet-channel.pdf");
        Files.createDirectories(pdf.getParent());
        SummarySheetPdf.write(channel, pdf);
        try (PDDocument doc = Loader.loadPDF(pdf.toFile())) {
            PDFTextStripper first = new PDFTextStripper();
            first.setStartPage(1);
            first.setEndPage(1);
            String page1 = first.getText(doc).replaceAll("\\s+", " ");
            assertTrue(page1.contains(Headline.of(channel).text()), page1);
            for (String c : channel.forecast().cautions()) {
                assertTrue(page1.contains(c), "caution on page 1: " + c);
            }
            assertTrue(page1.contains("release point on the centre-line"), "the release point is a key input");
            assertTrue(page1.contains("Question"), page1);
            assertTrue(doc.getNumberOfPages() >= 2, "detail pages follow");
        }
    }

    @Test
    void everyFontIsEmbedded() throws Exception {
        Path pdf = tmp.resolve("sheet.pdf");
        SummarySheetPdf.write(channel, pdf);
        List<String> fonts = new ArrayList<>();
        try (PDDocument doc = Loader.loadPDF(pdf.toFile())) {
            for (PDPage page : doc.getPages()) {
                collectFonts(page.getResources(), fonts, 0);
            }
        }
        assertFalse(fonts.isEmpty(), "the sheet sets its text in fonts");
        for (String f : fonts) {
            assertTrue(f.endsWith("embedded"), "not embedded: " + f);
        }
    }

    /** Fonts of a resource dictionary and of the form XObjects it holds (the pages are drawn as forms). */
    private static void collectFonts(PDResources res, List<String> out, int depth) throws Exception {
        if (res == null || depth > 8) {
            return;
        }
        for (COSName n : res.getFontNames()) {
            PDFont f = res.getFont(n);
            out.add(f.getName() + (f.isEmbedded() ? " embedded" : " NOT"));
        }
        for (COSName n : res.getXObjectNames()) {
            PDXObject x = res.getXObject(n);
            if (x instanceof PDFormXObject form) {
                collectFonts(form.getResources(), out, depth + 1);
            }
        }
    }

    @Test
    void lastPageIsNotNearlyEmpty() {
        SummarySheetLayout layout = SummarySheetPdf.layout(channel);
        assertTrue(layout.pageCount() >= 2);
        double fill = layout.pageFill(layout.pageCount() - 1);
        assertTrue(fill >= SummarySheetLayout.NEARLY_EMPTY, "last page filled to " + fill);
    }

    @Test
    void runWithPdfPrintsNothingOnStandardError() throws Exception {
        Path scenario = tmp.resolve("channel.json");
        Files.writeString(scenario, ForecastSheetTest.CHANNEL);
        Path pdf = tmp.resolve("run.pdf");
        List<LogRecord> logged = new ArrayList<>();
        Handler h = new Handler() {
            @Override
            public void publish(LogRecord r) {
                if (r.getLevel().intValue() >= Level.WARNING.intValue()) {
                    logged.add(r);
                }
            }

            @Override
            public void flush() {
            }

            @Override
            public void close() {
            }
        };
        Logger root = Logger.getLogger("");
        root.addHandler(h);
        PrintStream saved = System.err;
        ByteArrayOutputStream captured = new ByteArrayOutputStream();
        StringWriter err = new StringWriter();
        int code;
        try {
            System.setErr(new PrintStream(captured, true, StandardCharsets.UTF_8));
            code = org.eddycast.cli.Main.execute(new String[] {"run", scenario.toString(), "--pdf", pdf.toString(),
                    "--threads", "2"}, new PrintWriter(new StringWriter(), true), new PrintWriter(err, true));
        } finally {
            System.setErr(saved);
            root.removeHandler(h);
        }
        assertEquals(0, code, err.toString());
        assertTrue(Files.size(pdf) > 0);
        assertEquals("", err.toString(), "the command's error stream");
        assertEquals("", captured.toString(StandardCharsets.UTF_8), "standard error");
        assertTrue(logged.isEmpty(), () -> "warnings logged: " + logged.stream().map(LogRecord::getMessage).toList());
    }
}
