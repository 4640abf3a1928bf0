package org.gyreplan.solver.coast;

import net.sf.geographiclib.Geodesic;
import net.sf.geographiclib.GeodesicData;
import net.sf.geographiclib.GeodesicMask;
import org.gyreplan.solver.DegreeTrig;
import org.gyreplan.solver.PhysicalConstants;
import org.locationtech.jts.algorithm.Orientation;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.LineString;
import org.locationtech.jts.geom.LinearRing;
import org.locationtech.jts.geom.Polygon;
import org.locationtech.jts.operation.linemerge.LineMerger;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Objects;

/**
 * A coastline in longitude/latitude with along-coast distance, a smoothed orientation and the offshore normal.
 *
 * <h2>Orientation</h2>
 * <pre>
 *   s        distance along the coast from the first vertex (geodesic, km)
 *   P, A, B  the points of the coast at s, s − L/2 and s + L/2 (clamped to the ends of an open line,
 *            wrapped around a closed ring)
 *   α_B      azimuth at P of the geodesic P→B;  α_A  azimuth at P of the geodesic P→A
 *   θ(s)     direction of the unit-vector sum  ê(α_B) + ê(α_A + 180°)   (degrees clockwise from north)
 *   coast bearing    = θ(s) if the ocean lies right of the vertex order, θ(s) + 180° otherwise
 *   offshore bearing = coast bearing + 90°
 * </pre>
 * <table>
 *   <caption>Symbols</caption>
 *   <tr><td>L</td><td>smoothing length (default {@value #DEFAULT_SMOOTHING_KM} km, user-set)</td><td>km</td></tr>
 *   <tr><td>s</td><td>along-coast distance</td><td>km</td></tr>
 *   <tr><td>θ</td><td>chord azimuth</td><td>degrees</td></tr>
 * </table>
 * <p>θ is the bisector, at P, of the directions "from A" and "toward B" (in the local tangent plane at P), i.e.
 * the direction of the chord A→B seen from P. For a coast that is itself a geodesic (great-circle) segment both
 * directions equal the local bearing of the coast, so θ is exact; on a circular coast A and B are symmetric about
 * the radius through P, so the offshore normal points exactly at the centre (the basin interior). Features
 * shorter than L are smoothed away. Near the end of an open line only the direction to the remaining side is
 * used; if the two directions cancel (a coast folding back on itself within L) the bearing of the local segment
 * is used instead.
 *
 * <h2>Which side is the ocean</h2>
 * <ul>
 *   <li>{@link #ofBasin(Polygon, PhysicalConstants)}: the polygon is the ocean basin; the ocean is inside its
 *       exterior ring, whatever the ring's orientation (tested with {@link Orientation#isCCW} in the
 *       longitude/latitude plane, valid for rings that do not enclose a pole).</li>
 *   <li>{@link #ofLandPolygon(Polygon, PhysicalConstants)}: the polygon is land; the ocean is outside.</li>
 *   <li>{@link #ofLand(LineString, OceanSide, PhysicalConstants)} or
 *       {@link #ofLand(LineString, double, double, PhysicalConstants)}: an open coast line and the side of the
 *       ocean, given explicitly or by a point at sea.</li>
 * </ul>
 * Along-coast distance always runs in the vertex order of the input geometry, from its first vertex.
 *
 * <p>Validity: coast segments are geodesics on a sphere; the smoothing length should be small compared with
 * the coast (an open line clamps the chord at its ends, so bearings within L/2 of an end are one-sided).
 * Instances are immutable.
 */
public final class Coastline {
    /** Default smoothing length of the coast orientation, km. */
    public static final double DEFAULT_SMOOTHING_KM = 100.0;
    private static final int FULL = GeodesicMask.STANDARD | GeodesicMask.LONG_UNROLL;

    private final double[] lonDeg;
    private final double[] latDeg;
    private final double[] cumKm;
    private final double[] segAzi;
    private final boolean closed;
    private final boolean oceanOnRight;
    private final double smoothingLengthKm;
    private final Geodesic geod;
    private final PhysicalConstants constants;

    private Coastline(double[] lon, double[] lat, boolean closed, boolean oceanOnRight,
                      double smoothingLengthKm, PhysicalConstants constants) {
        this.constants = Objects.requireNonNull(constants, "constants");
        this.geod = new Geodesic(constants.earthRadius(), 0.0);
        // drop repeated vertices
        List<double[]> pts = new ArrayList<>();
        for (int k = 0; k < lon.length; k++) {
            if (!Double.isFinite(lon[k]) || !Double.isFinite(lat[k]) || Math.abs(lat[k]) > 90) {
                throw new IllegalArgumentException("coastline vertex " + k + " is not a valid lon/lat position: ("
                        + lon[k] + ", " + lat[k] + ")");
            }
            if (!pts.isEmpty()) {
                double[] p = pts.get(pts.size() - 1);
                if (p[0] == lon[k] && p[1] == lat[k]) continue;
            }
            pts.add(new double[] {lon[k], lat[k]});
        }
        if (closed && pts.size() > 1) {
            double[] a = pts.get(0), b = pts.get(pts.size() - 1);
            if (a[0] == b[0] && a[1] == b[1]) pts.remove(pts.size() - 1);
            pts.add(pts.get(0).clone());   // store the closing vertex explicitly
        }
        if (pts.size() < 2 || (closed && pts.size() < 4)) {
            throw new IllegalArgumentException("a coastline needs at least 2 distinct vertices (a ring at least 3), got "
                    + pts.size());
        }
        int n = pts.size();
        this.lonDeg = new double[n];
        this.latDeg = new double[n];
        for (int k = 0; k < n; k++) { lonDeg[k] = pts.get(k)[0]; latDeg[k] = pts.get(k)[1]; }
        this.cumKm = new double[n];
        this.segAzi = new double[n - 1];
        for (int k = 0; k < n - 1; k++) {
            GeodesicData g = geod.Inverse(latDeg[k], lonDeg[k], latDeg[k + 1], lonDeg[k + 1]);
            segAzi[k] = g.azi1;
            cumKm[k + 1] = cumKm[k] + g.s12 / 1000.0;
        }
        this.closed = closed;
        this.oceanOnRight = oceanOnRight;
        if (!(smoothingLengthKm > 0) || Double.isInfinite(smoothingLengthKm)) {
            throw new IllegalArgumentException("smoothing length must be a positive number of km, got " + smoothingLengthKm);
        }
        this.smoothingLengthKm = smoothingLengthKm;
    }

    /** The coast of an ocean basin: the exterior ring of {@code basin} (x = longitude, y = latitude, degrees); ocean inside. */
    public static Coastline ofBasin(Polygon basin, PhysicalConstants constants) {
        LinearRing ring = Objects.requireNonNull(basin, "basin").getExteriorRing();
        boolean ccw = Orientation.isCCW(ring.getCoordinateSequence());
        // walking counter-clockwise, the interior (ocean) is on the left
        return ofRing(ring.getCoordinates(), !ccw, constants);
    }

    /** The coast of a land polygon (exterior ring); the ocean lies outside. */
    public static Coastline ofLandPolygon(Polygon land, PhysicalConstants constants) {
        LinearRing ring = Objects.requireNonNull(land, "land").getExteriorRing();
        boolean ccw = Orientation.isCCW(ring.getCoordinateSequence());
        // walking counter-clockwise, the interior (land) is on the left, so the ocean is on the right
        return ofRing(ring.getCoordinates(), ccw, constants);
    }

    /** An open coast line with the ocean on the given side of its vertex order. */
    public static Coastline ofLand(LineString coast, OceanSide side, PhysicalConstants constants) {
        Coordinate[] c = Objects.requireNonNull(coast, "coast").getCoordinates();
        return new Coastline(lons(c), lats(c), false, Objects.requireNonNull(side, "side") == OceanSide.RIGHT,
                DEFAULT_SMOOTHING_KM, constants);
    }

    /**
     * An open coast line with the ocean on the side of the given sea point (decided at the coast point nearest to it,
     * from the local segment direction).
     */
    public static Coastline ofLand(LineString coast, double seaLonDeg, double seaLatDeg, PhysicalConstants constants) {
        Coastline right = ofLand(coast, OceanSide.RIGHT, constants);
        double s = right.nearestAlongKm(seaLonDeg, seaLatDeg);
        double[] p = right.positionAt(s);
        GeodesicData g = right.geod.Inverse(p[1], p[0], seaLatDeg, seaLonDeg);
        if (g.s12 < 1.0) {
            throw new IllegalArgumentException("the sea point (" + seaLonDeg + ", " + seaLatDeg
                    + ") lies on the coast line; give a point at sea");
        }
        double rel = DegreeTrig.wrap180(g.azi1 - right.segAzi[right.segmentOf(s)]);
        return rel > 0 ? right : new Coastline(right.lonDeg, right.latDeg, false, false, DEFAULT_SMOOTHING_KM, constants);
    }

    /**
     * Coastlines from several land line strings (a {@code LineString}, {@code MultiLineString} or collection): pieces
     * whose ends touch are merged (JTS {@link LineMerger}), and the ocean side of each merged line is decided by the
     * point at sea as in {@link #ofLand(LineString, double, double, PhysicalConstants)}. Lines are returned in a
     * deterministic order (longest first).
     */
    public static List<Coastline> ofLandLines(Geometry lines, double seaLonDeg, double seaLatDeg,
                                              PhysicalConstants constants) {
        LineMerger merger = new LineMerger();
        merger.add(Objects.requireNonNull(lines, "lines"));
        List<Coastline> out = new ArrayList<>();
        for (Object o : merger.getMergedLineStrings()) {
            out.add(ofLand((LineString) o, seaLonDeg, seaLatDeg, constants));
        }
        if (out.isEmpty()) throw new IllegalArgumentException("no line strings in the coast geometry " + lines.getGeometryType());
        out.sort((p, q) -> {
            int c = Double.compare(q.lengthKm(), p.lengthKm());
            if (c != 0) return c;
            c = Double.compare(p.lonDeg[0], q.lonDeg[0]);
            return c != 0 ? c : Double.compare(p.latDeg[0], q.latDeg[0]);
        });
        return out;
    }

    private static Coastline ofRing(Coordinate[] c, boolean oceanOnRight, PhysicalConstants constants) {
        return new Coastline(lons(c), lats(c), true, oceanOnRight, DEFAULT_SMOOTHING_KM, constants);
    }

    private static double[] lons(Coordinate[] c) { return Arrays.stream(c).mapToDouble(q -> q.x).toArray(); }
    private static double[] lats(Coordinate[] c) { return Arrays.stream(c).mapToDouble(q -> q.y).toArray(); }

    /** A copy with another smoothing length L of the orientation, km. */
    public Coastline withSmoothingLengthKm(double lengthKm) {
        return new Coastline(lonDeg, latDeg, closed, oceanOnRight, lengthKm, constants);
    }

    /** Smoothing length of the orientation, km. */
    public double smoothingLengthKm() { return smoothingLengthKm; }
    /** Total length of the coastline, km. */
    public double lengthKm() { return cumKm[cumKm.length - 1]; }
    /** Whether the coastline is a closed ring. */
    public boolean isClosed() { return closed; }
    /** Whether the ocean lies on the right of the vertex order. */
    public boolean oceanOnRight() { return oceanOnRight; }
    /** Number of stored vertices (a ring stores its closing vertex). */
    public int vertexCount() { return lonDeg.length; }
    /** Constants (Earth radius) used for the geodesics. */
    public PhysicalConstants constants() { return constants; }

    private double wrapOrClamp(double sKm) {
        double len = lengthKm();
        if (closed) {
            double r = sKm % len;
            return r < 0 ? r + len : r;
        }
        return Math.max(0.0, Math.min(len, sKm));
    }

    private int segmentOf(double sKm) {
        int k = Arrays.binarySearch(cumKm, sKm);
        if (k < 0) k = -k - 2;
        return Math.max(0, Math.min(segAzi.length - 1, k));
    }

    /** Position {lonDeg, latDeg} of the coast at along-coast distance s (km; wrapped on rings, clamped on lines). */
    public double[] positionAt(double alongKm) {
        if (!Double.isFinite(alongKm)) throw new IllegalArgumentException("along-coast distance must be finite, got " + alongKm);
        double s = wrapOrClamp(alongKm);
        int k = segmentOf(s);
        GeodesicData g = geod.Direct(latDeg[k], lonDeg[k], segAzi[k], (s - cumKm[k]) * 1000.0, FULL);
        return new double[] {g.lon2, g.lat2};
    }

    /** Smoothed coast bearing (ocean on the right), degrees clockwise from north in [0, 360), at distance s (km). */
    public double coastBearingDegAt(double alongKm) {
        double s = wrapOrClamp(alongKm);
        double half = smoothingLengthKm / 2.0;
        if (closed) half = Math.min(half, lengthKm() / 4.0);
        double[] p = positionAt(s);
        double[] a = positionAt(closed ? s - half : Math.max(0, s - half));
        double[] b = positionAt(closed ? s + half : Math.min(lengthKm(), s + half));
        double ex = 0, ey = 0;
        GeodesicData toB = geod.Inverse(p[1], p[0], b[1], b[0]);
        if (toB.s12 >= 1.0) { ex += DegreeTrig.sinDeg(toB.azi1); ey += DegreeTrig.cosDeg(toB.azi1); }
        GeodesicData toA = geod.Inverse(p[1], p[0], a[1], a[0]);
        if (toA.s12 >= 1.0) { ex -= DegreeTrig.sinDeg(toA.azi1); ey -= DegreeTrig.cosDeg(toA.azi1); }
        double theta;
        if (Math.hypot(ex, ey) < 1e-6) {
            theta = segAzi[segmentOf(s)];
        } else {
            theta = Math.toDegrees(Math.atan2(ex, ey));
        }
        return CoastPoint.normalize360(oceanOnRight ? theta : theta + 180.0);
    }

    /** An index point at along-coast distance s (km) with its smoothed orientation. */
    public CoastPoint pointAt(String name, double alongKm) {
        double s = wrapOrClamp(alongKm);
        double[] p = positionAt(s);
        double coast = coastBearingDegAt(s);
        return new CoastPoint(name, p[0], p[1], s, coast, coast + 90.0, 0.0, smoothingLengthKm, OrientationSource.SMOOTHED);
    }

    /**
     * Index points every {@code spacingKm} along the stretch from {@code fromKm} to {@code toKm} (both km along the
     * coast, inclusive of the start; the end is included when it falls on the spacing). On a closed ring
     * {@code toKm} may be less than {@code fromKm}: the stretch then runs through the ring's first vertex.
     * Points are named {@code "km <s>"} with s the along-coast distance.
     */
    public List<CoastPoint> pointsEvery(double spacingKm, double fromKm, double toKm) {
        if (!(spacingKm > 0) || Double.isInfinite(spacingKm)) {
            throw new IllegalArgumentException("spacing must be a positive number of km, got " + spacingKm);
        }
        if (!Double.isFinite(fromKm) || !Double.isFinite(toKm)) {
            throw new IllegalArgumentException("stretch ends must be finite km along the coast, got " + fromKm + " … " + toKm);
        }
        double len = lengthKm();
        double from = closed ? wrapOrClamp(fromKm) : Math.max(0, fromKm);
        double to = closed ? wrapOrClamp(toKm) : Math.min(len, toKm);
        if (closed && (to < from || (to == from && toKm != fromKm))) to += len;
        if (to < from) {
            throw new IllegalArgumentException("stretch end " + toKm + " km lies before its start " + fromKm + " km");
        }
        List<CoastPoint> out = new ArrayList<>();
        long n = (long) Math.floor((to - from) / spacingKm + 1e-9);
        if (n > 1_000_000) throw new IllegalArgumentException("too many index points (" + n + "); increase the spacing");
        for (long k = 0; k <= n; k++) {
            double s = from + k * spacingKm;
            double sw = closed ? wrapOrClamp(s) : s;
            out.add(pointAt(String.format(java.util.Locale.ROOT, "km %.1f", sw), sw));
        }
        return out;
    }

    /**
     * Index points every {@code spacingKm} along the stretch between the coast points nearest to two positions
     * (in the coast's vertex order from the first position to the second; on a ring through the first vertex if
     * needed). On an open line the positions may be given in either order.
     */
    public List<CoastPoint> pointsBetween(double spacingKm, double lon1Deg, double lat1Deg, double lon2Deg, double lat2Deg) {
        double a = nearestAlongKm(lon1Deg, lat1Deg), b = nearestAlongKm(lon2Deg, lat2Deg);
        if (!closed && b < a) { double t = a; a = b; b = t; }
        return pointsEvery(spacingKm, a, b);
    }

    /** The along-coast distance (km) of the coast point nearest to (lon, lat). */
    public double nearestAlongKm(double lonDeg0, double latDeg0) {
        if (!Double.isFinite(lonDeg0) || !Double.isFinite(latDeg0) || Math.abs(latDeg0) > 90) {
            throw new IllegalArgumentException("position must be finite lon/lat degrees, got (" + lonDeg0 + ", " + latDeg0 + ")");
        }
        // 1) approximate nearest point per segment in a local equirectangular plane around the query point
        int nSeg = segAzi.length;
        double[] approx = new double[nSeg];
        double[] approxT = new double[nSeg];
        double cosLat = Math.max(1e-6, DegreeTrig.cosDeg(latDeg0));
        for (int k = 0; k < nSeg; k++) {
            double ax = DegreeTrig.wrap180(lonDeg[k] - lonDeg0) * cosLat, ay = latDeg[k] - latDeg0;
            double bx = ax + (lonDeg[k + 1] - lonDeg[k]) * cosLat, by = latDeg[k + 1] - latDeg0;
            double dx = bx - ax, dy = by - ay, d2 = dx * dx + dy * dy;
            double t = d2 > 0 ? Math.max(0, Math.min(1, -(ax * dx + ay * dy) / d2)) : 0;
            double px = ax + t * dx, py = ay + t * dy;
            approx[k] = px * px + py * py;
            approxT[k] = t;
        }
        // 2) refine the best few segments with the true geodesic distance (golden-section search)
        Integer[] order = new Integer[nSeg];
        for (int k = 0; k < nSeg; k++) order[k] = k;
        Arrays.sort(order, (p, q) -> Double.compare(approx[p], approx[q]));
        double bestS = cumKm[order[0]] + approxT[order[0]] * (cumKm[order[0] + 1] - cumKm[order[0]]);
        double bestD = distanceKm(bestS, lonDeg0, latDeg0);
        for (int r = 0; r < Math.min(4, nSeg); r++) {
            int k = order[r];
            double lo = cumKm[k], hi = cumKm[k + 1];
            double gr = (Math.sqrt(5) - 1) / 2;
            double x1 = hi - gr * (hi - lo), x2 = lo + gr * (hi - lo);
            double f1 = distanceKm(x1, lonDeg0, latDeg0), f2 = distanceKm(x2, lonDeg0, latDeg0);
            for (int it = 0; it < 80 && hi - lo > 1e-9; it++) {
                if (f1 < f2) { hi = x2; x2 = x1; f2 = f1; x1 = hi - gr * (hi - lo); f1 = distanceKm(x1, lonDeg0, latDeg0); }
                else { lo = x1; x1 = x2; f1 = f2; x2 = lo + gr * (hi - lo); f2 = distanceKm(x2, lonDeg0, latDeg0); }
            }
            for (double s : new double[] {lo, hi, cumKm[k], cumKm[k + 1]}) {
                double d = distanceKm(s, lonDeg0, latDeg0);
                if (d < bestD) { bestD = d; bestS = s; }
            }
        }
        return bestS;
    }

    private double distanceKm(double sKm, double lon0, double lat0) {
        double[] p = positionAt(sKm);
        return geod.Inverse(p[1], p[0], lat0, lon0, GeodesicMask.DISTANCE).s12 / 1000.0;
    }

    /**
     * A named user point snapped to the nearest point of the coast, with the smoothed orientation there and the
     * snap distance (km) from the given position.
     */
    public CoastPoint snap(String name, double lonDeg0, double latDeg0) {
        double s = nearestAlongKm(lonDeg0, latDeg0);
        CoastPoint p = pointAt(name, s);
        double d = distanceKm(s, lonDeg0, latDeg0);
        return new CoastPoint(name, p.lonDeg(), p.latDeg(), p.alongCoastKm(), p.coastBearingDeg(),
                p.offshoreBearingDeg(), d, smoothingLengthKm, OrientationSource.SMOOTHED);
    }

    /** Geodesic distance between two positions on this coastline's sphere, km. */
    public double distanceKm(double lon1Deg, double lat1Deg, double lon2Deg, double lat2Deg) {
        return geod.Inverse(lat1Deg, lon1Deg, lat2Deg, lon2Deg, GeodesicMask.DISTANCE).s12 / 1000.0;
    }
}
