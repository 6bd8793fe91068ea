package org.eddycast.scenario;

import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;

/** The preset a new window opens on, bundled in the jar. */
public final class BundledPresets {

    /** The file name shown for the bundled preset. */
    public static final String STANDARD_NAME = "mixing-tank-dose.json";

    private BundledPresets() {
    }

    /** The bundled stirred-tank preset (an invented example). */
    public static Scenario standard() {
        try (InputStream in = BundledPresets.class.getResourceAsStream("/presets/" + STANDARD_NAME)) {
            if (in == null) {
                throw new IllegalStateException("the bundled preset " + STANDARD_NAME + " is missing from the jar");
            }
            return ScenarioReader.parse(new String(in.readAllBytes(), StandardCharsets.UTF_8), folder());
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    /** The folder relative paths of a new scenario resolve against: the working folder. */
    public static Path folder() {
        return Path.of("").toAbsolutePath();
    }
}
