/**
 * Reading and writing netCDF files behind one abstraction, {@link org.gyreplan.gisdata.netcdf.NetcdfDataset}.
 *
 * <ul>
 *   <li>Classic format CDF-1 and 64-bit-offset CDF-2 (published "netCDF Classic and 64-bit Offset Format"
 *       specification, Unidata): an own reader that keeps only the header in memory and reads hyperslabs with
 *       positional reads on a {@link java.nio.channels.FileChannel}; an own writer of CDF-2.</li>
 *   <li>netCDF-4 (HDF5 storage, chunked, deflate, shuffle) through the pure-Java library {@code io.jhdf};
 *       dimensions come from the HDF5 dimension scales ({@code DIMENSION_LIST}).</li>
 * </ul>
 *
 * <p>Values read here are the raw stored numbers widened to {@code double}; CF decoding (fill values,
 * packing, units) is the job of {@code org.gyreplan.gisdata.cf}. Arrays are flat, row-major (last index fastest),
 * in the order of the variable's dimensions.
 */
package org.gyreplan.gisdata.netcdf;
