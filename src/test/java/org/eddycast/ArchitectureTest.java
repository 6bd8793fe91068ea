package org.eddycast;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;

/**
 * The engine and everything headless never import a user-interface library: the panel, the command line and
 * the report drive one engine API, and the engine runs where there is no display.
 */
class ArchitectureTest {

    private static final List<String> HEADLESS = List.of("field", "particles", "stats", "engine", "forecast",
            "measure", "scenario", "report", "cli");
    private static final List<String> FORBIDDEN = List.of("import java.awt", "import javax.swing",
            "import org.jfree", "import com.formdev", "import net.miginfocom");

    @Test
    void headlessPackagesImportNoUserInterfaceLibrary() throws IOException {
        List<String> offences = new ArrayList<>();
        for (String pkg : HEADLESS) {
            Path dir = Path.of("src/main/java/org/eddycast", pkg);
            try (Stream<Path> files = Files.walk(dir)) {
                for (Path f : files.filter(p -> p.toString().endsWith(".java")).toList()) {
                    for (String line : Files.readAllLines(f)) {
                        for (String bad : FORBIDDEN) {
                            if (line.startsWith(bad)) {
                                offences.add(f + ": " + line);
                            }
                        }
                    }
                }
            }
        }
        assertTrue(offences.isEmpty(), String.join("\n", offences));
    }
}
