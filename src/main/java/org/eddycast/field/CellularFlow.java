package org.eddycast.field;

import java.util.random.RandomGenerator;

/**
 * The steady cellular vortex array with stream function psi = (U/k) sin(k x) sin(k y), in units U = k = 1:
 * u = (sin x cos y, -cos x sin y[, 0]).
 *
 * <p>As a sum of two shear modes: sin x cos y = (sin(x+y) + sin(x-y))/2 and cos x sin y =
 * (sin(x+y) - sin(x-y))/2, so u = b1 sin(x + y) + b2 sin(x - y) with b1 = (1, -1)/2 normal to (1, 1) and
 * b2 = (1, 1)/2 normal to (1, -1).
 *
 * <p>Its effective diffusivity at large Peclet number follows D = c sqrt(U D0 / k) with c near 1.07
 * (Shraiman 1987, "Diffusive transport in a Rayleigh-Benard convection cell", Phys. Rev. A 36:261-267;
 * Rosenbluth, Berk, Doxas and Horton 1987, "Effective diffusion in laminar convective flows", Phys. Fluids
 * 30:2636-2647; reviewed by Isichenko 1992, Rev. Mod. Phys. 64:961-1043).
 */
public final class CellularFlow implements FieldModel {

    private final int dimensions;

    public CellularFlow(int dimensions) {
        if (dimensions != 2 && dimensions != 3) {
            throw new IllegalArgumentException("dimensions must be 2 or 3; got " + dimensions);
        }
        this.dimensions = dimensions;
    }

    @Override
    public int dimensions() {
        return dimensions;
    }

    @Override
    public int modeCount() {
        return 2;
    }

    @Override
    public void realize(ShearModeField target, RandomGenerator rng) {
        double h = Math.sqrt(0.5);
        target.setMode(0, new double[] {1, 1, 0}, new double[] {h, -h, 0}, null, 0.0, Double.POSITIVE_INFINITY);
        target.setCoefficients(0, 0.0, 0.0, h, 0.0);
        target.setMode(1, new double[] {1, -1, 0}, new double[] {h, h, 0}, null, 0.0, Double.POSITIVE_INFINITY);
        target.setCoefficients(1, 0.0, 0.0, h, 0.0);
    }

    @Override
    public double componentVariance(int axis) {
        return axis < 2 ? 0.25 : 0.0;
    }

    @Override
    public double startRegion() {
        return 2 * Math.PI;
    }

    @Override
    public double shortestTimeScale() {
        return 1.0;
    }

    @Override
    public String describe() {
        return "steady cellular vortex array, psi = (U/k) sin(kx) sin(ky)";
    }
}
