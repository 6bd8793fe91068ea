package org.eddycast.ui;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The help menu finds the built manual where the build writes it, or where the user points, or in the jar. */
class ManualLocatorTest {

    @Test
    void theBundledCopyIsWrittenOutWhenTheJarCarriesOne() throws Exception {
        // the package phase puts the manual among the classes; test-compile alone does not, so skip then
        org.junit.jupiter.api.Assumptions.assumeTrue(ManualLocator.class.getResource(ManualLocator.BUNDLED) != null,
                "no bundled manual on this class path");
        Path out = ManualLocator.bundled().orElseThrow();
        assertTrue(Files.readString(out).contains("<title>"), out.toString());
    }

    @Test
    void noPlaceIsListedTwice() {
        java.util.List<Path> places = ManualLocator.candidates().stream().map(p -> p.toAbsolutePath().normalize())
                .toList();
        assertEquals(places.size(), new java.util.HashSet<>(places).size(), places.toString());
    }

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
