package org.gyreplan.solver.gyre;

import org.gyreplan.solver.PhysicalConstants;
import org.gyreplan.solver.grid.LonLatGrid;
import org.gyreplan.solver.progress.CancelToken;
import org.gyreplan.solver.progress.ProgressListener;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * Verification of the Munk (1950) western boundary layer ("On the wind-driven ocean circulation", J. Meteorol. 7,
 * 79–93; governing equation and no-slip walls as in Stewart, Introduction to Physical Oceanography, eqs. 11.18–11.20).
 * Boundary-layer profile for V = ∂ψ/∂x: ψ = ψ_I [1 − e^{−ξ/2}(cos(√3ξ/2) + sin(√3ξ/2)/√3)], ξ = x/δ_M,
 * δ_M = (A_H/β)^{1/3} (CHECKS.md §8b, MU-01 … MU-09, derived there, flag D).
 *
 * <p>Set-up: β-plane rectangle 4000 km × 2000 km, β = 2e-11 m⁻¹ s⁻¹, δ_M = 40 km (A_H = 1280 m² s⁻¹),
 * Δx = 5 km = δ_M/8, curl τ = −1e-7 sin(πy/b) N m⁻³. The boundary-layer solution neglects terms of relative size
 * δ_M/L = 1 % (the interior slope of ψ and the interior V) and the grid adds (Δx/δ_M)² ≈ 1.6 %: the profile checks
 * use a 4 % tolerance for that reason (measured on 2026-12-01: V_max position −0.8 %, V_max −2.3 %, zero crossing
 * −1.8 %, counter-current −1.4 % and 0.0 %, overshoot −3.4 %, ψ(ξ = 1, 2) −1.4 %, −2.2 %; free slip −1.5 %, −1.0 %).
 */
class MunkBoundaryLayerTest {
    static final double L = 4e6, BY = 2e6, BETA = 2e-11, DELTA = 40e3, AH = BETA * DELTA * DELTA * DELTA;
    static final int NXO = 799, NYO = 19;

    static GyreSolution solve(WallCondition wc) {
        LonLatGrid g = GyreTestSupport.rectangle(NXO, NYO, L, BY);
        var curl = GyreTestSupport.curlXY(g, (x, y) -> -1e-7 * Math.sin(Math.PI * y / BY));
        GyreProblem p = GyreProblem.on(g).curl(curl).munk(AH, wc).depth(1000)
                .geometry(Geometry.betaPlane(0, BETA)).build();
        return GyreSolver.solve(p, ProgressListener.NONE, CancelToken.none());
    }

    /** Faces V (m² s⁻¹) of the middle row, face f between column f and f+1 (x = (f + ½)Δx). */
    static double[] faces(GyreSolution s, int j) {
        LonLatGrid g = s.streamfunction().grid();
        double dx = L / (NXO + 1);
        double[] v = new double[g.nx() - 1];
        for (int f = 0; f < v.length; f++) {
            double a = g.isOcean(f, j) ? s.streamfunction().at(f, j) : 0.0;
            double b = g.isOcean(f + 1, j) ? s.streamfunction().at(f + 1, j) : 0.0;
            v[f] = (b - a) * 1e6 / dx;
        }
        return v;
    }

    static double psiInterior(WallCondition wc) {
        // Sverdrup interior at the western wall, row y = b/2; for no-slip integrated from x_E − δ_M (CHECKS pitfall 12)
        double vS = -1e-7 / (PhysicalConstants.RHO_SEA_WATER * BETA);
        return -vS * (L - (wc == WallCondition.NO_SLIP ? DELTA : 0));
    }

    @Test
    void widthsMatchTheCheckTable() {
        double beta30 = PhysicalConstants.DEFAULT.beta(30);
        // MU-07: δ_M at 30°N, rel 1e-3
        assertEquals(17.15e3, BoundaryLayerScales.munkWidth(1e2, beta30), 17.15e3 * 1e-3);
        assertEquals(63.18e3, BoundaryLayerScales.munkWidth(5e3, beta30), 63.18e3 * 1e-3);
        assertEquals(171.50e3, BoundaryLayerScales.munkWidth(1e5, beta30), 171.50e3 * 1e-3);
        // MU-08: width 2π/√3 δ_M at 30°N, rel 1e-3
        assertEquals(229.20e3, BoundaryLayerScales.munkCurrentWidth(5e3, beta30), 229.20e3 * 1e-3);
        // MU-09: β = 2e-11, A_H = 5e3 → 228.52 km (rel 1e-4); Stewart: "roughly 225 km" (±5 %)
        assertEquals(228.52e3, BoundaryLayerScales.munkCurrentWidth(5e3, 2e-11), 228.52e3 * 1e-4);
        assertEquals(225e3, BoundaryLayerScales.munkCurrentWidth(5e3, 2e-11), 225e3 * 0.05);
    }

    @Test
    void noSlipProfile() {
        GyreSolution s = solve(WallCondition.NO_SLIP);
        int j = (NYO + 1) / 2;
        double dx = L / (NXO + 1);
        double[] v = faces(s, j);
        double psiI = psiInterior(WallCondition.NO_SLIP);
        // maximum of V by a parabola through the largest face and its neighbours
        int fm = 0;
        for (int f = 0; f < 100; f++) if (v[f] > v[fm]) fm = f;
        double a = v[fm - 1], b = v[fm], c = v[fm + 1];
        double shift = 0.5 * (a - c) / (a - 2 * b + c);
        double xMax = (fm + 0.5 + shift) * dx;
        double vMax = b - 0.25 * (a - c) * shift;
        // MU-01: V_max at ξ = 1.20920; MU-02: V_max δ/ψ_I = 0.546293 (4 %, see class comment)
        assertEquals(1.20920, xMax / DELTA, 1.20920 * 0.04);
        assertEquals(0.546293, vMax * DELTA / psiI, 0.546293 * 0.04);
        // MU-03: first zero of V at ξ = 3.62760
        int fz = fm;
        while (v[fz] > 0) fz++;
        double xZero = (fz - 0.5 + v[fz - 1] / (v[fz - 1] - v[fz])) * dx;
        assertEquals(3.62760, xZero / DELTA, 3.62760 * 0.04);
        // MU-05: counter-current minimum V δ/ψ_I = −0.089064 at ξ = 4.8368; the interior Sverdrup V_S (= −ψ_I/L here,
        // 10 % of that minimum) is added by the composite solution and is subtracted before the comparison (5 %)
        double vS = -1e-7 / (PhysicalConstants.RHO_SEA_WATER * BETA);
        int fmin = fz;
        for (int f = fz; f < fz + 40; f++) if (v[f] < v[fmin]) fmin = f;
        double am = v[fmin - 1], bm = v[fmin], cm = v[fmin + 1];
        double sm = 0.5 * (am - cm) / (am - 2 * bm + cm);
        double vMin = bm - 0.25 * (am - cm) * sm;
        assertEquals(-0.089064, (vMin - vS) * DELTA / psiI, 0.089064 * 0.05);
        assertEquals(4.8368, (fmin + 0.5 + sm) * dx / DELTA, 4.8368 * 0.05);
        // MU-04: overshoot ψ/ψ_I = 1 + e^{−π/√3} = 1.163034 near the zero crossing
        double psiPeak = s.streamfunction().at(fz, j) * 1e6;
        assertEquals(1.163034, psiPeak / psiI, 1.163034 * 0.04);
        // MU-06: ψ/ψ_I at ξ = 1 and 2 (0.340300, 0.849426): columns x = 40 km (i = 8) and 80 km (i = 16); 4 %
        assertEquals(0.340300, s.streamfunction().at(8, j) * 1e6 / psiI, 0.340300 * 0.04);
        assertEquals(0.849426, s.streamfunction().at(16, j) * 1e6 / psiI, 0.849426 * 0.04);
        // diagnostics agree with the face analysis (zero-crossing width in km)
        var row = s.diagnostics().rows().stream().filter(r -> r.j() == j).findFirst().orElseThrow();
        assertEquals(xZero / 1e3, row.zeroCrossingWidthKm(), 1e-6);
        assertTrue(s.warnings().isEmpty(), s.warnings().toString());
    }

    @Test
    void noSlipInteriorMatchesSverdrupFromTheShiftedEasternEdge() {
        // CHECKS pitfall 12: with no-slip walls the eastern Munk layer shifts the interior; at mid-basin the solution
        // matches the Sverdrup solution integrated from x_E − δ_M (to 0.3 %), and differs from the one integrated
        // from the coast by ≈ δ_M/(L − x) = 2 %.
        GyreSolution s = solve(WallCondition.NO_SLIP);
        int j = (NYO + 1) / 2, i = (NXO + 1) / 2;
        double x = i * L / (NXO + 1);
        double vS = -1e-7 / (PhysicalConstants.RHO_SEA_WATER * BETA);
        double shifted = -vS * (L - DELTA - x), fromCoast = -vS * (L - x);
        double psi = s.streamfunction().at(i, j) * 1e6;
        assertEquals(shifted, psi, Math.abs(shifted) * 0.003);
        assertTrue(Math.abs(psi - fromCoast) > 0.015 * fromCoast);
    }

    @Test
    void freeSlipProfile() {
        // Free slip (ζ = 0 at the wall), same boundary-layer equation ψ'''' = ψ' with ψ(0) = ψ''(0) = 0, derived here:
        // ψ = ψ_I [1 − e^{−ξ/2}(cos(√3ξ/2) − sin(√3ξ/2)/√3)], V = (ψ_I/δ) e^{−ξ/2}(cos(√3ξ/2) + sin(√3ξ/2)/√3):
        // V is largest at the wall, V(0) δ/ψ_I = 1, and first vanishes at ξ = 4π/(3√3) = 2.41840.
        GyreSolution s = solve(WallCondition.FREE_SLIP);
        int j = (NYO + 1) / 2;
        double dx = L / (NXO + 1);
        double[] v = faces(s, j);
        double psiI = psiInterior(WallCondition.FREE_SLIP);
        assertTrue(v[0] > v[1] && v[1] > v[2], "free-slip V must decrease away from the wall");
        double xi0 = 0.5 * dx / DELTA;
        double expected0 = Math.exp(-xi0 / 2) * (Math.cos(Math.sqrt(3) * xi0 / 2) + Math.sin(Math.sqrt(3) * xi0 / 2) / Math.sqrt(3));
        assertEquals(expected0, v[0] * DELTA / psiI, expected0 * 0.04);
        int fz = 0;
        while (v[fz] > 0) fz++;
        double xZero = (fz - 0.5 + v[fz - 1] / (v[fz - 1] - v[fz])) * dx;
        assertEquals(4 * Math.PI / (3 * Math.sqrt(3)), xZero / DELTA, 2.41840 * 0.04);
    }
}
