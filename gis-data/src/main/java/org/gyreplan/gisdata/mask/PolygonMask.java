package org.gyreplan.gisdata.mask;

import org.gyreplan.gisdata.vector.Antimeridian;
import org.gyreplan.solver.DegreeTrig;
import org.gyreplan.solver.grid.LonLatGrid;
import org.gyreplan.solver.progress.CancelToken;
import org.gyreplan.solver.progress.ProgressListener;
import org.locationtech.jts.algorithm.locate.IndexedPointInAreaLocator;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Envelope;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.Location;
import org.locationtech.jts.geom.Polygonal;
import org.locationtech.jts.operation.distance.IndexedFacetDistance;

/**
 * Polygons to cell masks on a {@link LonLatGrid}: a cell belongs to a polygon when its centre lies inside it or on
 * its boundary; centres inside a hole (an island) do not. Point-in-polygon tests use JTS
 * {@link IndexedPointInAreaLocator} (an interval index on the polygon edges), so a 500 × 500 grid against a
 * detailed coastline takes a fraction of a second.
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

    /** As {@link #rasterise(LonLatGrid, Geometry)}, reporting progress per row and honouring cancellation. */
    public static boolean[] rasterise(LonLatGrid grid, Geometry polygon, ProgressListener progress, CancelToken cancel) {
        if (!(polygon instanceof Polygonal)) {
            throw new IllegalArgumentException("a mask needs a Polygon or MultiPolygon, got " + polygon.getGeometryType());
        }
        Geometry g = Antimeridian.intoRange(polygon, grid.westDeg(), grid.eastDeg());
        boolean[] in = new boolean[grid.size()];
        if (g.isEmpty()) return in;
        Envelope e = g.getEnvelopeInternal();
        IndexedPointInAreaLocator loc = new IndexedPointInAreaLocator(g);
        Coordinate c = new Coordinate();
        int nx = grid.nx(), ny = grid.ny();
        for (int j = 0; j < ny; j++) {
            if ((j & 31) == 0) {
                cancel.check();
                progress.progress("mask", (double) j / ny, "rasterising polygon");
            }
            double lat = grid.latDeg(j);
            if (lat < e.getMinY() || lat > e.getMaxY()) continue;
            c.y = lat;
            for (int i = 0; i < nx; i++) {
                double lon = grid.lonDeg(i);
                if (lon < e.getMinX() || lon > e.getMaxX()) continue;
                c.x = lon;
                if (loc.locate(c) != Location.EXTERIOR) in[j * nx + i] = true;
            }
        }
        progress.progress("mask", 1.0, "polygon rasterised");
        return in;
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
            double lat = grid.latDeg(j);
            for (int i = 0; i < grid.nx(); i++) {
                double lon = grid.lonDeg(i);
                Coordinate[] near = index.nearestPoints(f.createPoint(new Coordinate(lon * sx, lat)));
                Coordinate b = near[0];
                out[grid.index(i, j)] = haversineKm(lon, lat, b.x / sx, b.y, rKm);
            }
        }
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
