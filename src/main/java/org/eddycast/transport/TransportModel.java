package org.eddycast.transport;

/**
 * The large scale of a flow, in physical units: a bounded region, the mean velocity in it, and a diagonal
 * turbulent diffusivity tensor that varies from point to point. The transport stage moves particles through
 * it ({@link RandomDisplacementScheme}).
 *
 * <p>Implementations are immutable and thread-safe; their methods write into arrays the caller owns, so the
 * particle loop allocates nothing. Coordinates are the model's own (x along a channel, or x, y across a tank
 * from its axis), stated in its javadoc.
 */
public interface TransportModel {

    /**
     * Writes what the step needs at a point: the mean velocity (m/s) into {@code out[0..2]}; the diagonal of the
     * diffusivity (K_xx, K_yy, K_zz in m^2/s, each at least 0) into {@code out[3..5]}; and the derivative of
     * each diagonal entry along its own axis (dK_xx/dx, dK_yy/dy, dK_zz/dz in m/s) into {@code out[6..8]}: the
     * drift that keeps a well-mixed tracer well mixed.
     */
    void evaluate(double x, double y, double z, double[] out);

    /** Writes the mean velocity alone into {@code out[0..2]} (the rest of out may be overwritten). */
    default void velocity(double x, double y, double z, double[] out) {
        evaluate(x, y, z, out);
    }

    /** Writes the diffusivity's diagonal alone into {@code out[3..5]} (the rest of out may be overwritten). */
    default void diffusivity(double x, double y, double z, double[] out) {
        evaluate(x, y, z, out);
    }

    /** Maps a point that has left the region back inside it by mirror reflection at the walls, in place. */
    void reflect(double[] point);

    /** True when the point lies inside the region (walls included). */
    boolean contains(double x, double y, double z);
}
