package org.gyreplan.gisdata.basemap;

import org.locationtech.jts.algorithm.Orientation;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Envelope;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.GeometryFactory;
import org.locationtech.jts.geom.LineString;
import org.locationtech.jts.geom.Polygon;
import org.locationtech.jts.geom.util.PolygonExtracter;
import org.locationtech.jts.operation.distance.IndexedFacetDistance;

import java.util.ArrayList;
import java.util.List;

/**
 * Coastlines as JTS LineStrings for the coastal indices (which work on JTS geometries in the solver), oriented so
 * that <b>the sea is on the left</b> when walking along the line (common practice for offshore normals: the
 * offshore direction is the left-hand normal).
 *
 * <ul>
 *   <li>{@link #ofBasin(Geometry, Geometry, double)}: the boundary of a basin (sea) polygon — exterior rings
 *       counter-clockwise, island rings clockwise — optionally keeping only the parts that run along land, so that
 *       open-sea edges of a basin drawn across the ocean are not taken for coast;</li>
 *   <li>{@link #ofLand(Geometry, Envelope)}: the boundary of land polygons (e.g. {@link LandPolygons#clip}),
 *       reversed so the sea is on the left, without the artificial edges made by clipping to the box, by the split
 *       of land at the antimeridian (x = ±180°) or along the south pole line of Antarctica.</li>
 * </ul>
 * Coordinates are longitude/latitude degrees as given; for {@code ofBasin} with land, pass land in the basin's
 * longitudes (e.g. {@link LandPolygons#clip} over the basin's box). The lines feed the solver's
 * {@code coast.Coastline.ofLand(line, OceanSide.LEFT, constants)}.
 */
public final class Coastlines {
    private Coastlines() {}

    /** Tolerance for "on the box edge / on the seam", degrees. */
    static final double EDGE_TOL_DEG = 1e-9;

    /**
     * Coast of a basin polygon.
     *
     * @param basin        Polygon or MultiPolygon of sea
     * @param land         land polygons, or {@code null} to take the whole basin boundary as coast
     * @param toleranceDeg a boundary segment is coast when its midpoint lies within this distance of land, degrees
     */
    public static List<LineString> ofBasin(Geometry basin, Geometry land, double toleranceDeg) {
        IndexedFacetDistance near = null;
        if (land != null && !land.isEmpty()) {
            Envelope e = basin.getEnvelopeInternal().copy();
            e.expandBy(toleranceDeg * 2 + 1e-6);
            Geometry local = LandClip.within(land, e);
            if (!local.isEmpty()) near = new IndexedFacetDistance(local);
        }
        final IndexedFacetDistance landIndex = near;
        final boolean all = land == null;
        List<LineString> out = new ArrayList<>();
        GeometryFactory f = basin.getFactory();
        for (Object o : PolygonExtracter.getPolygons(basin)) {
            Polygon p = (Polygon) o;
            rings(p, true, out, f, (a, b) -> all || (landIndex != null
                    && landIndex.distance(f.createPoint(new Coordinate((a.x + b.x) / 2, (a.y + b.y) / 2))) <= toleranceDeg));
        }
        return out;
    }

    /**
     * Coast of land polygons, sea on the left, without clipping edges on {@code box} (may be null), seams at
     * x = ±180° (and ±180° + 360°k for shifted land) and edges south of −89.9°.
     */
    public static List<LineString> ofLand(Geometry land, Envelope box) {
        List<LineString> out = new ArrayList<>();
        GeometryFactory f = land.getFactory();
        for (Object o : PolygonExtracter.getPolygons(land)) {
            Polygon p = (Polygon) o;
            rings(p, false, out, f, (a, b) -> !artificial(a, b, box));
        }
        return out;
    }

    private static boolean artificial(Coordinate a, Coordinate b, Envelope box) {
        if (box != null) {
            if (Math.abs(a.x - b.x) <= EDGE_TOL_DEG && (Math.abs(a.x - box.getMinX()) <= EDGE_TOL_DEG
                    || Math.abs(a.x - box.getMaxX()) <= EDGE_TOL_DEG)) return true;
            if (Math.abs(a.y - b.y) <= EDGE_TOL_DEG && (Math.abs(a.y - box.getMinY()) <= EDGE_TOL_DEG
                    || Math.abs(a.y - box.getMaxY()) <= EDGE_TOL_DEG)) return true;
        }
        if (Math.abs(a.x - b.x) <= EDGE_TOL_DEG) {
            double r = Math.IEEEremainder(a.x - 180, 360);
            if (Math.abs(r) <= 1e-7) return true;
        }
        return a.y < -89.9 && b.y < -89.9;
    }

    private interface Keep { boolean test(Coordinate a, Coordinate b); }

    /** Orients each ring (sea on the left) and cuts it into runs of kept segments. */
    private static void rings(Polygon p, boolean isSea, List<LineString> out, GeometryFactory f, Keep keep) {
        for (int r = 0; r <= p.getNumInteriorRing(); r++) {
            Coordinate[] cs = (r == 0 ? p.getExteriorRing() : p.getInteriorRingN(r - 1)).getCoordinates();
            if (cs.length < 4) continue;
            boolean exterior = r == 0;
            // sea on the left: a sea polygon's exterior runs counter-clockwise, its holes (islands) clockwise;
            // a land polygon's exterior runs clockwise (sea outside), its holes (lakes/lagoons) counter-clockwise.
            boolean wantCcw = isSea == exterior;
            if (Orientation.isCCW(cs) != wantCcw) {
                Coordinate[] rev = new Coordinate[cs.length];
                for (int k = 0; k < cs.length; k++) rev[k] = cs[cs.length - 1 - k];
                cs = rev;
            }
            int n = cs.length - 1; // segments
            boolean[] kept = new boolean[n];
            int firstDropped = -1;
            for (int k = 0; k < n; k++) {
                kept[k] = keep.test(cs[k], cs[k + 1]);
                if (!kept[k] && firstDropped < 0) firstDropped = k;
            }
            if (firstDropped < 0) { // the whole ring
                out.add(f.createLineString(cs));
                continue;
            }
            // walk once around starting after a dropped segment, so runs that wrap past the ring start stay whole
            List<Coordinate> run = new ArrayList<>();
            for (int s = 1; s <= n; s++) {
                int k = (firstDropped + s) % n;
                if (kept[k]) {
                    if (run.isEmpty()) run.add(cs[k]);
                    run.add(cs[k + 1]);
                } else if (!run.isEmpty()) {
                    out.add(f.createLineString(run.toArray(new Coordinate[0])));
                    run = new ArrayList<>();
                }
            }
            if (!run.isEmpty()) out.add(f.createLineString(run.toArray(new Coordinate[0])));
        }
    }

    /** Land polygons intersecting an envelope (the envelope is not clipped; used for distance queries). */
    private static final class LandClip {
        static Geometry within(Geometry land, Envelope e) {
            List<Polygon> keep = new ArrayList<>();
            for (Object o : PolygonExtracter.getPolygons(land)) {
                Polygon p = (Polygon) o;
                if (p.getEnvelopeInternal().intersects(e)) keep.add(p);
            }
            return land.getFactory().createMultiPolygon(keep.toArray(new Polygon[0]));
        }
    }
}
