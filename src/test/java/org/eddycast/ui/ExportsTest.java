package org.eddycast.ui;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Optional;
import javax.swing.SwingUtilities;
import org.eddycast.engine.Engine;
import org.eddycast.engine.StudyResult;
import org.eddycast.particles.Cancellation;
import org.eddycast.particles.RunListener;
import org.eddycast.scenario.ScenarioReader;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** An export from the window never replaces the velocity record its result was analysed from. */
class ExportsTest {

    @TempDir
    Path tmp;

    @Test
    void exportingCurvesOverTheRecordIsRefused() throws Exception {
        Path record = tmp.resolve("records/flume-probe.csv");
        Files.createDirectories(record.getParent());
        Files.copy(Path.of("presets/records/flume-probe.csv"), record);
        byte[] before = Files.readAllBytes(record);
        String text = Files.readString(Path.of("presets/flume-probe-record.json"))
                .replace("\"particles\": 16384", "\"particles\": 256, \"modes\": 16");
        StudyResult result = Engine.run(ScenarioReader.parse(text, tmp), 2, RunListener.NONE, new Cancellation());
        PanelRunTest.TestDialogs dialogs = new PanelRunTest.TestDialogs();
        org.eddycast.plugin.HostContext host = new org.eddycast.plugin.HostContext() {
            @Override
            public void showStatus(String status) {
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
                // the record, spelt another way
                return Optional.of(tmp.resolve("records/../records/flume-probe.csv"));
            }

            @Override
            public void contributeMenu(String title, java.util.List<javax.swing.Action> actions) {
            }

            @Override
            public java.awt.Component dialogParent() {
                return null;
            }
        };
        SwingUtilities.invokeAndWait(() -> new Exports(host, dialogs, () -> result, new ResultsView()).curvesCsv()
                .actionPerformed(null));
        assertTrue(dialogs.told.stream().anyMatch(t -> t.startsWith("Not written: ") && t.contains("velocity record")),
                dialogs.told.toString());
        assertArrayEquals(before, Files.readAllBytes(record));
    }
}
