package org.gyreplan.gisdata.vector;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Geometry;
import org.w3c.dom.Document;
import org.w3c.dom.Element;
import org.w3c.dom.NodeList;

import javax.xml.parsers.DocumentBuilderFactory;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import java.util.List;
import java.util.Map;

import static org.junit.jupiter.api.Assertions.*;

/**
 * Every writer's output opened by an independent client (GDAL's ogrinfo, Debian gdal-bin) and, where we have one,
 * read back by our own reader. Expected values are the invented inputs of {@link Fixtures}; ogrinfo prints extents
 * with 6 decimals, hence the 1e-6° tolerance.
 */
class VectorWritersTest {
    @TempDir Path dir;

    static final double EXTENT_TOL = 1e-6;

    static void assertWgs84(Ogr.Layer l) {
        assertTrue(l.srs().contains("ID[\"EPSG\",4326]") || l.srs().contains("AUTHORITY[\"EPSG\",\"4326\"]"),
                "layer " + l.name() + " must be in EPSG:4326, got " + l.srs());
        assertTrue(l.srs().contains("WGS 84"), l.srs());
    }

    static void assertExtent(Ogr.Layer l, double minX, double minY, double maxX, double maxY) {
        assertNotNull(l.extent(), "no extent in ogrinfo output for " + l.name());
        assertArrayEquals(new double[] {minX, minY, maxX, maxY}, l.extent(), EXTENT_TOL, "extent of " + l.name());
    }

    @Test
    void geoJsonPolygonsOpenInGdalAndRoundTrip() throws Exception {
        Path f = dir.resolve("zones.geojson");
        GeoJsonFiles.write(f, Fixtures.zones());
        Ogr.Layer l = Ogr.summary(f).get("zones");
        assertNotNull(l, "ogrinfo must find layer zones");
        assertEquals("Polygon", l.geometry());
        assertEquals(2, l.featureCount());
        assertExtent(l, 0, 30, 22, 50);
        assertWgs84(l);
        String dump = Ogr.dump(f).out();
        assertTrue(Ogr.attributeLines(dump).contains("name (String) = Zone A"), dump);
        assertTrue(Ogr.attributeLines(dump).contains("area_deg2 (Real) = 96"), dump);

        // RFC 7946 §3.1.6: exterior ring counter-clockwise, holes clockwise
        String text = Files.readString(f);
        assertTrue(text.contains("[[[0,40],[10,40],[10,50],[0,50],[0,40]],[[4,44],[4,46],[6,46],[6,44],[4,44]]]"), text);
        assertFalse(text.contains("\"crs\""), "RFC 7946 has no crs member");

        List<PolygonFeature> back = PolygonFiles.read(f);
        assertEquals(2, back.size());
        assertEquals("Zone A", back.get(0).name());
        assertEquals(96.0, back.get(0).polygon().getArea(), 1e-12);
        assertTrue(back.get(0).polygon().equalsTopo(Fixtures.squareWithHole()));
        assertEquals(96.0, ((Number) back.get(0).attributes().get("area_deg2")).doubleValue(), 0);
    }

    @Test
    void geoJsonPointsAndLinesWithPropertiesRoundTrip() throws Exception {
        Path f = dir.resolve("stations.geojson");
        GeoJsonFiles.write(f, Fixtures.stations());
        Ogr.Layer l = Ogr.summary(f).get("stations");
        assertEquals("Point", l.geometry());
        assertEquals(2, l.featureCount());
        assertExtent(l, -9.75, -33.5, 12.5, 54.25);
        assertWgs84(l);
        String dump = Ogr.dump(f).out();
        assertTrue(Ogr.attributeLines(dump).contains("name (String) = M2 \"south\", deep"), dump);
        assertTrue(Ogr.attributeLines(dump).contains("rank (Integer) = 2"), dump);

        FeatureLayer back = GeoJsonFiles.readFeatures(f);
        assertEquals(2, back.features().size());
        Feature m1 = back.features().get(0);
        assertEquals(new Coordinate(12.5, 54.25), m1.geometry().getCoordinate());
        assertEquals("M1", m1.get("name"));
        assertEquals(35.5, ((Number) m1.get("depth_m")).doubleValue(), 0);
        assertEquals(1L, m1.get("rank"));
        assertEquals(Boolean.TRUE, m1.get("surveyed"));
        assertEquals("2026-03-01T06:00:00Z", m1.get("time"));

        Path t = dir.resolve("transects.geojson");
        GeoJsonFiles.write(t, Fixtures.transects());
        Ogr.Layer lt = Ogr.summary(t).get("transects");
        assertEquals("Line String", lt.geometry());
        assertExtent(lt, 10, 54, 11.5, 55);
        assertEquals(3, GeoJsonFiles.readFeatures(t).features().get(0).geometry().getNumPoints());
    }

    @Test
    void geoJsonSplitsAtTheAntimeridian() throws Exception {
        // A box from 170°E to 170°W given in continuous longitudes (170…190): RFC 7946 §3.1.9 asks for a split.
        Geometry box = Fixtures.GF.createPolygon(Fixtures.ring(170, -10, 190, -10, 190, 10, 170, 10, 170, -10));
        Path f = dir.resolve("am.geojson");
        GeoJsonFiles.write(f, new FeatureLayer("am", List.of(Feature.of(box, "name", "across"))));
        Ogr.Layer l = Ogr.summary(f).get("am");
        assertEquals("Multi Polygon", l.geometry());
        assertExtent(l, -180, -10, 180, 10);
        Geometry back = PolygonFiles.read(f).get(0).polygon();
        assertEquals(2, back.getNumGeometries());
        assertEquals(box.getArea(), back.getArea(), 1e-9);
    }

    @Test
    void geoPackageWithThreeLayersIsVersion13WithoutWarnings() throws Exception {
        Path f = dir.resolve("plan.gpkg");
        GeoPackageFiles.write(f, List.of(Fixtures.stations(), Fixtures.transects(), Fixtures.zones()),
                Instant.parse("2026-12-01T12:00:00Z"));
        Ogr.Run run = Ogr.run("ogrinfo", "-ro", "-al", "-so", f.toString());
        assertEquals(0, run.exit(), run.err());
        assertEquals("", run.err().strip(), "GDAL must open the GeoPackage without warnings");
        Map<String, Ogr.Layer> layers = Ogr.summary(f);
        assertEquals(List.of("stations", "transects", "zones"), List.copyOf(layers.keySet()));
        assertEquals("Point", layers.get("stations").geometry());
        assertEquals("Line String", layers.get("transects").geometry());
        assertEquals("Polygon", layers.get("zones").geometry());
        assertEquals(2, layers.get("stations").featureCount());
        assertEquals(1, layers.get("transects").featureCount());
        assertEquals(2, layers.get("zones").featureCount());
        assertExtent(layers.get("stations"), -9.75, -33.5, 12.5, 54.25);
        assertExtent(layers.get("zones"), 0, 30, 22, 50);
        for (Ogr.Layer l : layers.values()) assertWgs84(l);

        // application_id "GPKG" and user_version 10300 (GeoPackage 1.3.0, OGC 12-128r18 §1.1.1.1.1), read by GDAL's SQL
        Ogr.Run v = Ogr.run("ogrinfo", "-ro", f.toString(), "-sql", "PRAGMA user_version");
        assertTrue(v.out().contains("user_version (Integer) = 10300"), v.out() + v.err());
        Ogr.Run a = Ogr.run("ogrinfo", "-ro", f.toString(), "-sql", "PRAGMA application_id");
        assertTrue(a.out().contains("application_id (Integer) = 1196444487"), a.out() + a.err());
        assertEquals("", v.err().strip() + a.err().strip());

        String dump = Ogr.dump(f).out();
        assertTrue(Ogr.attributeLines(dump).contains("name (String) = Zone A"), dump);
        assertTrue(Ogr.attributeLines(dump).contains("depth_m (Real) = 1200.25"), dump);
        assertTrue(Ogr.attributeLines(dump).contains("surveyed (Integer(Boolean)) = 1"), dump);
        assertTrue(Ogr.attributeLines(dump).contains("time (DateTime) = 2026/03/01 06:00:00+00"), dump);

        // round trip through our readers
        FeatureLayer st = GeoPackageFiles.readLayer(f, "stations");
        assertEquals(new Coordinate(-9.75, -33.5), st.features().get(1).geometry().getCoordinate());
        assertEquals("M2 \"south\", deep", st.features().get(1).get("name"));
        assertEquals(1200.25, ((Number) st.features().get(1).get("depth_m")).doubleValue(), 0);
        List<PolygonFeature> zones = PolygonFiles.read(f, PolygonFiles.Options.DEFAULT.withLayer("zones"));
        assertEquals("Zone A", zones.get(0).name());
        assertTrue(zones.get(0).polygon().equalsTopo(Fixtures.squareWithHole()));
        assertEquals(2.0, zones.get(1).polygon().getArea(), 1e-12);
    }

    @Test
    void geoPackagePassesGdalsConformanceValidator() throws Exception {
        // GDAL's validate_gpkg.py (python3-gdal, a dependency of Debian's gdal-bin) checks the requirements of the
        // GeoPackage specification (OGC 12-128r18) one by one and exits non-zero on the first failure.
        Path validator = Path.of("/usr/lib/python3/dist-packages/osgeo_utils/samples/validate_gpkg.py");
        assertTrue(Files.exists(validator), "GDAL's validate_gpkg.py is missing: install Debian's gdal-bin (python3-gdal)");
        Geometry across = Fixtures.GF.createPolygon(Fixtures.ring(170, -10, 190, -10, 190, 10, 170, 10, 170, -10));
        FeatureLayer mixed = new FeatureLayer("mixed_zones", List.of(Feature.of(Fixtures.squareWithHole(), "name", "A"),
                Feature.of(across, "name", "across 180")));
        Path f = dir.resolve("valid.gpkg");
        GeoPackageFiles.write(f, List.of(Fixtures.stations(), Fixtures.transects(), Fixtures.zones(), mixed));
        Ogr.Run r = Ogr.run("/usr/bin/python3", validator.toString(), f.toString());
        assertEquals(0, r.exit(), r.out() + r.err());
        assertEquals("", r.out().strip() + r.err().strip());
        Ogr.Layer l = Ogr.summary(f).get("mixed_zones");
        assertEquals("Multi Polygon", l.geometry());
        assertExtent(l, -180, -10, 180, 50);
    }

    @Test
    void geoPackageIsReproducible() throws Exception {
        Path a = dir.resolve("a.gpkg"), b = dir.resolve("b.gpkg");
        GeoPackageFiles.write(a, List.of(Fixtures.zones()));
        GeoPackageFiles.write(b, List.of(Fixtures.zones()));
        assertArrayEquals(Files.readAllBytes(a), Files.readAllBytes(b));
    }

    static Document parseXml(Path f) throws Exception {
        DocumentBuilderFactory dbf = DocumentBuilderFactory.newInstance();
        dbf.setNamespaceAware(true);
        return dbf.newDocumentBuilder().parse(f.toFile());
    }

    @Test
    void gpxHasWaypointsRouteAndCaution() throws Exception {
        Path f = dir.resolve("cruise.gpx");
        List<GpxFiles.Waypoint> wpts = List.of(new GpxFiles.Waypoint("S1", 10.25, 54.5, "CTD"),
                new GpxFiles.Waypoint("S2", 190.5, 55.0, null));
        GpxFiles.Route route = new GpxFiles.Route("Leg 1", "survey leg", wpts);
        GpxFiles.write(f, "Invented cruise", Instant.parse("2026-12-01T00:00:00Z"), wpts, List.of(route));

        Map<String, Ogr.Layer> layers = Ogr.summary(f);
        Ogr.Layer w = layers.get("waypoints");
        assertEquals("Point", w.geometry());
        assertEquals(2, w.featureCount());
        assertExtent(w, -169.5, 54.5, 10.25, 55.0); // 190.5° written as −169.5°
        assertWgs84(w);
        assertEquals(1, layers.get("routes").featureCount());
        assertEquals(2, layers.get("route_points").featureCount());
        assertTrue(Ogr.attributeLines(Ogr.dump(f).out()).contains("name (String) = S1"));

        Document d = parseXml(f);
        String ns = GpxFiles.NAMESPACE;
        assertEquals("1.1", d.getDocumentElement().getAttribute("version"));
        Element meta = (Element) d.getElementsByTagNameNS(ns, "metadata").item(0);
        assertTrue(meta.getElementsByTagNameNS(ns, "desc").item(0).getTextContent().startsWith("Not for navigation"));
        NodeList wp = d.getElementsByTagNameNS(ns, "wpt");
        assertEquals(2, wp.getLength());
        assertEquals(54.5, Double.parseDouble(((Element) wp.item(0)).getAttribute("lat")), 0);
        assertEquals(-169.5, Double.parseDouble(((Element) wp.item(1)).getAttribute("lon")), 0);
        assertEquals(2, d.getElementsByTagNameNS(ns, "rtept").getLength());

        List<GpxFiles.Waypoint> fromLayer = GpxFiles.waypoints(Fixtures.stations());
        assertEquals("M1", fromLayer.get(0).name());
        assertEquals(-33.5, fromLayer.get(1).latDeg(), 0);
        assertThrows(IllegalArgumentException.class, () -> GpxFiles.waypoints(Fixtures.zones()));
    }

    @Test
    void kmlHasPlacemarksForEachGeometryAndCaution() throws Exception {
        Path f = dir.resolve("plan.kml");
        KmlFiles.write(f, "Invented plan", List.of(Fixtures.stations(), Fixtures.transects(), Fixtures.zones()));

        Map<String, Ogr.Layer> layers = Ogr.summary(f);
        assertEquals(2, layers.get("stations").featureCount());
        assertEquals(1, layers.get("transects").featureCount());
        assertEquals(2, layers.get("zones").featureCount());
        // GDAL's LIBKML driver reports "Unknown (any)" layer types; check each feature's geometry in the dump
        assertExtent(layers.get("zones"), 0, 30, 22, 50);
        assertExtent(layers.get("stations"), -9.75, -33.5, 12.5, 54.25);
        assertWgs84(layers.get("zones"));
        String dump = Ogr.dump(f).out();
        List<Geometry> geoms = Ogr.geometries(dump);
        assertEquals(5, geoms.size(), dump);
        assertTrue(geoms.get(0).equalsExact(Fixtures.stations().features().get(0).geometry()), geoms.get(0).toText());
        assertTrue(geoms.get(2).equalsExact(Fixtures.transects().features().get(0).geometry()), geoms.get(2).toText());
        assertTrue(geoms.get(3).equalsTopo(Fixtures.squareWithHole()), geoms.get(3).toText());
        assertTrue(Ogr.attributeLines(dump).contains("depth_m (String) = 1200.25"), dump);
        assertTrue(Ogr.attributeLines(dump).contains("Name (String) = Zone A"), dump);

        Document d = parseXml(f);
        String ns = KmlFiles.NAMESPACE;
        Element doc = (Element) d.getElementsByTagNameNS(ns, "Document").item(0);
        assertTrue(((Element) doc.getElementsByTagNameNS(ns, "description").item(0)).getTextContent()
                .startsWith("Not for navigation"));
        assertEquals(5, d.getElementsByTagNameNS(ns, "Placemark").getLength());
        assertEquals(1, d.getElementsByTagNameNS(ns, "innerBoundaryIs").getLength());
        assertEquals("12.5,54.25", d.getElementsByTagNameNS(ns, "Point").item(0).getTextContent().trim());
    }
}
