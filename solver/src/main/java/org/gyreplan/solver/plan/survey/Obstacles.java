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
import java.util.HashMap;
import java.util.List;
import java.util.Map;

/**
 * Land and exclusion polygons a ship's track must not cross, and the shortest way around them.
 *
 * <p>Method and approximations:
 * <ul>
 *   <li>A leg is the WGS 84 geodesic between its ends. For the crossing test it is stood in for by the great circle
 *       through the same ends (tens of metres apart for legs of a few hundred km), densified to points at most
 *       {@code checkStepKm} apart; the polyline through those points (straight in lon/lat between them) is tested
 *       against the obstacles with JTS.
 *       Between check points the true geodesic deviates from the chord by far less than a kilometre for steps of a
 *       few km, so features much smaller than the step can be missed.</li>
 *   <li>When a leg is blocked, it is replaced by the shortest path in a visibility graph whose nodes are the two
 *       ends and the vertices of the obstacles buffered by {@code marginKm} (a buffer in degrees, widened by
 *       1/cos φ_max of the poleward-most obstacle latitude so that the east–west clearance is at least the margin;
 *       north–south it is then larger, which errs on the safe side; buffered rings simplified with a tolerance of a
 *       quarter of the buffer, and vertices inside any original polygon dropped). Edges are geodesics that
 *       pass the same crossing test against the original polygons; weights are their WGS 84 lengths. The search is
 *       Dijkstra on the dense graph; vertex–vertex visibility is computed once per
 *       {@code Obstacles} and point–vertex visibility once per point, so routing many stops costs at most
 *       O(V² + P·V) crossing tests (V vertices, P places); vertex rows are computed only when the search reaches the
 *       vertex, so distant parts of a long coastline cost little. Simplify large coastlines before use.</li>
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
    private final Map<Long, double[]> endpointCache = new HashMap<>();
    private double[][] nodeDist;

    private Obstacles(Geometry union, double marginKm, double checkStepKm) {
        this.union = union;
        this.prepared = union == null ? null : PreparedGeometryFactory.prepare(union);
        this.checkStepM = checkStepKm * 1000.0;
        if (union == null) {
            nodes = new double[0][];
        } else {
            // a buffer of r degrees is r·111 km north–south but only r·111·cos φ km east–west: widen it by the
            // poleward-most latitude of the obstacles so the east–west clearance is at least the margin everywhere
            double maxAbsLat = Math.min(80.0, Math.max(Math.abs(union.getEnvelopeInternal().getMinY()),
                    Math.abs(union.getEnvelopeInternal().getMaxY())));
            double marginDeg = marginKm / 111.0 / Math.cos(Math.toRadians(maxAbsLat));
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

    /**
     * Obstacles clipped to the region of the cruise: the envelope of the places widened by {@code padDeg} on every
     * side. Use it with large land layers (e.g. a world coastline) to keep the visibility graph small. Routes cannot
     * leave the padded box around a clipped polygon, so choose a pad wider than any detour (e.g. 2–5°).
     */
    public static Obstacles around(List<Geometry> polygons, List<Stop> places, double padDeg, double marginKm, double checkStepKm) {
        if (places == null || places.isEmpty()) throw new IllegalArgumentException("obstacles around a cruise need at least one place");
        if (!(padDeg > 0)) throw new IllegalArgumentException("padDeg must be > 0, got " + padDeg);
        org.locationtech.jts.geom.Envelope env = new org.locationtech.jts.geom.Envelope();
        for (Stop p : places) env.expandToInclude(p.lonDeg(), p.latDeg());
        env.expandBy(padDeg);
        Geometry box = GF.toGeometry(env);
        List<Geometry> clipped = new ArrayList<>();
        if (polygons != null) {
            for (Geometry g : polygons) {
                if (!g.getEnvelopeInternal().intersects(env)) continue;
                Geometry c = g.intersection(box);
                if (!c.isEmpty()) clipped.add(c);
            }
        }
        return of(clipped, marginKm, checkStepKm);
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
        LineString l = line(Geodesy.greatCirclePoints(lon1, lat1, lon2, lat2, checkStepM));
        if (!l.getEnvelopeInternal().intersects(union.getEnvelopeInternal())) return true;
        return !prepared.intersects(l);
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
        double[] fromStart = endpointDistances(lon1, lat1), toGoal = endpointDistances(lon2, lat2);
        // Dijkstra on the dense graph (V + 2 nodes); start has edges fromStart, goal has edges toGoal
        double[] g = new double[v + 2];
        int[] prev = new int[v + 2];
        boolean[] done = new boolean[v + 2];
        java.util.Arrays.fill(g, Double.POSITIVE_INFINITY);
        java.util.Arrays.fill(prev, -1);
        g[start] = 0;
        for (int it = 0; it < v + 2; it++) {
            int u = -1;
            for (int w = 0; w < v + 2; w++) if (!done[w] && (u < 0 || g[w] < g[u])) u = w;
            if (u < 0 || g[u] == Double.POSITIVE_INFINITY) break;
            done[u] = true;
            if (u == goal) break;
            double[] rowU = u == start ? null : row(u);
            for (int w = 0; w < v; w++) {
                if (done[w]) continue;
                double e = u == start ? fromStart[w] : rowU[w];
                if (g[u] + e < g[w]) { g[w] = g[u] + e; prev[w] = u; }
            }
            if (u != start && g[u] + toGoal[u] < g[goal]) { g[goal] = g[u] + toGoal[u]; prev[goal] = u; }
        }
        if (prev[goal] < 0) {
            throw new IllegalArgumentException("no obstacle-free path from (" + lon1 + ", " + lat1 + ") to (" + lon2 + ", " + lat2 + ")");
        }
        List<double[]> out = new ArrayList<>();
        for (int u = goal; u >= 0; u = prev[u]) {
            out.add(0, u == start ? new double[] {lon1, lat1} : u == goal ? new double[] {lon2, lat2} : nodes[u]);
        }
        return out;
    }

    /** The vertex–vertex distance matrix, rows filled lazily by {@link #row} (NaN = not yet computed). */
    private synchronized double[][] nodeDistances() {
        if (nodeDist == null) {
            int v = nodes.length;
            nodeDist = new double[v][v];
            for (double[] r : nodeDist) java.util.Arrays.fill(r, Double.NaN);
        }
        return nodeDist;
    }

    /** Row u of the vertex–vertex geodesic lengths (∞ where blocked), computed on first use and cached (symmetric). */
    private synchronized double[] row(int u) {
        double[][] d = nodeDistances();
        for (int w = 0; w < nodes.length; w++) {
            if (!Double.isNaN(d[u][w])) continue;
            double e = w == u ? 0.0 : clear(nodes[u][0], nodes[u][1], nodes[w][0], nodes[w][1])
                    ? Geodesy.distanceM(nodes[u][0], nodes[u][1], nodes[w][0], nodes[w][1]) : Double.POSITIVE_INFINITY;
            d[u][w] = d[w][u] = e;
        }
        return d[u];
    }

    /** Geodesic lengths from a point to every visible vertex (∞ if blocked), cached per point. */
    private synchronized double[] endpointDistances(double lon, double lat) {
        long key = Double.doubleToLongBits(lon) * 31 + Double.doubleToLongBits(lat);
        double[] d = endpointCache.get(key);
        if (d == null || d.length != nodes.length) {
            d = new double[nodes.length];
            for (int w = 0; w < nodes.length; w++) {
                d[w] = clear(lon, lat, nodes[w][0], nodes[w][1])
                        ? Geodesy.distanceM(lon, lat, nodes[w][0], nodes[w][1]) : Double.POSITIVE_INFINITY;
            }
            endpointCache.put(key, d);
        }
        return d;
    }

    /** Number of visibility-graph vertices (buffered obstacle vertices). */
    public int vertexCount() { return nodes.length; }

    /** Whether a point is inside (for tests and callers). */
    public boolean contains(Point p) { return prepared != null && prepared.intersects(p); }
}
