package org.eddycast.sheet;

import org.eddycast.report.SpreadCurves;
import org.eddycast.report.SummaryContent;
import org.eddycast.report.ChartSpecs;
import org.eddycast.report.ChartSpec;
import de.rototor.pdfbox.graphics2d.PdfBoxGraphics2D;
import de.rototor.pdfbox.graphics2d.PdfBoxGraphics2DFontTextDrawer;
import java.io.IOException;
import java.nio.file.Path;
import java.util.List;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.pdmodel.PDDocumentInformation;
import org.apache.pdfbox.pdmodel.PDPage;
import org.apache.pdfbox.pdmodel.PDPageContentStream;
import org.apache.pdfbox.pdmodel.common.PDRectangle;
import org.apache.pdfbox.util.Matrix;
import org.eddycast.engine.StudyResult;
import org.eddycast.scenario.AtomicFiles;

/**
 * Writes the summary sheet as PDF: the {@link SummarySheetLayout} drawn through a Graphics2D bridge, so charts
 * are vector graphics and text stays text, set in the embedded {@link SheetFonts}. Written atomically.
 */
public final class SummarySheetPdf {

    private SummarySheetPdf() {
    }

    /** The sheet of one study, with its spread and settling charts. */
    public static void write(StudyResult result, Path target) throws IOException {
        write(layout(result), target);
    }

    /**
     * The layout of one study's sheet (for the PDF and the printer), with the inputs' ranking when the study
     * ranged its inputs.
     */
    public static SummarySheetLayout layout(StudyResult result) {
        SummaryContent content = SummaryContent.of(result);
        List<ChartSpec> charts = defaultCharts(result);
        return new SummarySheetLayout(content, SheetFront.of(result, content, charts), charts.subList(
                Math.min(1, charts.size()), charts.size()), result.uncertainty(),
                result.scenario().forecast().units());
    }

    /** The layout of a comparison sheet. */
    public static SummarySheetLayout optionsLayout(List<String> names, List<StudyResult> options) {
        List<ChartSpec> charts = optionCharts(names, options);
        return new SummarySheetLayout(SummaryContent.ofOptions(names, options),
                SheetFront.ofOptions(names, options, charts), List.of());
    }

    /**
     * The charts a study's sheet carries, in the scenario's display units: plume width with its band and the
     * handbook curves, peak concentration, and the running diffusivity settling (with stations, their
     * concentration against time first, in place of the settling); without a forecast, the cloud's spread instead.
     */
    public static List<ChartSpec> defaultCharts(StudyResult result) {
        SpreadCurves c = SpreadCurves.of(result.diffusivity());
        ChartSpec settling = ChartSpecs.settling(c, result.diffusivity().axes());
        if (result.forecast() == null) {
            return List.of(ChartSpecs.spread(c, "Spread of the particle cloud"), settling);
        }
        org.eddycast.scenario.DisplayUnits units = result.scenario().forecast().units();
        ChartSpec width = ChartSpecs.width(result.forecast(), "Plume width", units);
        ChartSpec peak = ChartSpecs.peak(result.forecast(), units);
        // a dye test is planned by its stations' curves: they take the place of the run's settling
        if (result.answers() != null && !result.answers().stations().isEmpty()) {
            return List.of(ChartSpecs.stations(result.answers()), width, peak);
        }
        return List.of(width, peak, settling);
    }

    /** The comparison sheet of design options (two or more): side by side, overlaid widths, the verdict. */
    public static void writeOptions(List<String> names, List<StudyResult> options, Path target) throws IOException {
        write(optionsLayout(names, options), target);
    }

    /** The charts of a comparison sheet: the options' widths overlaid, when every option has a forecast. */
    public static List<ChartSpec> optionCharts(List<String> names, List<StudyResult> options) {
        if (options.stream().anyMatch(o -> o.forecast() == null)) {
            return List.of();
        }
        return List.of(ChartSpecs.optionWidths(names, options.stream().map(StudyResult::forecast).toList()));
    }

    /** Writes a laid-out sheet, its fonts embedded. */
    public static void write(SummarySheetLayout layout, Path target) throws IOException {
        AtomicFiles.write(target, out -> {
            try (PDDocument doc = new PDDocument();
                 PdfBoxGraphics2DFontTextDrawer fonts = new PdfBoxGraphics2DFontTextDrawer()) {
                PDDocumentInformation info = doc.getDocumentInformation();
                info.setTitle(layout.title());
                info.setCreator("eddycast " + layout.toolVersion());
                SheetFonts.register(fonts, doc);
                for (int p = 0; p < layout.pageCount(); p++) {
                    PDPage page = new PDPage(PDRectangle.A4);
                    doc.addPage(page);
                    PdfBoxGraphics2D g = new PdfBoxGraphics2D(doc, (float) SummarySheetLayout.PAGE_WIDTH,
                            (float) SummarySheetLayout.PAGE_HEIGHT);
                    // text in the registered fonts is embedded; anything else is drawn as outlines
                    g.setFontTextDrawer(fonts);
                    layout.drawPage(g, p);
                    g.dispose();
                    try (PDPageContentStream cs = new PDPageContentStream(doc, page)) {
                        cs.transform(Matrix.getScaleInstance(1, 1));
                        cs.drawForm(g.getXFormObject());
                    }
                }
                doc.save(out);
            }
        });
    }
}
