package org.eddycast.ui;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardOpenOption;
import java.time.Instant;

/**
 * The tool's log of faults: eddycast.log in the folder named by the system property {@value #FOLDER_PROPERTY}, or
 * .eddycast in the user's home folder. Each entry is appended with its time, what was being done and the full
 * stack trace. Writing the log never throws: a log that cannot be written is reported by the return value.
 */
final class ErrorLog {

    /** The system property naming the log folder (tests point it under target/). */
    static final String FOLDER_PROPERTY = "eddycast.logDir";

    private ErrorLog() {
    }

    /** The log file. */
    static Path file() {
        String folder = System.getProperty(FOLDER_PROPERTY);
        Path dir = folder != null && !folder.isBlank() ? Path.of(folder)
                : Path.of(System.getProperty("user.home"), ".eddycast");
        return dir.resolve("eddycast.log");
    }

    /** The stack trace as text. */
    static String details(Throwable t) {
        StringWriter s = new StringWriter();
        t.printStackTrace(new PrintWriter(s));
        return s.toString();
    }

    /** Appends an entry; returns false when the log could not be written. */
    static synchronized boolean append(String doing, Throwable t) {
        Path f = file();
        String entry = Instant.now() + "  " + doing + "\n" + details(t) + "\n";
        try {
            Files.createDirectories(f.getParent());
            Files.writeString(f, entry, StandardCharsets.UTF_8, StandardOpenOption.CREATE, StandardOpenOption.APPEND);
            return true;
        } catch (IOException | RuntimeException e) {
            return false;
        }
    }
}
