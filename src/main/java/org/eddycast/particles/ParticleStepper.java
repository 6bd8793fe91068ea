package org.eddycast.particles;

import org.eddycast.field.ModeLanes;
import org.eddycast.field.ShearKernel;
import org.eddycast.field.ShearModeField;

/**
 * One full time step for a group of particles sharing one realization: the integrator's drift, then the
 * Brownian step of molecular diffusion x &lt;- x + sqrt(2 D0 dt) xi per axis, then the exact
 * Ornstein-Uhlenbeck update of the field's amplitudes. The normal variates come in bulk, per step, from the
 * block's {@link NormalStream}; the inner loops are the given {@link ShearKernel}'s.
 *
 * <p>With the Strang drift this order is the symmetric composition N(dt/2) S(dt) N(dt/2) of noise N and
 * drift S with neighbouring noise half steps merged (two exact half steps of Brownian motion and of an
 * Ornstein-Uhlenbeck process compose to one full step); the merge shifts the noise by half a step against the
 * observation times, a constant offset that leaves the long-time slope of the mean-square displacement
 * unchanged.
 */
public final class ParticleStepper {

    private final Integrator integrator;
    private final double dt;
    private final double kickX;
    private final double kickY;
    private final double kickZ;
    private final ShearKernel kernel;
    private double[] normals = new double[0];

    /** A stepper on the fastest kernel of this machine ({@link KernelChoice#fastest()}). */
    public ParticleStepper(Integrator integrator, double dt, double[] d0) {
        this(integrator, dt, d0, KernelChoice.fastest().newShearKernel());
    }

    /**
     * @param integrator the drift scheme
     * @param dt         the time step
     * @param d0         molecular diffusivity per axis (length 3; the third ignored in two dimensions)
     * @param kernel     the inner loops, owned by this stepper's thread
     */
    public ParticleStepper(Integrator integrator, double dt, double[] d0, ShearKernel kernel) {
        this.integrator = integrator;
        this.dt = dt;
        this.kickX = Math.sqrt(2 * d0[0] * dt);
        this.kickY = Math.sqrt(2 * d0[1] * dt);
        this.kickZ = Math.sqrt(2 * d0[2] * dt);
        this.kernel = kernel;
    }

    public double timeStep() {
        return dt;
    }

    /**
     * Advances the first n particles of the block, sharing the field's realization, and the field by one step.
     * Uses 3n normal variates for the Brownian steps and 4 per mode for the amplitudes.
     */
    public void step(ShearModeField field, ParticleBlock p, int n, NormalStream source) {
        field.setStepScale(integrator.stepScale(dt));
        integrator.drift(kernel, field, p, n);
        int need = NormalStream.roundUp(3 * n + 4 * field.modes());
        double[] xi = normals(need);
        source.fill(xi, need);
        kickAll(p, n, xi, field.dimensions());
        kernel.advance(field, xi, 3 * n);
    }

    /** Advances every particle of the block, each in its lane's own realization, and the lanes by one step. */
    public void step(ModeLanes lanes, ParticleBlock p, NormalStream source) {
        lanes.setStepScale(integrator.stepScale(dt));
        integrator.drift(kernel, lanes, p);
        int n = lanes.width();
        int need = NormalStream.roundUp(Math.max(3 * n, 4 * n));
        double[] xi = normals(need);
        source.fill(xi, NormalStream.roundUp(3 * n));
        kickAll(p, n, xi, lanes.dimensions());
        int perMode = NormalStream.roundUp(4 * n);
        for (int m = 0; m < lanes.modes(); m++) {
            source.fill(xi, perMode);
            kernel.advance(lanes, m, xi);
        }
    }

    private double[] normals(int need) {
        if (normals.length < need) {
            normals = new double[need];
        }
        return normals;
    }

    /** The Brownian step x &lt;- x + sqrt(2 D0 dt) xi per axis, variates xi[0..3n) taken x, then y, then z. */
    private void kickAll(ParticleBlock p, int n, double[] xi, int dimensions) {
        kick(p.x, kickX, xi, 0, n);
        kick(p.y, kickY, xi, n, n);
        if (dimensions == 3) {
            kick(p.z, kickZ, xi, 2 * n, n);
        }
    }

    private static void kick(double[] coordinate, double scale, double[] xi, int offset, int n) {
        if (scale == 0) {
            return;
        }
        for (int i = 0; i < n; i++) {
            coordinate[i] += scale * xi[offset + i];
        }
    }

    /** Advances the first n particles by the drift only (no noise, amplitudes held): for tests of the map. */
    public void driftOnly(ShearModeField field, ParticleBlock p, int n) {
        field.setStepScale(integrator.stepScale(dt));
        integrator.drift(kernel, field, p, n);
    }
}
