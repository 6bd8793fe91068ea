package org.eddycast.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

/**
 * Writes a command's output files after its results are on standard output. A file that cannot be saved does
 * not stop the others and does not hide the results: each failure is reported at the end and the command exits
 * with status 2.
 */
final class Saves {

    /** One file's writing. */
    @FunctionalInterface
    interface Save {
        void run() throws IOException;
    }

    private final PrintWriter out;
    private final List<String> failures = new ArrayList<>();

    Saves(PrintWriter out) {
        this.out = out;
        out.flush();
    }

    /** Writes one output, if asked for ({@code path} not null), and says so on standard output. */
    void save(String what, Path path, Save save) {
        if (path == null) {
            return;
        }
        try {
            save.run();
            out.println(what + " written to " + path);
            out.flush();
        } catch (IOException e) {
            failures.add(e.getMessage());
        }
    }

    /** Reports the failures on standard error and returns the exit status: 0, or 2 when any file failed. */
    int finish(PrintWriter err) {
        out.flush();
        for (String f : failures) {
            err.println("eddycast: " + f);
        }
        err.flush();
        return failures.isEmpty() ? 0 : Main.BAD_INPUT;
    }
}
