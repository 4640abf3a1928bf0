package org.gyreplan.solver.gyre;

/**
 * Widths of the frictional western boundary layers.
 *
 * <pre>
 *   δ_S = r / β                  Stommel (1948): linear bottom drag r (s⁻¹) on the transport form
 *   δ_M = (A_H / β)^(1/3)        Munk (1950): lateral viscosity A_H (m² s⁻¹)
 * </pre>
 *
 * β in m⁻¹ s⁻¹, widths in m. With no-slip walls the Munk meridional transport peaks at 2π/(3√3) δ_M ≈ 1.209 δ_M and
 * first changes sign at 2π/√3 δ_M ≈ 3.628 δ_M (the "current width"); derived from ψ'''' = ψ' (CHECKS.md §8b).
 */
public final class BoundaryLayerScales {
    private BoundaryLayerScales() { }

    /** Stommel width r/β, m. */
    public static double stommelWidth(double dragRate, double beta) { return dragRate / beta; }

    /** Munk width (A_H/β)^(1/3), m. */
    public static double munkWidth(double viscosity, double beta) { return Math.cbrt(viscosity / beta); }

    /** No-slip Munk current width to the first zero of V, 2π/√3 · δ_M, m. */
    public static double munkCurrentWidth(double viscosity, double beta) {
        return 2 * Math.PI / Math.sqrt(3) * munkWidth(viscosity, beta);
    }
}
