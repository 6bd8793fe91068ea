package org.eddycast.cli;

import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.Callable;
import org.eddycast.engine.Benchmark;
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

    @Option(names = "--quick", description = "A reduced workload (8,192 particles, 400 steps).")
    boolean quick;

    @Option(names = "--json", paramLabel = "FILE", description = "Write the figures as JSON.")
    Path json;

    @Mixin
    ThreadsOption threads;

    @Spec
    picocli.CommandLine.Model.CommandSpec spec;

    @Override
    public Integer call() throws Exception {
        PrintWriter out = spec.commandLine().getOut();
        Benchmark.Workload w = quick ? Benchmark.Workload.quick() : Benchmark.Workload.standard();
        out.printf(Locale.ROOT, "workload: %d particles, %d modes, %d steps (%.3g mode-updates per run), "
                        + "median of %d after a warm-up%n", w.particles(), w.modes(), w.steps(),
                (double) w.particles() * w.modes() * w.steps(), w.repetitions());
        out.printf(Locale.ROOT, "%-8s %-7s %7s %18s %12s %28s%n", "scheme", "sharing", "threads",
                "mode-updates/s", "peak memory", "diffusivity (95% interval)");
        List<Benchmark.Figure> figures = Benchmark.all(w, threads.resolve(), f -> {
            out.printf(Locale.ROOT, "%-8s %-7s %7d %18.3g %9.0f MB %9.4f [%.4f, %.4f]%n", f.integrator(), f.sharing(),
                    f.threads(), f.modeUpdatesPerSecond(), f.peakMemoryBytes() / 1e6, f.diffusivity(), f.low(),
                    f.high());
            out.flush();
        });
        if (json != null) {
            ObjectMapper mapper = new ObjectMapper().enable(SerializationFeature.INDENT_OUTPUT);
            ObjectNode root = mapper.createObjectNode();
            ArrayNode results = root.putArray("results");
            for (Benchmark.Figure f : figures) {
                ObjectNode r = results.addObject();
                r.put("integrator", f.integrator());
                r.put("sharing", f.sharing());
                r.put("threads", f.threads());
                r.put("modeUpdatesPerSecond", f.modeUpdatesPerSecond());
                r.put("peakMemoryBytes", f.peakMemoryBytes());
                ObjectNode d = r.putObject("diffusivity");
                d.put("value", f.diffusivity());
                d.put("low", f.low());
                d.put("high", f.high());
            }
            AtomicFiles.writeString(json, mapper.writeValueAsString(root));
            out.println("figures written to " + json);
        }
        return 0;
    }
}
