package org.eddycast.ui;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The help menu finds the built manual where the build writes it, or where the user points. */
class ManualLocatorTest {

    @Test
    void findsTheManualThePropertyNamesFirst(@TempDir Path dir) throws Exception {
        Path manual = Files.writeString(dir.resolve(ManualLocator.FILE), "<html></html>");
        System.setProperty("eddycast.manual", manual.toString());
        try {
            assertEquals(manual, ManualLocator.find().orElseThrow());
            assertTrue(ManualLocator.candidates().stream().anyMatch(p -> p.endsWith(Path.of("target", "manual",
                    ManualLocator.FILE))), "looks under target/manual as the build writes it");
        } finally {
            System.clearProperty("eddycast.manual");
        }
    }
}
