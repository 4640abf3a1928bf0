package org.gyreplan.gisdata.basemap;

import org.gyreplan.gisdata.vector.Json;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.GeometryFactory;
import org.locationtech.jts.geom.LineString;
import org.locationtech.jts.geom.LinearRing;
import org.locationtech.jts.geom.Polygon;
import org.locationtech.jts.geom.PrecisionModel;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;

/**
 * Decodes TopoJSON (Bostock, "TopoJSON Format Specification" 1.0, 2013–2016) into JTS geometries.
 *
 * <p>A topology stores shared line pieces once, as <em>arcs</em>; geometries list arc indices, a negative index
 * {@code ~i} (= −i − 1) meaning arc {@code i} reversed. When the topology has a {@code transform}, arc positions
 * are quantised and delta-encoded (§2.2.1–2.2.2): the first position is absolute, each later one is the
 * difference from the previous, all in integer units, and
 * <pre>
 *   x = (Σ Δxₖ) · scale[0] + translate[0],   y = (Σ Δyₖ) · scale[1] + translate[1]
 * </pre>
 * Rings and lines are stitched from arcs; the first position of each following arc repeats the last position of
 * the previous one and is dropped (§2.2.3). Coordinates are as in the file (for world-atlas: degrees of longitude
 * and latitude, unprojected).
 */
public final class TopoJson {
    private final List<Coordinate[]> arcs = new ArrayList<>();
    private final Map<String, Object> objects;
    private final GeometryFactory factory;
    private final double[] scale;
    private final double[] translate;

    private TopoJson(Map<String, Object> topology, GeometryFactory factory) {
        this.factory = factory;
        if (!"Topology".equals(topology.get("type"))) throw new IllegalArgumentException("not a TopoJSON Topology object");
        Object t = topology.get("transform");
        this.scale = t instanceof Map ? doubles(((Map<?, ?>) t).get("scale")) : null;
        this.translate = t instanceof Map ? doubles(((Map<?, ?>) t).get("translate")) : null;
        for (Object a : (List<?>) topology.get("arcs")) {
            List<?> pts = (List<?>) a;
            Coordinate[] cs = new Coordinate[pts.size()];
            long qx = 0, qy = 0;
            for (int k = 0; k < cs.length; k++) {
                List<?> p = (List<?>) pts.get(k);
                if (scale != null) {
                    qx += ((Number) p.get(0)).longValue();
                    qy += ((Number) p.get(1)).longValue();
                    cs[k] = new Coordinate(qx * scale[0] + translate[0], qy * scale[1] + translate[1]);
                } else {
                    cs[k] = new Coordinate(((Number) p.get(0)).doubleValue(), ((Number) p.get(1)).doubleValue());
                }
            }
            arcs.add(cs);
        }
        @SuppressWarnings("unchecked")
        Map<String, Object> o = (Map<String, Object>) topology.get("objects");
        this.objects = o;
    }

    private static double[] doubles(Object o) {
        List<?> l = (List<?>) o;
        return new double[] {((Number) l.get(0)).doubleValue(), ((Number) l.get(1)).doubleValue()};
    }

    /** Parses a topology (JSON text). */
    public static TopoJson parse(String json) {
        Object root = Json.parse(json);
        if (!(root instanceof Map)) throw new IllegalArgumentException("TopoJSON must be a JSON object");
        @SuppressWarnings("unchecked")
        Map<String, Object> m = (Map<String, Object>) root;
        return new TopoJson(m, new GeometryFactory(new PrecisionModel(), 4326));
    }

    /** Names of the topology's objects. */
    public List<String> objectNames() { return List.copyOf(objects.keySet()); }

    /** Number of arcs. */
    public int arcCount() { return arcs.size(); }

    /**
     * The geometries of a named object (a GeometryCollection gives one geometry per member), in file order.
     * Rings are built as decoded; validity is not checked here.
     */
    public List<Geometry> geometries(String objectName) {
        Object o = objects.get(objectName);
        if (!(o instanceof Map)) throw new IllegalArgumentException("no object \"" + objectName + "\"; objects are " + objects.keySet());
        List<Geometry> out = new ArrayList<>();
        collect((Map<?, ?>) o, out);
        return out;
    }

    private void collect(Map<?, ?> g, List<Geometry> out) {
        String type = String.valueOf(g.get("type"));
        switch (type) {
            case "GeometryCollection":
                for (Object m : (List<?>) g.get("geometries")) collect((Map<?, ?>) m, out);
                break;
            case "Polygon":
                out.add(polygon((List<?>) g.get("arcs")));
                break;
            case "MultiPolygon": {
                List<?> ps = (List<?>) g.get("arcs");
                Polygon[] polys = new Polygon[ps.size()];
                for (int k = 0; k < polys.length; k++) polys[k] = polygon((List<?>) ps.get(k));
                out.add(factory.createMultiPolygon(polys));
                break;
            }
            case "LineString":
                out.add(factory.createLineString(stitch((List<?>) g.get("arcs"))));
                break;
            case "MultiLineString": {
                List<?> ls = (List<?>) g.get("arcs");
                LineString[] lines = new LineString[ls.size()];
                for (int k = 0; k < lines.length; k++) lines[k] = factory.createLineString(stitch((List<?>) ls.get(k)));
                out.add(factory.createMultiLineString(lines));
                break;
            }
            case "Point":
                out.add(factory.createPoint(position((List<?>) g.get("coordinates"))));
                break;
            case "MultiPoint": {
                List<?> ps = (List<?>) g.get("coordinates");
                Coordinate[] cs = new Coordinate[ps.size()];
                for (int k = 0; k < cs.length; k++) cs[k] = position((List<?>) ps.get(k));
                out.add(factory.createMultiPointFromCoords(cs));
                break;
            }
            default:
                if (g.get("type") == null) break; // null geometry
                throw new IllegalArgumentException("unknown TopoJSON geometry type " + type);
        }
    }

    /** A point position: quantised (not delta-encoded) when the topology has a transform (§2.2.1). */
    private Coordinate position(List<?> p) {
        double x = ((Number) p.get(0)).doubleValue(), y = ((Number) p.get(1)).doubleValue();
        return scale == null ? new Coordinate(x, y) : new Coordinate(x * scale[0] + translate[0], y * scale[1] + translate[1]);
    }

    private Polygon polygon(List<?> rings) {
        LinearRing shell = factory.createLinearRing(stitch((List<?>) rings.get(0)));
        LinearRing[] holes = new LinearRing[rings.size() - 1];
        for (int k = 1; k < rings.size(); k++) holes[k - 1] = factory.createLinearRing(stitch((List<?>) rings.get(k)));
        return factory.createPolygon(shell, holes);
    }

    /** Concatenates arcs (negative index = reversed arc), dropping each following arc's repeated first position. */
    Coordinate[] stitch(List<?> arcIndices) {
        List<Coordinate> out = new ArrayList<>();
        for (Object o : arcIndices) {
            int i = ((Number) o).intValue();
            boolean reversed = i < 0;
            Coordinate[] arc = arcs.get(reversed ? ~i : i);
            int n = arc.length;
            for (int k = 0; k < n; k++) {
                if (k == 0 && !out.isEmpty()) continue;
                out.add(new Coordinate(arc[reversed ? n - 1 - k : k]));
            }
        }
        return out.toArray(new Coordinate[0]);
    }

}
