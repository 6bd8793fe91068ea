package org.eddycast.ui;

import java.net.URISyntaxException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

/**
 * Finds the manual the build renders (target/manual/eddycast-manual.html): beside the running jar, under the
 * working folder, or where the system property {@code eddycast.manual} points.
 */
final class ManualLocator {

    static final String FILE = "eddycast-manual.html";

    private ManualLocator() {
    }

    /** The places looked at, in order. */
    static List<Path> candidates() {
        List<Path> places = new ArrayList<>();
        String property = System.getProperty("eddycast.manual");
        if (property != null && !property.isBlank()) {
            places.add(Path.of(property));
        }
        try {
            Path code = Path.of(ManualLocator.class.getProtectionDomain().getCodeSource().getLocation().toURI());
            Path folder = Files.isDirectory(code) ? code.getParent() : code.getParent();
            if (folder != null) {
                places.add(folder.resolve("manual").resolve(FILE));
            }
        } catch (URISyntaxException | SecurityException | NullPointerException e) {
            // no code source: fall back to the working folder
        }
        places.add(Path.of("target", "manual", FILE).toAbsolutePath());
        return places;
    }

    /** The manual, if it has been built. */
    static Optional<Path> find() {
        return candidates().stream().filter(Files::isRegularFile).findFirst();
    }
}
