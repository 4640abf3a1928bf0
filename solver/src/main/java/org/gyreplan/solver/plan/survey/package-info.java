/**
 * Survey cruise: cross-shore transects and stations, the route from a port and back (order and obstacle-avoiding
 * legs), and the schedule (transit, station work, weather downtime, daylight) with a per-leg table.
 *
 * <p>Units: inside SI (m, s, m s⁻¹); names ending in {@code Km}, {@code Nmi}, {@code Kn}, {@code Hours},
 * {@code Min}, {@code Mpm} (m per minute) say otherwise. Depth in m positive down. Bearings and azimuths in degrees
 * clockwise from true north. Geodesics on WGS 84 via GeographicLib.
 *
 * <p>Not for navigation: routes avoid only the polygons they are given; the master and licensed practice decide.
 */
package org.gyreplan.solver.plan.survey;
