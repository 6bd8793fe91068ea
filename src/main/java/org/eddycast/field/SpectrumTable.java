package org.eddycast.field;

/**
 * A spectrum shape discretised for sampling Fourier modes, rescaled so that the longitudinal integral length
 * is one.
 *
 * <p>The support is cut into {@code bins} intervals of equal width in ln k. Bin j carries the exact energy
 * fraction w_j of the spectrum; a mode drawn for bin j takes a wavenumber from E(k) restricted to the bin
 * (inverse of the tabulated cumulative energy). The sampled spectrum then equals E in expectation, the energy
 * per realization is exact, and so is the expected integral length (stratified sampling).
 *
 * <p>The longitudinal integral length of an isotropic field is L11 = (pi / (2 u'^2)) integral E(k)/k dk
 * (Pope 2000, Turbulent Flows, eq. 6.213) in three dimensions, where u'^2 = (2/3) integral E; that is
 * L11 = (3 pi / 4) &lt;1/k&gt; with &lt;.&gt; the energy-weighted mean. For a two-dimensional isotropic field the
 * same integral of the longitudinal correlation gives L11 = 2 &lt;1/k&gt; (average of sin^2 theta times the
 * delta function of cos theta over the circle).
 */
public final class SpectrumTable {

    private static final int GRID_PER_BIN = 64;

    private final int dimensions;
    private final int bins;
    private final double scale;
    private final double logLow;
    private final double logStep;
    private final double[] cumulative;
    private final double[] binWeight;
    private final double shapeIntegralLength;

    /**
     * @param shape      the spectrum shape
     * @param dimensions 2 or 3
     * @param bins       number of modes per realization, at least 1
     */
    public SpectrumTable(SpectrumShape shape, int dimensions, int bins) {
        if (dimensions != 2 && dimensions != 3) {
            throw new IllegalArgumentException("dimensions must be 2 or 3; got " + dimensions);
        }
        if (bins < 1) {
            throw new IllegalArgumentException("mode count must be at least 1; got " + bins);
        }
        this.dimensions = dimensions;
        this.bins = bins;
        int n = bins * GRID_PER_BIN + 1;
        double lo = Math.log(shape.lowerWavenumber());
        double hi = Math.log(shape.upperWavenumber());
        if (hi - lo < 1e-9) {
            hi = lo + 1e-9;
        }
        this.logLow = lo;
        this.logStep = (hi - lo) / (n - 1);
        this.cumulative = new double[n];
        double inverseMoment = 0;
        double previousEnergy = energyPerLog(shape, lo);
        double previousInverse = previousEnergy / Math.exp(lo);
        for (int i = 1; i < n; i++) {
            double logK = lo + i * logStep;
            double e = energyPerLog(shape, logK);
            double inv = e / Math.exp(logK);
            cumulative[i] = cumulative[i - 1] + 0.5 * (previousEnergy + e) * logStep;
            inverseMoment += 0.5 * (previousInverse + inv) * logStep;
            previousEnergy = e;
            previousInverse = inv;
        }
        double total = cumulative[n - 1];
        if (!(total > 0)) {
            throw new IllegalArgumentException("the spectrum carries no energy over its support");
        }
        for (int i = 0; i < n; i++) {
            cumulative[i] /= total;
        }
        cumulative[n - 1] = 1.0;
        this.binWeight = new double[bins];
        for (int j = 0; j < bins; j++) {
            binWeight[j] = cumulative[(j + 1) * GRID_PER_BIN] - cumulative[j * GRID_PER_BIN];
        }
        double meanInverseK = inverseMoment / total;
        this.shapeIntegralLength = shapeFactor(dimensions) * meanInverseK;
        this.scale = shapeIntegralLength;
    }

    private static double energyPerLog(SpectrumShape shape, double logK) {
        double k = Math.exp(logK);
        return shape.density(k) * k;
    }

    /** L11 = factor * &lt;1/k&gt;: 3 pi / 4 in three dimensions, 2 in two. */
    public static double shapeFactor(int dimensions) {
        return dimensions == 3 ? 0.75 * Math.PI : 2.0;
    }

    public int dimensions() {
        return dimensions;
    }

    public int bins() {
        return bins;
    }

    /**
     * 1 / sqrt(d * sum_j w_j k_j^2) with k_j the bin's energy-weighted rms wavenumber: the inverse rms velocity
     * gradient of a field with unit variance per component (each component's gradient variance summed over
     * directions).
     */
    public double inverseRmsGradient() {
        double sum = 0;
        int n = cumulative.length;
        for (int i = 1; i < n; i++) {
            double k = Math.exp(logLow + (i - 0.5) * logStep) * scale;
            sum += (cumulative[i] - cumulative[i - 1]) * k * k;
        }
        return 1.0 / Math.sqrt(dimensions * sum);
    }

    /** The energy fraction of bin j. */
    public double weight(int j) {
        return binWeight[j];
    }

    /** The integral length of the shape in its own wavenumber units; wavenumbers are multiplied by it. */
    public double shapeIntegralLength() {
        return shapeIntegralLength;
    }

    /** Smallest dimensionless wavenumber of the support (integral length one). */
    public double lowestWavenumber() {
        return Math.exp(logLow) * scale;
    }

    /** Largest dimensionless wavenumber of the support (integral length one). */
    public double highestWavenumber() {
        return Math.exp(logLow + (cumulative.length - 1) * logStep) * scale;
    }

    /**
     * A dimensionless wavenumber from bin j: the inverse of the cumulative energy at fraction u of the bin.
     *
     * @param j bin index
     * @param u a uniform variate in [0, 1)
     */
    public double sampleWavenumber(int j, double u) {
        int start = j * GRID_PER_BIN;
        int end = start + GRID_PER_BIN;
        double target = cumulative[start] + u * (cumulative[end] - cumulative[start]);
        if (cumulative[end] - cumulative[start] <= 0) {
            return Math.exp(logLow + (start + u * GRID_PER_BIN) * logStep) * scale;
        }
        int lo = start;
        int hi = end;
        while (hi - lo > 1) {
            int mid = (lo + hi) >>> 1;
            if (cumulative[mid] <= target) {
                lo = mid;
            } else {
                hi = mid;
            }
        }
        double span = cumulative[hi] - cumulative[lo];
        double f = span > 0 ? (target - cumulative[lo]) / span : 0.5;
        return Math.exp(logLow + (lo + f) * logStep) * scale;
    }
}
