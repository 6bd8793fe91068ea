package org.eddycast.engine;

import java.io.IOException;
import java.lang.management.ManagementFactory;
import java.lang.management.MemoryPoolMXBean;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import org.eddycast.field.PowerLawBand;
import org.eddycast.field.RandomFourierModel;
import org.eddycast.field.SpectrumTable;
import org.eddycast.particles.Cancellation;
import org.eddycast.particles.Integrator;
import org.eddycast.particles.RunListener;
import org.eddycast.stats.AxisEstimate;

/**
 * The standard benchmark workload: 3D, 64 modes, power-law band spectrum with slope -5/3 and |k| in [1, 16],
 * u' = 1, tau = 1, D0 = 0.01, dt = 0.02, 65,536 particles, 2,000 steps, 64 particles per realization (or one
 * realization per particle). Work = particles x modes x steps mode-updates. Throughput is the median over
 * repetitions after one warm-up run; the answer (diffusivity averaged over the axes) is printed beside it.
 */
public final class Benchmark {

    /**
     * One measured configuration. Throughput is by the wall clock, the median repetition's, with the slowest and
     * the fastest repetition's beside it so that the spread is seen; the same work per CPU-second of the whole
     * process (workers, compiler and collector) is given too, because on a machine shared with other work the
     * wall clock also counts time the workers spent waiting for a core.
     */
    public record Figure(String integrator, String sharing, int threads, double modeUpdatesPerSecond,
                         double slowestModeUpdatesPerSecond, double fastestModeUpdatesPerSecond,
                         double modeUpdatesPerCpuSecond, long peakMemoryBytes, double diffusivity, double low,
                         double high, double medianSeconds) {
    }

    /** Time to a converged answer, counted from the start of the process (JIT warm-up included). */
    public record Answer(String integrator, int threads, double secondsFromStart, double runSeconds,
                         long particles, double worstRelativeHalfWidth, double diffusivity, double low, double high) {
    }

    /** Workload size. */
    public record Workload(int particles, int steps, int modes, int repetitions) {
        /** This workload with another size; any non-positive argument keeps the current value. */
        public Workload with(int newParticles, int newSteps, int newModes) {
            return new Workload(newParticles > 0 ? newParticles : particles, newSteps > 0 ? newSteps : steps,
                    newModes > 0 ? newModes : modes, repetitions);
        }

        /** The standard workload of the design notes. */
        public static Workload standard() {
            return new Workload(65_536, 2_000, 64, 3);
        }

        /** A reduced workload that runs in seconds. */
        public static Workload quick() {
            return new Workload(4_096, 400, 64, 3);
        }
    }

    private Benchmark() {
    }

    /** The dimensionless case of the workload with the given integrator and group size. */
    public static DimensionlessCase workload(Workload w, Integrator integrator, int groupSize, long seed) {
        SpectrumTable table = new SpectrumTable(new PowerLawBand(-5.0 / 3.0, 16), 3, w.modes());
        // The table works in units of the integral length; the workload states |k| in [1, 16] and u' = 1, so its
        // length unit is the shape's integral length and tau = 1 is tau = 1 / L11 in table units.
        double l11 = table.shapeIntegralLength();
        Scales scales = new Scales(l11, 1.0);
        double tau = 1.0 / scales.time();
        RandomFourierModel model = new RandomFourierModel(table, tau, "power law k^-5/3, |k| in [1, 16]");
        double d0 = 0.01 / scales.diffusivity();
        return new DimensionlessCase(model, integrator, new double[] {d0, d0, d0}, 0.02 / scales.time(), w.steps(),
                groupSize, w.particles(), w.particles(), Double.NaN, seed, scales, tau, 1 / d0, List.of(),
                "benchmark");
    }

    /**
     * Measures one configuration: a warm-up run on an eighth of the particles, then the median over the
     * workload's repetitions.
     */
    public static Figure measure(Workload w, Integrator integrator, boolean shared, int threads) {
        int group = shared ? 64 : 1;
        DimensionlessCase c = workload(w, integrator, group, 1);
        DimensionlessCase warmUp = workload(w.with(Math.max(128, w.particles() / 8), 0, 0), integrator, group, 2);
        DiffusivityStudy.run(warmUp, threads, RunListener.NONE, new Cancellation());
        double[] seconds = new double[w.repetitions()];
        double[] cpuSeconds = new double[w.repetitions()];
        DiffusivityResult last = null;
        for (int i = 0; i < seconds.length; i++) {
            long cpuStart = processCpuNanos();
            last = DiffusivityStudy.run(c, threads, RunListener.NONE, new Cancellation());
            seconds[i] = last.elapsedSeconds();
            cpuSeconds[i] = (processCpuNanos() - cpuStart) / 1e9;
        }
        Arrays.sort(seconds);
        Arrays.sort(cpuSeconds);
        double median = seconds[seconds.length / 2];
        double medianCpu = cpuSeconds[cpuSeconds.length / 2];
        double work = (double) last.particles() * w.modes() * w.steps();
        double value = 0;
        double low = 0;
        double high = 0;
        for (AxisEstimate a : last.axes()) {
            value += a.diffusivity().value() / 3;
            low += a.diffusivity().low() / 3;
            high += a.diffusivity().high() / 3;
        }
        return new Figure(integrator.key(), shared ? "shared" : "own", threads, work / median,
                work / seconds[seconds.length - 1], work / seconds[0], medianCpu > 0 ? work / medianCpu : Double.NaN,
                peakMemoryBytes(), value, low, high, median);
    }

    /** CPU time of the whole process so far, in nanoseconds (-1 where the platform does not say). */
    public static long processCpuNanos() {
        java.lang.management.OperatingSystemMXBean os = ManagementFactory.getOperatingSystemMXBean();
        if (os instanceof com.sun.management.OperatingSystemMXBean sun) {
            return sun.getProcessCpuTime();
        }
        return -1;
    }

    /** Peak resident memory of this process (Linux VmHWM), or the sum of the JVM pools' peaks elsewhere. */
    public static long peakMemoryBytes() {
        try {
            for (String line : Files.readAllLines(Path.of("/proc/self/status"))) {
                if (line.startsWith("VmHWM:")) {
                    String[] parts = line.trim().split("\\s+");
                    return Long.parseLong(parts[1]) * 1024L;
                }
            }
        } catch (IOException | RuntimeException e) {
            // fall through to the JVM's own figures
        }
        long sum = 0;
        for (MemoryPoolMXBean pool : ManagementFactory.getMemoryPoolMXBeans()) {
            sum += pool.getPeakUsage().getUsed();
        }
        return sum;
    }

    /**
     * The standard workload (Strang splitting, shared realizations) run until every axis' 95% interval is
     * within +-target of its value, adding particles in the study's fixed batches. The clock is the process's
     * uptime, so class loading and JIT compilation count: call this first in a fresh process.
     */
    public static Answer timeToAnswer(int threads, double target) {
        Workload w = Workload.standard();
        DimensionlessCase base = workload(w, Integrator.STRANG, 64, 1);
        DimensionlessCase c = new DimensionlessCase(base.model(), base.integrator(), base.d0(), base.timeStep(),
                base.steps(), base.groupSize(), base.particles(), 1 << 23, target, base.seed(), base.scales(),
                base.kubo(), base.peclet(), List.of(), "benchmark answer");
        DiffusivityResult r = DiffusivityStudy.run(c, threads, RunListener.NONE, new Cancellation());
        double fromStart = ManagementFactory.getRuntimeMXBean().getUptime() / 1e3;
        double value = 0;
        double low = 0;
        double high = 0;
        double worst = 0;
        for (AxisEstimate a : r.axes()) {
            value += a.diffusivity().value() / 3;
            low += a.diffusivity().low() / 3;
            high += a.diffusivity().high() / 3;
            worst = Math.max(worst, a.diffusivity().relativeHalfWidth());
        }
        return new Answer(c.integrator().key(), threads, fromStart, r.elapsedSeconds(), r.particles(), worst, value,
                low, high);
    }

    /** Every integrator, shared and own realizations. */
    public static List<Figure> all(Workload w, int threads, java.util.function.Consumer<Figure> each) {
        return select(w, threads, List.of(Integrator.values()), List.of(true, false), each);
    }

    /** The given integrators and sharing modes (true for shared realizations), in that order. */
    public static List<Figure> select(Workload w, int threads, List<Integrator> integrators, List<Boolean> sharing,
                                      java.util.function.Consumer<Figure> each) {
        List<Figure> figures = new ArrayList<>();
        for (boolean shared : sharing) {
            for (Integrator i : integrators) {
                Figure f = measure(w, i, shared, threads);
                each.accept(f);
                figures.add(f);
            }
        }
        return figures;
    }
}
