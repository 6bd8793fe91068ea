package org.eddycast.docs;

import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Locale;
import java.util.stream.Stream;

/**
 * The validation-record chapter, written as Markdown from the entries the test suite recorded in
 * {@code target/validation/*.json} (one file per check). Nothing in it is typed by hand: every number is the
 * test's own. Entries are grouped by the test class that recorded them.
 */
public final class ValidationChapter {

    private static final ObjectMapper JSON = new ObjectMapper();

    private ValidationChapter() {
    }

    /** Reads every entry in the directory, ordered by recording test and check; fails when there are none. */
    public static List<ValidationEntry> read(Path dir) {
        if (!Files.isDirectory(dir)) {
            throw new ManualBuildException("no validation record at " + dir
                    + ": the tests write it; build the manual with 'mvn -B verify'");
        }
        List<ValidationEntry> entries = new ArrayList<>();
        try (Stream<Path> files = Files.list(dir)) {
            for (Path f : files.filter(p -> p.toString().endsWith(".json")).sorted().toList()) {
                try {
                    entries.add(JSON.readValue(f.toFile(), ValidationEntry.class));
                } catch (IOException | IllegalArgumentException e) {
                    throw new ManualBuildException("unreadable validation entry " + f + ": " + e.getMessage(), e);
                }
            }
        } catch (IOException e) {
            throw new ManualBuildException("cannot list " + dir + ": " + e.getMessage(), e);
        }
        if (entries.isEmpty()) {
            throw new ManualBuildException("the validation record at " + dir
                    + " is empty: the tests write it; build the manual with 'mvn -B verify'");
        }
        entries.sort(Comparator.comparing(ValidationEntry::recordedBy).thenComparing(ValidationEntry::check));
        return List.copyOf(entries);
    }

    /** The chapter as Markdown. */
    public static String markdown(String title, List<ValidationEntry> entries) {
        long passed = entries.stream().filter(ValidationEntry::passed).count();
        StringBuilder md = new StringBuilder();
        md.append("# ").append(title).append("\n\n");
        md.append("This chapter is written by the build from the outcomes of the test suite that ran just before it: "
                + "each row is one check of the tool against a value from outside the project (an exact result, a "
                + "derivation stated in the test, or a published formula or constant), with its source. Where the "
                + "tool's value is statistical its 95% interval is shown; \"accepted\" is the range the test allows, "
                + "and the criterion says how that range was set. No number here is typed by hand.\n\n");
        md.append(String.format(Locale.ROOT, "**%d of %d checks passed.**%n%n", passed, entries.size()));
        String group = null;
        for (ValidationEntry e : entries) {
            String cls = testClass(e.recordedBy());
            if (!cls.equals(group)) {
                group = cls;
                md.append("\n## ").append(cls).append("\n\n");
                md.append("| check | expected | tool | 95% interval | accepted | verdict | source | criterion |\n");
                md.append("|---|---:|---:|---|---|---|---|---|\n");
            }
            md.append("| ").append(cell(e.check()))
                    .append(" | ").append(number(e.expected()))
                    .append(" | ").append(number(e.estimate()))
                    .append(" | ").append(e.estimateLow() == null ? "exact computation"
                            : "[" + number(e.estimateLow()) + ", " + number(e.estimateHigh()) + "]")
                    .append(" | [").append(number(e.acceptLow())).append(", ").append(number(e.acceptHigh())).append("]")
                    .append(" | ").append(e.passed() ? "pass" : "**FAIL**")
                    .append(" | ").append(cell(e.source()))
                    .append(" | ").append(cell(e.criterion()))
                    .append(" |\n");
        }
        return md.toString();
    }

    private static String testClass(String recordedBy) {
        int hash = recordedBy.indexOf('#');
        String cls = hash < 0 ? recordedBy : recordedBy.substring(0, hash);
        return cls.substring(cls.lastIndexOf('.') + 1);
    }

    /** Four significant digits, plain or scientific, without trailing zeros. */
    static String number(double v) {
        if (Double.isNaN(v)) {
            return "n/a";
        }
        if (Double.isInfinite(v)) {
            return v > 0 ? "+inf" : "-inf";
        }
        double a = Math.abs(v);
        boolean scientific = a != 0 && (a < 1e-3 || a >= 1e5);
        String s = String.format(Locale.ROOT, scientific ? "%.3e" : "%.4g", v);
        String mantissa = scientific ? s.substring(0, s.indexOf('e')) : s;
        String exponent = scientific ? "e" + Integer.parseInt(s.substring(s.indexOf('e') + 1)) : "";
        if (mantissa.contains(".")) {
            mantissa = mantissa.replaceAll("0+$", "").replaceAll("\\.$", "");
        }
        return mantissa + exponent;
    }

    private static String cell(String s) {
        return s.replace("|", "\\|").replace("\n", " ");
    }
}
