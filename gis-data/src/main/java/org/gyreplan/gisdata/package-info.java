/**
 * Every file format and coordinate reference of Gyreplan: netCDF reading and CF writing, GeoTIFF, GeoJSON,
 * WKT, Shapefile, GeoPackage, GPX, KML, CSV; unit strings; rasterising polygons to grid masks; base-map land
 * polygons; bathymetry. Depends on {@code solver} for grid and field types, never on {@code app}.
 *
 * <p>Coordinates are geographic WGS 84 (EPSG:4326) longitude/latitude in degrees. All writers write to a
 * temporary file in the target folder and move it into place, so a failed or cancelled run leaves no partial file.
 */
package org.gyreplan.gisdata;
