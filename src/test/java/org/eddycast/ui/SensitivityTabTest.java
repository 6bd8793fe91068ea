package org.eddycast.ui;

import static org.eddycast.ui.PanelRunTest.callEdt;
import static org.eddycast.ui.PanelRunTest.onEdt;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.formdev.flatlaf.FlatDarkLaf;
import com.formdev.flatlaf.FlatLightLaf;
import java.awt.Dimension;
import java.awt.image.BufferedImage;
import java.nio.file.Path;
import java.util.List;
import java.util.prefs.Preferences;
import javax.imageio.ImageIO;
import org.eddycast.engine.Engine;
import org.eddycast.engine.StudyResult;
import org.eddycast.particles.Cancellation;
import org.eddycast.particles.RunListener;
import org.eddycast.report.SummaryContent;
import org.eddycast.scenario.ScenarioReader;
import org.eddycast.sheet.SensitivityChart;
import org.eddycast.uncertainty.ExampleUncertainty;
import org.eddycast.uncertainty.UncertaintySummary;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/**
 * The inputs tab opens with a sensitivity section when a result has an uncertainty part, and without one
 * otherwise: the ranking chart in the theme's colours, both intervals of each figure, the ranged inputs with
 * their indices; nothing cut off at 1024 x 700. Screenshots: target/screenshots/panel-sensitivity-*.png.
 */
class SensitivityTabTest {

    private static StudyResult result;

    @TempDir
    Path tmp;

    @BeforeAll
    static void run() {
        result = Engine.run(ScenarioReader.parse(PanelRunTest.TINY), 2, RunListener.NONE, new Cancellation());
    }

    @ParameterizedTest
    @ValueSource(strings = {"light", "dark"})
    void theSectionFollowsTheResultsUncertaintyPart(String theme) throws Exception {
        Preferences prefs = Preferences.userRoot().node("org/eddycast/ui-test-sensitivity");
        EddycastPanel[] holder = new EddycastPanel[1];
        onEdt(() -> {
            if (theme.equals("dark")) {
                FlatDarkLaf.setup();
            } else {
                FlatLightLaf.setup();
            }
            holder[0] = new EddycastPanel(new PanelRunTest.TestHost(), new PanelRunTest.TestDialogs(),
                    new UiPreferences(prefs));
            holder[0].results().showResult(result);
        });
        EddycastPanel panel = holder[0];
        ResultsView view = panel.results();
        int tabs = callEdt(() -> view.tabs().getTabCount());
        assertTrue(!callEdt(() -> view.sensitivity().isVisible()), "no uncertainty part, no section");
        assertNull(callEdt(view::uncertainty));

        UncertaintySummary u = ExampleUncertainty.blendTimeStudy();
        onEdt(() -> view.showResult(result.withUncertainty(u)));
        assertTrue(callEdt(() -> view.sensitivity().isVisible()), "the section shows");
        assertEquals(tabs, (int) callEdt(() -> view.tabs().getTabCount()), "in the inputs tab, no new tab");
        assertNotNull(callEdt(() -> view.sensitivity().chartPanel()), "the ranking chart");
        onEdt(() -> assertEquals(javax.swing.UIManager.getColor("Panel.background"),
                view.sensitivity().chartPanel().getChart().getBackgroundPaint(), "the chart follows the theme"));
        UncertaintySummary.FigureRange f = u.mainFigure();
        List<String> figureRow = callEdt(() -> view.sensitivity().figureRows().get(0));
        // in the scenario's display units, as the headline shows them
        org.eddycast.engine.DisplayFormat shown =
                new org.eddycast.engine.DisplayFormat(result.scenario().forecast().units());
        assertEquals(List.of(f.label(), shown.ofUnit(f.unit(), f.nominal())), figureRow.subList(0, 2));
        assertEquals(shown.ofUnit(f.unit(), f.p05()) + " to " + shown.ofUnit(f.unit(), f.p95()), figureRow.get(3),
                "the input range");
        List<List<String>> inputs = callEdt(() -> view.sensitivity().inputRows());
        List<String> order = SensitivityChart.ranked(u).stream()
                .map(UncertaintySummary.SensitivityIndex::input).toList();
        assertEquals(order, inputs.stream().map(r -> r.get(0)).toList(), "largest total index first");
        for (String h : List.of("first-order index [95% interval]", "total index [95% interval]")) {
            assertNotNull(Glossary.definition(h), "no tooltip for the column " + h);
        }

        onEdt(() -> view.tabs().setSelectedIndex(ResultsView.INPUTS_TAB));
        PanelRunTest.shot(panel, "sensitivity-" + theme, new Dimension(1024, 700));
        PanelRunTest.noLabelCutOff(panel, theme, ResultsView.INPUTS_TAB, "1024-sensitivity-" + theme);

        // the exported charts end with the ranking
        Path png = tmp.resolve("charts.png");
        Exports.writePng(callEdt(view::charts), callEdt(view::uncertainty), png);
        BufferedImage img = ImageIO.read(png.toFile());
        int withoutRanking = ImageIO.read(new java.io.ByteArrayInputStream(Exports.png(callEdt(view::charts))))
                .getHeight();
        assertEquals(withoutRanking + 420, img.getHeight(), "one more chart's height: the ranking");

        // figures without a ranking: the tab says so instead of drawing an empty chart
        onEdt(() -> view.showResult(result.withUncertainty(ExampleUncertainty.withoutRanking())));
        assertNull(callEdt(() -> view.sensitivity().chartPanel()));
        assertNotNull(PanelRunTest.findNamed(panel.component(), "uncertainty.noRanking", javax.swing.JLabel.class));

        // a result without an uncertainty part takes the tab away again
        onEdt(() -> view.showResult(result));
        assertTrue(!callEdt(() -> view.sensitivity().isVisible()), "the section is hidden again");
        assertNull(callEdt(view::uncertainty));
        prefs.removeNode();
        onEdt(FlatLightLaf::setup);
    }
}
