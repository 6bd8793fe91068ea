package org.eddycast.cli;

import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.Callable;
import org.eddycast.engine.Benchmark;
import org.eddycast.engine.TransportBenchmark;
import org.eddycast.engine.BenchmarkPresets;
import org.eddycast.particles.Integrator;
import org.eddycast.particles.KernelChoice;
import org.eddycast.scenario.AtomicFiles;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;

/** {@code bench}: the standard workload's throughput, memory and answer per integrator and sharing mode. */
@Command(name = "bench", mixinStandardHelpOptions = true,
        description = "Measure mode-updates per second on the standard workload (3D, 64 modes, 65,536 particles, "
                + "2,000 steps) for every integrator, shared and own realizations.")
final class BenchCommand implements Callable<Integer> {

    @Option(names = "--quick", description = "A reduced workload (4,096 particles, 400 steps).")
    boolean quick;

    @Option(names = "--json", paramLabel = "FILE", description = "Write the figures as JSON.")
    Path json;

    @Option(names = "--answer", description = "Instead of throughput, time each preset: a fresh Java process runs "
            + "'run PRESET', timed from its start to its end, with the precision asked for or reached.")
    boolean answer;

    @Option(names = "--presets", paramLabel = "DIR", description = "The folder of presets --answer times "
            + "(default: ${DEFAULT-VALUE}).", defaultValue = "presets")
    Path presets;

    @Option(names = "--workload-answer", description = "Instead of throughput, measure the seconds from process "
            + "start to the standard workload's diffusivity within a 95%% interval of +-2%% per axis (Strang, "
            + "shared).")
    boolean workloadAnswer;

    @Option(names = "--particles", paramLabel = "N", description = "Override the workload's particle count.")
    int particles;

    @Option(names = "--modes", paramLabel = "M", description = "Override the workload's mode count.")
    int modes;

    @Option(names = "--steps", paramLabel = "S", description = "Override the workload's step count.")
    int steps;

    @Option(names = "--scheme", paramLabel = "NAME", split = ",",
            description = "Only these integrators (euler, lie, strang; default all).")
    List<String> schemes;

    @Option(names = "--sharing", paramLabel = "MODE", split = ",",
            description = "Only these sharing modes (shared, own; default both).")
    List<String> sharing;

    @Mixin
    ThreadsOption threads;

    @Spec
    picocli.CommandLine.Model.CommandSpec spec;

    @Override
    public Integer call() throws Exception {
        PrintWriter out = spec.commandLine().getOut();
        if (workloadAnswer && json != null) {
            throw new IllegalArgumentException("--json applies to the throughput figures and to --answer's table:"
                    + " leave it out with --workload-answer, whose one line goes to standard output");
        }
        new OutputPlan().output("--json", json).check();
        int threadCount = threads.resolve();
        if (answer) {
            return timePresets(out, threadCount);
        }
        if (workloadAnswer) {
            long cpuStart = Benchmark.processCpuNanos();
            Benchmark.Answer a = Benchmark.timeToAnswer(threadCount, 0.02);
            double cpu = (Benchmark.processCpuNanos() - cpuStart) / 1e9;
            out.printf(Locale.ROOT, "time to answer (%s, shared, %d threads, %s kernel): %.1f s from process start "
                            + "(%.1f s of simulation), %d particles, widest 95%% interval +-%.2f%%, diffusivity "
                            + "%.4f [%.4f, %.4f]%n", a.integrator(), a.threads(), KernelChoice.fastest().name()
                            .toLowerCase(Locale.ROOT), a.secondsFromStart(), a.runSeconds(), a.particles(),
                    100 * a.worstRelativeHalfWidth(), a.diffusivity(), a.low(), a.high());
            out.printf(Locale.ROOT, "CPU time of the process: %.1f s (%.2f cores busy on average)%n", cpu,
                    cpu / a.secondsFromStart());
            return 0;
        }
        Benchmark.Workload w = (quick ? Benchmark.Workload.quick() : Benchmark.Workload.standard())
                .with(checked(particles, "--particles"), checked(steps, "--steps"), checked(modes, "--modes"));
        List<Integrator> integrators = integrators();
        List<Boolean> modesOfSharing = sharingModes();
        out.printf(Locale.ROOT, "workload: %d particles, %d modes, %d steps (%.3g mode-updates per run), "
                        + "median of %d after a warm-up; %s kernel, %d threads%n", w.particles(), w.modes(), w.steps(),
                (double) w.particles() * w.modes() * w.steps(), w.repetitions(),
                KernelChoice.fastest().name().toLowerCase(Locale.ROOT), threadCount);
        out.printf(Locale.ROOT, "%-8s %-7s %7s %15s %19s %15s %12s %28s%n", "scheme", "sharing", "threads",
                "mode-updates/s", "(slowest, fastest)", "per CPU-second", "peak memory", "diffusivity (95% interval)");
        out.flush();
        List<Benchmark.Figure> figures = Benchmark.select(w, threadCount, integrators, modesOfSharing, f -> {
            out.printf(Locale.ROOT, "%-8s %-7s %7d %15.3g %19s %15.3g %9.0f MB %9.4f [%.4f, %.4f]%n", f.integrator(),
                    f.sharing(), f.threads(), f.modeUpdatesPerSecond(), String.format(Locale.ROOT, "(%.3g, %.3g)",
                    f.slowestModeUpdatesPerSecond(), f.fastestModeUpdatesPerSecond()), f.modeUpdatesPerCpuSecond(),
                    f.peakMemoryBytes() / 1e6, f.diffusivity(), f.low(), f.high());
            out.flush();
        });
        // the transport stage follows the same overrides, so a small run stays small
        int transportParticles = particles > 0 ? Math.max(512, particles) : quick ? 4096 : 16384;
        int transportSteps = steps > 0 ? Math.max(4, steps) : quick ? 200 : 1000;
        out.printf(Locale.ROOT, "transport stage: %d particles x %d steps, median of 3 after a warm-up%n",
                transportParticles, transportSteps);
        out.printf(Locale.ROOT, "%-8s %7s %20s %19s %22s %12s%n", "geometry", "threads", "particle-steps/s",
                "(slowest, fastest)", "per CPU-second", "peak memory");
        List<TransportBenchmark.Figure> transport = TransportBenchmark.measure(transportParticles, transportSteps,
                threadCount);
        for (TransportBenchmark.Figure t : transport) {
            out.printf(Locale.ROOT, "%-8s %7d %20.3g %19s %22.3g %9.0f MB%n", t.geometry(), t.threads(),
                    t.particleStepsPerSecond(), String.format(Locale.ROOT, "(%.3g, %.3g)", t.slowest(), t.fastest()),
                    t.particleStepsPerCpuSecond(), t.peakMemoryBytes() / 1e6);
        }
        out.flush();
        Saves saves = new Saves(out);
        saves.save("figures", json, () -> {
            ObjectMapper mapper = new ObjectMapper().enable(SerializationFeature.INDENT_OUTPUT);
            ObjectNode root = mapper.createObjectNode();
            ArrayNode results = root.putArray("results");
            for (Benchmark.Figure f : figures) {
                ObjectNode r = results.addObject();
                r.put("integrator", f.integrator());
                r.put("sharing", f.sharing());
                r.put("threads", f.threads());
                r.put("modeUpdatesPerSecond", f.modeUpdatesPerSecond());
                ObjectNode spread = r.putObject("modeUpdatesPerSecondRange");
                spread.put("low", f.slowestModeUpdatesPerSecond());
                spread.put("high", f.fastestModeUpdatesPerSecond());
                r.put("modeUpdatesPerCpuSecond", f.modeUpdatesPerCpuSecond());
                r.put("peakMemoryBytes", f.peakMemoryBytes());
                ObjectNode d = r.putObject("diffusivity");
                d.put("value", f.diffusivity());
                d.put("low", f.low());
                d.put("high", f.high());
            }
            for (TransportBenchmark.Figure t : transport) {
                ObjectNode r = results.addObject();
                r.put("stage", "transport");
                r.put("geometry", t.geometry());
                r.put("threads", t.threads());
                r.put("particleStepsPerSecond", t.particleStepsPerSecond());
                ObjectNode spread = r.putObject("particleStepsPerSecondRange");
                spread.put("low", t.slowest());
                spread.put("high", t.fastest());
                r.put("particleStepsPerCpuSecond", t.particleStepsPerCpuSecond());
                r.put("peakMemoryBytes", t.peakMemoryBytes());
            }
            AtomicFiles.writeString(json, mapper.writeValueAsString(root));
        });
        return saves.finish(spec.commandLine().getErr());
    }

    private int timePresets(PrintWriter out, int threadCount) throws Exception {
        List<Path> files = BenchmarkPresets.presetsIn(presets);
        out.printf(Locale.ROOT, "time to the result of 'run PRESET' from the start of a fresh process, %d presets, "
                + "%d threads each:%n", files.size(), threadCount);
        out.printf(Locale.ROOT, "%-28s %9s  %s%n", "preset", "seconds", "precision (95% half-width)");
        out.flush();
        List<BenchmarkPresets.PresetTime> times = BenchmarkPresets.time(files, threadCount, t -> {
            out.printf(Locale.ROOT, "%-28s %9.1f  %s%n", t.preset(), t.seconds(),
                    BenchmarkPresets.describePrecision(t));
            out.flush();
        });
        if (json != null) {
            ObjectMapper mapper = new ObjectMapper().enable(SerializationFeature.INDENT_OUTPUT);
            ObjectNode root = mapper.createObjectNode();
            root.put("threads", threadCount);
            ArrayNode table = root.putArray("timeToHeadline");
            for (BenchmarkPresets.PresetTime t : times) {
                ObjectNode row = table.addObject();
                row.put("preset", t.preset());
                row.put("seconds", t.seconds());
                if (Double.isNaN(t.precision())) {
                    row.putNull("precision");
                } else {
                    row.put("precision", t.precision());
                }
                row.put("precisionRequested", t.requested());
            }
            AtomicFiles.writeString(json, mapper.writeValueAsString(root));
            out.println("figures written to " + json);
        }
        return 0;
    }

    private static int checked(int value, String option) {
        if (value < 0 || (value > 0 && value < 2)) {
            throw new IllegalArgumentException(option + " must be a whole number of at least 2; got " + value);
        }
        return value;
    }

    private List<Integrator> integrators() {
        if (schemes == null) {
            return List.of(Integrator.values());
        }
        List<Integrator> list = new ArrayList<>();
        for (String name : schemes) {
            Integrator i = Integrator.fromKey(name.trim());
            if (i == null) {
                throw new IllegalArgumentException("--scheme must be euler, lie or strang; got \"" + name + "\"");
            }
            list.add(i);
        }
        return list;
    }

    private List<Boolean> sharingModes() {
        if (sharing == null) {
            return List.of(true, false);
        }
        List<Boolean> list = new ArrayList<>();
        for (String name : sharing) {
            switch (name.trim().toLowerCase(Locale.ROOT)) {
                case "shared" -> list.add(true);
                case "own" -> list.add(false);
                default -> throw new IllegalArgumentException("--sharing must be shared or own; got \"" + name
                        + "\"");
            }
        }
        return list;
    }
}
