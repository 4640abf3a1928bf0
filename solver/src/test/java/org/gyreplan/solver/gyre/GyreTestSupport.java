package org.gyreplan.solver.gyre;

import org.gyreplan.solver.PhysicalConstants;
import org.gyreplan.solver.grid.LonLatGrid;
import org.gyreplan.solver.grid.ScalarField;

import java.util.function.DoubleBinaryOperator;

/** Shared set-ups for the gyre tests. */
final class GyreTestSupport {
    private GyreTestSupport() { }

    static final double RADIUS = PhysicalConstants.EARTH_RADIUS_MEAN;

    /**
     * A rectangular β-plane basin (reference latitude 0°, so Δx = R Δλ) of nxo × nyo ocean cells surrounded by one
     * ring of land; the walls (land cell centres) lie at x = 0, x = lengthX, y = 0, y = lengthY.
     */
    static LonLatGrid rectangle(int nxo, int nyo, double lengthX, double lengthY) {
        double dx = lengthX / (nxo + 1), dy = lengthY / (nyo + 1);
        double dLon = Math.toDegrees(dx / RADIUS), dLat = Math.toDegrees(dy / RADIUS);
        int nx = nxo + 2, ny = nyo + 2;
        boolean[] ocean = new boolean[nx * ny];
        for (int j = 1; j <= nyo; j++) for (int i = 1; i <= nxo; i++) ocean[j * nx + i] = true;
        double lat0 = -(ny - 1) / 2.0 * dLat;
        return new LonLatGrid(nx, ny, 0.0, lat0, dLon, dLat, RADIUS, ocean);
    }

    /** x (m from the western wall) of column i of a {@link #rectangle}. */
    static double x(LonLatGrid g, int i) { return i * RADIUS * Math.toRadians(g.dLonDeg()); }
    /** y (m from the southern wall) of row j of a {@link #rectangle}. */
    static double y(LonLatGrid g, int j) { return j * RADIUS * Math.toRadians(g.dLatDeg()); }

    /** A curl field (N m⁻³) given as a function of (x, y) in metres on a {@link #rectangle}; NaN on land. */
    static ScalarField curlXY(LonLatGrid g, DoubleBinaryOperator f) {
        double[] v = new double[g.size()];
        for (int j = 0; j < g.ny(); j++) for (int i = 0; i < g.nx(); i++) {
            int k = g.index(i, j);
            v[k] = g.isOcean(k) ? f.applyAsDouble(x(g, i), y(g, j)) : Double.NaN;
        }
        return new ScalarField(g, v, "wind_stress_curl", "N m-3", "wind-stress curl");
    }

    /** A curl field given as a function of (lonDeg, latDeg); defined on every cell (land too). */
    static ScalarField curlLonLat(LonLatGrid g, DoubleBinaryOperator f) {
        double[] v = new double[g.size()];
        for (int j = 0; j < g.ny(); j++) for (int i = 0; i < g.nx(); i++) v[g.index(i, j)] = f.applyAsDouble(g.lonDeg(i), g.latDeg(j));
        return new ScalarField(g, v, "wind_stress_curl", "N m-3", "wind-stress curl");
    }

    /**
     * Stommel (1948) closed form in the transport formulation r∇²Ψ + βΨ_x = curl τ/ρ with τ_x = −F cos(πy/b)
     * (CHECKS.md §8a): Ψ = −(F b/(ρ r π)) sin(πy/b) (p e^{Ax} + q e^{Bx} − 1), m³ s⁻¹.
     */
    static double stommel(double x, double y, double lam, double b, double F, double r, double beta, double rho) {
        double al = beta / r, k = Math.PI / b;
        double A = -al / 2 + Math.sqrt(al * al / 4 + k * k), B = -al / 2 - Math.sqrt(al * al / 4 + k * k);
        double eB = Math.exp(B * lam);
        double p = (1 - eB) / (Math.exp(A * lam) - eB), q = 1 - p;
        return -(F * b / (rho * r * Math.PI)) * Math.sin(Math.PI * y / b) * (p * Math.exp(A * x) + q * Math.exp(B * x) - 1);
    }
}
