/**
 * The CF Conventions layer over {@code org.gyreplan.gisdata.netcdf}: finding the longitude, latitude and time axes
 * and the variables Gyreplan needs (by {@code standard_name}, then units and common names, or by an explicit user
 * mapping), decoding values ({@code _FillValue}, {@code missing_value}, {@code valid_range}, {@code scale_factor},
 * {@code add_offset}, units to SI), decoding CF time with its calendar, streaming gridded series one time step at a
 * time on a subset {@link org.gyreplan.solver.grid.LonLatGrid}, writing CF-1.8 files, and describing a file for the
 * user.
 *
 * <p>Conventions: output grids have latitude ascending (row j = 0 southernmost) and longitudes continuous over the
 * requested box (a box may cross the antimeridian or the 0° meridian). Values are SI; NaN marks missing values.
 * Times are UTC instants.
 */
package org.gyreplan.gisdata.cf;
