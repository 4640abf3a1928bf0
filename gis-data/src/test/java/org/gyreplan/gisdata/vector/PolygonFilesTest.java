package org.gyreplan.gisdata.vector;

import org.gyreplan.gisdata.vector.GeometryFileException.Problem;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.MultiPolygon;
import org.locationtech.jts.geom.Polygon;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

import static org.junit.jupiter.api.Assertions.*;

/**
 * Polygon input in every format, including files written by GDAL's ogr2ogr (an independent writer), and bad input
 * that must be refused with the file, the feature and the location. Areas are planar in degrees² (JTS
 * {@code getArea}) of hand-computable shapes.
 */
class PolygonFilesTest {
    @TempDir Path dir;

    static final String TWO_ZONES = "{\"type\":\"FeatureCollection\",\"features\":["
            + "{\"type\":\"Feature\",\"properties\":{\"name\":\"Outer Bay\",\"depth_m\":40},\"geometry\":{\"type\":\"Polygon\","
            + "\"coordinates\":[[[0,40],[10,40],[10,50],[0,50],[0,40]],[[4,44],[4,46],[6,46],[6,44],[4,44]]]}},"
            + "{\"type\":\"Feature\",\"properties\":{\"name\":\"Twin Isles\"},\"geometry\":{\"type\":\"MultiPolygon\","
            + "\"coordinates\":[[[[20,30],[21,30],[21,31],[20,31],[20,30]]],[[[22,30],[23,30],[23,31],[22,31],[22,30]]]]}}]}";

    Path write(String name, String text) throws Exception {
        Path f = dir.resolve(name);
        Files.writeString(f, text);
        return f;
    }

    static void assertTwoZones(List<PolygonFeature> zones) {
        assertEquals(2, zones.size());
        assertEquals("Outer Bay", zones.get(0).name());
        assertInstanceOf(Polygon.class, zones.get(0).polygon());
        assertEquals(100 - 4, zones.get(0).polygon().getArea(), 1e-12);
        assertEquals(1, ((Polygon) zones.get(0).polygon()).getNumInteriorRing());
        assertEquals(40L, ((Number) zones.get(0).attributes().get("depth_m")).longValue());
        assertEquals("Twin Isles", zones.get(1).name());
        assertInstanceOf(MultiPolygon.class, zones.get(1).polygon());
        assertEquals(2.0, zones.get(1).polygon().getArea(), 1e-12);
    }

    @Test
    void readsGeoJson() throws Exception {
        assertTwoZones(PolygonFiles.read(write("zones.geojson", TWO_ZONES)));
    }

    @Test
    void readsShapefileWrittenByOgr2ogr() throws Exception {
        Path src = write("zones.geojson", TWO_ZONES);
        Path shp = dir.resolve("zones.shp");
        Ogr.Run r = Ogr.run("ogr2ogr", "-f", "ESRI Shapefile", "-lco", "ENCODING=UTF-8", shp.toString(), src.toString());
        assertEquals(0, r.exit(), r.err());
        assertTrue(Files.exists(dir.resolve("zones.prj")) && Files.exists(dir.resolve("zones.dbf")));
        assertTwoZones(PolygonFiles.read(shp));
    }

    @Test
    void readsGeoPackageWrittenByOgr2ogr() throws Exception {
        Path src = write("zones.geojson", TWO_ZONES);
        Path gpkg = dir.resolve("zones.gpkg");
        Ogr.Run r = Ogr.run("ogr2ogr", "-f", "GPKG", "-nlt", "MULTIPOLYGON", gpkg.toString(), src.toString());
        assertEquals(0, r.exit(), r.err());
        List<PolygonFeature> zones = PolygonFiles.read(gpkg);
        assertEquals(2, zones.size());
        assertEquals("Outer Bay", zones.get(0).name());
        assertEquals(96.0, zones.get(0).polygon().getArea(), 1e-12);
        assertEquals(2.0, zones.get(1).polygon().getArea(), 1e-12);
    }

    @Test
    void readsWkt() throws Exception {
        Path f = write("basin.wkt", "# invented basin and an islet zone\n"
                + "POLYGON ((0 40, 10 40, 10 50, 0 50, 0 40), (4 44, 4 46, 6 46, 6 44, 4 44))\n"
                + "SRID=4326;MULTIPOLYGON (((20 30, 21 30, 21 31, 20 31, 20 30)), ((22 30 5, 23 30 5, 23 31 5, 22 31 5, 22 30 5)))\n");
        List<PolygonFeature> ps = PolygonFiles.read(f);
        assertEquals(2, ps.size());
        assertEquals(96.0, ps.get(0).polygon().getArea(), 1e-12);
        assertEquals(2.0, ps.get(1).polygon().getArea(), 1e-12);
        GeometryFileException e = assertThrows(GeometryFileException.class,
                () -> PolygonFiles.read(write("line.wkt", "LINESTRING (0 0, 1 1)")));
        assertEquals(Problem.NOT_POLYGON, e.problem());
        assertTrue(e.getMessage().contains("LINESTRING"), e.getMessage());
    }

    @Test
    void ringThatDoesNotCloseIsRefusedWithFeatureAndLocation() throws Exception {
        Path f = write("open.geojson", "{\"type\":\"FeatureCollection\",\"features\":["
                + "{\"type\":\"Feature\",\"properties\":{\"name\":\"ok\"},\"geometry\":{\"type\":\"Polygon\",\"coordinates\":[[[0,0],[1,0],[1,1],[0,0]]]}},"
                + "{\"type\":\"Feature\",\"properties\":{\"name\":\"Open Bay\"},\"geometry\":{\"type\":\"Polygon\",\"coordinates\":[[[0,0],[3,0],[3,3],[0,3.5]]]}}]}");
        GeometryFileException e = assertThrows(GeometryFileException.class, () -> PolygonFiles.read(f));
        assertEquals(Problem.RING_NOT_CLOSED, e.problem());
        assertEquals(1, e.featureIndex());
        assertEquals("Open Bay", e.featureName());
        assertEquals(0.0, e.location().x, 0);
        assertEquals(3.5, e.location().y, 0);
        assertTrue(e.getMessage().startsWith("open.geojson: feature 1 (\"Open Bay\"): "), e.getMessage());
        assertTrue(e.getMessage().contains("lon 0.000000, lat 3.500000"), e.getMessage());

        // opt-in repair closes the ring: the square 3×3 minus the sliver to (0, 3.5) → area 9 + 0.5·3·0.5 = 9.75
        List<PolygonFeature> fixed = PolygonFiles.read(f, PolygonFiles.Options.DEFAULT.withRepair());
        assertTrue(fixed.get(1).repaired());
        assertEquals(9.75, fixed.get(1).polygon().getArea(), 1e-12);
    }

    @Test
    void selfIntersectionIsRefusedWithItsLocation() throws Exception {
        // A "bow tie": the diagonals (0,0)–(2,2) and (2,0)–(0,2) cross at (1, 1) (analytic).
        Path f = write("bowtie.geojson", "{\"type\":\"Feature\",\"properties\":{\"name\":\"Knot\"},"
                + "\"geometry\":{\"type\":\"Polygon\",\"coordinates\":[[[0,0],[2,2],[2,0],[0,2],[0,0]]]}}");
        GeometryFileException e = assertThrows(GeometryFileException.class, () -> PolygonFiles.read(f));
        assertEquals(Problem.INVALID_GEOMETRY, e.problem());
        assertEquals("Knot", e.featureName());
        assertEquals(1.0, e.location().x, 1e-12);
        assertEquals(1.0, e.location().y, 1e-12);
        assertTrue(e.getMessage().contains("self-intersection"), e.getMessage());

        // repair (JTS GeometryFixer) keeps both lobes: two triangles of area 1 each
        Geometry g = PolygonFiles.read(f, PolygonFiles.Options.DEFAULT.withRepair()).get(0).polygon();
        assertEquals(2.0, g.getArea(), 1e-12);
        assertTrue(g.isValid());
    }

    @Test
    void tooFewPointsAndNonPolygonsAreRefused() throws Exception {
        GeometryFileException few = assertThrows(GeometryFileException.class, () -> PolygonFiles.read(write("few.geojson",
                "{\"type\":\"Polygon\",\"coordinates\":[[[0,0],[1,0],[0,0]]]}")));
        assertEquals(Problem.TOO_FEW_POINTS, few.problem());

        GeometryFileException line = assertThrows(GeometryFileException.class, () -> PolygonFiles.read(write("route.geojson",
                "{\"type\":\"FeatureCollection\",\"features\":[{\"type\":\"Feature\",\"properties\":{\"name\":\"Track\"},"
                        + "\"geometry\":{\"type\":\"LineString\",\"coordinates\":[[0,0],[1,1]]}}]}")));
        assertEquals(Problem.NOT_POLYGON, line.problem());
        assertEquals("Track", line.featureName());
        assertTrue(line.getMessage().contains("LineString"), line.getMessage());

        GeometryFileException syntax = assertThrows(GeometryFileException.class,
                () -> PolygonFiles.read(write("broken.geojson", "{\"type\":\"Polygon\",\"coordinates\":[[[0,0],[1,0]")));
        assertEquals(Problem.UNREADABLE, syntax.problem());
        assertTrue(syntax.getMessage().contains("line 1"), syntax.getMessage());

        GeometryFileException projected = assertThrows(GeometryFileException.class, () -> PolygonFiles.read(write("utm.geojson",
                "{\"type\":\"Polygon\",\"coordinates\":[[[500000,6000000],[510000,6000000],[510000,6010000],[500000,6000000]]]}")));
        assertEquals(Problem.COORDINATE_OUT_OF_RANGE, projected.problem());

        GeometryFileException unknown = assertThrows(GeometryFileException.class, () -> PolygonFiles.read(write("x.kmz", "")));
        assertEquals(Problem.UNSUPPORTED_FORMAT, unknown.problem());
    }

    @Test
    void projectedPrjIsRefused() throws Exception {
        Path src = write("zones.geojson", TWO_ZONES);
        Path shp = dir.resolve("utm.shp");
        Ogr.Run r = Ogr.run("ogr2ogr", "-f", "ESRI Shapefile", "-t_srs", "EPSG:32631", shp.toString(), src.toString());
        assertEquals(0, r.exit(), r.err());
        GeometryFileException e = assertThrows(GeometryFileException.class, () -> PolygonFiles.read(shp));
        assertEquals(Problem.PROJECTED_CRS, e.problem());
        assertTrue(e.getMessage().contains("UTM"), e.getMessage());
        assertTrue(e.getMessage().contains("EPSG:4326"), e.getMessage());

        // another geographic datum (ED50, whose WKT carries TOWGS84 shift parameters) is refused too
        Path ed50 = dir.resolve("ed50.shp");
        assertEquals(0, Ogr.run("ogr2ogr", "-f", "ESRI Shapefile", "-t_srs", "EPSG:4230", ed50.toString(), src.toString()).exit());
        GeometryFileException other = assertThrows(GeometryFileException.class, () -> PolygonFiles.read(ed50));
        assertEquals(Problem.UNSUPPORTED_CRS, other.problem());

        // the unit checks themselves: WKT 2 of EPSG:4326 as GDAL prints it is accepted, WKT 1 with TOWGS84 refused
        CrsCheck.requireGeographicWgs84("GEOGCRS[\"WGS 84\",ENSEMBLE[\"World Geodetic System 1984 ensemble\",MEMBER[\"World"
                + " Geodetic System 1984 (Transit)\"]],CS[ellipsoidal,2],ID[\"EPSG\",4326]]", null);
        assertThrows(GeometryFileException.class, () -> CrsCheck.requireGeographicWgs84("GEOGCS[\"ED50\",DATUM["
                + "\"European_Datum_1950\",SPHEROID[\"International 1924\",6378388,297],TOWGS84[-87,-98,-121,0,0,0,0]],"
                + "PRIMEM[\"Greenwich\",0],UNIT[\"degree\",0.0174532925199433]]", null));
    }

    @Test
    void inlineCoordinatesAndReadOne() throws Exception {
        Polygon p = PolygonFiles.fromLonLat(List.of(new double[] {170, -5}, new double[] {190, -5},
                new double[] {190, 5}, new double[] {170, 5}));
        assertEquals(20.0 * 10.0, p.getArea(), 1e-12); // 20° wide (170…190), 10° tall
        assertEquals(5, p.getNumPoints(), "the open ring is closed");
        GeometryFileException bad = assertThrows(GeometryFileException.class, () -> PolygonFiles.fromLonLat(
                List.of(new double[] {0, 0}, new double[] {2, 2}, new double[] {2, 0}, new double[] {0, 2})));
        assertEquals(Problem.INVALID_GEOMETRY, bad.problem());
        assertTrue(bad.getMessage().startsWith("inline polygon"), bad.getMessage());

        Path f = write("zones.geojson", TWO_ZONES);
        assertEquals(2.0, PolygonFiles.readOne(f, PolygonFiles.Options.DEFAULT, "Twin Isles").getArea(), 1e-12);
        GeometryFileException several = assertThrows(GeometryFileException.class,
                () -> PolygonFiles.readOne(f, PolygonFiles.Options.DEFAULT, null));
        assertTrue(several.getMessage().contains("[Outer Bay, Twin Isles]"), several.getMessage());
    }

    @Test
    void pointShapefileAndAmbiguousGeoPackageLayersAreRefused() throws Exception {
        Path pts = write("sites.geojson", "{\"type\":\"FeatureCollection\",\"features\":[{\"type\":\"Feature\","
                + "\"properties\":{\"name\":\"S1\"},\"geometry\":{\"type\":\"Point\",\"coordinates\":[1,2]}}]}");
        Path shp = dir.resolve("sites.shp");
        assertEquals(0, Ogr.run("ogr2ogr", "-f", "ESRI Shapefile", shp.toString(), pts.toString()).exit());
        GeometryFileException e = assertThrows(GeometryFileException.class, () -> PolygonFiles.read(shp));
        assertEquals(Problem.NOT_POLYGON, e.problem());
        assertTrue(e.getMessage().contains("Point"), e.getMessage());

        Path gpkg = dir.resolve("two.gpkg");
        GeoPackageFiles.write(gpkg, List.of(Fixtures.stations(), Fixtures.zones(),
                new FeatureLayer("more_zones", Fixtures.zones().features())));
        GeometryFileException amb = assertThrows(GeometryFileException.class, () -> PolygonFiles.read(gpkg));
        assertEquals(Problem.NO_POLYGONS, amb.problem());
        assertTrue(amb.getMessage().contains("[zones, more_zones]"), amb.getMessage());
        GeometryFileException points = assertThrows(GeometryFileException.class,
                () -> PolygonFiles.read(gpkg, PolygonFiles.Options.DEFAULT.withLayer("stations")));
        assertEquals(Problem.NOT_POLYGON, points.problem());
        assertEquals(2, PolygonFiles.read(gpkg, PolygonFiles.Options.DEFAULT.withLayer("more_zones")).size());
    }

    @Test
    void legacyCrsMembersAndWktPrefixes() throws Exception {
        String square = "\"coordinates\":[[[0,0],[1,0],[1,1],[0,1],[0,0]]]";
        assertEquals(1.0, PolygonFiles.read(write("crs84.geojson", "{\"type\":\"Polygon\",\"crs\":{\"type\":\"name\","
                + "\"properties\":{\"name\":\"urn:ogc:def:crs:OGC:1.3:CRS84\"}}," + square + "}")).get(0).polygon().getArea(), 0);
        GeometryFileException utm = assertThrows(GeometryFileException.class, () -> PolygonFiles.read(write("crs.geojson",
                "{\"type\":\"Polygon\",\"crs\":{\"type\":\"name\",\"properties\":{\"name\":\"urn:ogc:def:crs:EPSG::32631\"}},"
                        + square + "}")));
        assertEquals(Problem.UNSUPPORTED_CRS, utm.problem());
        assertEquals(Problem.UNSUPPORTED_CRS, assertThrows(GeometryFileException.class,
                () -> PolygonFiles.read(write("srid.wkt", "SRID=3857;POLYGON ((0 0, 1 0, 1 1, 0 0))"))).problem());
        assertEquals(Problem.NOT_POLYGON, assertThrows(GeometryFileException.class,
                () -> PolygonFiles.read(write("empty.wkt", "POLYGON EMPTY"))).problem());
        GeometryFileException topo = assertThrows(GeometryFileException.class,
                () -> PolygonFiles.read(write("topo.json", "{\"type\":\"Topology\",\"objects\":{},\"arcs\":[]}")));
        assertEquals(Problem.UNSUPPORTED_FORMAT, topo.problem());
        assertTrue(topo.getMessage().contains("TopoJSON"), topo.getMessage());
    }
}
