package org.eddycast.docs;

import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Comparator;
import java.util.stream.Stream;

/**
 * Where tests record their checks against outside values for the manual's validation record: one JSON file
 * per check in {@code target/validation/} (or the directory in the system property
 * {@code eddycast.validationDir}). The directory is emptied on the first record of a test run, so the record
 * holds this run's outcomes only. Recording never changes a verdict: the test computes it, records it, then
 * asserts as before.
 */
public final class ValidationLog {

    private static final ObjectMapper JSON = new ObjectMapper().enable(SerializationFeature.INDENT_OUTPUT);
    private static final Path DIR = Path.of(System.getProperty("eddycast.validationDir", "target/validation"));
    private static boolean cleared;

    private ValidationLog() {
    }

    /**
     * Records a deterministic check: the value passes when it lies within the tolerance of the expected value.
     *
     * @return whether it passed, so the caller may assert on the same verdict
     */
    public static boolean exact(String check, String source, double expected, double value, double tolerance,
                                String criterion) {
        boolean passed = Math.abs(value - expected) <= tolerance;
        write(new ValidationEntry(check, source, expected, value, null, null, expected - tolerance,
                expected + tolerance, criterion, passed, caller()));
        return passed;
    }

    /** Records a check of a statistical estimate with its own 95% interval and the range the test accepts. */
    public static void statistical(String check, String source, double expected, double estimate, double low,
                                   double high, double acceptLow, double acceptHigh, String criterion,
                                   boolean passed) {
        write(new ValidationEntry(check, source, expected, estimate, low, high, acceptLow, acceptHigh, criterion,
                passed, caller()));
    }

    private static synchronized void write(ValidationEntry e) {
        try {
            if (!cleared) {
                if (Files.isDirectory(DIR)) {
                    try (Stream<Path> old = Files.list(DIR)) {
                        for (Path p : old.sorted(Comparator.reverseOrder()).toList()) {
                            Files.delete(p);
                        }
                    }
                }
                Files.createDirectories(DIR);
                cleared = true;
            }
            String name = (e.recordedBy() + "-" + e.check()).replaceAll("[^A-Za-z0-9.-]+", "_");
            if (name.length() > 180) {
                name = name.substring(0, 170) + Integer.toHexString(name.hashCode());
            }
            JSON.writeValue(DIR.resolve(name + ".json").toFile(), e);
        } catch (IOException x) {
            throw new UncheckedIOException("cannot write the validation record in " + DIR, x);
        }
    }

    /** The test class and method that called in, "org.eddycast.engine.SomeTest#method". */
    private static String caller() {
        return StackWalker.getInstance().walk(frames -> frames
                .filter(f -> !f.getClassName().equals(ValidationLog.class.getName()))
                .findFirst()
                .map(f -> f.getClassName() + "#" + f.getMethodName().replaceAll("^lambda\\$(.*)\\$\\d+$", "$1"))
                .orElse("unknown"));
    }
}
