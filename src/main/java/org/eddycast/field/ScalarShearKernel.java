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
            x[i] += hax * cos[i] + hbx * sin[i];
            y[i] += hay * cos[i] + hby * sin[i];
            z[i] += haz * cos[i] + hbz * sin[i];
        }
    }

    @Override
    public void addVelocity(ShearModeField f, int m, double[] x, double[] y, double[] z, int n,
                            double[] vx, double[] vy, double[] vz) {
        ensure(n);
        double k1 = f.kx[m];
        double k2 = f.ky[m];
        double k3 = f.kz[m];
        for (int i = 0; i < n; i++) {
            phase[i] = k1 * x[i] + k2 * y[i] + k3 * z[i];
        }
        sinCos(phase, sin, cos, n);
        double a1 = f.ax[m];
        double a2 = f.ay[m];
        double a3 = f.az[m];
        double b1 = f.bx[m];
        double b2 = f.by[m];
        double b3 = f.bz[m];
        for (int i = 0; i < n; i++) {
            vx[i] += a1 * cos[i] + b1 * sin[i];
            vy[i] += a2 * cos[i] + b2 * sin[i];
            vz[i] += a3 * cos[i] + b3 * sin[i];
        }
    }

    @Override
    public void shear(ModeLanes f, int m, double h, double[] x, double[] y, double[] z) {
        int n = f.width();
        ensure(n);
        int o = m * n;
        for (int i = 0; i < n; i++) {
            phase[i] = f.kx[o + i] * x[i] + f.ky[o + i] * y[i] + f.kz[o + i] * z[i];
        }
        sinCos(phase, sin, cos, n);
        for (int i = 0; i < n; i++) {
            x[i] += h * (f.ax[o + i] * cos[i] + f.bx[o + i] * sin[i]);
            y[i] += h * (f.ay[o + i] * cos[i] + f.by[o + i] * sin[i]);
            z[i] += h * (f.az[o + i] * cos[i] + f.bz[o + i] * sin[i]);
        }
    }

    @Override
    public void addVelocity(ModeLanes f, int m, double[] x, double[] y, double[] z,
                            double[] vx, double[] vy, double[] vz) {
        int n = f.width();
        ensure(n);
        int o = m * n;
        for (int i = 0; i < n; i++) {
            phase[i] = f.kx[o + i] * x[i] + f.ky[o + i] * y[i] + f.kz[o + i] * z[i];
        }
        sinCos(phase, sin, cos, n);
        for (int i = 0; i < n; i++) {
            vx[i] += f.ax[o + i] * cos[i] + f.bx[o + i] * sin[i];
            vy[i] += f.ay[o + i] * cos[i] + f.by[o + i] * sin[i];
            vz[i] += f.az[o + i] * cos[i] + f.bz[o + i] * sin[i];
        }
    }

    @Override
    public void advance(ModeLanes f, int m, double[] normals) {
        int n = f.width();
        int o = m * n;
        for (int i = 0; i < n; i++) {
            int j = o + i;
            double rho = f.decay[j];
            double k = f.kick[j];
            double a1 = rho * f.alpha1[j] + k * normals[i];
            double b1 = rho * f.beta1[j] + k * normals[n + i];
            double a2 = rho * f.alpha2[j] + k * normals[2 * n + i];
            double b2 = rho * f.beta2[j] + k * normals[3 * n + i];
            f.alpha1[j] = a1;
            f.beta1[j] = b1;
            f.alpha2[j] = a2;
            f.beta2[j] = b2;
            f.ax[j] = a1 * f.e1x[j] + a2 * f.e2x[j];
            f.ay[j] = a1 * f.e1y[j] + a2 * f.e2y[j];
            f.az[j] = a1 * f.e1z[j] + a2 * f.e2z[j];
            f.bx[j] = b1 * f.e1x[j] + b2 * f.e2x[j];
            f.by[j] = b1 * f.e1y[j] + b2 * f.e2y[j];
            f.bz[j] = b1 * f.e1z[j] + b2 * f.e2z[j];
        }
    }

    @Override
    public String name() {
        return "scalar";
    }
}
