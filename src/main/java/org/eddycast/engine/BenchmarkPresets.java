package org.eddycast.engine;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.DirectoryStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Iterator;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.TimeUnit;
import java.util.function.Consumer;
import org.eddycast.scenario.Scenario;
import org.eddycast.scenario.ScenarioReader;

/**
 * Time to the answer as the user waits for it: for each preset, a fresh Java process runs {@code run PRESET}
 * (class loading and compilation included, as when the user starts the tool), and the wall time from starting
 * that process to its exit is taken. The measure ends with {@code run}, whatever the result contains; the
 * precision beside it is the preset's own target when it sets one, otherwise the widest relative 95%
 * half-width the run reached, read from the result file (NaN when the file does not say).
 */
public final class BenchmarkPresets {

    /** The main class a child process runs. */
    static final String MAIN_CLASS = "org.eddycast.cli.Main";
    /** A preset that takes longer than this is stopped and reported as failed. */
    static final long TIMEOUT_SECONDS = 600;

    /**
     * One preset's time.
     *
     * @param preset    the preset's file name without ".json"
     * @param seconds   wall time from starting the process to its exit
     * @param precision the requested relative half-width, or the widest one reached (NaN if unknown)
     * @param requested true when {@code precision} is the preset's own target
     * @param exitStatus the child's exit status (0 done)
     */
    public record PresetTime(String preset, double seconds, double precision, boolean requested, int exitStatus) {
    }

    private BenchmarkPresets() {
    }

    /** The scenario files of a folder, by name (not its subfolders). */
    public static List<Path> presetsIn(Path folder) {
        if (!Files.isDirectory(folder)) {
            throw new IllegalArgumentException("--presets must name a folder of scenario files; " + folder
                    + " is not a folder");
        }
        List<Path> files = new ArrayList<>();
        try (DirectoryStream<Path> in = Files.newDirectoryStream(folder, "*.json")) {
            in.forEach(files::add);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        files.sort(null);
        if (files.isEmpty()) {
            throw new IllegalArgumentException("--presets: the folder " + folder + " holds no .json scenario files");
        }
        return files;
    }

    /**
     * Runs each preset in its own fresh process, one after another, and reports each time as it comes.
     *
     * @param presets scenario files (each is read first, so a bad one is named before any timing)
     * @param threads worker threads of each run
     */
    public static List<PresetTime> time(List<Path> presets, int threads, Consumer<PresetTime> each)
            throws IOException, InterruptedException {
        List<Scenario> scenarios = new ArrayList<>();
        for (Path p : presets) {
            scenarios.add(ScenarioReader.read(p));
        }
        List<PresetTime> times = new ArrayList<>();
        Path scratch = Files.createTempDirectory("eddycast-bench");
        try {
            for (int i = 0; i < presets.size(); i++) {
                PresetTime t = timeOne(presets.get(i), scenarios.get(i), threads, scratch);
                each.accept(t);
                times.add(t);
            }
        } finally {
            deleteFolder(scratch);
        }
        return times;
    }

    private static PresetTime timeOne(Path preset, Scenario scenario, int threads, Path scratch)
            throws IOException, InterruptedException {
        String name = preset.getFileName().toString().replaceFirst("\\.json$", "");
        Path result = scratch.resolve(name + "-result.json");
        Path log = scratch.resolve(name + "-err.txt");
        List<String> command = childCommand(List.of("run", preset.toAbsolutePath().toString(), "--threads",
                Integer.toString(threads), "--json", result.toString()));
        ProcessBuilder builder = new ProcessBuilder(command)
                .redirectOutput(ProcessBuilder.Redirect.DISCARD)
                .redirectError(log.toFile());
        long start = System.nanoTime();
        Process child = builder.start();
        boolean finished = child.waitFor(TIMEOUT_SECONDS, TimeUnit.SECONDS);
        double seconds = (System.nanoTime() - start) / 1e9;
        if (!finished) {
            child.destroyForcibly().waitFor();
            throw new IllegalStateException("the preset " + name + " did not finish within " + TIMEOUT_SECONDS
                    + " s");
        }
        int status = child.exitValue();
        if (status != 0) {
            String err = Files.readString(log, StandardCharsets.UTF_8).strip();
            throw new IllegalStateException("run " + preset + " failed with status " + status + ": " + err);
        }
        double target = scenario.simulation().precisionTarget();
        boolean requested = !Double.isNaN(target);
        double precision = requested ? target : widestHalfWidth(result);
        return new PresetTime(name, seconds, precision, requested, status);
    }

    /** The java command that runs the tool as this process does, with the given arguments. */
    static List<String> childCommand(List<String> args) {
        List<String> command = new ArrayList<>();
        command.add(Path.of(System.getProperty("java.home"), "bin", "java").toString());
        if (ModuleLayer.boot().findModule("jdk.incubator.vector").isPresent()) {
            command.add("--add-modules");
            command.add("jdk.incubator.vector");
        }
        command.add("-cp");
        command.add(System.getProperty("java.class.path"));
        command.add(MAIN_CLASS);
        command.addAll(args);
        return command;
    }

    /** The widest relative 95% half-width over the axes in a result file, NaN if it does not say. */
    static double widestHalfWidth(Path resultJson) {
        try {
            JsonNode eddy = new ObjectMapper().readTree(resultJson.toFile()).path("eddyDiffusivity");
            double widest = Double.NaN;
            for (Iterator<String> axes = eddy.fieldNames(); axes.hasNext(); ) {
                JsonNode axis = eddy.get(axes.next());
                if (axis.has("value") && axis.has("low") && axis.has("high")) {
                    double value = axis.get("value").asDouble();
                    double half = (axis.get("high").asDouble() - axis.get("low").asDouble()) / 2;
                    double relative = Math.abs(half / value);
                    widest = Double.isNaN(widest) ? relative : Math.max(widest, relative);
                }
            }
            return widest;
        } catch (IOException e) {
            return Double.NaN;
        }
    }

    /** "4.2%" or "target 2.0%", for the printed table. */
    public static String describePrecision(PresetTime t) {
        if (Double.isNaN(t.precision())) {
            return "unknown";
        }
        return String.format(Locale.ROOT, "%s+-%.1f%%", t.requested() ? "target " : "", 100 * t.precision());
    }

    private static void deleteFolder(Path folder) throws IOException {
        try (DirectoryStream<Path> in = Files.newDirectoryStream(folder)) {
            for (Path p : in) {
                Files.deleteIfExists(p);
            }
        }
        Files.deleteIfExists(folder);
    }
}
