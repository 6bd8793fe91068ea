package org.eddycast.field;

/**
 * Many realizations of a sum of shear modes side by side, one per lane, laid out [mode][quantity][lane] so that a
 * vector kernel reads mode m of consecutive lanes from consecutive memory: the layout for particles that each carry
 * their own realization. Amplitudes follow the exact Ornstein-Uhlenbeck transition of {@link ShearModeField}
 * lane by lane.
 *
 * <p>A mutable workspace owned by one thread: the kernels read its arrays directly. Memory: 21 doubles per mode
 * and lane (about 690 kB for 64 modes and 64 lanes).
 */
public final class ModeLanes {

    private final int dimensions;
    private final int modes;
    private final int width;
    /** Quantities per mode and lane, in this order within each mode's record. */
    static final int KX = 0;
    static final int KY = 1;
    static final int KZ = 2;
    static final int AX = 3;
    static final int AY = 4;
    static final int AZ = 5;
    static final int BX = 6;
    static final int BY = 7;
    static final int BZ = 8;
    static final int E1X = 9;
    static final int E1Y = 10;
    static final int E1Z = 11;
    static final int E2X = 12;
    static final int E2Y = 13;
    static final int E2Z = 14;
    static final int ALPHA1 = 15;
    static final int ALPHA2 = 16;
    static final int BETA1 = 17;
    static final int BETA2 = 18;
    static final int DECAY = 19;
    static final int KICK = 20;
    static final int FIELDS = 21;

    /**
     * Every quantity, laid out [mode][quantity][lane]: quantity q of mode m for lane i is at
     * (m * FIELDS + q) * width + i. One array rather than one per quantity, so that the quantities a kernel
     * reads together lie a lane row apart instead of a whole array apart (arrays of equal power-of-two size
     * would all map to the same few cache sets).
     */
    final double[] data;

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
        data = new double[modes * FIELDS * width];
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
            field.copyMode(m, data, m * FIELDS * width + lane, width);
        }
    }

    /** Mode m's current amplitudes in the lane, copied into a and b (length 3). */
    public void amplitudes(int lane, int m, double[] a, double[] b) {
        int j = m * FIELDS * width + lane;
        a[0] = data[j + AX * width];
        a[1] = data[j + AY * width];
        a[2] = data[j + AZ * width];
        b[0] = data[j + BX * width];
        b[1] = data[j + BY * width];
        b[2] = data[j + BZ * width];
    }
}
