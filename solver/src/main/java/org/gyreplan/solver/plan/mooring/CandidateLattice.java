package org.gyreplan.solver.plan.mooring;

import org.gyreplan.solver.grid.LonLatGrid;
import org.gyreplan.solver.grid.ScalarField;
import org.gyreplan.solver.plan.Geodesy;
import org.gyreplan.solver.plan.zones.UpwellingStatistics;
import org.gyreplan.solver.plan.zones.UpwellingZone;
import org.gyreplan.solver.progress.CancelToken;
import org.gyreplan.solver.progress.ProgressListener;

import java.util.ArrayList;
import java.util.List;
import java.util.Objects;

/**
 * Mooring candidates at the ocean cell centres of the statistics grid (optionally every {@code stride}-th cell).
 *
 * <p>Criteria per candidate: persistence, mean and standard deviation from {@link UpwellingStatistics}; depth
 * (m, positive down) interpolated bilinearly from the depth field (any grid); zone id from the zones' member
 * cells; distance to port = WGS 84 geodesic (ignores land — the route planner gives sailing distances).
 * Distance from the coast = great-circle distance (haversine on the mean sphere) to the nearest land cell centre
 * of the grid's mask that touches the ocean: an approximation good to about half a cell plus 0.5 %, and
 * +∞ when the grid has no land (then the coast-distance window only acts through its minimum).
 */
public final class CandidateLattice {
    private CandidateLattice() { }

    /** One candidate per ocean cell centre (every {@code stride}-th cell in each direction). */
    public static List<MooringCandidate> fromGrid(UpwellingStatistics stats, List<UpwellingZone> zones, ScalarField depthM,
                                                  double portLonDeg, double portLatDeg, int stride,
                                                  ProgressListener progress, CancelToken cancel) {
        return build(stats, zones, depthM, portLonDeg, portLatDeg, stride, 1, progress, cancel);
    }

    /**
     * A finer lattice: each ocean cell holds {@code subdivisions}² candidates at the centres of its sub-cells. Upwelling
     * criteria and zone membership come from the containing cell; depth is interpolated at each sub-cell point, so the
     * depth window can pick the right part of a steep slope.
     */
    public static List<MooringCandidate> refined(UpwellingStatistics stats, List<UpwellingZone> zones, ScalarField depthM,
                                                 double portLonDeg, double portLatDeg, int subdivisions,
                                                 ProgressListener progress, CancelToken cancel) {
        return build(stats, zones, depthM, portLonDeg, portLatDeg, 1, subdivisions, progress, cancel);
    }

    private static List<MooringCandidate> build(UpwellingStatistics stats, List<UpwellingZone> zones, ScalarField depthM,
                                                double portLonDeg, double portLatDeg, int stride, int sub,
                                                ProgressListener progress, CancelToken cancel) {
        Objects.requireNonNull(stats, "stats");
        Objects.requireNonNull(depthM, "depthM");
        if (stride < 1) throw new IllegalArgumentException("candidate stride must be ≥ 1, got " + stride);
        if (sub < 1) throw new IllegalArgumentException("candidate subdivisions must be ≥ 1, got " + sub);
        LonLatGrid g = stats.grid();
        int nx = g.nx(), ny = g.ny();
        int[] zoneOf = new int[g.size()];
        if (zones != null) for (UpwellingZone z : zones) for (int k : z.cells()) zoneOf[k] = z.id();
        List<double[]> coast = new ArrayList<>();
        for (int j = 0; j < ny; j++) {
            for (int i = 0; i < nx; i++) {
                if (g.isOcean(i, j)) continue;
                boolean touches = (i > 0 && g.isOcean(i - 1, j)) || (i < nx - 1 && g.isOcean(i + 1, j))
                        || (j > 0 && g.isOcean(i, j - 1)) || (j < ny - 1 && g.isOcean(i, j + 1));
                if (touches) coast.add(new double[] {g.lonDeg(i), g.latDeg(j)});
            }
        }
        List<MooringCandidate> out = new ArrayList<>();
        for (int j = 0; j < ny; j += stride) {
            cancel.check();
            progress.progress("mooring candidates", (double) j / ny, "");
            for (int i = 0; i < nx; i += stride) {
                int k = g.index(i, j);
                if (!g.isOcean(k) || stats.count(k) == 0) continue;
                for (int b = 0; b < sub; b++) {
                    for (int a = 0; a < sub; a++) {
                        double lon = sub == 1 ? g.lonDeg(i) : g.lonDeg(i) + ((a + 0.5) / sub - 0.5) * g.dLonDeg();
                        double lat = sub == 1 ? g.latDeg(j) : g.latDeg(j) + ((b + 0.5) / sub - 0.5) * g.dLatDeg();
                        double coastKm = Double.POSITIVE_INFINITY;
                        for (double[] c : coast) coastKm = Math.min(coastKm, Geodesy.sphereDistanceM(lon, lat, c[0], c[1]) / 1000.0);
                        double portKm = Geodesy.distanceM(portLonDeg, portLatDeg, lon, lat) / 1000.0;
                        String id = sub == 1 ? "c-" + i + "-" + j : "c-" + i + "-" + j + "-" + a + b;
                        out.add(new MooringCandidate(id, lon, lat, depthM.interpolate(lon, lat), coastKm, portKm,
                                stats.persistence(k), stats.mean(k), stats.std(k), zoneOf[k]));
                    }
                }
            }
        }
        progress.progress("mooring candidates", 1.0, out.size() + " candidates");
        return out;
    }
}
