package org.eddycast.measure;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assertions.fail;

import java.io.StringReader;
import java.nio.file.Path;
import java.util.Random;

import org.junit.jupiter.api.Test;

/** Bad records: each fault names its line (and column) and what would be valid; nothing else is thrown. */
class RecordFormatErrorTest {

    private static RecordFormatException readFails(String text) {
        return assertThrows(RecordFormatException.class, () -> new RecordReader().read(new StringReader(text), "t"));
    }

    private static void assertMentions(RecordFormatException e, String... parts) {
        for (String p : parts) {
            assertTrue(e.getMessage().contains(p), "message should mention '" + p + "': " + e.getMessage());
        }
    }

    @Test
    void textInANumberColumnNamesLineColumnAndANumberFormat() {
        RecordFormatException e = readFails("time [s], u [m/s], v [m/s]\n0, 0.1, 0.0\n0.1, abc, 0.1\n");
        assertEquals(3, e.getLine());
        assertEquals(2, e.getColumn());
        assertMentions(e, "line 3", "column 2", "'abc'", "u [m/s]", "decimal number");
    }

    @Test
    void decimalCommaGetsAHint() {
        RecordFormatException e = readFails("time [s]; u [m/s]\n0; 0.1\n0.1; 0,2\n");
        assertEquals(3, e.getLine());
        assertEquals(2, e.getColumn());
        assertMentions(e, "decimal separator must be a point");
    }

    @Test
    void timesThatDoNotIncreaseNameBothLines() {
        RecordFormatException e = readFails("# c\ntime [s], u [m/s]\n0.0, 0.1\n0.1, 0.2\n0.1, 0.3\n");
        assertEquals(5, e.getLine());
        assertEquals(1, e.getColumn());
        assertMentions(e, "line 4", "must increase");
    }

    @Test
    void aRowWithAMissingValueNamesTheFirstMissingColumn() {
        RecordFormatException e = readFails("time [s], u [m/s], v [m/s]\n0, 0.1, 0.0\n0.1, 0.2\n");
        assertEquals(3, e.getLine());
        assertEquals(3, e.getColumn());
        assertMentions(e, "found 2 values", "header on line 1 names 3 columns");
    }

    @Test
    void anEmptyValueIsNamed() {
        RecordFormatException e = readFails("time [s], u [m/s]\n0, 0.1\n0.1,\n");
        assertEquals(3, e.getLine());
        assertEquals(2, e.getColumn());
        assertMentions(e, "empty value", "decimal number");
    }

    @Test
    void missingVelocityOrTimeColumnsAreNamedWithExamples() {
        RecordFormatException noVelocity = readFails("# c\ntime [s], depth [m]\n0, 0.1\n");
        assertEquals(2, noVelocity.getLine());
        assertMentions(noVelocity, "no velocity column", "u [m/s]", "m/s, cm/s or mm/s");
        RecordFormatException noTime = readFails("u [m/s], v [m/s]\n0.1, 0.0\n0.2, 0.1\n");
        assertEquals(1, noTime.getLine());
        assertMentions(noTime, "no time column", "time [s]", "sampling rate");
    }

    @Test
    void unknownVelocityUnitListsTheValidOnes() {
        RecordFormatException e = readFails("time [s], u [ft/s]\n0, 1\n1, 2\n");
        assertEquals(1, e.getLine());
        assertEquals(2, e.getColumn());
        assertMentions(e, "'ft/s'", "m/s, cm/s or mm/s");
    }

    @Test
    void aFourthVelocityColumnIsRejected() {
        RecordFormatException e = readFails("t [s], u [m/s], v [m/s], w [m/s], u2 [m/s]\n0,1,2,3,4\n");
        assertEquals(1, e.getLine());
        assertEquals(5, e.getColumn());
        assertMentions(e, "one to three");
    }

    @Test
    void emptyFileCommentOnlyFileAndHeaderOnlyFile() {
        RecordFormatException empty = readFails("");
        assertEquals(1, empty.getLine());
        assertMentions(empty, "empty", "time [s], u [m/s]");
        RecordFormatException comments = readFails("# one\n# two\n\n");
        assertEquals(3, comments.getLine());
        assertMentions(comments, "only comments");
        RecordFormatException headerOnly = readFails("# c\ntime [s], u [m/s]\n");
        assertEquals(3, headerOnly.getLine());
        assertMentions(headerOnly, "no data rows after the header on line 2");
    }

    @Test
    void aConstantComponentNamesItsColumnAndFirstLine() {
        RecordFormatException e = readFails("# c\ntime [s], u [m/s], w [m/s]\n0, 0.1, 0\n0.1, 0.2, 0\n0.2, 0.3, 0\n");
        assertEquals(3, e.getLine());
        assertEquals(3, e.getColumn());
        assertMentions(e, "w [m/s]", "same value", "line 3 to line 5", "must vary");
    }

    @Test
    void tooFewSamplesForTheAnalysisSaysHowManyAreNeeded() {
        StringBuilder s = new StringBuilder("time [s], u [m/s]\n");
        for (int i = 0; i < 100; i++) {
            s.append(i * 0.04).append(", ").append(0.3 + 0.01 * Math.sin(i)).append('\n');
        }
        RecordFormatException e = assertThrows(RecordFormatException.class,
                () -> RecordAnalyzer.analyze(new StringReader(s.toString()), "short", AnalysisOptions.defaults()));
        assertEquals(101, e.getLine(), "the last data row");
        assertMentions(e, "after 100 samples", "at least " + WelchSpectrumEstimator.MIN_SAMPLES, "20.48 s at 25.00 Hz");
        RecordFormatException withSegment = assertThrows(RecordFormatException.class,
                () -> RecordAnalyzer.analyze(new StringReader(s.toString()), "short",
                        AnalysisOptions.defaults().withSegmentLength(1024)));
        assertMentions(withSegment, "at least 2048", "two Welch segments of 1024");
    }

    @Test
    void aSpeedNoFlowHasIsRejectedWithAHintAboutUnits() {
        RecordFormatException e = readFails("time [s], u [mm/s]\n0, 300\n0.1, 2e9\n");
        assertEquals(3, e.getLine());
        assertEquals(2, e.getColumn());
        assertMentions(e, "not a flow velocity", "unit");
    }

    @Test
    void aSingleSampleIsRejected() {
        RecordFormatException e = readFails("time [s], u [m/s]\n0, 0.1\n");
        assertEquals(2, e.getLine());
        assertMentions(e, "only one sample");
    }

    @Test
    void anUnreadableFileIsAFormatExceptionWithoutALine() {
        RecordFormatException e = assertThrows(RecordFormatException.class,
                () -> new RecordReader().read(Path.of("/nonexistent/dir/record.csv")));
        assertEquals(0, e.getLine());
        assertMentions(e, "could not read", "record.csv");
    }

    /**
     * Robustness: random corruptions of a valid record (fixed seed) either read or raise a
     * RecordFormatException with a line number inside the text; no other exception escapes.
     */
    @Test
    void randomCorruptionsNeverCrash() {
        String valid = "# probe\ntime [s], u [m/s], v [cm/s]\n0.00, 0.30, 1.0\n0.04, 0.31, -2.0\n0.08, 0.29, 0.5\n"
                + "0.12, 0.28, 0.7\n0.16, 0.33, 0.1\n";
        String alphabet = "0123456789.,;\t -+eE#[]()/msxNaI\n\"";
        Random random = new Random(7);
        int failures = 0;
        for (int trial = 0; trial < 3000; trial++) {
            StringBuilder s = new StringBuilder(valid);
            int edits = 1 + random.nextInt(6);
            for (int k = 0; k < edits; k++) {
                int pos = random.nextInt(s.length() + 1);
                switch (random.nextInt(3)) {
                    case 0 -> s.insert(pos, alphabet.charAt(random.nextInt(alphabet.length())));
                    case 1 -> { if (pos < s.length()) s.deleteCharAt(pos); }
                    default -> { if (pos < s.length()) s.setCharAt(pos, alphabet.charAt(random.nextInt(alphabet.length()))); }
                }
            }
            String text = s.toString();
            try {
                new RecordReader().read(new StringReader(text), "fuzz");
            } catch (RecordFormatException e) {
                failures++;
                long lines = text.lines().count();
                assertTrue(e.getLine() >= 1 && e.getLine() <= lines + 1, "line " + e.getLine() + " outside 1.."
                        + (lines + 1) + " for:\n" + text + "\n" + e.getMessage());
            } catch (RuntimeException e) {
                fail("unexpected " + e + " for:\n" + text);
            }
        }
        assertTrue(failures > 100, "most corruptions should be caught, got " + failures);
    }

    /**
     * Robustness of the analysis: odd but readable signals (a single spike, a step, a pure tone, coarse
     * quantisation, tiny and huge values, a ramp, alternation, heavy spiking; fixed seed) either give finite,
     * positive scales or a RecordFormatException; nothing else escapes.
     */
    @Test
    void oddSignalsNeverCrashTheAnalysis() {
        Random random = new Random(1);
        int analysed = 0;
        for (int trial = 0; trial < 90; trial++) {
            int n = 512 + random.nextInt(1500);
            int m = 1 + random.nextInt(3);
            double[][] v = new double[m][n];
            int kind = trial % 9;
            for (int c = 0; c < m; c++) {
                for (int i = 0; i < n; i++) {
                    double x = switch (kind) {
                        case 0 -> i == n / 2 ? 1 : 0;
                        case 1 -> i < n / 2 ? 0 : 1;
                        case 2 -> Math.sin(0.3 * i);
                        case 3 -> Math.round(random.nextGaussian()) * 0.01;
                        case 4 -> 1e-200 * random.nextGaussian();
                        case 5 -> 900 * random.nextGaussian() / 4;
                        case 6 -> i;
                        case 7 -> i % 2 == 0 ? 1 : -1;
                        default -> random.nextGaussian() + (random.nextDouble() < 0.3 ? 50 * random.nextGaussian() : 0);
                    };
                    v[c][i] = x + (c == 0 ? random.nextDouble() : 0);
                }
            }
            VelocityRecord record = Records.of(50, v);
            AnalysisOptions options = AnalysisOptions.defaults().withDespike(random.nextBoolean())
                    .withDetrend(random.nextBoolean());
            try {
                org.eddycast.scenario.TurbulenceStatistics s = RecordAnalyzer.analyze(record, options).statistics();
                assertTrue(Double.isFinite(s.rmsVelocity()) && s.integralLength() > 0
                        && Double.isFinite(s.integralLength()) && s.correlationTime() > 0, "kind " + kind + ": " + s);
                analysed++;
            } catch (RecordFormatException e) {
                assertTrue(e.getLine() >= 0, e.getMessage());
            } catch (RuntimeException e) {
                fail("kind " + kind + ": unexpected " + e);
            }
        }
        assertTrue(analysed > 45, "most odd signals are still analysable, got " + analysed);
    }
}
