package org.eddycast.particles;

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
 * with half steps and back with half steps, the middle mode's two halves making one full step (second order
 * in the drift, 2M shear evaluations per step). Euler-Maruyama evaluates the full velocity at the start point
 * and is kept as a baseline (Kloeden and Platen 1992, Numerical Solution of Stochastic Differential Equations,
 * Springer).
 */
public enum Integrator {

    EULER_MARUYAMA("euler") {
        @Override
        void drift(ShearKernel kernel, ShearModeField field, ParticleBlock p, int n) {
            kernel.applyAtOnce(field, p.x, p.y, p.z, n);
        }

        @Override
        void drift(ShearKernel kernel, ModeLanes lanes, ParticleBlock p) {
            kernel.applyAtOnce(lanes, p.x, p.y, p.z);
        }
    },

    LIE("lie") {
        @Override
        void drift(ShearKernel kernel, ShearModeField field, ParticleBlock p, int n) {
            kernel.applyInTurn(field, 0, field.modes() - 1, p.x, p.y, p.z, n);
        }

        @Override
        void drift(ShearKernel kernel, ModeLanes lanes, ParticleBlock p) {
            kernel.applyInTurn(lanes, 0, lanes.modes() - 1, p.x, p.y, p.z);
        }
    },

    /**
     * Forward and back with half steps: the middle mode's two half steps make its exact full step, since a
     * shear leaves its own phase unchanged, so this is the symmetric composition with 2M - 1 distinct shears
     * (the middle one computed as two halves).
     */
    STRANG("strang") {
        @Override
        void drift(ShearKernel kernel, ShearModeField field, ParticleBlock p, int n) {
            int last = field.modes() - 1;
            kernel.applyInTurn(field, 0, last, p.x, p.y, p.z, n);
            kernel.applyInTurn(field, last, 0, p.x, p.y, p.z, n);
        }

        @Override
        void drift(ShearKernel kernel, ModeLanes lanes, ParticleBlock p) {
            int last = lanes.modes() - 1;
            kernel.applyInTurn(lanes, 0, last, p.x, p.y, p.z);
            kernel.applyInTurn(lanes, last, 0, p.x, p.y, p.z);
        }

        @Override
        double stepScale(double dt) {
            return 0.5 * dt;
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

    /** The substep h the stored amplitudes must carry for this scheme's drift over dt. */
    double stepScale(double dt) {
        return dt;
    }

    /**
     * Advances the first n particles of the block, sharing one realization, by the drift over the step the
     * field's amplitudes are scaled for ({@link #stepScale}).
     */
    abstract void drift(ShearKernel kernel, ShearModeField field, ParticleBlock p, int n);

    /** The same for particle i of the block in lane i's own realization, every lane. */
    abstract void drift(ShearKernel kernel, ModeLanes lanes, ParticleBlock p);
}
