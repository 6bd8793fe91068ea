package org.eddycast.ui;

import static org.eddycast.ui.PanelRunTest.callEdt;
import static org.eddycast.ui.PanelRunTest.onEdt;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.concurrent.CountDownLatch;
import java.util.concurrent.TimeUnit;
import java.util.prefs.Preferences;
import org.eddycast.engine.Engine;
import org.eddycast.scenario.ScenarioReader;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The window shows the preflight warnings while the run starts, before any result, as the command line does. */
class PanelPreflightTest {

    @TempDir
    Path tmp;

    @Test
    void thePreflightWarningIsShownWhileTheRunStarts() throws Exception {
        // the tiny flow's correlation time is 5 s: a step of 5 s is far above half its shortest time scale
        String coarse = PanelRunTest.TINY.replace("\"timeStep\": 0.5, \"duration\": 60", "\"timeStep\": 5, \"duration\": 100");
        CountDownLatch release = new CountDownLatch(1);
        EddycastPanel[] holder = new EddycastPanel[1];
        onEdt(com.formdev.flatlaf.FlatLightLaf::setup);
        onEdt(() -> {
            holder[0] = new EddycastPanel(new PanelRunTest.TestHost(), new PanelRunTest.TestDialogs(),
                    new UiPreferences(Preferences.userRoot().node("org/eddycast/ui-test-preflight")));
            holder[0].setThreads(2);
            holder[0].showScenario(ScenarioReader.parse(coarse), tmp, "coarse.json");
            holder[0].setRunner((sc, threads, listener, cancel) -> {
                try {
                    release.await(30, TimeUnit.SECONDS);
                } catch (InterruptedException e) {
                    Thread.currentThread().interrupt();
                }
                return Engine.run(sc, threads, listener, cancel);
            });
            holder[0].runAction().actionPerformed(null);
        });
        EddycastPanel panel = holder[0];
        long deadline = System.nanoTime() + 20_000_000_000L;
        while (callEdt(() -> panel.results().preflightShown()).isEmpty() && System.nanoTime() < deadline) {
            Thread.sleep(20);
        }
        java.util.List<String> shown = callEdt(() -> panel.results().preflightShown());
        assertTrue(!shown.isEmpty() && shown.get(0).startsWith("simulation.timeStep 5.00 s is more than 0.50 of the "
                + "field's"), shown.toString());
        PanelRunTest.shot(panel, "preflight");
        release.countDown();
        while (callEdt(panel::isRunning) && System.nanoTime() < deadline + 30_000_000_000L) {
            Thread.sleep(20);
        }
        assertFalse(callEdt(panel::isRunning));
        assertFalse(panel.lastResult().preflight().isEmpty());
    }
}
