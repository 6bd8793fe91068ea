package org.eddycast.engine;

import java.util.function.DoubleConsumer;
import org.eddycast.forecast.ChannelProfiles;
import org.eddycast.forecast.ChannelRules;
import org.eddycast.forecast.TankRules;
import org.eddycast.particles.Cancellation;
import org.eddycast.scenario.ChannelDesign;
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

    /** Runs the stage for a modeled channel or tank; null for other flows. */
    static TransportResult run(Scenario s, ResolvedFlow flow, DiffusivityResult r, int threads,
                               DoubleConsumer progress, Cancellation cancel) {
        if (s.flow() instanceof ChannelFlow c) {
            ChannelDesign ch = c.design();
            double[] f = fieldFactor(r, flow.turbulence());
            ChannelProfiles profiles = new ChannelProfiles(TankRules.STANDARD.dissipationConstant(), f[0]);
            ChannelStage.Request q = new ChannelStage.Request(ch.section(), ch.meanVelocity(),
                    ChannelRules.shearVelocity(ch).value(), profiles, f[1], s.substance().molecularDiffusivity(),
                    s.release().atBank(), Double.isNaN(s.forecast().horizon()) ? 0 : s.forecast().horizon(),
                    channelParticles(s), s.simulation().seed());
            return ChannelStage.run(q, threads, progress, cancel);
        }
        if (s.flow() instanceof TankFlow t) {
            double[] f = fieldFactor(r, flow.turbulence());
            return TankStudy.run(s, t.design(), f, threads, progress, cancel);
        }
        return null;
    }
}
