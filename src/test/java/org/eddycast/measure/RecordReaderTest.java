package org.eddycast.measure;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.StringReader;
import java.util.List;

import org.junit.jupiter.api.Test;

/** Reading delimited records: delimiters, headers, units, time column or stated rate, gaps. */
class RecordReaderTest {

    private static VelocityRecord read(String text) {
        return new RecordReader().read(new StringReader(text), "test");
    }

    @Test
    void commaSeparatedWithMixedUnitsIsConvertedToSi() {
        VelocityRecord r = read("""
                # a comment line
                time [s], u [m/s], v [cm/s], w [mm/s]
                0.00, 0.30, 1.0, 5
                0.04, 0.31, -2.0, 7
                0.08, 0.29, 0.5, -3
                """);
        assertEquals(3, r.componentCount());
        assertEquals(3, r.sampleCount());
        assertArrayEquals(new double[] {0.30, 0.31, 0.29}, r.component(0), 1e-15);
        assertArrayEquals(new double[] {0.010, -0.020, 0.005}, r.component(1), 1e-15);
        assertArrayEquals(new double[] {0.005, 0.007, -0.003}, r.component(2), 1e-15);
        assertEquals(25.0, r.samplingRate(), 1e-9);
        assertArrayEquals(new int[] {3, 4, 5}, r.lineNumbers());
        assertEquals(List.of("u [m/s]", "v [cm/s]", "w [mm/s]"), r.componentNames());
    }

    @Test
    void semicolonTabAndBlankDelimitersAreFound() {
        String[] texts = {
            "t (s);u (m/s)\n0;0.1\n0.5;0.2\n1.0;0.15\n",
            "time [s]\tu [m/s]\n0\t0.1\n0.5\t0.2\n1.0\t0.15\n",
            "time [s]   u [m/s]\n0  0.1\n0.5   0.2\n1.0 0.15\n",
            "time   u\n0  0.1\n0.5   0.2\n1.0 0.15\n",
        };
        for (String text : texts) {
            VelocityRecord r = read(text);
            assertArrayEquals(new double[] {0.1, 0.2, 0.15}, r.component(0), 1e-15, text);
            assertEquals(2.0, r.samplingRate(), 1e-12, text);
        }
    }

    @Test
    void millisecondTimesAndStatedRateAreHonoured() {
        VelocityRecord ms = read("time [ms], u [m/s]\n0, 0.1\n20, 0.2\n40, 0.3\n");
        assertEquals(50.0, ms.samplingRate(), 1e-9);
        VelocityRecord stated = new RecordReader(32.0, 1.5).read(new StringReader("u [cm/s]\n10\n12\n11\n"), "s");
        assertFalse(stated.hasTimeColumn());
        assertEquals(32.0, stated.samplingRate());
        assertArrayEquals(new double[] {0, 1 / 32.0, 2 / 32.0}, stated.times(), 1e-15);
        assertArrayEquals(new double[] {0.10, 0.12, 0.11}, stated.component(0), 1e-15);
    }

    @Test
    void headerlessRecordReadsTimeThenVelocitiesWithANote() {
        VelocityRecord r = read("0 0.1 0.01\n0.1 0.2 0.02\n0.2 0.3 0.01\n");
        assertEquals(2, r.componentCount());
        assertEquals(10.0, r.samplingRate(), 1e-9);
        assertTrue(r.notes().get(0).contains("no header"), r.notes().toString());
    }

    @Test
    void columnsThatAreNotVelocitiesAreLeftOutWithANote() {
        VelocityRecord r = read("time [s], u [m/s], snr [dB], v\n0, 0.1, 20, 0.01\n0.1, 0.2, 21, 0.02\n0.2, 0.3, x, 0.0\n");
        assertEquals(2, r.componentCount(), "u and v (no unit: m/s assumed)");
        assertTrue(r.notes().stream().anyMatch(n -> n.contains("snr [dB]") && n.contains("not used")), r.notes().toString());
        assertTrue(r.notes().stream().anyMatch(n -> n.contains("'v'") && n.contains("m/s assumed")), r.notes().toString());
    }

    @Test
    void medianStepGivesTheRateAndLongStepsAreGapsWithLineNumbers() {
        StringBuilder s = new StringBuilder("# probe\ntime [s], u [m/s]\n");
        double t = 0;
        for (int i = 0; i < 40; i++) {
            // two gaps: after the 10th sample 3 steps are missing, after the 30th one step
            t += i == 10 ? 0.4 : i == 30 ? 0.2 : 0.1;
            s.append(String.format(java.util.Locale.ROOT, "%.3f, %.3f%n", t, 0.3 + 0.01 * (i % 3)));
        }
        VelocityRecord r = read(s.toString());
        assertEquals(10.0, r.samplingRate(), 1e-6);
        assertEquals(2, r.gaps().size());
        // data starts on line 3, so sample i is on line i + 3
        assertEquals(13, r.gaps().get(0).line());
        assertEquals(12, r.gaps().get(0).previousLine());
        assertEquals(3, r.gaps().get(0).missingSamples());
        assertEquals(33, r.gaps().get(1).line());
        assertEquals(1, r.gaps().get(1).missingSamples());
    }

    @Test
    void byteOrderMarkAndQuotedNamesAreAccepted() {
        VelocityRecord r = read("\uFEFF\"time [s]\",\"u [m/s]\"\n0,0.1\n1,0.2\n");
        assertEquals(2, r.sampleCount());
    }
}
