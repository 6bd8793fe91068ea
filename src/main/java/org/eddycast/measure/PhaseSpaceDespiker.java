package org.eddycast.measure;

import java.util.Arrays;

/**
 * Finds and replaces spikes in one velocity component by phase-space thresholding.
 *
 * <p>Method: Goring, D. G. and Nikora, V. I. (2002), "Despiking acoustic Doppler velocimeter data",
 * Journal of Hydraulic Engineering 128(1):117-126. With u the fluctuation about the mean, its central
 * differences du_i = (u_{i+1} - u_{i-1}) / 2 and d2u_i = (du_{i+1} - du_{i-1}) / 2, and the universal threshold lambda = sqrt(2 ln n) (the expected largest of n standard normal values),
 * a sample is a spike candidate when it lies outside any of three ellipses:
 * <ul>
 *   <li>(u, du) with semi-axes lambda sigma_u, lambda sigma_du;</li>
 *   <li>(du, d2u) with semi-axes lambda sigma_du, lambda sigma_d2u;</li>
 *   <li>(u, d2u), rotated by theta = atan(sum u_i d2u_i / sum u_i^2), with semi-axes a, b solving
 *       (lambda sigma_u)^2 = a^2 cos^2 theta + b^2 sin^2 theta and
 *       (lambda sigma_d2u)^2 = a^2 sin^2 theta + b^2 cos^2 theta.</li>
 * </ul>
 * Spikes are replaced and the test repeated on the repaired series until no new spike is found. The rotation
 * angle and the semi-axis equations are written as we recall them from the paper (from memory).
 *
 * <p>Choices of ours, stated:
 * <ul>
 *   <li>Replacement: linear interpolation (in sample index) between the nearest good samples on either
 *       side; the nearest good value at the ends of the record. Good samples are never changed.</li>
 *   <li>Sparing neighbours (on by default): one spike of height A pushes its neighbours out of the ellipses
 *       through their differences alone (du at i+-1 is about A/2, d2u at i+-2 about A/4), which for a smooth
 *       signal removes good samples. So within each cluster of candidates (no more than two samples apart)
 *       only the sample that stands out most from the mean of its two neighbours is taken per pass; the passes
 *       repeat until no candidate is left, so a burst of several bad samples is still removed one by one.
 *       Switched off, every candidate is a spike, as in the paper.</li>
 *   <li>The differences of the first and last samples are set to zero, so the two end samples are judged on
 *       their value alone (a one-sided difference would be noisier than the central ones and flag good end
 *       samples).</li>
 *   <li>When the rotated ellipse degenerates (a^2 or b^2 not positive, theta near 45 degrees), the unrotated
 *       ellipse with semi-axes lambda sigma_u, lambda sigma_d2u is used.</li>
 *   <li>At most {@link #MAX_PASSES} passes; the result says whether the search converged.</li>
 * </ul>
 * Special cases: fewer than 5 samples or a signal with no spread: nothing is flagged. On Gaussian data with no
 * spikes a few samples are still flagged: for two independent normal coordinates the chance of leaving an
 * ellipse of radius lambda is exp(-lambda^2 / 2) = 1/n, about one sample per plane.
 */
public final class PhaseSpaceDespiker {

    /** Largest number of passes before the search stops unconverged. */
    public static final int MAX_PASSES = 200;

    private final boolean spareNeighbours;

    /** @param spareNeighbours take only the most prominent candidate of each cluster per pass (see class note) */
    public PhaseSpaceDespiker(boolean spareNeighbours) {
        this.spareNeighbours = spareNeighbours;
    }

    /**
     * The result for one component.
     *
     * @param repaired  the series with spikes replaced (a copy)
     * @param spikes    indices of replaced samples, ascending
     * @param passes    passes made (the last one found nothing new when converged)
     * @param converged false when {@link #MAX_PASSES} was reached with spikes still being found
     */
    public record Result(double[] repaired, int[] spikes, int passes, boolean converged) {
        public Result {
            repaired = repaired.clone();
            spikes = spikes.clone();
        }

        @Override
        public double[] repaired() {
            return repaired.clone();
        }

        @Override
        public int[] spikes() {
            return spikes.clone();
        }
    }

    /** Despikes one series; the input is not changed. */
    public Result despike(double[] series) {
        int n = series.length;
        double[] x = series.clone();
        boolean[] flagged = new boolean[n];
        if (n < 5) {
            return new Result(x, new int[0], 0, true);
        }
        double[] u = new double[n];
        double[] du = new double[n];
        double[] d2u = new double[n];
        boolean[] candidate = new boolean[n];
        double lambda = Math.sqrt(2.0 * Math.log(n));
        int passes = 0;
        boolean converged = false;
        while (passes < MAX_PASSES) {
            passes++;
            if (!findCandidates(x, u, du, d2u, lambda, candidate)) {
                converged = true;
                break;
            }
            int added = spareNeighbours ? flagMostProminent(x, candidate, flagged) : flagAll(candidate, flagged);
            if (added == 0) {
                converged = true;
                break;
            }
            interpolateFlagged(series, flagged, x);
        }
        int count = 0;
        for (boolean f : flagged) {
            count += f ? 1 : 0;
        }
        int[] spikes = new int[count];
        for (int i = 0, k = 0; i < n; i++) {
            if (flagged[i]) {
                spikes[k++] = i;
            }
        }
        return new Result(x, spikes, passes, converged);
    }

    /** Marks samples outside any of the three ellipses; returns false when the signal has no spread. */
    private static boolean findCandidates(double[] x, double[] u, double[] du, double[] d2u, double lambda,
                                          boolean[] candidate) {
        int n = x.length;
        double mean = 0;
        for (double v : x) {
            mean += v;
        }
        mean /= n;
        for (int i = 0; i < n; i++) {
            u[i] = x[i] - mean;
        }
        centralDifference(u, du);
        centralDifference(du, d2u);
        double su = rms(u);
        double sdu = rms(du);
        double sd2u = rms(d2u);
        if (su == 0 || sdu == 0 || sd2u == 0) {
            Arrays.fill(candidate, false);
            return false;
        }
        double sumUD2 = 0;
        double sumU2 = 0;
        for (int i = 0; i < n; i++) {
            sumUD2 += u[i] * d2u[i];
            sumU2 += u[i] * u[i];
        }
        double theta = Math.atan(sumUD2 / sumU2);
        double c2 = Math.cos(theta) * Math.cos(theta);
        double s2 = Math.sin(theta) * Math.sin(theta);
        double p = lambda * lambda * su * su;
        double q = lambda * lambda * sd2u * sd2u;
        double det = c2 - s2;
        double a2 = (p * c2 - q * s2) / det;
        double b2 = (q * c2 - p * s2) / det;
        if (!(a2 > 0 && b2 > 0) || !Double.isFinite(a2) || !Double.isFinite(b2)) {
            theta = 0;
            a2 = p;
            b2 = q;
        }
        double cos = Math.cos(theta);
        double sin = Math.sin(theta);
        double au = lambda * su;
        double adu = lambda * sdu;
        double ad2u = lambda * sd2u;
        boolean any = false;
        for (int i = 0; i < n; i++) {
            double e1 = sq(u[i] / au) + sq(du[i] / adu);
            double e2 = sq(du[i] / adu) + sq(d2u[i] / ad2u);
            double xr = u[i] * cos + d2u[i] * sin;
            double yr = -u[i] * sin + d2u[i] * cos;
            double e3 = xr * xr / a2 + yr * yr / b2;
            candidate[i] = e1 > 1 || e2 > 1 || e3 > 1;
            any |= candidate[i];
        }
        return any;
    }

    private static int flagAll(boolean[] candidate, boolean[] flagged) {
        int added = 0;
        for (int i = 0; i < candidate.length; i++) {
            if (candidate[i] && !flagged[i]) {
                flagged[i] = true;
                added++;
            }
        }
        return added;
    }

    /** In each cluster of candidates no more than two samples apart, flags the one that stands out most. */
    private static int flagMostProminent(double[] x, boolean[] candidate, boolean[] flagged) {
        int n = x.length;
        int added = 0;
        int i = 0;
        while (i < n) {
            if (!candidate[i]) {
                i++;
                continue;
            }
            int best = -1;
            double bestProminence = -1;
            int last = i;
            for (int j = i; j < n && j <= last + 2; j++) {
                if (!candidate[j]) {
                    continue;
                }
                last = j;
                if (!flagged[j]) {
                    double p = prominence(x, j);
                    if (p > bestProminence) {
                        bestProminence = p;
                        best = j;
                    }
                }
            }
            if (best >= 0) {
                flagged[best] = true;
                added++;
            }
            i = last + 1;
        }
        return added;
    }

    /** How far a sample stands from the mean of its two neighbours (from its one neighbour at an end). */
    private static double prominence(double[] x, int i) {
        int n = x.length;
        if (i == 0) {
            return Math.abs(x[0] - x[1]);
        }
        if (i == n - 1) {
            return Math.abs(x[n - 1] - x[n - 2]);
        }
        return Math.abs(x[i] - 0.5 * (x[i - 1] + x[i + 1]));
    }

    /** Replaces each run of flagged samples by linear interpolation between the good samples around it. */
    static void interpolateFlagged(double[] original, boolean[] flagged, double[] out) {
        int n = original.length;
        int i = 0;
        while (i < n) {
            if (!flagged[i]) {
                out[i] = original[i];
                i++;
                continue;
            }
            int start = i;
            while (i < n && flagged[i]) {
                i++;
            }
            int left = start - 1;
            int right = i;
            for (int k = start; k < i; k++) {
                if (left >= 0 && right < n) {
                    double w = (double) (k - left) / (right - left);
                    out[k] = original[left] + w * (original[right] - original[left]);
                } else if (left >= 0) {
                    out[k] = original[left];
                } else if (right < n) {
                    out[k] = original[right];
                } else {
                    out[k] = original[k];
                }
            }
        }
    }

    private static void centralDifference(double[] in, double[] out) {
        int n = in.length;
        for (int i = 1; i < n - 1; i++) {
            out[i] = 0.5 * (in[i + 1] - in[i - 1]);
        }
        out[0] = 0;
        out[n - 1] = 0;
    }

    private static double rms(double[] a) {
        double mean = 0;
        for (double v : a) {
            mean += v;
        }
        mean /= a.length;
        double s = 0;
        for (double v : a) {
            s += (v - mean) * (v - mean);
        }
        return Math.sqrt(s / a.length);
    }

    private static double sq(double v) {
        return v * v;
    }
}
