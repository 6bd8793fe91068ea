package org.eddycast.ui;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.prefs.Preferences;
import org.eddycast.engine.StudyResult;
import org.eddycast.report.ChartSpec;
import org.eddycast.scenario.ScenarioReader;
import org.eddycast.sheet.SummarySheetPdf;
import org.eddycast.transport.StationCurve;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/**
 * The lowland dye test (at 2,048 particles) in the window: the Curves tab shows the concentration against time at
 * its station in the scenario's display units (ug/L over minutes: 1 kg/m^3 = 1e6 ug/L, 1 min = 60 s), the other
 * forecast charts use them too, and the sheet leads with the station chart. Screenshots in both themes.
 */
class StationChartTest {

    @ParameterizedTest
    @ValueSource(strings = {"light", "dark"})
    void theStationsCurveIsShownInTheDisplayUnits(String theme) throws Exception {
        String text = Files.readString(Path.of("presets/lowland-channel-dye.json"))
                .replace("\"particles\": 16384", "\"particles\": 2048");
        EddycastPanel[] holder = new EddycastPanel[1];
        Preferences prefs = Preferences.userRoot().node("org/eddycast/ui-station-test");
        PanelRunTest.onEdt(() -> {
            if (theme.equals("dark")) {
                com.formdev.flatlaf.FlatDarkLaf.setup();
            } else {
                com.formdev.flatlaf.FlatLightLaf.setup();
            }
            holder[0] = new EddycastPanel(new PanelRunTest.TestHost(), new PanelRunTest.TestDialogs(),
                    new UiPreferences(prefs));
            holder[0].setThreads(2);
            // the preset's input ranges would add a sweep: this test is about the one run's chart
            holder[0].showScenario(ScenarioReader.parse(text)
                    .withUncertainty(org.eddycast.scenario.UncertaintySettings.none()), Path.of("presets"),
                    "lowland.json");
            holder[0].runAction().actionPerformed(null);
        });
        EddycastPanel panel = holder[0];
        long deadline = System.nanoTime() + 120_000_000_000L;
        while (PanelRunTest.callEdt(panel::isRunning)) {
            assertTrue(System.nanoTime() < deadline, "run did not finish in 120 s");
            Thread.sleep(50);
        }
        StudyResult r = panel.lastResult();
        assertNotNull(r);
        List<ChartSpec> charts = PanelRunTest.callEdt(() -> panel.results().charts());
        ChartSpec station = charts.stream().filter(c -> c.title().equals("Concentration at the stations"))
                .findFirst().orElseThrow();
        assertEquals("time after release (min)", station.xLabel());
        assertEquals("concentration at the station (ug/L)", station.yLabel());
        StationCurve curve = r.answers().stations().get(0).curve();
        ChartSpec.Curve shown = station.curves().get(0);
        int top = 0;
        for (int k = 1; k < shown.y().length; k++) {
            top = shown.y()[k] > shown.y()[top] ? k : top;
        }
        assertEquals(curve.peak() * 1e6, shown.y()[top], 1e-9 * curve.peak() * 1e6, "the peak in ug/L");
        double peakTime = r.answers().stations().get(0).passage().peakTime();
        assertEquals(peakTime / 60, shown.x()[top], 1e-12 * peakTime, "at its time in minutes");
        // the axis spans the passage, not the whole run (which lasts until the cap 600 m away is passed)
        assertTrue(shown.x()[shown.x().length - 1] < curve.times()[curve.times().length - 1] / 60);
        assertTrue(station.curves().stream().anyMatch(c -> c.name().equals("detection limit")));
        ChartSpec peak = charts.stream().filter(c -> c.title().equals("Peak concentration")).findFirst().orElseThrow();
        assertEquals("peak concentration (ug/L)", peak.yLabel());
        assertEquals(r.forecast().peakConcentration()[5] * 1e6, peak.curves().get(0).y()[5],
                1e-9 * r.forecast().peakConcentration()[5] * 1e6);
        assertEquals("Concentration at the stations", SummarySheetPdf.defaultCharts(r).get(0).title());
        PanelRunTest.onEdt(() -> {
            panel.results().tabs().setSelectedIndex(ResultsView.CURVES_TAB);
            panel.results().showChart("Concentration at the stations");
        });
        PanelRunTest.shot(panel, "stations", theme);
        prefs.removeNode();
        PanelRunTest.onEdt(com.formdev.flatlaf.FlatLightLaf::setup);
    }
}
