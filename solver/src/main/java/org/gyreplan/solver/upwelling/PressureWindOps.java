package org.gyreplan.solver.upwelling;

import org.gyreplan.solver.DegreeTrig;
import org.gyreplan.solver.grid.LonLatGrid;

/**
 * Pressure derivatives on the sphere and the gradient-wind speed ratio, used by {@link SeaLevelPressureIndex}.
 * Centred differences with the grid metrics (dx = R cos φ Δλ, dy = R Δφ); one-sided next to missing values;
 * periodic in longitude when the grid spans 360°.
 */
final class PressureWindOps {
    private PressureWindOps() {}

    /** Whether the grid wraps around the globe in longitude. */
    static boolean periodic(LonLatGrid g) {
        return Math.abs(g.nx() * g.dLonDeg() - 360.0) < 1e-6 * 360.0;
    }

    private static double at(double[] p, LonLatGrid g, int i, int j, boolean periodic) {
        if (j < 0 || j >= g.ny()) return Double.NaN;
        if (i < 0 || i >= g.nx()) {
            if (!periodic) return Double.NaN;
            i = Math.floorMod(i, g.nx());
        }
        return p[g.index(i, j)];
    }

    /** First derivative along one axis: centred if both neighbours are finite, else one-sided, else NaN. */
    private static double diff(double pm, double p0, double pp, double h) {
        if (Double.isFinite(pm) && Double.isFinite(pp)) return (pp - pm) / (2 * h);
        if (!Double.isFinite(p0)) return Double.NaN;
        if (Double.isFinite(pp)) return (pp - p0) / h;
        if (Double.isFinite(pm)) return (p0 - pm) / h;
        return Double.NaN;
    }

    /**
     * Derivatives {∂p/∂x, ∂p/∂y, ∂²p/∂x², ∂²p/∂y², ∂²p/∂x∂y} at cell (i, j), Pa m⁻¹ and Pa m⁻²; second derivatives NaN
     * unless all eight neighbours are finite.
     */
    static double[] derivatives(double[] p, LonLatGrid g, int i, int j) {
        boolean per = periodic(g);
        double dx = g.dx(j), dy = g.dy();
        double c = at(p, g, i, j, per);
        double w = at(p, g, i - 1, j, per), e = at(p, g, i + 1, j, per);
        double s = at(p, g, i, j - 1, per), n = at(p, g, i, j + 1, per);
        double px = diff(w, c, e, dx), py = diff(s, c, n, dy);
        double pxx = Double.NaN, pyy = Double.NaN, pxy = Double.NaN;
        double sw = at(p, g, i - 1, j - 1, per), se = at(p, g, i + 1, j - 1, per);
        double nw = at(p, g, i - 1, j + 1, per), ne = at(p, g, i + 1, j + 1, per);
        if (Double.isFinite(c) && Double.isFinite(w) && Double.isFinite(e) && Double.isFinite(s) && Double.isFinite(n)
                && Double.isFinite(sw) && Double.isFinite(se) && Double.isFinite(nw) && Double.isFinite(ne)) {
            pxx = (e - 2 * c + w) / (dx * dx);
            pyy = (n - 2 * c + s) / (dy * dy);
            pxy = (ne - nw - se + sw) / (4 * dx * dy);
        }
        return new double[] {px, py, pxx, pyy, pxy};
    }

    /**
     * Signed radius of curvature of the isobar, m: positive when the isobar curves around lower pressure
     * (cyclonic), negative around higher pressure, infinite for straight isobars or when undefined.
     * <pre>  κ = (p_xx p_y² − 2 p_xy p_x p_y + p_yy p_x²) / |∇p|³,   r = 1/κ</pre>
     */
    static double curvatureRadius(double px, double py, double pxx, double pyy, double pxy) {
        double g2 = px * px + py * py;
        if (!(g2 > 0) || !Double.isFinite(pxx)) return Double.POSITIVE_INFINITY;
        double k = (pxx * py * py - 2 * pxy * px * py + pyy * px * px) / Math.pow(g2, 1.5);
        return k == 0 ? Double.POSITIVE_INFINITY : 1.0 / k;
    }

    /**
     * Gradient-wind speed for geostrophic speed vg (m s⁻¹), |f| (s⁻¹) and signed curvature radius r (m, positive
     * cyclonic); NaN when an anticyclonic solution does not exist (vg &gt; |f||r|/4). Holton, An Introduction to
     * Dynamic Meteorology, ch. 3 (regular roots).
     */
    static double gradientSpeed(double vg, double absF, double r) {
        if (Double.isInfinite(r) || vg == 0) return vg;
        double fr = absF * Math.abs(r);
        if (r > 0) return fr / 2 * (-1 + Math.sqrt(1 + 4 * vg / fr));
        double d = 1 - 4 * vg / fr;
        return d < 0 ? Double.NaN : fr / 2 * (1 - Math.sqrt(d));
    }

    static double sinDeg(double d) { return DegreeTrig.sinDeg(d); }
    static double cosDeg(double d) { return DegreeTrig.cosDeg(d); }
}
