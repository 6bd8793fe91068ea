package org.eddycast.field;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.function.DoubleUnaryOperator;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/**
 * The model spectrum of Pope (2000, Turbulent Flows, Cambridge University Press, sec. 6.5.3, eqs. 6.246-6.248)
 * against its own defining conditions, by a quadrature of the test's own (composite Simpson in ln k, 4,000
 * intervals, on a wider range than the class integrates over): in units eta = eps = nu = 1 the kinetic energy
 * integral E dk is l^(2/3) (from l = k^(3/2) / eps), the dissipation 2 nu integral k^2 E dk is 1, and the
 * longitudinal integral length L11 = (pi / (2 u'^2)) integral E / k dk = (3 pi / 4) integral (E / k) /
 * integral E (Pope 2000, eq. 6.213, with k = 3 u'^2 / 2) is the requested ratio in Kolmogorov lengths.
 */
class PopeModelSpectrumTest {

    private static double simpsonInLogK(DoubleUnaryOperator f, double lo, double hi) {
        int n = 4000;
        double a = Math.log(lo);
        double h = (Math.log(hi) - a) / n;
        double sum = 0;
        for (int i = 0; i <= n; i++) {
            double k = Math.exp(a + i * h);
            double w = i == 0 || i == n ? 1 : i % 2 == 1 ? 4 : 2;
            sum += w * f.applyAsDouble(k) * k;
        }
        return sum * h / 3;
    }

    @ParameterizedTest(name = "L11 / eta = {0}")
    @ValueSource(doubles = {60, 400, 5000})
    void energyDissipationAndIntegralLengthMeetTheirConditions(double ratio) {
        PopeModelSpectrum p = new PopeModelSpectrum(ratio);
        double lo = 1e-5 / p.energyLength();
        double hi = 60;
        double energy = simpsonInLogK(p::density, lo, hi);
        double dissipation = 2 * simpsonInLogK(k -> k * k * p.density(k), lo, hi);
        double inverse = simpsonInLogK(k -> p.density(k) / k, lo, hi);
        // The class's own trapezoid grid of 700 points sets the accuracy of its solution: a few parts in 1e4.
        assertEquals(Math.pow(p.energyLength(), 2.0 / 3.0), energy, 1e-3 * energy, "kinetic energy");
        assertEquals(1.0, dissipation, 1e-3, "dissipation");
        assertEquals(ratio, 0.75 * Math.PI * inverse / energy, 1e-3 * ratio, "L11 / eta");
    }

    /** The density is Pope's product of the inertial law and the two shape functions, at a few points. */
    @Test
    void densityIsPopesFormula() {
        PopeModelSpectrum p = new PopeModelSpectrum(400);
        double l = p.energyLength();
        for (double k : new double[] {0.3 / l, 3 / l, 0.01, 0.1, 0.5, 1.5}) {
            double x = k * l;
            double fL = Math.pow(x / Math.sqrt(x * x + p.cL()), 5.0 / 3.0 + 2.0);
            double fEta = Math.exp(-5.2 * (Math.pow(Math.pow(k, 4) + Math.pow(p.cEta(), 4), 0.25) - p.cEta()));
            double expected = 1.5 * Math.pow(k, -5.0 / 3.0) * fL * fEta;
            assertEquals(expected, p.density(k), 1e-12 * expected, "k = " + k);
        }
    }

    @Test
    void tooNarrowARangeIsRefusedWithTheValidRange() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> new PopeModelSpectrum(24));
        assertEquals("the model spectrum needs integral length / Kolmogorov length between 25 and 1e7; got 24.00",
                e.getMessage());
        new PopeModelSpectrum(PopeModelSpectrum.MIN_RATIO);
    }
}
