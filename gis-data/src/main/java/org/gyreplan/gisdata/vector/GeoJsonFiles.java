package org.gyreplan.gisdata.vector;

import org.gyreplan.gisdata.io.AtomicWrite;
import org.gyreplan.gisdata.vector.GeometryFileException.Problem;
import org.locationtech.jts.algorithm.Orientation;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.LineString;
import org.locationtech.jts.geom.MultiLineString;
import org.locationtech.jts.geom.MultiPoint;
import org.locationtech.jts.geom.MultiPolygon;
import org.locationtech.jts.geom.Point;
import org.locationtech.jts.geom.Polygon;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;

/**
 * GeoJSON (RFC 7946, Butler et al. 2016) reading and writing.
 *
 * <p>Reading accepts a FeatureCollection, a Feature or a bare geometry. Positions are [longitude, latitude(,
 * altitude)] in WGS 84 degrees; a legacy {@code crs} member is accepted only when it names WGS 84 longitude/latitude
 * (CRS84 or EPSG:4326). Writing produces a FeatureCollection with no {@code crs} member, longitudes brought into
 * [−180°, 180°] (geometries crossing the antimeridian are split there, RFC 7946 §3.1.9), exterior rings
 * counter-clockwise and holes clockwise (the right-hand rule of §3.1.6), and coordinates rounded to 1e-7°
 * (about 1 cm; §11.2 recommends about six decimals).
 */
public final class GeoJsonFiles {
    private GeoJsonFiles() {}

    /** Decimal places written for coordinates (1e-7° ≈ 1.1 cm). */
    public static final int COORDINATE_DECIMALS = 7;

    // ------------------------------------------------------------------ reading

    /** Reads polygon features (Polygon/MultiPolygon only; any other geometry is refused with its feature named). */
    static List<PolygonFeature> readPolygons(Path file, boolean repair) throws IOException {
        List<PolygonFeature> out = new ArrayList<>();
        List<Map<String, Object>> features = featureObjects(file);
        for (int k = 0; k < features.size(); k++) {
            Map<String, Object> f = features.get(k);
            Map<String, Object> props = properties(file, k, f);
            String name = PolygonAssembly.nameFrom(props, f.get("id"));
            PolygonAssembly a = new PolygonAssembly(file, k, name, repair);
            Object g = f.get("geometry");
            if (!(g instanceof Map)) throw a.error(Problem.NOT_POLYGON, null, "has no geometry; expected a Polygon or MultiPolygon");
            Map<?, ?> gm = (Map<?, ?>) g;
            String type = String.valueOf(gm.get("type"));
            List<List<Coordinate[]>> parts = new ArrayList<>();
            if (type.equals("Polygon")) {
                parts.add(rings(a, gm.get("coordinates"), "Polygon"));
            } else if (type.equals("MultiPolygon")) {
                for (Object p : list(a, gm.get("coordinates"), "MultiPolygon coordinates")) parts.add(rings(a, p, "MultiPolygon part"));
            } else {
                throw a.error(Problem.NOT_POLYGON, null, "geometry type is " + type
                        + "; a basin, exclusion zone or study area must be a Polygon or MultiPolygon");
            }
            out.add(a.feature(a.polygonal(parts), props));
        }
        if (out.isEmpty()) throw new GeometryFileException(Problem.NO_POLYGONS, file, -1, null, null, "no features");
        return out;
    }

    /**
     * Reads every feature of a GeoJSON file (points, lines, polygons and their Multi- forms) with its properties.
     * Polygon rings must be closed with at least 4 points; polygon validity (self-intersection etc.) is not checked
     * here — read basins and zones with {@link PolygonFiles}, which does.
     */
    public static FeatureLayer readFeatures(Path file) throws IOException {
        List<Feature> out = new ArrayList<>();
        List<Map<String, Object>> features = featureObjects(file);
        for (int k = 0; k < features.size(); k++) {
            Map<String, Object> f = features.get(k);
            Map<String, Object> props = properties(file, k, f);
            PolygonAssembly a = new PolygonAssembly(file, k, PolygonAssembly.nameFrom(props, f.get("id")), false)
                    .withoutValidation();
            Object g = f.get("geometry");
            if (!(g instanceof Map)) throw a.error(Problem.UNREADABLE, null, "has no geometry");
            out.add(new Feature(geometry(a, (Map<?, ?>) g), props));
        }
        String base = file.getFileName().toString().replaceFirst("\\.[^.]*$", "");
        return new FeatureLayer(base.isBlank() ? "features" : base, out);
    }

    private static List<Map<String, Object>> featureObjects(Path file) throws IOException {
        Object root;
        try {
            root = Json.parse(Files.readString(file, StandardCharsets.UTF_8));
        } catch (IllegalArgumentException e) {
            throw new GeometryFileException(Problem.UNREADABLE, file, -1, null, null, e.getMessage());
        }
        if (!(root instanceof Map)) {
            throw new GeometryFileException(Problem.UNREADABLE, file, -1, null, null, "expected a JSON object with a \"type\" member");
        }
        @SuppressWarnings("unchecked")
        Map<String, Object> m = (Map<String, Object>) root;
        checkCrs(file, m.get("crs"));
        String type = String.valueOf(m.get("type"));
        List<Map<String, Object>> features = new ArrayList<>();
        switch (type) {
            case "FeatureCollection": {
                Object fs = m.get("features");
                if (!(fs instanceof List)) {
                    throw new GeometryFileException(Problem.UNREADABLE, file, -1, null, null, "FeatureCollection without a \"features\" array");
                }
                int k = 0;
                for (Object f : (List<?>) fs) {
                    if (!(f instanceof Map) || !"Feature".equals(((Map<?, ?>) f).get("type"))) {
                        throw new GeometryFileException(Problem.UNREADABLE, file, k, null, null, "is not a GeoJSON Feature object");
                    }
                    @SuppressWarnings("unchecked")
                    Map<String, Object> fm = (Map<String, Object>) f;
                    features.add(fm);
                    k++;
                }
                break;
            }
            case "Feature":
                features.add(m);
                break;
            case "Point": case "MultiPoint": case "LineString": case "MultiLineString": case "Polygon":
            case "MultiPolygon": case "GeometryCollection": {
                Map<String, Object> f = new LinkedHashMap<>();
                f.put("type", "Feature");
                f.put("geometry", m);
                f.put("properties", null);
                features.add(f);
                break;
            }
            case "Topology":
                throw new GeometryFileException(Problem.UNSUPPORTED_FORMAT, file, -1, null, null, "is TopoJSON, not GeoJSON;"
                        + " convert it first, e.g. ogr2ogr -f GeoJSON out.geojson " + file.getFileName());
            default:
                throw new GeometryFileException(Problem.UNREADABLE, file, -1, null, null, "unknown GeoJSON type \"" + type
                        + "\"; expected FeatureCollection, Feature or a geometry");
        }
        return features;
    }

    private static void checkCrs(Path file, Object crs) throws GeometryFileException {
        if (crs == null) return;
        String text = crs.toString();
        String t = text.toUpperCase(Locale.ROOT).replace(" ", "");
        if (t.contains("CRS84") || t.contains("EPSG::4326") || t.contains("EPSG:4326")) return;
        throw new GeometryFileException(Problem.UNSUPPORTED_CRS, file, -1, null, null, "declares coordinate reference "
                + text + "; RFC 7946 GeoJSON must be WGS 84 longitude/latitude (reproject, e.g. ogr2ogr -t_srs EPSG:4326)");
    }

    private static Map<String, Object> properties(Path file, int k, Map<String, Object> f) throws GeometryFileException {
        Object p = f.get("properties");
        if (p == null) return new LinkedHashMap<>();
        if (!(p instanceof Map)) throw new GeometryFileException(Problem.UNREADABLE, file, k, null, null, "\"properties\" is not an object");
        @SuppressWarnings("unchecked")
        Map<String, Object> pm = (Map<String, Object>) p;
        return new LinkedHashMap<>(pm);
    }

    private static List<?> list(PolygonAssembly a, Object o, String what) throws GeometryFileException {
        if (!(o instanceof List)) throw a.error(Problem.UNREADABLE, null, what + " is not an array");
        return (List<?>) o;
    }

    private static Coordinate position(PolygonAssembly a, Object o, String what) throws GeometryFileException {
        List<?> p = list(a, o, what + " position");
        if (p.size() < 2 || !(p.get(0) instanceof Number) || !(p.get(1) instanceof Number)) {
            throw a.error(Problem.UNREADABLE, null, what + " has position " + p + "; expected [longitude, latitude]");
        }
        Coordinate c = new Coordinate(((Number) p.get(0)).doubleValue(), ((Number) p.get(1)).doubleValue());
        a.checkCoordinate(c, what);
        return c;
    }

    private static Coordinate[] positions(PolygonAssembly a, Object o, String what) throws GeometryFileException {
        List<?> l = list(a, o, what);
        Coordinate[] cs = new Coordinate[l.size()];
        for (int k = 0; k < cs.length; k++) cs[k] = position(a, l.get(k), what);
        return cs;
    }

    private static List<Coordinate[]> rings(PolygonAssembly a, Object o, String what) throws GeometryFileException {
        List<Coordinate[]> rings = new ArrayList<>();
        int r = 0;
        for (Object ring : list(a, o, what + " rings")) rings.add(positions(a, ring, what + " ring " + r++));
        return rings;
    }

    private static Geometry geometry(PolygonAssembly a, Map<?, ?> g) throws GeometryFileException {
        String type = String.valueOf(g.get("type"));
        Object c = g.get("coordinates");
        var f = PolygonAssembly.FACTORY;
        switch (type) {
            case "Point": return f.createPoint(position(a, c, "Point"));
            case "MultiPoint": return f.createMultiPointFromCoords(positions(a, c, "MultiPoint"));
            case "LineString": return f.createLineString(positions(a, c, "LineString"));
            case "MultiLineString": {
                List<LineString> ls = new ArrayList<>();
                for (Object l : list(a, c, "MultiLineString")) ls.add(f.createLineString(positions(a, l, "MultiLineString part")));
                return f.createMultiLineString(ls.toArray(new LineString[0]));
            }
            case "Polygon": return a.polygonal(List.of(rings(a, c, "Polygon")));
            case "MultiPolygon": {
                List<List<Coordinate[]>> parts = new ArrayList<>();
                for (Object p : list(a, c, "MultiPolygon")) parts.add(rings(a, p, "MultiPolygon part"));
                Geometry g2 = a.polygonal(parts);
                return g2 instanceof Polygon ? f.createMultiPolygon(new Polygon[] {(Polygon) g2}) : g2;
            }
            case "GeometryCollection": {
                List<Geometry> gs = new ArrayList<>();
                for (Object x : list(a, g.get("geometries"), "GeometryCollection")) {
                    if (!(x instanceof Map)) throw a.error(Problem.UNREADABLE, null, "GeometryCollection member is not an object");
                    gs.add(geometry(a, (Map<?, ?>) x));
                }
                return f.createGeometryCollection(gs.toArray(new Geometry[0]));
            }
            default: throw a.error(Problem.UNREADABLE, null, "unknown geometry type \"" + type + "\"");
        }
    }

    // ------------------------------------------------------------------ writing

    /** Writes a layer as an RFC 7946 FeatureCollection (UTF-8), atomically. */
    public static void write(Path target, FeatureLayer layer) throws IOException {
        AtomicWrite.writeString(target, toJson(layer));
    }

    /** The RFC 7946 FeatureCollection text of a layer (one feature per line). */
    public static String toJson(FeatureLayer layer) {
        StringBuilder b = new StringBuilder(1 << 12);
        b.append("{\"type\":\"FeatureCollection\",\"name\":");
        Json.quote(b, layer.name());
        b.append(",\"features\":[");
        boolean first = true;
        for (Feature f : layer.features()) {
            b.append(first ? "\n" : ",\n");
            first = false;
            b.append("{\"type\":\"Feature\",\"properties\":");
            properties(b, f.properties());
            b.append(",\"geometry\":");
            geometry(b, Antimeridian.toStandardRange(f.geometry()));
            b.append('}');
        }
        b.append("\n]}\n");
        return b.toString();
    }

    static void properties(StringBuilder b, Map<String, Object> props) {
        b.append('{');
        boolean first = true;
        for (Map.Entry<String, Object> e : props.entrySet()) {
            if (!first) b.append(',');
            first = false;
            Json.quote(b, e.getKey());
            b.append(':');
            value(b, e.getValue());
        }
        b.append('}');
    }

    private static void value(StringBuilder b, Object v) {
        if (v == null) b.append("null");
        else if (v instanceof Boolean) b.append(v);
        else if (v instanceof Integer || v instanceof Long || v instanceof Short || v instanceof Byte) b.append(v);
        else if (v instanceof Number) {
            double d = ((Number) v).doubleValue();
            if (Double.isFinite(d)) {
                String t = VectorText.number(d);
                b.append(t);
                if (t.indexOf('.') < 0 && t.indexOf('E') < 0) b.append(".0"); // keep it a real number for readers
            } else {
                b.append("null");
            }
        } else if (v instanceof Instant) Json.quote(b, v.toString());
        else Json.quote(b, String.valueOf(v));
    }

    private static void geometry(StringBuilder b, Geometry g) {
        if (g instanceof Point) {
            b.append("{\"type\":\"Point\",\"coordinates\":");
            position(b, ((Point) g).getCoordinate());
        } else if (g instanceof LineString) {
            b.append("{\"type\":\"LineString\",\"coordinates\":");
            positions(b, g.getCoordinates(), null);
        } else if (g instanceof Polygon) {
            b.append("{\"type\":\"Polygon\",\"coordinates\":");
            polygon(b, (Polygon) g);
        } else if (g instanceof MultiPoint) {
            b.append("{\"type\":\"MultiPoint\",\"coordinates\":");
            positions(b, g.getCoordinates(), null);
        } else if (g instanceof MultiLineString) {
            b.append("{\"type\":\"MultiLineString\",\"coordinates\":[");
            for (int k = 0; k < g.getNumGeometries(); k++) {
                if (k > 0) b.append(',');
                positions(b, g.getGeometryN(k).getCoordinates(), null);
            }
            b.append(']');
        } else if (g instanceof MultiPolygon) {
            b.append("{\"type\":\"MultiPolygon\",\"coordinates\":[");
            for (int k = 0; k < g.getNumGeometries(); k++) {
                if (k > 0) b.append(',');
                polygon(b, (Polygon) g.getGeometryN(k));
            }
            b.append(']');
        } else {
            b.append("{\"type\":\"GeometryCollection\",\"geometries\":[");
            for (int k = 0; k < g.getNumGeometries(); k++) {
                if (k > 0) b.append(',');
                geometry(b, g.getGeometryN(k));
            }
            b.append("]}");
            return;
        }
        b.append('}');
    }

    private static void polygon(StringBuilder b, Polygon p) {
        b.append('[');
        positions(b, p.getExteriorRing().getCoordinates(), Boolean.TRUE);
        for (int h = 0; h < p.getNumInteriorRing(); h++) {
            b.append(',');
            positions(b, p.getInteriorRingN(h).getCoordinates(), Boolean.FALSE);
        }
        b.append(']');
    }

    /** Writes positions; for rings {@code ccw} asks for counter-clockwise (exterior) or clockwise (hole) order, null keeps the order. */
    private static void positions(StringBuilder b, Coordinate[] cs, Boolean ccw) {
        boolean isRing = ccw != null && cs.length >= 4 && cs[0].equals2D(cs[cs.length - 1]);
        boolean reverse = isRing && Orientation.isCCW(cs) != ccw;
        b.append('[');
        for (int k = 0; k < cs.length; k++) {
            if (k > 0) b.append(',');
            position(b, cs[reverse ? cs.length - 1 - k : k]);
        }
        b.append(']');
    }

    private static void position(StringBuilder b, Coordinate c) {
        b.append('[').append(VectorText.coordinate(c.x)).append(',').append(VectorText.coordinate(c.y)).append(']');
    }
}
