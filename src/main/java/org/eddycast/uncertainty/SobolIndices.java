package org.eddycast.uncertainty;

import java.util.Arrays;
import java.util.SplittableRandom;
import org.apache.commons.math3.stat.descriptive.rank.Percentile;
import org.apache.commons.math3.stat.descriptive.rank.Percentile.EstimationType;

/**
 * First-order and total Sobol sensitivity indices from a model's responses at the rows of a
 * {@link SaltelliDesign}, with 95% bootstrap half-widths.
 *
 * <p>Estimators (Saltelli, Annoni, Azzini, Campolongo, Ratto & Tarantola 2010, "Variance based sensitivity
 * analysis of model output. Design and estimator for the total sensitivity index", Computer Physics
 * Communications 181:259-270, Table 2):
 * <ul>
 * <li>first order, Table 2 (b): S_i = (1/N) sum_j f(B)_j (f(AB_i)_j - f(A)_j) / V;</li>
 * <li>total, Table 2 (f), Jansen's estimator (Jansen 1999, "Analysis of variance designs for model output",
 * Computer Physics Communications 117:35-43): S_Ti = (1/N) sum_j (f(A)_j - f(AB_i)_j)^2 / (2 V);</li>
 * </ul>
 * with V the sample variance of the 2N responses at the rows of A and B. The responses are first centred on
 * the mean of those 2N values: the first-order estimator's expectation is unchanged (f(AB_i) and f(A) have the
 * same mean), and its scatter no longer grows with the response's offset from zero. Jansen's estimator uses
 * differences only and is unaffected.
 *
 * <p>Half-widths: a bootstrap over the N base samples (Efron & Tibshirani 1993, An Introduction to the
 * Bootstrap): 1,000 resamples of the indices j with replacement, taken jointly for A, B and every AB_i, each
 * giving V and the indices again; the half-width is half the distance between the 2.5th and 97.5th
 * percentiles of the resampled indices. The resampling treats the quasi-random rows as independent, so for a
 * Sobol design it tends to overstate the error rather than understate it. The random stream is a
 * {@link SplittableRandom} from the caller's seed, so the same responses and seed give the same half-widths.
 *
 * <p>A constant response (the same value at every row of A and B, so V = 0) has no variance to share: every
 * index and half-width is 0 and {@link #note()} says why. Estimates may fall slightly below 0 or above 1 by
 * sampling error; they are not clipped.
 */
public final class SobolIndices {

    /** Bootstrap resamples behind the half-widths. */
    public static final int RESAMPLES = 1000;

    private final double[] first;
    private final double[] total;
    private final double[] firstHalfWidth;
    private final double[] totalHalfWidth;
    private final double variance;
    private final String note;

    private SobolIndices(double[] first, double[] total, double[] firstHalfWidth, double[] totalHalfWidth,
                         double variance, String note) {
        this.first = first;
        this.total = total;
        this.firstHalfWidth = firstHalfWidth;
        this.totalHalfWidth = totalHalfWidth;
        this.variance = variance;
        this.note = note;
    }

    /**
     * Estimates the indices.
     *
     * @param design        the design whose rows were run
     * @param responses     the response at each row, indexed by row ({@code design.rows()} values, all finite)
     * @param bootstrapSeed the seed of the bootstrap's random stream
     * @throws IllegalArgumentException for a wrong length or a response that is not a finite number (naming
     *                                  the row)
     */
    public static SobolIndices estimate(SaltelliDesign design, double[] responses, long bootstrapSeed) {
        if (responses.length != design.rows()) {
            throw new IllegalArgumentException("the design has " + design.rows() + " rows but " + responses.length
                    + " responses were given");
        }
        for (int row = 0; row < responses.length; row++) {
            if (!Double.isFinite(responses[row])) {
                throw new IllegalArgumentException("the response at " + design.describeRow(row)
                        + " is " + responses[row] + "; every response must be a finite number");
            }
        }
        int n = design.baseSamples();
        int k = design.inputs();
        int[] identity = new int[n];
        for (int j = 0; j < n; j++) {
            identity[j] = j;
        }
        double[] first = new double[k];
        double[] total = new double[k];
        double variance = estimateInto(responses, n, k, identity, first, total);
        if (variance == 0) {
            return new SobolIndices(first, total, new double[k], new double[k], 0,
                    "The response is the same at every sample, so no input moves it: every index is 0.");
        }
        double[][] firstSamples = new double[k][RESAMPLES];
        double[][] totalSamples = new double[k][RESAMPLES];
        SplittableRandom random = new SplittableRandom(bootstrapSeed);
        int[] pick = new int[n];
        double[] f = new double[k];
        double[] t = new double[k];
        for (int b = 0; b < RESAMPLES; b++) {
            for (int j = 0; j < n; j++) {
                pick[j] = random.nextInt(n);
            }
            estimateInto(responses, n, k, pick, f, t);
            for (int i = 0; i < k; i++) {
                firstSamples[i][b] = f[i];
                totalSamples[i][b] = t[i];
            }
        }
        return new SobolIndices(first, total, halfWidths(firstSamples), halfWidths(totalSamples), variance, "");
    }

    /**
     * The estimators over the base samples listed in {@code pick} (repeats allowed); writes the indices and
     * returns V (exactly 0 when the picked A and B responses are all equal, the indices then 0: their mean
     * would carry round-off and make a variance of 1e-31 out of nothing).
     */
    private static double estimateInto(double[] y, int n, int k, int[] pick, double[] first, double[] total) {
        int m = pick.length;
        double mean = 0;
        boolean constant = true;
        double reference = y[pick[0]];
        for (int j : pick) {
            mean += y[j] + y[n + j];
            constant &= y[j] == reference && y[n + j] == reference;
        }
        if (constant) {
            Arrays.fill(first, 0);
            Arrays.fill(total, 0);
            return 0;
        }
        mean /= 2.0 * m;
        double squares = 0;
        for (int j : pick) {
            double a = y[j] - mean;
            double b = y[n + j] - mean;
            squares += a * a + b * b;
        }
        double variance = squares / (2.0 * m - 1);
        for (int i = 0; i < k; i++) {
            int ab = (2 + i) * n;
            double sumFirst = 0;
            double sumTotal = 0;
            for (int j : pick) {
                double a = y[j] - mean;
                double b = y[n + j] - mean;
                double abi = y[ab + j] - mean;
                sumFirst += b * (abi - a);
                sumTotal += (a - abi) * (a - abi);
            }
            first[i] = sumFirst / m / variance;
            total[i] = sumTotal / m / (2 * variance);
        }
        return variance;
    }

    private static double[] halfWidths(double[][] samples) {
        Percentile percentile = new Percentile().withEstimationType(EstimationType.R_7);
        double[] h = new double[samples.length];
        for (int i = 0; i < samples.length; i++) {
            percentile.setData(samples[i]);
            h[i] = 0.5 * (percentile.evaluate(97.5) - percentile.evaluate(2.5));
        }
        return h;
    }

    /** First-order index per input: the share of the variance the input explains alone. */
    public double[] first() {
        return first.clone();
    }

    /** Total index per input: its share including every interaction it takes part in. */
    public double[] total() {
        return total.clone();
    }

    /** 95% bootstrap half-width of each first-order index. */
    public double[] firstHalfWidth() {
        return firstHalfWidth.clone();
    }

    /** 95% bootstrap half-width of each total index. */
    public double[] totalHalfWidth() {
        return totalHalfWidth.clone();
    }

    /** The response's variance used by the estimators, from the rows of A and B together. */
    public double variance() {
        return variance;
    }

    /** Empty, or why the indices are all 0 (a response that never varies). */
    public String note() {
        return note;
    }
}
