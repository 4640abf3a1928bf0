package org.gyreplan.solver.atmos;

import org.gyreplan.solver.PhysicalConstants;
import org.gyreplan.solver.ekman.EquatorialCutoff;
import org.gyreplan.solver.grid.LonLatGrid;
import org.gyreplan.solver.grid.ScalarField;
import org.gyreplan.solver.stress.WindVector;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

import static org.junit.jupiter.api.Assertions.*;

/**
 * Geostrophic wind V_g = k × ∇p/(ρₐ f) (Holton, An Introduction to Dynamic Meteorology, ch. 3; vector form as in
 * CHECKS.md §6 source S26) against CHECKS.md GEO-01…GEO-05 (derived by arithmetic; rel 1e-5).
 */
class GeostrophicWindTest {
    private static final PhysicalConstants C = PhysicalConstants.DEFAULT;

    @ParameterizedTest(name = "GEO {0} hPa/100 km at {1}° rho_a {2}")
    @CsvSource({"4, 45, 1.225, 31.663", "4, 45, 1.22, 31.793", "1, 45, 1.225, 7.9158", "1, 45, 1.22, 7.9483",
            "1, 36, 1.22, 9.5618", "1, 30, 1.225, 11.1946"})
    void geo01To05(double hPaPer100km, double lat, double rhoAir, double expected) {
        double grad = hPaPer100km * 100 / 100e3;   // Pa/m
        PhysicalConstants c = C.withRhoAir(rhoAir);
        assertEquals(expected, GeostrophicWind.of(grad, 0, lat, c).speed(), expected * 1e-5);
        assertEquals(expected, GeostrophicWind.of(0, grad, lat, c).speed(), expected * 1e-5);
        assertEquals(expected, GeostrophicWind.of(grad, 0, -lat, c).speed(), expected * 1e-5);
    }

    @Test
    void lowPressureToTheLeftInTheNorthRightInTheSouth() {
        // pressure rising eastward: low to the west
        WindVector n = GeostrophicWind.of(1e-3, 0, 45, C);
        assertTrue(n.northward() > 0 && n.eastward() == 0, "NH: northward, low (west) on the left");
        WindVector s = GeostrophicWind.of(1e-3, 0, -45, C);
        assertTrue(s.northward() < 0, "SH: southward, low (west) on the right");
        // pressure rising northward: low to the south
        WindVector w = GeostrophicWind.of(0, 1e-3, 45, C);
        assertTrue(w.eastward() < 0, "u_g = −(1/ρf)∂p/∂y: westward when pressure rises northward (low to the south, on the left)");
    }

    @Test
    void undefinedInsideCutoff() {
        assertTrue(Double.isNaN(GeostrophicWind.of(1e-3, 0, 0, C).northward()));
        assertTrue(Double.isNaN(GeostrophicWind.of(1e-3, 0, 3, C).northward()));
        assertTrue(Double.isNaN(GeostrophicWind.of(1e-3, 0, Double.NaN, C).northward()));
        assertTrue(Double.isFinite(GeostrophicWind.of(1e-3, 0, 5, C).northward()));
    }

    @Test
    void fieldFromSeaLevelPressureMatchesThePointForm() {
        // p = p₀ + G_y R φ + G_x R cos φ_ref λ: linear in λ and φ, so centred and one-sided differences are exact:
        // ∂p/∂y = G_y, ∂p/∂x = G_x cos φ_ref / cos φ (tolerance rel 1e-9, rounding of p ≈ 1e5 Pa).
        double r = C.earthRadius();
        double gy = 2e-3, gx = -1e-3, latRef = 45;
        boolean[] ocean = new boolean[8 * 6];
        java.util.Arrays.fill(ocean, true);
        ocean[3 * 8 + 4] = false;
        LonLatGrid g = new LonLatGrid(8, 6, -20, 42.5, 1, 1, r, ocean);
        double[] p = new double[g.size()];
        for (int j = 0; j < g.ny(); j++) {
            for (int i = 0; i < g.nx(); i++) {
                p[g.index(i, j)] = 101000 + gy * r * Math.toRadians(g.latDeg(j))
                        + gx * r * Math.cos(Math.toRadians(latRef)) * Math.toRadians(g.lonDeg(i));
            }
        }
        GeostrophicWind.Field f = GeostrophicWind.field(new ScalarField(g, p, "slp", "Pa", null), C, EquatorialCutoff.DEFAULT);
        assertEquals(0, f.cutoffCells());
        for (int j = 0; j < g.ny(); j++) {
            double lat = g.latDeg(j);
            WindVector expected = GeostrophicWind.of(gx * Math.cos(Math.toRadians(latRef)) / Math.cos(Math.toRadians(lat)), gy, lat, C);
            for (int i = 0; i < g.nx(); i++) {
                int k = g.index(i, j);
                if (!g.isOcean(k)) {
                    assertTrue(Double.isNaN(f.wind().eastward().values()[k]));
                    continue;
                }
                assertEquals(expected.eastward(), f.wind().eastward().values()[k], Math.abs(expected.eastward()) * 1e-9);
                assertEquals(expected.northward(), f.wind().northward().values()[k], Math.abs(expected.northward()) * 1e-9);
            }
        }
        assertEquals("m s-1", f.wind().units());
    }

    @Test
    void fieldRejectsHectopascalsAndCountsCutoff() {
        LonLatGrid g = LonLatGrid.covering(0, 4, -6, 6, 1, C.earthRadius());
        ScalarField hpa = new ScalarField(g, new double[g.size()], "msl", "hPa", null);
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> GeostrophicWind.field(hpa, C, EquatorialCutoff.DEFAULT));
        assertTrue(e.getMessage().contains("msl") && e.getMessage().contains("hPa"), e.getMessage());
        double[] p = new double[g.size()];
        java.util.Arrays.fill(p, 101325);
        GeostrophicWind.Field f = GeostrophicWind.field(new ScalarField(g, p, "msl", "Pa", null), C, EquatorialCutoff.DEFAULT);
        assertEquals(10 * 4, f.cutoffCells(), "rows −4.5 … 4.5 (10 rows × 4 columns) are inside 5°");
        for (double v : f.wind().eastward().values()) assertFalse(Double.isInfinite(v));
    }
}
