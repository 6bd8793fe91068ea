package org.eddycast.transport;

/**
 * Sums of the first three powers of each coordinate per block and record, the along-flow coordinate taken
 * relative to a point moving with the section-mean velocity (x - U t) so the sums stay small. From them: the
 * cloud's centre, variance per axis and along-flow skewness, per block and pooled.
 */
public final class CloudMoments implements TransportRecorder {

    private static final int SUMS = 9;

    private final double meanVelocity;
    private final double[] times;
    private final double[][] sums;
    private final int[] blockSize;

    /**
     * @param meanVelocity U (m/s) of the moving origin of the x axis
     * @param times        the run's record times (s)
     */
    public CloudMoments(double meanVelocity, double[] times, int blocks) {
        this.meanVelocity = meanVelocity;
        this.times = times.clone();
        this.sums = new double[blocks][times.length * SUMS];
        this.blockSize = new int[blocks];
    }

    @Override
    public void record(int block, int record, double[] x, double[] y, double[] z, int count) {
        double shift = meanVelocity * times[record];
        double[] s = sums[block];
        int o = record * SUMS;
        for (int i = 0; i < count; i++) {
            double a = x[i] - shift;
            double b = y[i];
            double c = z[i];
            s[o] += a;
            s[o + 1] += a * a;
            s[o + 2] += a * a * a;
            s[o + 3] += b;
            s[o + 4] += b * b;
            s[o + 5] += b * b * b;
            s[o + 6] += c;
            s[o + 7] += c * c;
            s[o + 8] += c * c * c;
        }
        blockSize[block] = count;
    }

    public int blocks() {
        return sums.length;
    }

    public double[] times() {
        return times.clone();
    }

    /** Unbiased variance of axis a (0, 1, 2) within block b at record j (m^2). */
    public double blockVariance(int b, int j, int axis) {
        int n = blockSize[b];
        double mean = sums[b][j * SUMS + 3 * axis] / n;
        double square = sums[b][j * SUMS + 3 * axis + 1] / n;
        return (square - mean * mean) * n / (n - 1.0);
    }

    /** Variance of axis a over every particle at record j (m^2). */
    public double pooledVariance(int j, int axis) {
        double[] m = pooled(j, axis);
        return m[1] - m[0] * m[0];
    }

    /** Mean of axis a over every particle at record j (m; along x, relative to U t). */
    public double pooledMean(int j, int axis) {
        return pooled(j, axis)[0];
    }

    /** Skewness of axis a over every particle at record j. */
    public double pooledSkewness(int j, int axis) {
        double[] m = pooled(j, axis);
        double var = m[1] - m[0] * m[0];
        double third = m[2] - 3 * m[0] * m[1] + 2 * m[0] * m[0] * m[0];
        return var > 0 ? third / Math.pow(var, 1.5) : Double.NaN;
    }

    private double[] pooled(int j, int axis) {
        double n = 0;
        double[] m = new double[3];
        for (int b = 0; b < sums.length; b++) {
            n += blockSize[b];
            for (int p = 0; p < 3; p++) {
                m[p] += sums[b][j * SUMS + 3 * axis + p];
            }
        }
        for (int p = 0; p < 3; p++) {
            m[p] /= n;
        }
        return m;
    }
}
