package org.gyreplan.solver.gyre;

/** Contract for the Munk (1950) solver with no-slip walls: A_H = 1.5e4 m² s⁻¹ (δ_M ≈ 88–97 km). */
class MunkNoSlipContractTest extends GyreSolverContract {
    @Override GyreProblem.Builder friction(GyreProblem.Builder b) { return b.munk(1.5e4, WallCondition.NO_SLIP); }
    /**
     * The eastern no-slip layer shifts the interior by ≈ δ_M/L ≈ 2 % of the maximum (CHECKS pitfall 12); measured
     * 2.2 %, tolerance 3 %.
     */
    @Override double interiorTolerance() { return 0.03; }
}
