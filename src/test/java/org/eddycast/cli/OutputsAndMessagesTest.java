package org.eddycast.cli;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.eddycast.engine.Benchmark;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The command line checks its outputs before any simulation, never writes over one of its own inputs or one
 * output over another, shows the preflight before a run, still prints its results when a file fails, and names
 * the option or the file in every message.
 */
class OutputsAndMessagesTest {

    /** A cheap run: the shear-flow verification preset with few particles (about a second). */
    private static Path cheapScenario(Path dir, String name) throws IOException {
        Path scenario = dir.resolve(name);
        Files.writeString(scenario, Files.readString(Path.of("presets/verify-shear-flow.json"))
                .replace("\"particles\": 32768", "\"particles\": 256").replace("\"duration\": 40", "\"duration\": 4"));
        return scenario;
    }

    private static CommandLineTest.Outcome run(String... args) {
        return CommandLineTest.run(args);
    }

    @Test
    void anOutputInAMissingFolderIsRefusedBeforeTheRun(@TempDir Path dir) throws IOException {
        Path scenario = cheapScenario(dir, "s.json");
        CommandLineTest.Outcome o = run("run", scenario.toString(), "--json", dir.resolve("missing/x.json").toString());
        assertEquals(2, o.status());
        assertTrue(o.err().contains("--json " + dir.resolve("missing/x.json") + ": the folder"), o.err());
        assertTrue(o.err().contains("does not exist"), o.err());
        assertFalse(o.out().contains("eddy diffusivity"), "nothing was simulated: " + o.out());
    }

    @Test
    void theBenchmarkChecksItsOutputBeforeMeasuring(@TempDir Path dir) {
        CommandLineTest.Outcome o = run("bench", "--json", dir.resolve("missing/b.json").toString());
        assertEquals(2, o.status());
        assertTrue(o.err().contains("does not exist"), o.err());
        assertEquals("", o.out(), "nothing was measured");
        CommandLineTest.Outcome answer = run("bench", "--answer", "--json", dir.resolve("b.json").toString());
        assertEquals(2, answer.status());
        assertTrue(answer.err().contains("--json applies to the throughput figures only"), answer.err());
    }

    @Test
    void anOutputNeverReplacesAnInputNorAnotherOutput(@TempDir Path dir) throws IOException {
        Path scenario = cheapScenario(dir, "s.json");
        byte[] before = Files.readAllBytes(scenario);
        CommandLineTest.Outcome over = run("run", scenario.toString(), "--json", dir.resolve("./s.json").toString());
        assertEquals(2, over.status());
        assertTrue(over.err().contains("--json names the scenario file " + scenario + ", an input of this command"),
                over.err());
        assertArrayEquals(before, Files.readAllBytes(scenario));

        Path same = dir.resolve("out.txt");
        CommandLineTest.Outcome twice = run("run", scenario.toString(), "--json", same.toString(), "--csv",
                same.toString());
        assertEquals(2, twice.status());
        assertTrue(twice.err().contains("--json and --csv name the same file"), twice.err());
        assertFalse(Files.exists(same));

        Path record = dir.resolve("probe.csv");
        Files.copy(Path.of("presets/records/flume-probe.csv"), record);
        byte[] recordBefore = Files.readAllBytes(record);
        CommandLineTest.Outcome analyze = run("analyze", record.toString(), "--json", record.toString());
        assertEquals(2, analyze.status());
        assertTrue(analyze.err().contains("--json names the record " + record), analyze.err());
        assertArrayEquals(recordBefore, Files.readAllBytes(record));
    }

    @Test
    void compareNamesABrokenFileBeforeSimulatingAnything(@TempDir Path dir) throws IOException {
        Path good = cheapScenario(dir, "good.json");
        Path broken = dir.resolve("broken.json");
        Files.writeString(broken, "{ \"version\": 1, \"name\": \"x\" ");
        CommandLineTest.Outcome o = run("compare", good.toString(), broken.toString());
        assertEquals(2, o.status());
        assertTrue(o.err().startsWith("eddycast: " + broken + ": line"), o.err());
        assertEquals("", o.out(), "nothing was simulated");
    }

    @Test
    void thePreflightIsShownBeforeTheRunAndKeptInTheJson(@TempDir Path dir) throws IOException {
        // a time step of 0.8 s against the shear's shortest time scale, 1 s (tau = 1 s, 1 / (U k) = 1 s)
        Path scenario = cheapScenario(dir, "coarse.json");
        Files.writeString(scenario, Files.readString(scenario).replace("\"timeStep\": 0.05", "\"timeStep\": 0.8")
                .replace("\"duration\": 4,", "\"duration\": 40,"));
        Path json = dir.resolve("r.json");
        CommandLineTest.Outcome o = run("run", scenario.toString(), "--json", json.toString(), "--threads", "2");
        assertEquals(0, o.status(), o.err());
        assertTrue(o.err().startsWith("eddycast: before the run: WARNING: simulation.timeStep 0.800 s is more than"),
                o.err());
        assertTrue(o.out().contains("WARNING (before the run): simulation.timeStep"), o.out());
        JsonNode root = new ObjectMapper().readTree(json.toFile());
        assertTrue(root.path("preflight").get(0).asText().startsWith("simulation.timeStep 0.800 s"));
    }

    @Test
    void resultsReachStandardOutputEvenWhenAFileFails() {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        PrintWriter o = new PrintWriter(out);
        o.print("the summary\n");
        Saves saves = new Saves(o);
        saves.save("result", Path.of("a.json"), () -> {
            throw new IOException("could not save a.json: the disk is full");
        });
        saves.save("curves", Path.of("b.csv"), () -> { });
        int status = saves.finish(new PrintWriter(err));
        assertEquals(Main.BAD_INPUT, status);
        assertEquals("the summary\ncurves written to b.csv\n", out.toString().replace(System.lineSeparator(), "\n"));
        assertTrue(err.toString().contains("eddycast: could not save a.json: the disk is full"));
    }

    @Test
    void anUnwritableFolderIsNamedBeforeTheRun(@TempDir Path dir) throws IOException {
        Path locked = Files.createDirectory(dir.resolve("locked"));
        locked.toFile().setWritable(false);
        org.junit.jupiter.api.Assumptions.assumeFalse(Files.isWritable(locked), "running as a user who may write anywhere");
        try {
            IllegalArgumentException e = org.junit.jupiter.api.Assertions.assertThrows(IllegalArgumentException.class,
                    () -> new OutputPlan().output("the summary sheet", locked.resolve("eddycast-summary.pdf")).check());
            assertTrue(e.getMessage().contains("cannot be written"), e.getMessage());
        } finally {
            locked.toFile().setWritable(true);
        }
    }

    @Test
    void optionsAndInapplicableOptionsAreNamed() {
        CommandLineTest.Outcome rate = run("analyze", "presets/records/flume-probe.csv", "--sampling-rate", "1e12");
        assertEquals(2, rate.status());
        assertTrue(rate.err().contains("--sampling-rate must be between 0 (exclusive) and 1e+06 Hz"), rate.err());
        CommandLineTest.Outcome scenario = run("analyze", "presets/records/flume-probe.csv", "--scenario");
        assertEquals(2, scenario.status());
        assertTrue(scenario.err().contains("--scenario applies with --json only"), scenario.err());
    }

    @Test
    void controlCharactersInANameAreEscapedOnTheTerminal(@TempDir Path dir) throws IOException {
        Path scenario = cheapScenario(dir, "s.json");
        Files.writeString(scenario, Files.readString(scenario).replace("\"Verification: time-correlated shear\"",
                "\"shear \\u001b[2J\\u0007\""));
        CommandLineTest.Outcome o = run("run", scenario.toString(), "--threads", "2");
        assertEquals(0, o.status(), o.err());
        assertFalse(o.out().chars().anyMatch(c -> c == 0x1b || c == 0x07));
        assertTrue(o.out().contains("shear \\u001b[2J\\u0007"), o.out());
    }

    @Test
    void analyzeWritesNothingThatRunWouldRefuse(@TempDir Path dir) throws IOException {
        // the demo record with its time column stretched 1e300-fold: an integral length near 1e299 m
        StringBuilder slow = new StringBuilder();
        for (String line : Files.readAllLines(Path.of("presets/records/flume-probe.csv"))) {
            String[] cells = line.split(",", 2);
            slow.append(cells.length == 2 && cells[0].matches("[0-9.]+")
                    ? Double.parseDouble(cells[0]) * 1e300 + "," + cells[1] : line).append('\n');
        }
        Path record = Files.writeString(dir.resolve("slow.csv"), slow);
        Path flow = dir.resolve("flow.json");
        CommandLineTest.Outcome o = run("analyze", record.toString(), "--json", flow.toString());
        assertEquals(2, o.status());
        assertTrue(o.err().contains("are outside what run accepts, so nothing is written: flow.integralLength must "
                + "be between 0 (exclusive) and 100000 m"), o.err());
        assertFalse(Files.exists(flow));
        assertTrue(o.out().contains("integral length"), "the analysis itself is still printed");
    }

    @Test
    void aRecordInAnotherEncodingIsNamed(@TempDir Path dir) throws IOException {
        String text = Files.readString(Path.of("presets/records/flume-probe.csv"));
        Path utf16 = Files.write(dir.resolve("probe16.csv"), text.getBytes(java.nio.charset.StandardCharsets.UTF_16));
        CommandLineTest.Outcome o = run("analyze", utf16.toString());
        assertEquals(2, o.status());
        assertTrue(o.err().contains("is not UTF-8 text: it is UTF-16 text (big-endian byte-order mark FE FF)"), o.err());
        Path latin = Files.write(dir.resolve("probe1.csv"), ("# Messung \u00e4\n" + text)
                .getBytes(java.nio.charset.StandardCharsets.ISO_8859_1));
        o = run("analyze", latin.toString());
        assertEquals(2, o.status());
        assertTrue(o.err().contains("byte 0xE4 on line 1 is not valid UTF-8"), o.err());
        o = run("analyze", dir.toString());
        assertEquals(2, o.status());
        assertTrue(o.err().contains("is a folder, not a record file"), o.err());
    }

    @Test
    void outOfMemoryIsAPlainMessage() {
        assertTrue(Main.outOfMemory(new RuntimeException(new java.util.concurrent.ExecutionException(
                new OutOfMemoryError("Java heap space")))));
        assertFalse(Main.outOfMemory(new IllegalStateException("other")));
        assertTrue(Main.OUT_OF_MEMORY.startsWith("out of memory:"));
        assertTrue(Main.OUT_OF_MEMORY.contains("-Xmx"));
    }

    @Test
    void theManualStatesTheQuickBenchmarksParticleCount() throws IOException {
        String manual = Files.readString(Path.of("manual/command-line.md"));
        Matcher m = Pattern.compile("`--quick` \\| a reduced workload \\(([0-9,]+) particles, ([0-9,]+) steps\\)")
                .matcher(manual);
        assertTrue(m.find(), "the manual's --quick row");
        Benchmark.Workload quick = Benchmark.Workload.quick();
        assertEquals(quick.particles(), Integer.parseInt(m.group(1).replace(",", "")));
        assertEquals(quick.steps(), Integer.parseInt(m.group(2).replace(",", "")));
    }
}
