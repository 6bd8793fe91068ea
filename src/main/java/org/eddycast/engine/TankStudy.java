package org.eddycast.engine;

import java.util.List;
import java.util.function.DoubleConsumer;
import org.eddycast.forecast.TankFlowRules;
import org.eddycast.forecast.TankRules;
import org.eddycast.particles.Cancellation;
import org.eddycast.scenario.Scenario;
import org.eddycast.scenario.TankDesign;
import org.eddycast.transport.TankStage;
import org.eddycast.transport.TankStageResult;
import org.eddycast.transport.TankTransport;

/** Sets up and runs the transport stage for a modeled stirred tank. */
final class TankStudy {

    /** The probes' radius over the tank diameter. */
    static final double PROBE_RADIUS = 0.1;

    private TankStudy() {
    }

    /**
     * The tank's transport model for a design and field factor F, in the tank's own units: lengths in tank
     * diameters T and times in impeller revolutions 1/N. Two tanks of the same shape, impeller and
     * molecular diffusivity in those units give the same numbers, so N theta follows 1/N exactly.
     */
    static TankTransport model(TankDesign tank, double fieldFactor, double molecular) {
        double po = TankRules.powerNumber(tank).value();
        double nq = TankFlowRules.pumpingNumber(tank).value();
        double t = tank.tankDiameter();
        double d = tank.impellerDiameter() / t;
        double n = tank.impellerSpeed();
        return new TankTransport(1, tank.liquidHeight() / t, d, tank.impellerClearance() / t,
                TankFlowRules.radialFlow(tank), nq * d * d * d, po * Math.pow(d, 5),
                TankFlowRules.IMPELLER_ZONE_SHARE, TankRules.STANDARD.integralLengthOverImpellerDiameter() * d,
                TankRules.STANDARD.dissipationConstant(), fieldFactor, molecular / (n * t * t),
                TankFlowRules.ZONE_SWIRL_FRACTION * 2 * Math.PI);
    }

    /**
     * The feed point in the tank's coordinates (x, y from the axis, z from the bottom). The scenario gives it
     * from a corner of the square of the tank's cross-section area (the format's first version), so the
     * axis is at half that square's side; a point outside the liquid is moved to the nearest point inside.
     */
    static double[] feed(Scenario s, TankDesign tank) {
        double side = tank.tankDiameter() * Math.sqrt(Math.PI) / 2;
        double[] at = s.release().position();
        if (at == null) {
            return new double[] {0, 0, 0.9 * tank.liquidHeight()};
        }
        double x = at[0] - side / 2;
        double y = at[1] - side / 2;
        double r = Math.hypot(x, y);
        double rMax = 0.98 * tank.tankDiameter() / 2;
        if (r > rMax) {
            x *= rMax / r;
            y *= rMax / r;
        }
        return new double[] {x, y, Math.max(0, Math.min(tank.liquidHeight(), at[2]))};
    }

    /**
     * The probes in the tank's own units (diameters, from the axis): the scenario's, placed as the feed point is
     * and moved inside the liquid by a probe's radius where they stand nearer a wall, or the usual three: near
     * the surface across the axis from the feed, at mid-depth by the wall, near the bottom half-way out.
     */
    static void probes(Scenario s, TankDesign tank, double[] feed, List<String> names, List<double[]> probes) {
        double length = tank.tankDiameter();
        double r = 0.5;
        double h = tank.liquidHeight() / length;
        if (!s.forecast().probes().isEmpty()) {
            double side = Math.sqrt(Math.PI) / 2;
            for (org.eddycast.scenario.ProbePoint p : s.forecast().probes()) {
                double x = p.x() / length - side / 2;
                double y = p.y() / length - side / 2;
                double reach = r - PROBE_RADIUS;
                double radial = Math.hypot(x, y);
                if (radial > reach) {
                    x *= reach / radial;
                    y *= reach / radial;
                }
                double z = Math.max(PROBE_RADIUS, Math.min(h - PROBE_RADIUS, p.z() / length));
                names.add(String.format(java.util.Locale.ROOT, "at (%.3g, %.3g, %.3g) m", p.x(), p.y(), p.z()));
                probes.add(new double[] {x, y, z});
            }
            return;
        }
        double angle = Math.atan2(feed[1], feed[0]) + Math.PI;
        double c = Math.cos(angle);
        double sn = Math.sin(angle);
        names.addAll(List.of("near the surface, across the axis from the feed", "mid-depth by the wall",
                "near the bottom, half-way out"));
        probes.add(new double[] {0.5 * r * c, 0.5 * r * sn, 0.85 * h});
        probes.add(new double[] {-0.75 * r * sn, 0.75 * r * c, 0.5 * h});
        probes.add(new double[] {-0.5 * r * c, -0.5 * r * sn, 0.12 * h});
    }

    static TankStageResult run(Scenario s, TankDesign tank, double[] fieldFactor, int threads,
                               DoubleConsumer progress, Cancellation cancel) {
        TankTransport model = model(tank, fieldFactor[0], s.substance().molecularDiffusivity());
        double length = tank.tankDiameter();
        double[] feed = feed(s, tank);
        for (int i = 0; i < 3; i++) {
            feed[i] /= length;
        }
        List<String> names = new java.util.ArrayList<>();
        List<double[]> probes = new java.util.ArrayList<>();
        probes(s, tank, feed, names, probes);
        double po = TankRules.powerNumber(tank).value();
        double nq = TankFlowRules.pumpingNumber(tank).value();
        double n = tank.impellerSpeed();
        TankStage.Request q = new TankStage.Request(model, feed, names, probes, PROBE_RADIUS,
                tank.impellerDiameter() / length, Double.isNaN(s.forecast().horizon()) ? 0
                : s.forecast().horizon() * n, TransportStudy.tankParticles(s), s.simulation().seed(), length, 1 / n);
        return TankStage.run(q, TankFlowRules.discharge(tank, nq), TankFlowRules.velocityGradient(tank, po),
                threads, progress, cancel);
    }
}
