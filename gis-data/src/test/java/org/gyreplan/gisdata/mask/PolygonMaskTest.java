package org.gyreplan.gisdata.mask;

import org.gyreplan.solver.grid.LonLatGrid;
import org.junit.jupiter.api.Test;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.GeometryFactory;
import org.locationtech.jts.geom.LinearRing;
import org.locationtech.jts.geom.Polygon;

import static org.junit.jupiter.api.Assertions.*;

/**
 * Masks from polygons whose edges lie on cell edges, so the expected cell counts follow by hand:
 * (width / spacing) × (height / spacing).
 */
class PolygonMaskTest {
    static final GeometryFactory GF = new GeometryFactory();
    static final double R = 6.371e6;

    static LinearRing box(double w, double s, double e, double n) {
        return GF.createLinearRing(new Coordinate[] {new Coordinate(w, s), new Coordinate(e, s), new Coordinate(e, n),
                new Coordinate(w, n), new Coordinate(w, s)});
    }

    static Polygon rect(double w, double s, double e, double n) { return GF.createPolygon(box(w, s, e, n)); }

    @Test
    void rectangleHasTheExpectedCellCount() {
        LonLatGrid grid = LonLatGrid.covering(0, 20, 0, 10, 0.5, R);
        boolean[] m = PolygonMask.rasterise(grid, rect(2, 1, 7, 4));
        assertEquals(10 * 6, PolygonMask.count(m)); // (7−2)/0.5 columns × (4−1)/0.5 rows
        assertTrue(m[grid.cellAt(2.25, 1.25)]);
        assertTrue(m[grid.cellAt(6.75, 3.75)]);
        assertFalse(m[grid.cellAt(7.25, 3.75)]);
        assertFalse(m[grid.cellAt(1.75, 1.25)]);
    }

    @Test
    void holeCellsAreExcluded() {
        LonLatGrid grid = LonLatGrid.covering(0, 20, 0, 10, 0.5, R);
        Polygon withIsland = GF.createPolygon(box(2, 1, 7, 4), new LinearRing[] {box(4, 2, 5, 3)});
        LonLatGrid basin = PolygonMask.applyBasin(grid, withIsland);
        assertEquals(60 - 4, basin.oceanCount()); // the 1°×1° island covers 2 × 2 cells
        assertFalse(basin.isOcean(grid.cellAt(4.25, 2.25)));
        assertTrue(basin.isOcean(grid.cellAt(3.75, 2.25)));

        LonLatGrid open = PolygonMask.excludeZones(basin, rect(2, 1, 3, 4)); // a 1° × 3° zone: 2 × 6 cells
        assertEquals(56 - 12, open.oceanCount());
    }

    @Test
    void basinAcrossTheAntimeridianInEveryForm() {
        // grid 170°E … 190° (= 170°W), 1°; basin 175°E … 176°W (= 184°), 2°S … 2°N: 9 columns × 4 rows
        LonLatGrid grid = LonLatGrid.covering(170, 190, -5, 5, 1.0, R);
        Geometry continuous = rect(175, -2, 184, 2);
        Geometry split = GF.createMultiPolygon(new Polygon[] {rect(175, -2, 180, 2), rect(-180, -2, -176, 2)});
        Geometry negative = rect(175 - 360, -2, 184 - 360, 2);
        for (Geometry g : new Geometry[] {continuous, split, negative}) {
            boolean[] m = PolygonMask.rasterise(grid, g);
            assertEquals(9 * 4, PolygonMask.count(m), g.toText());
            assertTrue(m[grid.index(13, 5)], "cell at 183.5°, 0.5° is inside: " + g.toText());
            assertFalse(m[grid.index(14, 5)], "cell at 184.5° is outside: " + g.toText());
        }
        // a grid in −180…180 form with a basin given beyond 180°
        LonLatGrid west = LonLatGrid.covering(-20, 20, -5, 5, 1.0, R);
        assertEquals(5 * 4, PolygonMask.count(PolygonMask.rasterise(west, rect(350, -2, 355, 2))));
    }

    @Test
    void distanceToBoundaryMatchesSphericalTrigonometry() {
        LonLatGrid grid = LonLatGrid.covering(0, 10, 40, 50, 1.0, R);
        double[] d = PolygonMask.distanceToBoundaryKm(grid, rect(0, 40, 10, 50));
        // Cell (4.5°E, 44.5°N): the nearest edge is the meridian 0°. Distance from a point to a meridian 4.5° away,
        // right spherical triangle (Napier's rules, e.g. Todhunter 1886 §62): sin d = sin Δλ · cos φ.
        double exact = Math.asin(Math.sin(Math.toRadians(4.5)) * Math.cos(Math.toRadians(44.5))) * R / 1000;
        assertEquals(exact, d[grid.cellAt(4.5, 44.5)], exact * 2e-3); // 0.2 %: documented approximation
        assertTrue(d[grid.cellAt(4.5, 44.5)] >= exact - 1e-9, "never below the exact distance");
        // Cell (4.5°E, 40.5°N): the south edge (parallel 40°) 0.5° away along the meridian: R · 0.5° exactly
        assertEquals(R / 1000 * Math.toRadians(0.5), d[grid.cellAt(4.5, 40.5)], 1e-9);
    }

    @Test
    void pointsAreRefused() {
        LonLatGrid grid = LonLatGrid.covering(0, 1, 0, 1, 0.5, R);
        assertThrows(IllegalArgumentException.class, () -> PolygonMask.rasterise(grid, GF.createPoint(new Coordinate(0.5, 0.5))));
    }
}
