package org.gyreplan.solver.ekman;

import org.gyreplan.solver.PhysicalConstants;
import org.gyreplan.solver.grid.LonLatGrid;
import org.gyreplan.solver.grid.ScalarField;
import org.gyreplan.solver.grid.VectorField;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

import static org.junit.jupiter.api.Assertions.*;

/**
 * Ekman pumping wₑ = curl τ/(ρ₀f) + βτₓ/(ρ₀f²), positive upward, against CHECKS.md §3 EP-01…EP-05 (derived by
 * arithmetic; formula Stewart, Introduction to Physical Oceanography, ch. 9 and 12, with the opposite sign to his
 * w_E(0)); tolerance rel 1e-4 (EP-05: rel 1e-3).
 */
class EkmanPumpingTest {
    private static final PhysicalConstants C = PhysicalConstants.DEFAULT;
    private static final double DAY = 86400;

    @ParameterizedTest(name = "EP curl term at {0}°N")
    @CsvSource({"30, 1.3379e-6, 0.1156", "45, 9.4604e-7, 0.0817"})
    void ep01And02CurlTerm(double lat, double w, double perDay) {
        assertEquals(w, EkmanPumping.of(1e-7, 0, lat, C), w * 1e-4);
        assertEquals(perDay, EkmanPumping.of(1e-7, 0, lat, C) * DAY, 5e-5, "m/day, 4-decimal rounding");
        assertEquals(-w, EkmanPumping.of(1e-7, 0, -lat, C), w * 1e-4, "positive curl pumps down in the SH");
    }

    @ParameterizedTest(name = "EP beta term at {0}°N")
    @CsvSource({"30, 3.6373e-7, 0.0314", "45, 1.4849e-7, 0.0128"})
    void ep03And04BetaTerm(double lat, double w, double perDay) {
        assertEquals(w, EkmanPumping.of(0, 0.1, lat, C), w * 1e-4);
        assertEquals(perDay, EkmanPumping.of(0, 0.1, lat, C) * DAY, 5e-5);
        // β τₓ/(ρ₀ f²) is even in φ: an eastward stress pumps up in both hemispheres
        assertEquals(w, EkmanPumping.of(0, 0.1, -lat, C), w * 1e-4);
    }

    @Test
    void ep05CoastalWindDropOffOnAGrid() {
        // EP-05: alongshore (northward) stress rising from −0.1 N/m² offshore to 0 at a N–S coast over 50 km at 36°N
        // (equatorward wind weakening toward the coast): curl = 2e-6 N/m³ → 1.967 m/day upward (rel 1e-3).
        double r = C.earthRadius();
        int nx = 40, ny = 3;
        double dLatDeg = 0.05;
        double dLonDeg = Math.toDegrees(2500.0 / (r * Math.cos(Math.toRadians(36))));   // 2.5 km at 36°N
        boolean[] ocean = new boolean[nx * ny];
        for (int j = 0; j < ny; j++) for (int i = 0; i < nx; i++) ocean[j * nx + i] = i < 32;   // land from column 32
        LonLatGrid g = new LonLatGrid(nx, ny, -125, 36 - dLatDeg, dLonDeg, dLatDeg, r, ocean);
        double[] tx = new double[g.size()], ty = new double[g.size()];
        int rampStart = 12, coast = 32;    // ramp over columns 12…32 (20 cells × 2.5 km = 50 km), coast at the land edge
        for (int j = 0; j < ny; j++) {
            for (int i = 0; i < nx; i++) {
                int k = g.index(i, j);
                if (!g.isOcean(k)) { tx[k] = Double.NaN; ty[k] = Double.NaN; continue; }
                double x = g.dx(j) * (i - rampStart);                 // metres east of the ramp start in this row
                double ramp = 50e3;                                   // 50 km (20 cells at 36°N)
                ty[k] = x <= 0 ? -0.1 : -0.1 + 0.1 * x / ramp;
            }
        }
        VectorField stress = new VectorField(new ScalarField(g, tx, "tx", "Pa", null), new ScalarField(g, ty, "ty", "Pa", null));
        EkmanPumping.Field f = EkmanPumping.field(stress, C, EquatorialCutoff.DEFAULT);
        int j = 1;   // the row at exactly 36°N
        assertEquals(36.0, g.latDeg(j), 1e-12);
        for (int i = rampStart + 1; i < coast; i++) {
            int k = g.index(i, j);
            assertEquals(2e-6, f.stressCurl().values()[k], 2e-6 * 1e-9, "curl inside the ramp, column " + i);
            assertEquals(1.967, f.pumping().values()[k] * DAY, 1.967 * 1e-3, "pumping, column " + i);
        }
        for (int i = 1; i < rampStart; i++) {
            assertEquals(0.0, f.pumping().values()[g.index(i, j)], 1e-18, "no curl offshore of the ramp");
        }
        for (int i = coast; i < nx; i++) assertTrue(Double.isNaN(f.pumping().values()[g.index(i, j)]), "land");
        assertEquals(0, f.cutoffCells());
        assertEquals("ekman_pumping_velocity", f.pumping().name());
        assertEquals("m s-1", f.pumping().units());
        assertTrue(f.pumping().longName().contains("positive upward"));
        assertEquals("N m-3", f.stressCurl().units());
    }

    @Test
    void uniformZonalStressOnTheSphere() {
        // Uniform τₓ: curl τ = τₓ tan φ / R analytically (SphericalOperatorsTest), so
        // wₑ = τₓ tan φ/(R ρ₀ f) + β τₓ/(ρ₀ f²); the discrete curl carries rel. error Δφ²/6 (5e-5 at 1°): tol rel 1e-4.
        LonLatGrid g = LonLatGrid.covering(150, 170, 10, 50, 1.0, C.earthRadius());
        double[] tx = new double[g.size()], ty = new double[g.size()];
        java.util.Arrays.fill(tx, 0.1);
        VectorField stress = new VectorField(new ScalarField(g, tx, "tx", "Pa", null), new ScalarField(g, ty, "ty", "Pa", null));
        EkmanPumping.Field f = EkmanPumping.field(stress, C, EquatorialCutoff.DEFAULT);
        for (int j = 1; j < g.ny() - 1; j++) {
            double lat = g.latDeg(j);
            double expected = EkmanPumping.of(0.1 * Math.tan(Math.toRadians(lat)) / C.earthRadius(), 0.1, lat, C);
            for (int i = 0; i < g.nx(); i++) {
                assertEquals(expected, f.pumping().values()[g.index(i, j)], Math.abs(expected) * 1e-4);
            }
        }
        // zero stress: exactly zero pumping everywhere
        java.util.Arrays.fill(tx, 0.0);
        EkmanPumping.Field z = EkmanPumping.field(stress, C, EquatorialCutoff.DEFAULT);
        for (double w : z.pumping().values()) assertEquals(0.0, w, 0.0);
    }

    @Test
    void equatorialBandIsMaskedAndCountedNeverInfinite() {
        boolean[] ocean = new boolean[6 * 21];
        java.util.Arrays.fill(ocean, true);
        ocean[6 * 10 + 2] = false;   // a land cell on the equator row
        LonLatGrid g = new LonLatGrid(6, 21, 0.5, -10, 1, 1, C.earthRadius(), ocean);   // rows −10 … 10
        double[] tx = new double[g.size()], ty = new double[g.size()];
        for (int j = 0; j < g.ny(); j++) {
            for (int i = 0; i < g.nx(); i++) {
                int k = g.index(i, j);
                tx[k] = g.isOcean(k) ? -0.05 * Math.cos(Math.toRadians(3 * g.latDeg(j))) : Double.NaN;
                ty[k] = g.isOcean(k) ? 0.02 * Math.sin(Math.toRadians(10 * i)) : Double.NaN;
            }
        }
        VectorField stress = new VectorField(new ScalarField(g, tx, "tx", "Pa", null), new ScalarField(g, ty, "ty", "Pa", null));
        EkmanPumping.Field f = EkmanPumping.field(stress, C, EquatorialCutoff.DEFAULT);
        // rows −4 … 4 (9 rows × 6 cells) minus the land cell
        assertEquals(9 * 6 - 1, f.cutoffCells());
        for (int j = 0; j < g.ny(); j++) {
            for (int i = 0; i < g.nx(); i++) {
                int k = g.index(i, j);
                double w = f.pumping().values()[k];
                assertFalse(Double.isInfinite(w));
                boolean inside = Math.abs(g.latDeg(j)) < 5;
                if (inside || !g.isOcean(k)) assertTrue(Double.isNaN(w), "masked " + i + "," + j);
                else assertTrue(Double.isFinite(w), "defined " + i + "," + j);
            }
        }
        // point form at the special latitudes: 0, ±cut-off, NaN
        assertTrue(Double.isNaN(EkmanPumping.of(1e-7, 0.1, 0, C)));
        assertTrue(Double.isNaN(EkmanPumping.of(1e-7, 0.1, Double.NaN, C)));
        assertTrue(Double.isFinite(EkmanPumping.of(1e-7, 0.1, 5, C)));
        assertTrue(Double.isFinite(EkmanPumping.of(1e-7, 0.1, -5, C)));
    }
}
