package org.gyreplan.app.desktop.map;

import org.gyreplan.solver.grid.LonLatGrid;
import org.gyreplan.solver.grid.ScalarField;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.EnumSource;

import java.util.List;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** Projections, viewport, contours, colour scales and number formats of the map (no JavaFX toolkit needed). */
class MapGeometryTest {

    @Test
    void mercatorOrdinateMatchesTheSphericalFormula() {
        // Snyder (1987), USGS Prof. Paper 1395, eq. 7-2: y = R ln tan(π/4 + φ/2); with R = 180/π "projected degrees".
        // ln tan(67.5°) = 0.881374 and ln tan(75°) = 1.316958 (arithmetic from the formula); tolerance: rounding 1e-6.
        MapProjection m = MapProjection.MERCATOR;
        assertEquals(Math.toDegrees(0.881374), m.y(45), 1e-4);
        assertEquals(Math.toDegrees(1.316958), m.y(60), 1e-4);
        assertEquals(0.0, m.y(0), 1e-12);
        assertEquals(-m.y(30), m.y(-30), 1e-12, "odd in latitude");
        assertEquals(m.y(MapProjection.MAX_MERCATOR_LAT), m.y(89.9), 1e-12, "clamped near the pole");
    }

    @ParameterizedTest
    @EnumSource(MapProjection.class)
    void projectionsInvertToRoundOff(MapProjection p) {
        for (double lat = -80; lat <= 80; lat += 7.3) assertEquals(lat, p.lat(p.y(lat)), 1e-9);
        for (double lon = -200; lon <= 200; lon += 13.1) assertEquals(lon, p.lon(p.x(lon)), 1e-12);
    }

    @ParameterizedTest
    @EnumSource(MapProjection.class)
    void zoomKeepsThePointUnderTheCursorFixed(MapProjection p) {
        // invariant of "zoom about the cursor": the geographic point under (sx, sy) stays there (round-off)
        MapViewport v = new MapViewport(p);
        v.setSize(900, 600);
        v.fit(-60, -20, 15, 45, 0.05);
        double sx = 613, sy = 177;
        double lon = v.lonAt(sx), lat = v.latAt(sy);
        v.zoomAbout(2.7, sx, sy);
        assertEquals(sx, v.screenX(lon), 1e-6);
        assertEquals(sy, v.screenY(lat), 1e-6);
        v.zoomAbout(1 / 5.0, sx, sy);
        assertEquals(sx, v.screenX(lon), 1e-6);
        assertEquals(sy, v.screenY(lat), 1e-6);
    }

    @Test
    void panMovesTheMapWithTheCursor() {
        MapViewport v = new MapViewport(MapProjection.MERCATOR);
        v.setSize(800, 500);
        v.fit(-10, 10, 30, 50, 0);
        double lon = v.lonAt(300), lat = v.latAt(200);
        v.pan(37, -21);
        assertEquals(337, v.screenX(lon), 1e-6);
        assertEquals(179, v.screenY(lat), 1e-6);
    }

    @Test
    void fitShowsTheWholeBox() {
        MapViewport v = new MapViewport(MapProjection.EQUIRECTANGULAR);
        v.setSize(1000, 400);
        v.fit(-60, -20, 15, 45, 0.05);
        assertTrue(v.screenX(-60) >= 0 && v.screenX(-20) <= 1000);
        assertEquals(20.0, v.screenY(45), 1e-9, "height limits: 5 % margin of 400 px");
        assertEquals(380.0, v.screenY(15), 1e-9);
    }

    @Test
    void contoursOfAParaboloidAreCircles() {
        // f = (λ−λ0)² + (φ−φ0)² on a 0.25° grid: the level r² is the circle of radius r (analytic). Linear
        // interpolation along an edge of length h errs by at most h²/(8r) ≈ 0.0016° for r = 5, h = 0.25; allow 0.005°.
        LonLatGrid g = LonLatGrid.covering(-20, 20, -20, 20, 0.25, 6.371e6);
        double[] v = new double[g.size()];
        for (int j = 0; j < g.ny(); j++) for (int i = 0; i < g.nx(); i++) {
            double x = g.lonDeg(i) - 1.3, y = g.latDeg(j) + 0.7;
            v[g.index(i, j)] = x * x + y * y;
        }
        ScalarField f = new ScalarField(g, v, "f", "1", "paraboloid");
        List<double[]> segs = MarchingSquares.segments(f, 25.0);
        double length = 0;
        for (double[] s : segs) {
            assertEquals(5.0, Math.hypot(s[0] - 1.3, s[1] + 0.7), 0.005);
            assertEquals(5.0, Math.hypot(s[2] - 1.3, s[3] + 0.7), 0.005);
            length += Math.hypot(s[2] - s[0], s[3] - s[1]);
        }
        // an inscribed polygon is shorter than the circle by O(h²); 0.5 % covers it
        assertEquals(2 * Math.PI * 5, length, 0.005 * 2 * Math.PI * 5);
    }

    @Test
    void contoursSkipCellsWithLand() {
        LonLatGrid g = LonLatGrid.covering(0, 4, 0, 4, 1, 6.371e6);
        double[] v = new double[g.size()];
        for (int j = 0; j < 4; j++) for (int i = 0; i < 4; i++) v[g.index(i, j)] = i;   // level 1.5 crosses column 1–2
        assertEquals(3, MarchingSquares.segments(new ScalarField(g, v.clone(), "f", "1", null), 1.5).size());
        v[g.index(2, 1)] = Double.NaN;                                                  // two squares touch it
        assertEquals(1, MarchingSquares.segments(new ScalarField(g, v, "f", "1", null), 1.5).size());
    }

    @Test
    void niceLevelsAndSteps() {
        assertArrayEquals(new double[] {-20, -10, 0, 10, 20}, MarchingSquares.niceLevels(-23, 27, 5), 1e-12);
        assertEquals(2.5e-7, MarchingSquares.niceStep(2.1e-7), 1e-20);
        assertEquals(500, MarchingSquares.niceStep(312), 1e-12);
    }

    @Test
    void divergingScaleIsCentredOnZero() {
        ColourScale s = new ColourScale(ColourScale.Kind.DIVERGING, -3e-7, 1e-7, 1);
        assertEquals(-3e-7, s.min(), 0);
        assertEquals(3e-7, s.max(), 0);
        assertEquals(0.5, s.fraction(0), 1e-12);
        var zero = s.color(0);
        assertTrue(zero.getRed() > 0.9 && zero.getGreen() > 0.9 && zero.getBlue() > 0.9, "white at zero: " + zero);
        assertTrue(s.color(-3e-7).getBlue() > s.color(-3e-7).getRed(), "negative is blue");
        assertTrue(s.color(3e-7).getRed() > s.color(3e-7).getBlue(), "positive is red");
        assertEquals(0, s.argb(Double.NaN), "NaN transparent");
        s.setRange(0, 5);
        assertEquals(-5, s.min(), 0, "still symmetric after the user sets a range");
    }

    @Test
    void formatsAreShortAndLocaleFree() {
        assertEquals("0.2", Format.tick(0.2));
        assertEquals("-22.5", Format.tick(-22.5));
        assertEquals("-1e-7", Format.tick(-1.0e-7));
        assertEquals("2.5e-7", Format.tick(2.5e-7));
        assertEquals("262.5", Format.number(262.5));
        assertEquals("15.5°W", Format.tickLon(-15.5));
        assertEquals("170°W", Format.tickLon(190));
        assertEquals("34.250° S", Format.lat(-34.25));
    }

    @Test
    void arrowStrideGrowsWhenZoomingOut() {
        LonLatGrid g = LonLatGrid.covering(-60, -20, 15, 45, 0.5, 6.371e6);
        MapViewport v = new MapViewport(MapProjection.EQUIRECTANGULAR);
        v.setSize(900, 600);
        v.fit(-60, -20, 15, 45, 0);
        int coarse = VectorLayer.stride(g, v);
        // 0.5° cells at 22.5 px/deg are 11.25 px wide: every 3rd cell keeps arrows ≥ 30 px apart
        assertEquals(3, coarse);
        v.zoomAbout(8, 450, 300);
        assertEquals(1, VectorLayer.stride(g, v));
    }
}
