package org.eddycast.reliability;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.StringReader;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import net.jqwik.api.Arbitraries;
import net.jqwik.api.Arbitrary;
import net.jqwik.api.Combinators;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.Provide;
import net.jqwik.api.statistics.Statistics;
import org.eddycast.measure.RecordFormatException;
import org.eddycast.measure.RecordReader;
import org.eddycast.measure.VelocityRecord;

/**
 * Property-based tests of the velocity-record reader: random and mutated record files never crash it (the only
 * failure is a {@link RecordFormatException}), every rejection names the line at fault, and a well-formed
 * record is read back sample for sample. Seeds are fixed so a run is repeatable.
 */
class RecordReaderPropertiesTest {

    /** Reads, and checks the contract: a record, or a RecordFormatException naming a line of the text. */
    private static VelocityRecord readChecked(String text) {
        try {
            VelocityRecord r = new RecordReader().read(new StringReader(text), "generated");
            Statistics.collect("accepted");
            return r;
        } catch (RecordFormatException e) {
            Statistics.collect("rejected");
            long lines = Math.max(1, text.lines().count());
            assertTrue(e.getLine() >= 1 && e.getLine() <= lines + 1, "line " + e.getLine() + " of " + lines
                    + " named by: " + e.getMessage());
            assertTrue(e.getMessage().startsWith("line " + e.getLine() + (e.getColumn() > 0 ? ", column "
                    + e.getColumn() + ": " : ": ")), e.getMessage());
            return null;
        }
    }

    @Property(tries = 1000, seed = "8201")
    void randomTextIsReadOrRejectedWithItsLine(@ForAll("recordishText") String text) {
        readChecked(text);
    }

    @Property(tries = 1500, seed = "8202")
    void mutatedRecordsAreReadOrRejectedWithTheirLine(@ForAll("mutatedRecords") String text) {
        VelocityRecord r = readChecked(text);
        if (r != null) {
            assertTrue(r.sampleCount() >= 2);
            for (int i = 1; i < r.sampleCount(); i++) {
                assertTrue(r.times()[i] > r.times()[i - 1], "times must increase");
            }
        }
    }

    /** A well-formed record: every value comes back as written, converted to m/s, on the line it was on. */
    @Property(tries = 500, seed = "8203")
    void wellFormedRecordsAreReadSampleForSample(@ForAll("wellFormedRecords") Generated g) {
        VelocityRecord r = readChecked(g.text());
        assertTrue(r != null, g.text());
        assertEquals(g.times().length, r.sampleCount());
        for (int i = 0; i < g.times().length; i++) {
            assertEquals(g.times()[i], r.times()[i], 0.0);
            assertEquals(g.u()[i] * g.unitScale(), r.component(0)[i], 0.0);
            assertEquals(g.headerLine() + 1 + i, r.lineOf(i));
        }
    }

    @Provide
    Arbitrary<String> recordishText() {
        Arbitrary<String> pieces = Arbitraries.oneOf(
                Arbitraries.of(",", ";", "\t", " ", "\n", "#", ".", "-", "e", "1", "0.5", "1e400", "time [s]",
                        "u [m/s]", "v (cm/s)", "w [mm/s]", "[", "]", "\"", "NaN", "2,5", "\uFEFF", "\r\n"),
                Arbitraries.strings().withCharRange(' ', '~').ofMaxLength(3));
        return pieces.list().ofMaxSize(60).map(l -> String.join("", l));
    }

    /** A generated record: its text, the values written, and the unit they were written in. */
    record Generated(String text, double[] times, double[] u, double unitScale, int headerLine) {
    }

    @Provide
    Arbitrary<Generated> wellFormedRecords() {
        Arbitrary<String> delimiter = Arbitraries.of(",", ";", "\t", "  ");
        Arbitrary<String> unit = Arbitraries.of("m/s", "cm/s", "mm/s");
        Arbitrary<Integer> rows = Arbitraries.integers().between(2, 80);
        Arbitrary<Integer> comments = Arbitraries.integers().between(0, 3);
        Arbitrary<Long> seed = Arbitraries.longs();
        return Combinators.combine(delimiter, unit, rows, comments, seed).as((d, un, n, c, s) -> {
            java.util.Random random = new java.util.Random(s);
            StringBuilder sb = new StringBuilder();
            for (int i = 0; i < c; i++) {
                sb.append("# probe notes ").append(i).append('\n');
            }
            sb.append("time [s]").append(d).append("u [").append(un).append("]").append(d).append("v [")
                    .append(un).append("]\n");
            double scale = un.equals("m/s") ? 1 : un.equals("cm/s") ? 0.01 : 0.001;
            double[] t = new double[n];
            double[] u = new double[n];
            for (int i = 0; i < n; i++) {
                String ts = String.format(Locale.ROOT, "%.3f", 0.02 * i + 0.001 * random.nextInt(5));
                String us = String.format(Locale.ROOT, "%.4f", random.nextGaussian() / scale * 0.05);
                String vs = String.format(Locale.ROOT, "%.4f", random.nextGaussian() / scale * 0.05);
                t[i] = Double.parseDouble(ts);
                u[i] = Double.parseDouble(us);
                sb.append(ts).append(d).append(us).append(d).append(vs).append('\n');
            }
            return new Generated(sb.toString(), t, u, scale, c + 1);
        });
    }

    /** A well-formed record with one to four edits: a line cut, doubled, swapped, or a piece of it replaced. */
    @Provide
    Arbitrary<String> mutatedRecords() {
        Arbitrary<String> tokens = Arbitraries.of("", ",", ";", "\t", "x", "-", "1e999", "NaN", "2,5", "..", "#",
                "u [km/s]", "time [h]", "9999", "-0", " ", "\"");
        Arbitrary<int[]> picks = Arbitraries.integers().between(0, 1_000_000).array(int[].class).ofSize(4);
        Arbitrary<LineEdit> edit = Combinators.combine(Arbitraries.integers().between(0, 4), picks, tokens)
                .as(LineEdit::new);
        return Combinators.combine(wellFormedRecords(), edit.list().ofMinSize(1).ofMaxSize(4)).as((g, edits) -> {
            List<String> lines = new ArrayList<>(g.text().lines().toList());
            for (LineEdit e : edits) {
                e.apply(lines);
            }
            return String.join("\n", lines) + "\n";
        });
    }

    private record LineEdit(int kind, int[] picks, String token) {
        void apply(List<String> lines) {
            if (lines.isEmpty()) {
                return;
            }
            int i = picks[0] % lines.size();
            int j = picks[1] % lines.size();
            String line = lines.get(i);
            switch (kind) {
                case 0 -> lines.remove(i);
                case 1 -> lines.add(i, line);
                case 2 -> {
                    lines.set(i, lines.get(j));
                    lines.set(j, line);
                }
                default -> {
                    int a = line.isEmpty() ? 0 : picks[2] % line.length();
                    int b = Math.min(line.length(), a + picks[3] % 6);
                    lines.set(i, line.substring(0, a) + token + line.substring(b));
                }
            }
        }
    }
}
