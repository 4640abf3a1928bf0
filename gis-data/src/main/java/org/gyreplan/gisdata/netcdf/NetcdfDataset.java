package org.gyreplan.gisdata.netcdf;

import java.io.IOException;
import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

/**
 * An open netCDF file of any supported format. Obtain one with {@link #open(Path)}, which tells the format by the
 * file's magic bytes:
 *
 * <pre>{@code
 * try (NetcdfDataset nc = NetcdfDataset.open(path)) {
 *     Variable u = nc.variable("UWND");
 *     double[] step = u.read(new int[] {k, 0, 0}, new int[] {1, ny, nx});
 * }
 * }</pre>
 *
 * Implementations keep only metadata in memory and read data on demand; they are not thread-safe for
 * concurrent reads unless stated.
 */
public interface NetcdfDataset extends AutoCloseable {
    /** The file that was opened. */
    Path path();

    /** Storage format. */
    NetcdfFormat format();

    /** Dimensions in file order. */
    List<Dimension> dimensions();

    /** Variables in file order (for netCDF-4: the data sets of the root group that are netCDF variables). */
    List<Variable> variables();

    /** Global attributes. */
    List<Attribute> globalAttributes();

    @Override
    void close() throws IOException;

    /** The variable of that exact name, or {@code null}. */
    default Variable findVariable(String name) {
        for (Variable v : variables()) if (v.name().equals(name)) return v;
        return null;
    }

    /** The variable of that exact name; throws naming the file and listing the variables it has. */
    default Variable variable(String name) throws NetcdfFormatException {
        Variable v = findVariable(name);
        if (v == null) {
            throw new NetcdfFormatException(path(), "no variable '" + name + "'; the file has: "
                    + String.join(", ", variables().stream().map(Variable::name).toList()));
        }
        return v;
    }

    /** The dimension of that name, or {@code null}. */
    default Dimension findDimension(String name) {
        for (Dimension d : dimensions()) if (d.name().equals(name)) return d;
        return null;
    }

    /** The global attribute of that name, or {@code null}. */
    default Attribute globalAttribute(String name) {
        for (Attribute a : globalAttributes()) if (a.name().equals(name)) return a;
        return null;
    }

    /** Opens a netCDF classic, 64-bit offset or netCDF-4 file, chosen by its magic bytes. */
    static NetcdfDataset open(Path path) throws IOException {
        NetcdfFormat f = detect(path);
        return switch (f) {
            case CLASSIC, OFFSET_64 -> ClassicNetcdfReader.open(path);
            case NETCDF4 -> Hdf5NetcdfReader.open(path);
        };
    }

    /**
     * Tells the format from the first bytes. Throws {@link NetcdfFormatException} naming the file and the
     * expected magic numbers when the file is none of the supported formats.
     */
    static NetcdfFormat detect(Path path) throws IOException {
        if (!Files.isRegularFile(path)) throw new NoSuchFileException(path.toString(), null, "no such netCDF file");
        byte[] m = new byte[8];
        int n;
        try (InputStream in = Files.newInputStream(path)) {
            n = in.readNBytes(m, 0, 8);
        }
        if (n >= 4 && m[0] == 'C' && m[1] == 'D' && m[2] == 'F') {
            if (m[3] == 1) return NetcdfFormat.CLASSIC;
            if (m[3] == 2) return NetcdfFormat.OFFSET_64;
            if (m[3] == 5) {
                throw new NetcdfFormatException(path, "netCDF CDF-5 (64-bit data) is not supported; "
                        + "convert it with 'nccopy -k nc7' or 'nccopy -k 64-bit offset'");
            }
        }
        if (n == 8 && (m[0] & 0xff) == 0x89 && m[1] == 'H' && m[2] == 'D' && m[3] == 'F'
                && m[4] == '\r' && m[5] == '\n' && m[6] == 0x1a && m[7] == '\n') {
            return NetcdfFormat.NETCDF4;
        }
        List<String> hex = new ArrayList<>();
        for (int i = 0; i < n; i++) hex.add(String.format("%02x", m[i] & 0xff));
        throw new NetcdfFormatException(path, "not a netCDF file: expected the magic bytes 'CDF\\001' (classic), "
                + "'CDF\\002' (64-bit offset) or '\\211HDF\\r\\n\\032\\n' (netCDF-4/HDF5) at the start, found "
                + (n == 0 ? "an empty file" : "[" + String.join(" ", hex) + "]"));
    }
}
