package org.gyreplan.gisdata.netcdf;

/**
 * A named netCDF dimension.
 *
 * @param name      dimension name as in the file
 * @param length    current length (for the unlimited dimension: the number of records)
 * @param unlimited whether this is the record (unlimited) dimension
 */
public record Dimension(String name, int length, boolean unlimited) {
    @Override
    public String toString() {
        return name + " = " + (unlimited ? "UNLIMITED (" + length + ")" : String.valueOf(length));
    }
}
