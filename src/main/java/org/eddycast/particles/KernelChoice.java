package org.eddycast.particles;

import org.eddycast.field.ReferenceShearKernel;
import org.eddycast.field.ScalarShearKernel;
import org.eddycast.field.ShearKernel;
import org.eddycast.field.VectorShearKernel;

/**
 * Which implementation of the inner loops a run uses. {@link #fastest()} takes the Vector API when the module
 * jdk.incubator.vector is present (run with {@code --add-modules jdk.incubator.vector}) and the scalar loops
 * otherwise, saying so once on standard error. All choices compute the same model; they differ in speed and in
 * rounding, so the same seed gives statistically equal, not bitwise equal, answers across choices.
 */
public enum KernelChoice {

    /** Vector API kernel and normal generator. */
    VECTOR {
        @Override
        public ShearKernel newShearKernel() {
            return new VectorShearKernel();
        }

        @Override
        public NormalStream newNormalStream() {
            return new VectorNormalStream();
        }
    },

    /** Plain scalar loops with our polynomial sine and cosine. */
    SCALAR {
        @Override
        public ShearKernel newShearKernel() {
            return new ScalarShearKernel();
        }

        @Override
        public NormalStream newNormalStream() {
            return new ScalarNormalStream();
        }
    },

    /** Plain scalar loops with {@link Math#sin} and {@link Math#cos}: the slow reference for tests. */
    REFERENCE {
        @Override
        public ShearKernel newShearKernel() {
            return new ReferenceShearKernel();
        }

        @Override
        public NormalStream newNormalStream() {
            return new ScalarNormalStream();
        }
    };

    private static volatile KernelChoice fastest;

    /** A fresh kernel for one thread. */
    public abstract ShearKernel newShearKernel();

    /** A fresh, unseeded normal generator for one thread. */
    public abstract NormalStream newNormalStream();

    /** True when the module jdk.incubator.vector is in the boot layer. */
    public static boolean vectorModulePresent() {
        return ModuleLayer.boot().findModule("jdk.incubator.vector").isPresent();
    }

    /** The fastest choice on this machine; the first call notes a scalar fallback on standard error. */
    public static KernelChoice fastest() {
        KernelChoice f = fastest;
        if (f == null) {
            synchronized (KernelChoice.class) {
                f = fastest;
                if (f == null) {
                    f = pick();
                    fastest = f;
                }
            }
        }
        return f;
    }

    private static KernelChoice pick() {
        if (!vectorModulePresent()) {
            System.err.println("note: the module jdk.incubator.vector is not available, so the particle kernel "
                    + "runs on its scalar path (several times slower); start Java with "
                    + "--add-modules jdk.incubator.vector for full speed");
            return SCALAR;
        }
        if (!VectorNormalStream.fits()) {
            System.err.println("note: this machine's vector length does not suit the vector kernel; the "
                    + "particle kernel runs on its scalar path");
            return SCALAR;
        }
        return VECTOR;
    }
}
