package org.eddycast.transport;

/**
 * A baffled stirred tank as a transport model: a flat-bottomed cylinder of radius R and liquid height H with
 * the impeller's circulation as an axisymmetric mean flow and a turbulent diffusivity that is higher near the
 * impeller than in the bulk. Coordinates: x and y across from the tank's axis, z up from the bottom.
 *
 * <p><b>Mean flow.</b> From a Stokes stream function psi(r, z) = A f(r) g(z) with f = r^2 (1 - r^2 / R^2), so
 * u_r = -(1/r) dpsi/dz and u_z = (1/r) dpsi/dr: divergence-free by construction, with no flow through the wall,
 * the bottom or the surface. An axial impeller drives one loop, g = sin(pi z / H) (down through the impeller
 * and up the wall); a radial impeller two, split at the impeller plane z = C (g = sin(pi z / C) below,
 * -sin(pi (z - C) / (H - C)) above), the discharge leaving radially between them. The amplitude A makes the
 * flow through the impeller equal to its discharge N_Q N D^3: through the impeller's disc (radius D/2) for an
 * axial impeller, out through the cylinder of radius D/2 between the loops' centres for a radial one. The loops
 * fill the tank, so they carry more than the impeller discharges: the rest is the flow entrained by the
 * impeller's stream. This is the circulation-loop picture of mixing (Norwood &amp; Metzner 1960, "Flow patterns
 * and mixing rates in agitated vessels", AIChE J. 6:432, from memory), made continuous. Left out: the swirl
 * that baffles leave, the trailing vortices, and the detail of the jet.
 *
 * <p><b>Turbulence.</b> The power P = Po rho N^3 D^5 is dissipated with a share {@code impellerShare} in an
 * impeller zone (a cylinder of radius 0.75 D and height D/2 about the impeller, edges smoothed) and the rest
 * evenly in the bulk. Local rms velocity u' = (eps L / C_eps)^(1/3) with the tank route's L and C_eps, and
 * K = D0 + F u' L with F from the random Fourier field, the same in every direction.
 */
public final class TankTransport implements TransportModel {

    private static final int SMOOTHING = 8;

    private final double radius;
    private final double height;
    private final double clearance;
    private final boolean radial;
    private final double amplitude;
    private final double zoneRadius;
    private final double zoneHalfHeight;
    private final double bulkDissipation;
    private final double zoneDissipation;
    private final double diffusivityScale;
    private final double molecular;
    private final double zoneAngularVelocity;

    /**
     * @param tankDiameter     T (m)
     * @param liquidHeight     H (m)
     * @param impellerDiameter D (m)
     * @param clearance        C, height of the impeller plane above the bottom (m)
     * @param radial           true for a radial-flow impeller (two loops)
     * @param discharge        N_Q N D^3 (m^3/s)
     * @param power            shaft power per unit mass of liquid times the volume, P / rho (m^5/s^3)
     * @param impellerShare    share of the power dissipated in the impeller zone, 0 to 1
     * @param length           integral length L (m)
     * @param dissipationConstant C_eps
     * @param fieldFactor      F = D / (u' L) from the random Fourier field
     * @param molecular        D0 (m^2/s)
     */
    public TankTransport(double tankDiameter, double liquidHeight, double impellerDiameter, double clearance,
                         boolean radial, double discharge, double power, double impellerShare, double length,
                         double dissipationConstant, double fieldFactor, double molecular,
                         double zoneAngularVelocity) {
        this.zoneAngularVelocity = zoneAngularVelocity;
        this.radius = tankDiameter / 2;
        this.height = liquidHeight;
        this.clearance = clearance;
        this.radial = radial;
        double a = impellerDiameter / 2;
        double fa = a * a * (1 - a * a / (radius * radius));
        // radial: out through the impeller's cylinder; axial: down through its disc (a down-pumping impeller,
        // so the loop rises at the wall and runs in towards the axis at the surface)
        this.amplitude = radial ? discharge / (4 * Math.PI * fa)
                : -discharge / (2 * Math.PI * fa * Math.sin(Math.PI * clearance / liquidHeight));
        this.zoneRadius = 0.75 * impellerDiameter;
        this.zoneHalfHeight = 0.25 * impellerDiameter;
        double volume = Math.PI * radius * radius * height;
        double zoneVolume = zoneVolume();
        this.bulkDissipation = (1 - impellerShare) * power / volume;
        this.zoneDissipation = impellerShare * power / zoneVolume;
        this.diffusivityScale = fieldFactor * length * Math.cbrt(length / dissipationConstant);
        this.molecular = molecular;
    }

    /** The integral of the zone's smooth indicator over the tank (m^3), by the midpoint rule. */
    private double zoneVolume() {
        int n = 400;
        double sum = 0;
        for (int i = 0; i < n; i++) {
            double r = radius * (i + 0.5) / n;
            for (int j = 0; j < n; j++) {
                double z = height * (j + 0.5) / n;
                sum += zone(r, z) * 2 * Math.PI * r;
            }
        }
        return sum * radius / n * height / n;
    }

    private double radialZone(double r) {
        return 1 / (1 + eighth(r / zoneRadius));
    }

    private double verticalZone(double z) {
        return 1 / (1 + eighth((z - clearance) / zoneHalfHeight));
    }

    /** x^8 by three multiplications ({@value #SMOOTHING} is the exponent). */
    private static double eighth(double x) {
        double x2 = x * x;
        double x4 = x2 * x2;
        return x4 * x4;
    }

    private double zone(double r, double z) {
        return radialZone(r) * verticalZone(z);
    }

    /** Local dissipation rate (W/kg). */
    public double dissipation(double x, double y, double z) {
        return bulkDissipation + zoneDissipation * zone(Math.hypot(x, y), z);
    }

    /** The flow carried round the loop(s): 2 pi times the largest stream function (m^3/s), per loop. */
    public double loopFlow() {
        double f = radius * radius / 4;
        return 2 * Math.PI * Math.abs(amplitude) * f;
    }

    private double g(double z) {
        if (!radial) {
            return Math.sin(Math.PI * z / height);
        }
        return z < clearance ? Math.sin(Math.PI * z / clearance)
                : -Math.sin(Math.PI * (z - clearance) / (height - clearance));
    }

    /** The stream function psi(r, z) (m^3/s over 2 pi). */
    public double streamFunction(double r, double z) {
        return amplitude * r * r * (1 - r * r / (radius * radius)) * g(z);
    }

    @Override
    public void evaluate(double x, double y, double z, double[] out) {
        double r = Math.sqrt(x * x + y * y);
        double rz = radialZone(r);
        double vz = verticalZone(z);
        velocity(x, y, z, rz * vz, out);
        double eps = bulkDissipation + zoneDissipation * rz * vz;
        double root = Math.cbrt(eps);
        double k = molecular + diffusivityScale * root;
        out[3] = k;
        out[4] = k;
        out[5] = k;
        // dK/deps = (1/3) scale eps^(-2/3); d(zone)/dx = rz' (x / r) vz with rz' / r = -8 r^6 / rz^8 rz^2
        double dk = diffusivityScale / (3 * root * root) * zoneDissipation;
        double q = r / zoneRadius;
        double q2 = q * q;
        double q6 = q2 * q2 * q2;
        double dRadialOverR = -SMOOTHING * q6 / (zoneRadius * zoneRadius) * rz * rz;
        double w = (z - clearance) / zoneHalfHeight;
        double w2 = w * w;
        double w7 = w2 * w2 * w2 * w;
        double dVertical = -SMOOTHING * w7 / zoneHalfHeight * vz * vz;
        out[6] = dk * dRadialOverR * x * vz;
        out[7] = dk * dRadialOverR * y * vz;
        out[8] = dk * rz * dVertical;
    }

    @Override
    public void velocity(double x, double y, double z, double[] out) {
        velocity(x, y, z, radialZone(Math.sqrt(x * x + y * y)) * verticalZone(z), out);
    }

    /** The mean velocity, with the impeller zone's indicator at the point already known. */
    private void velocity(double x, double y, double z, double zone, double[] out) {
        double r2 = x * x + y * y;
        double inv = 1 / (radius * radius);
        double g;
        double gPrime;
        if (!radial) {
            double a = Math.PI * z / height;
            g = Math.sin(a);
            gPrime = Math.PI / height * Math.cos(a);
        } else if (z < clearance) {
            double a = Math.PI * z / clearance;
            g = Math.sin(a);
            gPrime = Math.PI / clearance * Math.cos(a);
        } else {
            double a = Math.PI * (z - clearance) / (height - clearance);
            g = -Math.sin(a);
            gPrime = -Math.PI / (height - clearance) * Math.cos(a);
        }
        // u_r / r = -A (1 - r^2/R^2) g'(z); u_z = A f'(r) / r g(z) = 2 A (1 - 2 r^2 / R^2) g(z)
        double radialOverR = -amplitude * (1 - r2 * inv) * gPrime;
        double omega = zoneAngularVelocity * zone;
        out[0] = radialOverR * x - omega * y;
        out[1] = radialOverR * y + omega * x;
        out[2] = 2 * amplitude * (1 - 2 * r2 * inv) * g;
    }

    @Override
    public void diffusivity(double x, double y, double z, double[] out) {
        double eps = bulkDissipation + zoneDissipation * radialZone(Math.sqrt(x * x + y * y)) * verticalZone(z);
        double k = molecular + diffusivityScale * Math.cbrt(eps);
        out[3] = k;
        out[4] = k;
        out[5] = k;
    }

    @Override
    public void reflect(double[] p) {
        double x = p[0];
        double y = p[1];
        double z = p[2];
        double r2 = x * x + y * y;
        if (r2 > radius * radius) {
            double r = Math.sqrt(r2);
            double mirrored = Math.max(0, 2 * radius - r);
            x *= mirrored / r;
            y *= mirrored / r;
        }
        for (int i = 0; i < 4 && (z < 0 || z > height); i++) {
            z = z < 0 ? -z : 2 * height - z;
        }
        p[0] = x;
        p[1] = y;
        p[2] = Math.max(0, Math.min(height, z));
    }

    @Override
    public boolean contains(double x, double y, double z) {
        return x * x + y * y <= radius * radius && z >= 0 && z <= height;
    }

    /** The largest diffusivity (m^2/s): at the impeller zone's centre. */
    public double maxDiffusivity() {
        double[] out = new double[9];
        evaluate(0, 0, clearance, out);
        return out[3];
    }

    /**
     * The share of the tank's volume inside a sphere about a point, the part outside the liquid left out, by
     * the midpoint rule on a 40^3 grid.
     */
    public double sphereShare(double[] centre, double sphereRadius) {
        int n = 40;
        double cell = 2 * sphereRadius / n;
        double inside = 0;
        for (int i = 0; i < n; i++) {
            double x = centre[0] - sphereRadius + (i + 0.5) * cell;
            for (int j = 0; j < n; j++) {
                double y = centre[1] - sphereRadius + (j + 0.5) * cell;
                for (int k = 0; k < n; k++) {
                    double z = centre[2] - sphereRadius + (k + 0.5) * cell;
                    double dx = x - centre[0];
                    double dy = y - centre[1];
                    double dz = z - centre[2];
                    if (dx * dx + dy * dy + dz * dz <= sphereRadius * sphereRadius && contains(x, y, z)) {
                        inside++;
                    }
                }
            }
        }
        return inside * cell * cell * cell / (Math.PI * radius * radius * height);
    }

    public double radius() {
        return radius;
    }

    public double height() {
        return height;
    }

    /** Volume-mean diffusivity (m^2/s), by the midpoint rule. */
    public double meanDiffusivity() {
        int n = 200;
        double sum = 0;
        double[] out = new double[9];
        for (int i = 0; i < n; i++) {
            double r = radius * (i + 0.5) / n;
            for (int j = 0; j < n; j++) {
                evaluate(r, 0, height * (j + 0.5) / n, out);
                sum += out[3] * 2 * r;
            }
        }
        return sum / (n * (double) n * radius);
    }
}
