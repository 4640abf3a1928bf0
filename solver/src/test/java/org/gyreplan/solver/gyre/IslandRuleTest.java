package org.gyreplan.solver.gyre;

import org.gyreplan.solver.grid.LonLatGrid;
import org.gyreplan.solver.progress.CancelToken;
import org.gyreplan.solver.progress.ProgressListener;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * Island rule (Godfrey 1989, "A Sverdrup model of the depth-integrated flow for the world ocean allowing for island
 * circulations", Geophys. Astrophys. Fluid Dyn. 45, 89–112): the constant ψ of an island follows from the
 * circulation integral of the momentum balance around it. A small island in the smooth interior of a gyre must take
 * the value the streamfunction has there without the island (the island is then just a streamline), which is the
 * external check used here; the circulation integral itself is imposed exactly by the solver.
 */
class IslandRuleTest {
    static final double L = 2e6, BETA = 2e-11;
    static final int NXO = 199, NYO = 99;

    static LonLatGrid basin(int[][] islandCells) {
        LonLatGrid g = GyreTestSupport.rectangle(NXO, NYO, L, L);
        boolean[] m = g.oceanMask();
        for (int[] c : islandCells) m[g.index(c[0], c[1])] = false;
        return g.withOcean(m);
    }

    static GyreSolution solve(LonLatGrid g, GyreProblem.Builder friction) {
        var curl = GyreTestSupport.curlXY(g, (x, y) -> -1e-7 * Math.sin(Math.PI * y / L));
        return GyreSolver.solve(friction.curl(curl).depth(1000).geometry(Geometry.betaPlane(0, BETA)).build(),
                ProgressListener.NONE, CancelToken.none());
    }

    static int[][] block(int i0, int j0, int n) {
        int[][] c = new int[n * n][];
        for (int q = 0; q < n * n; q++) c[q] = new int[] {i0 + q % n, j0 + q / n};
        return c;
    }

    private void smallIslandsTakeTheAmbientValue(java.util.function.Function<LonLatGrid, GyreProblem.Builder> f, double tolSv) {
        LonLatGrid plain = basin(new int[0][]);
        GyreSolution ref = solve(plain, f.apply(plain));
        int[][] a = block(119, 49, 3), b = block(60, 70, 2);
        int[][] both = new int[a.length + b.length][];
        System.arraycopy(a, 0, both, 0, a.length);
        System.arraycopy(b, 0, both, a.length, b.length);
        LonLatGrid withIslands = basin(both);
        GyreSolution s = solve(withIslands, f.apply(withIslands));
        assertEquals(2, s.topology().islands().size());
        double max = GyreSolverContract.maxAbs(ref.streamfunction());
        // island order is row-major of the first cell: the block at row 49 first, then the one at row 70
        double ambientA = ref.streamfunction().at(120, 50), ambientB = (ref.streamfunction().at(60, 70)
                + ref.streamfunction().at(61, 70) + ref.streamfunction().at(60, 71) + ref.streamfunction().at(61, 71)) / 4;
        assertEquals(ambientA, s.islandValuesSv()[0], tolSv);
        assertEquals(ambientB, s.islandValuesSv()[1], tolSv);
        // far from the islands the circulation is unchanged (to 1 %)
        assertEquals(ref.streamfunction().at(20, 30), s.streamfunction().at(20, 30), 0.01 * max);
        // mass is conserved across rows through an island
        assertEquals(0.0, s.diagnostics().maxNetTransportSv(), 1e-9 * max);
    }

    @Test
    void stommelIslands() {
        // tolerance 0.05 Sv = 0.5 % of the 9.8 Sv maximum (ψ varies by ≈ 1.5 % of it across a 3-cell island)
        smallIslandsTakeTheAmbientValue(g -> GyreProblem.on(g).stommel(BETA * 50e3), 0.05);
    }

    @Test
    void munkFreeSlipIslands() {
        // Munk islands carry their own frictional layer (on their eastern side, where the fluid sees a western
        // wall); for an island of 2–3 cells with δ_M = 5 cells this moves the constant by up to ≈ δ_M |V_S|
        // = 50 km × 4.9 m²/s ≈ 0.24 Sv from the value at the island's centre (measured 0.13–0.16 Sv): tolerance 0.25 Sv.
        smallIslandsTakeTheAmbientValue(g -> GyreProblem.on(g).munk(BETA * 50e3 * 50e3 * 50e3, WallCondition.FREE_SLIP), 0.25);
    }

    @Test
    void munkNoSlipIslands() {
        smallIslandsTakeTheAmbientValue(g -> GyreProblem.on(g).munk(BETA * 50e3 * 50e3 * 50e3, WallCondition.NO_SLIP), 0.25);
    }

    @Test
    void aOneCellIslandIsInvisible() {
        // With no-slip walls the wall vorticity of a one-cell island (ocean on both sides) is the centred second
        // difference, so its circulation integral is exactly the vorticity equation of that cell without the island:
        // the island constant must equal the island-free solution there (to the solver tolerance). (A free-slip
        // one-cell island imposes ζ = 0 there and is a real obstacle.) The Stommel case holds for the same reason.
        for (WallCondition wc : new WallCondition[] {WallCondition.NO_SLIP}) {
            LonLatGrid plain = basin(new int[0][]);
            double aH = BETA * 50e3 * 50e3 * 50e3;
            GyreSolution ref = solve(plain, GyreProblem.on(plain).munk(aH, wc));
            LonLatGrid g = basin(block(120, 50, 1));
            GyreSolution s = solve(g, GyreProblem.on(g).munk(aH, wc));
            assertEquals(ref.streamfunction().at(120, 50), s.islandValuesSv()[0], 1e-5, wc.toString());
            assertEquals(ref.streamfunction().at(60, 60), s.streamfunction().at(60, 60), 1e-5, wc.toString());
        }
    }

    @Test
    void tooManyIslandsAreRefusedByName() {
        LonLatGrid g = basin(block(119, 49, 3));
        var curl = GyreTestSupport.curlXY(g, (x, y) -> -1e-7);
        GyreProblem p = GyreProblem.on(g).curl(curl).stommel(1e-6).depth(1000)
                .geometry(Geometry.betaPlane(0, BETA))
                .options(GyreProblem.Options.defaults().withMaxIslands(0)).build();
        GyreException e = assertThrows(GyreException.class, () -> GyreSolver.solve(p, ProgressListener.NONE, CancelToken.none()));
        assertEquals(GyreException.Reason.ISLAND_UNSUPPORTED, e.reason());
        assertTrue(e.getMessage().contains("island #0 (9 cells, centre"), e.getMessage());
        assertTrue(e.getMessage().contains(String.format("%.3f°E", g.lonDeg(120))), e.getMessage());
    }
}
