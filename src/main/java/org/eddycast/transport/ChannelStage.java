package org.eddycast.transport;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.function.DoubleConsumer;
import org.eddycast.forecast.ChannelProfiles;
import org.eddycast.particles.Cancellation;
import org.eddycast.scenario.ChannelSection;

/**
 * The transport stage for a channel: sizes the run from the section's own mixing times, releases a slug at
 * the surface (on the centre-line or at the left water's edge), follows it until it is mixed over the section
 * and its along-flow variance grows linearly, and reads off the longitudinal dispersion coefficient, the
 * section-mean diffusivities, the times to mixed over the depth and across the width, the skewness and the
 * cloud's widths.
 */
public final class ChannelStage {

    /** Strips across and layers over the depth of the cells that judge mixing. */
    static final int STRIPS = 16;
    static final int LAYERS = 8;
    /** Uniform record times per run, and geometric ones before the first of them. */
    static final int RECORDS = 240;
    static final int EARLY_RECORDS = 40;
    /** Time steps per vertical mixing time h^2 / K_z. */
    static final double STEPS_PER_DEPTH_TIME = 1000;
    /** The most time steps a run takes; a section that mixes more slowly is followed that far and said so. */
    static final long MAX_STEPS = 60_000;
    /** The most particle-steps a run takes (about half a minute on two cores). */
    static final double MAX_WORK = 5e8;

    private ChannelStage() {
    }

    /**
     * What to run.
     *
     * @param section       the cross-section
     * @param meanVelocity  U (m/s)
     * @param shearVelocity the section's u* (m/s)
     * @param profiles      the rules over the depth with the field's factor F
     * @param fieldFactorRelativeHalfWidth half-width of F's 95% interval over F
     * @param molecular     molecular diffusivity (m^2/s)
     * @param atBank        release at the left water's edge instead of the centre-line
     * @param minDuration   simulate at least this long (s), for example to reach the stations asked about
     * @param particles     particles to follow (rounded up to 32 blocks of a multiple of 16)
     * @param seed          the seed
     * @param stations      distances downstream (m) where the concentration against time is read; may be empty
     * @param across        each station's position across (m), NaN for the cross-section mean
     */
    public record Request(ChannelSection section, double meanVelocity, double shearVelocity,
                          ChannelProfiles profiles, double fieldFactorRelativeHalfWidth, double molecular,
                          boolean atBank, double minDuration, int particles, long seed, double[] stations,
                          double[] across) {

        public Request {
            stations = stations.clone();
            across = across.clone();
            if (stations.length != across.length) {
                throw new IllegalArgumentException("one position across per station; got " + stations.length
                        + " stations and " + across.length + " positions");
            }
        }

        /** A request with no stations. */
        public Request(ChannelSection section, double meanVelocity, double shearVelocity, ChannelProfiles profiles,
                       double fieldFactorRelativeHalfWidth, double molecular, boolean atBank, double minDuration,
                       int particles, long seed) {
            this(section, meanVelocity, shearVelocity, profiles, fieldFactorRelativeHalfWidth, molecular, atBank,
                    minDuration, particles, seed, new double[0], new double[0]);
        }

        @Override
        public double[] stations() {
            return stations.clone();
        }

        @Override
        public double[] across() {
            return across.clone();
        }
    }

    /** Fine bins kept each side of a station (see {@link StationCounts}). */
    static final int STATION_HALF_BINS = 40;

    /** The stage's model for a request. */
    public static ChannelTransport model(Request q) {
        return new ChannelTransport(new DesignSectionFlow(q.section(), q.meanVelocity(), q.shearVelocity(),
                q.profiles(), q.molecular()), q.meanVelocity());
    }

    /** Runs the stage. */
    /** Records read over each station's passage window, in all (at least {@link #MIN_PASSAGE_RECORDS} each). */
    static final int PASSAGE_RECORDS = 144;
    static final int MIN_PASSAGE_RECORDS = 24;

    /**
     * Record times over each station's passage: evenly from half to twice its travel time x / U. The uniform
     * records alone can be a cloud's standard deviation in time apart at a near station (the lowland preset's
     * 200 m station saw six records in its passage), and a peak read at the records then falls up to an eighth
     * below the curve's (exp(-1/8) at half a standard deviation off); at 144 records over the window, the first
     * station's records are a tenth of that apart. The window holds the passage of any cloud whose along-flow
     * spread at the station is below a third of the distance travelled.
     */
    static double[] passageRecordTimes(double[] stations, double meanVelocity, double duration) {
        if (stations.length == 0) {
            return new double[0];
        }
        int each = Math.max(MIN_PASSAGE_RECORDS, PASSAGE_RECORDS / stations.length);
        double spacing = passageSpacing(stations, meanVelocity);
        java.util.TreeSet<Double> times = new java.util.TreeSet<>();
        for (double x : stations) {
            double travel = x / meanVelocity;
            int n = (int) Math.min(each, Math.ceil(1.5 * travel / spacing));
            double step = 1.5 * travel / n;
            for (int i = 0; i <= n; i++) {
                double t = 0.5 * travel + i * step;
                if (t <= duration) {
                    times.add(t);
                }
            }
        }
        double[] out = new double[times.size()];
        int i = 0;
        for (double t : times) {
            out[i++] = t;
        }
        return out;
    }

    /**
     * The nearest station's record spacing over its passage window (infinite without stations): one spacing for
     * every station, so that the fine bin along the flow follows it.
     */
    static double passageSpacing(double[] stations, double meanVelocity) {
        if (stations.length == 0) {
            return Double.POSITIVE_INFINITY;
        }
        double nearest = Double.POSITIVE_INFINITY;
        for (double x : stations) {
            nearest = Math.min(nearest, x);
        }
        int each = Math.max(MIN_PASSAGE_RECORDS, PASSAGE_RECORDS / stations.length);
        return 1.5 * nearest / meanVelocity / each;
    }

    public static ChannelStageResult run(Request q, int threads, DoubleConsumer progress, Cancellation cancel) {
        long start = System.nanoTime();
        ChannelTransport model = model(q);
        double ky = model.sectionMeanDiffusivity(1);
        double kz = model.sectionMeanDiffusivity(2);
        double h = q.section().maxDepth();
        double w = q.section().width();
        double depthTime = h * h / kz;
        double widthTime = w * w / ky;
        double duration = Math.max(Math.max(widthTime, 3 * depthTime), q.minDuration());
        double dt = depthTime / STEPS_PER_DEPTH_TIME;
        List<String> warnings = new ArrayList<>();
        long maxSteps = TransportSettings.stageStepLimit(q.particles(), MAX_STEPS, MAX_WORK);
        if (duration / dt > maxSteps) {
            warnings.add(String.format(Locale.ROOT, "the section mixes slowly: mixing across the width takes about"
                    + " %.3g s (W^2/K_y), but the run stops at %.3g s (%d steps); the distance to mixed across the"
                    + " width, where given, is extrapolated, and the longitudinal dispersion coefficient is that of a"
                    + " cloud not yet mixed across", widthTime, maxSteps * dt, maxSteps));
            duration = maxSteps * dt;
        }
        double[] passage = passageRecordTimes(q.stations(), q.meanVelocity(), duration);
        TransportSettings settings = TransportSettings.stage(q.particles(), duration, dt, RECORDS, EARLY_RECORDS,
                q.seed(), passage);
        dt = settings.timeStep();
        long steps = settings.steps();
        int blocks = settings.blocks();
        double[] times = settings.recordTimes();
        CloudMoments moments = new CloudMoments(q.meanVelocity(), times, blocks);
        SectionCells cells = new SectionCells(model, STRIPS, LAYERS);
        CellCounts counts = new CellCounts(cells, blocks, settings.records());
        double[] stations = q.stations();
        double[] stationAcross = q.across();
        int[] strip = new int[stations.length];
        double[] stripShare = new double[stations.length];
        CellMap strips = cells.acrossWidth();
        for (int k = 0; k < strip.length; k++) {
            strip[k] = Double.isNaN(stationAcross[k]) ? -1 : strips.cellOf(0, Math.min(stationAcross[k], w), 0);
            stripShare[k] = strip[k] < 0 ? 1 : strips.share(strip[k]);
        }
        // the fine bin is the distance the mean flow covers between a passage's records (between the uniform
        // records where there is no station), so that the bin can follow a cloud narrower than the uniform step
        double fineBin = q.meanVelocity() * Math.min(passageSpacing(q.stations(), q.meanVelocity()),
                duration / RECORDS);
        StationCounts atStations = new StationCounts(stations, strip, w, STRIPS, fineBin, STATION_HALF_BINS, blocks,
                settings.records());
        double y0 = q.atBank() ? 0 : 0.5 * w;
        ReleaseSampler release = (rng, x, y, z, n) -> {
            for (int i = 0; i < n; i++) {
                x[i] = 0;
                y[i] = y0;
                z[i] = 0;
            }
        };
        TransportRunner.run(model, release, settings, List.of(moments, counts, atStations), threads, progress, cancel);

        int records = times.length;
        double[][] variance = new double[3][records];
        double[] skewness = new double[records];
        for (int j = 0; j < records; j++) {
            for (int a = 0; a < 3; a++) {
                variance[a][j] = moments.pooledVariance(j, a);
            }
            skewness[j] = moments.pooledSkewness(j, 0);
        }
        double windowStart = 0.5 * duration;
        Estimate slope = DispersionEstimator.halfSlope(moments, 0, windowStart, duration);
        Estimate drift = DispersionEstimator.drift(moments, 0, windowStart, duration);
        double f = q.fieldFactorRelativeHalfWidth();
        double mc = slope.relativeHalfWidth();
        double combined = Math.sqrt(mc * mc + f * f) * slope.value();
        Estimate longitudinal = new Estimate(slope.value(), slope.value() - combined, slope.value() + combined,
                "half the late slope of the along-flow variance; interval over blocks and the field factor's");
        if (drift.low() > 0.05 || drift.high() < -0.05) {
            warnings.add(String.format(Locale.ROOT, "the longitudinal dispersion coefficient was still changing"
                    + " (%+.0f%% between the halves of the late window): the cloud may not have reached the"
                    + " Taylor regime; treat it as approximate", 100 * drift.value()));
        }
        Estimate transverse = new Estimate(ky, ky * (1 - f), ky * (1 + f), "section mean of the local rules");
        Estimate vertical = new Estimate(kz, kz * (1 - f), kz * (1 + f), "section mean of the local rules");
        CellCounts across = counts.grouped(cells.acrossWidth(), k -> k / LAYERS);
        CellCounts over = counts.grouped(cells.overDepth(), k -> k % LAYERS);
        Estimate mixedWidth = MixingTimeEstimator.time(across, times, 0.95);
        Estimate mixedDepth = MixingTimeEstimator.time(over, times, 0.95);
        double[] peak = MixingTimeEstimator.peakFactor(counts, times);
        List<String> notes = new ArrayList<>();
        notes.add(String.format(Locale.ROOT, "transport stage: %d particles in %d blocks, %d steps of %.3g s over"
                        + " %.4g s; vertical mixing time h^2/K_z = %.3g s, across the width W^2/K_y = %.3g s",
                settings.particles(), blocks, steps, dt, duration, depthTime, widthTime));
        notes.add("release: an instantaneous slug at the surface " + (q.atBank() ? "at the left water's edge"
                : "on the centre-line"));
        List<StationCurve> curves = List.of(StationCurves.of(atStations, moments, 1.0, q.section().area(),
                stripShare, stationAcross));
        if (stations.length > 0) {
            notes.add(String.format(Locale.ROOT, "stations: particles counted within half a bin of each station,"
                    + " the bin a fifth of the cloud's along-flow standard deviation and at least %.3g m (the"
                    + " distance the mean flow covers between records), at most %.3g m; a position across reads"
                    + " the strip of %d across the width that holds it", fineBin,
                    (2 * STATION_HALF_BINS + 1) * fineBin, STRIPS));
        }
        double elapsed = (System.nanoTime() - start) / 1e9;
        return new ChannelStageResult(times, variance, skewness, peak, longitudinal, transverse, vertical,
                mixedWidth, mixedDepth, q.meanVelocity(), q.section().area(), windowStart, settings.particles(),
                blocks, steps, dt, elapsed, warnings, notes, curves);
    }
}
