package org.gyreplan.solver.gyre;

import org.gyreplan.solver.PhysicalConstants;
import org.gyreplan.solver.grid.LonLatGrid;
import org.gyreplan.solver.grid.ScalarField;

/**
 * Sverdrup balance: the interior, frictionless depth-integrated meridional transport and its streamfunction.
 *
 * <pre>
 *   β V = curl_z τ / ρ₀                     V: northward transport per unit width, m² s⁻¹
 *   ψ_S(x) = −∫_x^{x_E} V dx'               ψ_S = 0 on the eastern coast of each zonal ocean segment; V = ∂ψ/∂x
 * </pre>
 *
 * <table>
 *   <caption>Symbols</caption>
 *   <tr><td>curl_z τ</td><td>wind-stress curl</td><td>N m⁻³</td></tr>
 *   <tr><td>ρ₀</td><td>reference density</td><td>kg m⁻³</td></tr>
 *   <tr><td>β</td><td>2Ω cos φ / R (sphere) or the β-plane value</td><td>m⁻¹ s⁻¹</td></tr>
 *   <tr><td>ψ_S</td><td>Sverdrup streamfunction</td><td>m³ s⁻¹ (Sv = 10⁶ m³ s⁻¹ in fields)</td></tr>
 * </table>
 *
 * Sign: positive curl gives northward interior flow in both hemispheres (β &gt; 0 everywhere). Valid away from the
 * western boundary layer, for steady, linear, flat-bottom flow; undefined at the poles (β = 0). Source: Sverdrup
 * (1947), "Wind-driven currents in a baroclinic ocean", PNAS 33, 318–326 (form as in Stewart, Introduction to Physical
 * Oceanography, eq. 11.6). Integration: trapezoidal rule along each row between cell centres, Δx of the row (sphere)
 * or of the β-plane; the eastern coast is the centre of the first land cell east of the segment, where V is taken
 * equal to its value in the last ocean cell.
 */
public final class Sverdrup {
    private Sverdrup() { }

    /** Northward Sverdrup transport per unit width V = curl τ/(ρ₀ β), m² s⁻¹. */
    public static double northwardTransport(double curlTau, double rho0, double beta) {
        return curlTau / (rho0 * beta);
    }

    /**
     * Sverdrup streamfunction, m³ s⁻¹, on cells where {@code mask} is true (NaN elsewhere). Each zonal run of masked
     * cells is integrated westward from its eastern end.
     *
     * @param forcing curl τ / ρ₀ per cell, m s⁻² (flat grid array)
     */
    static double[] streamfunction(LonLatGrid grid, boolean[] mask, double[] forcing, Geometry geom, PhysicalConstants pc) {
        int nx = grid.nx(), ny = grid.ny();
        double[] psi = new double[nx * ny];
        java.util.Arrays.fill(psi, Double.NaN);
        for (int j = 0; j < ny; j++) {
            double beta = geom.beta(grid, j, pc);
            double dx = geom.dx(grid, j);
            int i = nx - 1;
            while (i >= 0) {
                if (!mask[j * nx + i]) { i--; continue; }
                // eastern end of a segment at i
                double vEast = forcing[j * nx + i] / beta;
                double acc = 0, vPrev = vEast;
                while (i >= 0 && mask[j * nx + i]) {
                    double v = forcing[j * nx + i] / beta;
                    acc -= dx * (v + vPrev) / 2;
                    psi[j * nx + i] = acc;
                    vPrev = v;
                    i--;
                }
            }
        }
        return psi;
    }

    /**
     * Sverdrup streamfunction in Sv from a wind-stress curl field (N m⁻³), integrated westward from the eastern coast
     * of every zonal ocean segment of the grid's mask.
     */
    public static ScalarField streamfunction(ScalarField curl, Geometry geom, PhysicalConstants pc) {
        LonLatGrid g = curl.grid();
        double[] f = new double[g.size()];
        boolean[] mask = g.oceanMask();
        for (int k = 0; k < f.length; k++) {
            f[k] = curl.values()[k] / pc.rho0();
            if (mask[k] && !Double.isFinite(f[k])) throw new GyreException(GyreException.Reason.BAD_FORCING,
                    "field '" + curl.name() + "' is undefined at ocean cell (" + (k % g.nx()) + "," + (k / g.nx()) + ")");
        }
        double[] psi = streamfunction(g, mask, f, geom, pc);
        for (int k = 0; k < psi.length; k++) psi[k] *= 1e-6;
        return new ScalarField(g, psi, "sverdrup_streamfunction", "Sv",
                "Sverdrup streamfunction; northward transport = d(psi)/dx, zero on the eastern coast of each row");
    }

    /**
     * Sverdrup streamfunction in Sv from the wind stress (Pa): the curl is taken with the grid metrics of
     * {@code geom} (centred differences, one-sided next to missing values), then integrated westward from the eastern
     * coast of every zonal ocean segment of the grid's mask. Needs no friction parameter (interior balance only).
     */
    public static ScalarField streamfunction(org.gyreplan.solver.grid.VectorField stress, Geometry geom, PhysicalConstants pc) {
        LonLatGrid g = stress.grid();
        if (!"Pa".equals(stress.units()) && !"N m-2".equals(stress.units())) {
            throw new GyreException(GyreException.Reason.BAD_FORCING,
                    "wind stress: expected units 'Pa' (N m-2), got '" + stress.units() + "'");
        }
        double[] c = GyreSolver.curlOf(g, stress, geom);
        ScalarField curl = new ScalarField(g, c, "wind_stress_curl", "N m-3", "curl of the wind stress '" + stress.eastward().name() + "'");
        return streamfunction(curl, geom, pc);
    }
}
