package org.eddycast.field;

import java.util.Locale;
import java.util.random.RandomGenerator;

/**
 * The steady Beltrami flow u = (A sin kz + C cos ky, B sin kx + A cos kz, C sin ky + B cos kx), whose curl
 * is k u (Dombre, Frisch, Greene, Henon, Mehr and Soward 1986, "Chaotic streamlines in the ABC flows",
 * J. Fluid Mech. 167:353-391). In units k = 1 with A, B, C relative to a velocity scale U.
 *
 * <p>It is three shear modes: along z, a = (0, A, 0) and b = (A, 0, 0); along y, a = (C, 0, 0) and
 * b = (0, 0, C); along x, a = (0, 0, B) and b = (0, B, 0).
 */
public final class BeltramiFlow implements FieldModel {

    private final double a;
    private final double b;
    private final double c;

    public BeltramiFlow(double a, double b, double c) {
        for (double v : new double[] {a, b, c}) {
            if (!Double.isFinite(v)) {
                throw new IllegalArgumentException("Beltrami amplitudes must be finite; got " + v);
            }
        }
        this.a = a;
        this.b = b;
        this.c = c;
    }

    @Override
    public int dimensions() {
        return 3;
    }

    @Override
    public int modeCount() {
        return 3;
    }

    @Override
    public void realize(ShearModeField target, RandomGenerator rng) {
        double inf = Double.POSITIVE_INFINITY;
        target.setMode(0, new double[] {0, 0, 1}, new double[] {1, 0, 0}, new double[] {0, 1, 0}, 0, inf);
        target.setCoefficients(0, 0, a, a, 0);
        target.setMode(1, new double[] {0, 1, 0}, new double[] {1, 0, 0}, new double[] {0, 0, 1}, 0, inf);
        target.setCoefficients(1, c, 0, 0, c);
        target.setMode(2, new double[] {1, 0, 0}, new double[] {0, 1, 0}, new double[] {0, 0, 1}, 0, inf);
        target.setCoefficients(2, 0, b, b, 0);
    }

    @Override
    public double componentVariance(int axis) {
        double[] v = {(a * a + c * c) / 2, (b * b + a * a) / 2, (c * c + b * b) / 2};
        return v[axis];
    }

    @Override
    public double startRegion() {
        return 2 * Math.PI;
    }

    @Override
    public double shortestTimeScale() {
        return 1.0 / Math.max(Math.abs(a), Math.max(Math.abs(b), Math.abs(c)));
    }

    @Override
    public String describe() {
        return String.format(Locale.ROOT, "steady Beltrami flow, A = %.4g, B = %.4g, C = %.4g", a, b, c);
    }
}
