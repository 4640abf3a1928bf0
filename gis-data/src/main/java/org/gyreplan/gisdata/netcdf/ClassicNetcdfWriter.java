package org.gyreplan.gisdata.netcdf;

import java.io.Closeable;
import java.io.IOException;
import java.nio.ByteBuffer;
import java.nio.ByteOrder;
import java.nio.channels.FileChannel;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.nio.file.StandardOpenOption;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * Writer of the netCDF 64-bit offset format (CDF-2), after the published "NetCDF Classic and 64-bit Offset File
 * Format" specification. First declare the schema (dimensions, variables with attributes, global attributes),
 * including the number of records of the unlimited dimension; then {@link #open(Path)} writes the header and
 * returns an {@link Output} that writes hyperslabs at their final positions (positional writes, so memory stays
 * bounded by the slab being written).
 *
 * <pre>{@code
 * ClassicNetcdfWriter w = new ClassicNetcdfWriter();
 * w.recordDimension("time", nt).dimension("lat", ny).dimension("lon", nx);
 * w.variable("u", DataType.FLOAT, "time", "lat", "lon").text("units", "m s-1");
 * AtomicWrite.toFile(target, tmp -> { try (var out = w.open(tmp)) { out.write("u", start, count, values); } });
 * }</pre>
 *
 * <p>NaN values are written as the variable's {@code _FillValue} when it has one (else as the netCDF default fill
 * value for integer types, and as NaN for floating types). Numbers are rounded to the nearest value for integer types.
 * Only the classic types (BYTE, CHAR, SHORT, INT, FLOAT, DOUBLE) can be written.
 */
public final class ClassicNetcdfWriter {
    private final Map<String, Integer> dimIndex = new LinkedHashMap<>();
    private final List<String> dimNames = new ArrayList<>();
    private final List<Integer> dimLens = new ArrayList<>();
    private int recDim = -1;
    private int numRecords;
    private final List<Attribute> globals = new ArrayList<>();
    private final List<VariableDef> vars = new ArrayList<>();

    /** Adds a fixed-size dimension. */
    public ClassicNetcdfWriter dimension(String name, int length) {
        if (length < 1) throw new IllegalArgumentException("dimension '" + name + "' must have length ≥ 1, got " + length);
        addDim(name, length);
        return this;
    }

    /** Adds the unlimited (record) dimension with the number of records that will be written. */
    public ClassicNetcdfWriter recordDimension(String name, int records) {
        if (recDim >= 0) throw new IllegalStateException("only one unlimited dimension is allowed");
        if (records < 0) throw new IllegalArgumentException("negative record count");
        recDim = dimNames.size();
        numRecords = records;
        addDim(name, 0);
        return this;
    }

    private void addDim(String name, int len) {
        if (dimIndex.containsKey(name)) throw new IllegalArgumentException("duplicate dimension '" + name + "'");
        dimIndex.put(name, dimNames.size());
        dimNames.add(name);
        dimLens.add(len);
    }

    /** Adds a global text attribute. */
    public ClassicNetcdfWriter globalText(String name, String value) {
        globals.add(Attribute.text(name, value));
        return this;
    }

    /** Adds a global attribute. */
    public ClassicNetcdfWriter global(Attribute a) {
        globals.add(a);
        return this;
    }

    /** Declares a variable over the named dimensions (record dimension first if used). */
    public VariableDef variable(String name, DataType type, String... dims) {
        if (type.code() > 6) throw new IllegalArgumentException("variable '" + name + "': type " + type + " cannot be stored in the classic format");
        for (VariableDef v : vars) if (v.name.equals(name)) throw new IllegalArgumentException("duplicate variable '" + name + "'");
        int[] ids = new int[dims.length];
        for (int i = 0; i < dims.length; i++) {
            Integer id = dimIndex.get(dims[i]);
            if (id == null) throw new IllegalArgumentException("variable '" + name + "': unknown dimension '" + dims[i] + "'");
            if (id == recDim && i != 0) throw new IllegalArgumentException("variable '" + name + "': the unlimited dimension must come first");
            ids[i] = id;
        }
        VariableDef v = new VariableDef(name, type, ids);
        vars.add(v);
        return v;
    }

    /** A declared variable; add attributes with the chaining methods. */
    public static final class VariableDef {
        final String name;
        final DataType type;
        final int[] dims;
        final List<Attribute> atts = new ArrayList<>();
        long begin;
        long sliceBytes;
        boolean isRecord;
        int[] shape;

        VariableDef(String name, DataType type, int[] dims) {
            this.name = name;
            this.type = type;
            this.dims = dims;
        }

        /** Adds a text attribute. */
        public VariableDef text(String att, String value) {
            atts.add(Attribute.text(att, value));
            return this;
        }

        /** Adds a numeric attribute of the given type. */
        public VariableDef numbers(String att, DataType t, double... values) {
            atts.add(Attribute.numbers(att, t, values));
            return this;
        }

        /** Adds a numeric attribute of the variable's own type (as CF requires for _FillValue, valid_range...). */
        public VariableDef sameType(String att, double... values) {
            return numbers(att, type, values);
        }

        double fill() {
            for (Attribute a : atts) if (a.name().equals("_FillValue")) return a.number(0);
            return type == DataType.FLOAT || type == DataType.DOUBLE ? Double.NaN : type.defaultFill();
        }
    }

    private static long pad4(long n) { return (n + 3) & ~3L; }

    private long headerSize() {
        long s = 4 + 4; // magic, numrecs
        s += 8;
        for (String d : dimNames) s += nameSize(d) + 4;
        s += attsSize(globals);
        s += 8;
        for (VariableDef v : vars) s += nameSize(v.name) + 4 + 4L * v.dims.length + attsSize(v.atts) + 4 + 4 + 8;
        return s;
    }

    private static long nameSize(String n) { return 4 + pad4(n.getBytes(StandardCharsets.UTF_8).length); }

    private static long attsSize(List<Attribute> atts) {
        long s = 8;
        for (Attribute a : atts) {
            long bytes = a.isText() ? a.text().getBytes(StandardCharsets.UTF_8).length : (long) a.numbers().length * a.type().size();
            s += nameSize(a.name()) + 4 + 4 + pad4(bytes);
        }
        return s;
    }

    /** Writes the header to a new file and returns the output for the data. */
    public Output open(Path file) throws IOException {
        long offset = headerSize();
        long recSize = 0;
        int nRec = 0;
        for (VariableDef v : vars) {
            v.isRecord = v.dims.length > 0 && v.dims[0] == recDim;
            v.shape = new int[v.dims.length];
            long bytes = v.type.size();
            for (int d = 0; d < v.dims.length; d++) {
                v.shape[d] = v.dims[d] == recDim ? numRecords : dimLens.get(v.dims[d]);
                if (!(v.isRecord && d == 0)) bytes *= v.shape[d];
            }
            v.sliceBytes = bytes;
            if (v.isRecord) nRec++;
        }
        for (VariableDef v : vars) {
            if (!v.isRecord) {
                v.begin = offset;
                offset += pad4(v.sliceBytes);
            }
        }
        for (VariableDef v : vars) {
            if (v.isRecord) {
                v.begin = offset + recSize;
                recSize += nRec == 1 ? v.sliceBytes : pad4(v.sliceBytes);
            }
        }
        ByteBuffer h = ByteBuffer.allocate((int) headerSize()).order(ByteOrder.BIG_ENDIAN);
        h.put(new byte[] {'C', 'D', 'F', 2});
        h.putInt(numRecords);
        if (dimNames.isEmpty()) { h.putInt(0).putInt(0); } else {
            h.putInt(0x0A).putInt(dimNames.size());
            for (int i = 0; i < dimNames.size(); i++) { putName(h, dimNames.get(i)); h.putInt(dimLens.get(i)); }
        }
        putAtts(h, globals);
        if (vars.isEmpty()) { h.putInt(0).putInt(0); } else {
            h.putInt(0x0B).putInt(vars.size());
            for (VariableDef v : vars) {
                putName(h, v.name);
                h.putInt(v.dims.length);
                for (int id : v.dims) h.putInt(id);
                putAtts(h, v.atts);
                h.putInt(v.type.code());
                long vsize = pad4(v.sliceBytes);
                h.putInt(vsize > 0xFFFFFFFFL - 4 ? -1 : (int) vsize);
                h.putLong(v.begin);
            }
        }
        if (h.hasRemaining()) throw new IllegalStateException("header size mismatch");
        h.flip();
        FileChannel ch = FileChannel.open(file, StandardOpenOption.CREATE, StandardOpenOption.WRITE,
                StandardOpenOption.TRUNCATE_EXISTING);
        try {
            long p = 0;
            while (h.hasRemaining()) p += ch.write(h, p);
            long end = offset + numRecords * recSize;
            if (end > p) { // make the file its full length even if some values are never written
                ch.write(ByteBuffer.allocate(1), end - 1);
            }
        } catch (IOException e) {
            ch.close();
            throw e;
        }
        return new Output(file, ch, recSize);
    }

    private static void putName(ByteBuffer h, String n) {
        byte[] b = n.getBytes(StandardCharsets.UTF_8);
        h.putInt(b.length).put(b);
        for (long i = b.length; i < pad4(b.length); i++) h.put((byte) 0);
    }

    private static void putAtts(ByteBuffer h, List<Attribute> atts) {
        if (atts.isEmpty()) { h.putInt(0).putInt(0); return; }
        h.putInt(0x0C).putInt(atts.size());
        for (Attribute a : atts) {
            putName(h, a.name());
            if (a.isText()) {
                byte[] b = a.text().getBytes(StandardCharsets.UTF_8);
                h.putInt(DataType.CHAR.code()).putInt(b.length).put(b);
                for (long i = b.length; i < pad4(b.length); i++) h.put((byte) 0);
            } else {
                DataType t = a.type();
                h.putInt(t.code()).putInt(a.numbers().length);
                for (double v : a.numbers()) put(h, t, v);
                long bytes = (long) a.numbers().length * t.size();
                for (long i = bytes; i < pad4(bytes); i++) h.put((byte) 0);
            }
        }
    }

    private static void put(ByteBuffer b, DataType t, double v) {
        switch (t) {
            case BYTE, CHAR -> b.put((byte) Math.round(v));
            case SHORT -> b.putShort((short) Math.round(v));
            case INT -> b.putInt((int) Math.round(v));
            case FLOAT -> b.putFloat((float) v);
            case DOUBLE -> b.putDouble(v);
            default -> throw new IllegalStateException(t.toString());
        }
    }

    /** The open data section of a file being written. Not thread-safe. */
    public final class Output implements Closeable {
        private final Path file;
        private final FileChannel ch;
        private final long recSize;
        private ByteBuffer buf = ByteBuffer.allocate(1 << 16).order(ByteOrder.BIG_ENDIAN);

        Output(Path file, FileChannel ch, long recSize) {
            this.file = file;
            this.ch = ch;
            this.recSize = recSize;
        }

        private VariableDef def(String name) {
            for (VariableDef v : vars) if (v.name.equals(name)) return v;
            throw new IllegalArgumentException(file + ": no variable '" + name + "' declared");
        }

        /** Writes all values of a variable (row-major). */
        public void write(String var, double[] values) throws IOException {
            VariableDef v = def(var);
            write(var, new int[v.shape.length], v.shape.clone(), values);
        }

        /** Writes a hyperslab from {@code values} (row-major, length = product of count). */
        public void write(String var, int[] start, int[] count, double[] values) throws IOException {
            VariableDef v = def(var);
            int rank = v.shape.length;
            if (start.length != rank || count.length != rank) throw new IllegalArgumentException("variable '" + var + "': rank mismatch");
            long total = 1;
            for (int d = 0; d < rank; d++) {
                if (start[d] < 0 || count[d] < 0 || start[d] + count[d] > v.shape[d]) {
                    throw new IndexOutOfBoundsException("variable '" + var + "': slab exceeds dimension " + d);
                }
                total *= count[d];
            }
            if (total != values.length) throw new IllegalArgumentException("variable '" + var + "': " + values.length + " values for a slab of " + total);
            if (total == 0) return;
            double fill = v.fill();
            int es = v.type.size();
            int first = v.isRecord ? 1 : 0;
            long[] stride = new long[rank];
            long s = 1;
            for (int d = rank - 1; d >= first; d--) { stride[d] = s; s *= v.shape[d]; }
            // innermost run: last dimension only (simple and sufficient; rows are long)
            int last = rank - 1;
            int run = rank == 0 ? 1 : count[last];
            if (v.isRecord && rank == 1) run = 1;
            int[] idx = new int[Math.max(rank - 1, 0)];
            long runs = total / run;
            int pos = 0;
            for (long r = 0; r < runs; r++) {
                long off = 0, rec = 0;
                for (int d = 0; d < rank; d++) {
                    int i = start[d] + (d < idx.length ? idx[d] : 0);
                    if (v.isRecord && d == 0) rec = (rank == 1) ? start[0] + r : i;
                    else off += (long) i * stride[d];
                }
                long byteOff = v.begin + rec * recSize + off * es;
                int bytes = run * es;
                if (buf.capacity() < bytes) buf = ByteBuffer.allocate(bytes).order(ByteOrder.BIG_ENDIAN);
                buf.clear();
                for (int k = 0; k < run; k++) {
                    double x = values[pos++];
                    put(buf, v.type, Double.isNaN(x) ? fill : x);
                }
                buf.flip();
                long p = byteOff;
                while (buf.hasRemaining()) p += ch.write(buf, p);
                for (int d = idx.length - 1; d >= 0; d--) {
                    if (++idx[d] < count[d]) break;
                    idx[d] = 0;
                }
            }
        }

        /** Writes strings into a CHAR variable whose last dimension is the string length (zero-padded). */
        public void writeStrings(String var, String[] strings) throws IOException {
            VariableDef v = def(var);
            if (v.type != DataType.CHAR || v.shape.length != 2) {
                throw new IllegalArgumentException("variable '" + var + "' must be CHAR with 2 dimensions");
            }
            int n = v.shape[0], len = v.shape[1];
            if (strings.length != n) throw new IllegalArgumentException("variable '" + var + "': " + strings.length + " strings for " + n);
            double[] vals = new double[n * len];
            for (int i = 0; i < n; i++) {
                byte[] b = strings[i].getBytes(StandardCharsets.UTF_8);
                if (b.length > len) throw new IllegalArgumentException("variable '" + var + "': '" + strings[i] + "' longer than " + len + " bytes");
                for (int c = 0; c < b.length; c++) vals[i * len + c] = b[c];
            }
            write(var, vals);
        }

        @Override
        public void close() throws IOException { ch.close(); }
    }
}
