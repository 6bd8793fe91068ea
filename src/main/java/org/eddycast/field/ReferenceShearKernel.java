package org.eddycast.field;

/**
 * The scalar kernel with the JDK's {@link Math#sin} and {@link Math#cos}: the slow reference against which
 * the fast kernels' answers are tested.
 */
public final class ReferenceShearKernel extends ScalarShearKernel {

    @Override
    void sinCos(double[] p, double[] s, double[] c, int n) {
        for (int i = 0; i < n; i++) {
            s[i] = Math.sin(p[i]);
            c[i] = Math.cos(p[i]);
        }
    }

    @Override
    public String name() {
        return "reference";
    }
}
