package org.eddycast.measure;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.Random;

import org.apache.commons.math3.analysis.integration.SimpsonIntegrator;
import org.junit.jupiter.api.Test;

/**
 * Welch's method (Welch, P. D. 1967, "The use of fast Fourier transform for the estimation of power spectra:
 * a method based on time averaging over short, modified periodograms", IEEE Trans. Audio Electroacoust.
 * AU-15:70-73): Parseval's theorem for the normalisation, and the exact spectrum of a sampled
 * Ornstein-Uhlenbeck process.
 *
 * <p>Standard error of a Welch estimate averaged over m neighbouring frequencies (derived for Gaussian
 * signals with a smooth spectrum): one periodogram value has relative variance 1; successive Hann segments
 * overlapping by half have correlated periodograms, squared correlation (sum w_j w_{j+L/2} / sum w_j^2)^2 =
 * (1/3)^2 = 1/9, so K segments give variance (1 + 2/9) / K; neighbouring frequencies of one Hann periodogram
 * correlate by (2/3)^2 = 4/9 (next but one (1/6)^2 = 1/36), so m of them give (1 + 8/9 + 1/18) / m. Together
 * the relative standard error is sqrt(2.376 / (K m)).
 */
class WelchSpectrumEstimatorTest {

    static double relativeStandardError(int segments, int frequencies) {
        return Math.sqrt((1 + 2.0 / 9) * (1 + 8.0 / 9 + 1.0 / 18) / ((double) segments * frequencies));
    }

    private static double[] whiteNoise(int n, long seed) {
        Random random = new Random(seed);
        double[] x = new double[n];
        for (int i = 0; i < n; i++) {
            x[i] = random.nextGaussian();
        }
        return x;
    }

    @Test
    void integralEqualsTheWindowedMeanSquareExactly() {
        int n = 10_000;
        int length = 1024;
        double fs = 25;
        double[] x = whiteNoise(n, 5);
        for (int i = 0; i < n; i++) {
            x[i] = 0.3 + 0.02 * x[i] + 0.01 * Math.sin(0.01 * i);
        }
        PowerSpectrum p = WelchSpectrumEstimator.estimate(x, fs, length);
        // Parseval: sum P(f_k) df = average over segments of sum (w_j x_j)^2 / sum w_j^2 (mean removed)
        double mean = java.util.Arrays.stream(x).average().orElseThrow();
        double windowPower = 0;
        double[] w = new double[length];
        for (int j = 0; j < length; j++) {
            w[j] = 0.5 * (1 - Math.cos(2 * Math.PI * j / length));
            windowPower += w[j] * w[j];
        }
        double total = 0;
        int segments = 0;
        for (int start = 0; start + length <= n; start += length / 2) {
            for (int j = 0; j < length; j++) {
                double v = (x[start + j] - mean) * w[j];
                total += v * v;
            }
            segments++;
        }
        assertEquals(segments, p.segmentCount());
        assertEquals(total / (segments * windowPower), p.integral(), 1e-12 * p.integral());
        assertEquals(fs / length, p.resolution(), 1e-15);
        assertEquals(fs / 2, p.frequencies()[length / 2], 1e-12);
    }

    @Test
    void integralEstimatesTheVarianceOfWhiteNoise() {
        int n = 1 << 15;
        double[] x = whiteNoise(n, 8);
        PowerSpectrum p = WelchSpectrumEstimator.estimate(x, 10.0);
        // The integral is a weighted mean square with weights omega_i = sum over segments of w^2; for white
        // Gaussian noise its relative standard error is sqrt(2 sum omega^2) / sum omega (derived).
        int length = p.segmentLength();
        double[] omega = new double[n];
        for (int start = 0; start + length <= n; start += length / 2) {
            for (int j = 0; j < length; j++) {
                double wj = 0.5 * (1 - Math.cos(2 * Math.PI * j / length));
                omega[start + j] += wj * wj;
            }
        }
        double s1 = 0;
        double s2 = 0;
        for (double o : omega) {
            s1 += o;
            s2 += o * o;
        }
        double se = Math.sqrt(2 * s2) / s1;
        assertEquals(1.0, p.integral(), 3 * se);
    }

    @Test
    void discreteLorentzianIntegratesToTheVariance() {
        // the reference itself: integral of the sampled Ornstein-Uhlenbeck density over [0, fs/2] is sigma^2
        double fs = 100;
        double integral = new SimpsonIntegrator(1e-10, 1e-12, 3, 30).integrate(1_000_000,
                f -> SyntheticRecord.ornsteinUhlenbeckDensity(f, fs, 2.0, 0.1), 0, fs / 2);
        assertEquals(4.0, integral, 1e-7);
    }

    /**
     * Against the exact spectrum of the sampled Ornstein-Uhlenbeck process, the discrete-time (aliased)
     * Lorentzian 2 s^2 (1 - rho^2) dt / (1 - 2 rho cos(2 pi f dt) + rho^2), rho = exp(-dt/T), in octave bands
     * of frequency from the 4th estimate up to the Nyquist frequency (the lowest estimates are left out: the
     * mean removal takes power from f = 0 and the Hann window spreads it over the first two). Each band's
     * mean ratio must lie within 3.5 standard errors of 1 (3.5 rather than 3 because ten bands are checked).
     */
    @Test
    void ornsteinUhlenbeckSpectrumMatchesTheDiscreteLorentzian() {
        int n = 1 << 16;
        double fs = 100;
        double t = 0.1;
        double sigma = 0.05;
        double[] x = SyntheticRecord.ornsteinUhlenbeck(n, fs, sigma, t, 17);
        PowerSpectrum p = WelchSpectrumEstimator.estimate(x, fs);
        assertEquals(8192, p.segmentLength());
        double[] f = p.frequencies();
        double[] d = p.densities();
        int bands = 0;
        for (int low = 4; low < f.length - 1; low *= 2) {
            int high = Math.min(2 * low, f.length - 1);
            double ratio = 0;
            for (int k = low; k < high; k++) {
                ratio += d[k] / SyntheticRecord.ornsteinUhlenbeckDensity(f[k], fs, sigma, t);
            }
            int m = high - low;
            ratio /= m;
            double se = relativeStandardError(p.segmentCount(), m);
            assertEquals(1.0, ratio, 3.5 * se, "band " + f[low] + " to " + f[high] + " Hz");
            bands++;
        }
        assertEquals(10, bands);
    }

    @Test
    void automaticSegmentLengthIsTheLargestPowerOfTwoUpToAnEighth() {
        assertEquals(64, WelchSpectrumEstimator.automaticSegmentLength(512));
        assertEquals(64, WelchSpectrumEstimator.automaticSegmentLength(1023));
        assertEquals(1024, WelchSpectrumEstimator.automaticSegmentLength(12_000));
        assertThrows(IllegalArgumentException.class, () -> WelchSpectrumEstimator.automaticSegmentLength(511));
        assertThrows(IllegalArgumentException.class, () -> WelchSpectrumEstimator.estimate(new double[100], 1, 48));
    }
}
