package org.eddycast.cli;

import java.io.PrintWriter;
import org.eddycast.engine.Engine;
import org.eddycast.scenario.Printable;
import org.eddycast.scenario.Scenario;

/** Shows the preflight ({@link Engine#preflight}) on standard error before a run starts. */
final class BeforeRun {

    private BeforeRun() {
    }

    /** Prints each warning of the scenario's preflight, naming the scenario when {@code named}. */
    static void show(PrintWriter err, Scenario s, boolean named) {
        for (String w : Engine.preflight(s)) {
            err.println("eddycast: before the run" + (named ? " of " + Printable.escape(s.name()) : "") + ": WARNING: "
                    + w);
        }
        err.flush();
    }
}
