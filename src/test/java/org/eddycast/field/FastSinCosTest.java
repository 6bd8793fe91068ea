package org.eddycast.field;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;

/** Our sine and cosine against the JDK's correctly rounded-to-1-ulp {@link Math#sin} and {@link Math#cos}. */
class FastSinCosTest {

    @Test
    void agreesWithTheJdkToTwoEMinus13OverThePhasesThatOccur() {
        SplittableRandom random = new SplittableRandom(1);
        int n = 200_000;
        double[] phase = new double[n];
        for (int i = 0; i < n; i++) {
            double scale = Math.pow(10, random.nextDouble(-3, 6));
            phase[i] = (random.nextBoolean() ? 1 : -1) * scale * random.nextDouble();
        }
        double[] sin = new double[n];
        double[] cos = new double[n];
        FastSinCos.sinCos(phase, sin, cos, n);
        double worst = 0;
        for (int i = 0; i < n; i++) {
            worst = Math.max(worst, Math.abs(sin[i] - Math.sin(phase[i])));
            worst = Math.max(worst, Math.abs(cos[i] - Math.cos(phase[i])));
        }
        assertTrue(worst < 2e-13, "largest absolute error " + worst);
    }

    @Test
    void quadrantBoundariesAndSpecialPoints() {
        for (int q = -8; q <= 8; q++) {
            double p = q * Math.PI / 4;
            assertEquals(Math.sin(p), FastSinCos.sin(p), 2e-13, "sin at " + q + " pi/4");
            assertEquals(Math.cos(p), FastSinCos.cos(p), 2e-13, "cos at " + q + " pi/4");
        }
        assertEquals(0.0, FastSinCos.sin(0.0), 0.0);
        assertEquals(1.0, FastSinCos.cos(0.0), 0.0);
    }

    /**
     * The turn method against sin(2 pi f) for the exact fraction f = t - rint(t) of the turn phase: the only
     * rounding in the reference is that of 2 pi f (below 5e-16).
     */
    @Test
    void turnPhasesAgreeWithTheJdkToOneEMinus13() {
        SplittableRandom random = new SplittableRandom(2);
        double worst = 0;
        for (int i = 0; i < 200_000; i++) {
            double t = (random.nextBoolean() ? 1 : -1) * Math.pow(10, random.nextDouble(-4, 5)) * random.nextDouble();
            double f = t - Math.rint(t);
            worst = Math.max(worst, Math.abs(FastSinCos.sinOfTurns(t) - Math.sin(2 * Math.PI * f)));
            worst = Math.max(worst, Math.abs(FastSinCos.cosOfTurns(t) - Math.cos(2 * Math.PI * f)));
        }
        assertTrue(worst < 1e-13, "largest absolute error " + worst);
    }

    @Test
    void turnMethodAtEighthsOfATurn() {
        for (int q = -16; q <= 16; q++) {
            double t = q / 8.0;
            assertEquals(Math.sin(q * Math.PI / 4), FastSinCos.sinOfTurns(t), 1e-13, "sin at " + q + " eighths");
            assertEquals(Math.cos(q * Math.PI / 4), FastSinCos.cosOfTurns(t), 1e-13, "cos at " + q + " eighths");
        }
        assertEquals(0.0, FastSinCos.sinOfTurns(3.0), 0.0);
        assertEquals(1.0, FastSinCos.cosOfTurns(-7.0), 0.0);
    }
}
