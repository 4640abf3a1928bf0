package org.gyreplan.gisdata.netcdf;

import java.util.Arrays;
import java.util.Objects;

/**
 * A netCDF attribute: either text or a vector of numbers (stored widened to {@code double}, which is exact
 * for every classic type; 64-bit integers beyond 2⁵³ lose precision).
 *
 * @param name    attribute name
 * @param type    stored type
 * @param text    the text for CHAR/STRING attributes, else {@code null}
 * @param numbers the values for numeric attributes, else {@code null}
 */
public record Attribute(String name, DataType type, String text, double[] numbers) {
    public Attribute {
        Objects.requireNonNull(name, "name");
        Objects.requireNonNull(type, "type");
        if ((text == null) == (numbers == null)) {
            throw new IllegalArgumentException("attribute '" + name + "' needs exactly one of text or numbers");
        }
    }

    /** A text attribute. */
    public static Attribute text(String name, String value) {
        return new Attribute(name, DataType.CHAR, value, null);
    }

    /** A numeric attribute of the given type. */
    public static Attribute numbers(String name, DataType type, double... values) {
        if (!type.isNumeric()) throw new IllegalArgumentException("attribute '" + name + "': type " + type + " is not numeric");
        return new Attribute(name, type, null, values.clone());
    }

    public boolean isText() { return text != null; }

    /** The i-th number; NaN for text attributes or out of range. */
    public double number(int i) {
        return numbers != null && i < numbers.length ? numbers[i] : Double.NaN;
    }

    /** Number of values (characters for text). */
    public int length() { return text != null ? text.length() : numbers.length; }

    /** The value as text (numbers joined by ", "). */
    public String asText() {
        if (text != null) return text;
        StringBuilder b = new StringBuilder();
        for (int i = 0; i < numbers.length; i++) {
            if (i > 0) b.append(", ");
            double v = numbers[i];
            if (type == DataType.FLOAT) b.append((float) v);
            else if (v == Math.rint(v) && Math.abs(v) < 1e15 && type != DataType.DOUBLE) b.append((long) v);
            else b.append(v);
        }
        return b.toString();
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof Attribute a && a.name.equals(name) && a.type == type && Objects.equals(a.text, text)
                && Arrays.equals(a.numbers, numbers);
    }

    @Override
    public int hashCode() { return Objects.hash(name, type, text, Arrays.hashCode(numbers)); }

    @Override
    public String toString() { return name + " = " + (isText() ? "\"" + text + "\"" : asText()); }
}
