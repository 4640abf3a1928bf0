package org.gyreplan.app.desktop.map;

import org.gyreplan.solver.grid.LonLatGrid;
import org.gyreplan.solver.grid.ScalarField;

import java.util.ArrayList;
import java.util.List;

/**
 * Contour lines of a gridded field by marching squares on the cell-centre lattice (Lorensen &amp; Cline 1987
 * describe the 3-D variant; the 2-D square case table is common practice). Each square of four neighbouring
 * centres contributes 0, 1 or 2 straight segments whose ends are linearly interpolated along the edges.
 * A square with any NaN corner is skipped. The saddle case is resolved with the mean of the four corners.
 */
public final class MarchingSquares {
    private MarchingSquares() { }

    /**
     * Segments of the contour {@code value = level}, each as {lon1, lat1, lon2, lat2} in degrees.
     */
    public static List<double[]> segments(ScalarField field, double level) {
        LonLatGrid g = field.grid();
        double[] v = field.values();
        int nx = g.nx(), ny = g.ny();
        List<double[]> out = new ArrayList<>();
        for (int j = 0; j < ny - 1; j++) {
            for (int i = 0; i < nx - 1; i++) {
                double a = v[g.index(i, j)], b = v[g.index(i + 1, j)];
                double c = v[g.index(i + 1, j + 1)], d = v[g.index(i, j + 1)];
                if (Double.isNaN(a) || Double.isNaN(b) || Double.isNaN(c) || Double.isNaN(d)) continue;
                int code = (a > level ? 1 : 0) | (b > level ? 2 : 0) | (c > level ? 4 : 0) | (d > level ? 8 : 0);
                if (code == 0 || code == 15) continue;
                // edge points: bottom (a-b), right (b-c), top (d-c), left (a-d)
                double x0 = g.lonDeg(i), x1 = g.lonDeg(i + 1), y0 = g.latDeg(j), y1 = g.latDeg(j + 1);
                double[] bottom = {x0 + (x1 - x0) * t(a, b, level), y0};
                double[] right = {x1, y0 + (y1 - y0) * t(b, c, level)};
                double[] top = {x0 + (x1 - x0) * t(d, c, level), y1};
                double[] left = {x0, y0 + (y1 - y0) * t(a, d, level)};
                switch (code) {
                    case 1, 14 -> add(out, left, bottom);
                    case 2, 13 -> add(out, bottom, right);
                    case 3, 12 -> add(out, left, right);
                    case 4, 11 -> add(out, right, top);
                    case 6, 9 -> add(out, bottom, top);
                    case 7, 8 -> add(out, left, top);
                    case 5, 10 -> {
                        boolean centreAbove = (a + b + c + d) / 4 > level;
                        boolean aAbove = code == 5;          // a and c above
                        if (centreAbove == aAbove) { add(out, left, top); add(out, bottom, right); }
                        else { add(out, left, bottom); add(out, right, top); }
                    }
                    default -> { }
                }
            }
        }
        return out;
    }

    /** "Nice" contour levels spanning [lo, hi] with about {@code target} intervals (1, 2, 2.5, 5 × 10ⁿ steps). */
    public static double[] niceLevels(double lo, double hi, int target) {
        if (!(hi > lo) || !Double.isFinite(lo) || !Double.isFinite(hi)) return new double[0];
        double step = niceStep((hi - lo) / Math.max(1, target));
        double first = Math.ceil(lo / step) * step;
        List<Double> lv = new ArrayList<>();
        for (double x = first; x <= hi + 1e-9 * step; x += step) lv.add(Math.abs(x) < 1e-9 * step ? 0.0 : x);
        return lv.stream().mapToDouble(Double::doubleValue).toArray();
    }

    /** The nearest step of the form {1, 2, 2.5, 5} × 10ⁿ at or above {@code raw}. */
    public static double niceStep(double raw) {
        double p = Math.pow(10, Math.floor(Math.log10(raw)));
        for (double m : new double[] {1, 2, 2.5, 5, 10}) if (m * p >= raw * (1 - 1e-12)) return m * p;
        return 10 * p;
    }

    private static double t(double p, double q, double level) {
        return q == p ? 0.5 : (level - p) / (q - p);
    }

    private static void add(List<double[]> out, double[] p, double[] q) {
        out.add(new double[] {p[0], p[1], q[0], q[1]});
    }
}
