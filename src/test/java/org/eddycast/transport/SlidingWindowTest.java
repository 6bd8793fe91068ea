package org.eddycast.transport;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.apache.commons.math3.special.Erf;
import org.eddycast.docs.ValidationLog;
import org.junit.jupiter.api.Test;

/**
 * The station curve of a release at a constant rate over a duration T against the closed form.
 *
 * <p>A Gaussian passage curve C(t) = exp(-(t - t0)^2 / (2 s^2)) / (sqrt(2 pi) s) (per unit of time integral: the
 * passage of a cloud past a distant station, Taylor 1954 and Fischer et al. 1979, Mixing in Inland and Coastal
 * Waters, ch. 5) averaged over a window of length T is
 * C_T(t) = (1 / (2 T)) [erf((t - t0) / (sqrt 2 s)) - erf((t - T - t0) / (sqrt 2 s))], the difference of error
 * functions of a slab of finite width (Crank 1975, The Mathematics of Diffusion, 2nd ed., sec. 2.2), peaking at
 * t0 + T / 2 with erf(T / (2 sqrt 2 s)) / T.
 */
class SlidingWindowTest {

    private static final double T0 = 600;
    private static final double S = 60;
    private static final double DT = 1;

    private static double gaussian(double t) {
        return Math.exp(-(t - T0) * (t - T0) / (2 * S * S)) / (Math.sqrt(2 * Math.PI) * S);
    }

    private static double closedForm(double t, double duration) {
        return (Erf.erf((t - T0) / (Math.sqrt(2) * S)) - Erf.erf((t - duration - T0) / (Math.sqrt(2) * S)))
                / (2 * duration);
    }

    private static StationCurve slug() {
        int n = (int) ((T0 + 8 * S) / DT);
        double[] t = new double[n];
        double[] c = new double[n];
        for (int j = 0; j < n; j++) {
            t[j] = (j + 1) * DT;
            c[j] = gaussian(t[j]);
        }
        return new StationCurve(300, Double.NaN, t, c, c, c, new double[n], new double[n]);
    }

    @Test
    void theWindowedCurveIsTheDifferenceOfErrorFunctions() {
        double duration = 300;
        StationCurve curve = SlidingWindow.of(slug(), duration);
        double[] t = curve.times();
        double[] c = curve.concentration();
        // the records are joined by straight lines: the average of such a curve over a window differs from the
        // exact one by at most DT^2 / 12 max|C''| (the trapezoid rule; the window's ends fall on records here),
        // max|C''| = 1 / (sqrt(2 pi) s^3) at the centre: 1.5e-7
        double bound = DT * DT / 12 / (Math.sqrt(2 * Math.PI) * S * S * S);
        double worst = 0;
        for (int j = 0; j < t.length; j++) {
            worst = Math.max(worst, Math.abs(c[j] - closedForm(t[j], duration)));
        }
        double largest = worst;
        assertTrue(worst <= bound, () -> "largest difference " + largest + " against the bound " + bound);
        Passage p = Passage.of(curve, Double.NaN);
        double peak = Erf.erf(duration / (2 * Math.sqrt(2) * S)) / duration;
        assertTrue(ValidationLog.exact("release over a duration: peak of a windowed Gaussian passage (1/s)",
                "Crank 1975, The Mathematics of Diffusion, sec. 2.2 (slab of finite width)", peak, p.peak(),
                bound, "the piecewise-linear bound DT^2 max|C''| / 12"), () -> p.peak() + " against " + peak);
        assertEquals(T0 + duration / 2, p.peakTime(), DT, "the peak half the duration after the slug's");
        // the curve runs on for the duration past the slug's last record and returns to zero
        assertTrue(t[t.length - 1] >= slug().times()[slug().times().length - 1] + duration);
        assertEquals(0, c[c.length - 1], 1e-9);
    }

    @Test
    void theMassPassingIsTheSlugsAndAShortWindowChangesNothing() {
        StationCurve slug = slug();
        StationCurve spread = SlidingWindow.of(slug, 450);
        // integral of C over time: 1 for the slug, and the same for any window (mass is conserved)
        assertEquals(1.0, trapezoid(slug.times(), slug.concentration()), 1e-6);
        assertEquals(1.0, trapezoid(spread.times(), spread.concentration()), 1e-6);
        StationCurve blink = SlidingWindow.of(slug, 1e-3);
        for (int j = 0; j < slug.times().length; j += 50) {
            assertEquals(slug.concentration()[j], blink.concentration()[j], 1e-3 * slug.peak());
        }
    }

    private static double trapezoid(double[] t, double[] c) {
        double sum = 0.5 * c[0] * t[0];
        for (int j = 1; j < t.length; j++) {
            sum += 0.5 * (c[j] + c[j - 1]) * (t[j] - t[j - 1]);
        }
        return sum;
    }
}
