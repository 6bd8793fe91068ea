package org.eddycast.transport;

/**
 * When a released tracer is mixed over a region to within a fraction: every cell's concentration within
 * +-(1 - p) of the fully mixed value, for p = 0.90, 0.95 or 0.99.
 *
 * <p>Particle counts carry counting noise: a cell expected to hold n f particles of n holds them with variance
 * n f (1 - f) (multinomial), which alone would make a large, well-mixed cloud look unmixed. So each cell's
 * squared relative deviation is corrected by its noise, d_k^2 = (c_k / (n f_k) - 1)^2 - (1 - f_k) / (n f_k),
 * and the region's coefficient of variation is CoV^2 = sum f_k d_k^2. Late in mixing the deviation is one
 * slowly decaying pattern, so its largest cell deviation is a fixed multiple r of CoV: r is read where the
 * deviation is still far above the noise, and "mixed within 1 - p" becomes CoV &lt;= (1 - p) / r. The crossing
 * is interpolated between record times while CoV stands clear of the noise, else found from the exponential
 * decay fitted to the resolved late records (marked "extrapolated"). The interval is the delete-one-block
 * jackknife over the independent blocks.
 */
public final class MixingTimeEstimator {

    /** CoV^2 above this many noise standard deviations counts as resolved. */
    static final double RESOLVED = 3.0;
    /** The late decay is fitted where CoV is below this value (past the first spreading). */
    static final double LATE_COV = 0.5;

    private MixingTimeEstimator() {
    }

    /** The time (s) when the region is mixed within 1 - p, with its interval. */
    public static Estimate time(CellCounts counts, double[] times, double p) {
        Crossing full = crossing(counts, times, p, -1);
        if (!Double.isFinite(full.time)) {
            return Estimate.undetermined(full.note);
        }
        double[] jack = new double[counts.blocks()];
        for (int b = 0; b < jack.length; b++) {
            jack[b] = crossing(counts, times, p, b).time;
        }
        return BlockStatistics.jackknife(full.time, jack, full.note);
    }

    /** The noise-corrected coefficient of variation at each record, every block pooled. */
    public static double[] coefficientOfVariation(CellCounts counts) {
        double[] cov = new double[counts.records()];
        for (int j = 0; j < cov.length; j++) {
            cov[j] = Math.sqrt(Math.max(0, record(counts, j, -1)[0]));
        }
        return cov;
    }

    /**
     * The largest concentration over the cells over the region's mean at each record: 1 plus the largest
     * noise-corrected deviation of a cell above its share while the deviation stands far above the counting
     * noise, and 1 plus r CoV once it does not (r the late pattern's ratio of largest to rms deviation), because
     * the largest of many noisy cells is biased upwards.
     */
    public static double[] peakFactor(CellCounts counts, double[] times) {
        int records = counts.records();
        double[][] r = records(counts, -1);
        double ratio = lateRatio(r);
        double[] fit = lateDecay(r, times);
        double[] peak = new double[records];
        for (int j = 0; j < records; j++) {
            boolean clear = r[j][0] > 10 * RESOLVED * r[j][1];
            double cov = fit == null ? Math.sqrt(Math.max(r[j][0], 0)) : Math.exp(fit[0] + fit[1] * times[j]);
            peak[j] = 1 + (clear || !Double.isFinite(ratio) ? Math.sqrt(Math.max(r[j][2], 0)) : ratio * cov);
        }
        return peak;
    }

    /** The records of every block but {@code omit} (-1 for none). */
    private static double[][] records(CellCounts counts, int omit) {
        double[][] r = new double[counts.records()][];
        for (int j = 0; j < r.length; j++) {
            r[j] = record(counts, j, omit);
        }
        return r;
    }

    /**
     * The ratio of largest to rms deviation at the last record that stands far above the noise late in mixing
     * (CoV below {@value #LATE_COV}); NaN when there is none.
     */
    private static double lateRatio(double[][] r) {
        double ratio = Double.NaN;
        for (double[] rj : r) {
            if (rj[0] > 10 * RESOLVED * rj[1] && Math.sqrt(rj[0]) < LATE_COV) {
                ratio = Math.sqrt(Math.max(rj[2], 0) / rj[0]);
            }
        }
        return ratio;
    }

    private record Crossing(double time, String note) {
    }

    /** [CoV^2, its noise standard deviation, largest corrected squared cell deviation] at record j. */
    private static double[] record(CellCounts counts, int j, int omit) {
        CellMap map = counts.map();
        int cells = map.cells();
        double n = 0;
        double[] c = new double[cells];
        for (int b = 0; b < counts.blocks(); b++) {
            if (b == omit) {
                continue;
            }
            for (int k = 0; k < cells; k++) {
                int v = counts.count(b, j, k);
                c[k] += v;
                n += v;
            }
        }
        double cov2 = 0;
        double noise = 0;
        double max = 0;
        for (int k = 0; k < cells; k++) {
            double f = map.share(k);
            if (f <= 0) {
                continue;
            }
            double dev = c[k] / (n * f) - 1;
            double s2 = (1 - f) / (n * f);
            double d2 = dev * dev - s2;
            cov2 += f * d2;
            noise += f * f * (2 * s2 * s2 + 4 * Math.max(d2, 0) * s2);
            max = Math.max(max, d2);
        }
        return new double[] {cov2, Math.sqrt(noise), max};
    }

    private static Crossing crossing(CellCounts counts, double[] times, double p, int omit) {
        int records = counts.records();
        double[][] r = records(counts, omit);
        // The pattern's ratio of largest to rms deviation, read at the last record still far above the noise;
        // for two cells (a probe and the rest) it is fixed by their shares.
        CellMap map = counts.map();
        double ratio;
        if (map.cells() == 2) {
            double small = Math.min(map.share(0), map.share(1));
            ratio = Math.sqrt((1 - small) / small);
        } else {
            ratio = lateRatio(r);
            if (Double.isNaN(ratio)) {
                // no resolved record late in mixing: the last resolved one at all
                for (double[] rk : r) {
                    if (rk[0] > 10 * RESOLVED * rk[1]) {
                        ratio = Math.sqrt(Math.max(rk[2], 0) / rk[0]);
                    }
                }
            }
        }
        if (!Double.isFinite(ratio) || ratio <= 0) {
            return new Crossing(Double.NaN, "not determined: the cloud never stood clear of the counting noise");
        }
        double threshold = (1 - p) / ratio;
        for (int j = 0; j < records; j++) {
            double cov = Math.sqrt(Math.max(r[j][0], 0));
            if (cov > threshold) {
                continue;
            }
            boolean resolved = r[j][0] > RESOLVED * r[j][1];
            if (j > 0 && resolved) {
                double c0 = Math.sqrt(r[j - 1][0]);
                double f = Math.log(c0 / threshold) / Math.log(c0 / cov);
                return new Crossing(times[j - 1] + f * (times[j] - times[j - 1]), "");
            }
            if (j == 0) {
                return new Crossing(times[0], "mixed by the first record time");
            }
            break;
        }
        return extrapolated(r, times, threshold);
    }

    /** Fits ln CoV = a - lambda t over the resolved late records and solves for the threshold. */
    private static Crossing extrapolated(double[][] r, double[] times, double threshold) {
        double[] fit = lateDecay(r, times);
        if (fit == null) {
            return new Crossing(Double.NaN, "not determined: too few resolved records late in the run");
        }
        if (!(fit[1] < 0)) {
            return new Crossing(Double.NaN, "not determined: the deviation was not decaying late in the run");
        }
        double t = (Math.log(threshold) - fit[0]) / fit[1];
        String note = t > times[times.length - 1] ? "extrapolated beyond the run from the late exponential decay"
                : "from the late exponential decay (the deviation fell into the counting noise)";
        return new Crossing(t, note);
    }

    /** {intercept, slope} of ln CoV against t over the resolved late records, or null with fewer than three. */
    private static double[] lateDecay(double[][] r, double[] times) {
        double st = 0;
        double sy = 0;
        double stt = 0;
        double sty = 0;
        int n = 0;
        boolean late = false;
        for (int j = 0; j < r.length; j++) {
            double cov = Math.sqrt(Math.max(r[j][0], 0));
            late |= cov < LATE_COV;
            if (late && r[j][0] > RESOLVED * r[j][1]) {
                double y = Math.log(cov);
                st += times[j];
                sy += y;
                stt += times[j] * times[j];
                sty += times[j] * y;
                n++;
            }
        }
        if (n < 3) {
            return null;
        }
        double slope = (n * sty - st * sy) / (n * stt - st * st);
        double intercept = (sy - slope * st) / n;
        return new double[] {intercept, slope};
    }
}
