package org.eddycast.field;

/**
 * The kernel in plain scalar loops with our {@link FastSinCos}: the path when the Vector API module is absent.
 * The sines and cosines of one mode for all points are computed in one pass into scratch arrays, then applied.
 */
public class ScalarShearKernel implements ShearKernel {

    private double[] phase = new double[0];
    private double[] sin = new double[0];
    private double[] cos = new double[0];

    /** Fills sin and cos of the phases 0..n-1; the reference kernel uses Math.sin and Math.cos instead. */
    void sinCos(double[] p, double[] s, double[] c, int n) {
        FastSinCos.sinCos(p, s, c, n);
    }

    private void ensure(int n) {
        if (phase.length < n) {
            phase = new double[n];
            sin = new double[n];
            cos = new double[n];
        }
    }

    @Override
    public void shear(ShearModeField f, int m, double h, double[] x, double[] y, double[] z, int n) {
        apply(f, m, h, x, y, z, n, x, y, z);
    }

    @Override
    public void addVelocity(ShearModeField f, int m, double[] x, double[] y, double[] z, int n,
                            double[] vx, double[] vy, double[] vz) {
        apply(f, m, 1.0, x, y, z, n, vx, vy, vz);
    }

    /**
     * Adds h times mode m's velocity at (x, y, z) to (ox, oy, oz): the shear when the output is the position
     * itself (every phase is taken before any point moves), the velocity sum when h = 1.
     */
    private void apply(ShearModeField f, int m, double h, double[] x, double[] y, double[] z, int n,
                       double[] ox, double[] oy, double[] oz) {
        ensure(n);
        double k1 = f.kx[m];
        double k2 = f.ky[m];
        double k3 = f.kz[m];
        for (int i = 0; i < n; i++) {
            phase[i] = k1 * x[i] + k2 * y[i] + k3 * z[i];
        }
        sinCos(phase, sin, cos, n);
        double hax = h * f.ax[m];
        double hay = h * f.ay[m];
        double haz = h * f.az[m];
        double hbx = h * f.bx[m];
        double hby = h * f.by[m];
        double hbz = h * f.bz[m];
        for (int i = 0; i < n; i++) {
            ox[i] += hax * cos[i] + hbx * sin[i];
            oy[i] += hay * cos[i] + hby * sin[i];
            oz[i] += haz * cos[i] + hbz * sin[i];
        }
    }

    @Override
    public void shear(ModeLanes f, int m, double h, double[] x, double[] y, double[] z) {
        apply(f, m, h, x, y, z, x, y, z);
    }

    @Override
    public void addVelocity(ModeLanes f, int m, double[] x, double[] y, double[] z,
                            double[] vx, double[] vy, double[] vz) {
        apply(f, m, 1.0, x, y, z, vx, vy, vz);
    }

    /** The same for one realization per lane (mode parameters laid out [mode][quantity][lane]). */
    private void apply(ModeLanes f, int m, double h, double[] x, double[] y, double[] z,
                       double[] ox, double[] oy, double[] oz) {
        int n = f.width();
        ensure(n);
        int o = m * ModeLanes.FIELDS * n;
        for (int i = 0; i < n; i++) {
            int j = o + i;
            phase[i] = f.data[j + ModeLanes.KX * n] * x[i] + f.data[j + ModeLanes.KY * n] * y[i]
                    + f.data[j + ModeLanes.KZ * n] * z[i];
        }
        sinCos(phase, sin, cos, n);
        for (int i = 0; i < n; i++) {
            ox[i] += h * (f.data[o + i + ModeLanes.AX * n] * cos[i] + f.data[o + i + ModeLanes.BX * n] * sin[i]);
            oy[i] += h * (f.data[o + i + ModeLanes.AY * n] * cos[i] + f.data[o + i + ModeLanes.BY * n] * sin[i]);
            oz[i] += h * (f.data[o + i + ModeLanes.AZ * n] * cos[i] + f.data[o + i + ModeLanes.BZ * n] * sin[i]);
        }
    }

    @Override
    public void advance(ModeLanes f, int m, double[] normals) {
        int n = f.width();
        int o = m * ModeLanes.FIELDS * n;
        for (int i = 0; i < n; i++) {
            int j = o + i;
            double rho = f.data[j + ModeLanes.DECAY * n];
            double k = f.data[j + ModeLanes.KICK * n];
            double a1 = rho * f.data[j + ModeLanes.ALPHA1 * n] + k * normals[i];
            double b1 = rho * f.data[j + ModeLanes.BETA1 * n] + k * normals[n + i];
            double a2 = rho * f.data[j + ModeLanes.ALPHA2 * n] + k * normals[2 * n + i];
            double b2 = rho * f.data[j + ModeLanes.BETA2 * n] + k * normals[3 * n + i];
            f.data[j + ModeLanes.ALPHA1 * n] = a1;
            f.data[j + ModeLanes.BETA1 * n] = b1;
            f.data[j + ModeLanes.ALPHA2 * n] = a2;
            f.data[j + ModeLanes.BETA2 * n] = b2;
            f.data[j + ModeLanes.AX * n] = a1 * f.data[j + ModeLanes.E1X * n] + a2 * f.data[j + ModeLanes.E2X * n];
            f.data[j + ModeLanes.AY * n] = a1 * f.data[j + ModeLanes.E1Y * n] + a2 * f.data[j + ModeLanes.E2Y * n];
            f.data[j + ModeLanes.AZ * n] = a1 * f.data[j + ModeLanes.E1Z * n] + a2 * f.data[j + ModeLanes.E2Z * n];
            f.data[j + ModeLanes.BX * n] = b1 * f.data[j + ModeLanes.E1X * n] + b2 * f.data[j + ModeLanes.E2X * n];
            f.data[j + ModeLanes.BY * n] = b1 * f.data[j + ModeLanes.E1Y * n] + b2 * f.data[j + ModeLanes.E2Y * n];
            f.data[j + ModeLanes.BZ * n] = b1 * f.data[j + ModeLanes.E1Z * n] + b2 * f.data[j + ModeLanes.E2Z * n];
        }
    }

    @Override
    public String name() {
        return "scalar";
    }
}
