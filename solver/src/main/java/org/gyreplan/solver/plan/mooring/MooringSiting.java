package org.gyreplan.solver.plan.mooring;

import org.gyreplan.solver.plan.Cautions;
import org.gyreplan.solver.plan.Geodesy;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.GeometryFactory;
import org.locationtech.jts.geom.Point;
import org.locationtech.jts.geom.prep.PreparedGeometry;
import org.locationtech.jts.geom.prep.PreparedGeometryFactory;

import java.util.ArrayList;
import java.util.BitSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Objects;

/**
 * Chooses the best K mooring sites.
 *
 * <pre>
 *   feasible(c)  ⇔  minDepthM ≤ depth ≤ maxDepthM ∧ minCoastKm ≤ coast ≤ maxCoastKm ∧ c ∉ any exclusion polygon
 *                   ∧ (zoneId &gt; 0 if required)
 *   xₙ(c)        = (x(c) − min x) / (max x − min x)  over feasible candidates (1 if max = min)
 *   proximity(c) = (max d − d(c)) / (max d − min d),  d = distance to port
 *   score(c)     = Σ wᵢ xᵢ,ₙ(c),  Σ wᵢ = 1            (0…1)
 *   maximise (|S|, Σ_{c∈S} score(c)) lexicographically, |S| ≤ K, geodesic distance ≥ minSpacing for all pairs in S
 * </pre>
 * The set selection is {@link SiteSelection}: greedy by score, then add / 1-for-1 swap / 1-for-2 exchange local
 * search, then an exact branch-and-bound seeded with that set and bounded by a deterministic work budget (proven optimal when it
 * finishes, which is the usual case for up to a few hundred feasible candidates and small K; otherwise the
 * local-search set, possibly improved, is returned and flagged). The result is never worse than greedy.
 * Spacing conflicts use the WGS 84 geodesic distance (GeographicLib) after a spherical pre-filter.
 */
public final class MooringSiting {
    private static final GeometryFactory GF = new GeometryFactory();

    private MooringSiting() { }

    /** Best K sites with the default branch-and-bound budget. */
    public static SitingResult choose(List<MooringCandidate> candidates, SiteConstraints constraints, SiteWeights weights, int k) {
        return choose(candidates, constraints, weights, k, SiteSelection.DEFAULT_NODE_BUDGET);
    }

    /** Best K sites; {@code nodeBudget} bounds the work of the exact search (nodes plus candidates scanned). */
    public static SitingResult choose(List<MooringCandidate> candidates, SiteConstraints constraints, SiteWeights weights,
                                      int k, long nodeBudget) {
        Objects.requireNonNull(candidates, "candidates");
        Objects.requireNonNull(constraints, "constraints");
        Objects.requireNonNull(weights, "weights");
        if (k < 1) throw new IllegalArgumentException("number of mooring sites K must be at least 1, got " + k);
        Map<String, Integer> rejected = new LinkedHashMap<>();
        List<MooringCandidate> feasible = new ArrayList<>();
        List<PreparedGeometry> excl = new ArrayList<>();
        for (Geometry g : constraints.exclusions()) excl.add(PreparedGeometryFactory.prepare(g));
        for (MooringCandidate c : candidates) {
            String why = rejection(c, constraints, excl);
            if (why == null) feasible.add(c);
            else rejected.merge(why, 1, Integer::sum);
        }
        SiteWeights w = weights.normalised();
        int n = feasible.size();
        ScoreBreakdown[] br = breakdowns(feasible, w);
        double[] score = new double[n];
        for (int i = 0; i < n; i++) score[i] = br[i].score();
        BitSet[] conflicts = conflicts(feasible, constraints.minSpacingKm() * 1000.0);
        SiteSelection sel = new SiteSelection(score, conflicts, k);
        SiteSelection.Selection greedy = sel.greedy();
        SiteSelection.Selection best = sel.best(nodeBudget);
        List<ChosenSite> sites = new ArrayList<>();
        int rank = 1;
        for (int i : best.chosen()) sites.add(new ChosenSite(rank++, feasible.get(i), br[i]));
        List<String> cautions = new ArrayList<>(Cautions.STANDARD);
        if (best.count() < k) {
            cautions.add("Only " + best.count() + " of the " + k + " requested sites fit the constraints ("
                    + n + " feasible candidates, minimum spacing " + constraints.minSpacingKm() + " km).");
        }
        cautions.add("Depths come from the gridded bathymetry at the candidate point; survey the site (multibeam or echo "
                + "sounder) before cutting line lengths.");
        return new SitingResult(sites, w, best.method(), best.provenOptimal(), best.total(), greedy.total(),
                greedy.count(), n, rejected, cautions);
    }

    /** Why a candidate fails the per-site constraints, or null if it passes. */
    static String rejection(MooringCandidate c, SiteConstraints k, List<PreparedGeometry> excl) {
        if (!Double.isFinite(c.depthM())) return "depth unknown (land or no data)";
        if (c.depthM() < k.minDepthM()) return "shallower than " + k.minDepthM() + " m";
        if (c.depthM() > k.maxDepthM()) return "deeper than " + k.maxDepthM() + " m";
        if (!(c.coastDistanceKm() >= k.minCoastKm())) return "closer to the coast than " + k.minCoastKm() + " km";
        if (!(c.coastDistanceKm() <= k.maxCoastKm())) return "farther from the coast than " + k.maxCoastKm() + " km";
        if (k.requireInZone() && c.zoneId() <= 0) return "outside the upwelling zones";
        if (!excl.isEmpty()) {
            Point p = GF.createPoint(new Coordinate(c.lonDeg(), c.latDeg()));
            for (PreparedGeometry g : excl) if (g.intersects(p)) return "inside an exclusion zone";
        }
        return null;
    }

    static ScoreBreakdown[] breakdowns(List<MooringCandidate> feasible, SiteWeights w) {
        int n = feasible.size();
        double[][] x = new double[4][n];
        for (int i = 0; i < n; i++) {
            MooringCandidate c = feasible.get(i);
            x[0][i] = finiteOr0(c.persistence());
            x[1][i] = finiteOr0(c.meanMps());
            x[2][i] = finiteOr0(c.stdMps());
            x[3][i] = -finiteOr0(c.portDistanceKm());   // closer is better
        }
        for (double[] col : x) normalise(col);
        ScoreBreakdown[] out = new ScoreBreakdown[n];
        for (int i = 0; i < n; i++) {
            double s = w.persistence() * x[0][i] + w.intensity() * x[1][i] + w.variability() * x[2][i]
                    + w.portProximity() * x[3][i];
            out[i] = new ScoreBreakdown(x[0][i], x[1][i], x[2][i], x[3][i], w, Math.max(0.0, s));
        }
        return out;
    }

    private static double finiteOr0(double v) { return Double.isFinite(v) ? v : 0.0; }

    private static void normalise(double[] v) {
        double lo = Double.POSITIVE_INFINITY, hi = Double.NEGATIVE_INFINITY;
        for (double a : v) { lo = Math.min(lo, a); hi = Math.max(hi, a); }
        for (int i = 0; i < v.length; i++) v[i] = hi > lo ? (v[i] - lo) / (hi - lo) : 1.0;
    }

    /** Pairs closer than {@code spacingM} (WGS 84 geodesic; haversine pre-filter with a 1 % margin). */
    static BitSet[] conflicts(List<MooringCandidate> c, double spacingM) {
        int n = c.size();
        BitSet[] out = new BitSet[n];
        for (int i = 0; i < n; i++) out[i] = new BitSet(n);
        if (spacingM <= 0) return out;
        double dLatMax = Math.toDegrees(spacingM * 1.01 / 6_356_000.0);
        for (int i = 0; i < n; i++) {
            MooringCandidate a = c.get(i);
            for (int j = i + 1; j < n; j++) {
                MooringCandidate b = c.get(j);
                if (Math.abs(a.latDeg() - b.latDeg()) > dLatMax) continue;
                double ds = Geodesy.sphereDistanceM(a.lonDeg(), a.latDeg(), b.lonDeg(), b.latDeg());
                if (ds > spacingM * 1.01) continue;
                double d = Geodesy.distanceM(a.lonDeg(), a.latDeg(), b.lonDeg(), b.latDeg());
                if (d < spacingM) { out[i].set(j); out[j].set(i); }
            }
        }
        return out;
    }
}
