package org.gyreplan.solver.coast;

import net.sf.geographiclib.Geodesic;
import net.sf.geographiclib.GeodesicData;
import net.sf.geographiclib.GeodesicLine;
import net.sf.geographiclib.GeodesicMask;
import org.gyreplan.solver.PhysicalConstants;
import org.junit.jupiter.api.Test;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.GeometryFactory;
import org.locationtech.jts.geom.LineString;
import org.locationtech.jts.geom.Polygon;

import java.util.List;

import static org.junit.jupiter.api.Assertions.*;

/**
 * Coast orientation, offshore normals, index points and snapping. References: geodesics on the sphere from
 * GeographicLib (Karney 2013, J. Geodesy 87, 43–55) as an independent implementation; analytic geometry (a
 * great-circle coast has the bearing of its geodesic; the normals of a circle point at its centre).
 */
class CoastlineTest {
    private static final PhysicalConstants C = PhysicalConstants.DEFAULT;
    private static final GeometryFactory GF = new GeometryFactory();
    private static final Geodesic SPHERE = new Geodesic(C.earthRadius(), 0.0);

    private static double angleDiff(double a, double b) {
        double d = (a - b) % 360.0;
        if (d > 180) d -= 360;
        if (d < -180) d += 360;
        return Math.abs(d);
    }

    @Test
    void meridionalCoastWithOceanToTheWestHasExactBearings() {
        // A coast along 120°W from 30°N to 40°N, ocean to the west (left when walking north).
        LineString line = GF.createLineString(new Coordinate[] {new Coordinate(-120, 30), new Coordinate(-120, 35),
                new Coordinate(-120, 40)});
        Coastline c = Coastline.ofLand(line, OceanSide.LEFT, C);
        for (CoastPoint p : c.pointsEvery(50, 0, c.lengthKm())) {
            assertEquals(0.0, angleDiff(180.0, p.coastBearingDeg()), 1e-9, p.name());
            assertEquals(0.0, angleDiff(270.0, p.offshoreBearingDeg()), 1e-9, p.name());
            assertEquals(-120.0, p.lonDeg(), 1e-9);
        }
        // the same decided by a point at sea
        Coastline bySea = Coastline.ofLand(line, -125, 33, C);
        assertFalse(bySea.oceanOnRight());
        assertEquals(270.0, bySea.pointAt("x", 300).offshoreBearingDeg(), 1e-9);
        // 10° of latitude on the 6371-km sphere
        assertEquals(6371.0 * Math.toRadians(10), c.lengthKm(), 1e-6);
    }

    @Test
    void greatCircleCoastHasTheBearingOfItsGeodesic() {
        // Vertices every 20 km on a geodesic leaving (10°W, 20°N) at azimuth 30°; ocean on the right.
        GeodesicLine g = SPHERE.DirectLine(20, -10, 30, 1_000_000);
        Coordinate[] v = new Coordinate[51];
        for (int k = 0; k <= 50; k++) {
            GeodesicData d = g.Position(k * 20_000.0, GeodesicMask.STANDARD | GeodesicMask.LONG_UNROLL);
            v[k] = new Coordinate(d.lon2, d.lat2);
        }
        Coastline c = Coastline.ofLand(GF.createLineString(v), OceanSide.RIGHT, C);
        assertEquals(1000.0, c.lengthKm(), 1e-6);
        for (double s = 60; s <= 940; s += 37) {
            GeodesicData d = g.Position(s * 1000.0);
            CoastPoint p = c.pointAt("s", s);
            assertEquals(0.0, angleDiff(d.azi2, p.coastBearingDeg()), 1e-7, "s = " + s);
            assertEquals(0.0, angleDiff(d.azi2 + 90, p.offshoreBearingDeg()), 1e-7, "s = " + s);
            assertEquals(d.lat2, p.latDeg(), 1e-9);
            assertEquals(d.lon2, p.lonDeg(), 1e-9);
        }
        // the smoothing length changes nothing on a straight coast
        assertEquals(c.pointAt("a", 500).coastBearingDeg(),
                c.withSmoothingLengthKm(300).pointAt("a", 500).coastBearingDeg(), 1e-7);
    }

    private static Coordinate[] circle(double lon0, double lat0, double radiusKm, int n, boolean clockwise) {
        Coordinate[] v = new Coordinate[n + 1];
        for (int k = 0; k < n; k++) {
            double az = (clockwise ? 1 : -1) * 360.0 * k / n;
            GeodesicData d = SPHERE.Direct(lat0, lon0, az, radiusKm * 1000.0);
            v[k] = new Coordinate(d.lon2, d.lat2);
        }
        v[n] = v[0];
        return v;
    }

    @Test
    void circularBasinHasNormalsPointingInwardWhateverTheRingOrientation() {
        for (boolean cw : new boolean[] {true, false}) {
            Polygon basin = GF.createPolygon(circle(-30, 40, 300, 1440, cw));
            Coastline c = Coastline.ofBasin(basin, C);
            assertTrue(c.isClosed());
            for (CoastPoint p : c.pointsEvery(97, 0, c.lengthKm() - 1)) {
                double toCentre = SPHERE.Inverse(p.latDeg(), p.lonDeg(), 40, -30).azi1;
                // a 100-km chord of a 300-km circle is perpendicular to the radius through its midpoint;
                // tolerance covers the 1440-gon approximation of the circle
                assertEquals(0.0, angleDiff(toCentre, p.offshoreBearingDeg()), 1e-3, "cw " + cw + " " + p.name());
            }
            // the same circle as an island: normals point away from the centre
            Coastline island = Coastline.ofLandPolygon(basin, C);
            CoastPoint q = island.pointAt("q", 123);
            double fromCentre = SPHERE.Inverse(40, -30, q.latDeg(), q.lonDeg()).azi2;
            assertEquals(0.0, angleDiff(fromCentre, q.offshoreBearingDeg()), 1e-3);
        }
    }

    @Test
    void snappedUserPointLandsOnTheCoastAtTheFootOfThePerpendicular() {
        LineString line = GF.createLineString(new Coordinate[] {new Coordinate(-120, 30), new Coordinate(-120, 40)});
        Coastline c = Coastline.ofLand(line, OceanSide.LEFT, C);
        // 50 km due west of (120°W, 35°N) along a geodesic: the foot of the perpendicular is (120°W, 35°N)
        GeodesicData d = SPHERE.Direct(35, -120, 270, 50_000);
        CoastPoint p = c.snap("Station A", d.lon2, d.lat2);
        assertEquals("Station A", p.name());
        assertEquals(35.0, p.latDeg(), 1e-7);
        assertEquals(-120.0, p.lonDeg(), 1e-7);
        assertEquals(50.0, p.snapDistanceKm(), 1e-6);
        assertEquals(6371.0 * Math.toRadians(5), p.alongCoastKm(), 1e-5);
        assertEquals(270.0, p.offshoreBearingDeg(), 1e-9);
        // user overrides
        CoastPoint o = p.withOffshoreBearingDeg(250);
        assertEquals(OrientationSource.USER, o.orientation());
        assertEquals(160.0, o.coastBearingDeg(), 1e-12);
        assertEquals(340.0, p.withCoastBearingDeg(-110).offshoreBearingDeg(), 1e-12);
    }

    @Test
    void pointsEveryAreEquallySpacedAlongTheCoastAndWrapOnRings() {
        Polygon basin = GF.createPolygon(circle(10, -35, 200, 720, false));
        Coastline c = Coastline.ofBasin(basin, C);
        double len = c.lengthKm();
        List<CoastPoint> pts = c.pointsEvery(25, len - 60, 40);      // through the ring's first vertex
        assertEquals(5, pts.size());
        for (int k = 1; k < pts.size(); k++) {
            double ds = (pts.get(k).alongCoastKm() - pts.get(k - 1).alongCoastKm() + len) % len;
            assertEquals(25.0, ds, 1e-9);
        }
        assertThrows(IllegalArgumentException.class, () -> c.pointsEvery(0, 0, 10));
    }

    @Test
    void badGeometryIsRefusedWithAClearMessage() {
        LineString one = GF.createLineString(new Coordinate[] {new Coordinate(1, 1), new Coordinate(1, 1)});
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> Coastline.ofLand(one, OceanSide.LEFT, C));
        assertTrue(e.getMessage().contains("at least 2"), e.getMessage());
        LineString line = GF.createLineString(new Coordinate[] {new Coordinate(0, 0), new Coordinate(0, 1)});
        assertThrows(IllegalArgumentException.class, () -> Coastline.ofLand(line, OceanSide.LEFT, C).withSmoothingLengthKm(-5));
    }

    @Test
    void severalLandLinesAreMergedAndEachGetsItsOceanSide() {
        // two touching pieces of a meridional coast (given in opposite directions) and a separate island coast
        LineString a = GF.createLineString(new Coordinate[] {new Coordinate(-120, 30), new Coordinate(-120, 35)});
        LineString b = GF.createLineString(new Coordinate[] {new Coordinate(-120, 40), new Coordinate(-120, 35)});
        LineString far = GF.createLineString(new Coordinate[] {new Coordinate(-130, 20), new Coordinate(-130, 21)});
        List<Coastline> cs = Coastline.ofLandLines(GF.createMultiLineString(new LineString[] {a, b, far}), -125, 33, C);
        assertEquals(2, cs.size());
        assertEquals(6371.0 * Math.toRadians(10), cs.get(0).lengthKm(), 1e-6);
        for (CoastPoint p : cs.get(0).pointsEvery(100, 0, cs.get(0).lengthKm())) {
            assertEquals(270.0, p.offshoreBearingDeg(), 1e-9);
        }
        // the sea point lies east of the far line: its ocean is to the east
        assertEquals(90.0, cs.get(1).pointAt("x", 50).offshoreBearingDeg(), 1e-9);
        // a stretch between two positions, in either order
        List<CoastPoint> s1 = cs.get(0).pointsBetween(50, -121, 36, -121, 33);
        assertEquals(7, s1.size());
        // foot of the perpendicular from (121°W, 33°N) on the 120°W meridian: tan φ = tan 33° / cos 1° (Napier's rules)
        assertEquals(Math.toDegrees(Math.atan(Math.tan(Math.toRadians(33)) / Math.cos(Math.toRadians(1)))),
                s1.get(0).latDeg(), 1e-7);
    }
}
