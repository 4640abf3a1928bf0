package org.gyreplan.gisdata.netcdf;

import java.io.IOException;
import java.nio.BufferUnderflowException;
import java.nio.ByteBuffer;
import java.nio.ByteOrder;
import java.nio.channels.FileChannel;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.nio.file.StandardOpenOption;
import java.util.ArrayList;
import java.util.Collections;
import java.util.List;

/**
 * Reader of the netCDF classic (CDF-1) and 64-bit offset (CDF-2) formats, after the published
 * "NetCDF Classic and 64-bit Offset File Format" specification (Unidata): a header of dimensions, attributes and
 * variables (each with its type, shape and byte offset), then the fixed-size variables, then the records of the
 * unlimited dimension, all big-endian.
 *
 * <p>Only the header is held in memory. Data are read with positional reads on one {@link FileChannel}; a
 * hyperslab is read as the fewest contiguous byte runs its shape allows (e.g. one read for a whole time step of a
 * (time, lat, lon) variable). Positional reads make concurrent reads from several threads safe.
 */
public final class ClassicNetcdfReader implements NetcdfDataset {
    private static final int NC_DIMENSION = 0x0A;
    /** Per-thread read buffer (reads stay thread-safe, no allocation per read). */
    private static final ThreadLocal<ByteBuffer> BUFFER =
            ThreadLocal.withInitial(() -> ByteBuffer.allocate(1 << 16).order(ByteOrder.BIG_ENDIAN));
    private static final int NC_VARIABLE = 0x0B;
    private static final int NC_ATTRIBUTE = 0x0C;

    private final Path path;
    private final FileChannel channel;
    private final NetcdfFormat format;
    private final List<Dimension> dimensions;
    private final List<Attribute> globals;
    private final List<Variable> variables;
    private final long recordSize;
    private final int numRecords;

    private ClassicNetcdfReader(Path path, FileChannel channel, NetcdfFormat format, List<Dimension> dimensions,
                                List<Attribute> globals, List<Variable> variables, long recordSize, int numRecords) {
        this.path = path;
        this.channel = channel;
        this.format = format;
        this.dimensions = dimensions;
        this.globals = globals;
        this.variables = variables;
        this.recordSize = recordSize;
        this.numRecords = numRecords;
    }

    /** Opens a CDF-1 or CDF-2 file; throws {@link NetcdfFormatException} naming the file if it is not one or is truncated. */
    public static ClassicNetcdfReader open(Path path) throws IOException {
        FileChannel ch = FileChannel.open(path, StandardOpenOption.READ);
        try {
            return parse(path, ch);
        } catch (IOException | RuntimeException e) {
            ch.close();
            throw e;
        }
    }

    private static ClassicNetcdfReader parse(Path path, FileChannel ch) throws IOException {
        long fileSize = ch.size();
        int bufSize = (int) Math.min(fileSize, 1 << 16);
        while (true) {
            ByteBuffer b = ByteBuffer.allocate(bufSize).order(ByteOrder.BIG_ENDIAN);
            readFully(ch, b, 0, path);
            b.flip();
            try {
                return parseHeader(path, ch, b, fileSize);
            } catch (BufferUnderflowException e) {
                if (bufSize >= fileSize) {
                    throw new NetcdfFormatException(path, "truncated netCDF classic header: the file ends after "
                            + fileSize + " bytes, inside the header (expected a complete header of dimensions, "
                            + "attributes and variables)");
                }
                bufSize = (int) Math.min(fileSize, Math.min((long) bufSize * 4, Integer.MAX_VALUE - 16));
            }
        }
    }

    private static ClassicNetcdfReader parseHeader(Path path, FileChannel ch, ByteBuffer b, long fileSize)
            throws IOException {
        if (b.remaining() < 4 || b.get() != 'C' || b.get() != 'D' || b.get() != 'F') {
            throw new NetcdfFormatException(path, "not a netCDF classic file: expected magic 'CDF\\001' or 'CDF\\002'");
        }
        int version = b.get();
        if (version != 1 && version != 2) {
            throw new NetcdfFormatException(path, "unsupported netCDF classic version " + version
                    + " (expected 1 = CDF-1 or 2 = 64-bit offset)");
        }
        NetcdfFormat format = version == 1 ? NetcdfFormat.CLASSIC : NetcdfFormat.OFFSET_64;
        int numrecsRaw = b.getInt();
        // dimensions
        List<String> dimNames = new ArrayList<>();
        List<Integer> dimLens = new ArrayList<>();
        int recDim = -1;
        int tag = b.getInt();
        int n = b.getInt();
        if (tag == NC_DIMENSION) {
            for (int i = 0; i < n; i++) {
                String name = readName(b, path);
                int len = b.getInt();
                if (len < 0) throw new NetcdfFormatException(path, "dimension '" + name + "' has negative length " + len);
                if (len == 0) {
                    if (recDim >= 0) throw new NetcdfFormatException(path, "more than one unlimited dimension");
                    recDim = i;
                }
                dimNames.add(name);
                dimLens.add(len);
            }
        } else if (tag != 0 || n != 0) {
            throw new NetcdfFormatException(path, "corrupt header: expected the dimension list tag (0x0A) or ABSENT, found 0x"
                    + Integer.toHexString(tag));
        }
        List<Attribute> globals = readAttributes(b, path, "global");
        // variables
        tag = b.getInt();
        n = b.getInt();
        if (tag != NC_VARIABLE && (tag != 0 || n != 0)) {
            throw new NetcdfFormatException(path, "corrupt header: expected the variable list tag (0x0B) or ABSENT, found 0x"
                    + Integer.toHexString(tag));
        }
        List<String> vNames = new ArrayList<>();
        List<int[]> vDims = new ArrayList<>();
        List<List<Attribute>> vAtts = new ArrayList<>();
        List<DataType> vTypes = new ArrayList<>();
        List<Long> vBegins = new ArrayList<>();
        for (int i = 0; i < n; i++) {
            String name = readName(b, path);
            int rank = b.getInt();
            if (rank < 0 || rank > 1024) throw new NetcdfFormatException(path, "variable '" + name + "': corrupt rank " + rank);
            int[] ids = new int[rank];
            for (int d = 0; d < rank; d++) {
                ids[d] = b.getInt();
                if (ids[d] < 0 || ids[d] >= dimNames.size()) {
                    throw new NetcdfFormatException(path, "variable '" + name + "' refers to dimension id " + ids[d]
                            + " but the file has " + dimNames.size() + " dimensions");
                }
            }
            List<Attribute> atts = readAttributes(b, path, "variable '" + name + "'");
            int code = b.getInt();
            DataType type = DataType.ofCode(code);
            if (type == null || code > 6) {
                throw new NetcdfFormatException(path, "variable '" + name + "' has type code " + code
                        + ", not one of the classic types 1..6");
            }
            b.getInt(); // vsize: recomputed below (it saturates for large variables)
            long begin = version == 1 ? (b.getInt() & 0xffffffffL) : b.getLong();
            vNames.add(name);
            vDims.add(ids);
            vAtts.add(atts);
            vTypes.add(type);
            vBegins.add(begin);
        }
        long headerEnd = b.position();
        // record structure
        long recSize = 0;
        int nRecVars = 0;
        long singleRecBytes = 0;
        for (int i = 0; i < vNames.size(); i++) {
            int[] ids = vDims.get(i);
            if (ids.length > 0 && ids[0] == recDim) {
                long bytes = vTypes.get(i).size();
                for (int d = 1; d < ids.length; d++) bytes *= dimLens.get(ids[d]);
                singleRecBytes = bytes;
                recSize += pad4(bytes);
                nRecVars++;
            }
        }
        if (nRecVars == 1) recSize = singleRecBytes; // one record variable: records are not padded
        int numRecs;
        if (numrecsRaw == -1) { // STREAMING: count complete records
            long firstRec = Long.MAX_VALUE;
            for (int i = 0; i < vNames.size(); i++) {
                int[] ids = vDims.get(i);
                if (ids.length > 0 && ids[0] == recDim) firstRec = Math.min(firstRec, vBegins.get(i));
            }
            numRecs = recSize == 0 || firstRec == Long.MAX_VALUE ? 0 : (int) ((fileSize - firstRec) / recSize);
        } else {
            numRecs = numrecsRaw;
        }
        if (numRecs < 0) throw new NetcdfFormatException(path, "corrupt header: negative number of records " + numRecs);
        List<Dimension> dims = new ArrayList<>();
        for (int i = 0; i < dimNames.size(); i++) {
            dims.add(new Dimension(dimNames.get(i), i == recDim ? numRecs : dimLens.get(i), i == recDim));
        }
        ClassicNetcdfReader reader = new ClassicNetcdfReader(path, ch, format, Collections.unmodifiableList(dims),
                Collections.unmodifiableList(globals), new ArrayList<>(), recSize, numRecs);
        for (int i = 0; i < vNames.size(); i++) {
            int[] ids = vDims.get(i);
            List<Dimension> vd = new ArrayList<>();
            for (int id : ids) vd.add(dims.get(id));
            boolean isRec = ids.length > 0 && ids[0] == recDim;
            ClassicVariable v = reader.new ClassicVariable(vNames.get(i), vTypes.get(i), List.copyOf(vd),
                    Collections.unmodifiableList(vAtts.get(i)), vBegins.get(i), isRec);
            // truncation check: the last byte this variable needs must be in the file
            long need;
            if (isRec) {
                need = numRecs == 0 ? 0 : v.begin + (numRecs - 1) * recSize + v.sliceBytes();
            } else {
                need = v.begin + v.sliceBytes();
            }
            if (v.begin < headerEnd && v.sliceBytes() > 0) {
                throw new NetcdfFormatException(path, "corrupt header: variable '" + v.name() + "' starts at byte "
                        + v.begin + ", inside the header (which ends at " + headerEnd + ")");
            }
            if (need > fileSize) {
                throw new NetcdfFormatException(path, "truncated file: variable '" + v.name() + "' needs "
                        + need + " bytes but the file has only " + fileSize
                        + " (expected a complete netCDF " + (version == 1 ? "classic" : "64-bit offset") + " file)");
            }
            reader.variables.add(v);
        }
        return reader;
    }

    private static long pad4(long n) { return (n + 3) & ~3L; }

    private static String readName(ByteBuffer b, Path path) throws NetcdfFormatException {
        int len = b.getInt();
        if (len < 0 || len > 1 << 20) throw new NetcdfFormatException(path, "corrupt header: name length " + len);
        byte[] s = new byte[len];
        b.get(s);
        b.position(b.position() + (int) (pad4(len) - len));
        return new String(s, StandardCharsets.UTF_8);
    }

    private static List<Attribute> readAttributes(ByteBuffer b, Path path, String owner) throws NetcdfFormatException {
        int tag = b.getInt();
        int n = b.getInt();
        List<Attribute> list = new ArrayList<>();
        if (tag == 0 && n == 0) return list;
        if (tag != NC_ATTRIBUTE) {
            throw new NetcdfFormatException(path, "corrupt header: expected the attribute list tag (0x0C) of the "
                    + owner + " attributes, found 0x" + Integer.toHexString(tag));
        }
        for (int i = 0; i < n; i++) {
            String name = readName(b, path);
            int code = b.getInt();
            DataType type = DataType.ofCode(code);
            int count = b.getInt();
            if (type == null || code > 6 || count < 0) {
                throw new NetcdfFormatException(path, "corrupt header: " + owner + " attribute '" + name
                        + "' has type code " + code + " and length " + count);
            }
            long bytes = (long) count * type.size();
            if (type == DataType.CHAR) {
                byte[] s = new byte[count];
                b.get(s);
                int end = s.length;
                while (end > 0 && s[end - 1] == 0) end--;
                list.add(new Attribute(name, type, new String(s, 0, end, StandardCharsets.UTF_8), null));
            } else {
                double[] v = new double[count];
                for (int k = 0; k < count; k++) v[k] = get(b, type);
                list.add(new Attribute(name, type, null, v));
            }
            b.position(b.position() + (int) (pad4(bytes) - bytes));
        }
        return list;
    }

    private static double get(ByteBuffer b, DataType t) {
        return switch (t) {
            case BYTE, CHAR -> b.get();
            case SHORT -> b.getShort();
            case INT -> b.getInt();
            case FLOAT -> b.getFloat();
            case DOUBLE -> b.getDouble();
            default -> throw new IllegalStateException(t.toString());
        };
    }

    private static void readFully(FileChannel ch, ByteBuffer b, long pos, Path path) throws IOException {
        long p = pos;
        while (b.hasRemaining()) {
            int r = ch.read(b, p);
            if (r < 0) {
                throw new NetcdfFormatException(path, "truncated file: unexpected end at byte " + p
                        + " while reading " + b.remaining() + " more bytes");
            }
            p += r;
        }
    }

    @Override public Path path() { return path; }
    @Override public NetcdfFormat format() { return format; }
    @Override public List<Dimension> dimensions() { return dimensions; }
    @Override public List<Variable> variables() { return Collections.unmodifiableList(variables); }
    @Override public List<Attribute> globalAttributes() { return globals; }
    /** Number of records of the unlimited dimension. */
    public int numRecords() { return numRecords; }

    @Override
    public void close() throws IOException { channel.close(); }

    @Override
    public String toString() { return format.label() + " " + path; }

    /** A variable of a classic file; reads with positional reads (thread-safe). */
    final class ClassicVariable implements Variable {
        private final String name;
        private final DataType type;
        private final List<Dimension> dims;
        private final List<Attribute> atts;
        private final long begin;
        private final boolean isRecord;

        ClassicVariable(String name, DataType type, List<Dimension> dims, List<Attribute> atts, long begin, boolean isRecord) {
            this.name = name;
            this.type = type;
            this.dims = dims;
            this.atts = atts;
            this.begin = begin;
            this.isRecord = isRecord;
        }

        @Override public String name() { return name; }
        @Override public DataType dataType() { return type; }
        @Override public List<Dimension> dimensions() { return dims; }
        @Override public List<Attribute> attributes() { return atts; }
        /** Whether this variable runs along the unlimited dimension. */
        public boolean isRecordVariable() { return isRecord; }

        /** Bytes of one record slice (record variables) or of the whole variable. */
        long sliceBytes() {
            long n = type.size();
            for (int d = isRecord ? 1 : 0; d < dims.size(); d++) n *= dims.get(d).length();
            return n;
        }

        @Override
        public void read(int[] start, int[] count, double[] dst, int dstOffset) throws IOException {
            checkSlab(start, count);
            int rank = dims.size();
            long total = 1;
            for (int c : count) total *= c;
            if (total == 0) return;
            if (rank == 0) {
                readRun(begin, 1, dst, dstOffset);
                return;
            }
            int[] shape = shape();
            int first = isRecord ? 1 : 0; // first dimension inside a record slice
            // k: outermost dimension included in one contiguous run
            int k = rank - 1;
            while (k > first && count[k] == shape[k]) k--;
            // ... dimension k may be partial; dimensions after k are full
            long inner = 1;
            for (int d = k + 1; d < rank; d++) inner *= shape[d];
            long run = count[k] * inner;
            // strides in elements within a record slice (or the whole variable)
            long[] stride = new long[rank];
            long s = 1;
            for (int d = rank - 1; d >= first; d--) {
                stride[d] = s;
                s *= shape[d];
            }
            int outer = k; // dimensions 0..k-1 are iterated
            int[] idx = new int[outer];
            int pos = dstOffset;
            long runs = total / run;
            for (long r = 0; r < runs; r++) {
                long off = 0;
                long rec = 0;
                for (int d = 0; d < outer; d++) {
                    int i = start[d] + idx[d];
                    if (isRecord && d == 0) rec = i;
                    else off += i * stride[d];
                }
                if (isRecord && outer == 0) rec = start[0]; // k == 0 only when rank-1 record variable
                off += (long) start[k] * stride[k];
                long byteOff = begin + rec * recordSize + off * type.size();
                if (isRecord && k == 0) {
                    // a 1-D record variable: records are recordSize apart, read each value
                    for (int c = 0; c < count[0]; c++) {
                        readRun(begin + (long) (start[0] + c) * recordSize, 1, dst, pos++);
                    }
                } else {
                    readRun(byteOff, (int) run, dst, pos);
                    pos += (int) run;
                }
                for (int d = outer - 1; d >= 0; d--) {
                    if (++idx[d] < count[d]) break;
                    idx[d] = 0;
                }
            }
        }

        private void readRun(long byteOffset, int n, double[] dst, int at) throws IOException {
            int es = type.size();
            final int chunk = Math.max(1, (1 << 20) / es);
            ByteBuffer b = BUFFER.get();
            if (b.capacity() < Math.min(n, chunk) * es) {
                b = ByteBuffer.allocate(Math.max(Math.min(n, chunk) * es, 4096)).order(ByteOrder.BIG_ENDIAN);
                BUFFER.set(b);
            }
            int done = 0;
            while (done < n) {
                int m = Math.min(chunk, n - done);
                b.clear().limit(m * es);
                readFully(channel, b, byteOffset + (long) done * es, path);
                decode(b, type, m, dst, at + done);
                done += m;
            }
        }

        @Override
        public String[] readStrings() throws IOException {
            if (type != DataType.CHAR) {
                throw new IOException(path + ": variable '" + name + "' is of type " + type + ", not text");
            }
            int[] shape = shape();
            int rank = shape.length;
            int len = rank == 0 ? 1 : shape[rank - 1];
            double[] all = readAll();
            int n = len == 0 ? 0 : all.length / len;
            String[] out = new String[n];
            byte[] bytes = new byte[len];
            for (int i = 0; i < n; i++) {
                for (int c = 0; c < len; c++) bytes[c] = (byte) all[i * len + c];
                int end = len;
                while (end > 0 && (bytes[end - 1] == 0 || bytes[end - 1] == ' ')) end--;
                out[i] = new String(bytes, 0, end, StandardCharsets.UTF_8);
            }
            return out;
        }

        @Override
        public String toString() { return type + " " + name + dimensionNames(); }
    }

    /** Decodes n big-endian values of the given type from the buffer start into dst. */
    static void decode(ByteBuffer b, DataType type, int n, double[] dst, int at) {
        switch (type) {
            case BYTE, CHAR -> { for (int i = 0; i < n; i++) dst[at + i] = b.get(i); }
            case SHORT -> { for (int i = 0; i < n; i++) dst[at + i] = b.getShort(i << 1); }
            case INT -> { for (int i = 0; i < n; i++) dst[at + i] = b.getInt(i << 2); }
            case FLOAT -> { for (int i = 0; i < n; i++) dst[at + i] = b.getFloat(i << 2); }
            case DOUBLE -> { for (int i = 0; i < n; i++) dst[at + i] = b.getDouble(i << 3); }
            default -> throw new IllegalStateException("type " + type + " is not a classic type");
        }
    }
}
