/**
 * Physics and numerics of the wind-driven upper ocean. No file I/O, no formats, no GUI, no printing.
 *
 * <h2>Conventions (all sub-packages)</h2>
 * <ul>
 *   <li>SI inside: m, s, kg, Pa (N m⁻²), m s⁻¹. Degrees only for coordinates, in names ending in {@code Deg}.</li>
 *   <li>Vectors as eastward (x, u) and northward (y, v) components. Currents and stress point "toward".</li>
 *   <li>f = 2Ω sin φ, β = 2Ω cos φ / R with Ω sidereal (see {@link org.gyreplan.solver.PhysicalConstants}).</li>
 *   <li>Arrays are flat {@code double[]}, row-major {@code [j * nx + i]}, j northward, i eastward;
 *       {@code NaN} marks land or missing values.</li>
 * </ul>
 */
package org.gyreplan.solver;
