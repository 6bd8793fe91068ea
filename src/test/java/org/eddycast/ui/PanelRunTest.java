package org.eddycast.ui;

import org.eddycast.scenario.BundledPresets;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.Component;
import java.awt.Container;
import java.awt.Dimension;
import java.awt.Graphics2D;
import java.awt.image.BufferedImage;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Optional;
import java.util.concurrent.CopyOnWriteArrayList;
import java.util.prefs.Preferences;
import javax.imageio.ImageIO;
import javax.swing.Action;
import javax.swing.JComponent;
import javax.swing.RepaintManager;
import javax.swing.SwingUtilities;
import com.formdev.flatlaf.FlatLightLaf;
import org.eddycast.plugin.HostContext;
import org.eddycast.scenario.ScenarioReader;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Drives the panel through its own actions with no display: fill the form, run, wait, read the table; keep
 * two options and compare; an input error. Screenshots of each state go to target/screenshots. A repaint
 * manager records any Swing repaint requested off the event thread during the run.
 */
class PanelRunTest {

    /** A tiny direct-statistics scenario (invented): few particles, short time, so the run takes seconds. */
    static final String TINY = """
            { "version": 1, "name": "Tiny test flow",
              "flow": { "kind": "direct", "dimensions": 3, "rmsVelocity": 0.04, "integralLength": 0.25,
                        "correlationTime": 5.0, "spectrum": { "model": "power-law", "slope": -1.6667,
                        "wavenumberRatio": 8 } },
              "substance": { "name": "fluorescein", "molecularDiffusivity": 4.25e-10 },
              "simulation": { "particles": 512, "groupSize": 32, "modes": 16, "timeStep": 0.5, "duration": 60,
                              "seed": 5 } }
            """;

    @TempDir
    Path tmp;

    private final List<String> offThread = new CopyOnWriteArrayList<>();

    @Test
    void fullRunThroughThePanelsOwnActions() throws Exception {
        onEdt(FlatLightLaf::setup);
        RepaintManager.setCurrentManager(new RepaintManager() {
            @Override
            public synchronized void addInvalidComponent(JComponent c) {
                check(c);
                super.addInvalidComponent(c);
            }

            @Override
            public void addDirtyRegion(JComponent c, int x, int y, int w, int h) {
                check(c);
                super.addDirtyRegion(c, x, y, w, h);
            }

            private void check(JComponent c) {
                if (!SwingUtilities.isEventDispatchThread()) {
                    offThread.add(c.getClass().getName() + " from " + Thread.currentThread().getName());
                }
            }
        });
        Preferences prefs = Preferences.userRoot().node("org/eddycast/ui-test");
        EddycastPanel[] holder = new EddycastPanel[1];
        onEdt(() -> {
            holder[0] = new EddycastPanel(new TestHost(), new TestDialogs(), new UiPreferences(prefs));
            holder[0].setThreads(2);
            holder[0].showScenario(BundledPresets.standard(), BundledPresets.folder(), "mixing-tank-dose.json");
        });
        EddycastPanel panel = holder[0];
        shot(panel, "1-filled-tank-preset");
        onEdt(() -> panel.showScenario(ScenarioReader.parse(TINY), tmp, "tiny.json"));
        // set fields as a user would
        onEdt(() -> panel.form().setValue("flow.rmsVelocity", "0.05"));
        onEdt(() -> assertTrue(panel.form().lastCheck().valid(), () -> panel.form().lastCheck().toString()));
        runAndWait(panel, "2-running");
        shot(panel, "3-results");
        List<List<String>> rows = callEdt(() -> panel.results().tableRows());
        assertEquals("eddy diffusivity along x", rows.get(0).get(0));
        double dx = Double.parseDouble(rows.get(0).get(1));
        double engineDx = panel.lastResult().diffusivity().axes().get(0).diffusivity().value();
        assertEquals(engineDx, dx, 1e-3 * Math.abs(engineDx), "table shows the engine's value to 4 figures");
        assertEquals(0.05, panel.lastResult().turbulence().rmsVelocity(), 1e-12, "the edited field was used");
        assertTrue(offThread.isEmpty(), () -> "Swing touched off the event thread: " + offThread);

        // keep it, change the flow, run again, keep: comparison
        onEdt(() -> panel.keepAction().actionPerformed(null));
        onEdt(() -> panel.form().setValue("flow.rmsVelocity", "0.1"));
        runAndWait(panel, null);
        onEdt(() -> panel.keepAction().actionPerformed(null));
        String verdict = callEdt(() -> panel.results().options().verdictText());
        // u' doubled at fixed L and tau: the option with 0.1 m/s must spread faster
        assertTrue(verdict.contains("faster"), verdict);
        shot(panel, "4-comparison");

        // an input error: named under its field, the run refuses, nothing crashes
        onEdt(() -> panel.form().setValue("flow.integralLength", "-2"));
        ScenarioForm.Check bad = callEdt(() -> panel.form().lastCheck());
        assertFalse(bad.valid());
        assertTrue(bad.fieldProblems().get("flow.integralLength").contains("flow.integralLength"));
        onEdt(() -> panel.runAction().actionPerformed(null));
        assertFalse(callEdt(panel::isRunning));
        onEdt(() -> panel.results().tabs().setSelectedIndex(0));
        shot(panel, "5-input-error");
        onEdt(() -> panel.form().setValue("flow.integralLength", "abc"));
        assertTrue(callEdt(() -> panel.form().lastCheck().fieldProblems().get("flow.integralLength"))
                .contains("not a number"));
        prefs.removeNode();
    }

    @Test
    void cancelFreesThePanelAtOnce() throws Exception {
        EddycastPanel[] holder = new EddycastPanel[1];
        onEdt(() -> {
            holder[0] = new EddycastPanel(new TestHost(), new TestDialogs(),
                    new UiPreferences(Preferences.userRoot().node("org/eddycast/ui-test2")));
            holder[0].showScenario(ScenarioReader.parse(TINY.replace("\"duration\": 60", "\"duration\": 6000")), tmp,
                    "long.json");
            holder[0].runAction().actionPerformed(null);
        });
        EddycastPanel panel = holder[0];
        assertTrue(callEdt(panel::isRunning));
        onEdt(() -> panel.cancelAction().actionPerformed(null));
        assertFalse(callEdt(panel::isRunning));
        assertEquals("Cancelled", callEdt(panel::progressText));
        onEdt(() -> assertTrue(panel.runAction().isEnabled()));
    }

    @Test
    void emptyStateAndBadFileLeaveTheWindowAsItWas() throws Exception {
        TestDialogs dialogs = new TestDialogs();
        EddycastPanel[] holder = new EddycastPanel[1];
        onEdt(() -> holder[0] = new EddycastPanel(new TestHost(), dialogs,
                new UiPreferences(Preferences.userRoot().node("org/eddycast/ui-test3"))));
        shot(holder[0], "0-empty");
        Path broken = tmp.resolve("broken.json");
        Files.writeString(broken, "{ \"version\": 1, \"flow\": ");
        onEdt(() -> holder[0].showScenario(ScenarioReader.parse(TINY), tmp, "tiny.json"));
        assertFalse(callEdt(() -> holder[0].open(broken)));
        assertTrue(dialogs.told.get(0).contains("line"), dialogs.told.toString());
        assertEquals("0.04", callEdt(() -> holder[0].form().value("flow.rmsVelocity")));
    }

    private void runAndWait(EddycastPanel panel, String shotWhileRunning) throws Exception {
        onEdt(() -> panel.runAction().actionPerformed(null));
        assertTrue(callEdt(panel::isRunning));
        if (shotWhileRunning != null) {
            shot(panel, shotWhileRunning);
        }
        long deadline = System.nanoTime() + 60_000_000_000L;
        while (callEdt(panel::isRunning)) {
            assertTrue(System.nanoTime() < deadline, "run did not finish in 60 s");
            Thread.sleep(50);
        }
        assertNotNull(panel.lastResult(), () -> "no result: " + callEdtQuiet(panel::progressText));
    }

    static void shot(EddycastPanel panel, String name) throws Exception {
        onEdt(() -> {
            JComponent c = panel.component();
            c.setSize(new Dimension(1280, 820));
            layout(c);
            BufferedImage img = new BufferedImage(1280, 820, BufferedImage.TYPE_INT_RGB);
            Graphics2D g = img.createGraphics();
            c.printAll(g);
            g.dispose();
            try {
                Path dir = Path.of("target", "screenshots");
                Files.createDirectories(dir);
                ImageIO.write(img, "png", dir.resolve(name + ".png").toFile());
            } catch (java.io.IOException e) {
                throw new java.io.UncheckedIOException(e);
            }
        });
    }

    private static void layout(Component c) {
        c.doLayout();
        if (c instanceof Container k) {
            for (Component child : k.getComponents()) {
                layout(child);
            }
        }
    }

    static void onEdt(Runnable r) throws Exception {
        SwingUtilities.invokeAndWait(r);
    }

    static <T> T callEdt(java.util.concurrent.Callable<T> c) throws Exception {
        Object[] out = new Object[1];
        Exception[] err = new Exception[1];
        SwingUtilities.invokeAndWait(() -> {
            try {
                out[0] = c.call();
            } catch (Exception e) {
                err[0] = e;
            }
        });
        if (err[0] != null) {
            throw err[0];
        }
        @SuppressWarnings("unchecked")
        T t = (T) out[0];
        return t;
    }

    static String callEdtQuiet(java.util.concurrent.Callable<String> c) {
        try {
            return callEdt(c);
        } catch (Exception e) {
            return e.toString();
        }
    }

    static final class TestDialogs implements Dialogs {
        final List<String> told = new CopyOnWriteArrayList<>();

        @Override
        public Answer askUnsaved(String documentName) {
            return Answer.DISCARD;
        }

        @Override
        public void tell(String title, String message) {
            told.add(title + ": " + message);
        }
    }

    static final class TestHost implements HostContext {
        @Override
        public void showStatus(String text) {
        }

        @Override
        public void documentChanged(String documentName, boolean modified) {
        }

        @Override
        public Optional<Path> chooseFileToOpen(String title, String extension) {
            return Optional.empty();
        }

        @Override
        public Optional<Path> chooseFileToSave(String title, String extension, Path suggested) {
            return Optional.empty();
        }

        @Override
        public void contributeMenu(String title, List<Action> actions) {
        }

        @Override
        public Component dialogParent() {
            return null;
        }
    }
}
