package org.eddycast.docs;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Set;
import java.util.stream.Stream;
import org.commonmark.node.AbstractVisitor;
import org.commonmark.node.FencedCodeBlock;
import org.commonmark.node.IndentedCodeBlock;
import org.commonmark.parser.Parser;
import org.eddycast.cli.Main;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * Every command in the manual's code blocks runs as written: each {@code java --add-modules jdk.incubator.vector -jar target/eddycast.jar ...}
 * runs in-process through {@link Main#execute} from the project directory and must exit 0 with output, and
 * every line with an {@code mvn} command must be one of the README's own command lines.
 */
class ManualCommandsTest {

    private static final String JAR = "java --add-modules jdk.incubator.vector -jar target/eddycast.jar";

    /** Every line of every code block in the given Markdown files. */
    static List<String> codeLines(Stream<Path> files) {
        List<String> lines = new ArrayList<>();
        Parser parser = Parser.builder().build();
        files.forEach(f -> {
            try {
                parser.parse(Files.readString(f)).accept(new AbstractVisitor() {
                    @Override
                    public void visit(IndentedCodeBlock block) {
                        lines.addAll(block.getLiteral().lines().map(String::strip).toList());
                    }

                    @Override
                    public void visit(FencedCodeBlock block) {
                        lines.addAll(block.getLiteral().lines().map(String::strip).toList());
                    }
                });
            } catch (java.io.IOException e) {
                throw new java.io.UncheckedIOException(e);
            }
        });
        return lines;
    }

    static List<Path> manualPages() throws Exception {
        try (Stream<Path> s = Files.list(Path.of("manual"))) {
            return s.filter(p -> p.toString().endsWith(".md")).sorted().toList();
        }
    }

    /** The tool commands in the manual, each as its argument list, without repeats. */
    static Stream<String> toolCommands() throws Exception {
        Set<String> commands = new LinkedHashSet<>();
        for (String line : codeLines(manualPages().stream())) {
            for (String part : line.split("&&")) {
                String p = part.strip();
                if (p.startsWith(JAR)) {
                    commands.add(p.substring(JAR.length()).strip());
                }
            }
        }
        return commands.stream();
    }

    @ParameterizedTest(name = "eddycast {0}")
    @MethodSource("toolCommands")
    void runsAsWritten(String arguments) {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        String[] args = arguments.isEmpty() ? new String[0] : arguments.split("\\s+");
        int status = Main.execute(args, new PrintWriter(out, true), new PrintWriter(err, true));
        assertEquals(0, status, "java --add-modules jdk.incubator.vector -jar target/eddycast.jar " + arguments + " failed: " + err);
        assertFalse(out.toString().isBlank(), "no output from " + arguments);
    }

    @Test
    void theManualShowsCommandsAndTheFirstRunOfTheReadme() throws Exception {
        List<String> commands = toolCommands().toList();
        assertTrue(commands.size() >= 6, "commands found: " + commands);
        assertTrue(commands.contains("run presets/canal-dye-test.json"), commands.toString());
        for (String c : List.of("run", "compare", "analyze", "check", "bench")) {
            assertTrue(commands.stream().anyMatch(x -> x.startsWith(c + " ")), "no example of " + c);
        }
    }

    @Test
    void everyMavenCommandIsOneOfTheReadmes() throws Exception {
        List<String> readme = codeLines(Stream.of(Path.of("README.md")));
        List<String> mavenLines = codeLines(manualPages().stream()).stream().filter(l -> l.contains("mvn ")).toList();
        assertFalse(mavenLines.isEmpty(), "the manual shows the README's build and test commands");
        for (String line : mavenLines) {
            assertTrue(readme.contains(line), "'" + line + "' is not a README command; README has "
                    + Arrays.toString(readme.stream().filter(l -> l.contains("mvn ")).toArray()));
        }
    }
}
