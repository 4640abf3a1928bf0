package org.gyreplan.solver.grid;

import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.*;

class LonLatGridTest {

    @Test
    void sphereAreaSumsToFourPiRSquared() {
        // Analytic: the surface of a sphere is 4πR².
        LonLatGrid g = LonLatGrid.covering(0, 360, -90, 90, 1.0, 6.371e6);
        double s = 0;
        for (int j = 0; j < g.ny(); j++) s += g.cellArea(j) * g.nx();
        assertEquals(4 * Math.PI * 6.371e6 * 6.371e6, s, 1e-9 * s);
    }

    @Test
    void metricsShrinkWithCosLatitude() {
        // dx = R cos φ Δλ (spherical geometry).
        LonLatGrid g = new LonLatGrid(10, 3, 0.5, 59.5, 1, 0.5, 6.371e6, null);
        double oneDeg = 6.371e6 * Math.toRadians(1);
        assertEquals(oneDeg * Math.cos(Math.toRadians(60.0)), g.dx(1), 1e-6);
        assertEquals(oneDeg * 0.5, g.dy(), 1e-6);
    }

    @Test
    void antimeridianLongitudesStayContinuous() {
        LonLatGrid g = new LonLatGrid(40, 10, 170.25, 10.25, 0.5, 0.5, 6.371e6, null);
        assertEquals(189.75, g.lonDeg(39), 1e-12);
        // −170.25° (= 189.75°E) maps into the grid
        assertEquals(39.0, g.columnOf(-170.25), 1e-9);
        assertEquals(g.index(39, 0), g.cellAt(-170.25, 10.25));
    }

    @Test
    void maskIsCopiedAndCounted() {
        boolean[] m = {true, false, true, true};
        LonLatGrid g = new LonLatGrid(2, 2, 0, 0, 1, 1, 1e6, m);
        m[0] = false;
        assertTrue(g.isOcean(0, 0));
        assertEquals(3, g.oceanCount());
        assertFalse(g.isOcean(-1, 0));
    }

    @Test
    void bilinearInterpolationIsExactForLinearFields() {
        LonLatGrid g = new LonLatGrid(5, 5, 0, 0, 1, 1, 1e6, null);
        double[] v = new double[25];
        for (int j = 0; j < 5; j++) for (int i = 0; i < 5; i++) v[g.index(i, j)] = 2 * i + 3 * j;
        ScalarField f = new ScalarField(g, v, "t", "1", null);
        assertEquals(2 * 1.3 + 3 * 2.6, f.interpolate(1.3, 2.6), 1e-12);
    }
}
