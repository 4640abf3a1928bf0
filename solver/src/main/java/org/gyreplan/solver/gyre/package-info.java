/**
 * Steady wind-driven, depth-integrated circulation on the user's masked basin: Sverdrup interior, Stommel (1948)
 * bottom drag, Munk (1950) lateral friction, islands by the island rule (Godfrey 1989), and western-boundary-current
 * diagnostics.
 *
 * <h2>Conventions</h2>
 * <ul>
 *   <li>ψ is m³ s⁻¹ inside and Sv (10⁶ m³ s⁻¹) in output fields; northward transport V = ∂ψ/∂x, eastward
 *       U = −∂ψ/∂y (DESIGN.md §3). Output name {@code ocean_barotropic_streamfunction} (CF standard name).</li>
 *   <li>Equation r∇²ψ + β ∂ψ/∂x − A_H∇⁴ψ = curl τ/ρ₀; r (s⁻¹) is the linear drag rate on the transport form,
 *       A_H (m² s⁻¹) the lateral viscosity; the western boundary layer lies at the west coast in both hemispheres.</li>
 *   <li>Curl τ in N m⁻³, stress in Pa, ρ₀ in kg m⁻³, depth H in m, widths in m inside (km in diagnostics).</li>
 *   <li>ψ sits at cell centres; the coast is the centre of the first land cell (ψ = 0 on the outer coast, a constant
 *       on each island).</li>
 *   <li>Results are bit-identical for any thread count.</li>
 * </ul>
 *
 * Entry point: {@link org.gyreplan.solver.gyre.GyreSolver#solve}.
 */
package org.gyreplan.solver.gyre;
