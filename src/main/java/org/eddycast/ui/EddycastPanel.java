package org.eddycast.ui;

import java.awt.BorderLayout;
import java.awt.event.ActionEvent;
import java.awt.event.InputEvent;
import java.awt.event.KeyEvent;
import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.ExecutionException;
import java.util.function.Consumer;
import javax.swing.AbstractAction;
import javax.swing.Action;
import javax.swing.JButton;
import javax.swing.JComponent;
import javax.swing.JPanel;
import javax.swing.JProgressBar;
import javax.swing.JScrollPane;
import javax.swing.JSplitPane;
import javax.swing.KeyStroke;
import net.miginfocom.swing.MigLayout;
import org.eddycast.engine.Engine;
import org.eddycast.engine.StudyResult;
import org.eddycast.particles.RunCancelledException;
import org.eddycast.plugin.HostContext;
import org.eddycast.plugin.ToolPanel;
import org.eddycast.scenario.Scenario;
import org.eddycast.scenario.ScenarioReader;
import org.eddycast.scenario.ScenarioWriter;

/**
 * The eddycast panel: the scenario form on the left, the results on the right, a run bar below the form.
 * Runs go to a background worker; the form locks only the inputs that define the running simulation.
 */
public final class EddycastPanel implements ToolPanel {

    private final HostContext host;
    private final Dialogs dialogs;
    private final UiPreferences prefs;
    private final JPanel root = new JPanel(new BorderLayout());
    private final ScenarioForm form = new ScenarioForm();
    private final ResultsView results = new ResultsView();
    private final JProgressBar progress = new JProgressBar(0, 1000);
    private final Action runAction = action("Run", KeyEvent.VK_R, KeyStroke.getKeyStroke(KeyEvent.VK_R,
            InputEvent.CTRL_DOWN_MASK), this::run);
    private final Action cancelAction = action("Cancel run", KeyEvent.VK_C, KeyStroke.getKeyStroke(
            KeyEvent.VK_ESCAPE, 0), this::cancel);
    private final Action keepAction = action("Keep result as option", KeyEvent.VK_K, KeyStroke.getKeyStroke(
            KeyEvent.VK_K, InputEvent.CTRL_DOWN_MASK), this::keepOption);
    private final Action clearOptionsAction = action("Clear options", KeyEvent.VK_L, null, this::clearOptions);
    private final Action saveAction = action("Save", KeyEvent.VK_S, KeyStroke.getKeyStroke(KeyEvent.VK_S,
            InputEvent.CTRL_DOWN_MASK), this::save);
    private final Exports exports;
    private final List<Consumer<StudyResult>> resultListeners = new ArrayList<>();
    private StudyWorker worker;
    private StudyResult lastResult;
    private Path file;
    private String documentName = "untitled";
    private boolean modified;
    private int threads = Engine.defaultThreads();
    private StudyWorker.Runner runner = org.eddycast.propagation.UncertaintyStudy::run;
    /** True when the form was edited after the result on view was made. */
    private boolean changedSinceResult;

    /** A panel over a host; dialogs appear over the host's window. */
    public EddycastPanel(HostContext host) {
        this(host, null, UiPreferences.user());
    }

    EddycastPanel(HostContext host, Dialogs dialogs, UiPreferences prefs) {
        this.host = host;
        this.dialogs = dialogs != null ? dialogs : Dialogs.over(host::dialogParent);
        this.prefs = prefs;
        this.exports = new Exports(host, this.dialogs, this::lastResult, results, this::suggestedFile);
        progress.setStringPainted(true);
        progress.setString("Ready");
        progress.setName("progress");
        JButton run = new JButton(runAction);
        run.setName("run");
        run.putClientProperty("JButton.buttonType", "default");
        JButton stop = new JButton(cancelAction);
        stop.setName("cancel");
        JButton keep = new JButton(keepAction);
        // the progress text on a row of its own, so it is never squeezed by the buttons
        JPanel runBar = new JPanel(new MigLayout("insets dialog, fillx, wrap 3", "[grow,fill][grow,fill][grow,fill]"));
        runBar.add(progress, "span 3, wmin 10");
        runBar.add(run, "sizegroup b");
        runBar.add(stop, "sizegroup b");
        runBar.add(keep);
        JPanel left = new JPanel(new BorderLayout());
        JScrollPane scroll = ScrollPage.around(form);
        left.add(scroll, BorderLayout.CENTER);
        left.add(runBar, BorderLayout.SOUTH);
        JSplitPane split = new JSplitPane(JSplitPane.HORIZONTAL_SPLIT, left, results);
        // the form keeps its own width; a wider window gives the room to the results
        split.setResizeWeight(0.2);
        // never narrower than the run bar's buttons and the form's labels, fields and units need
        left.setMinimumSize(new java.awt.Dimension(Math.max(Math.max(440, runBar.getPreferredSize().width),
                form.getMinimumSize().width + scroll.getVerticalScrollBar().getPreferredSize().width), 200));
        results.setMinimumSize(new java.awt.Dimension(560, 200));
        split.setContinuousLayout(true);
        root.add(split, BorderLayout.CENTER);
        root.setPreferredSize(new java.awt.Dimension(1280, 820));
        bindKeys(runAction, cancelAction, keepAction, saveAction);
        form.addChangeListener(this::formChanged);
        form.setRecordChooser(start -> host.chooseFileToOpen("Velocity record", "csv", start));
        cancelAction.setEnabled(false);
        keepAction.setEnabled(false);
        contributeMenus();
    }

    private void contributeMenus() {
        Action open = action("Open scenario\u2026", KeyEvent.VK_O, KeyStroke.getKeyStroke(KeyEvent.VK_O,
                InputEvent.CTRL_DOWN_MASK), this::openChosen);
        Action recent = action("Open recent", KeyEvent.VK_T, null, () -> { });
        recent.putValue(HostContext.SUBMENU_ITEMS, (java.util.function.Supplier<List<Action>>) this::recentActions);
        Action saveAs = action("Save as\u2026", KeyEvent.VK_A, KeyStroke.getKeyStroke(KeyEvent.VK_S,
                InputEvent.CTRL_DOWN_MASK | InputEvent.SHIFT_DOWN_MASK), this::saveAs);
        host.contributeMenu("&File", java.util.Arrays.asList(open, recent, saveAction, saveAs, null,
                exports.sheetPdf(), exports.optionsPdf(), exports.print(), exports.chartPng(), exports.chartSvg(), exports.curvesCsv()));
        Action check = action("Self-check\u2026", KeyEvent.VK_H, null, this::selfCheck);
        host.contributeMenu("&Run", java.util.Arrays.asList(runAction, cancelAction, null, keepAction,
                clearOptionsAction, null, check));
        Action manual = action("Manual", KeyEvent.VK_M, KeyStroke.getKeyStroke(KeyEvent.VK_F1, 0), this::openManual);
        Action about = action("About eddycast", KeyEvent.VK_A, null, this::about);
        host.contributeMenu("&Help", java.util.Arrays.asList(manual, about));
        bindKeys(open, saveAs);
    }

    /** Opens the manual in the system's browser, or says where it is. */
    private void openManual() {
        java.util.Optional<java.nio.file.Path> file = ManualLocator.find();
        if (file.isPresent() && java.awt.Desktop.isDesktopSupported()
                && java.awt.Desktop.getDesktop().isSupported(java.awt.Desktop.Action.BROWSE)) {
            try {
                java.awt.Desktop.getDesktop().browse(file.get().toUri());
                host.showStatus("Manual opened: " + file.get());
                return;
            } catch (java.io.IOException | RuntimeException e) {
                dialogs.tell("Manual", "The manual is at " + file.get() + " but no browser could open it ("
                        + e.getMessage() + "). Open the file in a web browser.");
                return;
            }
        }
        dialogs.tell("Manual", file.map(p -> "The manual is at " + p + ". Open it in a web browser.")
                .orElse("This build carries no manual. Build the tool with 'mvn -B -q package -DskipTests' in "
                        + "the project folder, which puts the manual inside target/eddycast.jar."));
    }

    private void about() {
        dialogs.tell("About eddycast", "eddycast " + org.eddycast.engine.ToolVersion.get() + "\n\n"
                + "Screening forecasts of tracer spreading in turbulent tanks and channels from eddy "
                + "diffusivities computed by particle simulation.\n\n"
                + String.join("\n", org.eddycast.forecast.Cautions.ALL));
    }

    @Override
    public JComponent component() {
        return root;
    }

    /** The form (for tests and the host). */
    public ScenarioForm form() {
        return form;
    }

    ResultsView results() {
        return results;
    }

    /** The latest finished result, or null. */
    public StudyResult lastResult() {
        return lastResult;
    }

    /** Whether a run is going. */
    public boolean isRunning() {
        return worker != null;
    }

    /** Runs after each finished run, on the event thread. */
    public void addResultListener(Consumer<StudyResult> l) {
        resultListeners.add(l);
    }

    /** Runs go through this runner (tests put a failing one here). */
    void setRunner(StudyWorker.Runner runner) {
        this.runner = runner;
    }

    /** The worker threads runs use. */
    public void setThreads(int threads) {
        this.threads = Math.max(1, threads);
    }

    /** The action that starts a run. */
    public Action runAction() {
        return runAction;
    }

    /** The action that cancels a run. */
    public Action cancelAction() {
        return cancelAction;
    }

    /** The action that keeps the latest result as a design option. */
    public Action keepAction() {
        return keepAction;
    }

    /** The progress bar's text (for tests). */
    public String progressText() {
        return progress.getString();
    }

    /** Shows a scenario in the form, as if opened from a file in {@code folder}. */
    public void showScenario(Scenario s, Path folder, String name) {
        form.load(s, folder);
        documentName = name;
        file = null;
        setModified(false);
    }

    /** Opens a scenario file; a file that fails to load says why and leaves the panel as it was. */
    public boolean open(Path f) {
        if (!confirmDiscard()) {
            return false;
        }
        try {
            // a file with bad values opens with them marked; only text that is not a scenario is refused
            form.loadText(java.nio.file.Files.readString(f, java.nio.charset.StandardCharsets.UTF_8),
                    f.toAbsolutePath().getParent());
        } catch (IOException | IllegalArgumentException e) {
            dialogs.tell("Could not open " + f.getFileName(), message(e));
            host.showStatus("Not opened: " + f.getFileName());
            return false;
        }
        file = f.toAbsolutePath();
        documentName = f.getFileName().toString();
        prefs.addRecent(file);
        prefs.setLastFolder(file);
        setModified(false);
        int problems = problems(form.lastCheck()).size();
        host.showStatus(problems == 0 ? "Opened " + file : "Opened " + file + " with " + problems + " problem"
                + (problems == 1 ? "" : "s") + " marked in the form");
        return true;
    }

    /** Saves to a file atomically; returns false (with a message) when the form has errors or writing fails. */
    public boolean saveTo(Path f) {
        ScenarioForm.Check c = form.check();
        if (!c.valid()) {
            dialogs.tell("Not saved", "The form has problems; fix them before saving:\n"
                    + String.join("\n", problems(c)));
            return false;
        }
        try {
            ScenarioWriter.write(c.scenario(), f);
        } catch (IOException | RuntimeException e) {
            dialogs.tell("Could not save " + f.getFileName(), message(e));
            return false;
        }
        file = f.toAbsolutePath();
        documentName = f.getFileName().toString();
        form.setFolder(file.getParent());
        prefs.addRecent(file);
        prefs.setLastFolder(file);
        setModified(false);
        host.showStatus("Saved " + file);
        return true;
    }

    private static List<String> problems(ScenarioForm.Check c) {
        List<String> all = new ArrayList<>(c.fieldProblems().values());
        all.addAll(c.otherProblems());
        return all;
    }

    private static String message(Exception e) {
        if (e instanceof java.nio.file.NoSuchFileException) {
            return "No such file: " + e.getMessage();
        }
        if (e instanceof org.eddycast.scenario.ScenarioException se) {
            return String.join("\n", se.problems());
        }
        return e.getMessage() == null ? e.toString() : e.getMessage();
    }

    private void openChosen() {
        host.chooseFileToOpen("Open scenario", "json", startFolder()).ifPresent(this::open);
    }

    /** The recent files as menu entries, newest first, each named by its file and showing its folder. */
    private List<Action> recentActions() {
        List<Action> list = new ArrayList<>();
        int i = 1;
        for (Path p : prefs.recentFiles()) {
            Action a = action(i + "  " + p.getFileName(), i <= 9 ? KeyEvent.VK_0 + i : 0, null, () -> open(p));
            a.putValue(Action.SHORT_DESCRIPTION, p.toString());
            list.add(a);
            i++;
        }
        return list;
    }

    /** Where file dialogs start: the folder last used, else the bundled presets' folder, else the working one. */
    Path startFolder() {
        return prefs.lastFolder().orElseGet(() -> {
            Path presets = Path.of("presets").toAbsolutePath();
            return java.nio.file.Files.isDirectory(presets) ? presets : Path.of("").toAbsolutePath();
        });
    }

    /** A file name for an output of the current scenario, in the start folder: "lowland-dye-summary.pdf". */
    Path suggestedFile(String suffix) {
        String typed = form.value("name").trim();
        String name = lastResult != null ? lastResult.scenario().name()
                : !typed.isEmpty() ? typed : documentName.replaceAll("\\.json$", "");
        String slug = name.toLowerCase(Locale.ROOT).replaceAll("[^a-z0-9]+", "-").replaceAll("^-|-$", "");
        return startFolder().resolve((slug.isEmpty() ? "eddycast" : slug) + suffix);
    }

    private void save() {
        if (file == null) {
            saveAs();
        } else {
            saveTo(file);
        }
    }

    private void saveAs() {
        host.chooseFileToSave("Save scenario as", "json", file != null ? file : suggestedFile(".json"))
                .ifPresent(this::saveTo);
    }

    @Override
    public boolean confirmClose() {
        return confirmDiscard();
    }

    private boolean confirmDiscard() {
        if (!modified) {
            return true;
        }
        return switch (dialogs.askUnsaved(documentName)) {
            case SAVE -> {
                save();
                yield !modified;
            }
            case DISCARD -> true;
            case CANCEL -> false;
        };
    }

    @Override
    public void dispose() {
        if (worker != null) {
            worker.stop();
            worker = null;
        }
    }

    private void formChanged() {
        setModified(true);
        changedSinceResult = true;
        if (lastResult != null && worker == null) {
            results.showStale(null);
        }
    }

    private void setModified(boolean m) {
        modified = m;
        host.documentChanged(documentName, m);
    }

    /** Starts a run of the form's scenario; with problems in the form, says what they are instead. */
    void run() {
        if (worker != null) {
            return;
        }
        ScenarioForm.Check c = form.check();
        if (!c.valid()) {
            host.showStatus("Not run: " + problems(c).size() + " problem(s) in the form; each is shown under its "
                    + "field.");
            return;
        }
        form.setRunning(true);
        runAction.setEnabled(false);
        cancelAction.setEnabled(true);
        keepAction.setEnabled(false);
        progress.setValue(0);
        progress.setString("Starting\u2026");
        results.showPreflight(List.of());
        results.showRunning("Running \"" + c.scenario().name() + "\"\u2026");
        host.showStatus("Running " + c.scenario().name());
        worker = new StudyWorker(runner, c.scenario(), threads, this::progressed, this::finished);
        worker.execute();
    }

    private void progressed(StudyWorker.Progress p) {
        if (worker == null) {
            return;
        }
        if (!p.preflight().isEmpty()) {
            results.showPreflight(p.preflight());
            host.showStatus("Before the run: WARNING: " + p.preflight().get(0)
                    + (p.preflight().size() > 1 ? " (and " + (p.preflight().size() - 1) + " more)" : ""));
        }
        progress.setValue((int) Math.round(1000 * p.fraction()));
        String left = Double.isNaN(p.secondsLeft()) ? "estimating time left" : "about " + duration(p.secondsLeft())
                + " left";
        String text = String.format(Locale.ROOT, "%.0f%%, %s", 100 * p.fraction(), left);
        progress.setString(text);
        if (p.curves() != null && p.curves().times().length > 1) {
            results.showPartial(p.curves(), "Running: " + text + " (curves fill in as groups of particles finish)");
        }
    }

    private static String duration(double s) {
        return s < 90 ? String.format(Locale.ROOT, "%.0f s", Math.ceil(s))
                : String.format(Locale.ROOT, "%.0f min", Math.ceil(s / 60));
    }

    /** Cancels at once: the panel is free again immediately; the engine stops within a step. */
    void cancel() {
        if (worker == null) {
            return;
        }
        StudyWorker w = worker;
        worker = null;
        w.stop();
        unlock();
        results.showPreflight(List.of());
        progress.setValue(0);
        progress.setString("Cancelled");
        showLastResult("the run with the new inputs was cancelled");
        host.showStatus("Run cancelled");
    }

    private void finished(StudyWorker w) {
        if (w != worker) {
            return;
        }
        worker = null;
        unlock();
        try {
            lastResult = w.get();
            changedSinceResult = false;
            progress.setValue(1000);
            progress.setString(lastResult.diffusivity().fromCache()
                    ? "Done: reused an identical earlier simulation"
                    : String.format(Locale.ROOT, "Done in %.1f s", lastResult.diffusivity().elapsedSeconds()));
            results.showResult(lastResult);
            keepAction.setEnabled(true);
            exports.resultChanged(lastResult, results.options().count());
            host.showStatus("Finished " + lastResult.scenario().name());
            for (Consumer<StudyResult> l : resultListeners) {
                l.accept(lastResult);
            }
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
        } catch (ExecutionException e) {
            Throwable cause = e.getCause();
            progress.setValue(0);
            showLastResult("the run with the new inputs did not finish");
            if (cause instanceof RunCancelledException) {
                progress.setString("Cancelled");
                return;
            }
            progress.setString("Failed");
            boolean inputProblem = cause instanceof IllegalArgumentException || cause instanceof IOException
                    || cause instanceof org.eddycast.particles.NumericalBlowupException;
            String what = cause.getMessage() == null ? cause.getClass().getSimpleName() : cause.getMessage();
            boolean logged = ErrorLog.append("run of \"" + documentName + "\" failed", cause);
            String why = inputProblem ? what : "an internal fault stopped the run (" + what + "). The form and "
                    + "the last result are kept; please report this with the log.";
            String where = logged ? "The details were written to " + ErrorLog.file() + "."
                    : "The log " + ErrorLog.file() + " could not be written; the details are below.";
            dialogs.fault("The run stopped", why + "\n" + where, ErrorLog.details(cause));
            host.showStatus("Run failed: " + what);
        } catch (java.util.concurrent.CancellationException e) {
            progress.setString("Cancelled");
        }
    }

    /** Shows the last finished result again after a run that did not finish, marked if the form moved on. */
    private void showLastResult(String why) {
        if (lastResult == null) {
            results.showEmpty();
            return;
        }
        results.showResult(lastResult);
        if (changedSinceResult) {
            results.showStale(why);
        }
    }

    private void unlock() {
        form.setRunning(false);
        runAction.setEnabled(true);
        cancelAction.setEnabled(false);
    }

    private void keepOption() {
        if (lastResult == null) {
            return;
        }
        String name = results.options().keep(lastResult);
        int n = results.options().count();
        keepAction.setEnabled(false);
        exports.resultChanged(lastResult, n);
        results.tabs().setSelectedIndex(ResultsView.OPTIONS_TAB);
        host.showStatus("Kept \u201c" + name + "\u201d as an option; " + (n < 2 ? "keep another to compare."
                : n + " options compared on the Options tab."));
    }

    private void clearOptions() {
        results.options().clear();
        exports.resultChanged(lastResult, 0);
    }

    private void selfCheck() {
        SelfCheckPanel panel = new SelfCheckPanel(org.eddycast.engine.VerificationSuite.cases(), threads);
        javax.swing.JDialog d = new javax.swing.JDialog(javax.swing.SwingUtilities.getWindowAncestor(
                host.dialogParent()), "Self-check", java.awt.Dialog.ModalityType.MODELESS);
        d.setContentPane(panel);
        d.pack();
        d.setLocationRelativeTo(host.dialogParent());
        d.addWindowListener(new java.awt.event.WindowAdapter() {
            @Override
            public void windowClosed(java.awt.event.WindowEvent e) {
                panel.stop();
            }
        });
        d.setDefaultCloseOperation(javax.swing.WindowConstants.DISPOSE_ON_CLOSE);
        panel.setCloser(d::dispose);
        Dialogs.closeOnEscape(d);
        panel.start();
        d.setVisible(true);
    }

    private void bindKeys(Action... actions) {
        for (Action a : actions) {
            KeyStroke k = (KeyStroke) a.getValue(Action.ACCELERATOR_KEY);
            if (k != null) {
                root.getInputMap(JComponent.WHEN_IN_FOCUSED_WINDOW).put(k, a.getValue(Action.NAME));
                root.getActionMap().put(a.getValue(Action.NAME), a);
            }
        }
    }

    static Action action(String name, int mnemonic, KeyStroke key, Runnable body) {
        AbstractAction a = new AbstractAction(name) {
            @Override
            public void actionPerformed(ActionEvent e) {
                body.run();
            }
        };
        a.putValue(Action.MNEMONIC_KEY, mnemonic);
        if (key != null) {
            a.putValue(Action.ACCELERATOR_KEY, key);
        }
        return a;
    }
}
