/**
 * Regular longitude–latitude grids with spherical metrics, the single land/ocean mask at cell centres,
 * and the scalar, vector and time-axis types every physics package works on.
 *
 * <p>Units: coordinates in degrees (names end in {@code Deg}); metrics in metres and m².
 * Layout: flat arrays, row-major {@code [j * nx + i]}, j increasing northward, i increasing eastward.
 * Longitudes are continuous: a grid may start at 170° and run to 200° to cross the antimeridian.
 */
package org.gyreplan.solver.grid;
