package org.eddycast.measure;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.Reader;
import java.nio.charset.StandardCharsets;
import org.eddycast.scenario.TextFiles;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.BasicFileAttributes;
import java.nio.file.attribute.FileTime;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Locale;
import java.util.function.UnaryOperator;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * Reads a delimited text velocity record: a time column (or a stated sampling rate) and one to three velocity
 * components.
 *
 * <p>Format accepted:
 * <ul>
 *   <li>Lines starting with '#' are comments; blank lines are skipped.</li>
 *   <li>The delimiter is found from the first non-comment line: tab if it holds one, else semicolon, else
 *       comma, else runs of blanks. The decimal separator is always a point.</li>
 *   <li>An optional header names the columns with units in brackets or parentheses, for example
 *       {@code time [s], u [m/s], v [cm/s], w (mm/s)}. Velocity units m/s, cm/s and mm/s are converted to
 *       m/s; time units s and ms to s. A column named t or time (or with unit s or ms) is the time column.
 *       A column without a unit is a velocity in m/s when its name is a usual component name (u, v, w, ux,
 *       u1, ...), otherwise it is not used; either way a note says so. Columns with other units (a signal
 *       strength in dB, say) are not used, with a note.</li>
 *   <li>Without a header: time in s then one to three velocities in m/s, or, when a sampling rate is
 *       stated, one to three velocities in m/s.</li>
 * </ul>
 * The sampling rate is the reciprocal of the median time step; steps above {@code gapFactor} times the
 * median are reported as gaps with their line numbers. A stated sampling rate is used only when there is no
 * time column (a note is made when both are given and they differ by more than 1%).
 *
 * <p>Every fault raises a {@link RecordFormatException} naming the line, the column and what would be valid.
 */
public final class RecordReader {

    /** Largest number of samples read, to keep memory bounded (about 43 hours at 64 Hz). */
    public static final int MAX_SAMPLES = 10_000_000;
    /** Largest velocity magnitude accepted (m/s): far above any water or air flow a probe measures. */
    public static final double MAX_SPEED = 1000.0;
    /** Default gap threshold: a step above 1.5 median steps is a gap (common practice: at least one sample lost). */
    public static final double DEFAULT_GAP_FACTOR = 1.5;

    private static final Pattern NAME_AND_UNIT = Pattern.compile("^(.*?)\\s*[\\[(]\\s*([^\\])]*?)\\s*[\\])]\\s*$");
    private static final Pattern NUMBER = Pattern.compile("[+-]?(\\d+\\.?\\d*|\\.\\d+)([eE][+-]?\\d+)?");
    private static final Pattern COMPONENT_NAME =
            Pattern.compile("(?i)(u|v|w|u[123xyz]|v[123xyz]|vel\\w*|velocity\\w*)");

    private final double statedSamplingRate;
    private final double gapFactor;

    /** A reader for records with a time column, default gap threshold. */
    public RecordReader() {
        this(Double.NaN, DEFAULT_GAP_FACTOR);
    }

    /**
     * @param statedSamplingRate samples per second for records without a time column; NaN when not stated
     * @param gapFactor          a step above this many median steps is a gap; above 1
     */
    public RecordReader(double statedSamplingRate, double gapFactor) {
        if (!Double.isNaN(statedSamplingRate) && !(statedSamplingRate > 0 && statedSamplingRate < 1e9)) {
            throw new IllegalArgumentException("stated sampling rate must be positive (Hz) or NaN for none, not "
                    + statedSamplingRate);
        }
        if (!(gapFactor > 1 && gapFactor < 1e6)) {
            throw new IllegalArgumentException("gap factor must be above 1 (median steps), not " + gapFactor);
        }
        this.statedSamplingRate = statedSamplingRate;
        this.gapFactor = gapFactor;
    }

    /**
     * Reads a record file (UTF-8). The file's size and modification time are taken before and after reading;
     * a file that changed meanwhile (a probe program still writing it, say) is rejected rather than read half
     * old and half new.
     */
    public VelocityRecord read(Path path) {
        return read(path, UnaryOperator.identity());
    }

    /** As {@link #read(Path)}, with the file's reader passed through {@code wrap} (tests use it to act mid-read). */
    VelocityRecord read(Path path, UnaryOperator<Reader> wrap) {
        try {
            TextFiles.checkStart(path, "record file");
        } catch (java.nio.file.NoSuchFileException e) {
            throw new RecordFormatException(0, 0, "could not read the record file " + path + ": no such file");
        } catch (IOException e) {
            throw new RecordFormatException(0, 0, e.getMessage());
        }
        FileState before = FileState.of(path);
        VelocityRecord record;
        try (Reader in = wrap.apply(Files.newBufferedReader(path, StandardCharsets.UTF_8))) {
            record = read(in, path.getFileName() == null ? path.toString() : path.getFileName().toString());
        } catch (java.io.UncheckedIOException e) {
            if (!(e.getCause() instanceof java.nio.charset.CharacterCodingException)) {
                throw e;
            }
            // not UTF-8 further in: the whole file says which byte and line
            try {
                TextFiles.decodeUtf8(Files.readAllBytes(path), path + " (record file)");
            } catch (IOException described) {
                throw new RecordFormatException(0, 0, described.getMessage());
            }
            throw new RecordFormatException(0, 0, "could not read the record file " + path + ": " + e);
        } catch (IOException e) {
            throw new RecordFormatException(0, 0, "could not read the record file " + path + ": " + e.getMessage()
                    + " (a readable UTF-8 text file is needed)");
        }
        FileState after = FileState.of(path);
        if (!before.equals(after)) {
            throw new RecordFormatException(0, 0, "the record file " + path + " changed while it was being read ("
                    + before.describe() + " before, " + after.describe() + " after); wait until the program"
                    + " writing it has finished, or read a copy of it");
        }
        return record;
    }

    /** The size and modification time of a file: enough to see that it was written to. */
    private record FileState(long size, FileTime modified) {
        static FileState of(Path path) {
            try {
                BasicFileAttributes a = Files.readAttributes(path, BasicFileAttributes.class);
                return new FileState(a.size(), a.lastModifiedTime());
            } catch (IOException e) {
                throw new RecordFormatException(0, 0, "could not read the record file " + path + ": "
                        + e.getMessage() + " (a readable UTF-8 text file is needed)");
            }
        }

        String describe() {
            return size + " bytes, modified " + modified;
        }
    }

    /** Reads a record from a character stream; {@code source} names it in reports. */
    public VelocityRecord read(Reader in, String source) {
        BufferedReader lines = in instanceof BufferedReader b ? b : new BufferedReader(in);
        Parser parser = new Parser(source);
        try {
            String text;
            while ((text = lines.readLine()) != null) {
                parser.accept(text);
            }
        } catch (java.nio.charset.CharacterCodingException e) {
            // the file reader names the encoding (read(Path) catches this)
            throw new java.io.UncheckedIOException(e);
        } catch (IOException e) {
            throw new RecordFormatException(parser.lineNo + 1, 0, "could not read the record: " + e.getMessage());
        }
        return parser.finish();
    }

    /** Where each kind of column sits, found from the header or from the first data row. */
    private static final class Layout {
        int headerLine;              // 0 when there is no header
        int fieldCount;
        int timeColumn = -1;         // 0-based, -1 when none
        double timeScale = 1.0;
        final List<Integer> velocityColumns = new ArrayList<>();
        final List<Double> velocityScales = new ArrayList<>();
        final List<String> velocityNames = new ArrayList<>();
        String[] columnLabels;
    }

    private final class Parser {
        private final String source;
        private final List<String> notes = new ArrayList<>();
        int lineNo;
        private Layout layout;
        private Pattern splitter;
        private boolean whitespace;
        private char delimiter;
        private DoubleBuffer times;
        private DoubleBuffer[] velocities;
        private final IntBuffer lines = new IntBuffer();
        private double previousTime = Double.NEGATIVE_INFINITY;
        private int previousLine;
        private boolean sawContent;

        Parser(String source) {
            this.source = source;
        }

        void accept(String raw) {
            lineNo++;
            String text = lineNo == 1 && raw.startsWith("\uFEFF") ? raw.substring(1) : raw;
            String trimmed = text.strip();
            if (trimmed.isEmpty() || trimmed.startsWith("#")) {
                return;
            }
            if (!sawContent) {
                sawContent = true;
                chooseDelimiter(trimmed);
                String[] fields = split(trimmed);
                if (allNumbers(fields)) {
                    layout = layoutWithoutHeader(fields.length);
                } else {
                    layout = layoutFromHeader(whitespace ? splitHeaderOnBlanks(trimmed) : fields);
                    return;
                }
            }
            readRow(split(trimmed));
        }

        private void chooseDelimiter(String line) {
            if (line.indexOf('\t') >= 0) {
                delimiter = '\t';
            } else if (line.indexOf(';') >= 0) {
                delimiter = ';';
            } else if (line.indexOf(',') >= 0) {
                delimiter = ',';
            } else {
                whitespace = true;
            }
            splitter = whitespace ? Pattern.compile("\\s+") : Pattern.compile(Pattern.quote(String.valueOf(delimiter)));
        }

        private String[] split(String line) {
            String[] parts = splitter.split(line, -1);
            for (int i = 0; i < parts.length; i++) {
                parts[i] = unquote(parts[i].strip());
            }
            return parts;
        }

        /** Splits a blank-separated header, keeping a unit in brackets with its name: "u [m/s]" is one field. */
        private String[] splitHeaderOnBlanks(String line) {
            List<String> out = new ArrayList<>();
            StringBuilder current = new StringBuilder();
            int depth = 0;
            for (int i = 0; i < line.length(); i++) {
                char ch = line.charAt(i);
                if (ch == '[' || ch == '(') {
                    depth++;
                } else if ((ch == ']' || ch == ')') && depth > 0) {
                    depth--;
                }
                if (Character.isWhitespace(ch) && depth == 0) {
                    int next = i;
                    while (next < line.length() && Character.isWhitespace(line.charAt(next))) {
                        next++;
                    }
                    boolean unitFollows = next < line.length() && (line.charAt(next) == '[' || line.charAt(next) == '(');
                    if (!unitFollows && current.length() > 0) {
                        out.add(unquote(current.toString()));
                        current.setLength(0);
                    } else if (unitFollows) {
                        current.append(' ');
                    }
                    i = next - 1;
                    continue;
                }
                current.append(ch);
            }
            if (current.length() > 0) {
                out.add(unquote(current.toString()));
            }
            return out.toArray(new String[0]);
        }

        private String delimiterName() {
            return whitespace ? "blanks" : delimiter == '\t' ? "tabs" : delimiter == ';' ? "semicolons" : "commas";
        }

        private boolean allNumbers(String[] fields) {
            for (String f : fields) {
                if (!NUMBER.matcher(f).matches()) {
                    return false;
                }
            }
            return true;
        }

        private Layout layoutWithoutHeader(int count) {
            Layout l = new Layout();
            l.fieldCount = count;
            l.columnLabels = new String[count];
            int first;
            if (Double.isNaN(statedSamplingRate)) {
                if (count < 2 || count > 4) {
                    throw new RecordFormatException(lineNo, 0, "found " + count + " values and no header; without a"
                            + " header the record must hold time in s then one to three velocities in m/s"
                            + " (or state the sampling rate and give one to three velocity columns)");
                }
                l.timeColumn = 0;
                l.columnLabels[0] = "time [s]";
                first = 1;
                notes.add("no header line: column 1 read as time in s, columns 2 to " + count
                        + " as velocities in m/s");
            } else {
                if (count > 3) {
                    throw new RecordFormatException(lineNo, 4, "found " + count + " values and no header; with a"
                            + " stated sampling rate the record must hold one to three velocity columns in m/s");
                }
                first = 0;
                notes.add("no header line: columns 1 to " + count + " read as velocities in m/s");
            }
            String[] names = {"u", "v", "w"};
            for (int c = first; c < count; c++) {
                l.velocityColumns.add(c);
                l.velocityScales.add(1.0);
                String name = names[c - first] + " [m/s]";
                l.velocityNames.add(name);
                l.columnLabels[c] = name;
            }
            return l;
        }

        private Layout layoutFromHeader(String[] fields) {
            Layout l = new Layout();
            l.headerLine = lineNo;
            l.fieldCount = fields.length;
            l.columnLabels = fields.clone();
            for (int j = 0; j < fields.length; j++) {
                classify(l, j, fields[j]);
            }
            if (l.velocityColumns.isEmpty()) {
                throw new RecordFormatException(lineNo, 0, "no velocity column in the header "
                        + Arrays.toString(fields) + "; name one to three velocity columns with a unit, for example"
                        + " 'u [m/s]' (valid units " + VelocityUnit.VALID + ")");
            }
            if (l.timeColumn < 0 && Double.isNaN(statedSamplingRate)) {
                throw new RecordFormatException(lineNo, 0, "no time column in the header " + Arrays.toString(fields)
                        + " and no sampling rate stated; add a column such as 'time [s]' or state the sampling"
                        + " rate in Hz");
            }
            return l;
        }

        private void classify(Layout l, int j, String field) {
            String name = field;
            String unit = "";
            Matcher m = NAME_AND_UNIT.matcher(field);
            if (m.matches()) {
                name = m.group(1).strip();
                unit = m.group(2).strip();
            }
            String lowerName = name.toLowerCase(Locale.ROOT);
            String lowerUnit = unit.replace(" ", "").toLowerCase(Locale.ROOT);
            boolean timeUnit = lowerUnit.equals("s") || lowerUnit.equals("sec") || lowerUnit.equals("ms");
            boolean timeName = lowerName.equals("t") || lowerName.startsWith("time");
            int column = j + 1;
            if (timeName || timeUnit) {
                if (l.timeColumn >= 0) {
                    throw new RecordFormatException(lineNo, column, "a second time column '" + field
                            + "' (the first is column " + (l.timeColumn + 1) + "); keep one time column");
                }
                if (unit.isEmpty()) {
                    notes.add("column " + column + " '" + field + "': no unit given, seconds assumed");
                } else if (lowerUnit.equals("ms")) {
                    l.timeScale = 0.001;
                } else if (!timeUnit) {
                    throw new RecordFormatException(lineNo, column, "time unit '" + unit + "' is not accepted;"
                            + " valid time units are s or ms");
                }
                l.timeColumn = j;
                return;
            }
            VelocityUnit vu = unit.isEmpty() ? null : VelocityUnit.parse(unit);
            if (vu == null && !unit.isEmpty() && VelocityUnit.looksLikeVelocity(unit)) {
                throw new RecordFormatException(lineNo, column, "velocity unit '" + unit + "' of column '" + field
                        + "' is not accepted; valid units are " + VelocityUnit.VALID);
            }
            if (vu == null && unit.isEmpty() && COMPONENT_NAME.matcher(name).matches()) {
                vu = VelocityUnit.METRES_PER_SECOND;
                notes.add("column " + column + " '" + field + "': no unit given, m/s assumed");
            }
            if (vu == null) {
                notes.add("column " + column + " '" + field + "' is not a velocity (units " + VelocityUnit.VALID
                        + ") and is not used");
                return;
            }
            if (l.velocityColumns.size() == 3) {
                throw new RecordFormatException(lineNo, column, "a fourth velocity column '" + field
                        + "'; a record holds one to three velocity components (u, v, w)");
            }
            l.velocityColumns.add(j);
            l.velocityScales.add(vu.toMetresPerSecond());
            l.velocityNames.add(field);
        }

        private void readRow(String[] fields) {
            if (times == null) {
                times = new DoubleBuffer();
                velocities = new DoubleBuffer[layout.velocityColumns.size()];
                for (int c = 0; c < velocities.length; c++) {
                    velocities[c] = new DoubleBuffer();
                }
            }
            if (fields.length != layout.fieldCount) {
                String expected = layout.headerLine > 0
                        ? "the header on line " + layout.headerLine + " names " + layout.fieldCount + " columns"
                        : "the first data row has " + layout.fieldCount + " values";
                int column = Math.min(fields.length, layout.fieldCount) + 1;
                throw new RecordFormatException(lineNo, column, "found " + fields.length + " values separated by "
                        + delimiterName() + ", but " + expected + "; every row needs one value per column");
            }
            if (lines.size() >= MAX_SAMPLES) {
                throw new RecordFormatException(lineNo, 0, "more than " + MAX_SAMPLES
                        + " samples; split the record into shorter pieces");
            }
            if (layout.timeColumn >= 0) {
                double t = number(fields, layout.timeColumn) * layout.timeScale;
                if (!(t > previousTime)) {
                    throw new RecordFormatException(lineNo, layout.timeColumn + 1, "time " + fields[layout.timeColumn]
                            + " is not later than the time on line " + previousLine + " ("
                            + fmt(previousTime / layout.timeScale) + "); times must increase from row to row");
                }
                previousTime = t;
                times.add(t);
            }
            for (int c = 0; c < velocities.length; c++) {
                int j = layout.velocityColumns.get(c);
                double v = number(fields, j) * layout.velocityScales.get(c);
                if (Math.abs(v) > MAX_SPEED) {
                    throw new RecordFormatException(lineNo, j + 1, "'" + fields[j] + "' in column '"
                            + layout.columnLabels[j] + "' is " + fmt(v) + " m/s, not a flow velocity (at most "
                            + fmt(MAX_SPEED) + " m/s in magnitude); check the column's unit");
                }
                velocities[c].add(v);
            }
            lines.add(lineNo);
            previousLine = lineNo;
        }

        private double number(String[] fields, int j) {
            String f = fields[j];
            String label = "column '" + layout.columnLabels[j] + "'";
            if (f.isEmpty()) {
                throw new RecordFormatException(lineNo, j + 1, "empty value in " + label
                        + "; every row needs a decimal number in every column");
            }
            if (!NUMBER.matcher(f).matches()) {
                String hint = f.matches("[+-]?\\d*,\\d+([eE][+-]?\\d+)?")
                        ? " (the decimal separator must be a point, not a comma)" : "";
                throw new RecordFormatException(lineNo, j + 1, "'" + f + "' in " + label + " is not a number"
                        + hint + "; expected a decimal number such as 0.253 or -1.5e-2");
            }
            double v = Double.parseDouble(f);
            if (!Double.isFinite(v)) {
                throw new RecordFormatException(lineNo, j + 1, "'" + f + "' in " + label
                        + " is too large; expected a finite decimal number");
            }
            return v;
        }

        VelocityRecord finish() {
            if (!sawContent) {
                throw new RecordFormatException(Math.max(1, lineNo), 0, "the record is empty"
                        + (lineNo > 0 ? " (only comments or blank lines)" : "")
                        + "; expected a header such as 'time [s], u [m/s]' followed by rows of numbers");
            }
            int n = lines.size();
            if (n == 0) {
                throw new RecordFormatException(layout.headerLine + 1, 0, "no data rows after the header on line "
                        + layout.headerLine + "; expected rows of numbers such as '0.00, 0.31'");
            }
            if (n < 2) {
                throw new RecordFormatException(lines.get(0), 0, "only one sample; at least 2 are needed to read a"
                        + " sampling rate, and the analysis needs many more");
            }
            double[][] v = new double[velocities.length][];
            for (int c = 0; c < v.length; c++) {
                v[c] = velocities[c].toArray();
                rejectConstant(v[c], c);
            }
            int[] lineArray = lines.toArray();
            double[] t;
            double rate;
            List<SamplingGap> gaps = new ArrayList<>();
            boolean fromColumn = layout.timeColumn >= 0;
            if (fromColumn) {
                t = times.toArray();
                double median = medianStep(t);
                rate = 1.0 / median;
                for (int i = 1; i < n; i++) {
                    double step = t[i] - t[i - 1];
                    if (step > gapFactor * median) {
                        gaps.add(new SamplingGap(lineArray[i], lineArray[i - 1], t[i - 1], step,
                                Math.max(1, Math.round(step / median) - 1)));
                    }
                }
                if (!Double.isNaN(statedSamplingRate) && Math.abs(statedSamplingRate - rate) > 0.01 * rate) {
                    notes.add(String.format(Locale.ROOT, "stated sampling rate %.6g Hz differs from the rate"
                            + " %.6g Hz of the time column; the time column is used", statedSamplingRate, rate));
                }
            } else {
                rate = statedSamplingRate;
                t = new double[n];
                for (int i = 0; i < n; i++) {
                    t[i] = i / rate;
                }
                notes.add(String.format(Locale.ROOT, "no time column: times made from the stated sampling rate"
                        + " %.6g Hz", rate));
            }
            return new VelocityRecord(source, t, v, layout.velocityNames, lineArray, rate, fromColumn, gaps, notes);
        }

        private void rejectConstant(double[] values, int c) {
            for (double x : values) {
                if (x != values[0]) {
                    return;
                }
            }
            int column = layout.velocityColumns.get(c) + 1;
            throw new RecordFormatException(lines.get(0), column, "column '" + layout.velocityNames.get(c)
                    + "' holds the same value " + fmt(values[0]) + " m/s on every row from line " + lines.get(0)
                    + " to line " + lines.get(lines.size() - 1) + "; a velocity component must vary (leave the"
                    + " column out if the probe did not measure it)");
        }
    }

    private static double medianStep(double[] t) {
        double[] steps = new double[t.length - 1];
        for (int i = 1; i < t.length; i++) {
            steps[i - 1] = t[i] - t[i - 1];
        }
        Arrays.sort(steps);
        int m = steps.length;
        return m % 2 == 1 ? steps[m / 2] : 0.5 * (steps[m / 2 - 1] + steps[m / 2]);
    }

    private static String unquote(String s) {
        if (s.length() >= 2 && (s.startsWith("\"") && s.endsWith("\"") || s.startsWith("'") && s.endsWith("'"))) {
            return s.substring(1, s.length() - 1).strip();
        }
        return s;
    }

    private static String fmt(double x) {
        return String.format(Locale.ROOT, "%.6g", x);
    }

    /** A growable array of doubles. */
    private static final class DoubleBuffer {
        private double[] data = new double[1024];
        private int size;

        void add(double x) {
            if (size == data.length) {
                data = Arrays.copyOf(data, data.length * 2);
            }
            data[size++] = x;
        }

        double[] toArray() {
            return Arrays.copyOf(data, size);
        }
    }

    /** A growable array of ints. */
    private static final class IntBuffer {
        private int[] data = new int[1024];
        private int size;

        void add(int x) {
            if (size == data.length) {
                data = Arrays.copyOf(data, data.length * 2);
            }
            data[size++] = x;
        }

        int get(int i) {
            return data[i];
        }

        int size() {
            return size;
        }

        int[] toArray() {
            return Arrays.copyOf(data, size);
        }
    }
}
