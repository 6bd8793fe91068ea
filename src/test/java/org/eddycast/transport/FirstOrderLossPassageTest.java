package org.eddycast.transport;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.eddycast.docs.ValidationLog;
import org.junit.jupiter.api.Test;

/**
 * A station curve of a tracer lost at first order against the closed form.
 *
 * <p>The conservative curve is the passage of an instantaneous plane release carried at U and spread with a
 * constant dispersion coefficient K: c(t) = M / (A sqrt(4 pi K t)) exp(-(x - U t)^2 / (4 K t)) (Crank 1975, The
 * Mathematics of Diffusion, 2nd ed., eq. 2.6, in the frame moving with the flow). A first-order loss multiplies it
 * by exp(-k t), the analytic solution of dc/dt = -k c. The peak in time of the product solves
 * d ln c / dt = 0: -1/(2t) + [2 U t (x - U t) + (x - U t)^2] / (4 K t^2) - k = 0; times 4 K t^2 this is
 * x^2 - U^2 t^2 - 2 K t - 4 K k t^2 = 0, so t* = (-K + sqrt(K^2 + x^2 (U^2 + 4 K k))) / (U^2 + 4 K k), derived
 * here, and the peak is c(t*) exp(-k t*). With k = 0 it is the conservative curve's own peak time.
 */
class FirstOrderLossPassageTest {

    private static final double MASS = 0.5;
    private static final double AREA = 6.0;
    private static final double X = 200;
    private static final double U = 0.4;
    private static final double K = 2.0;
    private static final double DT = 0.5;

    private static double conservative(double t) {
        return MASS / (AREA * Math.sqrt(4 * Math.PI * K * t)) * Math.exp(-(X - U * t) * (X - U * t) / (4 * K * t));
    }

    private static double peakTime(double k) {
        double a = U * U + 4 * K * k;
        return (-K + Math.sqrt(K * K + X * X * a)) / a;
    }

    /** The conservative curve sampled every DT seconds up to four times the travel time. */
    private static StationCurve sampled() {
        int n = (int) (4 * X / U / DT);
        double[] t = new double[n];
        double[] c = new double[n];
        for (int j = 0; j < n; j++) {
            t[j] = (j + 1) * DT;
            c[j] = conservative(t[j]);
        }
        return new StationCurve(X, Double.NaN, t, c, c, c, new double[n], new double[n]);
    }

    @Test
    void theDecayedPeakMovesEarlierAndLowerAsTheClosedFormSays() {
        double k = 1.0 / 1800; // a half-life of 1,248 s: 21 minutes
        StationCurve curve = sampled();
        Passage plain = Passage.of(curve, Double.NaN);
        Passage decayed = Passage.of(curve.decayed(k), Double.NaN);
        // the sampled maximum lies within half a step of the true one; its value within (1/2)|c''| (DT/2)^2,
        // c''/c about 1/sigma_t^2 with sigma_t = sqrt(2 K t)/U near 110 s: a relative 3e-6, checked at 1e-5
        assertEquals(peakTime(0), plain.peakTime(), DT / 2, "the conservative curve's peak time");
        double expectedTime = peakTime(k);
        double expectedPeak = conservative(expectedTime) * Math.exp(-k * expectedTime);
        assertTrue(ValidationLog.exact("first-order loss: peak time of a decayed Gaussian passage (s)",
                "Crank 1975, The Mathematics of Diffusion, eq. 2.6, times exp(-k t); peak time derived",
                expectedTime, decayed.peakTime(), DT / 2, "within half a record step"),
                () -> "peak time " + decayed.peakTime() + " against " + expectedTime);
        assertTrue(ValidationLog.exact("first-order loss: peak of a decayed Gaussian passage (kg/m^3)",
                "Crank 1975, The Mathematics of Diffusion, eq. 2.6, times exp(-k t)", expectedPeak,
                decayed.peak(), 1e-5 * expectedPeak, "relative 1e-5 (sampling of the peak)"),
                () -> "peak " + decayed.peak() + " against " + expectedPeak);
        // the loss moved the peak by far more than the sampling could: about k sigma_t^2 = 7 s earlier
        assertTrue(plain.peakTime() - decayed.peakTime() > 5, plain.peakTime() + " then " + decayed.peakTime());
        // and the peak fell by more than exp(-k t) at the old peak time would say: the maximum is re-read
        assertTrue(decayed.peak() >= plain.peak() * Math.exp(-k * plain.peakTime()));
    }

    @Test
    void everyValueOfTheCurveAndItsBandIsMultipliedAtItsOwnTime() {
        double k = 2e-3;
        StationCurve curve = sampled();
        StationCurve decayed = curve.decayed(k);
        double[] t = curve.times();
        for (int j = 0; j < t.length; j += 97) {
            double f = Math.exp(-k * t[j]);
            assertEquals(curve.concentration()[j] * f, decayed.concentration()[j], 1e-15 * curve.peak());
            assertEquals(curve.low()[j] * f, decayed.low()[j], 1e-15 * curve.peak());
            assertEquals(curve.high()[j] * f, decayed.high()[j], 1e-15 * curve.peak());
        }
    }
}
