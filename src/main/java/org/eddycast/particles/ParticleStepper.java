package org.eddycast.particles;

import java.util.random.RandomGenerator;
import org.eddycast.field.ShearModeField;

/**
 * One full time step for a group of particles sharing one realization: the integrator's drift, then the
 * Brownian step of molecular diffusion x &lt;- x + sqrt(2 D0 dt) xi per axis, then the exact
 * Ornstein-Uhlenbeck update of the field's amplitudes.
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

    /**
     * @param integrator the drift scheme
     * @param dt         the time step
     * @param d0         molecular diffusivity per axis (length 3; the third ignored in two dimensions)
     */
    public ParticleStepper(Integrator integrator, double dt, double[] d0) {
        this.integrator = integrator;
        this.dt = dt;
        this.kickX = Math.sqrt(2 * d0[0] * dt);
        this.kickY = Math.sqrt(2 * d0[1] * dt);
        this.kickZ = Math.sqrt(2 * d0[2] * dt);
    }

    public double timeStep() {
        return dt;
    }

    /** Advances the first n particles of the block and the field by one step. */
    public void step(ShearModeField field, ParticleBlock p, int n, RandomGenerator rng) {
        integrator.drift(field, p, n, dt);
        if (kickX > 0) {
            for (int i = 0; i < n; i++) {
                p.x[i] += kickX * rng.nextGaussian();
            }
        }
        if (kickY > 0) {
            for (int i = 0; i < n; i++) {
                p.y[i] += kickY * rng.nextGaussian();
            }
        }
        if (field.dimensions() == 3 && kickZ > 0) {
            for (int i = 0; i < n; i++) {
                p.z[i] += kickZ * rng.nextGaussian();
            }
        }
        field.advanceAmplitudes(rng);
    }

    /** Advances the first n particles by the drift only (no noise, amplitudes held): for tests of the map. */
    public void driftOnly(ShearModeField field, ParticleBlock p, int n) {
        integrator.drift(field, p, n, dt);
    }
}
