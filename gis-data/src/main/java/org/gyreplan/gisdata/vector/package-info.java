/**
 * Vector formats: polygons in (basins, exclusion zones, study areas) from GeoJSON, WKT, Shapefile and GeoPackage
 * through {@link org.gyreplan.gisdata.vector.PolygonFiles}; features out (points, lines, polygons with properties)
 * to GeoJSON (RFC 7946), GeoPackage 1.3, GPX 1.1 and KML 2.2, all written atomically.
 *
 * <p>Coordinates are geographic WGS 84 (EPSG:4326), x = longitude and y = latitude in degrees. Inside Gyreplan
 * longitudes may be continuous beyond ±180° (a basin across the antimeridian); writers bring them into
 * [−180°, 180°] and split geometries at the antimeridian ({@link org.gyreplan.gisdata.vector.Antimeridian}).
 * No reprojection is done: projected or non-WGS 84 inputs are refused with a message naming the reference.
 * Errors are {@link org.gyreplan.gisdata.vector.GeometryFileException} with a problem key, the file, the feature
 * and the location. Exports that may go to sea carry {@link org.gyreplan.gisdata.vector.SeaCaution#TEXT}.
 */
package org.gyreplan.gisdata.vector;
