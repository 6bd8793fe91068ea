package org.eddycast.transport;

/**
 * Station curves from the counts of {@link StationCounts}: at each record time the particles within half a bin
 * of a station give the cross-section mean concentration there, C = (M / A) n_bin / (n b), the fraction of the
 * mass per metre along the flow over the flow area; with a position across, the strip holding it gives the
 * local value C = (M / (A s)) n_strip / (n b), s the strip's share of the area (a histogram estimate of the
 * density: Silverman 1986, Density Estimation for Statistics and Data Analysis, ch. 2).
 *
 * <p>The bin width b at record j is a fifth of the cloud's along-flow standard deviation then, and never less
 * than the fine bin (the distance the mean flow covers between records): wide enough to hold many particles,
 * narrow enough that the bin's smoothing of a Gaussian peak, a relative C''b^2/(24 C) = 1/600 of it, is far
 * below the counting noise. Each block gives its own curve; the value is their mean and the band Student's t
 * 95% interval over blocks, clipped at zero.
 */
public final class StationCurves {

    /** The bin width as a fraction of the cloud's along-flow standard deviation. */
    public static final double BIN_PER_SIGMA = 0.2;

    private StationCurves() {
    }

    /**
     * @param counts     the counts of the run
     * @param moments    the cloud's moments of the same run (for the along-flow standard deviation)
     * @param mass       released mass (kg)
     * @param area       flow area (m^2)
     * @param stripShare the share of the section's area of each station's strip (ignored without a strip)
     * @param across     each station's position across (m), NaN for none
     */
    public static StationCurve[] of(StationCounts counts, CloudMoments moments, double mass, double area,
                                    double[] stripShare, double[] across) {
        double[] times = moments.times();
        int records = counts.records();
        int blocks = counts.blocks();
        double t = BlockStatistics.t975(blocks - 1);
        StationCurve[] out = new StationCurve[counts.stations()];
        for (int k = 0; k < out.length; k++) {
            boolean inStrip = counts.strip(k) >= 0;
            double share = inStrip ? stripShare[k] : 1.0;
            double[] c = new double[records];
            double[] lo = new double[records];
            double[] hi = new double[records];
            double[] bw = new double[records];
            double[] one = new double[records];
            long particles = 0;
            for (int b = 0; b < blocks; b++) {
                particles += counts.blockSize(b);
            }
            double[] perBlock = new double[blocks];
            for (int j = 0; j < records; j++) {
                double sigma = Math.sqrt(Math.max(moments.pooledVariance(j, 0), 0));
                int reach = reach(sigma, counts.fineWidth(), counts.halfBins());
                double bin = (2 * reach + 1) * counts.fineWidth();
                double mean = 0;
                for (int b = 0; b < blocks; b++) {
                    perBlock[b] = mass / (area * share) * counts.near(b, j, k, reach, inStrip)
                            / (counts.blockSize(b) * bin);
                    mean += perBlock[b];
                }
                mean /= blocks;
                double ss = 0;
                for (double v : perBlock) {
                    ss += (v - mean) * (v - mean);
                }
                double half = t * Math.sqrt(ss / (blocks - 1) / blocks);
                c[j] = mean;
                lo[j] = Math.max(0, mean - half);
                hi[j] = mean + half;
                bw[j] = bin;
                one[j] = mass / (area * share) / (particles * bin);
            }
            out[k] = new StationCurve(counts.distance(k), across[k], times, c, lo, hi, bw, one);
        }
        return out;
    }

    /** Fine bins each side of the station's own so the bin is about a fifth of sigma, within what was kept. */
    static int reach(double sigma, double fineWidth, int halfBins) {
        double bins = BIN_PER_SIGMA * sigma / fineWidth;
        int reach = (int) Math.round((bins - 1) / 2);
        return Math.max(0, Math.min(halfBins, reach));
    }
}
