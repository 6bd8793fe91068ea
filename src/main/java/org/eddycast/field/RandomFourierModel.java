package org.eddycast.field;

import java.util.Locale;
import java.util.random.RandomGenerator;

/**
 * An isotropic random Fourier velocity field with a prescribed energy spectrum and an Ornstein-Uhlenbeck
 * time correlation, in units where the longitudinal integral length and the rms velocity per component
 * are one.
 *
 * <p>Kinematic simulation in the sense of Kraichnan (1970, "Diffusion by a random velocity field", Phys.
 * Fluids 13:22-31) and Fung, Hunt, Malik and Perkins (1992, "Kinematic simulation of homogeneous turbulence by
 * unsteady random Fourier modes", J. Fluid Mech. 236:281-318): mode m has a wavenumber drawn from bin m of a
 * {@link SpectrumTable}, a direction uniform on the sphere (circle), and cos and sin amplitudes that are
 * isotropic Gaussian vectors in the plane normal to it. With d dimensions, each coefficient's variance is
 * sigma_m^2 = d w_m / (d - 1) for energy fraction w_m, so that every velocity component has unit variance in
 * expectation. All modes share one correlation time tau (the Kubo number u' tau / L in these units), or are
 * frozen when tau is infinite.
 */
public final class RandomFourierModel implements FieldModel {

    private final SpectrumTable spectrum;
    private final double correlationTime;
    private final String shapeDescription;

    /**
     * @param spectrum        the discretised spectrum (one mode per bin)
     * @param correlationTime dimensionless correlation time (Kubo number), positive, or infinite for frozen
     * @param shapeDescription the spectrum shape's description, for reports
     */
    public RandomFourierModel(SpectrumTable spectrum, double correlationTime, String shapeDescription) {
        if (!(correlationTime > 0)) {
            throw new IllegalArgumentException("correlation time must be positive or infinite; got " + correlationTime);
        }
        this.spectrum = spectrum;
        this.correlationTime = correlationTime;
        this.shapeDescription = shapeDescription;
    }

    public SpectrumTable spectrum() {
        return spectrum;
    }

    public double correlationTime() {
        return correlationTime;
    }

    @Override
    public int dimensions() {
        return spectrum.dimensions();
    }

    @Override
    public int modeCount() {
        return spectrum.bins();
    }

    @Override
    public void realize(ShearModeField target, RandomGenerator rng) {
        int d = dimensions();
        double[] k = new double[3];
        double[] e1 = new double[3];
        double[] e2 = new double[3];
        for (int m = 0; m < modeCount(); m++) {
            double magnitude = spectrum.sampleWavenumber(m, rng.nextDouble());
            double sigma = Math.sqrt(d * spectrum.weight(m) / (d - 1.0));
            double phi = 2 * Math.PI * rng.nextDouble();
            if (d == 2) {
                double c = Math.cos(phi);
                double s = Math.sin(phi);
                k[0] = magnitude * c;
                k[1] = magnitude * s;
                e1[0] = -s;
                e1[1] = c;
                target.setMode(m, k, e1, null, sigma, correlationTime);
            } else {
                double cz = 2 * rng.nextDouble() - 1;
                double r = Math.sqrt(Math.max(0, 1 - cz * cz));
                double ux = r * Math.cos(phi);
                double uy = r * Math.sin(phi);
                k[0] = magnitude * ux;
                k[1] = magnitude * uy;
                k[2] = magnitude * cz;
                unitNormal(ux, uy, cz, e1);
                // e2 = khat x e1
                e2[0] = uy * e1[2] - cz * e1[1];
                e2[1] = cz * e1[0] - ux * e1[2];
                e2[2] = ux * e1[1] - uy * e1[0];
                target.setMode(m, k, e1, e2, sigma, correlationTime);
            }
        }
        target.drawStationaryCoefficients(rng);
    }

    /** A unit vector normal to the unit vector (ux, uy, uz). */
    static void unitNormal(double ux, double uy, double uz, double[] out) {
        // Project the coordinate axis least aligned with u onto the plane normal to u.
        double ax = 0;
        double ay = 0;
        double az = 0;
        if (Math.abs(ux) <= Math.abs(uy) && Math.abs(ux) <= Math.abs(uz)) {
            ax = 1;
        } else if (Math.abs(uy) <= Math.abs(uz)) {
            ay = 1;
        } else {
            az = 1;
        }
        double dot = ax * ux + ay * uy + az * uz;
        double nx = ax - dot * ux;
        double ny = ay - dot * uy;
        double nz = az - dot * uz;
        double norm = Math.sqrt(nx * nx + ny * ny + nz * nz);
        out[0] = nx / norm;
        out[1] = ny / norm;
        out[2] = nz / norm;
    }

    @Override
    public double componentVariance(int axis) {
        return 1.0;
    }

    @Override
    public double startRegion() {
        return 16.0;
    }

    /**
     * The smaller of the correlation time and the inverse rms velocity gradient,
     * 1 / sqrt(sum_m k_m^2 &lt;|a_m|^2 + |b_m|^2&gt; / 2) with the bin's mean wavenumber: the time over which
     * the smallest energetic eddies deform a particle's neighbourhood (the Kolmogorov time for a spectrum
     * that reaches the dissipation range).
     */
    @Override
    public double shortestTimeScale() {
        return Math.min(correlationTime, spectrum.inverseRmsGradient());
    }

    @Override
    public String describe() {
        return String.format(Locale.ROOT, "random Fourier field, %dD, %d modes, %s, %s", dimensions(), modeCount(),
                shapeDescription, Double.isInfinite(correlationTime) ? "frozen in time"
                        : String.format(Locale.ROOT, "Kubo number %.4g", correlationTime));
    }
}
