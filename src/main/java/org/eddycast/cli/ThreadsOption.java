package org.eddycast.cli;

import org.eddycast.engine.Engine;
import picocli.CommandLine.Option;

/** The shared {@code --threads} option. */
final class ThreadsOption {

    @Option(names = "--threads", paramLabel = "N",
            description = "Worker threads (default: all cores). The results do not depend on it.")
    Integer threads;

    int resolve() {
        if (threads == null) {
            return Engine.defaultThreads();
        }
        if (threads < 1 || threads > 1024) {
            throw new IllegalArgumentException("--threads must be a whole number from 1 to 1024; got " + threads);
        }
        return threads;
    }
}
