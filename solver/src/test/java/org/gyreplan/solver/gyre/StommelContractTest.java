package org.gyreplan.solver.gyre;

/** Contract for the Stommel (1948) solver: r = 2e-6 s⁻¹ (δ_S = r/β ≈ 90–120 km, ≥ 4.5 cells). */
class StommelContractTest extends GyreSolverContract {
    @Override GyreProblem.Builder friction(GyreProblem.Builder b) { return b.stommel(2e-6); }
    /**
     * Stommel's drag acts on the whole interior: near the zonal coasts frictional layers of width √(δ_S L) ≈ 700 km
     * (L ≈ 5000 km) reach into the middle third of the basin; measured departure 6.3 %, tolerance 8 %.
     */
    @Override double interiorTolerance() { return 0.08; }
}
