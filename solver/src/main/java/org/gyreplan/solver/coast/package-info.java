/**
 * Coastlines for coastal indices: a coast taken from a basin polygon's exterior ring, a land polygon or land
 * line strings (longitude/latitude, degrees), with along-coast distance, a smoothed coast orientation and the
 * offshore unit normal, and index points placed along the coast or snapped from user positions.
 *
 * <h2>Conventions</h2>
 * <ul>
 *   <li>Positions in degrees ({@code lonDeg}, {@code latDeg}); distances in kilometres where the name ends in
 *       {@code Km} (along-coast distance, smoothing length, snap distance).</li>
 *   <li>Bearings in degrees clockwise from true north, in [0, 360).</li>
 *   <li><b>Coast bearing</b>: the direction along the coast that keeps the ocean on the right-hand side
 *       (an eastern-boundary coast in either hemisphere, ocean to the west, has a coast bearing near 180°).
 *       <b>Offshore bearing</b> = coast bearing + 90°: the horizontal unit normal pointing from the coast into
 *       the ocean, whatever the orientation of the input ring or line.</li>
 *   <li>Geodesics on a sphere of radius {@link org.gyreplan.solver.PhysicalConstants#earthRadius()} (default
 *       6 371 km), computed with GeographicLib (Karney 2013, "Algorithms for geodesics", J. Geodesy 87, 43–55).
 *       Coast segments between vertices are geodesic segments.</li>
 * </ul>
 */
package org.gyreplan.solver.coast;
