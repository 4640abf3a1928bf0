package org.gyreplan.gisdata.netcdf;

/** The storage formats Gyreplan reads, told apart by the first bytes of the file. */
public enum NetcdfFormat {
    /** CDF-1: classic format, 32-bit offsets (magic "CDF\001"). */
    CLASSIC("netCDF classic (CDF-1)"),
    /** CDF-2: 64-bit offset format (magic "CDF\002"). */
    OFFSET_64("netCDF 64-bit offset (CDF-2)"),
    /** netCDF-4: HDF5 storage (magic "\211HDF\r\n\032\n"). */
    NETCDF4("netCDF-4 (HDF5)");

    private final String label;

    NetcdfFormat(String label) { this.label = label; }

    /** Human-readable name, e.g. "netCDF 64-bit offset (CDF-2)". */
    public String label() { return label; }
}
