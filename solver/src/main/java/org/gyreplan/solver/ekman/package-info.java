/**
 * The Ekman layer: transport, depth scales, the velocity spiral and Ekman pumping.
 *
 * <h2>Conventions</h2>
 * <ul>
 *   <li>Stress τ in Pa (N m⁻²), along the wind; f = 2Ω sin φ (s⁻¹), β = 2Ω cos φ / R (m⁻¹ s⁻¹) from
 *       {@link org.gyreplan.solver.PhysicalConstants}.</li>
 *   <li>Ekman volume transport per unit width in m² s⁻¹: Uₑ = τᵧ/(ρ₀ f), Vₑ = −τₓ/(ρ₀ f) — 90° right of the stress
 *       in the northern hemisphere, left in the southern (the sign comes from f).</li>
 *   <li>Ekman pumping wₑ in m s⁻¹, positive upward (upwelling) at the base of the Ekman layer.</li>
 *   <li>Depth z in metres, positive upward, z = 0 at the surface (so the layer is at z ≤ 0).</li>
 *   <li>Inside the {@link org.gyreplan.solver.ekman.EquatorialCutoff} every Ekman quantity is undefined:
 *       {@code NaN}, counted in field results, never infinite.</li>
 * </ul>
 */
package org.gyreplan.solver.ekman;
