package org.eddycast.measure;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Locale;
import java.util.Optional;

import org.apache.commons.math3.stat.regression.SimpleRegression;

/**
 * Fits the inertial range of a velocity spectrum: a straight line through log E against log f over a band,
 * found automatically or given by the caller.
 *
 * <p>Automatic band, a rule of our own:
 * <ol>
 *   <li>Noise and aliasing limit: the floor is the median density above 0.8 times the Nyquist frequency; the
 *       candidate range ends below the first log bin (ten per decade, {@link LogBinnedSpectrum}) whose density
 *       falls under {@value #FLOOR_FACTOR} times the floor, so noise or folded energy adds at most about a
 *       tenth at the top of the band. A spectrum still falling as f^(-5/3) at the Nyquist frequency thus ends
 *       its range near a quarter of the Nyquist frequency.</li>
 *   <li>Energy-containing peak: the largest f E(f) among the log bins below that limit; candidates start
 *       above it.</li>
 *   <li>Local slope at each candidate bin: least-squares slope over the five bins around it (half a decade),
 *       reaching below the peak where needed but not above the noise limit, so that the curvature of the
 *       energy-containing range keeps the band's lower end clear of it.</li>
 *   <li>The band is the widest run (in log frequency) of at least three consecutive bins whose local slope is
 *       within {@value #SLOPE_TOLERANCE} of -5/3; ties go to the run closer to -5/3 on average. With no such
 *       run the whole candidate range is used and the fit says so.</li>
 * </ol>
 * The line is the least-squares fit of log10 E against log10 f over the band's spectral estimates (Commons
 * Math {@link SimpleRegression}); the Kolmogorov level is the plain mean of E(f) f^(5/3) over the same
 * estimates (taken on the densities, not their logarithms, so it carries no log bias).
 */
public final class InertialRangeFitter {

    /** A local slope within this of -5/3 counts as inertial (our own tolerance; see class note). */
    public static final double SLOPE_TOLERANCE = 0.4;
    /** The band stays where the spectrum exceeds this many times the high-frequency floor. */
    public static final double FLOOR_FACTOR = 10.0;

    private static final double KOLMOGOROV_SLOPE = -5.0 / 3.0;
    private static final int HALF_WINDOW = 2;
    private static final int MIN_BINS = 3;

    /**
     * What the fitter found.
     *
     * @param fit                 the fit, or null when there was no usable band
     * @param peakFrequency       the energy-containing peak of f E(f) (Hz); NaN when not found
     * @param noiseLimitFrequency the upper end of the candidate range (Hz); NaN when not found
     * @param warnings            what went wrong or needs care
     */
    public record Outcome(InertialRangeFit fit, double peakFrequency, double noiseLimitFrequency,
                          List<String> warnings) {
        public Outcome {
            warnings = List.copyOf(warnings);
        }

        public Optional<InertialRangeFit> result() {
            return Optional.ofNullable(fit);
        }
    }

    private InertialRangeFitter() {
    }

    /** Fits over the band found by the automatic rule. */
    public static Outcome fitAutomatic(PowerSpectrum spectrum) {
        List<String> warnings = new ArrayList<>();
        double[] f = spectrum.frequenciesView();
        double[] p = spectrum.densitiesView();
        LogBinnedSpectrum bins = LogBinnedSpectrum.of(spectrum);
        double[] centre = bins.centres();
        double[] density = bins.densities();
        double floor = highFrequencyFloor(f, p);
        int high = -1;
        while (high + 1 < bins.size() && density[high + 1] >= FLOOR_FACTOR * floor) {
            high++;
        }
        if (high < 0) {
            warnings.add("the spectrum nowhere rises " + FLOOR_FACTOR + " times above its high-frequency floor"
                    + " (noise?); no inertial range can be fitted");
            return new Outcome(null, Double.NaN, Double.NaN, warnings);
        }
        double noiseLimit = f[bins.lastRaw()[high]];
        int peak = 0;
        for (int i = 1; i <= high; i++) {
            if (centre[i] * density[i] > centre[peak] * density[peak]) {
                peak = i;
            }
        }
        double peakFrequency = centre[peak];
        int start = peak + 1;
        if (high - start + 1 < MIN_BINS) {
            warnings.add(String.format(Locale.ROOT, "between the energy-containing peak (%.4g Hz) and the noise"
                    + " limit (%.4g Hz) there are fewer than %d log bins; no inertial range can be fitted (a longer"
                    + " record or a higher sampling rate would help)", peakFrequency, noiseLimit, MIN_BINS));
            return new Outcome(null, peakFrequency, noiseLimit, warnings);
        }
        double[] localSlope = new double[bins.size()];
        for (int i = start; i <= high; i++) {
            SimpleRegression r = new SimpleRegression(true);
            for (int j = Math.max(0, i - HALF_WINDOW); j <= Math.min(high, i + HALF_WINDOW); j++) {
                r.addData(Math.log10(centre[j]), Math.log10(density[j]));
            }
            localSlope[i] = r.getN() >= 3 ? r.getSlope() : Double.NaN;
        }
        int bestFrom = -1;
        int bestTo = -1;
        double bestWidth = -1;
        double bestDeviation = Double.POSITIVE_INFINITY;
        int i = start;
        while (i <= high) {
            if (!(Math.abs(localSlope[i] - KOLMOGOROV_SLOPE) <= SLOPE_TOLERANCE)) {
                i++;
                continue;
            }
            int from = i;
            double deviation = 0;
            while (i <= high && Math.abs(localSlope[i] - KOLMOGOROV_SLOPE) <= SLOPE_TOLERANCE) {
                deviation += Math.abs(localSlope[i] - KOLMOGOROV_SLOPE);
                i++;
            }
            int to = i - 1;
            deviation /= to - from + 1;
            double width = Math.log10(centre[to] / centre[from]);
            boolean wider = width > bestWidth + 1e-12;
            boolean tie = Math.abs(width - bestWidth) <= 1e-12 && deviation < bestDeviation;
            if (to - from + 1 >= MIN_BINS && (wider || tie)) {
                bestFrom = from;
                bestTo = to;
                bestWidth = width;
                bestDeviation = deviation;
            }
        }
        boolean found = bestFrom >= 0;
        if (!found) {
            bestFrom = start;
            bestTo = high;
            warnings.add(String.format(Locale.ROOT, "no stretch of the spectrum between %.4g and %.4g Hz keeps a"
                    + " slope within %.1f of -5/3; the fit uses that whole range and the dissipation estimate"
                    + " is unreliable", centre[start], noiseLimit, SLOPE_TOLERANCE));
        }
        InertialRangeFit fit = fitRaw(f, p, bins.firstRaw()[bestFrom], bins.lastRaw()[bestTo], true, found);
        return new Outcome(fit, peakFrequency, noiseLimit, warnings);
    }

    /** Fits over a band given by the caller; it must hold at least three spectral estimates. */
    public static Outcome fitBand(PowerSpectrum spectrum, FrequencyBand band) {
        double[] f = spectrum.frequenciesView();
        double[] p = spectrum.densitiesView();
        int from = -1;
        int to = -1;
        for (int k = 1; k < f.length; k++) {
            if (band.contains(f[k])) {
                from = from < 0 ? k : from;
                to = k;
            }
        }
        int count = from < 0 ? 0 : to - from + 1;
        if (count < MIN_BINS) {
            throw new IllegalArgumentException(String.format(Locale.ROOT, "fit band %.4g to %.4g Hz holds %d"
                    + " spectral estimates; at least %d are needed (the spectrum runs from %.4g to %.4g Hz in steps"
                    + " of %.4g Hz)", band.low(), band.high(), count, MIN_BINS, f[1], f[f.length - 1],
                    spectrum.resolution()));
        }
        return new Outcome(fitRaw(f, p, from, to, false, true), Double.NaN, Double.NaN, List.of());
    }

    private static InertialRangeFit fitRaw(double[] f, double[] p, int from, int to, boolean automatic,
                                           boolean found) {
        SimpleRegression r = new SimpleRegression(true);
        double compensated = 0;
        int count = 0;
        for (int k = from; k <= to; k++) {
            if (p[k] > 0) {
                r.addData(Math.log10(f[k]), Math.log10(p[k]));
            }
            compensated += p[k] * Math.pow(f[k], 5.0 / 3.0);
            count++;
        }
        return new InertialRangeFit(f[from], f[to], r.getSlope(), r.getSlopeStdErr(), r.getIntercept(),
                compensated / count, count, automatic, found);
    }

    /** Median density above 0.8 times the Nyquist frequency. */
    private static double highFrequencyFloor(double[] f, double[] p) {
        double nyquist = f[f.length - 1];
        double[] top = Arrays.stream(indicesAbove(f, 0.8 * nyquist)).mapToDouble(k -> p[k]).sorted().toArray();
        int m = top.length;
        return m % 2 == 1 ? top[m / 2] : 0.5 * (top[m / 2 - 1] + top[m / 2]);
    }

    private static int[] indicesAbove(double[] f, double limit) {
        return java.util.stream.IntStream.range(1, f.length).filter(k -> f[k] > limit).toArray();
    }
}
