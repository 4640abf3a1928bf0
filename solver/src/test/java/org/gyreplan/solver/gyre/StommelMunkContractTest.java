package org.gyreplan.solver.gyre;

/** Contract for bottom drag and lateral friction together: r = 1e-6 s⁻¹, A_H = 1.5e4 m² s⁻¹, no-slip. */
class StommelMunkContractTest extends GyreSolverContract {
    @Override GyreProblem.Builder friction(GyreProblem.Builder b) { return b.stommel(1e-6).munk(1.5e4, WallCondition.NO_SLIP); }
    /** Drag layers (see the Stommel contract, r halved) plus the no-slip shift; measured 3.4 %, tolerance 4.5 %. */
    @Override double interiorTolerance() { return 0.045; }
}
