package org.gyreplan.app.render;

import org.gyreplan.solver.grid.LonLatGrid;
import org.gyreplan.solver.grid.ScalarField;

import java.util.ArrayList;
import java.util.List;

/** Contour line segments of a gridded field by marching squares over cell centres (display only). */
public final class Contours {
    private Contours() {}

    /** Segments {lon1, lat1, lon2, lat2} where the field crosses {@code level}; squares with a NaN corner are skipped. */
    public static List<double[]> segments(ScalarField f, double level) {
        LonLatGrid g = f.grid();
        double[] v = f.values();
        List<double[]> out = new ArrayList<>();
        for (int j = 0; j < g.ny() - 1; j++) {
            for (int i = 0; i < g.nx() - 1; i++) {
                double a = v[g.index(i, j)], b = v[g.index(i + 1, j)], c = v[g.index(i + 1, j + 1)], d = v[g.index(i, j + 1)];
                if (!(Double.isFinite(a) && Double.isFinite(b) && Double.isFinite(c) && Double.isFinite(d))) continue;
                double x0 = g.lonDeg(i), x1 = g.lonDeg(i + 1), y0 = g.latDeg(j), y1 = g.latDeg(j + 1);
                List<double[]> pts = new ArrayList<>(4);
                edge(pts, a, b, level, x0, y0, x1, y0);
                edge(pts, b, c, level, x1, y0, x1, y1);
                edge(pts, c, d, level, x1, y1, x0, y1);
                edge(pts, d, a, level, x0, y1, x0, y0);
                if (pts.size() == 2) {
                    out.add(new double[] {pts.get(0)[0], pts.get(0)[1], pts.get(1)[0], pts.get(1)[1]});
                } else if (pts.size() == 4) {
                    double centre = 0.25 * (a + b + c + d);
                    // saddle: pair the crossings so that the centre value decides the topology
                    if ((centre > level) == (a > level)) {
                        out.add(new double[] {pts.get(0)[0], pts.get(0)[1], pts.get(3)[0], pts.get(3)[1]});
                        out.add(new double[] {pts.get(1)[0], pts.get(1)[1], pts.get(2)[0], pts.get(2)[1]});
                    } else {
                        out.add(new double[] {pts.get(0)[0], pts.get(0)[1], pts.get(1)[0], pts.get(1)[1]});
                        out.add(new double[] {pts.get(2)[0], pts.get(2)[1], pts.get(3)[0], pts.get(3)[1]});
                    }
                }
            }
        }
        return out;
    }

    private static void edge(List<double[]> pts, double p, double q, double level, double xa, double ya, double xb, double yb) {
        if ((p > level) == (q > level)) return;
        double t = (level - p) / (q - p);
        pts.add(new double[] {xa + t * (xb - xa), ya + t * (yb - ya)});
    }

    /** About {@code n} round levels spanning the field's range, excluding the extremes. */
    public static double[] niceLevels(ScalarField f, int n) {
        double[] r = f.range();
        if (!Double.isFinite(r[0]) || r[1] <= r[0]) return new double[0];
        double raw = (r[1] - r[0]) / n;
        double mag = Math.pow(10, Math.floor(Math.log10(raw)));
        double step = raw / mag < 1.5 ? mag : raw / mag < 3.5 ? 2 * mag : raw / mag < 7.5 ? 5 * mag : 10 * mag;
        List<Double> lv = new ArrayList<>();
        for (double v = Math.ceil(r[0] / step) * step; v < r[1]; v += step) if (v > r[0]) lv.add(Math.abs(v) < 1e-12 ? 0 : v);
        return lv.stream().mapToDouble(Double::doubleValue).toArray();
    }
}
