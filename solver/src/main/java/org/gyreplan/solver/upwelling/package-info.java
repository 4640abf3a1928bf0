/**
 * Coastal upwelling indices: the cross-shore Ekman transport at coast points from stress fields or from
 * sea-level pressure (the classic geostrophic method), and curl-driven upwelling in a coastal band.
 *
 * <h2>Conventions</h2>
 * <ul>
 *   <li><b>Index sign</b>: positive = offshore Ekman transport = upwelling-favourable; negative = onshore
 *       (downwelling-favourable).</li>
 *   <li><b>Index unit</b>: m³ s⁻¹ per 100 m of coastline (numerically 100 × the transport per unit width in m² s⁻¹).
 *       Names end in {@code M3PerSPer100m}.</li>
 *   <li>Ekman transport per unit width Qₑ = (τᵧ/(ρ₀ f), −τₓ/(ρ₀ f)) in m² s⁻¹, f at the coast point's latitude.</li>
 *   <li>Within the equatorial cut-off ({@link org.gyreplan.solver.ekman.EquatorialCutoff}, default |φ| &lt; 5°)
 *       the index is undefined: {@code NaN} and flagged {@link org.gyreplan.solver.upwelling.IndexFlag#EQUATORIAL_CUTOFF}.</li>
 *   <li>Stress in Pa (N m⁻²) toward which the wind blows; wind in m s⁻¹ (eastward, northward, "toward").</li>
 * </ul>
 */
package org.gyreplan.solver.upwelling;
