package org.gyreplan.solver.plan.survey;

import org.gyreplan.solver.plan.Geodesy;
import org.junit.jupiter.api.Test;
import org.locationtech.jts.geom.Geometry;

import java.util.ArrayList;
import java.util.List;

import static org.junit.jupiter.api.Assertions.*;

class TransectsTest {
    /** Straight N–S coast along 0° from 30°N to 32°N, ocean to the west; bearings wiggle ±20° around 270°. */
    static List<ShorePoint> coast() {
        List<ShorePoint> c = new ArrayList<>();
        for (int q = 0; q <= 40; q++) c.add(new ShorePoint(0, 30 + q * 0.05, 270 + (q % 2 == 0 ? 20 : -20)));
        return c;
    }

    /** Depth grows 10 m per km offshore (a synthetic shelf). */
    static final DepthModel SHELF = (lon, lat) -> lon < 0 ? 10 * Geodesy.distanceM(lon, lat, 0, lat) / 1000 : Double.NaN;

    @Test
    void transectsArePerpendicularAndEvenlySpaced() {
        TransectDesign d = TransectDesign.simple(50, 10, 100, 20);
        List<Transect> t = Transects.design(coast(), d, null, null, DepthModel.UNKNOWN);
        // coast length: 2° of meridian at ~31°N ≈ 221.8 km (GeographicLib) → origins at 0, 50, …, 200 km → 5
        double coastKm = Geodesy.distanceM(0, 30, 0, 32) / 1000;
        assertEquals((int) Math.floor(coastKm / 50) + 1, t.size());
        for (Transect x : t) {
            // smoothed bearing (circular mean of unit vectors): a full 5-point window with 3×(+20°) and 2×(−20°)
            // gives atan(tan20°/5) = 4.16°; at the coast ends the window is cut to 3 points (2:1) → atan(tan20°/3) = 6.92°
            double end = Math.toDegrees(Math.atan(Math.tan(Math.toRadians(20)) / 3));
            double inner = Math.toDegrees(Math.atan(Math.tan(Math.toRadians(20)) / 5));
            boolean atEnd = x.id() == 1 || x.id() == t.size();
            assertEquals(270, x.bearingDeg(), (atEnd ? end : inner) + 1e-6);
            // stations at 10, 30, 50, 70, 90 km (first at half the spacing)
            assertEquals(5, x.stations().size());
            for (int k = 0; k < 5; k++) {
                Stop s = x.stations().get(k);
                assertEquals(10 + 20 * k, Geodesy.distanceM(x.originLonDeg(), x.originLatDeg(), s.lonDeg(), s.latDeg()) / 1000, 1e-6);
                assertTrue(s.lonDeg() < 0, "station offshore");
            }
        }
        for (int k = 1; k < t.size(); k++) {
            assertEquals(50, Geodesy.distanceM(0, t.get(k - 1).originLatDeg(), 0, t.get(k).originLatDeg()) / 1000, 0.01);
        }
    }

    /**
     * Closer stations on the shelf (&lt; 195 m) and a target depth: 5, 10, 15, 20 (≈ 200 m), 40, 60, 80 (≈ 800 m ≥ 700) km.
     * (Shelf break set a little below 200 m so the station at 20 km, ≈ 200 m deep, is unambiguously off the shelf.)
     */
    @Test
    void shelfSpacingAndTargetDepth() {
        TransectDesign d = new TransectDesign(50, 1, 150, 700, 20, 5, 195, 5, 2);
        List<Transect> t = Transects.design(coast(), d, null, null, SHELF);
        assertEquals(1, t.size());
        List<Stop> s = t.get(0).stations();
        double[] expectedKm = {5, 10, 15, 20, 40, 60, 80};
        assertEquals(expectedKm.length, s.size());
        for (int k = 0; k < s.size(); k++) {
            assertEquals(expectedKm[k], Geodesy.distanceM(t.get(0).originLonDeg(), t.get(0).originLatDeg(),
                    s.get(k).lonDeg(), s.get(k).latDeg()) / 1000, 1e-6);
        }
        assertTrue(s.get(s.size() - 1).depthM() >= 700);
    }

    /** Only transects crossing the zone are kept; maxTransects keeps the middle ones. */
    @Test
    void zonesAndMaxCount() {
        Geometry zone = SurveyRouteTest.poly(-2, 30.8, -0.5, 30.8, -0.5, 31.0, -2, 31.0);
        List<Transect> t = Transects.design(coast(), TransectDesign.simple(50, 10, 100, 20), zone, null, DepthModel.UNKNOWN);
        assertEquals(1, t.size());
        assertEquals(30.9, t.get(0).originLatDeg(), 0.05);
        List<Transect> mid = Transects.design(coast(), TransectDesign.simple(50, 3, 100, 20), null, null, DepthModel.UNKNOWN);
        assertEquals(3, mid.size());
        assertEquals(Geodesy.direct(0, 30, 0, 50_000)[1], mid.get(0).originLatDeg(), 0.01);
    }

    /** The adapter keeps position and offshore bearing of the coast package's points. */
    @Test
    void adapterFromCoastPackage() {
        ShorePoint p = ShorePoint.of(org.gyreplan.solver.coast.CoastPoint.of("a", -12.5, 25.0, 265.0));
        assertEquals(new ShorePoint(-12.5, 25.0, 265.0), p);
    }
}
