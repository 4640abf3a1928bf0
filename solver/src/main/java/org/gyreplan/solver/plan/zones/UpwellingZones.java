package org.gyreplan.solver.plan.zones;

import org.gyreplan.solver.grid.LonLatGrid;
import org.gyreplan.solver.progress.CancelToken;
import org.gyreplan.solver.progress.ProgressListener;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.GeometryFactory;
import org.locationtech.jts.geom.Polygon;
import org.locationtech.jts.geom.PrecisionModel;
import org.locationtech.jts.geom.util.GeometryFixer;
import org.locationtech.jts.operation.union.UnaryUnionOp;

import java.util.ArrayDeque;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.Comparator;
import java.util.List;
import java.util.Objects;

/**
 * Finds upwelling zones from {@link UpwellingStatistics}.
 *
 * <p>Method: a cell qualifies when it is ocean, has samples, its mean ≥ the intensity threshold and its
 * persistence ≥ the persistence threshold. Qualifying cells are grouped into contiguous zones by edge
 * (4-)connectivity (cells touching only at a corner form separate zones). Each zone's polygon is the exact union
 * of its cell rectangles (first merged into row runs, then unioned with JTS {@code UnaryUnionOp}), so holes appear
 * where enclosed cells fail a threshold; the result is checked and, if needed, repaired with {@code GeometryFixer}.
 * Area is the sum of the grid's exact spherical cell areas, so it inherits the staircase (cell-resolution) error
 * of the thresholded field: at most about (zone perimeter × cell diagonal) for a smooth boundary, usually much
 * less because cells cut by the boundary err on both sides.
 */
public final class UpwellingZones {
    private static final GeometryFactory GF = new GeometryFactory(new PrecisionModel(), 4326);

    private UpwellingZones() { }

    /** Zones ordered by decreasing area. */
    public static List<UpwellingZone> find(UpwellingStatistics stats, ZoneThresholds thresholds) {
        return find(stats, thresholds, ProgressListener.NONE, CancelToken.none());
    }

    /** Zones ordered by decreasing area, with progress and cancel. */
    public static List<UpwellingZone> find(UpwellingStatistics stats, ZoneThresholds thresholds,
                                           ProgressListener progress, CancelToken cancel) {
        Objects.requireNonNull(stats, "stats");
        Objects.requireNonNull(thresholds, "thresholds");
        LonLatGrid g = stats.grid();
        int nx = g.nx(), ny = g.ny(), n = g.size();
        boolean[] in = new boolean[n];
        for (int k = 0; k < n; k++) {
            in[k] = g.isOcean(k) && stats.count(k) > 0
                    && stats.mean(k) >= thresholds.minMeanMps()
                    && stats.persistence(k) >= thresholds.minPersistence();
        }
        int[] label = new int[n];
        Arrays.fill(label, -1);
        List<int[]> comps = new ArrayList<>();
        ArrayDeque<Integer> queue = new ArrayDeque<>();
        for (int k0 = 0; k0 < n; k0++) {
            if (!in[k0] || label[k0] >= 0) continue;
            int id = comps.size();
            List<Integer> members = new ArrayList<>();
            label[k0] = id;
            queue.add(k0);
            while (!queue.isEmpty()) {
                int k = queue.poll();
                members.add(k);
                int i = k % nx, j = k / nx;
                int[][] nb = {{i - 1, j}, {i + 1, j}, {i, j - 1}, {i, j + 1}};
                for (int[] p : nb) {
                    if (p[0] < 0 || p[0] >= nx || p[1] < 0 || p[1] >= ny) continue;
                    int q = g.index(p[0], p[1]);
                    if (in[q] && label[q] < 0) { label[q] = id; queue.add(q); }
                }
            }
            int[] arr = members.stream().mapToInt(Integer::intValue).sorted().toArray();
            if (arr.length >= thresholds.minCells()) comps.add(arr);
            else for (int k : arr) label[k] = -2;
        }
        List<UpwellingZone> zones = new ArrayList<>();
        for (int c = 0; c < comps.size(); c++) {
            cancel.check();
            progress.progress("upwelling zones", (double) c / comps.size(), "zone " + (c + 1) + " of " + comps.size());
            zones.add(describe(stats, thresholds, comps.get(c)));
        }
        zones.sort(Comparator.comparingDouble(UpwellingZone::areaKm2).reversed()
                .thenComparingInt(z -> z.cells()[0]));
        List<UpwellingZone> out = new ArrayList<>();
        for (int z = 0; z < zones.size(); z++) {
            UpwellingZone u = zones.get(z);
            out.add(new UpwellingZone(z + 1, u.polygon(), u.areaKm2(), u.centroidLonDeg(), u.centroidLatDeg(),
                    u.meanMps(), u.peakMps(), u.peakMonthlyMps(), u.meanPersistence(), u.peakMonth(),
                    u.monthsActive(), u.cells()));
        }
        progress.progress("upwelling zones", 1.0, out.size() + " zones");
        return out;
    }

    /** The union of the zones' polygons (lon/lat), or an empty polygon if there are none. */
    public static Geometry union(List<UpwellingZone> zones) {
        List<Geometry> g = new ArrayList<>();
        for (UpwellingZone z : zones) g.add(z.polygon());
        Geometry u = UnaryUnionOp.union(g);
        return u == null ? GF.createPolygon() : u;
    }

    private static UpwellingZone describe(UpwellingStatistics s, ZoneThresholds t, int[] cells) {
        LonLatGrid g = s.grid();
        int nx = g.nx();
        double area = 0, cx = 0, cy = 0, wm = 0, wp = 0, peak = Double.NEGATIVE_INFINITY;
        double[] mSum = new double[12], mArea = new double[12];
        for (int k : cells) {
            int i = k % nx, j = k / nx;
            double a = g.cellArea(j);
            area += a;
            cx += a * g.lonDeg(i);
            cy += a * g.latDeg(j);
            wm += a * s.mean(k);
            wp += a * s.persistence(k);
            peak = Math.max(peak, s.mean(k));
            for (int m = 1; m <= 12; m++) {
                double v = s.monthMean(k, m);
                if (Double.isFinite(v)) { mSum[m - 1] += a * v; mArea[m - 1] += a; }
            }
        }
        List<Integer> active = new ArrayList<>();
        int peakMonth = 0;
        double peakMonthly = Double.NaN;
        for (int m = 1; m <= 12; m++) {
            if (mArea[m - 1] <= 0) continue;
            double v = mSum[m - 1] / mArea[m - 1];
            if (v >= t.minMeanMps()) active.add(m);
            if (peakMonth == 0 || v > peakMonthly) { peakMonthly = v; peakMonth = m; }
        }
        return new UpwellingZone(0, polygonOf(g, cells), area / 1e6, cx / area, cy / area, wm / area, peak,
                peakMonthly, wp / area, peakMonth, active, cells);
    }

    /** Exact union of the cell rectangles (lon/lat degrees), valid. */
    static Geometry polygonOf(LonLatGrid g, int[] sortedCells) {
        int nx = g.nx();
        List<Geometry> runs = new ArrayList<>();
        int p = 0;
        while (p < sortedCells.length) {
            int k = sortedCells[p];
            int j = k / nx, i0 = k % nx, i1 = i0;
            while (p + 1 < sortedCells.length && sortedCells[p + 1] == sortedCells[p] + 1 && sortedCells[p + 1] / nx == j) {
                p++;
                i1++;
            }
            p++;
            // edges from one formula so neighbouring runs share bit-identical coordinates
            double w = g.westDeg() + i0 * g.dLonDeg(), e = g.westDeg() + (i1 + 1) * g.dLonDeg();
            double so = g.southDeg() + j * g.dLatDeg(), no = g.southDeg() + (j + 1) * g.dLatDeg();
            runs.add(box(w, so, e, no));
        }
        Geometry u = UnaryUnionOp.union(runs);
        if (u == null) return GF.createPolygon();
        if (!u.isValid()) u = GeometryFixer.fix(u);
        u.normalize();
        return u;
    }

    private static Polygon box(double w, double s, double e, double n) {
        return GF.createPolygon(new Coordinate[] {
                new Coordinate(w, s), new Coordinate(e, s), new Coordinate(e, n), new Coordinate(w, n), new Coordinate(w, s)});
    }
}
