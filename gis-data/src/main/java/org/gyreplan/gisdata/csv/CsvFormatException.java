package org.gyreplan.gisdata.csv;

import java.io.IOException;
import java.nio.file.Path;

/**
 * A CSV input that cannot be used, with a {@link Problem} key, the file, the line (1-based, 0 when not about one
 * line) and the column title (or {@code null}). The message reads e.g.
 * {@code station.csv, line 14, column "speed [kn]": "12,5" is not a number}.
 */
public final class CsvFormatException extends IOException {
    private static final long serialVersionUID = 1L;

    /** What went wrong. */
    public enum Problem {
        /** The text is not CSV (e.g. an unclosed quote) or has no header. */
        UNREADABLE,
        /** A needed column is absent. */
        MISSING_COLUMN,
        /** Several columns could serve the same purpose; name the one to use. */
        AMBIGUOUS_COLUMNS,
        /** A unit is missing, unknown or not one of the accepted units. */
        UNKNOWN_UNIT,
        /** A cell does not hold what its column needs (number, time, range). */
        BAD_VALUE,
        /** Times do not increase strictly. */
        TIME_NOT_INCREASING
    }

    private final Problem problem;
    private final transient Path file;
    private final int line;
    private final String column;

    public CsvFormatException(Problem problem, Path file, int line, String column, String detail) {
        super((file == null ? "CSV" : String.valueOf(file.getFileName()))
                + (line > 0 ? ", line " + line : "")
                + (column != null ? ", column \"" + column + "\"" : "") + ": " + detail);
        this.problem = problem;
        this.file = file;
        this.line = line;
        this.column = column;
    }

    /** The problem key. */
    public Problem problem() { return problem; }
    /** The file. */
    public Path file() { return file; }
    /** 1-based line number, or 0. */
    public int line() { return line; }
    /** Column title, or {@code null}. */
    public String column() { return column; }
}
