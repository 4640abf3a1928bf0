/**
 * Mooring siting: candidates, constraints, a weighted score, the choice of the best K sites under a minimum
 * spacing, and per-site notes (deployment months with favourable weather, indicative line length, cautions).
 *
 * <p>Units: depth m (positive down); distances in km where the name says {@code Km}; rates m s⁻¹; wind speed
 * m s⁻¹; fractions 0…1. Geodesic distances on WGS 84 via GeographicLib unless a method says "sphere".
 */
package org.gyreplan.solver.plan.mooring;
