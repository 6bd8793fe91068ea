package org.eddycast.measure;

import org.apache.commons.math3.transform.DftNormalization;
import org.apache.commons.math3.transform.FastFourierTransformer;
import org.apache.commons.math3.transform.TransformType;

/**
 * Autocorrelation of a sampled signal through the fast Fourier transform, and its integral time scale.
 *
 * <p>The fluctuation x (mean removed) is zero-padded to a power of two at least twice its length, so the
 * circular correlation of the padded series equals the linear sums C(k) = sum_{i=0}^{n-1-k} x_i x_{i+k}
 * (Wiener-Khinchin: inverse transform of |X|^2). The coefficient is R(k) = C(k) / C(0): the biased estimator
 * (divisor n at every lag), which is the usual choice for integral scales because it stays bounded at large
 * lags (common practice).
 * Lags up to half the record are kept.
 *
 * <p>Integral time: {@link Autocorrelation#INTEGRAL_TIME_RULE}. The estimate is biased low: sampling noise in
 * R of order sqrt(T / record length) makes the estimate cross zero early.
 *
 * <p>Special cases: fewer than 4 samples or a signal with no spread are rejected with an
 * IllegalArgumentException.
 */
public final class AutocorrelationEstimator {

    private AutocorrelationEstimator() {
    }

    /** The autocorrelation of {@code signal} sampled at {@code samplingRate} (Hz). */
    public static Autocorrelation estimate(double[] signal, double samplingRate) {
        int n = signal.length;
        if (n < 4) {
            throw new IllegalArgumentException("autocorrelation needs at least 4 samples, got " + n);
        }
        double mean = 0;
        for (double v : signal) {
            mean += v;
        }
        mean /= n;
        int size = Integer.highestOneBit(2 * n - 1) << 1;
        double[][] data = new double[2][size];
        for (int i = 0; i < n; i++) {
            data[0][i] = signal[i] - mean;
        }
        FastFourierTransformer.transformInPlace(data, DftNormalization.STANDARD, TransformType.FORWARD);
        for (int k = 0; k < size; k++) {
            double re = data[0][k];
            double im = data[1][k];
            data[0][k] = re * re + im * im;
            data[1][k] = 0;
        }
        FastFourierTransformer.transformInPlace(data, DftNormalization.STANDARD, TransformType.INVERSE);
        double c0 = data[0][0];
        if (!(c0 > 0)) {
            throw new IllegalArgumentException("autocorrelation of a signal with no spread is undefined");
        }
        int lags = n / 2 + 1;
        double dt = 1.0 / samplingRate;
        double[] lagTimes = new double[lags];
        double[] values = new double[lags];
        for (int k = 0; k < lags; k++) {
            lagTimes[k] = k * dt;
            values[k] = data[0][k] / c0;
        }
        return fromCoefficients(lagTimes, values, dt);
    }

    /** Finds the first zero crossing and integrates up to it. */
    static Autocorrelation fromCoefficients(double[] lagTimes, double[] values, double dt) {
        double integral = 0;
        for (int k = 1; k < values.length; k++) {
            if (values[k] <= 0) {
                double fraction = values[k - 1] / (values[k - 1] - values[k]);
                double crossing = (k - 1 + fraction) * dt;
                integral += 0.5 * values[k - 1] * fraction * dt;
                return new Autocorrelation(lagTimes, values, crossing, integral);
            }
            integral += 0.5 * (values[k - 1] + values[k]) * dt;
        }
        return new Autocorrelation(lagTimes, values, Double.NaN, integral);
    }
}
