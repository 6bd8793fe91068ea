package org.eddycast.engine;

import java.util.ArrayList;
import java.util.List;
import java.util.function.DoubleConsumer;
import org.eddycast.forecast.ChannelHandbook;
import org.eddycast.forecast.ChannelProfiles;
import org.eddycast.forecast.ChannelRules;
import org.eddycast.forecast.TankRules;
import org.eddycast.particles.Cancellation;
import org.eddycast.scenario.ChannelDesign;
import org.eddycast.scenario.ConcentrationCap;
import org.eddycast.scenario.Station;
import org.eddycast.scenario.ChannelFlow;
import org.eddycast.scenario.Scenario;
import org.eddycast.scenario.TankFlow;
import org.eddycast.scenario.TurbulenceStatistics;
import org.eddycast.stats.AxisEstimate;
import org.eddycast.transport.ChannelStage;
import org.eddycast.transport.TransportResult;

/**
 * The second stage of a modeled channel or tank: the field stage's factor F = D / (u' L) put into the local
 * rules of the real geometry, and particles moved through it ({@link ChannelStage}, {@link TankStudy}).
 */
final class TransportStudy {

    /**
     * Particles the channel stage follows: half the scenario's particles, from 1,024 to 65,536 (8,192 for the
     * default 16,384).
     */
    static int channelParticles(Scenario s) {
        return Math.max(1024, Math.min(65536, s.simulation().particles() / 2));
    }

    /**
     * Particles the tank stage follows: twice the scenario's particles, from 16,384 (fewer leave too few in each of
     * the tank's cells to read a 5% deviation from) to 262,144.
     */
    static int tankParticles(Scenario s) {
        return Math.max(16384, Math.min(262144, 2 * s.simulation().particles()));
    }

    private TransportStudy() {
    }

    /** The field factor F = (D - D0) / (u' L) averaged over the axes, and its 95% interval's half-width over F. */
    static double[] fieldFactor(DiffusivityResult r, TurbulenceStatistics t) {
        double d = 0;
        double low = 0;
        double high = 0;
        for (AxisEstimate a : r.axes()) {
            d += a.diffusivity().value();
            low += a.diffusivity().low();
            high += a.diffusivity().high();
        }
        int n = r.axes().size();
        double scale = t.rmsVelocity() * t.integralLength();
        double f = (d / n - r.molecularDiffusivity()) / scale;
        double half = 0.5 * (high - low) / n / scale;
        return new double[] {f, half / f};
    }

    /**
     * The stations the channel stage reads: the scenario's, then the cap's distance when no station is there
     * (its distances in row 0, positions across in row 1, NaN for the cross-section mean).
     */
    static double[][] stations(Scenario s) {
        List<Station> list = new ArrayList<>(s.forecast().stations());
        ConcentrationCap cap = s.forecast().cap();
        if (cap != null && list.stream().noneMatch(st -> st.distance() == cap.distance() && Double.isNaN(st.across()))) {
            list.add(new Station(cap.distance(), Double.NaN));
        }
        double[][] out = new double[2][list.size()];
        for (int k = 0; k < list.size(); k++) {
            out[0][k] = list.get(k).distance();
            out[1][k] = list.get(k).across();
        }
        return out;
    }

    /** Stations' lead over the cloud's centre, in along-flow standard deviations, that the run must reach. */
    static final double PASSAGE_SIGMAS = 4;

    /**
     * The time the furthest station needs to see the cloud pass: its distance over U plus four along-flow standard
     * deviations over U. The standard deviation there is sized before the run from the larger of the two
     * handbook coefficients (Elder's and Fischer's), sigma = sqrt(2 K x / U): a run length, not a result.
     */
    static double passageTime(ChannelDesign ch, double shear, double[] distances) {
        double far = 0;
        for (double x : distances) {
            far = Math.max(far, x);
        }
        if (far == 0) {
            return 0;
        }
        double u = ch.meanVelocity();
        double k = Math.max(ChannelHandbook.elderLongitudinal(ch.meanDepth(), shear).value(),
                ChannelHandbook.fischerLongitudinal(u, ch.width(), ch.meanDepth(), shear).value());
        double sigma = Math.sqrt(2 * k * far / u);
        return (far + PASSAGE_SIGMAS * sigma) / u;
    }

    /** Runs the stage for a modeled channel or tank; null for other flows. */
    static TransportResult run(Scenario s, ResolvedFlow flow, DiffusivityResult r, int threads,
                               DoubleConsumer progress, Cancellation cancel) {
        if (s.flow() instanceof ChannelFlow c) {
            ChannelDesign ch = c.design();
            double[] f = fieldFactor(r, flow.turbulence());
            ChannelProfiles profiles = new ChannelProfiles(TankRules.STANDARD.dissipationConstant(), f[0]);
            double shear = ChannelRules.shearVelocity(ch).value();
            double[][] stations = stations(s);
            double horizon = !Double.isNaN(s.forecast().horizon()) ? s.forecast().horizon()
                    : Double.isNaN(s.forecast().horizonDistance()) ? 0
                    : s.forecast().horizonDistance() / ch.meanVelocity();
            double minDuration = Math.max(horizon, passageTime(ch, shear, stations[0]));
            ChannelStage.Request q = new ChannelStage.Request(ch.section(), ch.meanVelocity(), shear, profiles, f[1],
                    s.substance().molecularDiffusivity(), s.release().atBank(), minDuration, channelParticles(s),
                    s.simulation().seed(), stations[0], stations[1]);
            return ChannelStage.run(q, threads, progress, cancel);
        }
        if (s.flow() instanceof TankFlow t) {
            double[] f = fieldFactor(r, flow.turbulence());
            return TankStudy.run(s, t.design(), f, threads, progress, cancel);
        }
        return null;
    }
}
