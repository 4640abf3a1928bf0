/**
 * Linear algebra of the gyre solvers: structured stencil matrices on masked lattices, geometric multigrid with
 * Galerkin coarse operators and x-line Gauss–Seidel smoothing, and a BiCGStab outer iteration. Deterministic: fixed
 * partitions, reductions in a fixed order. No units (pure numerics).
 */
package org.gyreplan.solver.gyre.mg;
