package org.eddycast.particles;

import java.util.Arrays;
import java.util.Locale;
import org.eddycast.field.ModeLanes;
import org.eddycast.field.ShearKernel;
import org.eddycast.field.ShearModeField;

/**
 * The drift part of one time step for particles in a sum of shear modes, with the amplitudes held at their
 * values at the start of the step. The Brownian step and the amplitude update follow in the
 * {@link ParticleStepper}.
 *
 * <p>The splitting schemes compose the exact flows of the single modes: each substep is a shear with unit
 * Jacobian determinant, so volume is preserved to round-off (McLachlan and Quispel 2002, "Splitting methods",
 * Acta Numerica 11:341-434). Lie applies the modes once in order (first order); Strang applies them forward
 * with half steps and back with half steps, the middle mode merged into one full step (second order in the
 * drift, 2M - 1 shears per step). Euler-Maruyama evaluates the full velocity at the start point and is kept
 * as a baseline (Kloeden and Platen 1992, Numerical Solution of Stochastic Differential Equations, Springer).
 */
public enum Integrator {

    EULER_MARUYAMA("euler") {
        @Override
        void drift(ShearKernel kernel, ShearModeField field, ParticleBlock p, int n, double dt) {
            Arrays.fill(p.vx, 0, n, 0.0);
            Arrays.fill(p.vy, 0, n, 0.0);
            Arrays.fill(p.vz, 0, n, 0.0);
            for (int m = 0; m < field.modes(); m++) {
                kernel.addVelocity(field, m, p.x, p.y, p.z, n, p.vx, p.vy, p.vz);
            }
            move(p, n, dt);
        }

        @Override
        void drift(ShearKernel kernel, ModeLanes lanes, ParticleBlock p, double dt) {
            int n = lanes.width();
            Arrays.fill(p.vx, 0, n, 0.0);
            Arrays.fill(p.vy, 0, n, 0.0);
            Arrays.fill(p.vz, 0, n, 0.0);
            for (int m = 0; m < lanes.modes(); m++) {
                kernel.addVelocity(lanes, m, p.x, p.y, p.z, p.vx, p.vy, p.vz);
            }
            move(p, n, dt);
        }

        private void move(ParticleBlock p, int n, double dt) {
            for (int i = 0; i < n; i++) {
                p.x[i] += dt * p.vx[i];
                p.y[i] += dt * p.vy[i];
                p.z[i] += dt * p.vz[i];
            }
        }
    },

    LIE("lie") {
        @Override
        void drift(ShearKernel kernel, ShearModeField field, ParticleBlock p, int n, double dt) {
            for (int m = 0; m < field.modes(); m++) {
                kernel.shear(field, m, dt, p.x, p.y, p.z, n);
            }
        }

        @Override
        void drift(ShearKernel kernel, ModeLanes lanes, ParticleBlock p, double dt) {
            for (int m = 0; m < lanes.modes(); m++) {
                kernel.shear(lanes, m, dt, p.x, p.y, p.z);
            }
        }
    },

    STRANG("strang") {
        @Override
        void drift(ShearKernel kernel, ShearModeField field, ParticleBlock p, int n, double dt) {
            int last = field.modes() - 1;
            double half = 0.5 * dt;
            for (int m = 0; m < last; m++) {
                kernel.shear(field, m, half, p.x, p.y, p.z, n);
            }
            kernel.shear(field, last, dt, p.x, p.y, p.z, n);
            for (int m = last - 1; m >= 0; m--) {
                kernel.shear(field, m, half, p.x, p.y, p.z, n);
            }
        }

        @Override
        void drift(ShearKernel kernel, ModeLanes lanes, ParticleBlock p, double dt) {
            int last = lanes.modes() - 1;
            double half = 0.5 * dt;
            for (int m = 0; m < last; m++) {
                kernel.shear(lanes, m, half, p.x, p.y, p.z);
            }
            kernel.shear(lanes, last, dt, p.x, p.y, p.z);
            for (int m = last - 1; m >= 0; m--) {
                kernel.shear(lanes, m, half, p.x, p.y, p.z);
            }
        }
    };

    private final String key;

    Integrator(String key) {
        this.key = key;
    }

    /** The name used in scenario files and on the command line. */
    public String key() {
        return key;
    }

    /** True for the schemes whose every substep preserves volume. */
    public boolean volumePreserving() {
        return this != EULER_MARUYAMA;
    }

    /** The integrator for a scenario-file name, or null if there is none. */
    public static Integrator fromKey(String key) {
        for (Integrator i : values()) {
            if (i.key.equals(key.toLowerCase(Locale.ROOT))) {
                return i;
            }
        }
        return null;
    }

    /** Advances the first n particles of the block, sharing one realization, by the drift over dt. */
    abstract void drift(ShearKernel kernel, ShearModeField field, ParticleBlock p, int n, double dt);

    /** Advances particle i of the block in lane i's own realization, every lane, by the drift over dt. */
    abstract void drift(ShearKernel kernel, ModeLanes lanes, ParticleBlock p, double dt);
}
