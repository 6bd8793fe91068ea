package org.eddycast.sheet;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.Color;
import java.awt.Font;
import java.awt.Graphics2D;
import java.awt.geom.Rectangle2D;
import java.awt.image.BufferedImage;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import javax.imageio.ImageIO;
import org.eddycast.uncertainty.ExampleUncertainty;
import org.eddycast.uncertainty.UncertaintySummary;
import org.eddycast.uncertainty.UncertaintySummary.SensitivityIndex;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.plot.CategoryPlot;
import org.jfree.chart.plot.PlotOrientation;
import org.jfree.chart.title.TextTitle;
import org.jfree.data.statistics.StatisticalCategoryDataset;
import org.junit.jupiter.api.Test;

/** The ranking chart says what the summary says: its inputs in order, both indices and their intervals. */
class SensitivityChartTest {

    private static final Font FONT = new Font(Font.SANS_SERIF, Font.PLAIN, 12);

    @Test
    void barsFollowTheSummaryLargestTotalIndexFirst() {
        UncertaintySummary u = ExampleUncertainty.blendTimeStudy();
        JFreeChart chart = SensitivityChart.chart(u, ChartRendering.PAPER, FONT);
        CategoryPlot plot = chart.getCategoryPlot();
        assertEquals(PlotOrientation.HORIZONTAL, plot.getOrientation());
        StatisticalCategoryDataset data = (StatisticalCategoryDataset) plot.getDataset();
        List<SensitivityIndex> ranked = SensitivityChart.ranked(u);
        assertEquals(u.sensitivity().size(), data.getColumnCount());
        for (int c = 0; c < ranked.size(); c++) {
            SensitivityIndex s = ranked.get(c);
            assertEquals(s.input(), data.getColumnKey(c));
            assertEquals(s.first(), data.getMeanValue(0, c).doubleValue(), 0);
            assertEquals(s.firstHalfWidth(), data.getStdDevValue(0, c).doubleValue(), 0);
            assertEquals(s.total(), data.getMeanValue(1, c).doubleValue(), 0);
            assertEquals(s.totalHalfWidth(), data.getStdDevValue(1, c).doubleValue(), 0);
            if (c > 0) {
                assertTrue(s.total() <= ranked.get(c - 1).total(), "ordered by total index");
            }
        }
        assertTrue(chart.getTitle().getText().contains("95% blend time"), chart.getTitle().getText());
        boolean advice = false;
        for (int i = 0; i < chart.getSubtitleCount(); i++) {
            advice |= chart.getSubtitle(i) instanceof TextTitle t && t.getText().equals(u.advice());
        }
        assertTrue(advice, "the advice stands under the chart");
        // the example's blend time goes as Po^(-1/3) (T/D)^2 / N: over these ranges the power number varies most
        assertEquals("flow.impeller.powerNumber", ranked.get(0).input());
    }

    @Test
    void theAxisTakesTheIntervalsInWithinLimitsAndTicksStayApart() {
        assertEquals(0.1, SensitivityChart.tickStep(1.0), 1e-12);
        assertEquals(0.2, SensitivityChart.tickStep(2.0), 1e-12);
        assertEquals(0.5, SensitivityChart.tickStep(3.0), 1e-12);
        UncertaintySummary u = ExampleUncertainty.blendTimeStudy();
        UncertaintySummary wide = new UncertaintySummary(u.inputs(), 4, 24, 256, u.figures(),
                List.of(new SensitivityIndex("a", 0.7, 1.5, 1.3, 0.6), new SensitivityIndex("b", -0.04, 0.07, 0, 0)),
                "", List.of());
        org.jfree.chart.axis.ValueAxis axis = SensitivityChart.chart(wide, ChartRendering.PAPER, FONT)
                .getCategoryPlot().getRangeAxis();
        assertEquals(-0.5, axis.getLowerBound(), 0);
        assertEquals(1.5, axis.getUpperBound(), 0);
        axis = SensitivityChart.chart(u, ChartRendering.PAPER, FONT).getCategoryPlot().getRangeAxis();
        assertEquals(0, axis.getLowerBound(), 0);
        assertEquals(1, axis.getUpperBound(), 0);
    }

    @Test
    void noIndicesNoChart() {
        UncertaintySummary u = ExampleUncertainty.withoutRanking();
        assertThrows(IllegalArgumentException.class, () -> SensitivityChart.chart(u, ChartRendering.PAPER, FONT));
    }

    @Test
    void drawsOnPaper() throws Exception {
        UncertaintySummary u = ExampleUncertainty.blendTimeStudy();
        BufferedImage img = new BufferedImage(900, 420, BufferedImage.TYPE_INT_RGB);
        Graphics2D g = img.createGraphics();
        SensitivityChart.draw(u, ChartRendering.PAPER, FONT, g, new Rectangle2D.Double(0, 0, 900, 420));
        g.dispose();
        int first = ChartRendering.PAPER.series().get(0).getRGB();
        int total = ChartRendering.PAPER.series().get(1).getRGB();
        int firstPixels = 0;
        int totalPixels = 0;
        for (int x = 0; x < img.getWidth(); x++) {
            for (int y = 0; y < img.getHeight(); y++) {
                int p = img.getRGB(x, y);
                firstPixels += p == first ? 1 : 0;
                totalPixels += p == total ? 1 : 0;
            }
        }
        assertTrue(firstPixels > 500 && totalPixels > 500, "both kinds of bar drawn: " + firstPixels + ", "
                + totalPixels);
        Path dir = Path.of("target", "screenshots");
        Files.createDirectories(dir);
        ImageIO.write(img, "png", dir.resolve("sensitivity-chart-paper.png").toFile());
        assertTrue(new Color(img.getRGB(2, 2)).equals(Color.WHITE), "paper background");
    }
}
