package org.gyreplan.solver.plan.survey;

import org.gyreplan.solver.progress.CancelToken;

import java.util.ArrayList;
import java.util.List;

/**
 * Closed-tour heuristics on a symmetric distance matrix with node 0 as the fixed depot (the port): nearest
 * neighbour, cheapest insertion and farthest insertion constructions, each improved by 2-opt and Or-opt
 * (segments of 1–3, both orientations) until no improving move remains (first improvement, deterministic scan);
 * the shortest result is returned. See Lin (1965), "Computer solutions of the traveling salesman problem", Bell
 * Syst. Tech. J. 44, 2245–2269 (2-opt/3-opt family) and Or (1976, PhD thesis, Northwestern) for Or-opt.
 */
public final class TourImprover {
    /** The method in words. */
    public static final String METHOD = "nearest neighbour / cheapest insertion / farthest insertion, each improved by "
            + "2-opt and Or-opt (segments of 1–3), best kept";
    private static final double EPS = 1e-9;

    private TourImprover() { }

    /** Best tour found, starting with node 0; length = number of nodes. */
    public static int[] bestTour(double[][] d, CancelToken cancel) {
        int n = d.length;
        if (n <= 3) {
            int[] t = new int[n];
            for (int i = 0; i < n; i++) t[i] = i;
            return t;
        }
        int[][] starts = {nearestNeighbour(d), insertion(d, false), insertion(d, true)};
        int[] best = null;
        double bestLen = Double.POSITIVE_INFINITY;
        for (int[] s : starts) {
            cancel.check();
            int[] t = improve(s, d, cancel);
            double len = length(t, d);
            if (len < bestLen - EPS) { bestLen = len; best = t; }
        }
        return best;
    }

    /** Closed tour length. */
    public static double length(int[] t, double[][] d) {
        double s = 0;
        for (int q = 0; q < t.length; q++) s += d[t[q]][t[(q + 1) % t.length]];
        return s;
    }

    static int[] nearestNeighbour(double[][] d) {
        int n = d.length;
        boolean[] used = new boolean[n];
        int[] t = new int[n];
        used[0] = true;
        for (int q = 1; q < n; q++) {
            int last = t[q - 1], best = -1;
            for (int j = 1; j < n; j++) if (!used[j] && (best < 0 || d[last][j] < d[last][best])) best = j;
            t[q] = best;
            used[best] = true;
        }
        return t;
    }

    /** Cheapest (farthest=false) or farthest (farthest=true) insertion starting from the depot. */
    static int[] insertion(double[][] d, boolean farthest) {
        int n = d.length;
        List<Integer> tour = new ArrayList<>();
        tour.add(0);
        boolean[] in = new boolean[n];
        in[0] = true;
        double[] near = new double[n];   // distance to the tour
        for (int j = 0; j < n; j++) near[j] = d[0][j];
        for (int step = 1; step < n; step++) {
            int pick = -1;
            double bestCost = Double.POSITIVE_INFINITY;
            int bestPos = -1;
            if (farthest) {
                for (int j = 1; j < n; j++) if (!in[j] && (pick < 0 || near[j] > near[pick])) pick = j;
                for (int p = 0; p < tour.size(); p++) {
                    int a = tour.get(p), b = tour.get((p + 1) % tour.size());
                    double c = d[a][pick] + d[pick][b] - d[a][b];
                    if (c < bestCost - EPS) { bestCost = c; bestPos = p; }
                }
            } else {
                for (int j = 1; j < n; j++) {
                    if (in[j]) continue;
                    for (int p = 0; p < tour.size(); p++) {
                        int a = tour.get(p), b = tour.get((p + 1) % tour.size());
                        double c = d[a][j] + d[j][b] - d[a][b];
                        if (c < bestCost - EPS) { bestCost = c; bestPos = p; pick = j; }
                    }
                }
            }
            tour.add(bestPos + 1, pick);
            in[pick] = true;
            for (int j = 0; j < n; j++) near[j] = Math.min(near[j], d[pick][j]);
        }
        int[] t = new int[n];
        for (int q = 0; q < n; q++) t[q] = tour.get(q);
        return t;
    }

    /** 2-opt + Or-opt until no improvement; node 0 stays first. */
    static int[] improve(int[] start, double[][] d, CancelToken cancel) {
        int[] t = start.clone();
        int n = t.length;
        boolean improved = true;
        while (improved) {
            cancel.check();
            improved = false;
            // 2-opt: reverse t[i..j], 1 ≤ i < j ≤ n−1 (closed tour, t[n] ≡ t[0])
            for (int i = 1; i < n - 1 && !improved; i++) {
                for (int j = i + 1; j < n && !improved; j++) {
                    int a = t[i - 1], b = t[i], c = t[j], e = t[(j + 1) % n];
                    double delta = d[a][c] + d[b][e] - d[a][b] - d[c][e];
                    if (delta < -EPS) { reverse(t, i, j); improved = true; }
                }
            }
            if (improved) continue;
            // Or-opt: move segment t[i..i+len-1] between t[p] and t[p+1], optionally reversed
            for (int len = 1; len <= 3 && !improved; len++) {
                for (int i = 1; i + len - 1 <= n - 1 && !improved; i++) {
                    int first = t[i], last = t[i + len - 1];
                    int before = t[i - 1], after = t[(i + len) % n];
                    double removeGain = d[before][first] + d[last][after] - d[before][after];
                    for (int p = 0; p < n && !improved; p++) {
                        if (p >= i - 1 && p <= i + len - 1) continue;
                        int x = t[p], y = t[(p + 1) % n];
                        double fwd = d[x][first] + d[last][y] - d[x][y];
                        double rev = d[x][last] + d[first][y] - d[x][y];
                        if (fwd - removeGain < -EPS) { t = moveSegment(t, i, len, p, false); improved = true; }
                        else if (rev - removeGain < -EPS) { t = moveSegment(t, i, len, p, true); improved = true; }
                    }
                }
            }
        }
        return t;
    }

    private static void reverse(int[] t, int i, int j) {
        while (i < j) { int s = t[i]; t[i] = t[j]; t[j] = s; i++; j--; }
    }

    /** Removes t[i..i+len-1] and inserts it after the element that was at position p. */
    private static int[] moveSegment(int[] t, int i, int len, int p, boolean reversed) {
        int n = t.length;
        List<Integer> seg = new ArrayList<>();
        for (int q = 0; q < len; q++) seg.add(t[i + q]);
        if (reversed) java.util.Collections.reverse(seg);
        int anchor = t[p];
        List<Integer> rest = new ArrayList<>();
        for (int q = 0; q < n; q++) if (q < i || q >= i + len) rest.add(t[q]);
        int at = rest.indexOf(anchor);
        rest.addAll(at + 1, seg);
        int[] out = new int[n];
        for (int q = 0; q < n; q++) out[q] = rest.get(q);
        // keep the depot first
        int z = 0;
        while (out[z] != 0) z++;
        int[] rot = new int[n];
        for (int q = 0; q < n; q++) rot[q] = out[(z + q) % n];
        return rot;
    }
}
