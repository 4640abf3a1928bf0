package org.gyreplan.solver.gyre;

/** Contract for the Munk (1950) solver with free-slip walls: A_H = 1.5e4 m² s⁻¹. */
class MunkFreeSlipContractTest extends GyreSolverContract {
    @Override GyreProblem.Builder friction(GyreProblem.Builder b) { return b.munk(1.5e4, WallCondition.FREE_SLIP); }
    /** Free-slip walls do not shift the interior; measured 0.8 %, tolerance 1.5 %. */
    @Override double interiorTolerance() { return 0.015; }
}
