package org.eddycast.measure;

/**
 * A velocity record that cannot be read or analysed as it stands. The message names the line (and column,
 * where one is at fault), what was found and what would be valid.
 *
 * <p>{@link #getLine()} is the 1-based line number in the record file, or 0 when the problem is not tied to
 * one line (the file could not be opened, for example). {@link #getColumn()} is the 1-based column number,
 * or 0 when no single column is at fault.
 */
public class RecordFormatException extends IllegalArgumentException {

    private static final long serialVersionUID = 1L;

    private final int line;
    private final int column;

    /**
     * @param line    1-based line number, 0 when not tied to a line
     * @param column  1-based column number, 0 when not tied to a column
     * @param message what is wrong and what would be valid (the line and column are prefixed here)
     */
    public RecordFormatException(int line, int column, String message) {
        super(prefix(line, column) + message);
        this.line = line;
        this.column = column;
    }

    /** The 1-based line number of the offending line, or 0 when the problem is not tied to one line. */
    public int getLine() {
        return line;
    }

    /** The 1-based column number of the offending column, or 0 when no single column is at fault. */
    public int getColumn() {
        return column;
    }

    private static String prefix(int line, int column) {
        if (line <= 0) {
            return "";
        }
        return column > 0 ? "line " + line + ", column " + column + ": " : "line " + line + ": ";
    }
}
