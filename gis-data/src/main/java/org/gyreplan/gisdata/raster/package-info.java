/**
 * Rasters: GeoTIFF writing and reading (EPSG:4326 grids) and bathymetry (water depth, m, positive down, NaN on
 * land) from netCDF or GeoTIFF regridded onto a computational {@link org.gyreplan.solver.grid.LonLatGrid}.
 */
package org.gyreplan.gisdata.raster;
