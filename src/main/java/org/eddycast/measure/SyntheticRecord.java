package org.eddycast.measure;

import java.util.Locale;
import java.util.function.DoubleUnaryOperator;

import org.apache.commons.math3.random.RandomGenerator;
import org.apache.commons.math3.random.Well19937c;
import org.apache.commons.math3.transform.DftNormalization;
import org.apache.commons.math3.transform.FastFourierTransformer;
import org.apache.commons.math3.transform.TransformType;
import org.apache.commons.math3.util.FastMath;

/**
 * Invented velocity signals with known statistics, for tests and the demo record. All randomness comes from a
 * seeded {@link Well19937c}, and only pure-Java arithmetic ({@link FastMath}) is used, so a seed gives the same
 * signal on every machine.
 *
 * <ul>
 *   <li>{@link #ornsteinUhlenbeck}: exact discrete sampling of an Ornstein-Uhlenbeck process, x_{i+1} =
 *       rho x_i + s sqrt(1 - rho^2) xi_i, rho = exp(-dt / T), x_0 stationary. Its autocorrelation is exactly
 *       exp(-|t| / T) at the sample lags; its one-sided spectral density is the discrete-time (aliased)
 *       Lorentzian {@link #ornsteinUhlenbeckDensity}.</li>
 *   <li>{@link #fourierSynthesis}: random-phase Fourier synthesis: x_j = sum_k A_k cos(2 pi f_k t_j + phi_k),
 *       A_k = sqrt(2 E(f_k) df), phases uniform, on the frequencies of a power-of-two grid (df = fs / N, N the
 *       next power of two at or above n; the first n samples are kept). Its variance is sum E(f_k) df.</li>
 * </ul>
 */
public final class SyntheticRecord {

    /** The integral of (1 + x^2)^(-5/6) over x from 0 to infinity: B(1/2, 1/3) / 2 = 2.10327 (derived). */
    static final double KARMAN_SHAPE_INTEGRAL = 2.1032742;

    private SyntheticRecord() {
    }

    /**
     * An Ornstein-Uhlenbeck signal with mean 0.
     *
     * @param n            samples
     * @param samplingRate samples per second
     * @param rms          stationary standard deviation
     * @param integralTime T, the e-folding time of the autocorrelation (s)
     * @param seed         random seed
     */
    public static double[] ornsteinUhlenbeck(int n, double samplingRate, double rms, double integralTime, long seed) {
        RandomGenerator random = new Well19937c(seed);
        double rho = FastMath.exp(-1.0 / (samplingRate * integralTime));
        double kick = rms * FastMath.sqrt(1 - rho * rho);
        double[] x = new double[n];
        x[0] = rms * random.nextGaussian();
        for (int i = 1; i < n; i++) {
            x[i] = rho * x[i - 1] + kick * random.nextGaussian();
        }
        return x;
    }

    /**
     * The exact one-sided spectral density of the sampled Ornstein-Uhlenbeck process: the discrete-time
     * Lorentzian 2 s^2 (1 - rho^2) dt / (1 - 2 rho cos(2 pi f dt) + rho^2), rho = exp(-dt / T), for
     * 0 &lt; f &lt; fs / 2. Its integral over [0, fs / 2] is s^2 (derived from the AR(1) form).
     */
    public static double ornsteinUhlenbeckDensity(double f, double samplingRate, double rms, double integralTime) {
        double dt = 1.0 / samplingRate;
        double rho = FastMath.exp(-dt / integralTime);
        return 2 * rms * rms * (1 - rho * rho) * dt / (1 - 2 * rho * FastMath.cos(2 * FastMath.PI * f * dt) + rho * rho);
    }

    /**
     * A random-phase signal with mean 0 and the given one-sided spectral density.
     *
     * @param n                 samples
     * @param samplingRate      samples per second
     * @param oneSidedDensity   E(f) ((units)^2 / Hz), evaluated at f &gt; 0
     * @param seed              random seed
     */
    public static double[] fourierSynthesis(int n, double samplingRate, DoubleUnaryOperator oneSidedDensity,
                                            long seed) {
        if (n < 2) {
            throw new IllegalArgumentException("at least 2 samples are needed, got " + n);
        }
        RandomGenerator random = new Well19937c(seed);
        int size = Integer.highestOneBit(n - 1) << 1;
        double df = samplingRate / size;
        double[][] data = new double[2][size];
        for (int k = 1; k < size / 2; k++) {
            double amplitude = FastMath.sqrt(2 * oneSidedDensity.applyAsDouble(k * df) * df);
            double phase = 2 * FastMath.PI * random.nextDouble();
            double re = 0.5 * size * amplitude * FastMath.cos(phase);
            double im = 0.5 * size * amplitude * FastMath.sin(phase);
            data[0][k] = re;
            data[1][k] = im;
            data[0][size - k] = re;
            data[1][size - k] = -im;
        }
        FastFourierTransformer.transformInPlace(data, DftNormalization.STANDARD, TransformType.INVERSE);
        double[] x = new double[n];
        System.arraycopy(data[0], 0, x, 0, n);
        return x;
    }

    /**
     * The frequency spectrum a probe sees in frozen turbulence with dissipation rate eps carried at speed U:
     * E(f) = K f^(-5/3) with K = C1 (eps U / (2 pi))^(2/3) (Kolmogorov's law through Taylor's hypothesis, see
     * {@link KolmogorovScales}) above {@code lowFrequency}, and flat at its value there below it.
     */
    public static DoubleUnaryOperator kolmogorovSpectrum(double dissipationRate, double meanSpeed,
                                                         double lowFrequency) {
        double level = KolmogorovScales.compensatedLevel(dissipationRate, meanSpeed);
        return f -> level * FastMath.pow(FastMath.max(f, lowFrequency), -5.0 / 3.0);
    }

    /**
     * A smooth spectrum with a flat low-frequency end and a -5/3 high-frequency end:
     * E(f) = A / (1 + (f / f0)^2)^(5/6), with A = rms^2 / (2.10327 f0) so that its integral is rms^2. Its
     * integral time is E(0) / (4 rms^2) = 0.11886 / f0 (derived).
     */
    public static DoubleUnaryOperator karmanShapedSpectrum(double rms, double kneeFrequency) {
        double a = rms * rms / (KARMAN_SHAPE_INTEGRAL * kneeFrequency);
        return f -> a * FastMath.pow(1 + (f / kneeFrequency) * (f / kneeFrequency), -5.0 / 6.0);
    }

    /** Seed of the bundled demo record presets/records/flume-probe.csv. */
    public static final long FLUME_SEED = 20_250_314L;

    /**
     * The text of the bundled demo record presets/records/flume-probe.csv: an invented three-component probe
     * record in a small laboratory flume, 4 minutes at 50 Hz, mean speed 0.30 m/s, with instrument noise, a
     * slow drift and injected spikes. See the comment lines at its top for how it is made.
     */
    public static String flumeProbeCsv() {
        return flumeProbeDemo().csv();
    }

    /**
     * The demo record's text and where its spikes were injected.
     *
     * @param csv          the file text
     * @param spikeSamples per component, the sample indices (from 0) that received a spike, ascending
     */
    record FlumeDemo(String csv, int[][] spikeSamples) {
    }

    /** Sampling rate of the demo record (Hz). */
    static final double FLUME_RATE = 50;
    /** Mean speed of the demo record (m/s). */
    static final double FLUME_MEAN_SPEED = 0.30;
    /** Rms per component of the demo record's turbulence (m/s). */
    static final double[] FLUME_RMS = {0.030, 0.022, 0.016};
    /** Knee frequency per component of the demo record's spectrum (Hz). */
    static final double[] FLUME_KNEE = {0.3, 0.45, 0.6};
    /** Linear drift added to u over the whole demo record (m/s), as when a flume's pump settles. */
    static final double FLUME_DRIFT = 0.03;
    /** Rms of the white instrument noise added to each component (m/s). */
    static final double FLUME_NOISE = 0.002;

    static FlumeDemo flumeProbeDemo() {
        double fs = FLUME_RATE;
        int n = 12_000;
        double[] mean = {FLUME_MEAN_SPEED, 0.004, -0.002};
        double drift = FLUME_DRIFT;
        RandomGenerator random = new Well19937c(FLUME_SEED);
        double[][] v = new double[3][];
        for (int c = 0; c < 3; c++) {
            v[c] = fourierSynthesis(n, fs, karmanShapedSpectrum(FLUME_RMS[c], FLUME_KNEE[c]), random.nextLong());
            for (int i = 0; i < n; i++) {
                v[c][i] += mean[c] + FLUME_NOISE * random.nextGaussian();
            }
        }
        for (int i = 0; i < n; i++) {
            v[0][i] += drift * (i / (n - 1.0) - 0.5);
        }
        int[] spikeCounts = {14, 7, 6};
        int[][] spikeSamples = new int[3][];
        for (int c = 0; c < 3; c++) {
            java.util.TreeSet<Integer> used = new java.util.TreeSet<>();
            for (int s = 0; s < spikeCounts[c]; s++) {
                int i = 50 + random.nextInt(n - 100);
                while (!used.add(i)) {
                    i = 50 + random.nextInt(n - 100);
                }
                double size = (0.15 + 0.25 * random.nextDouble()) * (random.nextBoolean() ? 1 : -1);
                v[c][i] += size;
            }
            spikeSamples[c] = used.stream().mapToInt(Integer::intValue).toArray();
        }
        StringBuilder out = new StringBuilder(n * 36);
        out.append("# SYNTHETIC demo record, invented for eddycast: not a measurement.\n");
        out.append("# Scenario: an acoustic velocity probe at mid-depth in a small laboratory flume (0.3 m deep),\n");
        out.append("# mean speed about 0.30 m/s, sampled at 50 Hz for 240 s.\n");
        out.append("# Made by org.eddycast.measure.SyntheticRecord.flumeProbeCsv(), seed ").append(FLUME_SEED)
                .append(": each component\n");
        out.append("# by random-phase Fourier synthesis of E(f) = A / (1 + (f/f0)^2)^(5/6) with rms 0.030, 0.022,\n");
        out.append("# 0.016 m/s and f0 = 0.3, 0.45, 0.6 Hz; white noise of 0.002 m/s rms added to each component;\n");
        out.append("# a linear drift of 0.03 m/s over the record added to u; single-sample spikes of 0.15 to\n");
        out.append("# 0.40 m/s added at random samples (14 in u, 7 in v, 6 in w).\n");
        out.append("time [s], u [m/s], v [m/s], w [m/s]\n");
        for (int i = 0; i < n; i++) {
            out.append(String.format(Locale.ROOT, "%.2f,%.4f,%.4f,%.4f\n", i / fs, v[0][i], v[1][i], v[2][i]));
        }
        return new FlumeDemo(out.toString(), spikeSamples);
    }
}
