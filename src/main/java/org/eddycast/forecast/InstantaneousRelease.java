package org.eddycast.forecast;

/**
 * Concentration after an instantaneous release of mass M at a point, with constant diffusivities per axis:
 * C(x, y, z, t) = M p_x(x, t) p_y(y, t) p_z(z, t), each factor the density of one axis (free, one wall, two
 * walls). In free space this is the Gaussian puff
 * C = M / ((4 pi t)^(3/2) sqrt(Dx Dy Dz)) exp(-sum (x_i - x0_i)^2 / (4 D_i t)), whose peak is
 * M / ((2 pi)^(3/2) sx sy sz) with s_i = sqrt(2 D_i t)
 * (Crank 1975, The Mathematics of Diffusion, 2nd ed., Oxford University Press).
 *
 * <p>Units: M in kg (or any mass unit) gives C in that unit per m^3. Assumptions: passive, conservative
 * tracer; homogeneous turbulence described by constant eddy diffusivities; walls reflect (no loss). Because
 * the densities are positive and separate by axis, the peak over the domain is the product of the per-axis
 * peaks.
 *
 * @param mass released mass M, greater than 0
 * @param x    spreading along x
 * @param y    spreading along y
 * @param z    spreading along z
 */
public record InstantaneousRelease(double mass, AxisDensity x, AxisDensity y, AxisDensity z) {

    public InstantaneousRelease {
        Checks.positive("mass", mass, "kg");
        if (x == null || y == null || z == null) {
            throw new IllegalArgumentException("all three axes must be given");
        }
    }

    /** A Gaussian puff in free space. */
    public static InstantaneousRelease freeSpace(double mass, double[] release, double[] diffusivity) {
        double[] r = Checks.length("release", release, 3);
        double[] d = Checks.length("diffusivity", diffusivity, 3);
        return new InstantaneousRelease(mass,
                new FreeAxis(r[0], d[0]), new FreeAxis(r[1], d[1]), new FreeAxis(r[2], d[2]));
    }

    /**
     * A closed box [0, Lx] x [0, Ly] x [0, Lz] with reflecting walls, by the cosine series on every axis.
     */
    public static InstantaneousRelease closedBox(double mass, double[] size, double[] release,
                                                 double[] diffusivity) {
        double[] s = Checks.length("size", size, 3);
        double[] r = Checks.length("release", release, 3);
        double[] d = Checks.length("diffusivity", diffusivity, 3);
        return new InstantaneousRelease(mass,
                new TwoWallCosineAxis(0, s[0], r[0], d[0]),
                new TwoWallCosineAxis(0, s[1], r[1], d[1]),
                new TwoWallCosineAxis(0, s[2], r[2], d[2]));
    }

    /** Concentration at a point (mass unit per m^3), t in seconds, greater than 0. */
    public double concentration(double px, double py, double pz, double t) {
        return mass * x.density(px, t) * y.density(py, t) * z.density(pz, t);
    }

    /** The largest concentration anywhere in the domain at time t. */
    public double peakConcentration(double t) {
        return mass * x.peakDensity(t) * y.peakDensity(t) * z.peakDensity(t);
    }

    /** The smallest concentration anywhere in the domain at time t (0 when any axis is open). */
    public double lowestConcentration(double t) {
        return mass * x.lowestDensity(t) * y.lowestDensity(t) * z.lowestDensity(t);
    }

    /**
     * Peak of a Gaussian cloud of mass M with standard deviations sx, sy, sz (m):
     * M / ((2 pi)^(3/2) sx sy sz).
     */
    public static double gaussianPeak(double mass, double sx, double sy, double sz) {
        Checks.positive("mass", mass, "kg");
        Checks.positive("sx", sx, "m");
        Checks.positive("sy", sy, "m");
        Checks.positive("sz", sz, "m");
        return mass / (Math.pow(2.0 * Math.PI, 1.5) * sx * sy * sz);
    }
}
