package org.eddycast.field;

/**
 * Many realizations of a sum of shear modes side by side, one per lane, laid out [mode][lane] so that a vector
 * kernel reads mode m of consecutive lanes from consecutive memory: the layout for particles that each carry
 * their own realization. Amplitudes follow the exact Ornstein-Uhlenbeck transition of {@link ShearModeField}
 * lane by lane.
 *
 * <p>A mutable workspace owned by one thread: the kernels read its arrays directly. Memory: 25 doubles per mode
 * and lane (about 800 kB for 64 modes and 64 lanes).
 */
public final class ModeLanes {

    private final int dimensions;
    private final int modes;
    private final int width;
    final double[] kx;
    final double[] ky;
    final double[] kz;
    final double[] ax;
    final double[] ay;
    final double[] az;
    final double[] bx;
    final double[] by;
    final double[] bz;
    final double[] e1x;
    final double[] e1y;
    final double[] e1z;
    final double[] e2x;
    final double[] e2y;
    final double[] e2z;
    final double[] alpha1;
    final double[] alpha2;
    final double[] beta1;
    final double[] beta2;
    final double[] decay;
    final double[] kick;

    /**
     * @param dimensions 2 or 3
     * @param modes      modes per realization
     * @param width      lanes (realizations); the vector kernel needs a multiple of its vector length
     */
    public ModeLanes(int dimensions, int modes, int width) {
        if (width < 1) {
            throw new IllegalArgumentException("lane count must be at least 1; got " + width);
        }
        this.dimensions = dimensions;
        this.modes = modes;
        this.width = width;
        int n = modes * width;
        kx = new double[n];
        ky = new double[n];
        kz = new double[n];
        ax = new double[n];
        ay = new double[n];
        az = new double[n];
        bx = new double[n];
        by = new double[n];
        bz = new double[n];
        e1x = new double[n];
        e1y = new double[n];
        e1z = new double[n];
        e2x = new double[n];
        e2y = new double[n];
        e2z = new double[n];
        alpha1 = new double[n];
        alpha2 = new double[n];
        beta1 = new double[n];
        beta2 = new double[n];
        decay = new double[n];
        kick = new double[n];
    }

    public int dimensions() {
        return dimensions;
    }

    public int modes() {
        return modes;
    }

    public int width() {
        return width;
    }

    /** Copies a realization, prepared for its time step ({@link ShearModeField#prepareStep}), into the lane. */
    public void load(int lane, ShearModeField field) {
        if (field.modes() != modes || field.dimensions() != dimensions) {
            throw new IllegalArgumentException("field has " + field.modes() + " modes in " + field.dimensions()
                    + "D; the lanes hold " + modes + " in " + dimensions + "D");
        }
        for (int m = 0; m < modes; m++) {
            int j = m * width + lane;
            field.copyMode(m, this, j);
        }
    }

    /** Mode m's current amplitudes in the lane, copied into a and b (length 3). */
    public void amplitudes(int lane, int m, double[] a, double[] b) {
        int j = m * width + lane;
        a[0] = ax[j];
        a[1] = ay[j];
        a[2] = az[j];
        b[0] = bx[j];
        b[1] = by[j];
        b[2] = bz[j];
    }
}
