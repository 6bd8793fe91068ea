package org.eddycast.ui;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.image.BufferedImage;
import java.io.ByteArrayInputStream;
import java.util.Iterator;
import java.util.List;
import javax.imageio.ImageIO;
import javax.imageio.ImageReader;
import javax.imageio.metadata.IIOMetadata;
import javax.imageio.stream.ImageInputStream;
import javax.swing.JTabbedPane;
import org.eddycast.engine.Engine;
import org.eddycast.engine.StudyResult;
import org.eddycast.forecast.Cautions;
import org.eddycast.particles.Cancellation;
import org.eddycast.particles.RunListener;
import org.eddycast.report.ChartSpec;
import org.eddycast.report.CurveCsv;
import org.eddycast.scenario.ScenarioReader;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.w3c.dom.Node;

/**
 * Every output that can leave the tool on its own carries the cautions: the curves as CSV, the charts as PNG
 * and SVG, and each results tab of the window (a one-line footer whose button shows the full list). The
 * comparison on standard output is checked in {@code cli/CommandLineTest}; the text, JSON and sheets in their
 * own tests.
 */
class CautionsOnEveryOutputTest {

    private static StudyResult result;
    private static List<ChartSpec> charts;

    @BeforeAll
    static void run() throws Exception {
        result = Engine.run(ScenarioReader.parse(PanelRunTest.TINY), 2, RunListener.NONE, new Cancellation());
        PanelRunTest.onEdt(() -> {
            ResultsView view = new ResultsView();
            view.showResult(result);
            charts = view.charts();
        });
        assertFalse(charts.isEmpty(), "the tiny run draws charts");
    }

    @Test
    void theCsvCarriesEveryCautionAsAComment() {
        String csv = CurveCsv.text(result);
        for (String caution : Cautions.ALL) {
            assertTrue(csv.lines().anyMatch(l -> l.equals("# - " + caution)), () -> "missing: " + caution);
        }
        // the comments open the file; the table follows them unbroken
        List<String> table = csv.lines().dropWhile(l -> l.startsWith("#")).toList();
        assertTrue(table.get(0).startsWith("time_s,"), table.get(0));
        assertTrue(table.stream().noneMatch(l -> l.startsWith("#")), "no comment inside the table");
    }

    @Test
    void theSvgShowsEveryCautionUnderTheCharts() {
        String svg = Exports.svg(charts);
        // the text drawn, tags stripped, lines joined: each caution must read whole
        String drawn = svg.replaceAll("<[^>]*>", " ").replace("&#39;", "'").replace("&apos;", "'")
                .replaceAll("\\s+", " ");
        for (String caution : Cautions.ALL) {
            assertTrue(drawn.contains(caution), () -> "the SVG lacks: " + caution);
        }
    }

    @Test
    void thePngDrawsTheCautionsAndNamesThemAsItsDisclaimer() throws Exception {
        byte[] png = Exports.png(charts);
        java.nio.file.Files.createDirectories(java.nio.file.Path.of("target/screenshots"));
        java.nio.file.Files.write(java.nio.file.Path.of("target/screenshots/export-charts.png"), png);
        BufferedImage img = ImageIO.read(new ByteArrayInputStream(png));
        int chartsHeight = 420 * charts.size();
        assertTrue(img.getHeight() > chartsHeight, "room under the charts for the cautions");
        // the block under the charts holds dark text on white: count dark pixels there
        int dark = 0;
        for (int y = chartsHeight; y < img.getHeight(); y++) {
            for (int x = 0; x < img.getWidth(); x++) {
                int rgb = img.getRGB(x, y) & 0xffffff;
                if (((rgb >> 16) & 0xff) < 128 && ((rgb >> 8) & 0xff) < 128 && (rgb & 0xff) < 128) {
                    dark++;
                }
            }
        }
        assertTrue(dark > 2000, "text drawn under the charts: " + dark + " dark pixels");
        String disclaimer = pngText(png, "Disclaimer");
        for (String caution : Cautions.ALL) {
            assertTrue(disclaimer.contains(caution), () -> "the PNG's Disclaimer text lacks: " + caution);
        }
    }

    @Test
    void everyResultsTabHasTheFooterAndItsButtonShowsTheFullList() throws Exception {
        PanelRunTest.onEdt(() -> {
            ResultsView view = new ResultsView();
            view.showResult(result);
            JTabbedPane tabs = view.tabs();
            assertEquals(ResultsView.OPTIONS_TAB + 1, tabs.getTabCount());
            for (int tab = 0; tab < tabs.getTabCount(); tab++) {
                CautionFooter footer = view.footer(tab);
                assertEquals(CautionFooter.NAME, footer.getName());
                assertEquals(Cautions.IN_ONE_LINE, footer.text(), "tab " + tabs.getTitleAt(tab));
                tabs.setSelectedIndex(tab == ResultsView.CURVES_TAB ? ResultsView.TABLES_TAB : ResultsView.CURVES_TAB);
                footer.link().doClick();
                assertEquals(ResultsView.INPUTS_TAB, tabs.getSelectedIndex(), "the button shows the full list");
            }
            for (String caution : Cautions.ALL) {
                assertTrue(view.reasoningText().contains(caution), "the full list holds: " + caution);
            }
        });
    }

    /** A tEXt entry of a PNG, read back through ImageIO's standard PNG metadata tree. */
    private static String pngText(byte[] png, String keyword) throws Exception {
        try (ImageInputStream in = ImageIO.createImageInputStream(new ByteArrayInputStream(png))) {
            Iterator<ImageReader> readers = ImageIO.getImageReaders(in);
            ImageReader reader = readers.next();
            reader.setInput(in);
            IIOMetadata meta = reader.getImageMetadata(0);
            Node root = meta.getAsTree("javax_imageio_png_1.0");
            for (Node n = root.getFirstChild(); n != null; n = n.getNextSibling()) {
                if (n.getNodeName().equals("tEXt")) {
                    for (Node e = n.getFirstChild(); e != null; e = e.getNextSibling()) {
                        if (keyword.equals(e.getAttributes().getNamedItem("keyword").getNodeValue())) {
                            return e.getAttributes().getNamedItem("value").getNodeValue();
                        }
                    }
                }
            }
            return "";
        }
    }
}
