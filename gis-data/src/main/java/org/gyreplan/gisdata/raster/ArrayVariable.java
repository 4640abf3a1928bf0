package org.gyreplan.gisdata.raster;

import org.gyreplan.gisdata.netcdf.Attribute;
import org.gyreplan.gisdata.netcdf.DataType;
import org.gyreplan.gisdata.netcdf.Dimension;
import org.gyreplan.gisdata.netcdf.Variable;

import java.util.List;

/** A 2-D in-memory array seen as a {@link Variable} (rows, columns), so raster data reuse the netCDF subsetting. */
final class ArrayVariable implements Variable {
    private final String name;
    private final double[] values;
    private final List<Dimension> dims;

    ArrayVariable(String name, double[] values, int rows, int cols) {
        this.name = name;
        this.values = values;
        this.dims = List.of(new Dimension("y", rows, false), new Dimension("x", cols, false));
    }

    @Override public String name() { return name; }
    @Override public DataType dataType() { return DataType.DOUBLE; }
    @Override public List<Dimension> dimensions() { return dims; }
    @Override public List<Attribute> attributes() { return List.of(); }

    @Override
    public void read(int[] start, int[] count, double[] dst, int dstOffset) {
        checkSlab(start, count);
        int cols = dims.get(1).length();
        for (int r = 0; r < count[0]; r++) {
            System.arraycopy(values, (start[0] + r) * cols + start[1], dst, dstOffset + r * count[1], count[1]);
        }
    }

    @Override
    public String[] readStrings() { throw new UnsupportedOperationException("numeric array"); }
}
