/**
 * Base map: Natural Earth land polygons (public domain, via the npm package world-atlas) shipped as resources and
 * served by {@link org.gyreplan.gisdata.basemap.LandPolygons}; a TopoJSON decoder; coastline extraction for the
 * coastal indices ({@link org.gyreplan.gisdata.basemap.Coastlines}, sea on the left). Coordinates are WGS 84
 * longitude/latitude in degrees; boxes may cross the antimeridian with continuous longitudes.
 */
package org.gyreplan.gisdata.basemap;
