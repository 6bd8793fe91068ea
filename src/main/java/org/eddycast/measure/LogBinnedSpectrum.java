package org.eddycast.measure;

import java.util.ArrayList;
import java.util.List;

/**
 * A spectrum averaged in bins of equal width in log frequency (ten per decade), for band finding and plots.
 * Each bin holds the mean density of the spectral estimates whose frequency falls in it, placed at the mean
 * of their log frequencies. The zero frequency is left out; empty bins are dropped.
 *
 * @param centres   bin positions (Hz), ascending
 * @param densities mean density in each bin
 * @param counts    number of spectral estimates averaged in each bin
 * @param firstRaw  index (into the spectrum) of the first estimate in each bin
 * @param lastRaw   index of the last estimate in each bin
 */
public record LogBinnedSpectrum(double[] centres, double[] densities, int[] counts, int[] firstRaw, int[] lastRaw) {

    /** Bins per decade of frequency. */
    public static final int BINS_PER_DECADE = 10;

    public LogBinnedSpectrum {
        centres = centres.clone();
        densities = densities.clone();
        counts = counts.clone();
        firstRaw = firstRaw.clone();
        lastRaw = lastRaw.clone();
    }

    @Override
    public double[] centres() {
        return centres.clone();
    }

    @Override
    public double[] densities() {
        return densities.clone();
    }

    @Override
    public int[] counts() {
        return counts.clone();
    }

    @Override
    public int[] firstRaw() {
        return firstRaw.clone();
    }

    @Override
    public int[] lastRaw() {
        return lastRaw.clone();
    }

    public int size() {
        return centres.length;
    }

    /** Bins the spectrum's nonzero frequencies. */
    public static LogBinnedSpectrum of(PowerSpectrum spectrum) {
        double[] f = spectrum.frequenciesView();
        double[] p = spectrum.densitiesView();
        List<double[]> bins = new ArrayList<>();
        int k = 1;
        while (k < f.length) {
            long bin = (long) Math.floor(Math.log10(f[k]) * BINS_PER_DECADE + 1e-9);
            int first = k;
            double sumLog = 0;
            double sum = 0;
            while (k < f.length && (long) Math.floor(Math.log10(f[k]) * BINS_PER_DECADE + 1e-9) == bin) {
                sumLog += Math.log10(f[k]);
                sum += p[k];
                k++;
            }
            int m = k - first;
            bins.add(new double[] {Math.pow(10, sumLog / m), sum / m, m, first, k - 1});
        }
        int n = bins.size();
        double[] centres = new double[n];
        double[] densities = new double[n];
        int[] counts = new int[n];
        int[] firstRaw = new int[n];
        int[] lastRaw = new int[n];
        for (int i = 0; i < n; i++) {
            double[] b = bins.get(i);
            centres[i] = b[0];
            densities[i] = b[1];
            counts[i] = (int) b[2];
            firstRaw[i] = (int) b[3];
            lastRaw[i] = (int) b[4];
        }
        return new LogBinnedSpectrum(centres, densities, counts, firstRaw, lastRaw);
    }
}
