package org.eddycast.cli;

import java.io.PrintWriter;
import java.lang.management.ManagementFactory;
import java.lang.management.MemoryPoolMXBean;
import java.lang.management.MemoryType;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.Callable;
import org.eddycast.engine.Benchmark;
import org.eddycast.engine.DiffusivityStudy;
import org.eddycast.engine.DimensionlessCase;
import org.eddycast.engine.Engine;
import org.eddycast.engine.SimulationCache;
import org.eddycast.field.ModeLanes;
import org.eddycast.particles.Cancellation;
import org.eddycast.particles.EnsembleRunner;
import org.eddycast.particles.Integrator;
import org.eddycast.particles.RunListener;
import org.eddycast.scenario.ScenarioReader;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/**
 * {@code memory}: shows that a run's memory does not grow with its particles or steps. For each scenario given,
 * and for one large run of the standard field (a million particles by default), it prints the stated bound on
 * the run's own arrays, the peak Java heap in use during the run and the process's peak resident memory.
 *
 * <p>The bound: the streamed moments hold axes * R * (R + 1) doubles (R records, at most about 136 whatever the
 * number of steps); each worker holds one block's state (about 23 arrays of M doubles for the field's modes, 12
 * arrays of G doubles for a group of particles, one curve of axes * R doubles, and with one realization per
 * particle the block's lanes, 15 doubles per mode and particle); the two batches in flight keep
 * 16 curves each. None of it depends on the number of particles or steps. Run with a small heap
 * (java -Xmx64m) to see a run finish inside it.
 */
@Command(name = "memory", mixinStandardHelpOptions = true,
        description = "Print the memory bound and the measured peak memory of runs: each SCENARIO given, then a "
                + "large run of the standard field.")
final class MemoryCommand implements Callable<Integer> {

    @Parameters(paramLabel = "SCENARIO", arity = "0..*", description = "Scenario files to run and measure.")
    List<Path> scenarios = List.of();

    @Option(names = "--particles", paramLabel = "N", defaultValue = "1000000",
            description = "Particles of the large run (default ${DEFAULT-VALUE}; 0 skips it).")
    int particles;

    @Option(names = "--steps", paramLabel = "S", defaultValue = "100",
            description = "Steps of the large run (default ${DEFAULT-VALUE}).")
    int steps;

    @Option(names = "--modes", paramLabel = "M", defaultValue = "16",
            description = "Fourier modes of the large run (default ${DEFAULT-VALUE}).")
    int modes;

    @Mixin
    ThreadsOption threads;

    @Spec
    picocli.CommandLine.Model.CommandSpec spec;

    @Override
    public Integer call() throws Exception {
        PrintWriter out = spec.commandLine().getOut();
        if (particles < 0 || steps < 2 || modes < 1) {
            throw new IllegalArgumentException("--particles must be 0 or more, --steps at least 2 and --modes at "
                    + "least 1; got " + particles + ", " + steps + ", " + modes);
        }
        int workers = threads.resolve();
        out.printf(Locale.ROOT, "largest Java heap allowed: %.0f MB; %d worker threads%n",
                Runtime.getRuntime().maxMemory() / 1e6, workers);
        out.printf(Locale.ROOT, "%-36s %12s %8s %6s %14s %14s %16s%n", "run", "particles", "steps", "modes",
                "bound (kB)", "peak heap (MB)", "peak process (MB)");
        for (Path file : scenarios) {
            DimensionlessCase c = Engine.dimensionlessCase(ScenarioReader.read(file));
            SimulationCache.shared().clear();
            measure(out, file.getFileName().toString(), c, workers,
                    () -> Engine.run(ScenarioReader.read(file), workers, RunListener.NONE, new Cancellation()));
        }
        if (particles > 0) {
            DimensionlessCase c = Benchmark.workload(new Benchmark.Workload(particles, steps, modes, 1),
                    Integrator.STRANG, 64, 1);
            measure(out, "standard field, large run", c, workers,
                    () -> DiffusivityStudy.run(c, workers, RunListener.NONE, new Cancellation()));
        }
        out.flush();
        return 0;
    }

    /** A run to measure. */
    private interface Run {
        void run() throws Exception;
    }

    private static void measure(PrintWriter out, String name, DimensionlessCase c, int workers, Run run)
            throws Exception {
        System.gc();
        resetHeapPeaks();
        run.run();
        out.printf(Locale.ROOT, "%-36s %12d %8d %6d %14.1f %14.1f %16.1f%n", name, c.particles(), c.steps(),
                c.model().modeCount(), boundBytes(c, workers) / 1e3, peakHeapBytes() / 1e6,
                Benchmark.peakMemoryBytes() / 1e6);
        out.flush();
    }

    /** The stated bound on a run's own arrays (bytes); see the class comment. */
    static long boundBytes(DimensionlessCase c, int workers) {
        long axes = c.model().dimensions();
        long records = 136;
        long curve = axes * records;
        long moments = axes * records * (records + 1);
        int block = EnsembleRunner.blockSizeFor(c.groupSize());
        // one realization per particle: the block's lanes (15 doubles per mode and particle) and its variates
        long lanes = c.groupSize() == 1 ? ModeLanes.doublesFor(c.model().modeCount(), block) + 4L * block : 0;
        long perWorker = 23L * c.model().modeCount() + 12L * Math.max(c.groupSize(), 64) + lanes + curve;
        long batches = 2 * 16 * curve;
        // the moments, one snapshot handed to the listener, the curves of the two batches in flight and every
        // worker's block
        return 8 * (2 * moments + batches + workers * perWorker);
    }

    private static void resetHeapPeaks() {
        for (MemoryPoolMXBean pool : ManagementFactory.getMemoryPoolMXBeans()) {
            if (pool.getType() == MemoryType.HEAP) {
                pool.resetPeakUsage();
            }
        }
    }

    /** Sum over the heap pools of each pool's peak: an upper bound on the heap in use at any one time. */
    private static long peakHeapBytes() {
        long sum = 0;
        for (MemoryPoolMXBean pool : ManagementFactory.getMemoryPoolMXBeans()) {
            if (pool.getType() == MemoryType.HEAP) {
                sum += pool.getPeakUsage().getUsed();
            }
        }
        return sum;
    }
}
