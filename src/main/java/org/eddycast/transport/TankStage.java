package org.eddycast.transport;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.function.DoubleConsumer;
import org.eddycast.particles.Cancellation;

/**
 * The transport stage for a stirred tank: releases a dose at the feed point, follows it round the circulation
 * loops until it is blended, and reads off the blend times over the tank's cells and at virtual probes. The
 * model works in the tank's own units (its diameter and one impeller revolution: {@link Request}); the result
 * is in metres and seconds. The time step is a twentieth of a revolution, smaller where the impeller zone's
 * diffusivity would carry a particle more than a twentieth of the impeller diameter in one step; the run lasts
 * twenty loop circulation times, or longer where diffusion across the tank is slower.
 */
public final class TankStage {

    /** Equal-volume cells: rings, sectors, layers. */
    static final int RINGS = 4;
    static final int SECTORS = 8;
    static final int LAYERS = 6;
    /** Record times per run. */
    static final int RECORDS = 240;
    /** The most time steps a run takes. */
    static final long MAX_STEPS = 60_000;
    /** The most particle-steps a run takes (about half a minute on two cores). */
    static final double MAX_WORK = 5e8;

    private TankStage() {
    }

    /**
     * What to run.
     *
     * @param model        the tank
     * @param feed         the feed point (x, y from the axis, z from the bottom; m)
     * @param probes       names and points of the virtual probes
     * @param probeRadius  the probes' radius
     * @param impellerDiameter D
     * @param minDuration  simulate at least this long
     * @param particles    particles to follow
     * @param seed         the seed
     * @param lengthScale  metres per unit of the model's lengths (the tank diameter)
     * @param timeScale    seconds per unit of the model's times (one impeller revolution)
     */
    public record Request(TankTransport model, double[] feed, List<String> probeNames, List<double[]> probes,
                          double probeRadius, double impellerDiameter, double minDuration, int particles, long seed,
                          double lengthScale, double timeScale) {
    }

    /** Runs the stage; the circulation time, G and the discharge are filled in by the caller's rules. */
    public static TankStageResult run(Request q, double discharge, double velocityGradient, int threads,
                                      DoubleConsumer progress, Cancellation cancel) {
        long start = System.nanoTime();
        TankTransport model = q.model();
        double volume = Math.PI * model.radius() * model.radius() * model.height();
        double loopTime = volume / model.loopFlow();
        double mixingTime = model.radius() * model.radius() / model.meanDiffusivity();
        double duration = Math.max(Math.max(20 * loopTime, 0.1 * mixingTime), q.minDuration());
        double dt = 0.05;
        double kMax = model.maxDiffusivity();
        dt = Math.min(dt, Math.pow(0.05 * q.impellerDiameter(), 2) / (2 * kMax));
        List<String> warnings = new ArrayList<>();
        long maxSteps = TransportSettings.stageStepLimit(q.particles(), MAX_STEPS, MAX_WORK);
        if (duration / dt > maxSteps) {
            warnings.add(String.format(Locale.ROOT, "the tank mixes slowly: the run stops at %d steps (%.3g"
                    + " revolutions); blend times beyond it are extrapolated or not determined", maxSteps,
                    maxSteps * dt));
            duration = maxSteps * dt;
        }
        TransportSettings settings = TransportSettings.stage(q.particles(), duration, dt, RECORDS, 30, q.seed());
        dt = settings.timeStep();
        long steps = settings.steps();
        int blocks = settings.blocks();
        double[] times = settings.recordTimes();
        CellCounts cells = new CellCounts(new TankCells(model.radius(), model.height(), RINGS, SECTORS, LAYERS),
                blocks, settings.records());
        List<TransportRecorder> recorders = new ArrayList<>();
        recorders.add(cells);
        CloudMoments moments = new CloudMoments(0, times, blocks);
        recorders.add(moments);
        List<CellCounts> probeCounts = new ArrayList<>();
        for (double[] p : q.probes()) {
            double share = model.sphereShare(p, q.probeRadius());
            CellCounts c = new CellCounts(new ProbeCell(p[0], p[1], p[2], q.probeRadius(), share), blocks,
                    settings.records());
            probeCounts.add(c);
            recorders.add(c);
        }
        double[] feed = q.feed().clone();
        ReleaseSampler release = (rng, x, y, z, count) -> {
            for (int i = 0; i < count; i++) {
                x[i] = feed[0];
                y[i] = feed[1];
                z[i] = feed[2];
            }
        };
        TransportRunner.run(model, release, settings, recorders, threads, progress, cancel);
        List<Estimate> blend = new ArrayList<>();
        for (double level : TankStageResult.LEVELS) {
            blend.add(MixingTimeEstimator.time(cells, times, level));
        }
        List<TankStageResult.Probe> probes = new ArrayList<>();
        for (int i = 0; i < probeCounts.size(); i++) {
            CellCounts c = probeCounts.get(i);
            double share = c.map().share(0);
            double[][] reading = probeReading(c, share);
            List<Estimate> levels = new ArrayList<>();
            double noise = 1 / Math.sqrt(settings.particles() * share);
            for (double level : TankStageResult.LEVELS) {
                Estimate e = MixingTimeEstimator.time(c, times, level);
                // a probe's own reading decides only while it stands clear of its counting noise
                if (e.determined() && !e.note().isEmpty()) {
                    e = Estimate.undetermined(String.format(Locale.ROOT, "the probe holds about %.0f particles, so"
                            + " its reading carries +-%.0f%% of counting noise and cannot be read to %.0f%%; the"
                            + " whole-tank blend time stands for it", settings.particles() * share, 100 * noise,
                            100 * (1 - level)));
                }
                levels.add(e);
            }
            probes.add(new TankStageResult.Probe(q.probeNames().get(i), q.probes().get(i), q.probeRadius(),
                    reading[0], reading[1], reading[2], levels));
        }
        for (int i = 0; i < TankStageResult.LEVELS.length; i++) {
            Estimate e = blend.get(i);
            if (!e.determined()) {
                warnings.add(String.format(Locale.ROOT, "the %.0f%% blend time was not determined: %s",
                        100 * TankStageResult.LEVELS[i], e.note()));
            } else if (e.note().startsWith("extrapolated")) {
                warnings.add(String.format(Locale.ROOT, "the %.0f%% blend time is extrapolated beyond the simulated"
                        + " %.4g s from the late exponential decay", 100 * TankStageResult.LEVELS[i],
                        duration * q.timeScale()));
            }
        }
        double ls = q.lengthScale();
        double ts = q.timeScale();
        List<String> notes = new ArrayList<>();
        notes.add(String.format(Locale.ROOT, "transport stage: %d particles in %d blocks, %d steps of %.3g s over"
                        + " %.4g s; loop circulation time %.3g s; cells: %d rings x %d sectors x %d layers of"
                        + " equal volume", settings.particles(), blocks, steps, dt * ts, duration * ts,
                loopTime * ts, RINGS, SECTORS, LAYERS));
        double elapsed = (System.nanoTime() - start) / 1e9;
        double[][] variance = new double[3][times.length];
        double[] seconds = new double[times.length];
        for (int j = 0; j < times.length; j++) {
            seconds[j] = times[j] * ts;
            for (int a = 0; a < 3; a++) {
                variance[a][j] = moments.pooledVariance(j, a) * ls * ls;
            }
        }
        return new TankStageResult(seconds, MixingTimeEstimator.coefficientOfVariation(cells), variance,
                MixingTimeEstimator.peakFactor(cells, times), scaled(blend, ts), scaledProbes(probes, ls, ts),
                model.loopFlow() * ls * ls * ls / ts, discharge, volume * ls * ls * ls / discharge,
                model.meanDiffusivity() * ls * ls / ts, velocityGradient, settings.particles(), blocks, steps,
                dt * ts, elapsed, warnings, notes);
    }

    private static List<Estimate> scaled(List<Estimate> list, double factor) {
        List<Estimate> out = new ArrayList<>();
        for (Estimate e : list) {
            out.add(e.times(factor));
        }
        return out;
    }

    private static List<TankStageResult.Probe> scaledProbes(List<TankStageResult.Probe> probes, double ls,
                                                           double ts) {
        List<TankStageResult.Probe> out = new ArrayList<>();
        for (TankStageResult.Probe p : probes) {
            double[] at = p.position();
            for (int i = 0; i < 3; i++) {
                at[i] *= ls;
            }
            out.add(new TankStageResult.Probe(p.name(), at, p.radius() * ls, p.concentration(), p.low(), p.high(),
                    scaled(p.blendTimes(), ts)));
        }
        return out;
    }

    /** The probe's reading over the final value, with a 95% band over blocks, at each record. */
    private static double[][] probeReading(CellCounts c, double share) {
        int records = c.records();
        int blocks = c.blocks();
        double t = BlockStatistics.t975(blocks - 1);
        double[][] out = new double[3][records];
        for (int j = 0; j < records; j++) {
            double[] perBlock = new double[blocks];
            for (int b = 0; b < blocks; b++) {
                double total = c.count(b, j, 0) + c.count(b, j, 1);
                perBlock[b] = c.count(b, j, 0) / (total * share);
            }
            Estimate e = BlockStatistics.mean(perBlock, "");
            out[0][j] = e.value();
            out[1][j] = Math.max(0, e.low());
            out[2][j] = e.high();
        }
        return out;
    }
}
