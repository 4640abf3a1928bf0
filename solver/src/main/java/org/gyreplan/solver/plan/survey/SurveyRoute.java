package org.gyreplan.solver.plan.survey;

import org.gyreplan.solver.plan.Cautions;
import org.gyreplan.solver.plan.Geodesy;
import org.gyreplan.solver.progress.CancelToken;
import org.gyreplan.solver.progress.ProgressListener;

import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Objects;
import java.util.Set;

/**
 * Orders the stops of a cruise from a port and back and builds obstacle-avoiding legs.
 *
 * <p>Distances: for every pair of places, the sailing distance of {@link Obstacles#path} (the WGS 84 geodesic,
 * or the shortest detour through the buffered obstacle vertices when the geodesic is blocked). The matrix is
 * symmetric.
 *
 * <p>Order (a travelling-salesman tour through the port): several constructions — nearest neighbour from the port,
 * cheapest insertion, and farthest insertion — are each improved by local search until no move helps:
 * 2-opt (reverse a sub-sequence) and Or-opt (move a run of 1–3 consecutive stops, either way round, to another
 * position). The shortest of the improved tours is kept. This is a heuristic: on the 60 seeded test cases with 4–9
 * stations it matched exhaustive enumeration in every case when written (the test allows a 2 % gap per case and
 * requires the exact optimum in ≥ 90 % of them); larger instances have no optimality guarantee. Ties break by input order, so results are reproducible.
 */
public final class SurveyRoute {
    private SurveyRoute() { }

    /** Plans the route with no obstacles. */
    public static Route plan(Stop port, List<Stop> stops) {
        return plan(port, stops, Obstacles.none(), ProgressListener.NONE, CancelToken.none());
    }

    /** Plans the route around the given obstacles. */
    public static Route plan(Stop port, List<Stop> stops, Obstacles obstacles) {
        return plan(port, stops, obstacles, ProgressListener.NONE, CancelToken.none());
    }

    /** Plans the route around the given obstacles, with progress and cancel. */
    public static Route plan(Stop port, List<Stop> stops, Obstacles obstacles, ProgressListener progress, CancelToken cancel) {
        Objects.requireNonNull(port, "port");
        Objects.requireNonNull(stops, "stops");
        Objects.requireNonNull(obstacles, "obstacles");
        checkIds(port, stops, obstacles);
        if (stops.isEmpty()) return new Route(port, List.of(), List.of(), "no stops", cautions(List.of()));
        List<Stop> places = new ArrayList<>();
        places.add(port);
        places.addAll(stops);
        int n = places.size();
        double[][] d = new double[n][n];
        List<double[]>[][] paths = pathsArray(n);
        for (int i = 0; i < n; i++) {
            cancel.check();
            progress.progress("route distances", (double) i / n, "");
            for (int j = i + 1; j < n; j++) {
                Stop a = places.get(i), b = places.get(j);
                List<double[]> p = obstacles.path(a.lonDeg(), a.latDeg(), b.lonDeg(), b.latDeg());
                paths[i][j] = p;
                d[i][j] = d[j][i] = length(p);
            }
        }
        progress.progress("route order", 0, "");
        int[] tour = TourImprover.bestTour(d, cancel);
        List<Stop> order = new ArrayList<>();
        for (int q = 1; q < tour.length; q++) order.add(places.get(tour[q]));
        List<Leg> legs = new ArrayList<>();
        for (int q = 0; q < tour.length; q++) {
            int a = tour[q], b = tour[(q + 1) % tour.length];
            legs.add(leg(places.get(a), places.get(b), a < b ? paths[a][b] : reversed(paths[b][a]), d[a][b]));
        }
        progress.progress("route order", 1, "");
        return new Route(port, order, legs, TourImprover.METHOD, cautions(legs));
    }

    /** A route visiting the stops in the given order (no reordering), around the obstacles. */
    public static Route inOrder(Stop port, List<Stop> stops, Obstacles obstacles) {
        checkIds(port, stops, obstacles);
        if (stops.isEmpty()) return new Route(port, List.of(), List.of(), "no stops", cautions(List.of()));
        List<Stop> seq = new ArrayList<>();
        seq.add(port);
        seq.addAll(stops);
        seq.add(port);
        List<Leg> legs = new ArrayList<>();
        for (int q = 0; q + 1 < seq.size(); q++) {
            Stop a = seq.get(q), b = seq.get(q + 1);
            List<double[]> p = obstacles.path(a.lonDeg(), a.latDeg(), b.lonDeg(), b.latDeg());
            legs.add(leg(a, b, p, length(p)));
        }
        return new Route(port, stops, legs, "given order", cautions(legs));
    }

    private static void checkIds(Stop port, List<Stop> stops, Obstacles obstacles) {
        Set<String> ids = new HashSet<>();
        ids.add(port.id());
        if (obstacles.contains(port.lonDeg(), port.latDeg())) {
            throw new IllegalArgumentException("port '" + port.id() + "' at (" + port.lonDeg() + ", " + port.latDeg()
                    + ") lies on land or inside an exclusion zone; give the harbour entrance just offshore");
        }
        for (Stop s : stops) {
            if (!ids.add(s.id())) throw new IllegalArgumentException("duplicate stop id '" + s.id() + "'");
            if (obstacles.contains(s.lonDeg(), s.latDeg())) {
                throw new IllegalArgumentException("stop '" + s.id() + "' at (" + s.lonDeg() + ", " + s.latDeg()
                        + ") lies on land or inside an exclusion zone");
            }
        }
    }

    private static List<String> cautions(List<Leg> legs) {
        List<String> c = new ArrayList<>(Cautions.STANDARD);
        long detours = legs.stream().filter(Leg::detours).count();
        if (detours > 0) {
            c.add(detours + " leg(s) go around land or exclusion zones through buffered corner points: check the "
                    + "clearance against the chart.");
        }
        c.add("Only the given land and exclusion polygons are avoided; shoals, traffic separation schemes, fishing gear "
                + "and other hazards are not.");
        return c;
    }

    private static Leg leg(Stop a, Stop b, List<double[]> p, double d) { return new Leg(a, b, d, p); }

    static double length(List<double[]> p) {
        double s = 0;
        for (int q = 0; q + 1 < p.size(); q++) s += Geodesy.distanceM(p.get(q)[0], p.get(q)[1], p.get(q + 1)[0], p.get(q + 1)[1]);
        return s;
    }

    private static List<double[]> reversed(List<double[]> p) {
        List<double[]> r = new ArrayList<>(p);
        java.util.Collections.reverse(r);
        return r;
    }

    @SuppressWarnings("unchecked")
    private static List<double[]>[][] pathsArray(int n) { return new List[n][n]; }
}
