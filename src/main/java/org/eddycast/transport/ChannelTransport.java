package org.eddycast.transport;

/**
 * A straight channel in uniform flow as a transport model. Coordinates: x downstream, y across from the left
 * water's edge (0 to W), z the elevation below the surface (0 at the surface, -h(y) at the bed).
 *
 * <p>The section's fields ({@link SectionFlow}) are tabulated on a grid in (y, zeta = 1 + z / h(y)) and
 * interpolated bilinearly; the drift terms dK_yy/dy (at fixed z) and dK_zz/dz come from centred differences of
 * the rules, not of the table. Particles reflect at the surface, the bed and the water's edges.
 */
public final class ChannelTransport implements TransportModel {

    private static final int NZ = 1024;
    private static final int DEPTH_POINTS = 1025;

    private final double width;
    private final double meanVelocity;
    private final int ny;
    private final boolean uniform;
    private final double depthIndexPerMetre;
    private final double rowsPerMetre;
    private final double[] depthTable = new double[DEPTH_POINTS];
    private final double[] u;
    private final double[] kx;
    private final double[] ky;
    private final double[] kz;
    private final double[] dky;
    private final double[] dkz;
    private final double[] sectionMeanDiffusivity = new double[3];

    /**
     * @param flow         the section's rules
     * @param meanVelocity U = Q / A (m/s), the velocity of the frame the cloud's moments are taken in
     */
    public ChannelTransport(SectionFlow flow, double meanVelocity) {
        this.width = flow.width();
        this.meanVelocity = meanVelocity;
        uniform = flow.uniformAcross();
        ny = uniform ? 2 : 129;
        depthIndexPerMetre = (DEPTH_POINTS - 1) / width;
        rowsPerMetre = (ny - 1) / width;
        for (int i = 0; i < DEPTH_POINTS; i++) {
            depthTable[i] = flow.depth(uniform ? 0.5 * width : width * i / (DEPTH_POINTS - 1));
        }
        u = new double[ny * NZ];
        kx = new double[ny * NZ];
        ky = new double[ny * NZ];
        kz = new double[ny * NZ];
        dky = new double[ny * NZ];
        dkz = new double[ny * NZ];
        double dy = width / (ny - 1);
        for (int a = 0; a < ny; a++) {
            double y = uniform ? 0.5 * width : a * dy;
            double h = flow.depth(y);
            for (int b = 0; b < NZ; b++) {
                double zeta = (double) b / (NZ - 1);
                int o = a * NZ + b;
                u[o] = flow.velocity(y, zeta);
                kx[o] = flow.diffusivity(0, y, zeta);
                ky[o] = flow.diffusivity(1, y, zeta);
                kz[o] = flow.diffusivity(2, y, zeta);
                double d = 1e-4;
                double lo = Math.max(0, zeta - d);
                double hi = Math.min(1, zeta + d);
                dkz[o] = (flow.diffusivity(2, y, hi) - flow.diffusivity(2, y, lo)) / ((hi - lo) * h);
                if (!uniform) {
                    double z = (zeta - 1) * h;
                    double yl = Math.max(0, y - 0.25 * dy);
                    double yr = Math.min(width, y + 0.25 * dy);
                    double kl = flow.diffusivity(1, yl, clampZeta(1 + z / flow.depth(yl)));
                    double kr = flow.diffusivity(1, yr, clampZeta(1 + z / flow.depth(yr)));
                    dky[o] = (kr - kl) / (yr - yl);
                }
            }
        }
        double[] out = new double[9];
        for (int axis = 0; axis < 3; axis++) {
            double sum = 0;
            double area = 0;
            for (int a = 0; a < DEPTH_POINTS; a++) {
                double y = width * a / (DEPTH_POINTS - 1);
                double depth = depthAt(y);
                for (int b = 0; b < 64; b++) {
                    evaluate(0, y, -depth * (b + 0.5) / 64, out);
                    sum += out[3 + axis] * depth / 64;
                }
                area += depth;
            }
            sectionMeanDiffusivity[axis] = sum / area;
        }
    }

    private static double clampZeta(double zeta) {
        return Math.max(0, Math.min(1, zeta));
    }
    /** Local depth (m) at y, as tabulated. */
    public double depthAt(double y) {
        if (uniform) {
            return depthTable[0];
        }
        double t = Math.max(0, Math.min(DEPTH_POINTS - 1, y * depthIndexPerMetre));
        int i = Math.min((int) t, DEPTH_POINTS - 2);
        double f = t - i;
        return depthTable[i] + f * (depthTable[i + 1] - depthTable[i]);
    }

    public double width() {
        return width;
    }

    public double meanVelocity() {
        return meanVelocity;
    }

    /** Area-weighted mean over the section of the diffusivity of an axis (m^2/s), molecular part included. */
    public double sectionMeanDiffusivity(int axis) {
        return sectionMeanDiffusivity[axis];
    }

    @Override
    public void evaluate(double x, double y, double z, double[] out) {
        double h = depthAt(y);
        double t = Math.max(0, Math.min(NZ - 1, (1 + z / h) * (NZ - 1)));
        int b = Math.min((int) t, NZ - 2);
        double fb = t - b;
        double gb = 1 - fb;
        out[1] = 0;
        out[2] = 0;
        out[6] = 0;
        if (uniform) {
            out[0] = gb * u[b] + fb * u[b + 1];
            out[3] = gb * kx[b] + fb * kx[b + 1];
            out[4] = gb * ky[b] + fb * ky[b + 1];
            out[5] = gb * kz[b] + fb * kz[b + 1];
            out[7] = 0;
            out[8] = gb * dkz[b] + fb * dkz[b + 1];
            return;
        }
        double s = Math.max(0, Math.min(ny - 1, y * rowsPerMetre));
        int a = Math.min((int) s, ny - 2);
        double fa = s - a;
        int o00 = a * NZ + b;
        int o10 = o00 + NZ;
        double w00 = (1 - fa) * gb;
        double w01 = (1 - fa) * fb;
        double w10 = fa * gb;
        double w11 = fa * fb;
        out[0] = w00 * u[o00] + w01 * u[o00 + 1] + w10 * u[o10] + w11 * u[o10 + 1];
        out[3] = w00 * kx[o00] + w01 * kx[o00 + 1] + w10 * kx[o10] + w11 * kx[o10 + 1];
        out[4] = w00 * ky[o00] + w01 * ky[o00 + 1] + w10 * ky[o10] + w11 * ky[o10 + 1];
        out[5] = w00 * kz[o00] + w01 * kz[o00 + 1] + w10 * kz[o10] + w11 * kz[o10 + 1];
        out[7] = w00 * dky[o00] + w01 * dky[o00 + 1] + w10 * dky[o10] + w11 * dky[o10 + 1];
        out[8] = w00 * dkz[o00] + w01 * dkz[o00 + 1] + w10 * dkz[o10] + w11 * dkz[o10 + 1];
    }

    /**
     * Mirrors a point that left the water back into it: at the banks across y, at the surface vertically, and at
     * the bed along the bed's normal (for a sloping bank a vertical mirror would let particles creep along it).
     */
    @Override
    public void reflect(double[] p) {
        double y = p[1];
        double z = p[2];
        if (y >= 0 && y <= width && z <= 0 && z >= -depthAt(y)) {
            return;
        }
        for (int i = 0; i < 6; i++) {
            if (y < 0) {
                y = -y;
            } else if (y > width) {
                y = 2 * width - y;
            }
            y = Math.max(0, Math.min(width, y));
            if (z > 0) {
                z = -z;
            }
            double h = depthAt(y);
            if (z >= -h) {
                break;
            }
            double slope = uniform ? 0 : depthSlopeAt(y);
            double norm2 = 1 + slope * slope;
            double below = (z + h) / norm2;
            y -= 2 * below * slope;
            z -= 2 * below;
        }
        y = Math.max(0, Math.min(width, y));
        p[1] = y;
        p[2] = Math.max(-depthAt(y), Math.min(0, z));
    }

    /** dh/dy at y from the depth table. */
    private double depthSlopeAt(double y) {
        double t = Math.max(0, Math.min(DEPTH_POINTS - 1, y * depthIndexPerMetre));
        int i = Math.min((int) t, DEPTH_POINTS - 2);
        return (depthTable[i + 1] - depthTable[i]) * depthIndexPerMetre;
    }

    @Override
    public boolean contains(double x, double y, double z) {
        return y >= 0 && y <= width && z <= 0 && z >= -depthAt(y);
    }
}
