package org.gyreplan.solver.gyre;

import org.gyreplan.solver.grid.ScalarField;

import java.util.List;

/**
 * Result of {@link GyreSolver#solve}.
 *
 * @param streamfunction  ψ, Sv, CF name {@code ocean_barotropic_streamfunction}; northward transport = ∂ψ/∂x,
 *                        eastward = −∂ψ/∂y; NaN outside the main basin
 * @param sverdrup        Sverdrup ψ, Sv (zero on the eastern coast of each row segment of the main basin)
 * @param topology        basin connectivity (main basin, islands)
 * @param islandValuesSv  constant ψ on each island coast, Sv (island order of {@link BasinTopology#islands()})
 * @param diagnostics     western-boundary-current diagnostics
 * @param warnings        human-readable warnings (resolution guard, excluded ocean, grid edge, filled forcing)
 * @param stats           linear-solver statistics
 */
public record GyreSolution(ScalarField streamfunction, ScalarField sverdrup, BasinTopology topology,
                           double[] islandValuesSv, BoundaryCurrentDiagnostics diagnostics, List<String> warnings,
                           SolverStats stats) {

    /**
     * @param unknowns          ocean cells solved for
     * @param levels            multigrid levels
     * @param solves            linear solves (1 + number of islands)
     * @param iterations        BiCGStab iterations per solve
     * @param relativeResiduals final relative residual per solve
     */
    public record SolverStats(int unknowns, int levels, int solves, int[] iterations, double[] relativeResiduals) { }
}
