package org.gyreplan.gisdata.csv;

import org.gyreplan.gisdata.io.AtomicWrite;
import org.gyreplan.gisdata.vector.VectorText;

import java.io.IOException;
import java.nio.file.Path;
import java.time.Instant;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Objects;

/**
 * A table written as CSV after RFC 4180 (Shafranovich 2005): UTF-8 without byte-order mark, CRLF line ends, a
 * header row, fields quoted with {@code "} when they hold a comma, quote, CR or LF (quotes doubled). Column names
 * carry their unit in brackets, e.g. {@code upwelling_index [m3 s-1 per 100 m]}, or in the name itself
 * ({@code index_m3_s_per_100m}). Numbers are written in the shortest form that reads back as the same double
 * (Java's {@code Double.toString} algorithm), without exponent for ordinary magnitudes; NaN and {@code null} are
 * empty cells; instants are ISO 8601 UTC.
 *
 * <pre>
 *   CsvTable t = new CsvTable(List.of(CsvTable.column("time", null), CsvTable.column("index", "m3 s-1 per 100 m")));
 *   t.add(Instant.parse("2026-01-01T00:00:00Z"), 12.5);
 *   t.write(Path.of("index.csv"));
 * </pre>
 */
public final class CsvTable {
    private final List<String> header;
    private final List<Object[]> rows = new ArrayList<>();

    /** A column title: {@code name [unit]}, or just {@code name} when the unit is null or blank. */
    public static String column(String name, String unit) {
        Objects.requireNonNull(name, "name");
        return unit == null || unit.isBlank() ? name : name + " [" + unit + "]";
    }

    /** A table with these column titles (use {@link #column} to add units). */
    public CsvTable(List<String> header) {
        if (header.isEmpty()) throw new IllegalArgumentException("a CSV table needs at least one column");
        this.header = List.copyOf(header);
    }

    /** Column titles. */
    public List<String> header() { return header; }

    /** Number of data rows. */
    public int rowCount() { return rows.size(); }

    /** Adds a row; values are String, Number, Boolean, Instant, other (toString) or null. */
    public CsvTable add(Object... values) {
        if (values.length != header.size()) {
            throw new IllegalArgumentException("row has " + values.length + " values, the table has " + header.size()
                    + " columns " + header);
        }
        rows.add(values.clone());
        return this;
    }

    /** Writes the table atomically. */
    public void write(Path target) throws IOException {
        AtomicWrite.writeString(target, toText());
    }

    /** The CSV text. */
    public String toText() {
        StringBuilder b = new StringBuilder(64 * (rows.size() + 1));
        line(b, header.toArray());
        for (Object[] r : rows) line(b, r);
        return b.toString();
    }

    private static void line(StringBuilder b, Object[] values) {
        for (int k = 0; k < values.length; k++) {
            if (k > 0) b.append(',');
            b.append(field(values[k]));
        }
        b.append("\r\n");
    }

    /** The CSV field text of one value (quoted if needed). */
    public static String field(Object v) {
        String t;
        if (v == null) t = "";
        else if (v instanceof Double || v instanceof Float) {
            double d = ((Number) v).doubleValue();
            t = Double.isFinite(d) ? VectorText.number(d) : "";
        } else if (v instanceof Instant) t = v.toString();
        else t = String.valueOf(v);
        if (t.indexOf(',') >= 0 || t.indexOf('"') >= 0 || t.indexOf('\n') >= 0 || t.indexOf('\r') >= 0) {
            return '"' + t.replace("\"", "\"\"") + '"';
        }
        return t;
    }

    @Override
    public String toString() {
        return "CsvTable" + Arrays.toString(header.toArray()) + " with " + rows.size() + " rows";
    }
}
