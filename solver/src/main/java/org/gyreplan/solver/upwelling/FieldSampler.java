package org.gyreplan.solver.upwelling;

import org.gyreplan.solver.DegreeTrig;
import org.gyreplan.solver.grid.LonLatGrid;
import org.gyreplan.solver.grid.ScalarField;

import java.util.Arrays;

/**
 * Samples a grid at one position by {@link StressSampling#NEAREST_OCEAN} or {@link StressSampling#BILINEAR},
 * using only cells that are ocean in the grid mask and have finite values, reporting the great-circle distance (km) to the cell used. The candidate cells are sorted once per position and
 * grid, so sampling a long series costs little per step.
 */
final class FieldSampler {
    private final LonLatGrid grid;
    private final double lonDeg;
    private final double latDeg;
    private final StressSampling mode;
    private int[] nearest;          // candidate cells sorted by distance
    private double[] nearestKm;

    /** Result of sampling: the value(s) and the distance to the cell used. */
    record Sample(double a, double b, double distanceKm) { }

    FieldSampler(LonLatGrid grid, double lonDeg, double latDeg, StressSampling mode) {
        this.grid = grid;
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

    private void sortCandidates() {
        int n = grid.size();
        double[] d = new double[n];
        long[] keys = new long[n];
        for (int j = 0; j < grid.ny(); j++) {
            for (int i = 0; i < grid.nx(); i++) {
                int k = grid.index(i, j);
                d[k] = greatCircleKm(lonDeg, latDeg, grid.lonDeg(i), grid.latDeg(j), grid.radius());
                // order by distance (float bits of a non-negative float sort like the value), ties by cell index
                keys[k] = ((long) Float.floatToIntBits((float) d[k]) << 32) | k;
            }
        }
        Arrays.sort(keys);
        nearest = new int[n];
        nearestKm = new double[n];
        for (int r = 0; r < n; r++) {
            int k = (int) (keys[r] & 0xffffffffL);
            nearest[r] = k;
            nearestKm[r] = d[k];
        }
    }

    /** Samples the pair (a, b) (e.g. the two stress components); a cell counts only if both are finite. */
    Sample sample(ScalarField fa, ScalarField fb) {
        double[] va = fa.values(), vb = fb.values();
        if (mode == StressSampling.NEAREST_OCEAN) {
            if (nearest == null) sortCandidates();
            for (int r = 0; r < nearest.length; r++) {
                int k = nearest[r];
                if (grid.isOcean(k) && Double.isFinite(va[k]) && Double.isFinite(vb[k])) {
                    return new Sample(va[k], vb[k], nearestKm[r]);
                }
            }
            return new Sample(Double.NaN, Double.NaN, Double.NaN);
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
