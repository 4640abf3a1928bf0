package org.gyreplan.solver.plan.survey;

import org.gyreplan.solver.plan.Geodesy;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.GeometryFactory;
import org.locationtech.jts.geom.LineString;
import org.locationtech.jts.geom.Point;
import org.locationtech.jts.geom.prep.PreparedGeometry;
import org.locationtech.jts.geom.prep.PreparedGeometryFactory;
import org.locationtech.jts.operation.union.UnaryUnionOp;
import org.locationtech.jts.simplify.DouglasPeuckerSimplifier;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.PriorityQueue;

/**
 * Land and exclusion polygons a ship's track must not cross, and the shortest way around them.
 *
 * <p>Method and approximations:
 * <ul>
 *   <li>A leg is the WGS 84 geodesic between its ends, densified to points at most {@code checkStepKm} apart; the
 *       polyline through those points (straight in lon/lat between them) is tested against the obstacles with JTS.
 *       Between check points the true geodesic deviates from the chord by far less than a kilometre for steps of a
 *       few km, so features much smaller than the step can be missed.</li>
 *   <li>When a leg is blocked, it is replaced by the shortest path in a visibility graph whose nodes are the two
 *       ends and the vertices of the obstacles buffered by {@code marginKm} (buffer in degrees of latitude,
 *       i.e. the clearance east–west grows as 1/cos φ, which errs on the safe side; buffered rings simplified with a
 *       tolerance of a quarter margin, so every node stays outside the original polygons). Edges are geodesics that
 *       pass the same crossing test against the original polygons; weights are their WGS 84 lengths. The search is
 *       A* (Dijkstra with the spherical distance × 0.99 as an admissible lower bound, since WGS 84 and sphere
 *       distances differ by well under 1 %).</li>
 *   <li>The result is the shortest path through buffered vertices, not the exact shortest path around curved
 *       coastlines: it is longer by the corner cut-offs, and it keeps at least roughly the margin at the turning
 *       points only.</li>
 * </ul>
 * Obstacles and stops must use the same continuous longitude convention.
 */
public final class Obstacles {
    private static final GeometryFactory GF = new GeometryFactory();

    private final Geometry union;
    private final PreparedGeometry prepared;
    private final double checkStepM;
    private final double[][] nodes;   // lon, lat of buffered vertices
    private final Map<Long, Boolean> visibleCache = new HashMap<>();

    private Obstacles(Geometry union, double marginKm, double checkStepKm) {
        this.union = union;
        this.prepared = union == null ? null : PreparedGeometryFactory.prepare(union);
        this.checkStepM = checkStepKm * 1000.0;
        if (union == null) {
            nodes = new double[0][];
        } else {
            double marginDeg = marginKm / 111.0;
            Geometry buf = union.buffer(marginDeg, 4);
            buf = DouglasPeuckerSimplifier.simplify(buf, marginDeg / 4);
            List<double[]> pts = new ArrayList<>();
            for (Coordinate c : buf.getCoordinates()) {
                double[] p = {c.x, c.y};
                boolean dup = false;
                for (double[] q : pts) if (q[0] == p[0] && q[1] == p[1]) { dup = true; break; }
                if (!dup && !prepared.intersects(GF.createPoint(c))) pts.add(p);
            }
            nodes = pts.toArray(new double[0][]);
        }
    }

    /** No obstacles. */
    public static Obstacles none() { return new Obstacles(null, 1, 5); }

    /**
     * @param polygons    land and exclusion polygons, lon/lat degrees
     * @param marginKm    clearance kept at turning points, km (&gt; 0)
     * @param checkStepKm densification step for crossing tests, km (&gt; 0, e.g. 2)
     */
    public static Obstacles of(List<Geometry> polygons, double marginKm, double checkStepKm) {
        if (!(marginKm > 0)) throw new IllegalArgumentException("obstacle margin must be > 0 km, got " + marginKm);
        if (!(checkStepKm > 0)) throw new IllegalArgumentException("crossing-check step must be > 0 km, got " + checkStepKm);
        if (polygons == null || polygons.isEmpty()) return new Obstacles(null, marginKm, checkStepKm);
        Geometry u = UnaryUnionOp.union(polygons);
        return new Obstacles(u == null || u.isEmpty() ? null : u, marginKm, checkStepKm);
    }

    /** The union of the obstacles, or null. */
    public Geometry union() { return union; }

    /** Whether a point lies on or inside an obstacle. */
    public boolean contains(double lonDeg, double latDeg) {
        return prepared != null && prepared.intersects(GF.createPoint(new Coordinate(lonDeg, latDeg)));
    }

    /** Whether the geodesic from 1 to 2 is free of obstacles. */
    public boolean clear(double lon1, double lat1, double lon2, double lat2) {
        if (prepared == null) return true;
        return !prepared.intersects(line(Geodesy.densify(lon1, lat1, lon2, lat2, checkStepM)));
    }

    /** A polyline {@code [n][2]} (lon, lat) of the given points as JTS geometry. */
    static LineString line(double[][] pts) {
        Coordinate[] cs = new Coordinate[pts.length];
        for (int q = 0; q < pts.length; q++) cs[q] = new Coordinate(pts[q][0], pts[q][1]);
        return GF.createLineString(cs);
    }

    /**
     * Shortest obstacle-free path from 1 to 2: the geodesic if clear, else via buffered vertices.
     *
     * @return waypoints {lon, lat} including both ends; consecutive waypoints are joined by geodesics
     * @throws IllegalArgumentException if an end lies inside an obstacle or no path exists
     */
    public List<double[]> path(double lon1, double lat1, double lon2, double lat2) {
        if (contains(lon1, lat1)) throw new IllegalArgumentException("position (" + lon1 + ", " + lat1 + ") is on land or inside an exclusion zone");
        if (contains(lon2, lat2)) throw new IllegalArgumentException("position (" + lon2 + ", " + lat2 + ") is on land or inside an exclusion zone");
        if (clear(lon1, lat1, lon2, lat2)) return List.of(new double[] {lon1, lat1}, new double[] {lon2, lat2});
        int v = nodes.length, start = v, goal = v + 1;
        double[][] all = Arrays.copyOf(nodes, v + 2);
        all[start] = new double[] {lon1, lat1};
        all[goal] = new double[] {lon2, lat2};
        double[] g = new double[v + 2];
        int[] prev = new int[v + 2];
        Arrays.fill(g, Double.POSITIVE_INFINITY);
        Arrays.fill(prev, -1);
        boolean[] done = new boolean[v + 2];
        g[start] = 0;
        PriorityQueue<double[]> open = new PriorityQueue<>((a, b) -> a[0] != b[0] ? Double.compare(a[0], b[0]) : Double.compare(a[1], b[1]));
        open.add(new double[] {h(all[start], all[goal]), start});
        while (!open.isEmpty()) {
            int u = (int) open.poll()[1];
            if (done[u]) continue;
            done[u] = true;
            if (u == goal) break;
            for (int w = 0; w < v + 2; w++) {
                if (w == u || done[w] || w == start) continue;
                double lower = g[u] + Geodesy.sphereDistanceM(all[u][0], all[u][1], all[w][0], all[w][1]) * 0.99;
                if (lower >= g[w]) continue;
                if (!visible(u, w, all, v)) continue;
                double d = g[u] + Geodesy.distanceM(all[u][0], all[u][1], all[w][0], all[w][1]);
                if (d < g[w]) {
                    g[w] = d;
                    prev[w] = u;
                    open.add(new double[] {d + h(all[w], all[goal]), w});
                }
            }
        }
        if (prev[goal] < 0) {
            throw new IllegalArgumentException("no obstacle-free path from (" + lon1 + ", " + lat1 + ") to (" + lon2 + ", " + lat2 + ")");
        }
        List<double[]> out = new ArrayList<>();
        for (int u = goal; u >= 0; u = prev[u]) out.add(0, all[u]);
        return out;
    }

    private static double h(double[] a, double[] b) { return Geodesy.sphereDistanceM(a[0], a[1], b[0], b[1]) * 0.99; }

    private boolean visible(int u, int w, double[][] all, int v) {
        if (u < v && w < v) {
            long key = (long) Math.min(u, w) * 1_000_003L + Math.max(u, w);
            Boolean c = visibleCache.get(key);
            if (c == null) {
                c = clear(all[u][0], all[u][1], all[w][0], all[w][1]);
                visibleCache.put(key, c);
            }
            return c;
        }
        return clear(all[u][0], all[u][1], all[w][0], all[w][1]);
    }

    /** Number of visibility-graph vertices (buffered obstacle vertices). */
    public int vertexCount() { return nodes.length; }

    /** Whether a point is inside (for tests and callers). */
    public boolean contains(Point p) { return prepared != null && prepared.intersects(p); }
}
