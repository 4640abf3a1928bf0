package org.gyreplan.gisdata.vector;

import org.gyreplan.gisdata.vector.GeometryFileException.Problem;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.GeometryFactory;
import org.locationtech.jts.geom.LinearRing;
import org.locationtech.jts.geom.Polygon;
import org.locationtech.jts.geom.Polygonal;
import org.locationtech.jts.geom.PrecisionModel;
import org.locationtech.jts.geom.util.GeometryFixer;
import org.locationtech.jts.geom.util.PolygonExtracter;
import org.locationtech.jts.operation.valid.IsValidOp;
import org.locationtech.jts.operation.valid.TopologyValidationError;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;

/**
 * Builds checked JTS polygons from raw rings read by the format readers, and reports problems with the file,
 * feature and location. Shared by all polygon readers so every format gives the same messages.
 *
 * <p>Checks, in order: every coordinate finite, latitude within [−90°, 90°] and longitude within [−540°, 540°]
 * (continuous longitudes beyond ±180° are allowed for basins that cross the antimeridian); every ring closed
 * (first point equals last) and with at least 4 points; the polygon valid by the OGC Simple Features rules
 * ({@link IsValidOp}: no self-intersection, holes inside their shell, ...). With repair, open rings are closed and
 * an invalid polygon is rebuilt by JTS {@link GeometryFixer}, keeping only its polygonal part.
 */
final class PolygonAssembly {
    /** Shared factory: floating precision, SRID 4326. */
    static final GeometryFactory FACTORY = new GeometryFactory(new PrecisionModel(), 4326);

    private final Path file;
    private final int index;
    private final String name;
    private final boolean repair;
    private boolean repaired;
    private boolean validate = true;

    PolygonAssembly(Path file, int index, String name, boolean repair) {
        this.file = file;
        this.index = index;
        this.name = name;
        this.repair = repair;
    }

    /** Skips the IsValidOp check (ring closure and size are still checked): for general feature reading. */
    PolygonAssembly withoutValidation() {
        validate = false;
        return this;
    }

    GeometryFileException error(Problem p, Coordinate at, String detail) {
        return new GeometryFileException(p, file, index, name, at, detail);
    }

    boolean repaired() { return repaired; }

    /** Checks coordinates and closes/validates one ring. */
    LinearRing ring(Coordinate[] pts, String label) throws GeometryFileException {
        for (Coordinate c : pts) checkCoordinate(c, label);
        if (pts.length == 0) throw error(Problem.TOO_FEW_POINTS, null, label + " has no points; a ring needs at least 4 (first = last)");
        Coordinate[] ring = pts;
        if (!pts[0].equals2D(pts[pts.length - 1])) {
            if (!repair) {
                throw error(Problem.RING_NOT_CLOSED, pts[pts.length - 1], label + " does not close: last point ("
                        + fmt(pts[pts.length - 1]) + ") differs from first point (" + fmt(pts[0])
                        + "); repeat the first point at the end, or ask for repair; last point");
            }
            ring = new Coordinate[pts.length + 1];
            System.arraycopy(pts, 0, ring, 0, pts.length);
            ring[pts.length] = new Coordinate(pts[0]);
            repaired = true;
        }
        if (ring.length < 4) {
            throw error(Problem.TOO_FEW_POINTS, ring[0], label + " has " + ring.length
                    + " points (closing point included); a ring needs at least 4; ring starts");
        }
        return FACTORY.createLinearRing(ring);
    }

    void checkCoordinate(Coordinate c, String label) throws GeometryFileException {
        if (!Double.isFinite(c.x) || !Double.isFinite(c.y)) {
            throw error(Problem.COORDINATE_OUT_OF_RANGE, null, label + " has a coordinate that is not a finite number ("
                    + c.x + ", " + c.y + ")");
        }
        if (c.y < -90 || c.y > 90 || c.x < -540 || c.x > 540) {
            throw error(Problem.COORDINATE_OUT_OF_RANGE, null, label + " has coordinate (" + c.x + ", " + c.y
                    + ") outside geographic longitude/latitude (latitude must be within −90…90°, longitude −540…540°);"
                    + " is the file in a projected coordinate reference? Expected WGS 84 longitude/latitude in degrees");
        }
    }

    /** Builds a polygon from a shell and holes (each a raw ring). */
    Polygon polygon(List<Coordinate[]> rings, String label) throws GeometryFileException {
        if (rings.isEmpty()) throw error(Problem.TOO_FEW_POINTS, null, label + " has no rings");
        LinearRing shell = ring(rings.get(0), label + " exterior ring");
        LinearRing[] holes = new LinearRing[rings.size() - 1];
        for (int k = 1; k < rings.size(); k++) holes[k - 1] = ring(rings.get(k), label + " hole " + k);
        return FACTORY.createPolygon(shell, holes);
    }

    /** Builds a Polygon (one part) or MultiPolygon (several) from parts, then validates it. */
    Geometry polygonal(List<List<Coordinate[]>> parts) throws GeometryFileException {
        if (parts.isEmpty()) throw error(Problem.NOT_POLYGON, null, "the geometry is empty; expected a Polygon or MultiPolygon");
        Polygon[] polys = new Polygon[parts.size()];
        for (int k = 0; k < parts.size(); k++) {
            polys[k] = polygon(parts.get(k), parts.size() == 1 ? "polygon" : "polygon part " + k);
        }
        Geometry g = polys.length == 1 ? polys[0] : FACTORY.createMultiPolygon(polys);
        return validate(g);
    }

    /** Validates a polygonal geometry (IsValidOp), or repairs it when asked. */
    Geometry validate(Geometry g) throws GeometryFileException {
        if (!validate) return g;
        IsValidOp op = new IsValidOp(g);
        if (op.isValid()) return g;
        TopologyValidationError e = op.getValidationError();
        if (!repair) {
            throw error(Problem.INVALID_GEOMETRY, e.getCoordinate(), "invalid polygon: "
                    + e.getMessage().toLowerCase(Locale.ROOT) + " (fix the file or ask for repair)");
        }
        Geometry fixed = GeometryFixer.fix(g);
        @SuppressWarnings("unchecked")
        List<Polygon> polys = new ArrayList<>(PolygonExtracter.getPolygons(fixed));
        polys.removeIf(Geometry::isEmpty);
        if (polys.isEmpty()) {
            throw error(Problem.INVALID_GEOMETRY, e.getCoordinate(), "invalid polygon that repair could not save ("
                    + e.getMessage().toLowerCase(Locale.ROOT) + "; nothing polygonal is left)");
        }
        repaired = true;
        Geometry out = polys.size() == 1 ? polys.get(0) : FACTORY.createMultiPolygon(polys.toArray(new Polygon[0]));
        out.setSRID(4326);
        return out;
    }

    /** Wraps a finished geometry as a {@link PolygonFeature}. */
    PolygonFeature feature(Geometry g, Map<String, Object> attributes) {
        if (!(g instanceof Polygonal)) throw new IllegalStateException("not polygonal: " + g.getGeometryType());
        return new PolygonFeature(index, name == null ? "feature " + index : name, g, attributes, repaired);
    }

    static String fmt(Coordinate c) {
        return String.format(Locale.ROOT, "%.6f, %.6f", c.x, c.y);
    }

    /** The feature name from the usual attribute names (name, NAME, Name, title, id), or {@code null}. */
    static String nameFrom(Map<String, Object> attributes, Object fallbackId) {
        for (String key : new String[] {"name", "NAME", "Name", "title", "TITLE", "id", "ID", "Id"}) {
            Object v = attributes.get(key);
            if (v != null && !String.valueOf(v).isBlank()) return String.valueOf(v).trim();
        }
        for (Map.Entry<String, Object> en : attributes.entrySet()) {
            if (en.getKey().equalsIgnoreCase("name") && en.getValue() != null) return String.valueOf(en.getValue()).trim();
        }
        return fallbackId == null ? null : String.valueOf(fallbackId);
    }
}
