/**
 * The per-time-step surface response used by the pipeline: wind → stress → stress curl, Ekman transport and
 * Ekman pumping in one call, with the counts a report needs.
 *
 * <p>Units and names: stress in Pa ({@code surface_downward_eastward_stress}, {@code surface_downward_northward_stress}),
 * stress curl in N m⁻³, Ekman transport in m² s⁻¹, Ekman pumping in m s⁻¹ positive upward
 * ({@code ekman_pumping_velocity}). {@code NaN} = land, missing, or inside the equatorial cut-off.
 */
package org.gyreplan.solver.surface;
