package org.eddycast.field;

/**
 * The kernel in plain scalar loops with our {@link FastSinCos}: the path when the Vector API module is absent,
 * and the vector kernel's path for the points beyond its last whole vector. Each point is taken through every
 * shear of the step before the next point.
 */
public class ScalarShearKernel implements ShearKernel {

    /** The lanes keep their wavevectors in turns (over 2 pi); the scalar loops turn the phase back to radians. */
    private static final double TWO_PI = 2 * Math.PI;

    /** One lane's displacement by one mode, written by {@link #laneMove}; a kernel belongs to one thread. */
    private final double[] move = new double[3];

    /** The sine the kernel uses; the reference kernel overrides it with {@link Math#sin}. */
    double sine(double phase) {
        return FastSinCos.sin(phase);
    }

    /** The cosine the kernel uses; the reference kernel overrides it with {@link Math#cos}. */
    double cosine(double phase) {
        return FastSinCos.cos(phase);
    }

    @Override
    public void applyInTurn(ShearModeField f, int first, int last, double[] x, double[] y, double[] z, int n) {
        int direction = last >= first ? 1 : -1;
        for (int i = 0; i < n; i++) {
            inTurnPoint(f, first, last + direction, direction, x, y, z, i);
        }
    }

    @Override
    public void applyAtOnce(ShearModeField f, double[] x, double[] y, double[] z, int n) {
        for (int i = 0; i < n; i++) {
            atOncePoint(f, x, y, z, i);
        }
    }

    /** Point i through modes first, first + direction, ... up to but not including stop, in turn. */
    void inTurnPoint(ShearModeField f, int first, int stop, int direction, double[] x, double[] y, double[] z,
                     int i) {
        double px = x[i];
        double py = y[i];
        double pz = z[i];
        for (int m = first; m != stop; m += direction) {
            double p = f.kx[m] * px + f.ky[m] * py + f.kz[m] * pz;
            double c = cosine(p);
            double s = sine(p);
            px += f.ax[m] * c + f.bx[m] * s;
            py += f.ay[m] * c + f.by[m] * s;
            pz += f.az[m] * c + f.bz[m] * s;
        }
        x[i] = px;
        y[i] = py;
        z[i] = pz;
    }

    /** Point i moved by the sum of every mode, all evaluated at its starting place. */
    void atOncePoint(ShearModeField f, double[] x, double[] y, double[] z, int i) {
        double dx = 0;
        double dy = 0;
        double dz = 0;
        for (int m = 0; m < f.modes(); m++) {
            double p = f.kx[m] * x[i] + f.ky[m] * y[i] + f.kz[m] * z[i];
            double c = cosine(p);
            double s = sine(p);
            dx += f.ax[m] * c + f.bx[m] * s;
            dy += f.ay[m] * c + f.by[m] * s;
            dz += f.az[m] * c + f.bz[m] * s;
        }
        x[i] += dx;
        y[i] += dy;
        z[i] += dz;
    }

    @Override
    public void applyInTurn(ModeLanes f, int first, int last, double[] x, double[] y, double[] z) {
        int n = f.width();
        int direction = last >= first ? 1 : -1;
        double[] d = f.data;
        for (int i = 0; i < n; i++) {
            double px = x[i];
            double py = y[i];
            double pz = z[i];
            for (int m = first; m != last + direction; m += direction) {
                laneMove(d, m * ModeLanes.FIELDS * n + i, n, px, py, pz);
                px += move[0];
                py += move[1];
                pz += move[2];
            }
            x[i] = px;
            y[i] = py;
            z[i] = pz;
        }
    }

    @Override
    public void applyAtOnce(ModeLanes f, double[] x, double[] y, double[] z) {
        int n = f.width();
        double[] d = f.data;
        for (int i = 0; i < n; i++) {
            double dx = 0;
            double dy = 0;
            double dz = 0;
            for (int m = 0; m < f.modes(); m++) {
                laneMove(d, m * ModeLanes.FIELDS * n + i, n, x[i], y[i], z[i]);
                dx += move[0];
                dy += move[1];
                dz += move[2];
            }
            x[i] += dx;
            y[i] += dy;
            z[i] += dz;
        }
    }

    /**
     * One lane's mode at a point into {@link #move}: the record from slot j with lane stride n, wavevector in
     * turns, displacement (alpha1 c + beta1 s) e1 + (alpha2 c + beta2 s) e2.
     */
    private void laneMove(double[] d, int j, int n, double px, double py, double pz) {
        double p = TWO_PI
                * (d[j + ModeLanes.KX * n] * px + d[j + ModeLanes.KY * n] * py + d[j + ModeLanes.KZ * n] * pz);
        double c = cosine(p);
        double s = sine(p);
        double u1 = d[j + ModeLanes.ALPHA1 * n] * c + d[j + ModeLanes.BETA1 * n] * s;
        double u2 = d[j + ModeLanes.ALPHA2 * n] * c + d[j + ModeLanes.BETA2 * n] * s;
        move[0] = u1 * d[j + ModeLanes.E1X * n] + u2 * d[j + ModeLanes.E2X * n];
        move[1] = u1 * d[j + ModeLanes.E1Y * n] + u2 * d[j + ModeLanes.E2Y * n];
        move[2] = u1 * d[j + ModeLanes.E1Z * n] + u2 * d[j + ModeLanes.E2Z * n];
    }

    @Override
    public void advance(ShearModeField f, double[] normals, int offset) {
        f.advanceAmplitudes(normals, offset);
    }

    @Override
    public void advance(ModeLanes f, int m, double[] normals) {
        int n = f.width();
        int o = m * ModeLanes.FIELDS * n;
        double[] d = f.data;
        for (int i = 0; i < n; i++) {
            int j = o + i;
            double rho = d[j + ModeLanes.DECAY * n];
            double k = d[j + ModeLanes.KICK * n];
            double a1 = k * normals[i] + rho * d[j + ModeLanes.ALPHA1 * n];
            double b1 = k * normals[n + i] + rho * d[j + ModeLanes.BETA1 * n];
            double a2 = k * normals[2 * n + i] + rho * d[j + ModeLanes.ALPHA2 * n];
            double b2 = k * normals[3 * n + i] + rho * d[j + ModeLanes.BETA2 * n];
            d[j + ModeLanes.ALPHA1 * n] = a1;
            d[j + ModeLanes.BETA1 * n] = b1;
            d[j + ModeLanes.ALPHA2 * n] = a2;
            d[j + ModeLanes.BETA2 * n] = b2;
        }
    }

    @Override
    public String name() {
        return "scalar";
    }
}
