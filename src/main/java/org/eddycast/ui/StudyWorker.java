package org.eddycast.ui;

import java.util.List;
import java.util.function.Consumer;
import javax.swing.SwingWorker;
import org.eddycast.engine.Engine;
import org.eddycast.engine.Scales;
import org.eddycast.engine.StudyResult;
import org.eddycast.particles.Cancellation;
import org.eddycast.report.SpreadCurves;
import org.eddycast.scenario.Scenario;

/**
 * Runs one scenario in the background. The engine reports progress on this worker's thread; the worker turns
 * each report into plain data and hands it to the event thread through {@code publish}/{@code process}; it
 * touches no Swing component itself.
 */
final class StudyWorker extends SwingWorker<StudyResult, StudyWorker.Progress> {

    /**
     * A progress report: fraction done, seconds elapsed and left, the curves so far (or null), and the preflight
     * warnings ({@link Engine#preflight}, sent once before the run starts; empty otherwise).
     */
    record Progress(double fraction, double elapsedSeconds, double secondsLeft, SpreadCurves curves,
                    List<String> preflight) {
    }

    /** What runs a scenario: the engine, or a stand-in in tests. */
    @FunctionalInterface
    interface Runner {
        StudyResult run(Scenario scenario, int threads, org.eddycast.particles.RunListener listener,
                        Cancellation cancellation);
    }

    private final Runner runner;
    private final Scenario scenario;
    private final int threads;
    private final Cancellation cancellation = new Cancellation();
    private final Consumer<Progress> onProgress;
    private final Consumer<StudyWorker> onDone;

    StudyWorker(Scenario scenario, int threads, Consumer<Progress> onProgress, Consumer<StudyWorker> onDone) {
        this(Engine::run, scenario, threads, onProgress, onDone);
    }

    StudyWorker(Runner runner, Scenario scenario, int threads, Consumer<Progress> onProgress,
                Consumer<StudyWorker> onDone) {
        this.runner = runner;
        this.scenario = scenario;
        this.threads = threads;
        this.onProgress = onProgress;
        this.onDone = onDone;
    }

    /** Stops the run within a step; the panel does not wait for it. */
    void stop() {
        cancellation.cancel();
        cancel(false);
    }

    @Override
    protected StudyResult doInBackground() {
        long start = System.nanoTime();
        Scales scales = Engine.dimensionlessCase(scenario).scales();
        // shown before the run, off the event thread (a measured flow reads its record for it)
        publish(new Progress(0, 0, Double.NaN, null, Engine.preflight(scenario)));
        return runner.run(scenario, threads, (fraction, partial) -> {
            double elapsed = (System.nanoTime() - start) * 1e-9;
            double left = fraction > 0.02 ? elapsed * (1 - fraction) / fraction : Double.NaN;
            publish(new Progress(fraction, elapsed, left, partial == null ? null : SpreadCurves.of(partial, scales),
                    List.of()));
        }, cancellation);
    }

    @Override
    protected void process(List<Progress> chunks) {
        if (isCancelled()) {
            return;
        }
        Progress latest = chunks.get(chunks.size() - 1);
        SpreadCurves curves = null;
        List<String> preflight = List.of();
        for (Progress p : chunks) {
            if (p.curves() != null) {
                curves = p.curves();
            }
            if (!p.preflight().isEmpty()) {
                preflight = p.preflight();
            }
        }
        onProgress.accept(new Progress(latest.fraction(), latest.elapsedSeconds(), latest.secondsLeft(), curves,
                preflight));
    }

    @Override
    protected void done() {
        onDone.accept(this);
    }
}
