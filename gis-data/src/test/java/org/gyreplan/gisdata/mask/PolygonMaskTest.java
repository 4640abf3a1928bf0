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
    void scanlineEqualsThePointLocatorCellByCell() {
        // Reference: JTS IndexedPointInAreaLocator per cell centre. Natural Earth 1:50m land on a global 0.5° grid,
        // on a fine grid across the antimeridian, and a polygon whose edges and vertices pass through cell centres.
        Geometry land = org.gyreplan.gisdata.basemap.LandPolygons.load(org.gyreplan.gisdata.basemap.LandPolygons.Resolution.MEDIUM_50M);
        LonLatGrid global = LonLatGrid.covering(-180, 180, -90, 90, 0.5, R);
        boolean[] a = PolygonMask.rasterise(global, land), b = PolygonMask.rasteriseByLocator(global, land);
        assertArrayEquals(b, a);
        assertTrue(PolygonMask.count(a) > 0.2 * a.length && PolygonMask.count(a) < 0.4 * a.length, "land is about 29 % of the surface");

        LonLatGrid fiji = LonLatGrid.covering(176, 182, -20, -15, 0.02, R);
        Geometry near = org.gyreplan.gisdata.basemap.LandPolygons.clip(org.gyreplan.gisdata.basemap.LandPolygons.Resolution.MEDIUM_50M,
                176, -20, 182, -15);
        assertArrayEquals(PolygonMask.rasteriseByLocator(fiji, near), PolygonMask.rasterise(fiji, near));
        assertTrue(PolygonMask.count(PolygonMask.rasterise(fiji, near)) > 100);

        LonLatGrid grid = LonLatGrid.covering(0, 10, 0, 10, 0.5, R);
        Polygon onCentres = GF.createPolygon(GF.createLinearRing(new Coordinate[] {new Coordinate(1.25, 1.25),
                new Coordinate(6.25, 1.25), new Coordinate(3.75, 6.25), new Coordinate(3.75, 3.75), new Coordinate(1.25, 1.25)}),
                new LinearRing[] {box(3.25, 2.25, 4.25, 3.25)});
        boolean[] exact = PolygonMask.rasteriseByLocator(grid, onCentres);
        assertArrayEquals(exact, PolygonMask.rasterise(grid, onCentres));
        assertTrue(exact[grid.cellAt(1.25, 1.25)], "a vertex on a cell centre counts as inside");
        assertTrue(exact[grid.cellAt(3.25, 1.25)], "a horizontal edge through centres counts as inside");
    }

    @Test
    void scanlineEqualsThePointLocatorOnStarsWithVerticesOnCellCentres() {
        // Star-shaped (hence simple) polygons whose vertices all sit on cell centres, fixed seed: many centres lie
        // exactly on vertices and edges, the hardest case for a scanline.
        LonLatGrid grid = LonLatGrid.covering(0, 20, 0, 20, 0.5, R);
        java.util.Random rnd = new java.util.Random(20261201L);
        int tested = 0;
        for (int t = 0; t < 30; t++) {
            int n = 5 + rnd.nextInt(20);
            Coordinate[] cs = new Coordinate[n + 1];
            for (int k = 0; k < n; k++) {
                double ang = 2 * Math.PI * k / n, r = 2 + rnd.nextInt(14) * 0.5;
                double x = 10.25 + Math.rint(r * Math.cos(ang) * 2) / 2, y = 10.25 + Math.rint(r * Math.sin(ang) * 2) / 2;
                cs[k] = new Coordinate(x, y);
            }
            cs[n] = cs[0];
            Polygon star = GF.createPolygon(cs);
            if (!star.isValid()) continue; // rounding may fold a narrow spike; such inputs are refused upstream
            assertArrayEquals(PolygonMask.rasteriseByLocator(grid, star), PolygonMask.rasterise(grid, star), star.toText());
            tested++;
        }
        assertTrue(tested >= 20, "only " + tested + " of 30 stars were valid");
    }

    @Test
    void longLoopsReportProgressAndStopWhenCancelled() {
        LonLatGrid grid = LonLatGrid.covering(0, 10, 0, 10, 0.1, R);
        double[] last = {-1};
        PolygonMask.rasterise(grid, rect(2, 2, 8, 8), (stage, f, m) -> last[0] = f, org.gyreplan.solver.progress.CancelToken.none());
        assertEquals(1.0, last[0], 0);
        org.gyreplan.solver.progress.CancelToken cancel = org.gyreplan.solver.progress.CancelToken.none();
        cancel.cancel();
        assertThrows(org.gyreplan.solver.progress.CancelledException.class,
                () -> PolygonMask.distanceToBoundaryKm(grid, rect(2, 2, 8, 8), org.gyreplan.solver.progress.ProgressListener.NONE, cancel));
    }

    @Test
    void pointsAreRefused() {
        LonLatGrid grid = LonLatGrid.covering(0, 1, 0, 1, 0.5, R);
        assertThrows(IllegalArgumentException.class, () -> PolygonMask.rasterise(grid, GF.createPoint(new Coordinate(0.5, 0.5))));
    }
}
