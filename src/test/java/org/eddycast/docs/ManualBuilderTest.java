package org.eddycast.docs;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.ObjectMapper;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Base64;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The manual builder on a small manual of its own: order, embedded images, chapter links, generated record. */
class ManualBuilderTest {

    // the 8-byte PNG signature is enough for the builder, which copies bytes without decoding them
    private static final byte[] PNG = {(byte) 0x89, 'P', 'N', 'G', '\r', '\n', 0x1a, '\n'};

    @TempDir
    Path dir;

    private Path manual() throws Exception {
        Path m = Files.createDirectories(dir.resolve("manual"));
        Files.writeString(m.resolve("README.md"), """
                # Test manual

                1. [Second file first](b.md)
                2. [Then the first](a.md)
                3. [Validation record](validation-record.md)
                """);
        Files.writeString(m.resolve("a.md"), "# A\n\nSee [b](b.md).\n\n![shot](../target/screenshots/1-x.png)\n");
        Files.writeString(m.resolve("b.md"), "# B\n\n| k | v |\n|---|---|\n| one | 1 |\n");
        Files.createDirectories(dir.resolve("shots"));
        Files.write(dir.resolve("shots/1-x.png"), PNG);
        Path v = Files.createDirectories(dir.resolve("validation"));
        new ObjectMapper().writeValue(v.resolve("e.json").toFile(), new ValidationEntry("shear D_xx", "Taylor 1921",
                2.25, 2.2512, 2.24, 2.26, 2.2, 2.3, "3 standard errors", true, "x.SomeTest#m"));
        return m;
    }

    @Test
    void chaptersInContentsOrderWithImagesEmbeddedAndTheRecordGenerated() throws Exception {
        String html = new ManualBuilder(manual(), dir.resolve("shots"), dir.resolve("validation")).html();
        assertTrue(html.indexOf("<h1>B</h1>") < html.indexOf("<h1>A</h1>"), "README order, not file order");
        assertTrue(html.contains("data:image/png;base64," + Base64.getEncoder().encodeToString(PNG)));
        assertTrue(html.contains("href=\"#b\""), "a link to a chapter points inside the file");
        assertTrue(html.contains("<table>"), "tables render");
        assertTrue(html.contains("shear D_xx") && html.contains("2.251") && html.contains("[2.24, 2.26]"));
        assertTrue(html.contains("1 of 1 checks passed"));
    }

    @Test
    void aMissingImageFailsNamingPageAndImage() throws Exception {
        Path m = manual();
        Files.writeString(m.resolve("b.md"), "# B\n\n![gone](../target/screenshots/9-missing.png)\n");
        ManualBuildException e = assertThrows(ManualBuildException.class,
                () -> new ManualBuilder(m, dir.resolve("shots"), dir.resolve("validation")).html());
        assertTrue(e.getMessage().contains("b.md") && e.getMessage().contains("9-missing.png"), e.getMessage());
    }

    @Test
    void anEmptyValidationRecordFails() throws Exception {
        Path m = manual();
        Path empty = Files.createDirectories(dir.resolve("none"));
        ManualBuildException e = assertThrows(ManualBuildException.class,
                () -> new ManualBuilder(m, dir.resolve("shots"), empty).html());
        assertTrue(e.getMessage().contains("mvn -B verify"), e.getMessage());
    }

    @Test
    void aListedChapterThatDoesNotExistFails() throws Exception {
        Path m = manual();
        Files.delete(m.resolve("a.md"));
        ManualBuildException e = assertThrows(ManualBuildException.class, () -> ManualContents.read(m));
        assertTrue(e.getMessage().contains("a.md"), e.getMessage());
    }

    @Test
    void numbersKeepFourSignificantDigits() {
        assertEquals("2.251", ValidationChapter.number(2.25123));
        assertEquals("1.069e-5", ValidationChapter.number(1.0692e-5));
        assertEquals("n/a", ValidationChapter.number(Double.NaN));
        assertEquals("1.235e5", ValidationChapter.number(123456));
        assertEquals("2.24", ValidationChapter.number(2.24));
        assertEquals("-0.5", ValidationChapter.number(-0.5));
    }

    @Test
    void theCopyForTheJarBuildsFromTheRealManualWithoutTestOutputs(@TempDir Path empty) throws Exception {
        // what 'mvn -B -q package -DskipTests' bundles: no screenshots and no validation record written yet; the
        // chapters are copied so that their "../target/screenshots" paths lead nowhere
        Path manual = Files.createDirectories(empty.resolve("manual"));
        try (var files = Files.list(Path.of("manual"))) {
            for (Path f : files.filter(p -> p.toString().endsWith(".md")).toList()) {
                Files.copy(f, manual.resolve(f.getFileName()));
            }
        }
        String html = new ManualBuilder(manual, empty.resolve("screenshots"), empty.resolve("validation"), true)
                .html();
        assertTrue(html.contains("The window"), "the window's chapter is in the contents");
        assertTrue(html.contains("the test suite draws it"), "a missing screenshot is named, not fatal");
        assertTrue(html.contains("built without running the tests"), "the record's place says how to fill it");
        assertThrows(ManualBuildException.class, () -> new ManualBuilder(manual, empty.resolve("screenshots"),
                empty.resolve("validation")).html(), "the full build stays strict");
    }
}
