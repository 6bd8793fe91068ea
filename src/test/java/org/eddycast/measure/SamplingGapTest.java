package org.eddycast.measure;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.io.StringReader;
import java.util.Locale;
import org.junit.jupiter.api.Test;

/**
 * A gap in a record's time column: where it starts, how long it is, how many samples it stands for, and how it
 * reads in a report. Gap threshold: 1.5 median steps (the reader's default).
 */
class SamplingGapTest {

    /** Samples every 0.1 s, except one step of `gap` seconds after the sample at t = 1.0 (line 12). */
    private static VelocityRecord withGap(double gap) {
        StringBuilder s = new StringBuilder("time [s], u [m/s]\n");
        double t = 0;
        for (int i = 0; i < 30; i++) {
            s.append(String.format(Locale.ROOT, "%.4f, %.3f%n", t, 0.3 + 0.01 * (i % 3)));
            t += i == 10 ? gap : 0.1;
        }
        return new RecordReader().read(new StringReader(s.toString()), "gap test");
    }

    @Test
    void aGapSaysWhereItStartsHowLongItIsAndWhatIsMissing() {
        VelocityRecord r = withGap(0.5);
        assertEquals(1, r.gaps().size());
        SamplingGap g = r.gaps().get(0);
        assertEquals(1.0, g.startTime(), 1e-12, "the last sample before the gap");
        assertEquals(0.5, g.duration(), 1e-9);
        assertEquals(4, g.missingSamples(), "round(0.5 / 0.1) - 1");
        assertEquals(12, g.previousLine(), "the header is line 1, t = 1.0 is the 11th sample");
        assertEquals(13, g.line());
        assertEquals("gap of 0.5000 s after t = 1.000 s between lines 12 and 13 (about 4 samples missing)",
                g.describe());
    }

    /** Just below 1.5 median steps is no gap; just above is one, counted as at least one missing sample. */
    @Test
    void thresholdIsOneAndAHalfMedianSteps() {
        assertEquals(0, withGap(0.149).gaps().size());
        VelocityRecord r = withGap(0.151);
        assertEquals(1, r.gaps().size());
        assertEquals(1, r.gaps().get(0).missingSamples(), "round(1.51) - 1 = 1");
    }

    @Test
    void describeUsesTheRecordsOwnFields() {
        assertEquals("gap of 12.50 s after t = 3600 s between lines 7 and 9 (about 249 samples missing)",
                new SamplingGap(9, 7, 3600, 12.5, 249).describe());
    }
}
