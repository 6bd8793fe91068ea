package org.eddycast.ui;

import java.io.IOException;
import java.io.InputStream;
import java.net.URISyntaxException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

/**
 * Finds the manual: where the system property {@code eddycast.manual} points, the full copy the tests' build
 * renders (target/manual/eddycast-manual.html, with the screenshots and the validation record), or else the
 * copy bundled inside the jar at package time, written out to the temporary folder so a browser can open it.
 */
final class ManualLocator {

    static final String FILE = "eddycast-manual.html";
    /** Where the build puts the manual inside the jar. */
    static final String BUNDLED = "/org/eddycast/manual/" + FILE;

    private ManualLocator() {
    }

    /** The files looked at, in order, before the bundled copy. */
    static List<Path> candidates() {
        List<Path> places = new ArrayList<>();
        String property = System.getProperty("eddycast.manual");
        if (property != null && !property.isBlank()) {
            places.add(Path.of(property));
        }
        Path working = Path.of("target", "manual", FILE).toAbsolutePath().normalize();
        try {
            Path code = Path.of(ManualLocator.class.getProtectionDomain().getCodeSource().getLocation().toURI());
            Path folder = code.getParent();
            if (folder != null && !folder.resolve("manual").resolve(FILE).normalize().equals(working)) {
                places.add(folder.resolve("manual").resolve(FILE));
            }
        } catch (URISyntaxException | SecurityException | NullPointerException e) {
            // no code source: the working folder and the bundled copy remain
        }
        places.add(working);
        return places;
    }

    /** The manual: a built file if there is one, else the bundled copy written out; empty if neither exists. */
    static Optional<Path> find() {
        Optional<Path> built = candidates().stream().filter(Files::isRegularFile).findFirst();
        return built.isPresent() ? built : bundled();
    }

    /** The copy inside the jar, written to the temporary folder (once per version), if the jar carries one. */
    static Optional<Path> bundled() {
        try (InputStream in = ManualLocator.class.getResourceAsStream(BUNDLED)) {
            if (in == null) {
                return Optional.empty();
            }
            Path out = Path.of(System.getProperty("java.io.tmpdir"), "eddycast-" + org.eddycast.engine.ToolVersion
                    .get().replaceAll("[^A-Za-z0-9.]", "_") + "-" + FILE);
            Path part = Files.createTempFile(out.getParent(), "eddycast-manual", ".part");
            Files.copy(in, part, StandardCopyOption.REPLACE_EXISTING);
            Files.move(part, out, StandardCopyOption.REPLACE_EXISTING, StandardCopyOption.ATOMIC_MOVE);
            return Optional.of(out);
        } catch (IOException e) {
            return Optional.empty();
        }
    }
}
