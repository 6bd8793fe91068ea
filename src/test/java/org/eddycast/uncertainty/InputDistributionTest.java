package org.eddycast.uncertainty;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;

/** Each distribution's quantile against its closed form, its mean against the quantile's integral. */
class InputDistributionTest {

    @Test
    void uniformQuantileIsLinear() {
        UniformRange r = new UniformRange(2, 6);
        assertEquals(3, r.quantile(0.25), 1e-15);
        assertEquals(5.8, r.quantile(0.95), 1e-14);
        assertEquals(4, r.mean(), 0);
    }

    @Test
    void triangularQuantileFollowsItsTwoBranches() {
        // F(x) = (x - a)^2 / ((b - a)(c - a)) below the mode c, so Q(u) = a + sqrt(u (b - a)(c - a)) for
        // u <= (c - a)/(b - a), and b - sqrt((1 - u)(b - a)(b - c)) above (Johnson, Kotz & Balakrishnan 1995,
        // Continuous Univariate Distributions, vol. 2, ch. 26).
        TriangularRange r = new TriangularRange(1, 2, 5);
        assertEquals(1 + Math.sqrt(0.1 * 4 * 1), r.quantile(0.1), 1e-12);
        assertEquals(5 - Math.sqrt(0.4 * 4 * 3), r.quantile(0.6), 1e-12);
        assertEquals(2, r.quantile(0.25), 1e-12);
        assertEquals(8.0 / 3, r.mean(), 1e-15);
    }

    @Test
    void normalQuantileMatchesPrintedTables() {
        // z = 1.959964 at 0.975 and 1.644854 at 0.95 (Abramowitz & Stegun 1964, Handbook of Mathematical
        // Functions, table 26.5).
        NormalRange r = new NormalRange(10, 2);
        assertEquals(10 + 2 * 1.959964, r.quantile(0.975), 2e-6);
        assertEquals(10 - 2 * 1.644854, r.quantile(0.05), 2e-6);
        assertEquals(10, r.quantile(0.5), 1e-12);
    }

    @Test
    void logNormalQuantileIsTheMedianTimesTheGeometricSdToTheNormalQuantile() {
        // ln X normal with mean ln(median) and sd ln(gsd): Q(0.5) = median, Q(Phi(1)) = median gsd,
        // Phi(1) = 0.8413447 (Abramowitz & Stegun 1964, table 26.1); mean median exp(ln(gsd)^2 / 2).
        LogNormalRange r = new LogNormalRange(0.6, 1.2);
        assertEquals(0.6, r.quantile(0.5), 1e-14);
        assertEquals(0.72, r.quantile(0.8413447460685429), 1e-9);
        assertEquals(0.5, r.quantile(1 - 0.8413447460685429), 1e-9);
        assertEquals(0.6 * Math.exp(0.5 * Math.pow(Math.log(1.2), 2)), r.mean(), 1e-15);
    }

    @Test
    void eachMeanIsTheIntegralOfItsQuantile() {
        // E[X] = integral over (0, 1) of Q(u) du; the midpoint rule on 200,000 cells converges slowly only in
        // the unbounded tails, well inside 1e-4 of the spread here.
        for (InputDistribution d : List.of(new UniformRange(-1, 3), new TriangularRange(0, 0.2, 1),
                new NormalRange(5, 0.5), new LogNormalRange(2, 1.5))) {
            int cells = 200_000;
            double sum = 0;
            for (int c = 0; c < cells; c++) {
                sum += d.quantile((c + 0.5) / cells);
            }
            assertEquals(d.mean(), sum / cells, 1e-4 * Math.abs(d.mean()) + 1e-4, d.describe());
        }
    }

    @Test
    void describesThemselvesInWords() {
        assertEquals("uniform 0.4 to 0.5", new UniformRange(0.4, 0.5).describe());
        assertEquals("triangular 1 to 5, most likely 2", new TriangularRange(1, 2, 5).describe());
        assertEquals("normal, mean 0.45, sd 0.02", new NormalRange(0.45, 0.02).describe());
        assertEquals("log-normal, median 0.6, geometric sd 1.2", new LogNormalRange(0.6, 1.2).describe());
        assertEquals("uniform 1.23e-7 to 1230", new UniformRange(1.2345e-7, 1234.5).describe());
    }

    @Test
    void refusesInvalidParametersNamingThem() {
        assertMessage("low (0.5) must be below high (0.4)", () -> new UniformRange(0.5, 0.4));
        assertMessage("high must be a finite number", () -> new UniformRange(0, Double.POSITIVE_INFINITY));
        assertMessage("the mode (6.0) must lie from low", () -> new TriangularRange(1, 6, 5));
        assertMessage("sd must be positive", () -> new NormalRange(1, 0));
        assertMessage("median must be positive", () -> new LogNormalRange(-1, 2));
        assertMessage("geometric sd must be above 1", () -> new LogNormalRange(1, 1));
        assertMessage("strictly between 0 and 1", () -> new NormalRange(0, 1).quantile(0));
        assertMessage("strictly between 0 and 1", () -> new UniformRange(0, 1).quantile(Double.NaN));
    }

    private static void assertMessage(String part, org.junit.jupiter.api.function.Executable e) {
        IllegalArgumentException x = assertThrows(IllegalArgumentException.class, e);
        assertTrue(x.getMessage().contains(part), x.getMessage());
    }
}
