package org.eddycast.engine;

/**
 * The physical units of a dimensionless case: a length and a velocity (and so a time and a diffusivity).
 *
 * @param length   metres per unit length
 * @param velocity metres per second per unit velocity
 */
public record Scales(double length, double velocity) {

    /** Seconds per unit time. */
    public double time() {
        return length / velocity;
    }

    /** Square metres per second per unit diffusivity. */
    public double diffusivity() {
        return length * velocity;
    }
}
