package org.eddycast.uncertainty;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Arrays;
import java.util.List;
import java.util.function.ToDoubleFunction;
import org.eddycast.docs.ValidationLog;
import org.junit.jupiter.api.Test;

/**
 * The sensitivity estimators against test functions with exact variance decompositions.
 *
 * <p>Tolerance: each estimate must lie within its own 95% bootstrap half-width of the exact index, with no
 * extra factor. The bootstrap resamples the design's rows as if they were independent random points; the
 * Sobol rows are more even than that, so the error of a quasi-random estimate is smaller than the bootstrap
 * says (Saltelli et al. 2010, Computer Physics Communications 181:259, section 4, where the quasi-random
 * design converges faster than the random one). The half-width is therefore, if anything, a loose bound here;
 * the seeds are fixed so the test is repeatable, and the half-widths themselves are asserted small so that a
 * broken bootstrap cannot pass by being wide.
 */
class SobolIndicesTest {

    private static final String SALTELLI = "Saltelli, Annoni, Azzini, Campolongo, Ratto & Tarantola 2010, Variance"
            + " based sensitivity analysis of model output, Comput. Phys. Commun. 181:259, Table 2 (b) and (f)";
    private static final String ISHIGAMI = "Ishigami & Homma 1990, An importance quantification technique in"
            + " uncertainty analysis for computer models; analytic indices in Saltelli et al. 2008, Global"
            + " Sensitivity Analysis: The Primer, and Sobol' & Levitan 1999, Comput. Phys. Commun. 117:52";

    private static final double A = 7;
    private static final double B = 0.1;

    /** f = sin x1 + a sin^2 x2 + b x3^4 sin x1 (Ishigami & Homma 1990). */
    private static double ishigami(double[] x) {
        double s2 = Math.sin(x[1]);
        return Math.sin(x[0]) + A * s2 * s2 + B * Math.pow(x[2], 4) * Math.sin(x[0]);
    }

    /**
     * The exact indices, derived from the closed-form variance decomposition for x uniform on [-pi, pi]^3:
     * V = a^2/8 + b pi^4/5 + b^2 pi^8/18 + 1/2, V1 = (1 + b pi^4/5)^2 / 2, V2 = a^2/8, V3 = 0,
     * V13 = b^2 pi^8 (1/18 - 1/50), every other partial variance 0. So S1 = V1/V, S2 = V2/V, S3 = 0,
     * ST1 = (V1 + V13)/V, ST2 = V2/V, ST3 = V13/V.
     */
    private static double[][] ishigamiExact() {
        double pi4 = Math.pow(Math.PI, 4);
        double pi8 = pi4 * pi4;
        double v = A * A / 8 + B * pi4 / 5 + B * B * pi8 / 18 + 0.5;
        double v1 = Math.pow(1 + B * pi4 / 5, 2) / 2;
        double v2 = A * A / 8;
        double v13 = B * B * pi8 * (1.0 / 18 - 1.0 / 50);
        return new double[][] {{v1 / v, v2 / v, 0}, {(v1 + v13) / v, v2 / v, v13 / v}};
    }

    private static double[] responses(SaltelliDesign design, List<InputDistribution> inputs,
                                      ToDoubleFunction<double[]> model) {
        double[] y = new double[design.rows()];
        for (int row = 0; row < y.length; row++) {
            y[row] = model.applyAsDouble(design.point(row, inputs));
        }
        return y;
    }

    @Test
    void closedFormIshigamiIndicesMatchThePrintedValues() {
        // Printed to four decimals in Saltelli et al. 2008 (The Primer) and Sobol' & Levitan 1999.
        double[][] exact = ishigamiExact();
        assertArrayEquals(new double[] {0.3139, 0.4424, 0}, exact[0], 0.5e-4);
        assertArrayEquals(new double[] {0.5576, 0.4424, 0.2437}, exact[1], 0.5e-4);
    }

    @Test
    void recoversTheIshigamiIndicesWithinTheirHalfWidths() {
        InputDistribution x = new UniformRange(-Math.PI, Math.PI);
        List<InputDistribution> inputs = List.of(x, x, x);
        SaltelliDesign design = new SaltelliDesign(4096, 3);
        SobolIndices s = SobolIndices.estimate(design, responses(design, inputs, SobolIndicesTest::ishigami), 20L);
        double[][] exact = ishigamiExact();
        String[] kind = {"first-order", "total"};
        double[][] estimate = {s.first(), s.total()};
        double[][] half = {s.firstHalfWidth(), s.totalHalfWidth()};
        boolean allPassed = true;
        StringBuilder failures = new StringBuilder();
        for (int m = 0; m < 2; m++) {
            for (int i = 0; i < 3; i++) {
                double e = estimate[m][i];
                double h = half[m][i];
                boolean passed = Math.abs(e - exact[m][i]) <= h && h > 0 && h < 0.05;
                ValidationLog.statistical("Ishigami " + kind[m] + " index of x" + (i + 1)
                                + " (4,096 base samples, Saltelli design)", ISHIGAMI + "; estimator " + SALTELLI,
                        exact[m][i], e, e - h, e + h, exact[m][i] - h, exact[m][i] + h,
                        "within the 95% bootstrap half-width", passed);
                if (!passed) {
                    allPassed = false;
                    failures.append(String.format("%s S%d: %.4f +- %.4f, exact %.4f%n", kind[m], i + 1, e, h,
                            exact[m][i]));
                }
            }
        }
        assertTrue(allPassed, failures.toString());
    }

    @Test
    void theHalfWidthIsAnHonestErrorBarForIndependentRandomRows() {
        // The same estimators on rows drawn at random (plain Monte Carlo, A and B independent uniform
        // matrices, laid out as a design's rows), where the bootstrap's independence assumption holds. The
        // half-width is about 1.96 standard errors, so 1.5 half-widths is about 2.9: each of the six checks
        // fails by chance with probability near 0.4%, all six together near 2%.
        int n = 4096;
        SaltelliDesign layout = new SaltelliDesign(n, 3);
        java.util.SplittableRandom random = new java.util.SplittableRandom(1990L);
        double[][] a = new double[n][3];
        double[][] b = new double[n][3];
        for (int j = 0; j < n; j++) {
            for (int c = 0; c < 3; c++) {
                a[j][c] = Math.PI * (2 * random.nextDouble() - 1);
                b[j][c] = Math.PI * (2 * random.nextDouble() - 1);
            }
        }
        double[] y = new double[layout.rows()];
        for (int j = 0; j < n; j++) {
            y[j] = ishigami(a[j]);
            y[n + j] = ishigami(b[j]);
            for (int i = 0; i < 3; i++) {
                double[] abi = a[j].clone();
                abi[i] = b[j][i];
                y[(2 + i) * n + j] = ishigami(abi);
            }
        }
        SobolIndices s = SobolIndices.estimate(layout, y, 21L);
        double[][] exact = ishigamiExact();
        for (int i = 0; i < 3; i++) {
            assertEquals(exact[0][i], s.first()[i], 1.5 * s.firstHalfWidth()[i], "first-order index of x" + (i + 1));
            assertEquals(exact[1][i], s.total()[i], 1.5 * s.totalHalfWidth()[i], "total index of x" + (i + 1));
        }
    }

    @Test
    void recoversALinearAdditiveModelsIndices() {
        // f = sum c_i x_i with independent inputs: the variance is sum c_i^2 Var x_i and there are no
        // interactions, so first = total = c_i^2 Var x_i / sum (Saltelli et al. 2008, The Primer, ch. 1).
        List<InputDistribution> inputs = List.of(new UniformRange(0, 1), new NormalRange(3, 0.5),
                new TriangularRange(0, 1, 3), new LogNormalRange(2, 1.3));
        double[] c = {4, 1, 2, 0.5};
        // Variances: uniform (b - a)^2 / 12; normal sd^2; triangular (a^2 + b^2 + c^2 - ab - ac - bc) / 18;
        // log-normal median^2 e^{s^2} (e^{s^2} - 1) with s = ln gsd (Johnson, Kotz & Balakrishnan 1994,
        // Continuous Univariate Distributions, vol. 1, ch. 14).
        double s2 = Math.pow(Math.log(1.3), 2);
        double[] var = {1.0 / 12, 0.25, (0 + 9 + 1 - 0 - 0 - 3) / 18.0, 4 * Math.exp(s2) * (Math.exp(s2) - 1)};
        double sum = 0;
        for (int i = 0; i < 4; i++) {
            sum += c[i] * c[i] * var[i];
        }
        SaltelliDesign design = new SaltelliDesign(2048, 4);
        SobolIndices s = SobolIndices.estimate(design, responses(design, inputs, x -> {
            double f = 0;
            for (int i = 0; i < 4; i++) {
                f += c[i] * x[i];
            }
            return f;
        }), 7L);
        for (int i = 0; i < 4; i++) {
            double exact = c[i] * c[i] * var[i] / sum;
            assertEquals(exact, s.first()[i], s.firstHalfWidth()[i], "first-order index of input " + i);
            assertEquals(exact, s.total()[i], s.totalHalfWidth()[i], "total index of input " + i);
        }
        assertEquals(sum, s.variance(), 0.02 * sum, "total variance");
    }

    @Test
    void anOffsetInTheResponseChangesNothingButTheMean() {
        InputDistribution x = new UniformRange(-Math.PI, Math.PI);
        SaltelliDesign design = new SaltelliDesign(256, 3);
        double[] y = responses(design, List.of(x, x, x), SobolIndicesTest::ishigami);
        double[] shifted = Arrays.stream(y).map(v -> v + 1000).toArray();
        SobolIndices a = SobolIndices.estimate(design, y, 3L);
        SobolIndices b = SobolIndices.estimate(design, shifted, 3L);
        assertArrayEquals(a.first(), b.first(), 1e-9);
        assertArrayEquals(a.total(), b.total(), 1e-9);
        assertArrayEquals(a.firstHalfWidth(), b.firstHalfWidth(), 1e-9);
    }

    @Test
    void theSameSeedGivesTheSameHalfWidthsAndAnotherSeedOthers() {
        InputDistribution x = new UniformRange(-Math.PI, Math.PI);
        SaltelliDesign design = new SaltelliDesign(128, 3);
        double[] y = responses(design, List.of(x, x, x), SobolIndicesTest::ishigami);
        SobolIndices a = SobolIndices.estimate(design, y, 11L);
        assertArrayEquals(a.totalHalfWidth(), SobolIndices.estimate(design, y, 11L).totalHalfWidth(), 0);
        assertTrue(!Arrays.equals(a.totalHalfWidth(), SobolIndices.estimate(design, y, 12L).totalHalfWidth()));
    }

    @Test
    void aConstantResponseGivesZeroIndicesAndSaysWhy() {
        SaltelliDesign design = new SaltelliDesign(16, 2);
        double[] y = new double[design.rows()];
        Arrays.fill(y, 4.2);
        SobolIndices s = SobolIndices.estimate(design, y, 1L);
        assertArrayEquals(new double[] {0, 0}, s.first(), 0);
        assertArrayEquals(new double[] {0, 0}, s.total(), 0);
        assertArrayEquals(new double[] {0, 0}, s.totalHalfWidth(), 0);
        assertEquals(0, s.variance(), 0);
        assertTrue(s.note().contains("same at every sample"), s.note());
    }

    @Test
    void refusesMissingOrWrongResponses() {
        SaltelliDesign design = new SaltelliDesign(8, 2);
        double[] y = new double[design.rows()];
        Arrays.setAll(y, r -> r);
        y[2 * 8 + 8 + 3] = Double.NaN; // AB_1, base sample 3
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> SobolIndices.estimate(design, y, 1L));
        assertTrue(e.getMessage().contains("row 27 (AB_1, base sample 3)"), e.getMessage());
        IllegalArgumentException shorter = assertThrows(IllegalArgumentException.class,
                () -> SobolIndices.estimate(design, new double[5], 1L));
        assertTrue(shorter.getMessage().contains("32 rows"), shorter.getMessage());
    }
}
