package org.eddycast.ui;

import java.awt.Font;
import java.awt.Graphics2D;
import java.awt.event.KeyEvent;
import java.awt.geom.Rectangle2D;
import java.awt.image.BufferedImage;
import java.awt.print.PrinterException;
import java.awt.print.PrinterJob;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.List;
import java.util.function.Supplier;
import javax.imageio.ImageIO;
import javax.swing.Action;
import org.eddycast.engine.StudyResult;
import org.eddycast.plugin.HostContext;
import org.eddycast.sheet.ChartRendering;
import org.eddycast.report.ChartSpec;
import org.eddycast.report.CurveCsv;
import org.eddycast.report.SummaryContent;
import org.eddycast.sheet.SummarySheetLayout;
import org.eddycast.sheet.SummarySheetPdf;
import org.eddycast.sheet.SummarySheetPrintable;
import org.eddycast.scenario.AtomicFiles;
import org.jfree.svg.SVGGraphics2D;

/** The panel's outputs: the summary sheet (PDF, print), the charts (PNG, SVG) and the curves (CSV). */
final class Exports {

    private final HostContext host;
    private final Dialogs dialogs;
    private final Supplier<StudyResult> result;
    private final ResultsView view;

    Exports(HostContext host, Dialogs dialogs, Supplier<StudyResult> result, ResultsView view) {
        this.host = host;
        this.dialogs = dialogs;
        this.result = result;
        this.view = view;
    }

    Action sheetPdf() {
        return EddycastPanel.action("Export summary sheet (PDF)\u2026", KeyEvent.VK_E, null, () -> withResult(r ->
                host.chooseFileToSave("Summary sheet", "pdf", null).ifPresent(p -> guarded(p,
                        () -> SummarySheetPdf.write(r, p)))));
    }

    Action optionsPdf() {
        return EddycastPanel.action("Export options sheet (PDF)\u2026", KeyEvent.VK_N, null, () -> {
            OptionsView options = view.options();
            if (options.count() < 2) {
                dialogs.tell("No comparison yet", "Keep two or more results as options (Run \u25b8 Keep result as "
                        + "option, Ctrl+K) before exporting their comparison.");
                return;
            }
            host.chooseFileToSave("Options sheet", "pdf", null).ifPresent(p -> guarded(p,
                    () -> SummarySheetPdf.writeOptions(options.names(), options.results(), p)));
        });
    }

    Action print() {
        return EddycastPanel.action("Print summary sheet\u2026", KeyEvent.VK_P, null, () -> withResult(r -> {
            PrinterJob job = PrinterJob.getPrinterJob();
            job.setPrintable(new SummarySheetPrintable(new SummarySheetLayout(SummaryContent.of(r),
                    SummarySheetPdf.defaultCharts(r))));
            if (job.printDialog()) {
                try {
                    job.print();
                } catch (PrinterException e) {
                    dialogs.tell("Not printed", e.getMessage());
                }
            }
        }));
    }

    Action chartPng() {
        return EddycastPanel.action("Export charts (PNG)\u2026", KeyEvent.VK_G, null, () -> withResult(r ->
                host.chooseFileToSave("Charts as PNG", "png", null).ifPresent(p -> guarded(p,
                        () -> writePng(view.charts(), p)))));
    }

    Action chartSvg() {
        return EddycastPanel.action("Export charts (SVG)\u2026", KeyEvent.VK_V, null, () -> withResult(r ->
                host.chooseFileToSave("Charts as SVG", "svg", null).ifPresent(p -> guarded(p,
                        () -> writeSvg(view.charts(), p)))));
    }

    Action curvesCsv() {
        return EddycastPanel.action("Export curves (CSV)\u2026", KeyEvent.VK_U, null, () -> withResult(r ->
                host.chooseFileToSave("Curves as CSV", "csv", null).ifPresent(p -> guarded(p,
                        () -> AtomicFiles.writeString(p, CurveCsv.text(r))))));
    }

    /** The charts stacked in one PNG, 900 by 420 pixels each. */
    static void writePng(List<ChartSpec> charts, Path target) throws IOException {
        int w = 900;
        int h = 420;
        BufferedImage img = new BufferedImage(w, h * Math.max(1, charts.size()), BufferedImage.TYPE_INT_RGB);
        Graphics2D g = img.createGraphics();
        try {
            draw(charts, g, w, h);
        } finally {
            g.dispose();
        }
        AtomicFiles.write(target, out -> ImageIO.write(img, "png", out));
    }

    /** The charts stacked in one SVG document. */
    static void writeSvg(List<ChartSpec> charts, Path target) throws IOException {
        int w = 900;
        int h = 420;
        SVGGraphics2D g = new SVGGraphics2D(w, h * Math.max(1, charts.size()));
        draw(charts, g, w, h);
        AtomicFiles.writeString(target, g.getSVGDocument());
    }

    private static void draw(List<ChartSpec> charts, Graphics2D g, int w, int h) {
        g.setColor(java.awt.Color.WHITE);
        g.fillRect(0, 0, w, h * Math.max(1, charts.size()));
        Font font = new Font(Font.SANS_SERIF, Font.PLAIN, 12);
        for (int i = 0; i < charts.size(); i++) {
            ChartRendering.draw(charts.get(i), ChartRendering.PAPER, font, g, new Rectangle2D.Double(0, i * h, w, h));
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
