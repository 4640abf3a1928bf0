package org.gyreplan.solver.gyre;

import org.gyreplan.solver.PhysicalConstants;
import org.gyreplan.solver.grid.LonLatGrid;
import org.gyreplan.solver.progress.CancelToken;
import org.gyreplan.solver.progress.ProgressListener;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * Verification against the closed-form solution of Stommel (1948), "The westward intensification of wind-driven
 * ocean currents", Trans. AGU 29, 202–206, in the transport form r∇²Ψ + βΨ_x = curl τ/ρ (CHECKS.md §8a, rows
 * ST-01 … ST-08; the closed form and its numbers are derived there, flag D; the 1948 parameter values are from
 * memory, flag M). β-plane Cartesian geometry; walls at the land cell centres x = 0, λ and y = 0, b.
 */
class StommelAnalyticTest {
    static final double LAM = 1e7, B = 2 * Math.PI * 1e6, F = 0.1, R = 1e-6, BETA = 1e-11, RHO = 1000;

    static GyreSolution solve(int nxo, int nyo) {
        LonLatGrid g = GyreTestSupport.rectangle(nxo, nyo, LAM, B);
        // τ_x = −F cos(πy/b) → curl τ = −∂τ_x/∂y = −F (π/b) sin(πy/b)
        var curl = GyreTestSupport.curlXY(g, (x, y) -> -F * Math.PI / B * Math.sin(Math.PI * y / B));
        GyreProblem p = GyreProblem.on(g).curl(curl).constants(PhysicalConstants.DEFAULT.withRho0(RHO))
                .stommel(R).depth(200).geometry(Geometry.betaPlane(0, BETA)).build();
        return GyreSolver.solve(p, ProgressListener.NONE, CancelToken.none());
    }

    static double maxError(GyreSolution s) {
        LonLatGrid g = s.streamfunction().grid();
        double err = 0;
        for (int j = 1; j < g.ny() - 1; j++) for (int i = 1; i < g.nx() - 1; i++) {
            double ex = GyreTestSupport.stommel(GyreTestSupport.x(g, i), GyreTestSupport.y(g, j), LAM, B, F, R, BETA, RHO) * 1e-6;
            err = Math.max(err, Math.abs(s.streamfunction().at(i, j) - ex));
        }
        return err;
    }

    @Test
    void closedFormReproducesTheCheckTable() {
        // ST-01: δ_S = r/β = 100 km (exact)
        assertEquals(100e3, BoundaryLayerScales.stommelWidth(R, BETA), 1e-6);
        // ST-04: Ψ_max at y = b/2 is 41.909 Sv (ρ = 1000) at x = 471.14 km, rel 1e-4 (D)
        double best = 0, xBest = 0;
        for (int q = 0; q <= 200000; q++) {
            double x = q * 2e6 / 200000;
            double v = GyreTestSupport.stommel(x, B / 2, LAM, B, F, R, BETA, RHO);
            if (v > best) { best = v; xBest = x; }
        }
        assertEquals(41.909, best * 1e-6, 41.909 * 1e-4);
        assertEquals(471.14e3, xBest, 0.05e3);
    }

    @Test
    void secondOrderConvergenceToTheClosedForm() {
        // Errors on three resolutions (Δx = 78, 39, 19.5 km; Δy four times larger), observed order 2 ± 0.15
        // (second-order centred differences, DESIGN.md §4).
        double e1 = maxError(solve(127, 31));
        double e2 = maxError(solve(255, 63));
        double e3 = maxError(solve(511, 127));
        double p12 = Math.log(e1 / e2) / Math.log(2), p23 = Math.log(e2 / e3) / Math.log(2);
        assertEquals(2.0, p12, 0.15, "observed order 78→39 km: errors " + e1 + ", " + e2);
        assertEquals(2.0, p23, 0.15, "observed order 39→19.5 km: errors " + e2 + ", " + e3);
        // finest error relative to the 41.9 Sv maximum: below 0.2 %
        assertTrue(e3 < 0.002 * 41.9, "max error " + e3 + " Sv");
    }

    @Test
    void maximumTransportPositionAndWallTransport() {
        GyreSolution s = solve(511, 127);
        LonLatGrid g = s.streamfunction().grid();
        int jMid = (g.ny() - 1) / 2;                  // y = b/2 exactly
        assertEquals(B / 2, GyreTestSupport.y(g, jMid), 1e-6);
        double best = -1;
        int iBest = -1;
        for (int i = 1; i < g.nx() - 1; i++) if (s.streamfunction().at(i, jMid) > best) { best = s.streamfunction().at(i, jMid); iBest = i; }
        // ST-04 / ST-08: Ψ_max = 41.909 Sv (ST-08 found 41.911 Sv with 12.5 km finite differences), rel 1e-3
        assertEquals(41.909, best, 41.909 * 1e-3);
        // position 471.14 km within one grid step (Δx = 19.5 km)
        double dx = LAM / 512;
        assertEquals(471.14e3, GyreTestSupport.x(g, iBest), dx);
        // ST-06: western-wall transport per width V(0) = 438.64 m²/s; the discrete V on the first face (x = Δx/2) is
        // compared with the exact derivative there, rel 1 %.
        double al = BETA / R, k = Math.PI / B;
        double A = -al / 2 + Math.sqrt(al * al / 4 + k * k), Bq = -al / 2 - Math.sqrt(al * al / 4 + k * k);
        double eB = Math.exp(Bq * LAM), p = (1 - eB) / (Math.exp(A * LAM) - eB), q = 1 - p;
        double C = -F * B / (RHO * R * Math.PI);
        assertEquals(438.64, C * (p * A + q * Bq), 438.64 * 1e-4);            // ST-06 arithmetic
        double xf = dx / 2, vExact = C * (p * A * Math.exp(A * xf) + q * Bq * Math.exp(Bq * xf));
        double vNum = s.streamfunction().at(1, jMid) * 1e6 / dx;
        assertEquals(vExact, vNum, Math.abs(vExact) * 0.01);
        // diagnostics: the boundary current of the middle row carries Ψ_max northward... here southward interior
        // flow (negative curl), so the western boundary current is northward with transport +Ψ_max
        var row = s.diagnostics().rows().stream().filter(r -> r.j() == jMid).findFirst().orElseThrow();
        assertEquals(best, row.boundaryCurrentTransportSv(), 1e-9);
        // ST-05 and pitfall 10: Sverdrup scale Fπλ/(ρβb) = 50 Sv; the exact maximum is ~16 % below it.
        double sverdrupScale = F * Math.PI * LAM / (RHO * BETA * B) * 1e-6;
        assertEquals(50.0, sverdrupScale, 50.0 * 1e-6);
        assertEquals(sverdrupScale * (1 - dx / LAM), s.sverdrup().at(1, jMid), 50.0 * 1e-4);
        assertEquals(41.909 / 50.0, best / sverdrupScale, 2e-3);
    }
}
