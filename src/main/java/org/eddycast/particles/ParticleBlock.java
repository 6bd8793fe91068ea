package org.eddycast.particles;

/**
 * Positions of a block of particles as structure-of-arrays doubles, and their starting points. Owned by one
 * thread; nothing is allocated after construction.
 */
public final class ParticleBlock {

    final int size;
    final double[] x;
    final double[] y;
    final double[] z;
    final double[] x0;
    final double[] y0;
    final double[] z0;

    public ParticleBlock(int size) {
        if (size < 1) {
            throw new IllegalArgumentException("block size must be at least 1; got " + size);
        }
        this.size = size;
        x = new double[size];
        y = new double[size];
        z = new double[size];
        x0 = new double[size];
        y0 = new double[size];
        z0 = new double[size];
    }

    public int size() {
        return size;
    }

    /** Position of particle i, copied into out (length 3; z is 0 in two dimensions). */
    public void position(int i, double[] out) {
        out[0] = x[i];
        out[1] = y[i];
        out[2] = z[i];
    }

    /** Places particle i at p (length 3) and makes that its starting point. */
    public void place(int i, double[] p) {
        x[i] = p[0];
        y[i] = p[1];
        z[i] = p[2];
        x0[i] = p[0];
        y0[i] = p[1];
        z0[i] = p[2];
    }
}
