/**
 * Surface winds from sea-level pressure: geostrophic and gradient wind, and the empirical reduction and turning
 * from the geostrophic to the surface (10 m) wind over the sea.
 *
 * <h2>Conventions</h2>
 * <ul>
 *   <li>Pressure in Pa, pressure gradients in Pa m⁻¹ (1 hPa per 100 km = 1e-3 Pa m⁻¹); winds in m s⁻¹ as
 *       eastward/northward components pointing "toward".</li>
 *   <li>Air density ρₐ from {@link org.gyreplan.solver.PhysicalConstants#rhoAir()} (default 1.22 kg m⁻³).</li>
 *   <li>Inside the equatorial cut-off ({@link org.gyreplan.solver.ekman.EquatorialCutoff}) the geostrophic wind is
 *       undefined: {@code NaN}, counted.</li>
 * </ul>
 */
package org.gyreplan.solver.atmos;
