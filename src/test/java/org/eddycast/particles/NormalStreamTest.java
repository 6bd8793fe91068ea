package org.eddycast.particles;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.random.RandomGeneratorFactory;
import org.junit.jupiter.api.Test;

/**
 * The bulk normal variates: the vector and scalar generators draw the same uniforms, and the sample moments
 * and tail fraction match the standard normal law within a few standard errors of each estimate.
 */
class NormalStreamTest {

    private static double[] draw(NormalStream s, long seed, int n) {
        s.reseed(RandomGeneratorFactory.of("L64X128MixRandom").create(seed));
        double[] out = new double[n];
        s.fill(out, n);
        return out;
    }

    @Test
    void vectorAndScalarStreamsAgreeToRounding() {
        double[] vector = draw(new VectorNormalStream(), 3, 4096);
        double[] scalar = draw(new ScalarNormalStream(), 3, 4096);
        for (int i = 0; i < vector.length; i++) {
            // Same uniforms; the logarithm, sine and cosine differ by rounding only.
            assertEquals(scalar[i], vector[i], 1e-13 * Math.max(1, Math.abs(scalar[i])), "variate " + i);
        }
    }

    @Test
    void momentsAndTailOfTheStandardNormal() {
        int n = 1 << 20;
        double[] x = draw(new VectorNormalStream(), 11, n);
        double sum = 0;
        double sumSq = 0;
        double sumFourth = 0;
        long beyondTwo = 0;
        for (double v : x) {
            sum += v;
            sumSq += v * v;
            sumFourth += v * v * v * v;
            if (Math.abs(v) > 2) {
                beyondTwo++;
            }
        }
        double mean = sum / n;
        double variance = sumSq / n;
        // Standard errors for N(0, 1): mean 1/sqrt(n); second moment sqrt(2/n); fourth moment sqrt(96/n)
        // (E x^8 - (E x^4)^2 = 105 - 9); four of each.
        assertEquals(0.0, mean, 4 / Math.sqrt(n));
        assertEquals(1.0, variance, 4 * Math.sqrt(2.0 / n));
        assertEquals(3.0, sumFourth / n, 4 * Math.sqrt(96.0 / n));
        // P(|x| > 2) = 0.0455003 (Abramowitz and Stegun 1964, Handbook of Mathematical Functions, table 26.1);
        // binomial standard error sqrt(p (1 - p) / n), four of them.
        double p = 0.0455003;
        assertEquals(p, (double) beyondTwo / n, 4 * Math.sqrt(p * (1 - p) / n));
    }

    @Test
    void countsMustBeWholeRuns() {
        assertThrows(IllegalArgumentException.class, () -> new ScalarNormalStream().fill(new double[20], 20));
        assertEquals(32, NormalStream.roundUp(17));
    }
}
