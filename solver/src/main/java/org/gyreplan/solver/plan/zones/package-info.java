/**
 * Upwelling zones from a time series of Ekman pumping (or any upwelling rate) on a {@code LonLatGrid}.
 *
 * <p>Units: pumping in m s⁻¹, positive upward (upwelling), as in DESIGN.md §3; thresholds may be given in
 * m day⁻¹ and are converted at the edge ({@link org.gyreplan.solver.plan.zones.ZoneThresholds#ofMetresPerDay}).
 * Areas in km² are spherical (sums of the grid's exact cell areas), not planar.
 */
package org.gyreplan.solver.plan.zones;
