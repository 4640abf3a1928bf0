/**
 * Air–sea momentum flux: neutral 10 m drag laws, air density and the bulk wind stress.
 *
 * <h2>Conventions</h2>
 * <ul>
 *   <li>Wind speed U₁₀ in m s⁻¹ at 10 m height, neutral stability; drag coefficients are dimensionless.</li>
 *   <li>Stress τ in Pa (N m⁻²), the force per unit area of the air on the sea, pointing along the wind
 *       ("toward"): τ = ρₐ C_D |U| U.</li>
 *   <li>Wind direction input in meteorological convention ("from", degrees clockwise from true north) is
 *       converted explicitly by {@link org.gyreplan.solver.stress.WindVectors}; every vector inside is
 *       eastward/northward components.</li>
 *   <li>Each drag law reports its published validity range; evaluations outside it are extrapolated as documented
 *       per law and counted so a report can state how many cells were outside.</li>
 * </ul>
 */
package org.gyreplan.solver.stress;
