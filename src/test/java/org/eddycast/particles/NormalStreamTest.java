package org.eddycast.particles;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.random.RandomGenerator;
import java.util.random.RandomGeneratorFactory;
import org.apache.commons.math3.special.Erf;
import org.junit.jupiter.api.Test;

/**
 * The bulk normal variates: the vector and scalar generators give the same bits; each variate lies within the
 * stated bound of the exact Box-Muller value of its two words; the variates are cut where the manual says; and
 * the sample moments and tail fractions match the standard normal law within a few standard errors.
 */
class NormalStreamTest {

    private static RandomGenerator seeded(long seed) {
        return RandomGeneratorFactory.of("L64X128MixRandom").create(seed);
    }

    private static double[] draw(NormalStream s, long seed, int n) {
        s.reseed(seeded(seed));
        double[] out = new double[n];
        s.fill(out, n);
        return out;
    }

    /**
     * The exact Box-Muller pair of the words (a, b) as the stream reads them, in double precision with the
     * JDK's functions: u = 2 - (1 + 23 bits of a), w = (1 + 23 bits of b) - 3/2, sign from b's lowest bit.
     */
    private static double[] exactPair(int a, int b) {
        double u = 2.0 - (1.0 + (a >>> 9) / 8388608.0);
        double w = 1.0 + (b >>> 9) / 8388608.0 - 1.5;
        double r = Math.sqrt(-2.0 * Math.log(u)) * ((b & 1) != 0 ? -1 : 1);
        return new double[] {r * Math.cos(Math.PI * w), r * Math.sin(Math.PI * w)};
    }

    /** Every variate of the stream of this seed against its exact value, as the stream's own layout puts it. */
    private static double worstRelativeError(long seed, int n) {
        double[] fast = draw(new ScalarNormalStream(), seed, n);
        RandomGenerator rng = seeded(seed);
        long[] state = new long[NormalStream.LANES];
        for (int l = 0; l < state.length; l++) {
            state[l] = rng.nextLong();
        }
        double worst = 0;
        for (int base = 0; base < n; base += NormalStream.RUN) {
            for (int l = 0; l < NormalStream.LANES; l++) {
                long z1 = NormalStream.mix(state[l] + NormalStream.GAMMA);
                long z2 = NormalStream.mix(state[l] + 2 * NormalStream.GAMMA);
                state[l] += 2 * NormalStream.GAMMA;
                for (int h = 0; h < 2; h++) {
                    double[] exact = exactPair((int) (z1 >>> (32 * h)), (int) (z2 >>> (32 * h)));
                    int at = base + 2 * l + h;
                    worst = Math.max(worst, Math.abs(fast[at] - exact[0]) / (1 + Math.abs(exact[0])));
                    worst = Math.max(worst, Math.abs(fast[at + NormalStream.WORDS] - exact[1])
                            / (1 + Math.abs(exact[1])));
                }
            }
        }
        return worst;
    }

    @Test
    void vectorAndScalarStreamsGiveTheSameBits() {
        for (long seed : new long[] {3, 4, 5}) {
            double[] vector = draw(new VectorNormalStream(), seed, 8192);
            double[] scalar = draw(new ScalarNormalStream(), seed, 8192);
            for (int i = 0; i < vector.length; i++) {
                assertEquals(Double.doubleToRawLongBits(scalar[i]), Double.doubleToRawLongBits(vector[i]),
                        "seed " + seed + ", variate " + i + ": " + scalar[i] + " against " + vector[i]);
            }
        }
    }

    @Test
    void eachVariateWithinTheStatedBoundOfItsExactValue() {
        double worst = Math.max(worstRelativeError(7, 1 << 20), worstRelativeError(8, 1 << 18));
        assertTrue(worst <= NormalStream.VARIATE_BOUND, "largest error " + worst + " (1 + |x|), stated bound "
                + NormalStream.VARIATE_BOUND);
        // The bound is not loose by orders of magnitude: single-precision arithmetic leaves errors of 1e-7.
        assertTrue(worst > NormalStream.VARIATE_BOUND / 100, "largest error " + worst);
    }

    @Test
    void theCutIsTheRadiusOfTheSmallestUniform() {
        // The smallest u is 2^-23 (all 23 bits set); its radius sqrt(46 ln 2) = 5.6464 is the largest |x|.
        double[] out = new double[NormalStream.RUN];
        double cut = Math.sqrt(46 * Math.log(2));
        assertEquals(cut, NormalStream.CUT, 1e-12);
        for (int b : new int[] {0, 1, 0x7FFFFE00, 0x80000000, 0xFFFFFFFF, 0x40000000, 0x40000001}) {
            ScalarNormalStream.pair(0xFFFFFFFF, b, out, 0);
            double[] exact = exactPair(0xFFFFFFFF, b);
            double radius = Math.hypot(out[0], out[NormalStream.WORDS]);
            assertEquals(cut, radius, NormalStream.VARIATE_BOUND * (1 + cut), "radius at the cut, b = " + b);
            assertEquals(exact[0], out[0], NormalStream.VARIATE_BOUND * (1 + Math.abs(exact[0])), "b = " + b);
            assertEquals(exact[1], out[NormalStream.WORDS], NormalStream.VARIATE_BOUND * (1 + Math.abs(exact[1])));
        }
        // u = 1 (no bits set) gives the radius 0.
        ScalarNormalStream.pair(0, 0x12345678, out, 0);
        assertEquals(0.0, out[0], 0.0);
        assertEquals(0.0, out[NormalStream.WORDS], 0.0);
        double largest = 0;
        for (double v : draw(new VectorNormalStream(), 12, 1 << 20)) {
            largest = Math.max(largest, Math.abs(v));
        }
        assertTrue(largest <= cut * (1 + NormalStream.VARIATE_BOUND) + NormalStream.VARIATE_BOUND,
                "largest |variate| " + largest);
    }

    @Test
    void momentsAndTailOfTheStandardNormal() {
        int n = 1 << 20;
        double[] x = draw(new VectorNormalStream(), 11, n);
        double sum = 0;
        double sumSq = 0;
        double sumFourth = 0;
        long beyondTwo = 0;
        long beyondThreeAndHalf = 0;
        for (double v : x) {
            sum += v;
            sumSq += v * v;
            sumFourth += v * v * v * v;
            if (Math.abs(v) > 2) {
                beyondTwo++;
            }
            if (Math.abs(v) > 3.5) {
                beyondThreeAndHalf++;
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
        // Further out, P(|x| > 3.5) = erfc(3.5 / sqrt 2), 4.65e-4: the tail is intact well inside the cut.
        double q = Erf.erfc(3.5 / Math.sqrt(2));
        assertEquals(q, (double) beyondThreeAndHalf / n, 4 * Math.sqrt(q * (1 - q) / n));
    }

    @Test
    void countsMustBeWholeRuns() {
        assertThrows(IllegalArgumentException.class, () -> new ScalarNormalStream().fill(new double[20], 20));
        assertThrows(IllegalArgumentException.class, () -> new VectorNormalStream().fill(new double[48], 48));
        assertEquals(32, NormalStream.roundUp(17));
    }
}
