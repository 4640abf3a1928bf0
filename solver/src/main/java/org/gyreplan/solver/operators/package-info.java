/**
 * Finite-difference operators on the sphere for fields on a {@link org.gyreplan.solver.grid.LonLatGrid}.
 *
 * <p>Units: a derivative has the unit of its field per metre (e.g. Pa → Pa m⁻¹, N m⁻² → N m⁻³).
 * Metrics come from the grid (dx(j) = R cos φⱼ Δλ, dy = R Δφ); no operator recomputes cos φ itself.
 * {@code NaN} marks land, missing values and cells with no usable stencil.
 *
 * <p>Performance: {@code SphericalOperators.on(grid)} prepares, once per grid object, the per-row metrics and the
 * runs of cells whose mask allows the centred stencil; those cells are computed in a tight loop and only edges,
 * cells next to land and cells touching non-finite values take the general one-sided stencil. The static methods
 * use the last prepared grid. Results are bit-identical to the general per-cell stencil (tested).
 */
package org.gyreplan.solver.operators;
