package org.eddycast.engine;

import java.util.ArrayList;
import java.util.List;
import org.eddycast.forecast.ChannelProfiles;
import org.eddycast.particles.Cancellation;
import org.eddycast.scenario.ChannelSection;
import org.eddycast.scenario.ImpellerType;
import org.eddycast.scenario.TankDesign;
import org.eddycast.transport.ChannelTransport;
import org.eddycast.transport.DesignSectionFlow;
import org.eddycast.transport.ReleaseSampler;
import org.eddycast.transport.TankTransport;
import org.eddycast.transport.TransportModel;
import org.eddycast.transport.TransportRunner;
import org.eddycast.transport.TransportSettings;

/**
 * Throughput of the transport stage: particle-steps per second of a trapezoidal channel section (tabulated
 * fields, 129 verticals) and of a stirred tank (analytic fields), on the given threads, median of three runs
 * after a warm-up. A particle-step is one random-displacement step of one particle, with its three evaluations
 * of the flow and its reflections.
 */
public final class TransportBenchmark {

    /**
     * One measurement.
     *
     * @param geometry                "channel" or "tank"
     * @param threads                 worker threads
     * @param particleStepsPerSecond  median over the runs
     * @param slowest                 slowest run
     * @param fastest                 fastest run
     * @param particleStepsPerCpuSecond over the process's CPU time
     * @param peakMemoryBytes         the process's peak heap use
     */
    public record Figure(String geometry, int threads, double particleStepsPerSecond, double slowest, double fastest,
                         double particleStepsPerCpuSecond, long peakMemoryBytes) {
    }

    private TransportBenchmark() {
    }

    static TransportModel channel() {
        ChannelSection section = new ChannelSection.Trapezoidal(6, 1.2, 1.5);
        return new ChannelTransport(new DesignSectionFlow(section, 0.45, 0.041, new ChannelProfiles(0.5, 0.41),
                4e-10), 0.45);
    }

    static TransportModel tank() {
        return TankStudy.model(new TankDesign(2, 2, 0.67, 1.5, null, ImpellerType.PITCHED_BLADE_TURBINE, null, true),
                0.41, 5e-10);
    }

    /** Measures both geometries with the given particles and steps. */
    public static List<Figure> measure(int particles, int steps, int threads) {
        List<Figure> out = new ArrayList<>();
        out.add(measure("channel", channel(), new double[] {0, 3, -0.1}, 0.3, particles, steps, threads));
        out.add(measure("tank", tank(), new double[] {0.1, 0, 0.9}, 0.05, particles, steps, threads));
        return out;
    }

    private static Figure measure(String name, TransportModel model, double[] start, double dt, int particles,
                                  int steps, int threads) {
        int blocks = Math.max(2, particles / 256);
        TransportSettings s = new TransportSettings(blocks, 256, dt, steps, steps, 1);
        ReleaseSampler release = (rng, x, y, z, n) -> {
            for (int i = 0; i < n; i++) {
                x[i] = start[0];
                y[i] = start[1];
                z[i] = start[2];
            }
        };
        TransportSettings warm = new TransportSettings(blocks, 256, dt, Math.max(1, steps / 4), Math.max(1,
                steps / 4), 1);
        TransportRunner.run(model, release, warm, List.of(), threads, f -> { }, new Cancellation());
        double[] rates = new double[3];
        long cpu0 = Benchmark.processCpuNanos();
        double work = (double) s.particles() * steps;
        for (int r = 0; r < rates.length; r++) {
            long t0 = System.nanoTime();
            TransportRunner.run(model, release, s, List.of(), threads, f -> { }, new Cancellation());
            rates[r] = work / ((System.nanoTime() - t0) / 1e9);
        }
        double cpu = (Benchmark.processCpuNanos() - cpu0) / 1e9;
        double[] sorted = rates.clone();
        java.util.Arrays.sort(sorted);
        return new Figure(name, threads, sorted[1], sorted[0], sorted[2], 3 * work / cpu,
                Benchmark.peakMemoryBytes());
    }
}
