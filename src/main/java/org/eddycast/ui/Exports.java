package org.eddycast.ui;

import java.awt.Font;
import java.awt.Graphics2D;
import java.awt.RenderingHints;
import java.awt.event.KeyEvent;
import java.awt.geom.Rectangle2D;
import java.awt.image.BufferedImage;
import java.awt.print.PrinterException;
import java.awt.print.PrinterJob;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.List;
import java.util.function.Supplier;
import javax.imageio.IIOImage;
import javax.imageio.ImageIO;
import javax.imageio.ImageTypeSpecifier;
import javax.imageio.ImageWriteParam;
import javax.imageio.ImageWriter;
import javax.imageio.metadata.IIOMetadata;
import javax.imageio.metadata.IIOMetadataNode;
import javax.imageio.stream.ImageOutputStream;
import javax.swing.Action;
import org.eddycast.engine.StudyResult;
import org.eddycast.forecast.Cautions;
import org.eddycast.plugin.HostContext;
import org.eddycast.sheet.CautionBlock;
import org.eddycast.sheet.ChartRendering;
import org.eddycast.sheet.SensitivityChart;
import org.eddycast.report.ChartSpec;
import org.eddycast.report.CurveCsv;
import org.eddycast.sheet.SummarySheetPdf;
import org.eddycast.sheet.SummarySheetPrintable;
import org.eddycast.scenario.AtomicFiles;
import org.eddycast.uncertainty.UncertaintySummary;
import org.jfree.svg.SVGGraphics2D;

/**
 * The panel's outputs: the summary sheet (PDF, print), the charts (PNG, SVG) and the curves (CSV). Every one
 * carries the cautions: the sheet and the CSV in their text, the pictures in a block drawn under the charts.
 */
final class Exports {

    private static final int WIDTH = 900;
    private static final int CHART_HEIGHT = 420;
    private static final Font FONT = new Font(Font.SANS_SERIF, Font.PLAIN, 12);

    private final HostContext host;
    private final Dialogs dialogs;
    private final Supplier<StudyResult> result;
    private final ResultsView view;
    private final java.util.function.Function<String, Path> suggest;
    private final List<Action> needResult = new java.util.ArrayList<>();
    private Action optionsSheet;

    /**
     * @param suggest a suggested file for an output, given the end of its name ("-summary.pdf")
     */
    Exports(HostContext host, Dialogs dialogs, Supplier<StudyResult> result, ResultsView view,
            java.util.function.Function<String, Path> suggest) {
        this.host = host;
        this.dialogs = dialogs;
        this.result = result;
        this.view = view;
        this.suggest = suggest;
    }

    /** Enables the exports that have something to export: a result; two or more options for their sheet. */
    void resultChanged(StudyResult r, int options) {
        needResult.forEach(a -> a.setEnabled(r != null));
        if (optionsSheet != null) {
            optionsSheet.setEnabled(options >= 2);
        }
    }

    /** An action disabled until there is a result. */
    private Action needingResult(Action a) {
        a.setEnabled(result.get() != null);
        needResult.add(a);
        return a;
    }

    Action sheetPdf() {
        return needingResult(EddycastPanel.action("Export summary sheet (PDF)\u2026", KeyEvent.VK_E, null,
                () -> withResult(r -> host.chooseFileToSave("Summary sheet", "pdf", suggest.apply("-summary.pdf"))
                        .ifPresent(p -> guarded(p, () -> SummarySheetPdf.write(r, p))))));
    }

    Action optionsPdf() {
        optionsSheet = EddycastPanel.action("Export options sheet (PDF)\u2026", KeyEvent.VK_N, null, () -> {
            OptionsView options = view.options();
            if (options.count() < 2) {
                dialogs.tell("No comparison yet", "Keep two or more results as options (Run \u25b8 Keep result as "
                        + "option, Ctrl+K) before exporting their comparison.");
                return;
            }
            host.chooseFileToSave("Options sheet", "pdf", suggest.apply("-options.pdf")).ifPresent(p -> guarded(p,
                    () -> SummarySheetPdf.writeOptions(options.names(), options.results(), p)));
        });
        optionsSheet.setEnabled(false);
        return optionsSheet;
    }

    Action print() {
        return needingResult(EddycastPanel.action("Print summary sheet\u2026", KeyEvent.VK_P, null,
                () -> withResult(r -> {
            PrinterJob job = PrinterJob.getPrinterJob();
            job.setPrintable(new SummarySheetPrintable(SummarySheetPdf.layout(r)));
            if (job.printDialog()) {
                try {
                    job.print();
                } catch (PrinterException e) {
                    dialogs.tell("Not printed", e.getMessage());
                }
            }
        })));
    }

    Action chartPng() {
        return needingResult(EddycastPanel.action("Export charts (PNG)\u2026", KeyEvent.VK_G, null,
                () -> withResult(r -> host.chooseFileToSave("Charts as PNG", "png", suggest.apply("-charts.png"))
                        .ifPresent(p -> guarded(p, () -> writePng(view.charts(), view.uncertainty(), p))))));
    }

    Action chartSvg() {
        return needingResult(EddycastPanel.action("Export charts (SVG)\u2026", KeyEvent.VK_V, null,
                () -> withResult(r -> host.chooseFileToSave("Charts as SVG", "svg", suggest.apply("-charts.svg"))
                        .ifPresent(p -> guarded(p, () -> writeSvg(view.charts(), view.uncertainty(), p))))));
    }

    Action curvesCsv() {
        return needingResult(EddycastPanel.action("Export curves (CSV)\u2026", KeyEvent.VK_U, null,
                () -> withResult(r -> host.chooseFileToSave("Curves as CSV", "csv", suggest.apply("-curves.csv"))
                        .ifPresent(p -> guarded(p, () -> AtomicFiles.writeString(p, CurveCsv.text(r)))))));
    }

    /**
     * The charts stacked in one PNG, 900 by 420 pixels each, then the inputs' ranking when the result has an
     * uncertainty part with indices (null: none), the cautions under them.
     */
    static void writePng(List<ChartSpec> charts, UncertaintySummary sensitivity, Path target) throws IOException {
        byte[] png = png(charts, sensitivity);
        AtomicFiles.write(target, out -> out.write(png));
    }

    /** The charts stacked in one SVG document, then the inputs' ranking if any, the cautions under them. */
    static void writeSvg(List<ChartSpec> charts, UncertaintySummary sensitivity, Path target) throws IOException {
        AtomicFiles.writeString(target, svg(charts, sensitivity));
    }

    /**
     * The PNG's bytes: the charts, the cautions drawn under them, and the cautions again as the PNG's standard
     * "Disclaimer" text (PNG specification, ISO/IEC 15948, keyword list) so a program reading the file finds them.
     */
    static byte[] png(List<ChartSpec> charts) throws IOException {
        return png(charts, null);
    }

    /** The PNG's bytes with the inputs' ranking after the charts (null: none). */
    static byte[] png(List<ChartSpec> charts, UncertaintySummary sensitivity) throws IOException {
        int h = chartsHeight(charts, sensitivity);
        CautionBlock cautions = new CautionBlock(FONT, WIDTH);
        BufferedImage img = new BufferedImage(WIDTH, h + cautions.height(), BufferedImage.TYPE_INT_RGB);
        Graphics2D g = img.createGraphics();
        try {
            g.setRenderingHint(RenderingHints.KEY_TEXT_ANTIALIASING, RenderingHints.VALUE_TEXT_ANTIALIAS_ON);
            draw(charts, sensitivity, g);
            cautions.draw(g, h);
        } finally {
            g.dispose();
        }
        ImageWriter writer = ImageIO.getImageWritersByFormatName("png").next();
        ByteArrayOutputStream bytes = new ByteArrayOutputStream();
        try (ImageOutputStream out = ImageIO.createImageOutputStream(bytes)) {
            writer.setOutput(out);
            ImageWriteParam param = writer.getDefaultWriteParam();
            IIOMetadata meta = writer.getDefaultImageMetadata(ImageTypeSpecifier.createFromRenderedImage(img), param);
            IIOMetadataNode entry = new IIOMetadataNode("tEXtEntry");
            entry.setAttribute("keyword", "Disclaimer");
            entry.setAttribute("value", String.join("\n", Cautions.lines("")));
            IIOMetadataNode text = new IIOMetadataNode("tEXt");
            text.appendChild(entry);
            IIOMetadataNode root = new IIOMetadataNode("javax_imageio_png_1.0");
            root.appendChild(text);
            meta.mergeTree("javax_imageio_png_1.0", root);
            writer.write(null, new IIOImage(img, null, meta), param);
        } finally {
            writer.dispose();
        }
        return bytes.toByteArray();
    }

    /** The SVG document: the charts, then the cautions as text under them. */
    static String svg(List<ChartSpec> charts) {
        return svg(charts, null);
    }

    /** The SVG document with the inputs' ranking after the charts (null: none). */
    static String svg(List<ChartSpec> charts, UncertaintySummary sensitivity) {
        int h = chartsHeight(charts, sensitivity);
        CautionBlock cautions = new CautionBlock(FONT, WIDTH);
        SVGGraphics2D g = new SVGGraphics2D(WIDTH, h + cautions.height());
        draw(charts, sensitivity, g);
        cautions.draw(g, h);
        return g.getSVGDocument();
    }

    private static boolean ranked(UncertaintySummary sensitivity) {
        return sensitivity != null && !sensitivity.sensitivity().isEmpty();
    }

    /** The height the charts take (at least one chart's), the ranking counted as one more. */
    private static int chartsHeight(List<ChartSpec> charts, UncertaintySummary sensitivity) {
        return CHART_HEIGHT * Math.max(1, charts.size() + (ranked(sensitivity) ? 1 : 0));
    }

    private static void draw(List<ChartSpec> charts, UncertaintySummary sensitivity, Graphics2D g) {
        g.setColor(java.awt.Color.WHITE);
        g.fillRect(0, 0, WIDTH, chartsHeight(charts, sensitivity));
        for (int i = 0; i < charts.size(); i++) {
            ChartRendering.draw(charts.get(i), ChartRendering.PAPER, FONT, g,
                    new Rectangle2D.Double(0, i * CHART_HEIGHT, WIDTH, CHART_HEIGHT));
        }
        if (ranked(sensitivity)) {
            SensitivityChart.draw(sensitivity, ChartRendering.PAPER, FONT, g,
                    new Rectangle2D.Double(0, charts.size() * CHART_HEIGHT, WIDTH, CHART_HEIGHT));
        }
    }

    private interface Io {
        void run() throws IOException;
    }

    private void guarded(Path p, Io io) {
        StudyResult r = result.get();
        if (r != null && r.scenario().flow() instanceof org.eddycast.scenario.MeasuredFlow m
                && sameFile(p, m.resolved())) {
            // an export must never replace the record the result was analysed from
            dialogs.tell("Not written", p + " is the velocity record this result was analysed from; choose "
                    + "another file.");
            return;
        }
        try {
            io.run();
            host.showStatus("Written " + p);
        } catch (IOException | RuntimeException e) {
            dialogs.tell("Could not write " + p.getFileName(), String.valueOf(e.getMessage()));
        }
    }

    private static boolean sameFile(Path a, Path b) {
        try {
            return a.toAbsolutePath().normalize().equals(b.toAbsolutePath().normalize())
                    || (java.nio.file.Files.exists(a) && java.nio.file.Files.isSameFile(a, b));
        } catch (IOException e) {
            return false;
        }
    }

    private void withResult(java.util.function.Consumer<StudyResult> body) {
        StudyResult r = result.get();
        if (r == null) {
            host.showStatus("Run a scenario first: there is no result to export yet.");
            return;
        }
        body.accept(r);
    }

    static byte[] utf8(String s) {
        return s.getBytes(StandardCharsets.UTF_8);
    }
}
