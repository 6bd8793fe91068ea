package org.eddycast.engine;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import org.eddycast.docs.ValidationLog;
import org.eddycast.forecast.ChannelHandbook;
import org.eddycast.forecast.ChannelRules;
import org.eddycast.forecast.Forecast;
import org.eddycast.particles.Cancellation;
import org.eddycast.particles.RunListener;
import org.eddycast.scenario.ChannelFlow;
import org.eddycast.scenario.Scenario;
import org.eddycast.scenario.ScenarioReader;
import org.eddycast.transport.ChannelStageResult;
import org.eddycast.transport.Passage;
import org.junit.jupiter.api.Test;

/**
 * The lowland channel preset through both stages, beside the handbook: its longitudinal dispersion coefficient
 * between Elder's (1959, J. Fluid Mech. 5:544) and Fischer's (1975, J. Environ. Eng. Div. ASCE 101:453)
 * estimates, no width beyond the section, and mixing across the width from a bank release taking about four
 * times as long as from the centre-line (Fischer et al. 1979, Mixing in Inland and Coastal Waters, ch. 5:
 * 0.4 against 0.1 U W^2 / eps_t, from memory), within 30%.
 */
class ChannelTransportPresetTest {

    private static StudyResult run(boolean atBank) throws Exception {
        Path preset = Path.of("presets/lowland-channel-dye.json");
        String text = Files.readString(preset).replaceAll("\"particles\": \\d+", "\"particles\": 2048");
        if (atBank) {
            text = text.replace("\"location\": \"centre-line\"", "\"location\": \"bank\"");
        }
        return Engine.run(ScenarioReader.parse(text, preset.toAbsolutePath().getParent()), 2, RunListener.NONE,
                new Cancellation());
    }

    private static StudyResult centreRun;

    private static synchronized StudyResult centre() throws Exception {
        if (centreRun == null) {
            centreRun = run(false);
        }
        return centreRun;
    }

    /**
     * The preset's question at 200 m: the headline answers it first, the dose plan follows by linearity (a slug's
     * concentrations are proportional to its mass: the advection-diffusion equation is linear, Crank 1975, The
     * Mathematics of Diffusion), and no concentration reported anywhere exceeds the injected solution's.
     */
    @Test
    void lowlandPresetAnswersAtItsStation() throws Exception {
        StudyResult r = centre();
        Answers a = r.answers();
        assertTrue(a.headline().startsWith("200 m downstream: peak "), a.headline());
        assertTrue(a.headline().contains(" ug/L at ") && a.headline().contains(" min"), a.headline());
        assertTrue(org.eddycast.report.TextSummary.of(r).startsWith(a.headline() + "\n"), "text opens with it");
        Answers.StationAnswer station = a.stations().get(0);
        double mass = r.scenario().release().mass();
        double perKg = station.passage().peak() / mass;
        Answers.DosePlan plan = a.dosePlan();
        assertEquals(plan.targetPeak(), plan.mass() * perKg, 1e-12 * plan.targetPeak(), "dose by linearity");
        double stock = r.scenario().release().stockConcentration();
        for (double c : station.curve().concentration()) {
            assertTrue(c <= stock, "station value " + c + " above the stock " + stock);
        }
        for (double c : r.forecast().peakConcentration()) {
            assertTrue(c <= stock, "forecast peak " + c + " above the stock " + stock);
        }
        double x = 200;
        double u = ((ChannelFlow) r.scenario().flow()).design().meanVelocity();
        Passage p = station.passage();
        assertTrue(p.arrival() < p.peakTime() && p.peakTime() < p.fallsBack(), "arrival, peak, fall back in order");
        // the cloud's centre passes at x / U; a shear-dispersed cloud's peak comes slightly earlier (its tail
        // trails), so the peak lies within the passage's own spread of x / U
        double spread = p.fallsBack() - p.arrival();
        assertTrue(Math.abs(p.peakTime() - x / u) < spread, "peak at " + p.peakTime() + " s against x/U " + x / u);
    }

    @Test
    void lowlandChannelAgreesWithTheHandbookWhereItShould() throws Exception {
        StudyResult centre = centre();
        StudyResult bank = run(true);
        Scenario s = centre.scenario();
        var ch = ((ChannelFlow) s.flow()).design();
        double shear = ChannelRules.shearVelocity(ch).value();
        double elder = ChannelHandbook.elderLongitudinal(ch.meanDepth(), shear).value();
        double fischer = ChannelHandbook.fischerLongitudinal(ch.meanVelocity(), ch.width(), ch.meanDepth(), shear)
                .value();
        ChannelStageResult t = (ChannelStageResult) centre.transport();
        double k = t.longitudinalDispersion().value();
        boolean between = elder <= k && k <= fischer;
        ValidationLog.statistical("lowland preset: longitudinal dispersion between Elder and Fischer",
                "Elder 1959, J. Fluid Mech. 5:544; Fischer 1975, J. Environ. Eng. Div. ASCE 101:453 (from memory)",
                Math.sqrt(elder * fischer), k, t.longitudinalDispersion().low(), t.longitudinalDispersion().high(),
                elder, fischer, "between the two handbook estimates", between);
        assertTrue(between, "K_L " + k + " against Elder " + elder + " and Fischer " + fischer);

        Forecast f = centre.forecast();
        double[][] width = f.width();
        for (int j = 0; j < f.grid().length; j++) {
            assertTrue(width[1][j] <= ch.width() + 1e-9, "width across " + width[1][j]);
            assertTrue(width[2][j] <= ch.section().maxDepth() + 1e-9, "width over the depth " + width[2][j]);
        }

        double fromCentre = t.distanceToMixedWidth().value();
        double fromBank = ((ChannelStageResult) bank.transport()).distanceToMixedWidth().value();
        double ratio = fromBank / fromCentre;
        boolean four = Math.abs(ratio - 4) <= 0.3 * 4;
        ValidationLog.statistical("lowland preset: distance to mixed across the width, bank over centre-line",
                "Fischer et al. 1979, Mixing in Inland and Coastal Waters, ch. 5: 0.4 against 0.1 (from memory)", 4,
                ratio, Double.NaN, Double.NaN, 2.8, 5.2, "within 30% of 4", four);
        assertTrue(four, "bank " + fromBank + " m over centre-line " + fromCentre + " m = " + ratio);
    }
}
