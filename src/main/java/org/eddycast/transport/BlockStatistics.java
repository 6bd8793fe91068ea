package org.eddycast.transport;

import org.apache.commons.math3.distribution.TDistribution;

/** Student-t intervals over independent blocks, and the delete-one-block jackknife. */
final class BlockStatistics {

    private BlockStatistics() {
    }

    /** Two-sided 95% quantile of Student's t with the given degrees of freedom. */
    static double t975(int degreesOfFreedom) {
        return new TDistribution(null, degreesOfFreedom).inverseCumulativeProbability(0.975);
    }

    /** The mean of per-block values with its 95% t interval. */
    static Estimate mean(double[] perBlock, String note) {
        int n = perBlock.length;
        double mean = 0;
        for (double v : perBlock) {
            mean += v;
        }
        mean /= n;
        double ss = 0;
        for (double v : perBlock) {
            ss += (v - mean) * (v - mean);
        }
        double se = Math.sqrt(ss / (n - 1) / n);
        double h = t975(n - 1) * se;
        return new Estimate(mean, mean - h, mean + h, note);
    }

    /**
     * The jackknife interval of an estimate: {@code full} from every block, {@code leaveOneOut[b]} without
     * block b; standard error sqrt((n - 1) / n sum (t_b - mean t)^2) (Efron &amp; Stein 1981, "The jackknife
     * estimate of variance", Ann. Statist. 9:586-596), 95% interval with Student's t on n - 1 degrees of
     * freedom. Undetermined replicates make the interval undetermined.
     */
    static Estimate jackknife(double full, double[] leaveOneOut, String note) {
        int n = leaveOneOut.length;
        double mean = 0;
        for (double v : leaveOneOut) {
            if (!Double.isFinite(v)) {
                return new Estimate(full, Double.NaN, Double.NaN, note);
            }
            mean += v;
        }
        mean /= n;
        double ss = 0;
        for (double v : leaveOneOut) {
            ss += (v - mean) * (v - mean);
        }
        double h = t975(n - 1) * Math.sqrt((n - 1.0) / n * ss);
        return new Estimate(full, full - h, full + h, note);
    }
}
