package org.eddycast.measure;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Arrays;
import java.util.Set;
import java.util.TreeSet;

import org.junit.jupiter.api.Test;

/**
 * Phase-space despiking (Goring, D. G. and Nikora, V. I. 2002, "Despiking acoustic Doppler velocimeter
 * data", J. Hydraul. Eng. 128(1):117-126): injected spikes are found and replaced, every other sample keeps
 * its exact value, and false detections stay within what the universal threshold predicts.
 */
class PhaseSpaceDespikerTest {

    private static final double FS = 50;
    private static final int N = 8192;

    /** A smooth probe-like signal: a -5/3 spectrum (eps = 1e-3 W/kg at 0.3 m/s) by random-phase synthesis. */
    private static double[] cleanSignal() {
        double[] x = SyntheticRecord.fourierSynthesis(N, FS, SyntheticRecord.kolmogorovSpectrum(1e-3, 0.3, 0.2), 11);
        for (int i = 0; i < N; i++) {
            x[i] += 0.3;
        }
        return x;
    }

    private static double rms(double[] x) {
        double m = Arrays.stream(x).average().orElseThrow();
        return Math.sqrt(Arrays.stream(x).map(v -> (v - m) * (v - m)).sum() / x.length);
    }

    /** Spike positions: 19 isolated single samples and one two-sample burst at 4000-4001. */
    private static final int[] ISOLATED = {150, 512, 900, 1333, 1700, 2100, 2500, 2901, 3333, 3700, 4500, 4777, 5200,
        5600, 6001, 6500, 6900, 7300, 7777};
    private static final int[] BURST = {4000, 4001};

    private static double[] withSpikes(double[] clean, double sigma) {
        double[] x = clean.clone();
        for (int k = 0; k < ISOLATED.length; k++) {
            // heights 5 to 10 sigma, alternating sign: above the universal threshold sqrt(2 ln n) = 4.25 sigma
            double height = (5 + 5.0 * k / ISOLATED.length) * sigma * (k % 2 == 0 ? 1 : -1);
            x[ISOLATED[k]] += height;
        }
        x[BURST[0]] += 8 * sigma;
        x[BURST[1]] += 7 * sigma;
        return x;
    }

    @Test
    void injectedSpikesAreReplacedAndEveryOtherSampleIsUntouched() {
        double[] clean = cleanSignal();
        double sigma = rms(clean);
        double[] spiked = withSpikes(clean, sigma);
        PhaseSpaceDespiker.Result r = new PhaseSpaceDespiker(true).despike(spiked);
        assertTrue(r.converged());
        Set<Integer> flagged = new TreeSet<>();
        for (int i : r.spikes()) {
            flagged.add(i);
        }
        Set<Integer> injected = new TreeSet<>();
        Arrays.stream(ISOLATED).forEach(injected::add);
        Arrays.stream(BURST).forEach(injected::add);
        assertTrue(flagged.containsAll(injected), "missed: " + difference(injected, flagged));

        double[] repaired = r.repaired();
        for (int i = 0; i < N; i++) {
            if (!flagged.contains(i)) {
                assertEquals(spiked[i], repaired[i], 0.0, "sample " + i + " was not flagged and must be unchanged");
            }
        }
        // The spikes (5 to 10 sigma high) are gone: each replaced value lies within half a sigma of the clean
        // signal (linear interpolation over one or two samples of a smooth signal errs far less).
        for (int i : injected) {
            assertTrue(Math.abs(repaired[i] - clean[i]) < 0.5 * sigma, "sample " + i + " still off by "
                    + (repaired[i] - clean[i]) / sigma + " sigma");
        }
        // Neighbour sparing: no good sample within two of an isolated spike is taken.
        for (int s : ISOLATED) {
            for (int d = -2; d <= 2; d++) {
                if (d != 0) {
                    assertTrue(!flagged.contains(s + d), "neighbour " + (s + d) + " of spike " + s + " was flagged");
                }
            }
        }
        // False detections: for independent normal coordinates the chance of leaving an ellipse of radius
        // lambda = sqrt(2 ln n) is exp(-lambda^2 / 2) = 1/n per sample and plane, so about 3 expected over the
        // three planes; for a Poisson count of mean 3, more than 10 has probability below 3e-4.
        Set<Integer> extra = difference(flagged, injected);
        assertTrue(extra.size() <= 10, "too many false detections: " + extra);
    }

    @Test
    void withoutNeighbourSparingThePlainMethodAlsoRemovesGoodNeighbours() {
        double[] clean = cleanSignal();
        double sigma = rms(clean);
        PhaseSpaceDespiker.Result plain = new PhaseSpaceDespiker(false).despike(withSpikes(clean, sigma));
        Set<Integer> flagged = new TreeSet<>();
        for (int i : plain.spikes()) {
            flagged.add(i);
        }
        int neighbours = 0;
        for (int s : ISOLATED) {
            assertTrue(flagged.contains(s), "spike " + s + " missed");
            neighbours += flagged.contains(s - 1) ? 1 : 0;
            neighbours += flagged.contains(s + 1) ? 1 : 0;
        }
        // A spike of height A gives its neighbours a first difference of about A/2, far above lambda sigma_du
        // for a smooth signal, so the plain method takes them too: the reason for the sparing rule.
        assertTrue(neighbours >= ISOLATED.length, "expected neighbours flagged by the plain method, got " + neighbours);
    }

    @Test
    void tooShortOrFlatSeriesAreLeftAlone() {
        double[] shortSeries = {1, 2, 100, 2};
        PhaseSpaceDespiker.Result r = new PhaseSpaceDespiker(true).despike(shortSeries);
        assertEquals(0, r.spikes().length);
        assertArrayEquals(shortSeries, r.repaired());
        double[] flat = new double[50];
        Arrays.fill(flat, 0.3);
        assertEquals(0, new PhaseSpaceDespiker(true).despike(flat).spikes().length);
    }

    @Test
    void interpolationUsesTheGoodNeighboursAndTheNearestValueAtTheEnds() {
        double[] original = {0, 10, 99, 99, 40, 50, 99};
        boolean[] flagged = {false, false, true, true, false, false, true};
        double[] out = new double[original.length];
        PhaseSpaceDespiker.interpolateFlagged(original, flagged, out);
        assertArrayEquals(new double[] {0, 10, 20, 30, 40, 50, 50}, out, 1e-12);
    }

    private static Set<Integer> difference(Set<Integer> a, Set<Integer> b) {
        Set<Integer> d = new TreeSet<>(a);
        d.removeAll(b);
        return d;
    }
}
