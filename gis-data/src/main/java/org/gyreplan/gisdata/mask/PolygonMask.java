package org.gyreplan.gisdata.mask;

import org.gyreplan.gisdata.vector.Antimeridian;
import org.gyreplan.solver.DegreeTrig;
import org.gyreplan.solver.grid.LonLatGrid;
import org.gyreplan.solver.progress.CancelToken;
import org.gyreplan.solver.progress.ProgressListener;
import org.locationtech.jts.algorithm.locate.IndexedPointInAreaLocator;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.Location;
import org.locationtech.jts.geom.Polygonal;
import org.locationtech.jts.operation.distance.IndexedFacetDistance;

/**
 * Polygons to cell masks on a {@link LonLatGrid}: a cell belongs to a polygon when its centre lies inside it or on
 * its boundary; centres inside a hole (an island) do not. Rows are filled by a scanline; cell centres on or next
 * to an edge are decided by JTS {@link IndexedPointInAreaLocator}, so the mask is the locator's, at a cost linear
 * in edges plus cells.
 *
 * <p>Longitudes: the polygon is first brought into the grid's continuous longitudes
 * ({@link Antimeridian#intoRange}) — a basin that crosses the antimeridian may be given with continuous
 * longitudes beyond 180°, with negative longitudes east of the date line, or split into parts at ±180°.
 *
 * <pre>
 *   LonLatGrid basinGrid = PolygonMask.applyBasin(grid, basin);            // ocean = inside the basin
 *   LonLatGrid open = PolygonMask.excludeZones(basinGrid, exclusionZones);  // zones become "not ocean"
 * </pre>
 */
public final class PolygonMask {
    private PolygonMask() {}

    /** Cells whose centre is inside the polygon(s) or on the boundary; flat row-major [j·nx + i]. */
    public static boolean[] rasterise(LonLatGrid grid, Geometry polygon) {
        return rasterise(grid, polygon, ProgressListener.NONE, CancelToken.none());
    }

    /**
     * As {@link #rasterise(LonLatGrid, Geometry)}, reporting progress per row and honouring cancellation.
     *
     * <p>Method: a scanline per grid row. The crossings of the row's latitude with the polygon edges (an edge
     * counts when one end lies above the row and the other at or below it) are sorted, and the cells between the
     * 1st and 2nd, 3rd and 4th, ... crossing are inside (even–odd rule, which holds for valid polygons with holes).
     * Cells whose centre lies within {@value #NEAR_DEG}° of a crossing or of a vertex, and rows that run along a
     * horizontal edge,
     * are decided by JTS {@link IndexedPointInAreaLocator} instead, so the result equals the locator's for every
     * cell (tested), at a cost linear in edges plus cells.
     */
    public static boolean[] rasterise(LonLatGrid grid, Geometry polygon, ProgressListener progress, CancelToken cancel) {
        if (!(polygon instanceof Polygonal)) {
            throw new IllegalArgumentException("a mask needs a Polygon or MultiPolygon, got " + polygon.getGeometryType());
        }
        Geometry g = Antimeridian.intoRange(polygon, grid.westDeg(), grid.eastDeg());
        boolean[] in = new boolean[grid.size()];
        if (g.isEmpty()) return in;
        int nx = grid.nx(), ny = grid.ny();
        double lon0 = grid.lon0Deg(), dLon = grid.dLonDeg();
        Edges edges = Edges.of(g);
        IndexedPointInAreaLocator loc = null;
        Coordinate c = new Coordinate();
        double[] xs = new double[16];
        double[] probe = new double[16];
        int next = 0;                                    // next edge (by ymin) not yet active
        int[] active = new int[16];
        int nActive = 0;
        for (int j = 0; j < ny; j++) {
            if ((j & 31) == 0) {
                cancel.check();
                progress.progress("mask", (double) j / ny, "rasterising polygon");
            }
            double y = grid.latDeg(j);
            while (next < edges.n && edges.ymin[edges.order[next]] <= y) {
                if (nActive == active.length) active = java.util.Arrays.copyOf(active, 2 * nActive);
                active[nActive++] = edges.order[next++];
            }
            int nx2 = 0, keep = 0, nProbe = 0;
            boolean alongEdge = false;
            for (int a = 0; a < nActive; a++) {
                int e = active[a];
                if (edges.ymax[e] < y) continue;         // finished: drop
                active[keep++] = e;
                double y1 = edges.y1[e], y2 = edges.y2[e];
                if (y1 == y2) {
                    if (Math.abs(y1 - y) <= NEAR_DEG) alongEdge = true;
                    continue;
                }
                if (Math.abs(y1 - y) <= NEAR_DEG || Math.abs(y2 - y) <= NEAR_DEG) { // a vertex on the row
                    if (nProbe == probe.length) probe = java.util.Arrays.copyOf(probe, 2 * nProbe);
                    probe[nProbe++] = Math.abs(y1 - y) <= NEAR_DEG ? edges.x1[e] : edges.x2[e];
                }
                if ((y1 > y) == (y2 > y)) continue;     // half-open rule: ymin ≤ y < ymax
                double x = edges.x1[e] + (y - y1) * (edges.x2[e] - edges.x1[e]) / (y2 - y1);
                if (nx2 == xs.length) xs = java.util.Arrays.copyOf(xs, 2 * nx2);
                xs[nx2++] = x;
            }
            nActive = keep;
            if (nx2 == 0 && nProbe == 0 && !alongEdge) continue;
            if (loc == null) loc = new IndexedPointInAreaLocator(g);
            int row = j * nx;
            c.y = y;
            if (alongEdge) {
                for (int i = 0; i < nx; i++) {
                    c.x = grid.lonDeg(i);
                    in[row + i] = loc.locate(c) != Location.EXTERIOR;
                }
                continue;
            }
            java.util.Arrays.sort(xs, 0, nx2);
            for (int m = 0; m + 1 < nx2; m += 2) {
                int i0 = (int) Math.max(0, Math.ceil((xs[m] - lon0) / dLon));
                int i1 = (int) Math.min(nx - 1, Math.floor((xs[m + 1] - lon0) / dLon));
                for (int i = i0; i <= i1; i++) in[row + i] = true;
            }
            for (int m = 0; m < nx2 + nProbe; m++) {     // centres near a crossing or vertex: ask the locator
                double xm = m < nx2 ? xs[m] : probe[m - nx2];
                int i = (int) Math.rint((xm - lon0) / dLon);
                for (int di = -1; di <= 1; di++) {
                    int ii = i + di;
                    if (ii < 0 || ii >= nx) continue;
                    double lon = grid.lonDeg(ii);
                    if (Math.abs(lon - xm) <= NEAR_DEG) {
                        c.x = lon;
                        in[row + ii] = loc.locate(c) != Location.EXTERIOR;
                    }
                }
            }
        }
        progress.progress("mask", 1.0, "polygon rasterised");
        return in;
    }

    /** Distance (degrees) from a crossing within which a cell centre is decided by the point locator. */
    static final double NEAR_DEG = 1e-9;

    /** The same mask computed cell by cell with {@link IndexedPointInAreaLocator} (reference for tests). */
    static boolean[] rasteriseByLocator(LonLatGrid grid, Geometry polygon) {
        Geometry g = Antimeridian.intoRange(polygon, grid.westDeg(), grid.eastDeg());
        boolean[] in = new boolean[grid.size()];
        if (g.isEmpty()) return in;
        IndexedPointInAreaLocator loc = new IndexedPointInAreaLocator(g);
        Coordinate c = new Coordinate();
        for (int j = 0; j < grid.ny(); j++) {
            c.y = grid.latDeg(j);
            for (int i = 0; i < grid.nx(); i++) {
                c.x = grid.lonDeg(i);
                in[grid.index(i, j)] = loc.locate(c) != Location.EXTERIOR;
            }
        }
        return in;
    }

    /** All ring edges of a polygonal geometry, sorted by their southern end. */
    private static final class Edges {
        int n;
        double[] x1, y1, x2, y2, ymin, ymax;
        int[] order;

        static Edges of(Geometry g) {
            java.util.List<Coordinate[]> rings = new java.util.ArrayList<>();
            for (int k = 0; k < g.getNumGeometries(); k++) {
                org.locationtech.jts.geom.Polygon p = (org.locationtech.jts.geom.Polygon) g.getGeometryN(k);
                rings.add(p.getExteriorRing().getCoordinates());
                for (int h = 0; h < p.getNumInteriorRing(); h++) rings.add(p.getInteriorRingN(h).getCoordinates());
            }
            int total = 0;
            for (Coordinate[] r : rings) total += Math.max(0, r.length - 1);
            Edges e = new Edges();
            e.x1 = new double[total]; e.y1 = new double[total]; e.x2 = new double[total]; e.y2 = new double[total];
            e.ymin = new double[total]; e.ymax = new double[total];
            int k = 0;
            for (Coordinate[] r : rings) {
                for (int q = 0; q + 1 < r.length; q++, k++) {
                    e.x1[k] = r[q].x; e.y1[k] = r[q].y; e.x2[k] = r[q + 1].x; e.y2[k] = r[q + 1].y;
                    e.ymin[k] = Math.min(r[q].y, r[q + 1].y);
                    e.ymax[k] = Math.max(r[q].y, r[q + 1].y);
                }
            }
            e.n = total;
            Integer[] idx = new Integer[total];
            for (int q = 0; q < total; q++) idx[q] = q;
            final double[] ymin = e.ymin;
            java.util.Arrays.sort(idx, (a, b) -> Double.compare(ymin[a], ymin[b]));
            e.order = new int[total];
            for (int q = 0; q < total; q++) e.order[q] = idx[q];
            return e;
        }
    }

    /** A copy of the grid whose ocean cells are those already ocean and inside the basin polygon. */
    public static LonLatGrid applyBasin(LonLatGrid grid, Geometry basin) {
        boolean[] inside = rasterise(grid, basin);
        boolean[] ocean = grid.oceanMask();
        for (int k = 0; k < ocean.length; k++) ocean[k] &= inside[k];
        return grid.withOcean(ocean);
    }

    /** A copy of the grid where cells inside the exclusion zones (Polygon/MultiPolygon) are no longer ocean. */
    public static LonLatGrid excludeZones(LonLatGrid grid, Geometry zones) {
        return grid.withOcean(excludeZones(grid, grid.oceanMask(), zones));
    }

    /** A copy of {@code mask} with cells inside the zones set to false. */
    public static boolean[] excludeZones(LonLatGrid grid, boolean[] mask, Geometry zones) {
        if (mask.length != grid.size()) throw new IllegalArgumentException("mask length does not match the grid");
        boolean[] inside = rasterise(grid, zones);
        boolean[] out = mask.clone();
        for (int k = 0; k < out.length; k++) if (inside[k]) out[k] = false;
        return out;
    }

    /** Number of true cells. */
    public static int count(boolean[] mask) {
        int n = 0;
        for (boolean b : mask) if (b) n++;
        return n;
    }

    /**
     * Distance from every cell centre to the polygon boundary, km, along the great circle (sphere of the grid's
     * radius) to the boundary point that is nearest in a local equirectangular metric (longitudes scaled by the
     * cosine of the grid's middle latitude). The point found is a true boundary point, so the value is never
     * below the exact distance; it exceeds it only where the scaled metric picks another point, which for basins
     * spanning some tens of degrees of latitude is a second-order effect. Use for siting buffers ("at least 5 km
     * from the coast"), not for geodesy.
     *
     * <pre>
     *   d = 2R · asin √( sin²(Δφ/2) + cos φ₁ cos φ₂ sin²(Δλ/2) )     (haversine)
     * </pre>
     */
    public static double[] distanceToBoundaryKm(LonLatGrid grid, Geometry polygon) {
        return distanceToBoundaryKm(grid, polygon, ProgressListener.NONE, CancelToken.none());
    }

    /** As {@link #distanceToBoundaryKm(LonLatGrid, Geometry)}, reporting progress per row and honouring cancellation. */
    public static double[] distanceToBoundaryKm(LonLatGrid grid, Geometry polygon, ProgressListener progress,
                                                CancelToken cancel) {
        Geometry g = Antimeridian.intoRange(polygon, grid.westDeg(), grid.eastDeg());
        double midLat = 0.5 * (grid.southDeg() + grid.northDeg());
        double sx = DegreeTrig.cosDeg(midLat);
        Geometry scaled = g.getBoundary().copy();
        scaled.apply((org.locationtech.jts.geom.CoordinateSequenceFilter) new ScaleX(sx));
        scaled.geometryChanged();
        IndexedFacetDistance index = new IndexedFacetDistance(scaled);
        double[] out = new double[grid.size()];
        org.locationtech.jts.geom.GeometryFactory f = g.getFactory();
        double rKm = grid.radius() / 1000.0;
        for (int j = 0; j < grid.ny(); j++) {
            cancel.check();
            progress.progress("distance", (double) j / grid.ny(), "distance to the boundary");
            double lat = grid.latDeg(j);
            for (int i = 0; i < grid.nx(); i++) {
                double lon = grid.lonDeg(i);
                Coordinate[] near = index.nearestPoints(f.createPoint(new Coordinate(lon * sx, lat)));
                Coordinate b = near[0];
                out[grid.index(i, j)] = haversineKm(lon, lat, b.x / sx, b.y, rKm);
            }
        }
        progress.progress("distance", 1.0, "distance to the boundary done");
        return out;
    }

    /** Great-circle distance on a sphere of radius rKm between two lon/lat points (degrees), km. */
    public static double haversineKm(double lon1, double lat1, double lon2, double lat2, double rKm) {
        double p1 = Math.toRadians(lat1), p2 = Math.toRadians(lat2);
        double dp = p2 - p1, dl = Math.toRadians(lon2 - lon1);
        double h = Math.sin(dp / 2) * Math.sin(dp / 2) + Math.cos(p1) * Math.cos(p2) * Math.sin(dl / 2) * Math.sin(dl / 2);
        return 2 * rKm * Math.asin(Math.min(1.0, Math.sqrt(h)));
    }

    private static final class ScaleX implements org.locationtech.jts.geom.CoordinateSequenceFilter {
        private final double s;
        ScaleX(double s) { this.s = s; }
        @Override public void filter(org.locationtech.jts.geom.CoordinateSequence seq, int i) { seq.setOrdinate(i, 0, seq.getX(i) * s); }
        @Override public boolean isDone() { return false; }
        @Override public boolean isGeometryChanged() { return true; }
    }
}
