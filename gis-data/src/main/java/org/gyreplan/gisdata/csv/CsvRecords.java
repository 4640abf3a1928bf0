package org.gyreplan.gisdata.csv;

import java.util.ArrayList;
import java.util.List;

/**
 * Splits CSV text into records after RFC 4180: fields separated by a delimiter (comma, semicolon or tab),
 * optionally quoted with {@code "} (a doubled quote inside is one quote; quoted fields may span lines). Each record
 * remembers the line number (1-based) where it starts, for error messages. A leading UTF-8 byte-order mark is
 * ignored.
 */
public final class CsvRecords {
    private CsvRecords() {}

    /** One record and the line it starts on. */
    public record Line(int lineNumber, List<String> fields) {}

    /** Parses the text; throws {@link IllegalArgumentException} naming the line of an unterminated quote. */
    public static List<Line> parse(String text, char delimiter) {
        List<Line> out = new ArrayList<>();
        int pos = text.startsWith("\uFEFF") ? 1 : 0;
        int line = 1;
        int n = text.length();
        while (pos < n) {
            int startLine = line;
            List<String> fields = new ArrayList<>();
            StringBuilder f = new StringBuilder();
            boolean quoted = false, wasQuoted = false;
            boolean endOfRecord = false;
            while (pos < n && !endOfRecord) {
                char c = text.charAt(pos);
                if (quoted) {
                    if (c == '"') {
                        if (pos + 1 < n && text.charAt(pos + 1) == '"') { f.append('"'); pos += 2; continue; }
                        quoted = false;
                        pos++;
                        continue;
                    }
                    if (c == '\n') line++;
                    f.append(c);
                    pos++;
                    continue;
                }
                if (c == '"' && f.toString().isBlank() && !wasQuoted) {
                    quoted = true;
                    wasQuoted = true;
                    f.setLength(0);
                    pos++;
                } else if (c == delimiter) {
                    fields.add(wasQuoted ? f.toString() : f.toString().trim());
                    f.setLength(0);
                    wasQuoted = false;
                    pos++;
                } else if (c == '\r' || c == '\n') {
                    if (c == '\r' && pos + 1 < n && text.charAt(pos + 1) == '\n') pos++;
                    pos++;
                    line++;
                    endOfRecord = true;
                } else {
                    f.append(c);
                    pos++;
                }
            }
            if (quoted) throw new IllegalArgumentException("line " + startLine + ": a quoted field is not closed");
            fields.add(wasQuoted ? f.toString() : f.toString().trim());
            boolean blank = fields.size() == 1 && fields.get(0).isEmpty();
            if (!blank) out.add(new Line(startLine, fields));
        }
        return out;
    }

    /** The delimiter of a header line: the most frequent of comma, semicolon and tab outside quotes (comma on ties). */
    public static char sniffDelimiter(String headerLine) {
        int comma = 0, semi = 0, tab = 0;
        boolean q = false;
        for (char c : headerLine.toCharArray()) {
            if (c == '"') q = !q;
            else if (!q && c == ',') comma++;
            else if (!q && c == ';') semi++;
            else if (!q && c == '\t') tab++;
        }
        if (semi > comma && semi >= tab) return ';';
        if (tab > comma && tab > semi) return '\t';
        return ',';
    }
}
