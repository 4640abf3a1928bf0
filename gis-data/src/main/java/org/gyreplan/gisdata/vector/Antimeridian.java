package org.gyreplan.gisdata.vector;

import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.CoordinateSequence;
import org.locationtech.jts.geom.CoordinateSequenceFilter;
import org.locationtech.jts.geom.Envelope;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.GeometryFactory;
import org.locationtech.jts.geom.LineString;
import org.locationtech.jts.geom.Point;
import org.locationtech.jts.geom.Polygon;
import org.locationtech.jts.geom.util.LineStringExtracter;
import org.locationtech.jts.geom.util.PolygonExtracter;
import org.locationtech.jts.operation.union.UnaryUnionOp;

import java.util.ArrayList;
import java.util.List;

/**
 * Longitude bookkeeping for geometries near the antimeridian (±180°).
 *
 * <p>Inside Gyreplan longitudes are continuous across a basin: a basin from 170°E to 170°W is stored as
 * 170°…190°. Files follow other habits: RFC 7946 GeoJSON, KML and GPX want longitudes within [−180°, 180°],
 * and a polygon that crosses the antimeridian is then given split in two parts (one ending at 180°, one starting
 * at −180°). {@link #toStandardRange} makes the file form; {@link #intoRange} makes the continuous form for a
 * given longitude window (a grid or a map box).
 */
public final class Antimeridian {
    private Antimeridian() {}

    /**
     * The geometry with every longitude in [−180°, 180°]: points are wrapped by multiples of 360°, lines and
     * polygons are cut at ±180° (and ±540°) and each piece is shifted by a multiple of 360°. Returns the same
     * instance when all longitudes are already within range.
     */
    public static Geometry toStandardRange(Geometry g) {
        Envelope e = g.getEnvelopeInternal();
        if (e.isNull() || (e.getMinX() >= -180 && e.getMaxX() <= 180)) return g;
        GeometryFactory f = g.getFactory();
        if (g.getDimension() == 0) {
            Geometry c = g.copy();
            c.apply(new Shift(Double.NaN));
            c.geometryChanged();
            return c;
        }
        List<Geometry> pieces = new ArrayList<>();
        long kMin = (long) Math.floor((e.getMinX() + 180) / 360), kMax = (long) Math.ceil((e.getMaxX() - 180) / 360);
        for (long k = kMin; k <= kMax; k++) {
            double west = -180 + 360.0 * k, east = 180 + 360.0 * k;
            if (e.getMaxX() <= west || e.getMinX() >= east) continue;
            Geometry box = f.toGeometry(new Envelope(west, east, e.getMinY() - 1, e.getMaxY() + 1));
            Geometry part = g.intersection(box).copy(); // the overlay may share coordinates with g
            if (part.isEmpty()) continue;
            part.apply(new Shift(-360.0 * k));
            part.geometryChanged();
            pieces.add(part);
        }
        return sameDimension(f, pieces, g.getDimension());
    }

    /**
     * The geometry in the continuous longitudes of a window [westDeg, eastDeg] (e.g. a grid's span, possibly
     * beyond 180°): each polygon, line or point is shifted by the multiple of 360° that puts its centre nearest
     * the window's centre; polygons are then dissolved (unioned) so that parts given split at ±180° join again.
     */
    public static Geometry intoRange(Geometry g, double westDeg, double eastDeg) {
        double mid = 0.5 * (westDeg + eastDeg);
        GeometryFactory f = g.getFactory();
        int dim = g.getDimension();
        List<Geometry> parts = new ArrayList<>();
        boolean shifted = false;
        for (int k = 0; k < g.getNumGeometries(); k++) {
            Geometry p = g.getGeometryN(k);
            Envelope e = p.getEnvelopeInternal();
            if (e.isNull()) continue;
            double c = 0.5 * (e.getMinX() + e.getMaxX());
            double s = 360.0 * Math.round((mid - c) / 360.0);
            if (s != 0) {
                p = p.copy();
                p.apply(new Shift(s));
                p.geometryChanged();
                shifted = true;
            }
            parts.add(p);
        }
        if (!shifted) return g;
        if (dim == 2) {
            Geometry u = UnaryUnionOp.union(parts);
            if (u == null) return f.createMultiPolygon();
            u.setSRID(g.getSRID());
            return u;
        }
        return sameDimension(f, parts, dim);
    }

    @SuppressWarnings("unchecked")
    private static Geometry sameDimension(GeometryFactory f, List<Geometry> pieces, int dim) {
        if (dim == 2) {
            List<Polygon> polys = new ArrayList<>();
            for (Geometry p : pieces) polys.addAll(PolygonExtracter.getPolygons(p));
            polys.removeIf(Geometry::isEmpty);
            return polys.size() == 1 ? polys.get(0) : f.createMultiPolygon(polys.toArray(new Polygon[0]));
        }
        if (dim == 1) {
            List<LineString> lines = new ArrayList<>();
            for (Geometry p : pieces) lines.addAll(LineStringExtracter.getLines(p));
            lines.removeIf(Geometry::isEmpty);
            return lines.size() == 1 ? lines.get(0) : f.createMultiLineString(lines.toArray(new LineString[0]));
        }
        List<Point> pts = new ArrayList<>();
        for (Geometry p : pieces) for (int k = 0; k < p.getNumGeometries(); k++) pts.add((Point) p.getGeometryN(k));
        return pts.size() == 1 ? pts.get(0) : f.createMultiPoint(pts.toArray(new Point[0]));
    }

    /** Wraps a longitude into [−180°, 180°] (180 stays 180). */
    public static double wrap180(double lonDeg) {
        if (lonDeg >= -180 && lonDeg <= 180) return lonDeg;
        double w = lonDeg - 360.0 * Math.floor((lonDeg + 180) / 360.0);
        return w;
    }

    /** Adds a constant to every x (NaN: wrap every x into [−180°, 180°]). */
    private static final class Shift implements CoordinateSequenceFilter {
        private final double dx;
        Shift(double dx) { this.dx = dx; }
        @Override public void filter(CoordinateSequence seq, int i) {
            double x = seq.getX(i);
            seq.setOrdinate(i, 0, Double.isNaN(dx) ? wrap180(x) : x + dx);
        }
        @Override public boolean isDone() { return false; }
        @Override public boolean isGeometryChanged() { return true; }
    }

    /** A copy of the geometry shifted eastward by {@code dLonDeg}. */
    public static Geometry shift(Geometry g, double dLonDeg) {
        Geometry c = g.copy();
        c.apply(new Shift(dLonDeg));
        c.geometryChanged();
        return c;
    }

    static Coordinate wrapped(Coordinate c) {
        return new Coordinate(wrap180(c.x), c.y);
    }
}
