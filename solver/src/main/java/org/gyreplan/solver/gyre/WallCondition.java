package org.gyreplan.solver.gyre;

/**
 * Tangential boundary condition of the lateral (Munk) friction at coasts, chosen explicitly (no default).
 *
 * <pre>
 *   NO_SLIP:   ψ = 0 and ∂ψ/∂n = 0 on the coast (tangential velocity vanishes) → wall vorticity ζ_w = 2 (ψ₁ − ψ_w)/h²
 *   FREE_SLIP: ψ = 0 and ζ = ∇²ψ = 0 on the coast (no tangential stress)
 * </pre>
 *
 * The no-slip wall vorticity is the classic second-order ghost-point (Thom) formula, h the distance between the coast
 * node and the first ocean node, ψ₁ the streamfunction there. Munk (1950) used no-slip walls.
 */
public enum WallCondition {
    /** Velocity vanishes at the coast. */
    NO_SLIP,
    /** Tangential stress vanishes at the coast. */
    FREE_SLIP
}
