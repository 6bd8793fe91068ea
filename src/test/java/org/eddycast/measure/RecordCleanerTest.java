package org.eddycast.measure;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.apache.commons.math3.stat.regression.SimpleRegression;
import org.junit.jupiter.api.Test;

/** Detrending and the cleaning report: a linear trend is removed, the mean kept, every change reported. */
class RecordCleanerTest {

    private static final double FS = 10;
    private static final int N = 5000;
    private static final double SLOPE = 1e-3;      // m/s per s
    private static final double RMS = 0.02;        // m/s
    private static final double T = 1.0;          // s, Ornstein-Uhlenbeck integral time

    private static VelocityRecord trendedRecord() {
        double[] x = SyntheticRecord.ornsteinUhlenbeck(N, FS, RMS, T, 21);
        double[] t = new double[N];
        int[] lines = new int[N];
        for (int i = 0; i < N; i++) {
            t[i] = i / FS;
            x[i] += 0.25 + SLOPE * t[i];
            lines[i] = i + 2;
        }
        return new VelocityRecord("trend", t, new double[][] {x}, List.of("u [m/s]"), lines, FS, true, List.of(),
                List.of());
    }

    @Test
    void aLinearTrendIsRemovedAndTheMeanKept() {
        VelocityRecord record = trendedRecord();
        double[] x = record.component(0);
        double[] t = record.times();
        LinearDetrender.Result r = LinearDetrender.detrend(t, x);
        // Standard error of the least-squares slope: sigma / sqrt(sum (t - mean t)^2) for white residuals,
        // times sqrt((1 + rho) / (1 - rho)) for AR(1) residuals with lag-one correlation rho = exp(-dt/T)
        // (variance inflation of a regression slope under AR(1) errors; derived for long records).
        double sxx = N * Math.pow(N / FS, 2) / 12;
        double rho = Math.exp(-1 / (FS * T));
        double se = RMS / Math.sqrt(sxx) * Math.sqrt((1 + rho) / (1 - rho));
        assertEquals(SLOPE, r.slope(), 3 * se);

        double[] d = r.detrended();
        SimpleRegression after = new SimpleRegression();
        double meanBefore = 0;
        double meanAfter = 0;
        for (int i = 0; i < N; i++) {
            after.addData(t[i], d[i]);
            meanBefore += x[i] / N;
            meanAfter += d[i] / N;
        }
        assertEquals(0, after.getSlope(), 1e-12, "no trend left");
        assertEquals(meanBefore, meanAfter, 1e-12, "mean kept");
    }

    @Test
    void theReportListsTheRemovedTrendAndWhatWasSwitchedOff() {
        VelocityRecord record = trendedRecord();
        RecordCleaner.Result on = new RecordCleaner(true, true, true).clean(record);
        ComponentCleaning c = on.report().components().get(0);
        assertTrue(c.detrended());
        assertEquals(SLOPE, c.trendSlope(), 1e-4);
        assertEquals(c.trendSlope() * (N - 1) / FS, c.trendChange(), 1e-12);
        assertTrue(on.report().lines().stream().anyMatch(l -> l.contains("linear trend removed")
                && l.contains("slope")), on.report().lines().toString());
        assertTrue(on.report().lines().stream().anyMatch(l -> l.contains("replaced as spikes")));

        RecordCleaner.Result off = new RecordCleaner(false, false, true).clean(record);
        assertArrayEquals(record.component(0), off.record().component(0), 0.0, "nothing changed when both are off");
        ComponentCleaning c0 = off.report().components().get(0);
        assertFalse(c0.despiked());
        assertFalse(c0.detrended());
        assertEquals(List.of("u [m/s]: despiking switched off", "u [m/s]: detrending switched off"),
                off.report().lines());
    }

    @Test
    void spikeLinesInTheReportAreTheFileLines() {
        VelocityRecord record = trendedRecord();
        double[][] v = record.velocities();
        v[0][1234] += 0.5;   // 25 rms
        RecordCleaner.Result r = new RecordCleaner(true, false, true).clean(record.withVelocities(v));
        ComponentCleaning c = r.report().components().get(0);
        int k = java.util.Arrays.binarySearch(c.spikeSamples(), 1234);
        assertTrue(k >= 0, "spike at sample 1234 found");
        assertEquals(1236, c.spikeLines()[k], "sample i sits on line i + 2");
    }
}
