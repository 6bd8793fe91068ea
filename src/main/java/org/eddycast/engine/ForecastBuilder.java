package org.eddycast.engine;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.eddycast.forecast.AxisDensity;
import org.eddycast.forecast.BoundedSpread;
import org.eddycast.forecast.Cautions;
import org.eddycast.forecast.ChannelHandbook;
import org.eddycast.forecast.ChannelMixingDistance;
import org.eddycast.forecast.ChannelPlume;
import org.eddycast.forecast.ChannelRules;
import org.eddycast.forecast.Comparison;
import org.eddycast.forecast.Forecast;
import org.eddycast.forecast.ForecastComparison;
import org.eddycast.forecast.TaylorEstimate;
import org.eddycast.forecast.FreeAxis;
import org.eddycast.forecast.HandbookEstimate;
import org.eddycast.forecast.InstantaneousRelease;
import org.eddycast.forecast.TankBlendCorrelation;
import org.eddycast.forecast.TwoWallAxis;
import org.eddycast.forecast.WellMixedTime;
import org.eddycast.forecast.WidthMeasure;
import org.eddycast.scenario.ChannelDesign;
import org.eddycast.scenario.ChannelFlow;
import org.eddycast.scenario.ForecastSettings;
import org.eddycast.scenario.Release;
import org.eddycast.scenario.Scenario;
import org.eddycast.scenario.TankDesign;
import org.eddycast.scenario.TurbulenceStatistics;
import org.eddycast.scenario.TankFlow;
import org.eddycast.stats.AxisEstimate;
import org.eddycast.transport.ChannelStageResult;
import org.eddycast.transport.TankStageResult;
import org.eddycast.transport.TransportResult;

/**
 * Turns a simulated diffusivity into a forecast in physical units.
 *
 * <p>Plume variance per axis: the simulated mean-square displacement while the simulation lasts (it carries
 * the early ballistic growth u'^2 t^2 of Taylor 1921), then sigma^2(T) + 2 D (t - T) beyond the simulated
 * time T, so that sigma^2 / (2 t) tends to D. The 95% band carries the curve's standard error and then D's
 * interval. Concentrations treat the cloud as Gaussian with that variance: free space, or walls by the cosine
 * series (Crank 1975, The Mathematics of Diffusion, Oxford), using D_eff(t) = sigma^2(t) / (2 t) so the
 * series has exactly the simulated variance before the walls are felt. Widths along an axis with walls are those
 * of the cloud between them ({@link BoundedSpread}).
 */
public final class ForecastBuilder {

    private static final int POINTS = 80;
    private static final double GRAVITY = ChannelRules.GRAVITY;

    private ForecastBuilder() {
    }

    /** The forecast of a study with the transport stage's result (null when it had none). */
    public static Forecast build(Scenario s, ResolvedFlow flow, DiffusivityResult r, TransportResult transport) {
        Forecast slug = uncapped(s, flow, r, transport);
        Forecast decayed = FirstOrderDecay.apply(slug, s.substance().loss());
        return StockCap.apply(ReleaseOverDuration.apply(decayed, s.release()), s.release());
    }

    private static Forecast uncapped(Scenario s, ResolvedFlow flow, DiffusivityResult r, TransportResult transport) {
        if (transport instanceof ChannelStageResult t && s.flow() instanceof ChannelFlow c) {
            return ChannelForecast.build(s, flow, c.design(), t, measure(s.forecast().widthMeasure()));
        }
        if (transport instanceof TankStageResult t && s.flow() instanceof TankFlow k) {
            return TankForecast.build(s, flow, k.design(), t);
        }
        return build(s, flow, r);
    }

    /** The forecast of a study from the field stage alone (homogeneous turbulence). */
    public static Forecast build(Scenario s, ResolvedFlow flow, DiffusivityResult r) {
        int axes = r.axes().size();
        double[] d = new double[3];
        double[] dLow = new double[3];
        double[] dHigh = new double[3];
        for (AxisEstimate a : r.axes()) {
            d[a.axis()] = a.diffusivity().value();
            dLow[a.axis()] = Math.max(a.diffusivity().low(), 1e-30);
            dHigh[a.axis()] = a.diffusivity().high();
        }
        if (axes == 2) {
            d[2] = r.molecularDiffusivity();
            dLow[2] = d[2];
            dHigh[2] = d[2];
        }
        List<Forecast.MixingFigure> mixing = new ArrayList<>();
        List<Comparison> handbook = new ArrayList<>();
        List<String> assumptions = new ArrayList<>(flow.assumptions());
        assumptions.add("homogeneous, stationary turbulence with the stated statistics throughout the region");
        assumptions.add(FirstOrderDecay.CONSERVATIVE);
        assumptions.add("spreading relative to the cloud's centre; the mean flow carries the centre");
        assumptions.add("no dispersion by mean-velocity shear (not in a homogeneous-turbulence model)");
        assumptions.add("a Gaussian cloud with the simulated variance; walls by the cosine series");
        ForecastSettings settings = s.forecast();
        WidthMeasure measure = measure(settings.widthMeasure());
        double horizon = settings.horizon();
        double[] marks = new double[0];
        boolean inDistance = false;
        double meanVelocity = flow.turbulence() == null ? 0 : flow.turbulence().meanVelocity();
        AxisDensityFactory density;
        Release release = s.release();
        ChannelPlume plume = null;
        // Walls per axis: the container's length (NaN for a free axis) and where the release sits on it.
        double[] wallLength = {Double.NaN, Double.NaN, Double.NaN};
        double[] wallRelease = new double[3];
        if (s.flow() instanceof TankFlow t) {
            TankDesign tank = t.design();
            double side = tank.tankDiameter() * Math.sqrt(Math.PI) / 2;
            double[] size = {side, side, tank.liquidHeight()};
            double[] at = release.position() != null ? release.position()
                    : new double[] {side / 2, side / 2, 0.9 * tank.liquidHeight()};
            at = new double[] {Math.min(at[0], side), Math.min(at[1], side), Math.min(at[2], size[2])};
            double blend = WellMixedTime.closedBox(size, at, d);
            double fast = WellMixedTime.closedBox(size, at, dHigh);
            double slow = WellMixedTime.closedBox(size, at, dLow);
            mixing.add(new Forecast.MixingFigure("blend time (every point within 5% of the final value)", blend, fast,
                    slow, "s", "cosine series in a box of the tank's cross-section area and liquid height with the "
                    + "simulated eddy diffusivities"));
            HandbookEstimate grenville = TankBlendCorrelation.blendTime(tank);
            handbook.add(ForecastComparison.compare(blend, fast, slow, grenville));
            assumptions.add(String.format(Locale.ROOT, "the cylindrical tank is taken as a box %.3g m x %.3g m x "
                    + "%.3g m of the same cross-section area", side, side, size[2]));
            double[] position = at;
            density = (axis, dEff) -> new TwoWallAxis(0, size[axis], position[axis], dEff);
            for (int a = 0; a < 3; a++) {
                wallLength[a] = size[a];
                wallRelease[a] = position[a];
            }
            assumptions.add("widths are those of the cloud between the tank's walls: they level off at the width "
                    + "of a cloud spread evenly over the tank");
            if (Double.isNaN(horizon)) {
                horizon = 2 * slow;
            }
        } else if (s.flow() instanceof ChannelFlow c) {
            ChannelDesign ch = c.design();
            inDistance = true;
            double u = ch.meanVelocity();
            double fromBank = release.atBank() ? 0 : ch.width() / 2;
            double across = ChannelMixingDistance.acrossWidth(u, ch.width(), d[1], fromBank);
            mixing.add(new Forecast.MixingFigure("distance to mixed across the width (within 5%)", across,
                    ChannelMixingDistance.acrossWidth(u, ch.width(), dHigh[1], fromBank),
                    ChannelMixingDistance.acrossWidth(u, ch.width(), dLow[1], fromBank), "m",
                    "cosine series across the width with the simulated transverse diffusivity, release "
                            + (release.atBank() ? "at the bank" : "on the centre-line")));
            double overDepth = ChannelMixingDistance.overDepth(u, ch.depth(), d[2], ch.depth());
            mixing.add(new Forecast.MixingFigure("distance to mixed over the depth (within 5%)", overDepth,
                    ChannelMixingDistance.overDepth(u, ch.depth(), dHigh[2], ch.depth()),
                    ChannelMixingDistance.overDepth(u, ch.depth(), dLow[2], ch.depth()), "m",
                    "cosine series over the depth with the simulated vertical diffusivity, release at the surface"));
            double shear = shearVelocity(ch);
            List<HandbookEstimate> estimates = ChannelHandbook.all(ch.depth(), ch.width(), u, shear);
            handbook.add(ForecastComparison.compare(d[2], dLow[2], dHigh[2], estimates.get(0)));
            handbook.add(ForecastComparison.compare(d[1], dLow[1], dHigh[1], estimates.get(1)));
            handbook.add(ForecastComparison.compare(d[1], dLow[1], dHigh[1], estimates.get(2)));
            handbook.add(ForecastComparison.compare(d[0], dLow[0], dHigh[0], estimates.get(3)));
            handbook.add(ForecastComparison.compare(d[0], dLow[0], dHigh[0], estimates.get(4)));
            double handbookAcross = ChannelMixingDistance.acrossWidth(u, ch.width(), estimates.get(1).value(),
                    fromBank);
            mixing.add(new Forecast.MixingFigure("distance to mixed across the width with the handbook eps_t "
                    + "(straight channel)", handbookAcross, handbookAcross, handbookAcross, "m",
                    "same cosine series with eps_t = 0.15 h u* (Fischer et al. 1979)"));
            assumptions.add("x = U t: the cloud's centre moves with the mean velocity " + fmt(u) + " m/s");
            assumptions.add("bed and surface (and banks) reflect the tracer");
            double y0 = fromBank;
            wallLength[1] = ch.width();
            wallRelease[1] = y0;
            wallLength[2] = ch.depth();
            wallRelease[2] = ch.depth();
            assumptions.add("lateral and vertical widths are those of the cloud between banks, bed and surface: they "
                    + "level off once it is mixed across the section");
            double[] lower = {0, 0, 0};
            double[] upper = {Double.NaN, ch.width(), ch.depth()};
            double[] at = {0, y0, ch.depth()};
            density = (axis, dEff) -> axis == 0 ? new FreeAxis(0, dEff)
                    : new TwoWallAxis(lower[axis], upper[axis], at[axis], dEff);
            marks = channelMarks(settings, u);
            if (Double.isNaN(horizon)) {
                horizon = Double.isNaN(settings.horizonDistance()) ? 1.2 * Math.max(across, overDepth) / u
                        : settings.horizonDistance() / u;
            }
            // the grid runs out to the furthest station
            horizon = Math.max(horizon, furthest(marks));
            meanVelocity = u;
            if (!Double.isNaN(release.rate())) {
                plume = new ChannelPlume(release.rate(), u, ch.depth(), ch.width(), d[1], d[2], fromBank,
                        ch.depth());
                assumptions.add("continuous release at the surface: a steady Gaussian plume with the late eddy "
                        + "diffusivities, bed, surface and banks reflecting (method of images)");
            }
        } else {
            density = (axis, dEff) -> new FreeAxis(0, dEff);
            assumptions.add("unbounded water: no walls, bed or surface within reach of the cloud");
            TurbulenceStatistics stats = flow.turbulence();
            if (stats != null && Double.isFinite(stats.correlationTime())) {
                double mean = 0;
                double meanLow = 0;
                double meanHigh = 0;
                for (AxisEstimate a : r.axes()) {
                    mean += a.diffusivity().value() / axes;
                    meanLow += a.diffusivity().low() / axes;
                    meanHigh += a.diffusivity().high() / axes;
                }
                handbook.add(ForecastComparison.compare(mean, Math.max(meanLow, 1e-30), meanHigh,
                        TaylorEstimate.longTime(stats.rmsVelocity(), stats.correlationTime(),
                                stats.integralLength(), r.molecularDiffusivity())));
            }
            if (Double.isNaN(horizon)) {
                horizon = 10 * r.duration();
            }
        }
        horizon = Math.max(horizon, r.times()[0] * 10);
        double[] times = grid(r.times()[0], horizon, marks);
        double[][] variance = new double[3][];
        double[][] varianceLow = new double[3][];
        double[][] varianceHigh = new double[3][];
        for (int a = 0; a < 3; a++) {
            double[][] v = variance(r, a, d[a], dLow[a], dHigh[a], times);
            variance[a] = v[0];
            varianceLow[a] = v[1];
            varianceHigh[a] = v[2];
        }
        double factor = Forecast.factor(measure, settings.edgeFraction());
        double[][] width = new double[3][times.length];
        double[][] widthLow = new double[3][times.length];
        double[][] widthHigh = new double[3][times.length];
        double[] peak = new double[times.length];
        for (int j = 0; j < times.length; j++) {
            double t = times[j];
            AxisDensity[] dens = new AxisDensity[3];
            for (int a = 0; a < 3; a++) {
                width[a][j] = factor * Math.sqrt(bounded(wallLength[a], wallRelease[a], variance[a][j]));
                widthLow[a][j] = factor * Math.sqrt(bounded(wallLength[a], wallRelease[a],
                        Math.max(varianceLow[a][j], 0)));
                widthHigh[a][j] = factor * Math.sqrt(bounded(wallLength[a], wallRelease[a], varianceHigh[a][j]));
                dens[a] = density.at(a, Math.max(variance[a][j] / (2 * t), 1e-30));
            }
            peak[j] = new InstantaneousRelease(release.mass(), dens[0], dens[1], dens[2]).peakConcentration(t);
        }
        double[] grid = times.clone();
        if (inDistance) {
            for (int j = 0; j < grid.length; j++) {
                grid[j] = meanVelocity * times[j];
            }
        }
        double[] plumePeak = new double[plume == null ? 0 : grid.length];
        for (int j = 0; j < plumePeak.length; j++) {
            plumePeak[j] = plume.peakConcentration(grid[j]);
        }
        return new Forecast(inDistance, grid, times, measure, settings.edgeFraction(), width, widthLow, widthHigh,
                r.duration(), peak, mixing, handbook, assumptions, Cautions.ALL, plumePeak);
    }

    /** The variance of a cloud between walls (BoundedSpread), or the free variance on a free axis. */
    private static double bounded(double length, double release, double freeVariance) {
        return Double.isNaN(length) ? freeVariance : BoundedSpread.variance(length, release, freeVariance);
    }

    /** An axis density for a diffusivity that reproduces the variance at the time asked. */
    @FunctionalInterface
    private interface AxisDensityFactory {
        AxisDensity at(int axis, double effectiveDiffusivity);
    }

    static WidthMeasure measure(String key) {
        return switch (key) {
            case "standard-deviation" -> WidthMeasure.STANDARD_DEVIATION;
            case "visible-edge" -> WidthMeasure.VISIBLE_EDGE;
            default -> WidthMeasure.FULL_WIDTH_AT_HALF_MAXIMUM;
        };
    }

    static double shearVelocity(ChannelDesign ch) {
        return ChannelRules.shearVelocity(ch).value();
    }

    /**
     * Geometric grid from the first record time to the horizon, with each mark (a station's travel time) inside
     * that range put on the grid exactly: it replaces the grid point nearest to it, so the grid keeps its size and
     * its order (a mark lies between the neighbours of its nearest point).
     */
    static double[] grid(double first, double horizon, double[] marks) {
        double[] t = grid(first, horizon);
        for (double m : marks) {
            if (!(m > first && m < horizon)) {
                continue;
            }
            int nearest = 1;
            for (int j = 2; j < t.length - 1; j++) {
                if (Math.abs(Math.log(t[j] / m)) < Math.abs(Math.log(t[nearest] / m))) {
                    nearest = j;
                }
            }
            if (m > t[nearest - 1] && m < t[nearest + 1]) {
                t[nearest] = m;
            }
        }
        return t;
    }

    /**
     * The travel times x / U of a channel's stations and of its horizon distance: the grid runs out to the
     * furthest and puts each on a grid point.
     */
    static double[] channelMarks(ForecastSettings f, double u) {
        double[] marks = new double[f.stations().size() + 1];
        for (int k = 0; k < f.stations().size(); k++) {
            marks[k] = f.stations().get(k).distance() / u;
        }
        marks[marks.length - 1] = Double.isNaN(f.horizonDistance()) ? 0 : f.horizonDistance() / u;
        return marks;
    }

    /** The furthest of the marks (0 for none). */
    static double furthest(double[] marks) {
        double far = 0;
        for (double m : marks) {
            far = Math.max(far, m);
        }
        return far;
    }

    /** Geometric grid from the first record time to the horizon. */
    static double[] grid(double first, double horizon) {
        double[] t = new double[POINTS];
        double ratio = Math.pow(horizon / first, 1.0 / (POINTS - 1));
        for (int j = 0; j < POINTS; j++) {
            t[j] = first * Math.pow(ratio, j);
        }
        t[POINTS - 1] = horizon;
        return t;
    }

    /**
     * Variance, low and high along one axis at the given times: interpolated from the simulated curve while it
     * lasts (band: 1.96 standard errors), then sigma^2(T) + 2 D (t - T) with D's interval.
     */
    static double[][] variance(DiffusivityResult r, int axis, double d, double dLow, double dHigh, double[] times) {
        double[] v = new double[times.length];
        double[] lo = new double[times.length];
        double[] hi = new double[times.length];
        boolean simulatedAxis = axis < r.axes().size();
        double[] recordTimes = r.times();
        double[] msd = simulatedAxis ? r.meanSquareDisplacement(axis) : null;
        double[] err = simulatedAxis ? r.meanSquareDisplacementError(axis) : null;
        double end = recordTimes[recordTimes.length - 1];
        for (int j = 0; j < times.length; j++) {
            double t = times[j];
            if (!simulatedAxis) {
                v[j] = 2 * d * t;
                lo[j] = v[j];
                hi[j] = v[j];
            } else if (t <= end) {
                int k = 1;
                while (k < recordTimes.length - 1 && recordTimes[k] < t) {
                    k++;
                }
                double t0 = recordTimes[k - 1];
                double t1 = recordTimes[k];
                double f = t <= t0 ? 0 : Math.min(1, (t - t0) / (t1 - t0));
                v[j] = msd[k - 1] + f * (msd[k] - msd[k - 1]);
                double e = err[k - 1] + f * (err[k] - err[k - 1]);
                lo[j] = v[j] - 1.96 * e;
                hi[j] = v[j] + 1.96 * e;
            } else {
                double last = msd[msd.length - 1];
                double lastErr = 1.96 * err[err.length - 1];
                v[j] = last + 2 * d * (t - end);
                lo[j] = last - lastErr + 2 * dLow * (t - end);
                hi[j] = last + lastErr + 2 * dHigh * (t - end);
            }
        }
        return new double[][] {v, lo, hi};
    }

    static String fmt(double x) {
        return String.format(Locale.ROOT, "%.3g", x);
    }
}
