package org.gyreplan.solver.gyre;

import org.gyreplan.solver.PhysicalConstants;
import org.gyreplan.solver.grid.LonLatGrid;
import org.gyreplan.solver.grid.ScalarField;
import org.gyreplan.solver.grid.VectorField;
import org.gyreplan.solver.progress.CancelToken;
import org.gyreplan.solver.progress.CancelledException;
import org.gyreplan.solver.progress.ProgressListener;
import org.junit.jupiter.api.Test;

import java.util.ArrayList;
import java.util.List;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** Interface behaviour: explicit choices, progress and cancel, determinism, metadata, stress forcing, warnings. */
class GyreSolverBehaviourTest {
    static LonLatGrid grid() { return GyreSolverContract.basin(true); }

    static ScalarField curl(LonLatGrid g) { return GyreTestSupport.curlLonLat(g, (lon, lat) -> -1e-7); }

    @Test
    void munkNeedsAnExplicitWallCondition() {
        LonLatGrid g = grid();
        GyreException e = assertThrows(GyreException.class,
                () -> GyreProblem.on(g).curl(curl(g)).munk(1e4, null).depth(1000).build());
        assertEquals(GyreException.Reason.BAD_PARAMETER, e.reason());
        assertTrue(e.getMessage().contains("wall condition"), e.getMessage());
        GyreException noDepth = assertThrows(GyreException.class, () -> GyreProblem.on(g).curl(curl(g)).stommel(1e-6).build());
        assertEquals(GyreException.Reason.BAD_PARAMETER, noDepth.reason());
        GyreException noFriction = assertThrows(GyreException.class, () -> GyreProblem.on(g).curl(curl(g)).depth(1000).build());
        assertEquals(GyreException.Reason.BAD_PARAMETER, noFriction.reason());
        ScalarField wrongUnits = curl(g).renamed("curl", "Pa", "x");
        GyreException units = assertThrows(GyreException.class, () -> GyreProblem.on(g).curl(wrongUnits).stommel(1e-6).depth(1000).build());
        assertEquals(GyreException.Reason.BAD_FORCING, units.reason());
        assertTrue(units.getMessage().contains("'curl'") && units.getMessage().contains("N m-3"), units.getMessage());
    }

    @Test
    void undefinedForcingOnOceanIsRefusedWithTheCell() {
        LonLatGrid g = grid();
        ScalarField c = curl(g);
        c.values()[g.index(10, 20)] = Double.NaN;
        GyreProblem p = GyreProblem.on(g).curl(c).stommel(2e-6).depth(1000).build();
        GyreException e = assertThrows(GyreException.class, () -> GyreSolver.solve(p, null, null));
        assertEquals(GyreException.Reason.BAD_FORCING, e.reason());
        assertTrue(e.getMessage().contains("(10,20)") && e.getMessage().contains("wind_stress_curl"), e.getMessage());
    }

    @Test
    void progressIsReportedAndCancelIsHonoured() {
        LonLatGrid g = grid();
        GyreProblem p = GyreProblem.on(g).curl(curl(g)).munk(1.5e4, WallCondition.NO_SLIP).depth(1000).build();
        List<Double> fractions = new ArrayList<>();
        ProgressListener l = (stage, f, msg) -> { if (stage.startsWith(GyreSolver.STAGE)) fractions.add(f); };
        GyreSolver.solve(p, l, CancelToken.none());
        assertTrue(fractions.size() >= 4, "progress calls: " + fractions);
        assertEquals(1.0, fractions.get(fractions.size() - 1), 0.0);
        CancelToken token = new CancelToken();
        ProgressListener cancelling = (stage, f, msg) -> { if (msg.startsWith("iteration")) token.cancel(); };
        assertThrows(CancelledException.class, () -> GyreSolver.solve(p, cancelling, token));
    }

    @Test
    void resultsAreBitIdenticalForAnyThreadCount() {
        LonLatGrid g = grid();
        GyreProblem.Builder b = GyreProblem.on(g).curl(curl(g)).stommel(1e-6).munk(1.5e4, WallCondition.NO_SLIP).depth(1000);
        GyreSolution one = GyreSolver.solve(b.options(GyreProblem.Options.defaults().withThreads(1)).build(), null, null);
        GyreSolution three = GyreSolver.solve(b.options(GyreProblem.Options.defaults().withThreads(3)).build(), null, null);
        assertArrayEquals(one.streamfunction().values(), three.streamfunction().values());
        assertArrayEquals(one.stats().iterations(), three.stats().iterations());
    }

    @Test
    void outputMetadataStatesNameUnitsAndSign() {
        LonLatGrid g = grid();
        GyreSolution s = GyreSolver.solve(GyreProblem.on(g).curl(curl(g)).stommel(2e-6).depth(1000).build(), null, null);
        assertEquals("ocean_barotropic_streamfunction", s.streamfunction().name());   // CF standard name
        assertEquals("Sv", s.streamfunction().units());
        assertTrue(s.streamfunction().longName().contains("northward transport = d(psi)/dx"));
        assertEquals("Sv", s.sverdrup().units());
        // 0.25°, δ_S ≥ 90 km ≥ 3 cells: no resolution warning
        assertTrue(s.warnings().isEmpty(), s.warnings().toString());
        // diagnostics: speed = transport per width / depth
        var pk = s.diagnostics().peak();
        assertEquals(pk.peakTransportPerWidth() / 1000, pk.peakSpeedMs(), 1e-12);
        assertTrue(pk.eFoldingWidthKm() < pk.zeroCrossingWidthKm());
    }

    @Test
    void resolutionGuardWarnsWhenTheLayerIsUnderResolved() {
        LonLatGrid g = grid();
        // r = 2e-7 s⁻¹ → δ_S ≈ 10 km < 3 cells of ≈ 20–27 km
        GyreSolution s = GyreSolver.solve(GyreProblem.on(g).curl(curl(g)).stommel(2e-7).depth(1000).build(), null, null);
        assertTrue(s.warnings().stream().anyMatch(w -> w.startsWith("resolution") && w.contains("Stommel r/β")), s.warnings().toString());
    }

    @Test
    void stressForcingMatchesItsAnalyticCurl() {
        // τ_x = −0.1 cos(π(φ − 15°)/30°) Pa; on the sphere curl τ = −(1/(R cos φ)) ∂(τ_x cos φ)/∂φ
        //   = −(1/R) [0.6 sin a + 0.1 cos a tan φ]·(sign as below), a = π(φ − 15°)/30° (elementary calculus)
        LonLatGrid g = grid();
        double R = g.radius();
        double[] tx = new double[g.size()], ty = new double[g.size()];
        for (int j = 0; j < g.ny(); j++) for (int i = 0; i < g.nx(); i++) {
            double a = Math.PI * (g.latDeg(j) - 15) / 30;
            tx[g.index(i, j)] = -0.1 * Math.cos(a);
        }
        VectorField tau = new VectorField(new ScalarField(g, tx, "tauu", "Pa", "eastward stress"),
                new ScalarField(g, ty, "tauv", "Pa", "northward stress"));
        ScalarField exact = GyreTestSupport.curlLonLat(g, (lon, lat) -> {
            double a = Math.PI * (lat - 15) / 30;
            return -(0.6 * Math.sin(a) + 0.1 * Math.cos(a) * Math.tan(Math.toRadians(lat))) / R;
        });
        GyreSolution fromStress = GyreSolver.solve(GyreProblem.on(g).stress(tau).stommel(2e-6).depth(1000).build(), null, null);
        GyreSolution fromCurl = GyreSolver.solve(GyreProblem.on(g).curl(exact).stommel(2e-6).depth(1000).build(), null, null);
        double max = GyreSolverContract.maxAbs(fromCurl.streamfunction());
        double worst = 0;
        for (int k = 0; k < g.size(); k++) {
            double a = fromStress.streamfunction().values()[k], b = fromCurl.streamfunction().values()[k];
            if (Double.isFinite(b)) worst = Math.max(worst, Math.abs(a - b));
        }
        // centred differences of τ: relative error O((π Δφ/30°)²/6) ≈ 1e-4; one-sided at the grid edge rows
        assertTrue(worst < 2e-3 * max, "stress vs curl forcing differ by " + worst / max);
    }
}
