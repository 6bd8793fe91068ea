package org.eddycast.field;

/**
 * The scalar kernel with the JDK's {@link Math#sin} and {@link Math#cos}: the slow reference against which
 * the fast kernels' answers are tested.
 */
public final class ReferenceShearKernel extends ScalarShearKernel {

    @Override
    double sine(double phase) {
        return Math.sin(phase);
    }

    @Override
    double cosine(double phase) {
        return Math.cos(phase);
    }

    @Override
    public String name() {
        return "reference";
    }
}
