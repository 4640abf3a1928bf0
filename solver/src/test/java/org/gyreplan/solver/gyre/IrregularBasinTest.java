package org.gyreplan.solver.gyre;

import org.gyreplan.solver.PhysicalConstants;
import org.gyreplan.solver.grid.LonLatGrid;
import org.gyreplan.solver.grid.ScalarField;
import org.gyreplan.solver.progress.CancelToken;
import org.gyreplan.solver.progress.ProgressListener;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * An invented irregular basin on the sphere (15°–45°N, 0.25°): ragged western and eastern coasts, a bay on the
 * east coast, a one-cell-wide inlet on the west coast, and a one-cell channel through the northern coast into a
 * small side sea; the bay mouth cuts off a small island from the ragged coast. The solver must converge, keep mass balance, and match the Sverdrup interior (Sverdrup 1947)
 * away from the boundary layers.
 */
class IrregularBasinTest {
    static LonLatGrid basin(double lon0) {
        double d = 0.25;
        int nx = 200, ny = 150;
        boolean[] o = new boolean[nx * ny];
        for (int j = 2; j < 122; j++) {
            int west = 3 + (j * 7 % 5);                   // ragged west coast
            int east = 180 - (j * 3 % 4) - (j % 11 == 0 ? 2 : 0);   // ragged east coast
            for (int i = west; i <= east; i++) o[j * nx + i] = true;
        }
        for (int j = 55; j < 63; j++) for (int i = 181; i < 196; i++) o[j * nx + i] = true;   // bay
        for (int i = 1; i < 8; i++) o[80 * nx + i] = true;                                       // one-cell inlet (west)
        for (int j = 122; j < 132; j++) o[j * nx + 90] = true;                                   // one-cell channel north
        for (int j = 132; j < 142; j++) for (int i = 84; i < 97; i++) o[j * nx + i] = true;      // side sea
        return new LonLatGrid(nx, ny, lon0, 15 + d / 2, d, d, PhysicalConstants.EARTH_RADIUS_MEAN, o);
    }

    static GyreSolution solve(LonLatGrid g, GyreProblem.Builder f) {
        ScalarField c = GyreTestSupport.curlLonLat(g, (lon, lat) -> -1e-7);
        return GyreSolver.solve(f.curl(c).depth(1000).build(), ProgressListener.NONE, CancelToken.none());
    }

    @Test
    void convergesAndMatchesSverdrupAwayFromBoundaryLayers() {
        LonLatGrid g = basin(-60);
        BasinTopology t = BasinTopology.of(g);
        assertEquals(1, t.oceanComponentCount());
        // the ragged east coast and the bay mouth leave one small land patch (rows 57–59) cut off by ocean: an island
        assertEquals(1, t.islands().size());
        assertEquals(6, t.islands().get(0).cellCount());
        GyreProblem.Builder[] configs = {GyreProblem.on(g).munk(1.5e4, WallCondition.NO_SLIP), GyreProblem.on(g).stommel(2e-6)};
        // Stommel as in the rectangular contract test (8 %); Munk no-slip: the basin is 25 % narrower than the
        // contract basin and its east coast is ragged, which widens the eastern no-slip layer's shift of the interior
        // (CHECKS pitfall 12) from 2.2 % to a measured 4.0 %: tolerance 5 %
        double[] tolerance = {0.05, 0.08};
        for (int c = 0; c < 2; c++) {
            GyreSolution s = solve(g, configs[c]);
            assertTrue(s.stats().relativeResiduals()[0] < 1e-8);
            double max = GyreSolverContract.maxAbs(s.sverdrup());
            double worst = 0;
            // rows of the bay (55–62) are left out: there Sverdrup integrates from the bay's head, 15 cells further
            // east, which the circulation cannot follow across the bay's walls
            for (int j = 35; j < 90; j++) for (int i = 60; i < 120; i++) {
                if (j >= 51 && j < 67) continue;
                worst = Math.max(worst, Math.abs(s.streamfunction().at(i, j) - s.sverdrup().at(i, j)));
            }
            assertTrue(worst < tolerance[c] * max, "config " + c + ": interior departure " + worst / max);
            assertEquals(0.0, s.diagnostics().maxNetTransportSv(), 1e-9 * max);
            // the channel and the side sea carry a finite, weak circulation
            double side = Math.abs(s.streamfunction().at(90, 136));
            assertTrue(Double.isFinite(side) && side < 0.05 * max, "side sea |ψ| = " + side);
            assertTrue(Double.isFinite(s.streamfunction().at(90, 127)));
            assertTrue(Double.isFinite(s.streamfunction().at(2, 80)));
            assertTrue(s.diagnostics().peakTransportSv() > 0);
        }
    }

    @Test
    void antimeridianBasinGivesTheSameField() {
        // longitudes are continuous (170°E … 220°E = 140°W): nothing in the physics depends on longitude itself
        GyreSolution a = solve(basin(-60), GyreProblem.on(basin(-60)).stommel(2e-6));
        LonLatGrid shifted = basin(170.125);
        assertTrue(shifted.eastDeg() > 180);
        GyreSolution b = solve(shifted, GyreProblem.on(shifted).stommel(2e-6));
        assertTrue(java.util.Arrays.equals(a.streamfunction().values(), b.streamfunction().values()));
    }
}
