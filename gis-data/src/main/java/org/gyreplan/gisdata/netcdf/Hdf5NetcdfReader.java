package org.gyreplan.gisdata.netcdf;

import io.jhdf.HdfFile;
import io.jhdf.api.Dataset;
import io.jhdf.api.Node;
import io.jhdf.exceptions.HdfException;

import java.io.IOException;
import java.lang.reflect.Array;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Collections;
import java.util.Comparator;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;

/**
 * Reader of netCDF-4 files (HDF5 storage) through the pure-Java HDF5 library {@code io.jhdf}, which handles
 * chunked layout and the deflate and shuffle filters.
 *
 * <p>netCDF-4 stores each dimension as an HDF5 "dimension scale" data set; every variable lists its dimension
 * scales in the {@code DIMENSION_LIST} attribute (object references). A dimension without a coordinate variable
 * is a dimension scale whose {@code NAME} attribute starts with "This is a netCDF dimension but not a netCDF
 * variable"; it is listed as a dimension but not as a variable. Only the root group is read. Hidden attributes of
 * the netCDF-4 library ({@code _Netcdf4Dimid}, {@code _NCProperties}, ...) and the HDF5 dimension-scale attributes
 * are not reported.
 */
public final class Hdf5NetcdfReader implements NetcdfDataset {
    private static final Set<String> HIDDEN = Set.of("DIMENSION_LIST", "REFERENCE_LIST", "CLASS", "NAME",
            "_Netcdf4Dimid", "_Netcdf4Coordinates", "_NCProperties", "_nc3_strict", "_IsNetcdf4", "_SuperblockVersion");
    private static final String PHONY = "This is a netCDF dimension but not a netCDF variable";

    private final Path path;
    private final HdfFile file;
    private final List<Dimension> dimensions;
    private final List<Variable> variables;
    private final List<Attribute> globals;

    private Hdf5NetcdfReader(Path path, HdfFile file, List<Dimension> dimensions, List<Variable> variables,
                             List<Attribute> globals) {
        this.path = path;
        this.file = file;
        this.dimensions = dimensions;
        this.variables = variables;
        this.globals = globals;
    }

    /** Opens a netCDF-4 file. */
    public static Hdf5NetcdfReader open(Path path) throws IOException {
        HdfFile f;
        try {
            f = new HdfFile(path);
        } catch (HdfException e) {
            throw new NetcdfFormatException(path, "cannot read as netCDF-4/HDF5 (truncated or corrupt?): " + e.getMessage(), e);
        }
        try {
            return build(path, f);
        } catch (HdfException | IllegalStateException e) {
            f.close();
            throw new NetcdfFormatException(path, "cannot read as netCDF-4/HDF5 (truncated or corrupt?): " + e.getMessage(), e);
        } catch (IOException | RuntimeException e) {
            f.close();
            throw e;
        }
    }

    private static Hdf5NetcdfReader build(Path path, HdfFile f) throws IOException {
        // dimension scales, ordered by _Netcdf4Dimid when present
        List<Dataset> scales = new ArrayList<>();
        List<Dataset> datasets = new ArrayList<>();
        for (Node n : f) {
            if (n instanceof Dataset ds) {
                Object cls = attrValue(ds, "CLASS");
                if ("DIMENSION_SCALE".equals(cls)) scales.add(ds);
                datasets.add(ds);
            }
        }
        scales.sort(Comparator.comparingInt(ds -> {
            Object id = attrValue(ds, "_Netcdf4Dimid");
            return id instanceof Number num ? num.intValue() : Integer.MAX_VALUE;
        }));
        Map<Long, Dimension> byAddress = new HashMap<>();
        Map<String, Dimension> byName = new LinkedHashMap<>();
        for (Dataset ds : scales) {
            long[] max = ds.getMaxSize();
            int len = ds.getDimensions().length == 0 ? 0 : ds.getDimensions()[0];
            boolean unlimited = max != null && max.length > 0 && max[0] < 0;
            Dimension d = new Dimension(ds.getName(), len, unlimited);
            byAddress.put(ds.getAddress(), d);
            byName.put(d.name(), d);
        }
        List<Variable> vars = new ArrayList<>();
        datasets.sort(Comparator.comparingLong(Node::getAddress)); // creation order in practice
        for (Dataset ds : datasets) {
            Object nameAttr = attrValue(ds, "NAME");
            if (nameAttr instanceof String s && s.startsWith(PHONY)) continue;
            int[] shape = ds.getDimensions();
            List<Dimension> dims = new ArrayList<>();
            Object dl = attrValue(ds, "DIMENSION_LIST");
            if (dl != null && Array.getLength(dl) == shape.length) {
                for (int i = 0; i < shape.length; i++) {
                    Object refs = Array.get(dl, i);
                    long addr = refs instanceof long[] la && la.length > 0 ? la[0]
                            : refs instanceof Number num ? num.longValue() : -1;
                    Dimension d = byAddress.get(addr);
                    if (d == null) d = new Dimension(ds.getName() + "_dim" + i, shape[i], false);
                    dims.add(d);
                }
            } else if ("DIMENSION_SCALE".equals(attrValue(ds, "CLASS")) && shape.length == 1) {
                dims.add(byName.get(ds.getName()));
            } else {
                for (int i = 0; i < shape.length; i++) dims.add(new Dimension(ds.getName() + "_dim" + i, shape[i], false));
            }
            vars.add(new H5Variable(path, ds, List.copyOf(dims), readAttributes(ds)));
        }
        List<Attribute> globals = readAttributes(f);
        return new Hdf5NetcdfReader(path, f, List.copyOf(byName.values()), Collections.unmodifiableList(vars),
                globals);
    }

    private static Object attrValue(Node n, String name) {
        io.jhdf.api.Attribute a = n.getAttributes().get(name);
        if (a == null) return null;
        Object d = a.getData();
        if (d != null && d.getClass().isArray() && Array.getLength(d) == 1 && !(d instanceof Object[])) {
            return Array.get(d, 0);
        }
        return d;
    }

    private static List<Attribute> readAttributes(Node n) {
        List<Attribute> out = new ArrayList<>();
        for (Map.Entry<String, io.jhdf.api.Attribute> e : n.getAttributes().entrySet()) {
            String name = e.getKey();
            if (HIDDEN.contains(name)) continue;
            Object d;
            try {
                d = e.getValue().getData();
            } catch (RuntimeException ex) {
                continue; // an attribute type this reader does not know; not part of the netCDF data model we use
            }
            Attribute a = toAttribute(name, d);
            if (a != null) out.add(a);
        }
        return Collections.unmodifiableList(out);
    }

    private static Attribute toAttribute(String name, Object d) {
        if (d == null) return null;
        if (d instanceof String s) return Attribute.text(name, s);
        if (d instanceof String[] sa) return Attribute.text(name, String.join(",", sa));
        if (d instanceof Number num) return Attribute.numbers(name, typeOf(num.getClass()), num.doubleValue());
        if (d.getClass().isArray() && d.getClass().getComponentType().isPrimitive()) {
            int len = Array.getLength(d);
            double[] v = new double[len];
            for (int i = 0; i < len; i++) v[i] = ((Number) Array.get(d, i)).doubleValue();
            return Attribute.numbers(name, typeOf(d.getClass().getComponentType()), v);
        }
        return null;
    }

    static DataType typeOf(Class<?> c) {
        if (c == byte.class || c == Byte.class) return DataType.BYTE;
        if (c == short.class || c == Short.class) return DataType.SHORT;
        if (c == int.class || c == Integer.class) return DataType.INT;
        if (c == long.class || c == Long.class) return DataType.INT64;
        if (c == float.class || c == Float.class) return DataType.FLOAT;
        if (c == double.class || c == Double.class) return DataType.DOUBLE;
        if (c == String.class) return DataType.STRING;
        return DataType.DOUBLE;
    }

    @Override public Path path() { return path; }
    @Override public NetcdfFormat format() { return NetcdfFormat.NETCDF4; }
    @Override public List<Dimension> dimensions() { return dimensions; }
    @Override public List<Variable> variables() { return variables; }
    @Override public List<Attribute> globalAttributes() { return globals; }
    @Override public void close() { file.close(); }
    @Override public String toString() { return "netCDF-4 " + path; }

    /** A variable backed by an HDF5 data set. Reads are synchronized (jhdf shares file state). */
    static final class H5Variable implements Variable {
        private final Path path;
        private final Dataset ds;
        private final List<Dimension> dims;
        private final List<Attribute> atts;
        private final DataType type;

        H5Variable(Path path, Dataset ds, List<Dimension> dims, List<Attribute> atts) {
            this.path = path;
            this.ds = ds;
            this.dims = dims;
            this.atts = atts;
            Class<?> jt = ds.getJavaType();
            this.type = jt == String.class ? DataType.STRING : typeOf(jt);
        }

        @Override public String name() { return ds.getName(); }
        @Override public DataType dataType() { return type; }
        @Override public List<Dimension> dimensions() { return dims; }
        @Override public List<Attribute> attributes() { return atts; }
        @Override public int[] shape() { return ds.getDimensions().clone(); }

        @Override
        public void read(int[] start, int[] count, double[] dst, int dstOffset) throws IOException {
            checkSlab(start, count);
            long total = 1;
            for (int c : count) total *= c;
            if (total == 0) return;
            Object data;
            try {
                synchronized (ds.getHdfFile()) {
                    if (count.length == 0) {
                        data = ds.getData();
                    } else {
                        long[] off = new long[start.length];
                        for (int i = 0; i < off.length; i++) off[i] = start[i];
                        data = ds.getData(off, count.clone());
                    }
                }
            } catch (HdfException | IllegalArgumentException e) {
                throw new NetcdfFormatException(path, "variable '" + name() + "': cannot read hyperslab ("
                        + e.getMessage() + ")", e);
            }
            int[] at = {dstOffset};
            flatten(data, dst, at);
        }

        private static void flatten(Object data, double[] dst, int[] at) {
            if (data instanceof double[] a) {
                System.arraycopy(a, 0, dst, at[0], a.length);
                at[0] += a.length;
            } else if (data instanceof float[] a) {
                int p = at[0];
                for (float v : a) dst[p++] = v;
                at[0] = p;
            } else if (data instanceof int[] a) {
                int p = at[0];
                for (int v : a) dst[p++] = v;
                at[0] = p;
            } else if (data instanceof short[] a) {
                int p = at[0];
                for (short v : a) dst[p++] = v;
                at[0] = p;
            } else if (data instanceof byte[] a) {
                int p = at[0];
                for (byte v : a) dst[p++] = v;
                at[0] = p;
            } else if (data instanceof long[] a) {
                int p = at[0];
                for (long v : a) dst[p++] = v;
                at[0] = p;
            } else if (data instanceof Object[] a) {
                for (Object o : a) flatten(o, dst, at);
            } else if (data instanceof Number num) {
                dst[at[0]++] = num.doubleValue();
            } else {
                throw new IllegalStateException("unsupported HDF5 data of class " + data.getClass());
            }
        }

        @Override
        public String[] readStrings() throws IOException {
            Object data;
            synchronized (ds.getHdfFile()) {
                data = ds.getDataFlat();
            }
            if (data instanceof String[] s) {
                int[] shape = shape();
                // netCDF-4 stores a CHAR array as one-character strings: join them along the last dimension
                boolean chars = shape.length >= 2 && s.length > 0 && java.util.Arrays.stream(s).allMatch(x -> x.length() <= 1);
                if (!chars) return s.clone();
                int len = shape[shape.length - 1];
                String[] out = new String[s.length / len];
                for (int i = 0; i < out.length; i++) {
                    StringBuilder b = new StringBuilder();
                    for (int c = 0; c < len; c++) b.append(s[i * len + c]);
                    int end = b.length();
                    while (end > 0 && (b.charAt(end - 1) == 0 || b.charAt(end - 1) == ' ')) end--;
                    out[i] = b.substring(0, end);
                }
                return out;
            }
            throw new IOException(path + ": variable '" + name() + "' is of type " + type + ", not text");
        }

        @Override
        public String toString() { return type + " " + name() + dimensionNames(); }
    }
}
