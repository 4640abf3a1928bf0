package org.gyreplan.solver.upwelling;

import org.gyreplan.solver.DegreeTrig;
import org.gyreplan.solver.grid.LonLatGrid;
import org.gyreplan.solver.grid.ScalarField;

import java.util.Arrays;

/**
 * Samples a grid at one position by {@link StressSampling#NEAREST_OCEAN} or {@link StressSampling#BILINEAR},
 * using only cells that are ocean in the grid mask and have finite values, and reports the great-circle distance
 * (km) to the cell used.
 *
 * <p>For nearest-ocean sampling the {@value #CANDIDATES} nearest cell centres of the grid geometry are found once
 * (one O(N) pass with a bounded selection) and kept sorted by distance, so each later sample costs O(1) in the usual
 * case; if none of them is usable the whole grid is scanned. The candidate list depends only on the grid geometry
 * and the position, never on the mask or the values, so one sampler serves every time step and mask.
 */
final class FieldSampler {
    static final int CANDIDATES = 256;
    private final LonLatGrid geometry;
    private final double lonDeg;
    private final double latDeg;
    private final StressSampling mode;
    private int[] nearest;          // candidate cells sorted by distance (ties by index)
    private double[] nearestKm;

    /** Result of sampling: the value(s) and the distance to the cell used. */
    record Sample(double a, double b, double distanceKm) { }

    FieldSampler(LonLatGrid geometry, double lonDeg, double latDeg, StressSampling mode) {
        this.geometry = geometry;
        this.lonDeg = lonDeg;
        this.latDeg = latDeg;
        this.mode = mode;
    }

    /** Great-circle (haversine) distance between two positions on a sphere of radius r, km. */
    static double greatCircleKm(double lon1, double lat1, double lon2, double lat2, double radiusM) {
        double s1 = DegreeTrig.sinDeg((lat2 - lat1) / 2), s2 = DegreeTrig.sinDeg((lon2 - lon1) / 2);
        double h = s1 * s1 + DegreeTrig.cosDeg(lat1) * DegreeTrig.cosDeg(lat2) * s2 * s2;
        return 2 * radiusM * Math.asin(Math.min(1.0, Math.sqrt(h))) / 1000.0;
    }

    private double distanceKm(LonLatGrid g, int k) {
        int i = k % g.nx(), j = k / g.nx();
        return greatCircleKm(lonDeg, latDeg, g.lonDeg(i), g.latDeg(j), g.radius());
    }

    /** Key ordering by distance then index: float bits of a non-negative float sort like the value. */
    private static long key(double d, int k) {
        return ((long) Float.floatToIntBits((float) d) << 32) | (k & 0xffffffffL);
    }

    private synchronized void selectCandidates() {
        if (nearest != null) return;
        int n = geometry.size(), m = Math.min(CANDIDATES, n);
        // bounded max-heap of the m smallest keys
        long[] heap = new long[m];
        int size = 0;
        for (int k = 0; k < n; k++) {
            long key = key(distanceKm(geometry, k), k);
            if (size < m) {
                int c = size++;
                heap[c] = key;
                while (c > 0 && heap[(c - 1) / 2] < heap[c]) { long t = heap[c]; heap[c] = heap[(c - 1) / 2]; heap[(c - 1) / 2] = t; c = (c - 1) / 2; }
            } else if (key < heap[0]) {
                heap[0] = key;
                int c = 0;
                while (true) {
                    int l = 2 * c + 1, r = l + 1, big = c;
                    if (l < m && heap[l] > heap[big]) big = l;
                    if (r < m && heap[r] > heap[big]) big = r;
                    if (big == c) break;
                    long t = heap[c]; heap[c] = heap[big]; heap[big] = t; c = big;
                }
            }
        }
        Arrays.sort(heap, 0, size);
        int[] idx = new int[size];
        double[] km = new double[size];
        for (int r = 0; r < size; r++) {
            idx[r] = (int) (heap[r] & 0xffffffffL);
            km[r] = distanceKm(geometry, idx[r]);
        }
        nearestKm = km;
        nearest = idx;
    }

    /** Samples the pair (a, b) (e.g. the two stress components); a cell counts only if ocean and both are finite. */
    Sample sample(ScalarField fa, ScalarField fb) {
        LonLatGrid grid = fa.grid();
        double[] va = fa.values(), vb = fb.values();
        if (mode == StressSampling.NEAREST_OCEAN) {
            if (nearest == null) selectCandidates();
            for (int r = 0; r < nearest.length; r++) {
                int k = nearest[r];
                if (grid.isOcean(k) && Double.isFinite(va[k]) && Double.isFinite(vb[k])) {
                    return new Sample(va[k], vb[k], nearestKm[r]);
                }
            }
            // none of the candidates is usable: scan the whole grid
            long best = Long.MAX_VALUE;
            for (int k = 0; k < grid.size(); k++) {
                if (grid.isOcean(k) && Double.isFinite(va[k]) && Double.isFinite(vb[k])) {
                    best = Math.min(best, key(distanceKm(grid, k), k));
                }
            }
            if (best == Long.MAX_VALUE) return new Sample(Double.NaN, Double.NaN, Double.NaN);
            int k = (int) (best & 0xffffffffL);
            return new Sample(va[k], vb[k], distanceKm(grid, k));
        }
        double x = grid.columnOf(lonDeg), y = grid.rowOf(latDeg);
        int i0 = (int) Math.floor(x), j0 = (int) Math.floor(y);
        double fx = x - i0, fy = y - j0;
        double sa = 0, sb = 0, w = 0, dmin = Double.NaN;
        for (int dj = 0; dj <= 1; dj++) {
            for (int di = 0; di <= 1; di++) {
                int i = i0 + di, j = j0 + dj;
                if (i < 0 || i >= grid.nx() || j < 0 || j >= grid.ny()) continue;
                int k = grid.index(i, j);
                if (!grid.isOcean(k) || !Double.isFinite(va[k]) || !Double.isFinite(vb[k])) continue;
                double wt = (di == 0 ? 1 - fx : fx) * (dj == 0 ? 1 - fy : fy);
                sa += wt * va[k];
                sb += wt * vb[k];
                w += wt;
                double dk = greatCircleKm(lonDeg, latDeg, grid.lonDeg(i), grid.latDeg(j), grid.radius());
                if (!(dk >= dmin)) dmin = dk;
            }
        }
        if (w <= 1e-12) return new Sample(Double.NaN, Double.NaN, Double.NaN);
        return new Sample(sa / w, sb / w, dmin);
    }

    /** Samples one scalar field. */
    Sample sample(ScalarField f) { return sample(f, f); }
}
