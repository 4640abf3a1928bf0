/**
 * Finite-difference operators on the sphere for fields on a {@link org.gyreplan.solver.grid.LonLatGrid}.
 *
 * <p>Units: a derivative has the unit of its field per metre (e.g. Pa → Pa m⁻¹, N m⁻² → N m⁻³).
 * Metrics come from the grid (dx(j) = R cos φⱼ Δλ, dy = R Δφ); no operator recomputes cos φ itself.
 * {@code NaN} marks land, missing values and cells with no usable stencil.
 */
package org.gyreplan.solver.operators;
