package org.eddycast.measure;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.InputStream;
import java.net.URISyntaxException;
import java.net.URL;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.Arrays;

import org.junit.jupiter.api.Test;

/**
 * The bundled demo record presets/records/flume-probe.csv: it is what the generator makes, and the analysis
 * recovers what was built into it.
 */
class FlumeDemoRecordTest {

    private static final String RESOURCE = "presets/records/flume-probe.csv";

    private static URL resource() {
        Path file = Path.of(RESOURCE);
        assertTrue(java.nio.file.Files.isRegularFile(file), RESOURCE + " is bundled");
        try {
            return file.toUri().toURL();
        } catch (java.net.MalformedURLException e) {
            throw new AssertionError(e);
        }
    }

    @Test
    void bundledFileIsTheGeneratorsOutputMarkedSyntheticAndSmall() throws IOException {
        byte[] bytes;
        try (InputStream in = resource().openStream()) {
            bytes = in.readAllBytes();
        }
        assertTrue(bytes.length < 1_500_000, "under 1.5 MB: " + bytes.length);
        String text = new String(bytes, StandardCharsets.UTF_8);
        assertTrue(text.startsWith("# SYNTHETIC"), "says at its top that it is synthetic");
        assertEquals(SyntheticRecord.flumeProbeCsv(), text, "regenerating gives the bundled file");
    }

    @Test
    void analysisFindsTheInjectedSpikesTheDriftAndTheBuiltInDissipation() throws URISyntaxException {
        RecordAnalysis a = RecordAnalyzer.analyze(Path.of(resource().toURI()), AnalysisOptions.defaults());
        SyntheticRecord.FlumeDemo demo = SyntheticRecord.flumeProbeDemo();

        // every injected spike replaced; false detections within the universal threshold's expectation
        // (about one per plane, see PhaseSpaceDespikerTest)
        for (int c = 0; c < 3; c++) {
            ComponentCleaning cleaning = a.cleaning().components().get(c);
            int[] found = cleaning.spikeSamples();
            for (int s : demo.spikeSamples()[c]) {
                assertTrue(Arrays.binarySearch(found, s) >= 0, "component " + c + ": spike at sample " + s + " missed");
            }
            assertTrue(found.length - demo.spikeSamples()[c].length <= 10, cleaning.describe());
        }

        // The drift: least-squares slope of u about 0.03 m/s / 240 s = 1.25e-4 m/s per s, plus the turbulence's
        // own trend, whose standard error is sqrt((E(0)/2) 12 / Tr^3) with E(0) = 4 u'^2 T the one-sided density
        // at zero frequency (T = 0.11886 / f0, see SyntheticRecord.karmanShapedSpectrum; derived): 2.5e-5.
        double duration = 240;
        double integralTime = 0.11886 / SyntheticRecord.FLUME_KNEE[0];
        double e0 = 4 * Math.pow(SyntheticRecord.FLUME_RMS[0], 2) * integralTime;
        double slopeSe = Math.sqrt(e0 / 2 * 12 / Math.pow(duration, 3));
        assertEquals(SyntheticRecord.FLUME_DRIFT / duration, a.cleaning().components().get(0).trendSlope(), 3 * slopeSe);

        // Mean speed: standard error of a mean is u' sqrt(2 T / Tr) (derived from the integral time).
        assertEquals(SyntheticRecord.FLUME_MEAN_SPEED, a.meanSpeed(),
                3 * SyntheticRecord.FLUME_RMS[0] * Math.sqrt(2 * integralTime / duration));

        // Dissipation: what Kolmogorov's law gives for the spectrum built into the record over the fitted band,
        // K = mean of (E(f) + noise density) f^(5/3) with E the generator's spectrum and a white noise density
        // of 2 s_n^2 / fs (derived); tolerance 3 standard errors as in DissipationRecoveryTest.
        InertialRangeFit fit = a.fit().orElseThrow();
        var spectrum = SyntheticRecord.karmanShapedSpectrum(SyntheticRecord.FLUME_RMS[0], SyntheticRecord.FLUME_KNEE[0]);
        double noiseDensity = 2 * Math.pow(SyntheticRecord.FLUME_NOISE, 2) / SyntheticRecord.FLUME_RATE;
        double level = 0;
        int count = 0;
        for (double f : a.spectrum().frequencies()) {
            if (f >= fit.lowFrequency() && f <= fit.highFrequency()) {
                level += (spectrum.applyAsDouble(f) + noiseDensity) * Math.pow(f, 5.0 / 3.0);
                count++;
            }
        }
        level /= count;
        // Kolmogorov's law with C1 = 0.53 (Sreenivasan 1995) through Taylor's hypothesis, written out here:
        // eps = (2 pi / U) (K / 0.53)^(3/2)
        double expected = 2 * Math.PI / a.meanSpeed() * Math.pow(level / 0.53, 1.5);
        double se = 1.5 * WelchSpectrumEstimatorTest.relativeStandardError(a.spectrum().segmentCount(), fit.points());
        assertEquals(expected, a.scales().dissipationRate(), 3 * se * expected);
        assertEquals(FlowRegime.FROZEN_TURBULENCE, a.scales().regime());
    }
}
