package org.gyreplan.gisdata.basemap;

import org.gyreplan.gisdata.vector.Feature;
import org.gyreplan.gisdata.vector.GeoJsonFiles;
import org.gyreplan.gisdata.vector.Ogr;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Envelope;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.GeometryFactory;
import org.locationtech.jts.geom.LineString;
import org.locationtech.jts.geom.Polygon;

import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

import static org.junit.jupiter.api.Assertions.*;

/**
 * TopoJSON decoding checked against GDAL's TopoJSON driver (an independent decoder) on the real Natural Earth
 * 1:110m land file from world-atlas 2.0.2; the shipped resources checked against that decoding; clipping across the
 * antimeridian checked against GDAL's clipping of the two halves.
 */
class BaseMapTest {
    @TempDir Path dir;

    static String resource(String name) throws Exception {
        try (InputStream in = BaseMapTest.class.getResourceAsStream(name)) {
            assertNotNull(in, "test resource " + name);
            return new String(in.readAllBytes(), StandardCharsets.UTF_8);
        }
    }

    @Test
    void decodesTheQuantisedExampleOfTheSpecification() {
        // The quantised example topology of the TopoJSON specification (§2, from memory) stands for the GeoJSON
        // LineString [[102,0],[103,1],[104,0],[105,1]] and Polygon [[[100,0],[100,1],[101,1],[101,0],[100,0]]];
        // quantisation to 1e4 steps leaves errors below 2e-4°.
        String topo = "{\"type\":\"Topology\",\"transform\":{\"scale\":[0.0005000500050005,0.00010001000100010001],"
                + "\"translate\":[100,0]},\"objects\":{\"example\":{\"type\":\"GeometryCollection\",\"geometries\":["
                + "{\"type\":\"Point\",\"coordinates\":[4000,5000]},{\"type\":\"LineString\",\"arcs\":[0]},"
                + "{\"type\":\"Polygon\",\"arcs\":[[1]]}]}},\"arcs\":[[[4000,0],[1999,9999],[2000,-9999],[2000,9999]],"
                + "[[0,0],[0,9999],[2000,0],[0,-9999],[-2000,0]]]}";
        List<Geometry> gs = TopoJson.parse(topo).geometries("example");
        assertEquals(3, gs.size());
        assertTrue(gs.get(0).getCoordinate().equals2D(new Coordinate(102, 0.5), 3e-4));
        Coordinate[] line = gs.get(1).getCoordinates();
        double[][] expLine = {{102, 0}, {103, 1}, {104, 0}, {105, 1}};
        for (int k = 0; k < 4; k++) assertTrue(line[k].equals2D(new Coordinate(expLine[k][0], expLine[k][1]), 3e-4), line[k].toString());
        assertEquals(1.0, gs.get(2).getArea(), 5e-4);
        assertTrue(gs.get(2).getEnvelopeInternal().equals(new Envelope(100, 101.00010001, 0, 0.99990001))
                || gs.get(2).getEnvelopeInternal().getMaxX() - 101 < 3e-4);
        // a reversed arc (~0 = −1) gives the line backwards
        List<Geometry> rev = TopoJson.parse(topo.replace("\"arcs\":[0]", "\"arcs\":[-1]")).geometries("example");
        assertTrue(rev.get(1).getCoordinates()[0].equals2D(new Coordinate(105, 1), 3e-4));
    }

    @Test
    void naturalEarthLandMatchesGdalVertexByVertex() throws Exception {
        String json = resource("land-110m.json");
        List<Geometry> ours = TopoJson.parse(json).geometries("land");
        Path src = dir.resolve("land-110m.json");
        Files.writeString(src, json);
        Path viaGdal = dir.resolve("land.geojson");
        Ogr.Run r = Ogr.run("ogr2ogr", "-f", "GeoJSON", "-lco", "COORDINATE_PRECISION=12", viaGdal.toString(), src.toString());
        assertEquals(0, r.exit(), r.err());
        List<Feature> theirs = GeoJsonFiles.readFeatures(viaGdal).features();
        assertEquals(1, ours.size());
        assertEquals(1, theirs.size());
        Geometry a = ours.get(0), b = theirs.get(0).geometry();
        assertEquals(b.getNumGeometries(), a.getNumGeometries(), "polygon count");
        assertEquals(b.getNumPoints(), a.getNumPoints(), "vertex count");
        Coordinate[] ca = a.getCoordinates(), cb = b.getCoordinates();
        for (int k = 0; k < ca.length; k++) {
            assertTrue(ca[k].equals2D(cb[k], 1e-9), "vertex " + k + ": ours " + ca[k] + ", GDAL " + cb[k]);
        }
        // GDAL's extent of the same file (ogrinfo -so): (-180, -85.609038) - (180, 83.645130), printed to 1e-6
        Envelope e = a.getEnvelopeInternal();
        assertEquals(-180, e.getMinX(), 1e-6);
        assertEquals(180, e.getMaxX(), 1e-6);
        assertEquals(-85.609038, e.getMinY(), 1e-6);
        assertEquals(83.645130, e.getMaxY(), 1e-6);
    }

    /** Area on a sphere of radius r of polygons drawn in lon/lat with straight edges: r² ∮ sin φ dλ (Green). */
    static double sphericalAreaKm2(Geometry g, double rKm) {
        double total = 0;
        for (int k = 0; k < g.getNumGeometries(); k++) {
            Polygon p = (Polygon) g.getGeometryN(k);
            total += Math.abs(ringIntegral(p.getExteriorRing().getCoordinates()));
            for (int h = 0; h < p.getNumInteriorRing(); h++) total -= Math.abs(ringIntegral(p.getInteriorRingN(h).getCoordinates()));
        }
        return total * rKm * rKm;
    }

    private static double ringIntegral(Coordinate[] cs) {
        double s = 0;
        for (int k = 0; k + 1 < cs.length; k++) {
            double l1 = Math.toRadians(cs[k].x), l2 = Math.toRadians(cs[k + 1].x);
            double p1 = Math.toRadians(cs[k].y), p2 = Math.toRadians(cs[k + 1].y);
            // ∫ sin φ dλ along an edge with φ linear in λ
            double mean = Math.abs(p2 - p1) < 1e-12 ? Math.sin(0.5 * (p1 + p2)) : (Math.cos(p1) - Math.cos(p2)) / (p2 - p1);
            s += (l2 - l1) * mean;
        }
        return s;
    }

    @Test
    void shippedResourcesAreValidAndCoverTheEarthsLandArea() {
        // Land area of the Earth ≈ 148.94 million km² (CIA World Factbook, "Geography – area: land", from memory),
        // Antarctica included. Small-scale generalisation and the mean radius (IUGG, 6371.0088 km) make a few % of
        // difference; 3 % also catches any sliver across the map (Fiji alone would add ~2 million km²).
        for (LandPolygons.Resolution r : LandPolygons.Resolution.values()) {
            Geometry land = LandPolygons.load(r);
            assertTrue(land.isValid(), r + ": land polygons must not overlap or self-intersect");
            Envelope e = land.getEnvelopeInternal();
            assertTrue(e.getMinX() >= -180 && e.getMaxX() <= 180 && e.getMinY() >= -90 && e.getMaxY() <= 90, e.toString());
            double areaKm2 = sphericalAreaKm2(land, 6371.0088);
            assertEquals(148.94e6, areaKm2, 148.94e6 * 0.03, r + " land area km²");
        }
    }

    @Test
    void clipAcrossTheAntimeridianMatchesGdalHalves() throws Exception {
        // Fiji straddles 180°: box 170°E … 170°W written continuously as 170 … 190, 25°S … 10°S
        Geometry clip = LandPolygons.clip(LandPolygons.Resolution.COARSE_110M, 170, -25, 190, -10);
        Envelope e = clip.getEnvelopeInternal();
        assertFalse(clip.isEmpty());
        assertTrue(e.getMinX() >= 170 && e.getMaxX() <= 190 && e.getMinY() >= -25 && e.getMaxY() <= -10, e.toString());
        assertTrue(e.getMaxX() > 180, "land east of the date line appears at longitudes above 180°: " + e);

        // GDAL clips the same land (our shipped polygons, written as GeoJSON) to the two halves in −180…180 form
        Path src = dir.resolve("land.geojson");
        GeoJsonFiles.write(src, new org.gyreplan.gisdata.vector.FeatureLayer("land",
                List.of(new Feature(LandPolygons.load(LandPolygons.Resolution.COARSE_110M), null))));
        double gdalArea = 0;
        for (String[] half : new String[][] {{"170", "-25", "180", "-10"}, {"-180", "-25", "-170", "-10"}}) {
            Path out = dir.resolve("half" + half[0] + ".geojson");
            Ogr.Run r = Ogr.run("ogr2ogr", "-f", "GeoJSON", "-clipsrc", half[0], half[1], half[2], half[3],
                    out.toString(), src.toString());
            assertEquals(0, r.exit(), r.err());
            for (Feature f : GeoJsonFiles.readFeatures(out).features()) gdalArea += f.geometry().getArea();
        }
        assertTrue(gdalArea > 0.5, "Fiji's main islands cover more than 0.5 deg²: " + gdalArea);
        assertEquals(gdalArea, clip.getArea(), gdalArea * 1e-6); // GeoJSON coordinates rounded to 1e-7°

        // coastline of the clip: no artificial edges on the box or along the 180° seam, sea on the left
        List<LineString> coast = Coastlines.ofLand(clip, new Envelope(170, 190, -25, -10));
        assertFalse(coast.isEmpty());
        for (LineString l : coast) {
            Coordinate[] cs = l.getCoordinates();
            for (int k = 1; k < cs.length; k++) {
                boolean seam = cs[k].x == 180 && cs[k - 1].x == 180;
                assertFalse(seam, "seam segment kept at " + cs[k]);
            }
        }
    }

    @Test
    void coastlineOfABasinKeepsOnlyTheEdgesAlongLandWithTheSeaOnTheLeft() {
        GeometryFactory gf = new GeometryFactory();
        Polygon basin = (Polygon) gf.toGeometry(new Envelope(0, 10, 0, 10));
        Polygon land = (Polygon) gf.toGeometry(new Envelope(-5, 0, -5, 15)); // land west of 0°
        List<LineString> coast = Coastlines.ofBasin(basin, land, 1e-6);
        assertEquals(1, coast.size());
        Coordinate[] cs = coast.get(0).getCoordinates();
        assertEquals(2, cs.length);
        // walking south along x = 0 the sea (x > 0) is on the left
        assertEquals(new Coordinate(0, 10), cs[0]);
        assertEquals(new Coordinate(0, 0), cs[1]);

        List<LineString> all = Coastlines.ofBasin(basin, null, 0);
        assertEquals(1, all.size());
        assertEquals(40.0, all.get(0).getLength(), 0);

        // land polygon: the sea is outside, so the coast runs clockwise (sea on the left)
        List<LineString> island = Coastlines.ofLand(gf.toGeometry(new Envelope(2, 3, 2, 3)), null);
        assertEquals(1, island.size());
        assertFalse(org.locationtech.jts.algorithm.Orientation.isCCW(island.get(0).getCoordinates()));
        List<Polygon> none = new ArrayList<>();
        assertTrue(Coastlines.ofLand(gf.createMultiPolygon(none.toArray(new Polygon[0])), null).isEmpty());
    }
}
