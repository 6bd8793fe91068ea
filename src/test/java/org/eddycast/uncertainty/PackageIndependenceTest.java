package org.eddycast.uncertainty;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;

/**
 * The sensitivity mathematics stands apart from the physics and from any display: it imports no other package
 * of the project and no user-interface library, so it can be checked (and reused) on its own.
 */
class PackageIndependenceTest {

    @Test
    void importsNothingFromTheProjectOrAUserInterface() throws IOException {
        List<String> offences = new ArrayList<>();
        try (Stream<Path> files = Files.walk(Path.of("src/main/java/org/eddycast/uncertainty"))) {
            for (Path f : files.filter(p -> p.toString().endsWith(".java")).toList()) {
                for (String line : Files.readAllLines(f)) {
                    boolean project = line.startsWith("import org.eddycast.")
                            && !line.startsWith("import org.eddycast.uncertainty.");
                    boolean ui = line.startsWith("import java.awt") || line.startsWith("import javax.swing")
                            || line.startsWith("import org.jfree") || line.startsWith("import com.formdev")
                            || line.startsWith("import net.miginfocom");
                    if (project || ui) {
                        offences.add(f + ": " + line);
                    }
                }
            }
        }
        assertTrue(offences.isEmpty(), String.join("\n", offences));
    }
}
