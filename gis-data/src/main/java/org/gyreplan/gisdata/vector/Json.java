package org.gyreplan.gisdata.vector;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * A small, strict JSON parser (RFC 8259) for the vector formats: objects become {@link LinkedHashMap} (key order
 * kept), arrays {@link List}, numbers {@link Double} (or {@link Long} when written without fraction or exponent
 * and in range), strings, {@link Boolean} and {@code null}. Errors name the line and column.
 */
public final class Json {
    private final String s;
    private int pos;

    private Json(String s) { this.s = s; }

    /** Parses one JSON value that must fill the whole text (whitespace aside). */
    public static Object parse(String text) {
        Json p = new Json(text);
        p.ws();
        Object v = p.value();
        p.ws();
        if (p.pos != text.length()) throw p.error("unexpected text after the JSON value");
        return v;
    }

    private IllegalArgumentException error(String what) {
        int line = 1, col = 1;
        for (int k = 0; k < Math.min(pos, s.length()); k++) {
            if (s.charAt(k) == '\n') { line++; col = 1; } else col++;
        }
        return new IllegalArgumentException("invalid JSON at line " + line + ", column " + col + ": " + what);
    }

    private void ws() {
        while (pos < s.length()) {
            char c = s.charAt(pos);
            if (c == ' ' || c == '\t' || c == '\n' || c == '\r' || c == '\uFEFF') pos++; else break;
        }
    }

    private Object value() {
        if (pos >= s.length()) throw error("unexpected end of text");
        char c = s.charAt(pos);
        switch (c) {
            case '{': return object();
            case '[': return array();
            case '"': return string();
            case 't': literal("true"); return Boolean.TRUE;
            case 'f': literal("false"); return Boolean.FALSE;
            case 'n': literal("null"); return null;
            default:
                if (c == '-' || (c >= '0' && c <= '9')) return number();
                throw error("unexpected character '" + c + "'");
        }
    }

    private void literal(String word) {
        if (!s.startsWith(word, pos)) throw error("expected " + word);
        pos += word.length();
    }

    private Map<String, Object> object() {
        Map<String, Object> m = new LinkedHashMap<>();
        pos++;
        ws();
        if (pos < s.length() && s.charAt(pos) == '}') { pos++; return m; }
        while (true) {
            ws();
            if (pos >= s.length() || s.charAt(pos) != '"') throw error("expected a member name in quotes");
            String key = string();
            ws();
            if (pos >= s.length() || s.charAt(pos) != ':') throw error("expected ':' after member name \"" + key + "\"");
            pos++;
            ws();
            m.put(key, value());
            ws();
            if (pos >= s.length()) throw error("unterminated object");
            char c = s.charAt(pos++);
            if (c == '}') return m;
            if (c != ',') { pos--; throw error("expected ',' or '}' in object"); }
        }
    }

    private List<Object> array() {
        List<Object> a = new ArrayList<>();
        pos++;
        ws();
        if (pos < s.length() && s.charAt(pos) == ']') { pos++; return a; }
        while (true) {
            ws();
            a.add(value());
            ws();
            if (pos >= s.length()) throw error("unterminated array");
            char c = s.charAt(pos++);
            if (c == ']') return a;
            if (c != ',') { pos--; throw error("expected ',' or ']' in array"); }
        }
    }

    private String string() {
        pos++;
        StringBuilder b = new StringBuilder();
        while (true) {
            if (pos >= s.length()) throw error("unterminated string");
            char c = s.charAt(pos++);
            if (c == '"') return b.toString();
            if (c == '\\') {
                if (pos >= s.length()) throw error("unterminated escape");
                char e = s.charAt(pos++);
                switch (e) {
                    case '"': b.append('"'); break;
                    case '\\': b.append('\\'); break;
                    case '/': b.append('/'); break;
                    case 'b': b.append('\b'); break;
                    case 'f': b.append('\f'); break;
                    case 'n': b.append('\n'); break;
                    case 'r': b.append('\r'); break;
                    case 't': b.append('\t'); break;
                    case 'u':
                        if (pos + 4 > s.length()) throw error("short \\u escape");
                        try {
                            b.append((char) Integer.parseInt(s.substring(pos, pos + 4), 16));
                        } catch (NumberFormatException ex) {
                            throw error("bad \\u escape");
                        }
                        pos += 4;
                        break;
                    default: pos--; throw error("bad escape \\" + e);
                }
            } else if (c < 0x20) {
                pos--;
                throw error("control character in string");
            } else {
                b.append(c);
            }
        }
    }

    private Object number() {
        int start = pos;
        boolean integral = true;
        if (s.charAt(pos) == '-') pos++;
        while (pos < s.length()) {
            char c = s.charAt(pos);
            if (c >= '0' && c <= '9') pos++;
            else if (c == '.' || c == 'e' || c == 'E' || c == '+' || c == '-') { integral = false; pos++; }
            else break;
        }
        String t = s.substring(start, pos);
        try {
            if (integral && t.length() < 18) return Long.parseLong(t);
            return Double.parseDouble(t);
        } catch (NumberFormatException e) {
            pos = start;
            throw error("bad number '" + t + "'");
        }
    }

    /** Appends a JSON string literal (with quotes and escapes) to the builder. */
    public static void quote(StringBuilder b, String text) {
        b.append('"');
        for (int k = 0; k < text.length(); k++) {
            char c = text.charAt(k);
            switch (c) {
                case '"': b.append("\\\""); break;
                case '\\': b.append("\\\\"); break;
                case '\n': b.append("\\n"); break;
                case '\r': b.append("\\r"); break;
                case '\t': b.append("\\t"); break;
                default:
                    if (c < 0x20) b.append(String.format("\\u%04x", (int) c)); else b.append(c);
            }
        }
        b.append('"');
    }
}
