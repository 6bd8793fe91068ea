package org.eddycast.measure;

import org.apache.commons.math3.transform.DftNormalization;
import org.apache.commons.math3.transform.FastFourierTransformer;
import org.apache.commons.math3.transform.TransformType;

/**
 * Power spectral density by Welch's method: the average of windowed, overlapping periodograms.
 *
 * <p>Method: Welch, P. D. (1967), "The use of fast Fourier transform for the estimation of power spectra: a
 * method based on time averaging over short, modified periodograms", IEEE Transactions on Audio and
 * Electroacoustics AU-15(2):70-73.
 *
 * <p>Details: the record mean is removed; segments of L samples (a power of two) overlap by half; each is
 * multiplied by the periodic Hann window w_j = (1 - cos(2 pi j / L)) / 2 and transformed with Commons Math's
 * {@link FastFourierTransformer}. The one-sided density is P(f_k) = c |X_k|^2 / (fs sum w_j^2), with c = 2
 * except at f = 0 and the Nyquist frequency (c = 1), averaged over the segments. Then by Parseval's theorem
 * the sum of P(f_k) fs / L equals the segments' average of sum (w_j x_j)^2 / sum w_j^2: the windowed mean
 * square, whose expectation is the variance. Samples after the last whole segment are not used.
 *
 * <p>Segment length when not given: the largest power of two not above n / 8 (about 15 averaged segments,
 * each Welch estimate then has a relative standard error near 1/sqrt(15)), at least {@link #MIN_SEGMENT}.
 */
public final class WelchSpectrumEstimator {

    /** Shortest automatic segment, in samples. */
    public static final int MIN_SEGMENT = 64;
    /** Fewest samples the automatic segment length accepts: 8 segments of {@link #MIN_SEGMENT}. */
    public static final int MIN_SAMPLES = 8 * MIN_SEGMENT;

    private WelchSpectrumEstimator() {
    }

    /** The automatic segment length for n samples (see class note); n must be at least {@link #MIN_SAMPLES}. */
    public static int automaticSegmentLength(int n) {
        if (n < MIN_SAMPLES) {
            throw new IllegalArgumentException("Welch's method needs at least " + MIN_SAMPLES + " samples, got " + n);
        }
        return Integer.highestOneBit(n / 8);
    }

    /** The density with the automatic segment length. */
    public static PowerSpectrum estimate(double[] signal, double samplingRate) {
        return estimate(signal, samplingRate, automaticSegmentLength(signal.length));
    }

    /** The density with segments of {@code segmentLength} samples (a power of two, at most the record length). */
    public static PowerSpectrum estimate(double[] signal, double samplingRate, int segmentLength) {
        int n = signal.length;
        if (segmentLength < 4 || Integer.bitCount(segmentLength) != 1) {
            throw new IllegalArgumentException("segment length must be a power of two of at least 4, not "
                    + segmentLength);
        }
        if (segmentLength > n) {
            throw new IllegalArgumentException("segment length " + segmentLength + " exceeds the record's " + n
                    + " samples");
        }
        if (!(samplingRate > 0)) {
            throw new IllegalArgumentException("sampling rate must be positive, not " + samplingRate);
        }
        double mean = 0;
        for (double v : signal) {
            mean += v;
        }
        mean /= n;
        int half = segmentLength / 2;
        double[] window = new double[segmentLength];
        double windowPower = 0;
        for (int j = 0; j < segmentLength; j++) {
            window[j] = 0.5 * (1 - Math.cos(2 * Math.PI * j / segmentLength));
            windowPower += window[j] * window[j];
        }
        double[] sum = new double[half + 1];
        double[][] data = new double[2][segmentLength];
        int segments = 0;
        for (int start = 0; start + segmentLength <= n; start += half) {
            for (int j = 0; j < segmentLength; j++) {
                data[0][j] = (signal[start + j] - mean) * window[j];
                data[1][j] = 0;
            }
            FastFourierTransformer.transformInPlace(data, DftNormalization.STANDARD, TransformType.FORWARD);
            for (int k = 0; k <= half; k++) {
                sum[k] += data[0][k] * data[0][k] + data[1][k] * data[1][k];
            }
            segments++;
        }
        double[] frequencies = new double[half + 1];
        double[] densities = new double[half + 1];
        double scale = 1.0 / (samplingRate * windowPower * segments);
        for (int k = 0; k <= half; k++) {
            frequencies[k] = k * samplingRate / segmentLength;
            double oneSided = k == 0 || k == half ? 1.0 : 2.0;
            densities[k] = oneSided * sum[k] * scale;
        }
        return new PowerSpectrum(frequencies, densities, samplingRate, segmentLength, segments);
    }
}
