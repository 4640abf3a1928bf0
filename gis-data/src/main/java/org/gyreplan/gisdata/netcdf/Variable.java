package org.gyreplan.gisdata.netcdf;

import java.io.IOException;
import java.util.List;

/**
 * A variable of a {@link NetcdfDataset}: name, type, dimensions, attributes and hyperslab reads.
 *
 * <p>Reads return the raw stored numbers widened to {@code double} (no fill-value or packing treatment), in
 * row-major order of the requested hyperslab (last dimension fastest).
 */
public interface Variable {
    /** Variable name as in the file. */
    String name();

    /** Stored type. */
    DataType dataType();

    /** Dimensions, slowest-varying first. */
    List<Dimension> dimensions();

    /** Attributes in file order. */
    List<Attribute> attributes();

    /** Current shape (lengths of {@link #dimensions()}). */
    default int[] shape() {
        List<Dimension> d = dimensions();
        int[] s = new int[d.size()];
        for (int i = 0; i < s.length; i++) s[i] = d.get(i).length();
        return s;
    }

    /** Number of dimensions. */
    default int rank() { return dimensions().size(); }

    /** Total number of values. */
    default long size() {
        long n = 1;
        for (int s : shape()) n *= s;
        return n;
    }

    /** Names of the dimensions, slowest first. */
    default List<String> dimensionNames() {
        return dimensions().stream().map(Dimension::name).toList();
    }

    /** The attribute of that name, or {@code null}. */
    default Attribute attribute(String attName) {
        for (Attribute a : attributes()) if (a.name().equals(attName)) return a;
        return null;
    }

    /** The text of an attribute, or {@code null} if absent or numeric. */
    default String textAttribute(String attName) {
        Attribute a = attribute(attName);
        return a != null && a.isText() ? a.text() : null;
    }

    /**
     * Reads a hyperslab into {@code dst[dstOffset …]}.
     *
     * @param start first index in each dimension
     * @param count number of values in each dimension
     */
    void read(int[] start, int[] count, double[] dst, int dstOffset) throws IOException;

    /** Reads a hyperslab into a new array. */
    default double[] read(int[] start, int[] count) throws IOException {
        long n = 1;
        for (int c : count) n *= c;
        if (n > Integer.MAX_VALUE - 8) {
            throw new IOException("variable '" + name() + "': hyperslab of " + n + " values is too large for one array");
        }
        double[] dst = new double[(int) n];
        read(start, count, dst, 0);
        return dst;
    }

    /** Reads all values. */
    default double[] readAll() throws IOException {
        int[] shape = shape();
        return read(new int[shape.length], shape);
    }

    /**
     * Reads a CHAR variable as strings along its last dimension (trailing NULs and blanks removed), or a STRING
     * variable as is.
     */
    String[] readStrings() throws IOException;

    /** Checks a hyperslab request against the shape; throws with a clear message naming the variable. */
    default void checkSlab(int[] start, int[] count) {
        int[] shape = shape();
        if (start.length != shape.length || count.length != shape.length) {
            throw new IllegalArgumentException("variable '" + name() + "' has rank " + shape.length
                    + ", request has rank " + start.length + "/" + count.length);
        }
        for (int d = 0; d < shape.length; d++) {
            if (start[d] < 0 || count[d] < 0 || (long) start[d] + count[d] > shape[d]) {
                throw new IndexOutOfBoundsException("variable '" + name() + "', dimension '"
                        + dimensions().get(d).name() + "': start " + start[d] + " + count " + count[d]
                        + " exceeds length " + shape[d]);
            }
        }
    }
}
