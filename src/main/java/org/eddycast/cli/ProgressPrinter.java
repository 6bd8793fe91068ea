package org.eddycast.cli;

import java.io.PrintWriter;
import java.util.Locale;
import java.util.concurrent.Executors;
import java.util.concurrent.ScheduledExecutorService;
import java.util.concurrent.TimeUnit;
import org.eddycast.particles.RunListener;
import org.eddycast.stats.DisplacementMoments;

/**
 * Shows a run's progress on standard error. On a terminal: a percentage rewritten in place every 5%. Otherwise
 * (a log file, a pipe, a batch job): one line at a fixed interval, by a timer, so that a long run says it is
 * alive at least every {@link #LOG_INTERVAL_SECONDS} s even while no block of particles finishes.
 */
final class ProgressPrinter implements RunListener {

    /** The longest silence of a run whose standard error is not a terminal. */
    static final long LOG_INTERVAL_SECONDS = 10;

    private final PrintWriter err;
    private final boolean terminal;
    private final long startNanos = System.nanoTime();
    private final ScheduledExecutorService timer;
    private volatile double fraction;
    private int lastPercent = -1;

    private ProgressPrinter(PrintWriter err, boolean terminal, long intervalMillis) {
        this.err = err;
        this.terminal = terminal;
        if (terminal) {
            this.timer = null;
        } else {
            this.timer = Executors.newSingleThreadScheduledExecutor(r -> {
                Thread t = new Thread(r, "eddycast-progress");
                t.setDaemon(true);
                return t;
            });
            timer.scheduleAtFixedRate(this::logLine, intervalMillis, intervalMillis, TimeUnit.MILLISECONDS);
        }
    }

    /** A printer for this process's standard error: in place on a terminal, a line every 10 s otherwise. */
    static ProgressPrinter start(PrintWriter err) {
        return new ProgressPrinter(err, System.console() != null, TimeUnit.SECONDS.toMillis(LOG_INTERVAL_SECONDS));
    }

    /** A printer that writes a line every {@code intervalMillis} (tests use a short interval). */
    static ProgressPrinter logging(PrintWriter err, long intervalMillis) {
        return new ProgressPrinter(err, false, intervalMillis);
    }

    @Override
    public void progress(double fraction, DisplacementMoments partial) {
        this.fraction = fraction;
        if (!terminal) {
            return;
        }
        int percent = (int) Math.floor(100 * fraction);
        if (percent / 5 != lastPercent / 5) {
            err.print("\r  running... " + percent + "%");
            err.flush();
            lastPercent = percent;
        }
    }

    private void logLine() {
        err.println(String.format(Locale.ROOT, "eddycast: running, %.0f%% done after %.0f s", 100 * fraction,
                (System.nanoTime() - startNanos) / 1e9));
        err.flush();
    }

    /** Stops the timer and clears the terminal line; call it when the run ends, however it ends. */
    void finish() {
        if (timer != null) {
            timer.shutdownNow();
        } else if (lastPercent >= 0) {
            err.print("\r                      \r");
            err.flush();
        }
    }
}
