package org.eddycast.cli;

import java.io.PrintWriter;
import org.eddycast.particles.RunListener;
import org.eddycast.stats.DisplacementMoments;

/** Prints a percentage now and then on standard error, when it is a terminal. */
final class ProgressPrinter implements RunListener {

    private final PrintWriter err;
    private final boolean enabled;
    private int lastPercent = -1;

    ProgressPrinter(PrintWriter err, boolean enabled) {
        this.err = err;
        this.enabled = enabled;
    }

    static boolean terminal() {
        return System.console() != null;
    }

    @Override
    public void progress(double fraction, DisplacementMoments partial) {
        int percent = (int) Math.floor(100 * fraction);
        if (enabled && percent / 5 != lastPercent / 5) {
            err.print("\r  running... " + percent + "%");
            err.flush();
            lastPercent = percent;
        }
    }

    void finish() {
        if (enabled && lastPercent >= 0) {
            err.print("\r                      \r");
            err.flush();
        }
    }
}
