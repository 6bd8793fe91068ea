package org.eddycast.engine;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.eddycast.particles.EnsembleRunner;
import org.eddycast.field.BeltramiFlow;
import org.eddycast.field.CellularFlow;
import org.eddycast.field.FieldModel;
import org.eddycast.field.PopeModelSpectrum;
import org.eddycast.field.PowerLawBand;
import org.eddycast.field.RandomFourierModel;
import org.eddycast.field.ShearFlow;
import org.eddycast.field.SpectrumShape;
import org.eddycast.field.SpectrumTable;
import org.eddycast.scenario.DirectFlow;
import org.eddycast.scenario.Scenario;
import org.eddycast.scenario.ScenarioException;
import org.eddycast.scenario.SimulationSettings;
import org.eddycast.scenario.SpectrumSpec;
import org.eddycast.scenario.TurbulenceStatistics;
import org.eddycast.scenario.VerificationFlow;

/**
 * Turns a scenario into a {@link DimensionlessCase}: turbulent flows in units of the integral length and the
 * rms velocity, verification flows in units of 1/k and U.
 */
public final class CaseBuilder {

    /** Default time step as a fraction of the field's shortest time scale. */
    public static final double DEFAULT_STEP_FRACTION = 0.1;
    /** A time step above this fraction of the shortest time scale is warned about. */
    public static final double MAX_STEP_FRACTION = 0.5;
    /** Default duration in units of the larger of L/u' and tau. */
    public static final double DEFAULT_DURATION_UNITS = 40;

    private CaseBuilder() {
    }

    /** The dimensionless case of a scenario whose flow is already turbulence statistics or a verification flow. */
    public static DimensionlessCase build(Scenario scenario, TurbulenceStatistics turbulence) {
        SimulationSettings sim = scenario.simulation();
        double d0 = scenario.substance().molecularDiffusivity();
        if (scenario.flow() instanceof VerificationFlow v) {
            return verification(v, sim, d0);
        }
        return turbulent(turbulence, sim, d0);
    }

    /** Turbulence statistics of a direct flow (no derivations: the values were given). */
    public static TurbulenceStatistics direct(DirectFlow f) {
        double[] rms = new double[f.dimensions()];
        java.util.Arrays.fill(rms, f.rmsVelocity());
        return new TurbulenceStatistics(f.dimensions(), f.rmsVelocity(), rms, f.integralLength(),
                f.correlationTime(), f.spectrum(), f.meanVelocity(), Double.NaN, List.of());
    }

    private static DimensionlessCase turbulent(TurbulenceStatistics t, SimulationSettings sim, double d0Physical) {
        Scales scales = new Scales(t.integralLength(), t.rmsVelocity());
        double kubo = t.frozen() ? Double.POSITIVE_INFINITY : t.correlationTime() / scales.time();
        SpectrumShape shape;
        SpectrumSpec spec = t.spectrum();
        if (spec.model() == SpectrumSpec.Model.POWER_LAW) {
            shape = new PowerLawBand(spec.slope(), spec.wavenumberRatio());
        } else {
            shape = new PopeModelSpectrum(t.integralLength() / spec.kolmogorovLength());
        }
        SpectrumTable table = new SpectrumTable(shape, t.dimensions(), sim.modes());
        FieldModel model = new RandomFourierModel(table, kubo, shape.describe());
        double d0 = d0Physical / scales.diffusivity();
        double slowest = Math.max(1.0, Double.isInfinite(kubo) ? 1.0 : kubo);
        String key = String.format(Locale.ROOT, "turbulent|%d|%s|%s|%.12g|%.12g", t.dimensions(), shape.describe(),
                spec, kubo, d0);
        return finish(model, sim, new double[] {d0, d0, d0}, scales, kubo, 1.0 / d0, slowest, key);
    }

    private static DimensionlessCase verification(VerificationFlow v, SimulationSettings sim, double d0Physical) {
        Scales scales;
        FieldModel model;
        double kubo;
        String key;
        switch (v.type()) {
            case SHEAR -> {
                boolean steady = Double.isInfinite(v.correlationTime());
                if (v.wavenumber() == 0) {
                    scales = new Scales(v.amplitude() * v.correlationTime(), v.amplitude());
                    model = new ShearFlow(v.dimensions(), 0, 1.0);
                    kubo = Double.POSITIVE_INFINITY;
                } else {
                    scales = new Scales(1 / v.wavenumber(), v.amplitude());
                    double tau = steady ? Double.POSITIVE_INFINITY : v.correlationTime() / scales.time();
                    model = new ShearFlow(v.dimensions(), 1, tau);
                    kubo = tau;
                }
                key = "shear";
            }
            case CELLULAR -> {
                scales = new Scales(1 / v.wavenumber(), v.amplitude());
                model = new CellularFlow(v.dimensions());
                kubo = Double.POSITIVE_INFINITY;
                key = "cellular";
            }
            case BELTRAMI -> {
                double[] c = v.coefficients();
                double u = v.amplitude();
                scales = new Scales(1 / v.wavenumber(), u);
                model = new BeltramiFlow(c[0] / u, c[1] / u, c[2] / u);
                kubo = Double.POSITIVE_INFINITY;
                key = "beltrami";
            }
            default -> throw new IllegalStateException("unknown verification flow " + v.type());
        }
        double d0 = d0Physical / scales.diffusivity();
        String fullKey = String.format(Locale.ROOT, "%s|%s|%.12g", key, model.describe(), d0);
        return finish(model, sim, new double[] {d0, d0, d0}, scales, kubo, 1.0 / d0, 1.0, fullKey);
    }

    private static DimensionlessCase finish(FieldModel model, SimulationSettings sim, double[] d0, Scales scales,
                                            double kubo, double peclet, double slowestTime, String key) {
        List<String> notes = new ArrayList<>();
        double dt;
        if (Double.isNaN(sim.timeStep())) {
            dt = DEFAULT_STEP_FRACTION * Math.min(1.0, model.shortestTimeScale());
            notes.add(String.format(Locale.ROOT, "time step chosen as %.3g s (%.2g of the field's shortest time scale)",
                    dt * scales.time(), DEFAULT_STEP_FRACTION));
        } else {
            dt = sim.timeStep() / scales.time();
        }
        double duration;
        if (Double.isNaN(sim.duration())) {
            duration = DEFAULT_DURATION_UNITS * slowestTime;
            notes.add(String.format(Locale.ROOT, "duration chosen as %.4g s (%.0f times the larger of L/u' and tau)",
                    duration * scales.time(), DEFAULT_DURATION_UNITS));
        } else {
            duration = sim.duration() / scales.time();
        }
        int steps = RunSize.steps(duration, dt, scales.time(), Double.isNaN(sim.duration()),
                Double.isNaN(sim.timeStep()));
        long block = EnsembleRunner.blockSizeFor(sim.groupSize());
        long run = Math.max(2, (sim.particles() + block - 1) / block) * block;
        if (run != sim.particles()) {
            notes.add(String.format(Locale.ROOT, "particles raised from %d to %d: the run is made of at least two "
                    + "whole blocks of %d (groups of %d sharing a realization)", sim.particles(), run, block,
                    sim.groupSize()));
        }
        String fullKey = key + String.format(Locale.ROOT, "|%s|%.12g|%d|%d|%d|%d|%d|%s", sim.integrator(), dt, steps,
                sim.groupSize(), sim.modes(), sim.particles(), sim.seed(), sim.precisionTarget());
        return new DimensionlessCase(model, sim.integrator(), d0, dt, steps, sim.groupSize(), sim.particles(),
                sim.maxParticles(), sim.precisionTarget(), sim.seed(), scales, kubo, peclet, notes, fullKey);
    }

    /**
     * The warning for a time step above {@link #MAX_STEP_FRACTION} of the field's shortest time scale, in
     * seconds, or null when the step is fine.
     */
    public static String timeStepWarning(DimensionlessCase c) {
        double shortest = c.model().shortestTimeScale() * c.scales().time();
        double step = c.timeStep() * c.scales().time();
        if (step <= MAX_STEP_FRACTION * shortest) {
            return null;
        }
        return String.format(Locale.ROOT,
                "simulation.timeStep %.3g s is more than %.2g of the field's shortest time scale (%.3g s): the "
                        + "answer would carry a time-step bias; use a time step below %.3g s (or leave "
                        + "simulation.timeStep out and the engine chooses one)",
                step, MAX_STEP_FRACTION, shortest, DEFAULT_STEP_FRACTION * shortest);
    }

    /** The message for particles that blew up, in seconds and naming the field to change. */
    public static String blowupMessage(DimensionlessCase c) {
        double shortest = c.model().shortestTimeScale() * c.scales().time();
        return String.format(Locale.ROOT,
                "the particle positions stopped being finite numbers: simulation.timeStep %.3g s is far too large "
                        + "for this flow (its shortest time scale is %.3g s); use a time step below %.3g s",
                c.timeStep() * c.scales().time(), shortest, DEFAULT_STEP_FRACTION * shortest);
    }
}
