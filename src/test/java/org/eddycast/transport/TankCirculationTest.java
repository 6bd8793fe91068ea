package org.eddycast.transport;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.eddycast.docs.ValidationLog;
import org.eddycast.particles.Cancellation;
import org.junit.jupiter.api.Test;

/** The tank's mean flow and the well-mixed property of its transport. */
class TankCirculationTest {

    private static TankTransport tank(boolean radial, double d, double discharge) {
        return new TankTransport(1, 1, d, 1.0 / 3, radial, discharge, 0.3 * Math.pow(d, 5), 0.7, 0.1 * d, 0.5,
                0.41, 1e-6, Math.PI);
    }

    /** Divergence of the mean flow by centred differences, at points spread through the tank. */
    @Test
    void meanFlowIsDivergenceFreeToRounding() {
        for (boolean radial : new boolean[] {false, true}) {
            TankTransport m = tank(radial, 0.4, 0.79 * 0.064);
            double[] a = new double[9];
            double[] b = new double[9];
            double h = 1e-5;
            double worst = 0;
            double scale = 0;
            java.util.SplittableRandom rng = new java.util.SplittableRandom(3);
            for (int i = 0; i < 2000; i++) {
                double r = 0.49 * Math.sqrt(rng.nextDouble());
                double angle = 2 * Math.PI * rng.nextDouble();
                double x = r * Math.cos(angle);
                double y = r * Math.sin(angle);
                double z = 0.01 + 0.98 * rng.nextDouble();
                if (Math.abs(z - 1.0 / 3) < 2 * h) {
                    continue;
                }
                double div = 0;
                for (int axis = 0; axis < 3; axis++) {
                    double[] p = {x, y, z};
                    double[] q = {x, y, z};
                    p[axis] += h;
                    q[axis] -= h;
                    m.evaluate(p[0], p[1], p[2], a);
                    m.evaluate(q[0], q[1], q[2], b);
                    div += (a[axis] - b[axis]) / (2 * h);
                    scale = Math.max(scale, Math.abs(a[axis]));
                }
                worst = Math.max(worst, Math.abs(div));
            }
            // centred differences of a smooth field: truncation ~ h^2 |u'''|, rounding ~ 1e-16 |u| / h
            double bound = 1e-6 * scale;
            ValidationLog.exact("tank mean flow divergence-free (" + (radial ? "two loops" : "one loop") + ")",
                    "a Stokes stream function gives a divergence-free axisymmetric flow (Batchelor 1967, An"
                            + " Introduction to Fluid Dynamics, sec. 2.2; from memory)", 0, worst, bound,
                    "largest |div u| over 2000 points, in units of the largest velocity over the tank diameter");
            assertTrue(worst <= bound, "divergence " + worst + " against velocity scale " + scale);
        }
    }

    /** The flow through the impeller equals its discharge N_Q N D^3. */
    @Test
    void impellerFluxEqualsTheDischarge() {
        double d = 0.4;
        double q = 0.79 * d * d * d;
        // axial: down through the impeller disc, 2 pi int_0^(D/2) u_z r dr, Gauss-Legendre in r
        TankTransport axial = tank(false, d, q);
        double flux = 2 * Math.PI * ShearDispersionTest.quadrature(s -> {
            double r = s * d / 2;
            double[] out = new double[9];
            axial.evaluate(r, 0, 1.0 / 3, out);
            return out[2] * r * d / 2;
        });
        boolean axialOk = ValidationLog.exact("flux through an axial impeller's disc over N_Q N D^3", "definition of"
                + " the pumping number (Hemrajani & Tatterson 2004, Handbook of Industrial Mixing, ch. 6)", 1,
                Math.abs(flux) / q, 1e-6, "relative, quadrature of u_z over the disc");
        assertTrue(axialOk, "axial flux " + flux + " against " + q);
        assertTrue(flux < 0, "an axial impeller pumps down through its disc: " + flux);
        // radial: out through the cylinder r = D/2 between the two loops' centres (z = C/2 and the upper centre)
        TankTransport radial = tank(true, d, q);
        double c = 1.0 / 3;
        double lower = c / 2;
        double upper = c + (1 - c) / 2;
        // u_r jumps at the impeller plane z = C (the two loops meet there), so integrate each side apart
        double out = 0;
        for (double[] part : new double[][] {{lower, c}, {c, upper}}) {
            out += 2 * Math.PI * (d / 2) * (part[1] - part[0]) * ShearDispersionTest.quadrature(s -> {
                double[] v = new double[9];
                radial.evaluate(d / 2, 0, part[0] + s * (part[1] - part[0]), v);
                return v[0];
            });
        }
        boolean radialOk = ValidationLog.exact("flux out of a radial impeller over N_Q N D^3", "definition of the"
                + " pumping number (Hemrajani & Tatterson 2004, Handbook of Industrial Mixing, ch. 6)", 1,
                out / q, 1e-5, "relative, quadrature of u_r over the cylinder r = D/2 between the loops' centres");
        assertTrue(radialOk, "radial flux " + out + " against " + q);
    }

    /**
     * A tracer spread evenly through the tank stays even (Thomson 1987, J. Fluid Mech. 180:529, well-mixed
     * criterion): after four loop times, the cells' counts pass a chi-square test of uniformity at the 0.1%
     * level, and the layer at the bottom holds its share within 3.3 standard errors.
     */
    @Test
    void evenlySpreadTracerStaysEven() {
        TankTransport m = tank(false, 0.4, 0.79 * 0.064);
        TankCells map = new TankCells(0.5, 1, 4, 8, 6);
        TransportSettings s = new TransportSettings(16, 512, 0.05, 400, 400, 9);
        CellCounts counts = new CellCounts(map, 16, 1);
        ReleaseSampler even = (rng, x, y, z, n) -> {
            for (int i = 0; i < n; i++) {
                double r = 0.5 * Math.sqrt(rng.nextDouble());
                double angle = 2 * Math.PI * rng.nextDouble();
                x[i] = r * Math.cos(angle);
                y[i] = r * Math.sin(angle);
                z[i] = rng.nextDouble();
            }
        };
        TransportRunner.run(m, even, s, List.of(counts), 2, f -> { }, new Cancellation());
        double n = s.particles();
        double chi2 = 0;
        double bottom = 0;
        for (int k = 0; k < map.cells(); k++) {
            double c = 0;
            for (int b = 0; b < 16; b++) {
                c += counts.count(b, 0, k);
            }
            double e = n * map.share(k);
            chi2 += (c - e) * (c - e) / e;
            if (k % 6 == 0) {
                bottom += c;
            }
        }
        // chi-square with 191 degrees of freedom: 99.9% point about 191 + 3.09 sqrt(382) + ... = 257 (normal approx.)
        assertTrue(chi2 < 257, "chi-square " + chi2);
        double expected = n / 6;
        double se = Math.sqrt(n * (1.0 / 6) * (5.0 / 6));
        assertEquals(expected, bottom, 3.3 * se, "bottom layer");
    }
}
