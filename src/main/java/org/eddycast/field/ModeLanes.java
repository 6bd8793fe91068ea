package org.eddycast.field;

/**
 * Many realizations of a sum of shear modes side by side, one per lane, laid out [mode][quantity][lane] so that a
 * vector kernel reads mode m of consecutive lanes from consecutive memory: the layout for particles that each carry
 * their own realization. Amplitudes follow the exact Ornstein-Uhlenbeck transition of {@link ShearModeField}
 * lane by lane. The kernels form the amplitudes alpha1 e1 + alpha2 e2 and beta1 e1 + beta2 e2 as they go,
 * which costs less than reading stored amplitudes from memory; the basis vectors e1 and e2 are stored
 * multiplied by the step scale h, the substep of the scheme that reads them, so that the kernels need no
 * multiplication by h in their inner loops.
 *
 * <p>A mutable workspace owned by one thread: the kernels read its arrays directly. Memory: 15 doubles per mode
 * and lane (about 490 kB for 64 modes and 64 lanes).
 */
public final class ModeLanes {

    private final int dimensions;
    private final int modes;
    private final int width;
    /** Quantities per mode and lane, in this order within each mode's record; the wavevector in turns (k / 2 pi). */
    static final int KX = 0;
    static final int KY = 1;
    static final int KZ = 2;
    static final int E1X = 3;
    static final int E1Y = 4;
    static final int E1Z = 5;
    static final int E2X = 6;
    static final int E2Y = 7;
    static final int E2Z = 8;
    static final int ALPHA1 = 9;
    static final int ALPHA2 = 10;
    static final int BETA1 = 11;
    static final int BETA2 = 12;
    static final int DECAY = 13;
    static final int KICK = 14;
    static final int FIELDS = 15;

    /**
     * Every quantity, laid out [mode][quantity][lane]: quantity q of mode m for lane i is at
     * (m * FIELDS + q) * width + i. One array rather than one per quantity, so that the quantities a kernel
     * reads together lie a lane row apart instead of a whole array apart (arrays of equal power-of-two size
     * would all map to the same few cache sets).
     */
    final double[] data;
    private double stepScale = 1.0;

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

    /** Doubles held by lanes of this many modes and lanes. */
    public static long doublesFor(int modes, int width) {
        return (long) modes * FIELDS * width;
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
            scaleBasis(m * FIELDS * width + lane, stepScale);
        }
    }

    /** Stores the basis vectors multiplied by h from now on (rescaled by the ratio of the new and old h). */
    public void setStepScale(double h) {
        if (h == stepScale) {
            return;
        }
        double ratio = h / stepScale;
        stepScale = h;
        for (int m = 0; m < modes; m++) {
            for (int lane = 0; lane < width; lane++) {
                scaleBasis(m * FIELDS * width + lane, ratio);
            }
        }
    }

    /** Multiplies the basis vectors of the record at slot j by the factor. */
    private void scaleBasis(int j, double factor) {
        for (int q = E1X; q <= E2Z; q++) {
            data[j + q * width] *= factor;
        }
    }
}
