package org.eddycast.cli;

import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import net.jqwik.api.Arbitraries;
import net.jqwik.api.Arbitrary;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.Provide;

/**
 * However a path is spelt (relative or absolute, with "." and ".." steps, through a link), an output that is
 * an input of the same command, or the same file as another output, is refused before anything runs; two
 * different files are accepted. Seeds are fixed so a run is repeatable.
 */
class OutputPlanPropertiesTest {

    private static final Path ROOT = folder();

    private static Path folder() {
        try {
            Path dir = Files.createTempDirectory("eddycast-plan");
            Files.createDirectories(dir.resolve("a/b"));
            Files.writeString(dir.resolve("a/scenario.json"), "{}");
            Files.createSymbolicLink(dir.resolve("link"), dir.resolve("a"));
            dir.toFile().deleteOnExit();
            return dir;
        } catch (IOException | UnsupportedOperationException e) {
            throw new IllegalStateException(e);
        }
    }

    @Property(tries = 300, seed = "8301")
    void anOutputThatIsAnInputIsRefusedHoweverSpelt(@ForAll("spelling") String spelling) {
        Path input = ROOT.resolve("a/scenario.json");
        Path output = Path.of(spelling);
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> new OutputPlan().input("the scenario file", input).output("--json", output).check());
        assertTrue(e.getMessage().startsWith("--json names the scenario file"), e.getMessage());
    }

    @Property(tries = 300, seed = "8302")
    void twoOutputsOnOneFileAreRefusedHoweverSpelt(@ForAll("spelling") String first, @ForAll("spelling") String second) {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> new OutputPlan()
                .output("--json", Path.of(first)).output("--csv", Path.of(second)).check());
        assertTrue(e.getMessage().contains("--json and --csv name the same file"), e.getMessage());
    }

    @Property(tries = 100, seed = "8303")
    void differentFilesInAWritableFolderAreAccepted(@ForAll("spelling") String input) {
        new OutputPlan().input("the scenario file", Path.of(input)).output("--json", ROOT.resolve("a/out.json"))
                .output("--csv", ROOT.resolve("a/b/out.csv")).check();
    }

    /** Spellings of ROOT/a/scenario.json. */
    @Provide
    Arbitrary<String> spelling() {
        Path cwd = Path.of("").toAbsolutePath();
        String relative;
        try {
            relative = cwd.relativize(ROOT).toString();
        } catch (IllegalArgumentException e) {
            throw new UncheckedIOException(new IOException(e));
        }
        return Arbitraries.of(
                ROOT + "/a/scenario.json",
                ROOT + "/a/./scenario.json",
                ROOT + "/a/b/../scenario.json",
                ROOT + "/./a/b/./../scenario.json",
                ROOT + "/link/scenario.json",
                relative + "/a/scenario.json",
                relative + "/a/b/../scenario.json",
                "./" + relative + "/link/../a/scenario.json");
    }
}
