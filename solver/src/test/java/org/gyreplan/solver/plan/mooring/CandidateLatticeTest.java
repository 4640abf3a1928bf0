package org.gyreplan.solver.plan.mooring;

import org.gyreplan.solver.grid.LonLatGrid;
import org.gyreplan.solver.grid.ScalarField;
import org.gyreplan.solver.plan.Geodesy;
import org.gyreplan.solver.plan.zones.UpwellingStatistics;
import org.gyreplan.solver.progress.CancelToken;
import org.gyreplan.solver.progress.ProgressListener;
import org.junit.jupiter.api.Test;

import java.time.Instant;
import java.util.List;

import static org.junit.jupiter.api.Assertions.*;

class CandidateLatticeTest {

    /**
     * A 10×10 grid of 0.5° cells with land in the two eastern columns; depth linear in longitude, so bilinear
     * interpolation reproduces it exactly inside the ocean (the interpolation of a linear function is exact);
     * coast distance to the nearest coastal land-cell centre by haversine; port distance by GeographicLib.
     */
    @Test
    void candidatesCarryCriteriaAndRefine() {
        LonLatGrid g0 = LonLatGrid.covering(-15, -10, 20, 25, 0.5, 6.371e6);
        boolean[] ocean = new boolean[g0.size()];
        for (int j = 0; j < g0.ny(); j++) for (int i = 0; i < g0.nx(); i++) ocean[g0.index(i, j)] = i < 8;
        LonLatGrid g = g0.withOcean(ocean);
        UpwellingStatistics s = UpwellingStatistics.on(g);
        double[] w = new double[g.size()];
        java.util.Arrays.fill(w, 1e-6);
        s.add(Instant.parse("2020-01-01T00:00:00Z"), w).add(Instant.parse("2020-01-02T00:00:00Z"), w);
        double[] depth = new double[g.size()];
        for (int j = 0; j < g.ny(); j++) for (int i = 0; i < g.nx(); i++) depth[g.index(i, j)] = ocean[g.index(i, j)] ? 1000 * (-10.25 - g.lonDeg(i)) : Double.NaN;
        ScalarField d = new ScalarField(g, depth, "depth", "m", "depth");
        List<MooringCandidate> c = CandidateLattice.fromGrid(s, List.of(), d, -10.5, 22.5, 1, ProgressListener.NONE, CancelToken.none());
        assertEquals(80, c.size());
        MooringCandidate a = c.stream().filter(x -> x.id().equals("c-3-4")).findFirst().orElseThrow();
        assertEquals(1000 * (-10.25 - a.lonDeg()), a.depthM(), 1e-9);
        assertEquals(Geodesy.sphereDistanceM(a.lonDeg(), a.latDeg(), -10.75, a.latDeg()) / 1000, a.coastDistanceKm(), 1e-9);
        assertEquals(Geodesy.distanceM(-10.5, 22.5, a.lonDeg(), a.latDeg()) / 1000, a.portDistanceKm(), 1e-9);
        assertEquals(1.0, a.persistence(), 0);
        assertEquals(0.0, a.stdMps(), 0);
        List<MooringCandidate> fine = CandidateLattice.refined(s, List.of(), d, -10.5, 22.5, 3, ProgressListener.NONE, CancelToken.none());
        assertEquals(80 * 9, fine.size());
        // sub-cell points interior to the ocean: depth still exactly linear
        for (MooringCandidate f : fine) {
            if (f.lonDeg() > -14.75 && f.lonDeg() < -11.25) assertEquals(1000 * (-10.25 - f.lonDeg()), f.depthM(), 1e-6);
        }
    }
}
