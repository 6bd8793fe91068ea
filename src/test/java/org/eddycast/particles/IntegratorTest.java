package org.eddycast.particles;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.random.RandomGeneratorFactory;
import org.eddycast.field.CellularFlow;
import org.eddycast.field.FieldModel;
import org.eddycast.field.PowerLawBand;
import org.eddycast.field.RandomFourierModel;
import org.eddycast.field.ShearModeField;
import org.eddycast.field.SpectrumTable;
import org.eddycast.docs.ValidationLog;
import org.junit.jupiter.api.Test;

/**
 * The drift maps of the integrators: volume preservation (McLachlan and Quispel 2002, "Splitting methods",
 * Acta Numerica 11:341-434: a composition of shears has unit Jacobian determinant) and the observed order of
 * convergence of a deterministic trajectory (Lie 1, Strang 2, Euler 1; Hairer, Lubich and Wanner 2006,
 * Geometric Numerical Integration, Springer, sec. II.5).
 */
class IntegratorTest {

    private static ShearModeField frozenRandomField(double dtForPrepare) {
        SpectrumTable table = new SpectrumTable(new PowerLawBand(-5.0 / 3.0, 16), 3, 32);
        FieldModel model = new RandomFourierModel(table, Double.POSITIVE_INFINITY, "test");
        ShearModeField field = new ShearModeField(3, model.modeCount());
        model.realize(field, RandomGeneratorFactory.of("L64X128MixRandom").create(3));
        field.prepareStep(dtForPrepare);
        return field;
    }

    /** One drift step of a single point. */
    private static double[] step(Integrator integrator, ShearModeField field, double dt, double[] p) {
        ParticleBlock block = new ParticleBlock(1);
        block.place(0, new double[] {p[0], p[1], p.length > 2 ? p[2] : 0});
        new ParticleStepper(integrator, dt, new double[3]).driftOnly(field, block, 1);
        double[] out = new double[3];
        block.position(0, out);
        return out;
    }

    /** det of the Jacobian of the one-step map by fourth-order central differences. */
    private static double jacobianDeterminant(Integrator integrator, ShearModeField field, double dt, double[] p) {
        double h = 1e-3;
        double[][] j = new double[3][3];
        for (int c = 0; c < 3; c++) {
            double[] p1 = p.clone();
            double[] p2 = p.clone();
            double[] m1 = p.clone();
            double[] m2 = p.clone();
            p1[c] += h;
            p2[c] += 2 * h;
            m1[c] -= h;
            m2[c] -= 2 * h;
            double[] f1 = step(integrator, field, dt, p1);
            double[] f2 = step(integrator, field, dt, p2);
            double[] g1 = step(integrator, field, dt, m1);
            double[] g2 = step(integrator, field, dt, m2);
            for (int r = 0; r < 3; r++) {
                j[r][c] = (8 * (f1[r] - g1[r]) - (f2[r] - g2[r])) / (12 * h);
            }
        }
        return j[0][0] * (j[1][1] * j[2][2] - j[1][2] * j[2][1])
                - j[0][1] * (j[1][0] * j[2][2] - j[1][2] * j[2][0])
                + j[0][2] * (j[1][0] * j[2][1] - j[1][1] * j[2][0]);
    }

    @Test
    void splittingStepsPreserveVolumeAndEulerDoesNot() {
        double dt = 0.05;
        ShearModeField field = frozenRandomField(dt);
        double[] p = {0.3, -1.2, 2.5};
        for (Integrator integrator : new Integrator[] {Integrator.LIE, Integrator.STRANG}) {
            double det = jacobianDeterminant(integrator, field, dt, p);
            // The fourth-order difference errs by about h^4 |f^(5)| / 30 ~ 1e-12 times k^5 (k up to ~20):
            // 1e-8 is far below Euler's departure, which is of order dt |div u|... i.e. dt^2 |grad u|^2.
            ValidationLog.exact(integrator + " step, Jacobian determinant", "exact: each substep is a shear map "
                    + "(derived; volume-preserving splitting, " + "McLachlan & Quispel 2002, Splitting methods, Acta Numerica 11" + ")", 1.0, det, 1e-8,
                    "fourth-order finite differences, within 1e-8");
            assertEquals(1.0, det, 1e-8, integrator + " Jacobian determinant");
        }
        double eulerDet = jacobianDeterminant(Integrator.EULER_MARUYAMA, field, dt, p);
        assertTrue(Math.abs(eulerDet - 1) > 1e-5, "Euler's step should not preserve volume: det = " + eulerDet);
    }

    /** Error at time T of one point against a very fine Strang reference, for a sequence of steps. */
    private static double[] errors(Integrator integrator, ShearModeField field, double[] start, double total,
                                   double[] steps) {
        double[] reference = start.clone();
        int fine = 20000;
        for (int s = 0; s < fine; s++) {
            reference = step(Integrator.STRANG, field, total / fine, reference);
        }
        double[] err = new double[steps.length];
        for (int i = 0; i < steps.length; i++) {
            double[] p = start.clone();
            int n = (int) Math.round(total / steps[i]);
            for (int s = 0; s < n; s++) {
                p = step(integrator, field, steps[i], p);
            }
            double dx = p[0] - reference[0];
            double dy = p[1] - reference[1];
            double dz = p[2] - reference[2];
            err[i] = Math.sqrt(dx * dx + dy * dy + dz * dz);
        }
        return err;
    }

    private static double observedOrder(double[] err) {
        // Least-squares slope of log error against log step (steps halve each time).
        int n = err.length;
        double sx = 0;
        double sy = 0;
        double sxx = 0;
        double sxy = 0;
        for (int i = 0; i < n; i++) {
            double x = -i * Math.log(2);
            double y = Math.log(err[i]);
            sx += x;
            sy += y;
            sxx += x * x;
            sxy += x * y;
        }
        return (n * sxy - sx * sy) / (n * sxx - sx * sx);
    }

    @Test
    void observedOrdersOnTheCellularFlowAndAFrozenRandomField() {
        double[] steps = {0.1, 0.05, 0.025, 0.0125};
        CellularFlow cells = new CellularFlow(2);
        ShearModeField cellular = new ShearModeField(2, 2);
        cells.realize(cellular, null);
        cellular.prepareStep(0.1);
        double[] start = {0.4, 0.9, 0};
        double lie = observedOrder(errors(Integrator.LIE, cellular, start, 2.0, steps));
        double strang = observedOrder(errors(Integrator.STRANG, cellular, start, 2.0, steps));
        double euler = observedOrder(errors(Integrator.EULER_MARUYAMA, cellular, start, 2.0, steps));
        ValidationLog.exact("Lie splitting, observed order on the cellular flow", "McLachlan & Quispel 2002, Splitting methods, Acta Numerica 11", 1.0, lie, 0.15,
                "slope of log error against log step over four halvings, within 0.15");
        ValidationLog.exact("Strang splitting, observed order on the cellular flow", "McLachlan & Quispel 2002, Splitting methods, Acta Numerica 11", 2.0, strang,
                0.15, "slope of log error against log step over four halvings, within 0.15");
        ValidationLog.exact("Euler-Maruyama, observed order on the cellular flow (deterministic drift)",
                "Euler's method is first order (common practice)", 1.0, euler, 0.15,
                "slope of log error against log step over four halvings, within 0.15");
        assertEquals(1.0, lie, 0.15, "Lie order on the cellular flow");
        assertEquals(2.0, strang, 0.15, "Strang order on the cellular flow");
        assertEquals(1.0, euler, 0.15, "Euler order on the cellular flow");

        ShearModeField random = frozenRandomField(0.01);
        double[] startRandom = {0.2, 0.5, -0.7};
        double[] fine = {0.02, 0.01, 0.005, 0.0025};
        ValidationLog.exact("Lie splitting, observed order on a frozen random Fourier field", "McLachlan & Quispel 2002, Splitting methods, Acta Numerica 11", 1.0,
                observedOrder(errors(Integrator.LIE, random, startRandom, 1.0, fine)), 0.15,
                "slope of log error against log step over four halvings, within 0.15");
        ValidationLog.exact("Strang splitting, observed order on a frozen random Fourier field", "McLachlan & Quispel 2002, Splitting methods, Acta Numerica 11",
                2.0, observedOrder(errors(Integrator.STRANG, random, startRandom, 1.0, fine)), 0.15,
                "slope of log error against log step over four halvings, within 0.15");
        assertEquals(1.0, observedOrder(errors(Integrator.LIE, random, startRandom, 1.0, fine)), 0.15);
        assertEquals(2.0, observedOrder(errors(Integrator.STRANG, random, startRandom, 1.0, fine)), 0.15);
    }
}
