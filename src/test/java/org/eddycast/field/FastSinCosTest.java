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
}
