package org.gyreplan.solver.stress;

import org.gyreplan.solver.PhysicalConstants;
import org.gyreplan.solver.grid.LonLatGrid;
import org.gyreplan.solver.grid.ScalarField;
import org.gyreplan.solver.grid.VectorField;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

import static org.junit.jupiter.api.Assertions.*;

/**
 * Bulk stress τ = ρₐ C_D U² against CHECKS.md §2c (derived from the §2a formulas; tolerance rel 1e-4), and the
 * direction and masking rules of the bulk formula (Stewart, Introduction to Physical Oceanography, eq. 4.2).
 */
class WindStressTest {

    @ParameterizedTest(name = "CHECKS 2c {0} rho_a={1}")
    @CsvSource({
            "large-pond-1981,     1.22,  0.03660, 0.14640, 0.87352",
            "large-pond-1981,     1.225, 0.03675, 0.14700, 0.87710",
            "trenberth-1990,      1.22,  0.03477, 0.13908, 0.87352",
            "trenberth-1990,      1.225, 0.03491, 0.13965, 0.87710",
            "large-yeager-2004,   1.22,  0.03245, 0.14346, 0.88078",
            "large-yeager-2004,   1.225, 0.03258, 0.14405, 0.88439",
            "large-yeager-2009,   1.225, 0.03258, 0.14401, 0.87452",
            "smith-1980,          1.225, 0.02833, 0.15190, 0.91630",
            "yelland-taylor-1996, 1.225, 0.03730, 0.16048, 0.98980",
            "constant:0.0013,     1.22,  0.03965, 0.15860, 0.63440",
            "constant:0.0013,     1.225, 0.03981, 0.15925, 0.63700",
            "constant:0.0026,     1.22,  0.07930, 0.31720, 1.26880"})
    void checksTable2c(String law, double rhoAir, double t5, double t10, double t20) {
        DragLaw d = DragLaws.byName(law);
        double[] speeds = {5, 10, 20};
        double[] expected = {t5, t10, t20};
        for (int n = 0; n < 3; n++) {
            // The table rounds to 5 decimals: allow that rounding or rel 1e-4, whichever is larger.
            double tol = Math.max(expected[n] * 1e-4, 5e-6);
            // wind toward the east: stress eastward
            assertEquals(expected[n], WindStress.of(speeds[n], 0, d, rhoAir).eastwardPa(), tol, law + " at " + speeds[n]);
            // wind toward the south-west: same magnitude, along the wind
            double c = speeds[n] / Math.sqrt(2);
            StressVector t = WindStress.of(-c, -c, d, rhoAir);
            assertEquals(expected[n], t.magnitudePa(), tol);
            assertEquals(t.eastwardPa(), t.northwardPa(), 1e-15);
            assertTrue(t.eastwardPa() < 0);
        }
    }

    @Test
    void ruleOfThumbTenMetresPerSecond() {
        // CHECKS.md §2c rule of thumb (D): 10 m/s gives 0.14–0.16 N/m² for all modern schemes.
        for (DragLaw law : DragLaws.speedDependent()) {
            double t = WindStress.of(10, 0, law, 1.225).eastwardPa();
            assertTrue(t > 0.135 && t < 0.185, law.id() + ": " + t);
        }
    }

    @Test
    void fieldKeepsLandNaNAndCountsOutOfRange() {
        boolean[] ocean = {true, true, false, true, true, true};
        LonLatGrid g = new LonLatGrid(3, 2, 0.5, 30.5, 1, 1, PhysicalConstants.EARTH_RADIUS_MEAN, ocean);
        double[] u = {10, 2, 10, Double.NaN, 30, -10};
        double[] v = {0, 0, 0, 1, 0, 0};
        VectorField wind = new VectorField(new ScalarField(g, u, "u10", "m s-1", null),
                new ScalarField(g, v, "v10", "m s-1", null));
        WindStress.Result r = WindStress.field(wind, LargePond1981.INSTANCE, 1.22);
        double[] tx = r.stress().eastward().values();
        assertEquals(0.14640, tx[0], 0.14640 * 1e-4);
        assertTrue(Double.isNaN(tx[2]), "land cell stays NaN even with a finite wind");
        assertTrue(Double.isNaN(tx[3]) && Double.isNaN(r.stress().northward().values()[3]), "missing wind stays NaN");
        assertEquals(-0.14640, tx[5], 0.14640 * 1e-4);
        // 2 m/s (below 4) and 30 m/s (above 25) are outside Large & Pond's 4–25 m/s; land and NaN are not counted
        assertEquals(2, r.outOfRangeCells());
        assertEquals("surface_downward_eastward_stress", r.stress().eastward().name());
        assertEquals("surface_downward_northward_stress", r.stress().northward().name());
        assertEquals("Pa", r.stress().units());
    }

    @Test
    void fieldRejectsWrongWindUnitsNamingTheField() {
        LonLatGrid g = LonLatGrid.covering(0, 2, 30, 32, 1, 6.371e6);
        VectorField knots = new VectorField(new ScalarField(g, new double[4], "u10", "knots", null),
                new ScalarField(g, new double[4], "v10", "knots", null));
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> WindStress.field(knots, LargePond1981.INSTANCE, 1.22));
        assertTrue(e.getMessage().contains("u10") && e.getMessage().contains("knots"), e.getMessage());
    }

    @Test
    void meteorologicalDirectionRoundTrip() {
        // WMO convention (common practice): direction the wind comes FROM, clockwise from north.
        WindVector north = WindVectors.fromMeteorological(10, 0);   // from the north, blowing south
        assertEquals(0.0, north.eastward(), 0.0);
        assertEquals(-10.0, north.northward(), 0.0);
        WindVector west = WindVectors.fromMeteorological(10, 270);  // from the west, blowing east
        assertEquals(10.0, west.eastward(), 0.0);
        assertEquals(0.0, west.northward(), 0.0);
        WindVector sw = WindVectors.fromMeteorological(10, 225);
        assertEquals(10 / Math.sqrt(2), sw.eastward(), 1e-12);
        assertEquals(10 / Math.sqrt(2), sw.northward(), 1e-12);
        for (double dir = 0; dir < 360; dir += 7.5) {
            WindVector w = WindVectors.fromMeteorological(8, dir);
            assertEquals(8, w.speed(), 1e-12);
            assertEquals(dir, WindVectors.fromDirectionDeg(w), 1e-9, "round trip at " + dir);
        }
        assertEquals(0.0, WindVectors.fromDirectionDeg(0, 0), 0.0, "calm reported as 0°");
        assertThrows(IllegalArgumentException.class, () -> WindVectors.fromMeteorological(-1, 0));
    }
}
