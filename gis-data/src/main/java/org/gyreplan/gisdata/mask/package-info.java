/**
 * Masks on a {@link org.gyreplan.solver.grid.LonLatGrid} from polygons: basin (ocean) masks, exclusion zones,
 * distances to a boundary. A cell is in a polygon when its centre is inside or on the boundary; holes (islands)
 * are excluded. Coordinates are geographic WGS 84 degrees; longitudes follow the grid's continuous span.
 * Distances are in km on the grid's sphere.
 */
package org.gyreplan.gisdata.mask;
