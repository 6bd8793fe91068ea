package org.eddycast.uncertainty;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;

/**
 * The design's rows follow Saltelli et al. 2010 (Comput. Phys. Commun. 181:259, section 3): A and B from the
 * two halves of one Sobol point, AB_i equal to A except its column i, which is B's.
 */
class SaltelliDesignTest {

    @Test
    void rowsAreLaidOutAsAThenBThenEachABi() {
        int n = 64;
        int k = 3;
        SaltelliDesign d = new SaltelliDesign(n, k);
        assertEquals(n * (k + 2), d.rows());
        for (int j = 0; j < n; j++) {
            double[] a = d.unitPoint(j);
            double[] b = d.unitPoint(n + j);
            for (int i = 0; i < k; i++) {
                double[] ab = d.unitPoint((2 + i) * n + j);
                for (int c = 0; c < k; c++) {
                    assertEquals(c == i ? b[c] : a[c], ab[c], 0, "AB_" + i + " row " + j + " column " + c);
                }
            }
            for (double u : a) {
                assertTrue(u > 0 && u < 1, "A row " + j + " leaves (0, 1): " + u);
            }
            for (double u : b) {
                assertTrue(u > 0 && u < 1, "B row " + j + " leaves (0, 1): " + u);
            }
        }
        assertEquals(-2, d.block(n - 1));
        assertEquals(-1, d.block(n));
        assertEquals(2, d.block(4 * n));
        assertEquals(5, d.baseIndex(3 * n + 5));
    }

    @Test
    void aAndBAreTheTwoHalvesOfOneRotatedSobolPointAfterTheSkippedZero() {
        // A Sobol sequence starts at the origin and its next point is (1/2, ..., 1/2) in every dimension
        // (Bratley & Fox 1988, Algorithm 659, ACM Trans. Math. Softw. 14:88; Joe & Kuo 2008, SIAM J. Sci.
        // Comput. 30:2635). Each dimension d is shifted by its own offset modulo 1 (Cranley & Patterson 1976), so
        // A's row j is point j + 1's first k coordinates shifted, and B's row j its last k shifted.
        SaltelliDesign d = new SaltelliDesign(8, 2);
        org.apache.commons.math3.random.SobolSequenceGenerator sobol =
                new org.apache.commons.math3.random.SobolSequenceGenerator(4);
        sobol.nextVector();
        for (int j = 0; j < 8; j++) {
            double[] p = sobol.nextVector();
            double[] a = d.unitPoint(j);
            double[] b = d.unitPoint(8 + j);
            for (int c = 0; c < 2; c++) {
                assertEquals(rotated(p[c], SaltelliDesign.offset(c)), a[c], 0.0);
                assertEquals(rotated(p[2 + c], SaltelliDesign.offset(2 + c)), b[c], 0.0);
                assertTrue(a[c] > 0 && a[c] < 1 && b[c] > 0 && b[c] < 1);
            }
        }
        // the unrotated sequence would put A's and B's first rows both at (1/2, 1/2); rotated, no row of B repeats
        // a row of A in any coordinate
        for (int j = 0; j < 8; j++) {
            for (int m = 0; m < 8; m++) {
                double[] a = d.unitPoint(j);
                double[] b = d.unitPoint(8 + m);
                assertTrue(a[0] != b[0] && a[1] != b[1], "A row " + j + " and B row " + m);
            }
        }
        // offsets are spread over [0, 1) and differ between dimensions
        assertTrue(SaltelliDesign.offset(0) != SaltelliDesign.offset(1));
    }

    private static double rotated(double x, double offset) {
        double u = x + offset;
        return u >= 1 ? u - 1 : u;
    }

    @Test
    void twoDesignsOfTheSameSizeGiveTheSameBits() {
        SaltelliDesign one = new SaltelliDesign(100, 5);
        SaltelliDesign other = new SaltelliDesign(100, 5);
        List<InputDistribution> inputs = List.of(new UniformRange(1, 2), new NormalRange(0, 1),
                new TriangularRange(0, 2, 3), new LogNormalRange(0.6, 1.2), new NormalRange(10, 3));
        for (int row = 0; row < one.rows(); row++) {
            double[] p = one.point(row, inputs);
            double[] q = other.point(row, inputs);
            for (int i = 0; i < p.length; i++) {
                assertEquals(Double.doubleToRawLongBits(p[i]), Double.doubleToRawLongBits(q[i]), "row " + row);
            }
        }
    }

    @Test
    void aLargerDesignStartsWithTheSmallerOnesBaseRows() {
        // The base rows are the Sobol points in order, so growing N keeps the rows already run.
        SaltelliDesign small = new SaltelliDesign(16, 2);
        SaltelliDesign large = new SaltelliDesign(32, 2);
        for (int j = 0; j < 16; j++) {
            assertArrayEquals(small.unitPoint(j), large.unitPoint(j), 0);
            assertArrayEquals(small.unitPoint(16 + j), large.unitPoint(32 + j), 0);
        }
    }

    @Test
    void pointsMapThroughEachInputsQuantile() {
        SaltelliDesign d = new SaltelliDesign(4, 2);
        List<InputDistribution> inputs = List.of(new UniformRange(10, 20), new NormalRange(0, 1));
        double[] u = d.unitPoint(7);
        double[] x = d.point(7, inputs);
        assertEquals(10 + 10 * u[0], x[0], 1e-12);
        assertEquals(inputs.get(1).quantile(u[1]), x[1], 0);
    }

    @Test
    void refusesBadSizesAndRows() {
        assertThrows(IllegalArgumentException.class, () -> new SaltelliDesign(1, 2));
        assertThrows(IllegalArgumentException.class, () -> new SaltelliDesign(10, 0));
        assertThrows(IllegalArgumentException.class, () -> new SaltelliDesign(10, SaltelliDesign.MAX_INPUTS + 1));
        SaltelliDesign d = new SaltelliDesign(4, 2);
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> d.unitPoint(16));
        assertTrue(e.getMessage().contains("0 to 15"), e.getMessage());
        assertThrows(IllegalArgumentException.class, () -> d.point(0, List.of(new UniformRange(0, 1))));
    }
}
