package org.gyreplan.solver.ekman;

import org.gyreplan.solver.PhysicalConstants;
import org.gyreplan.solver.grid.LonLatGrid;
import org.gyreplan.solver.grid.ScalarField;
import org.gyreplan.solver.grid.VectorField;
import org.gyreplan.solver.operators.SphericalOperators;

/**
 * Ekman pumping: the vertical velocity at the base of the Ekman layer forced by the divergence of Ekman transport.
 * <pre>
 *   wₑ = (1/ρ₀) curl_z(τ / f) = curl_z τ / (ρ₀ f) + β τₓ / (ρ₀ f²)
 * </pre>
 * <table>
 *   <caption>Symbols</caption>
 *   <tr><td>wₑ</td><td>Ekman pumping velocity, positive upward (upwelling)</td><td>m s⁻¹</td></tr>
 *   <tr><td>curl_z τ</td><td>vertical component of the curl of the surface stress (on the sphere)</td><td>N m⁻³</td></tr>
 *   <tr><td>τₓ</td><td>eastward surface stress</td><td>Pa</td></tr>
 *   <tr><td>ρ₀</td><td>reference sea-water density</td><td>kg m⁻³</td></tr>
 *   <tr><td>f, β</td><td>2Ω sin φ and 2Ω cos φ / R</td><td>s⁻¹, m⁻¹ s⁻¹</td></tr>
 * </table>
 * Sign convention: positive = upward = upwelling; cyclonic stress curl (positive in the northern hemisphere) drives
 * upwelling. Stewart writes the same physics with the opposite sign (his w_E(0) = −curl(T/(ρf)), positive down).
 * Validity: steady Ekman balance, outside the equatorial cut-off; inside it wₑ is {@code NaN} and counted.
 *
 * <p>Discretisation: curl_z τ is taken with {@link SphericalOperators} (centred, one-sided next to land) and f, β
 * at the cell centre, i.e. the split form on the right. The curl stencil never involves f, so only cells whose own
 * latitude lies inside the cut-off are masked; no cell ever divides by f = 0.
 * Sources: Stewart, Introduction to Physical Oceanography, ch. 9 (eq. 9.30) and ch. 12; the β-term split is
 * elementary calculus (∂(1/f)/∂y = −β/f²).
 */
public final class EkmanPumping {
    private EkmanPumping() {}

    /** Variable name of the pumping field. */
    public static final String NAME = "ekman_pumping_velocity";
    /** Long name of the pumping field, with its sign convention. */
    public static final String LONG_NAME = "Ekman pumping velocity at the base of the Ekman layer, positive upward (upwelling)";
    /** Unit of the pumping field. */
    public static final String UNITS = "m s-1";
    /** Variable name of the stress-curl field. */
    public static final String CURL_NAME = "surface_stress_curl";
    /** Long name of the stress-curl field. */
    public static final String CURL_LONG_NAME =
            "vertical component of the curl of the surface stress (positive counter-clockwise seen from above)";
    /** Unit of the stress-curl field. */
    public static final String CURL_UNITS = "N m-3";

    /**
     * Point form: wₑ (m s⁻¹) from the stress curl {@code curlTau} (N m⁻³) and the eastward stress {@code tauX} (Pa)
     * at {@code latDeg}; default 5° cut-off ({@code NaN} inside).
     */
    public static double of(double curlTau, double tauX, double latDeg, PhysicalConstants constants) {
        return of(curlTau, tauX, latDeg, constants, EquatorialCutoff.DEFAULT);
    }

    /** Point form with an explicit cut-off ({@code NaN} inside). */
    public static double of(double curlTau, double tauX, double latDeg, PhysicalConstants constants,
                            EquatorialCutoff cutoff) {
        if (cutoff.applies(latDeg)) return Double.NaN;
        double f = constants.coriolis(latDeg);
        double r0f = constants.rho0() * f;
        return curlTau / r0f + constants.beta(latDeg) * tauX / (r0f * f);
    }

    /**
     * A pumping field with the stress curl it was computed from and the count of masked cells.
     *
     * @param pumping     wₑ, m s⁻¹, positive upward
     * @param stressCurl  curl_z τ, N m⁻³ (defined also inside the cut-off)
     * @param cutoffCells ocean cells inside the equatorial cut-off (wₑ set to NaN)
     */
    public record Field(ScalarField pumping, ScalarField stressCurl, int cutoffCells) {}

    /** Pumping field from a stress field (Pa); land, cells without a curl stencil and cut-off cells are {@code NaN}. */
    public static Field field(VectorField stress, PhysicalConstants constants, EquatorialCutoff cutoff) {
        LonLatGrid g = stress.grid();
        double[] tx = stress.eastward().values();
        double[] curl = new double[g.size()];
        SphericalOperators.curl(g, tx, stress.northward().values(), curl);
        double[] w = new double[g.size()];
        int n = fromCurl(g, curl, tx, constants, cutoff, w);
        return new Field(pumpingField(g, w), curlField(g, curl), n);
    }

    /**
     * The kernel on flat arrays: wₑ from a precomputed stress curl (N m⁻³) and eastward stress (Pa).
     *
     * @return the number of ocean cells inside the cut-off (set to NaN)
     */
    public static int fromCurl(LonLatGrid g, double[] curl, double[] tauX, PhysicalConstants constants,
                               EquatorialCutoff cutoff, double[] w) {
        int nx = g.nx(), ny = g.ny();
        int masked = 0;
        double rho0 = constants.rho0();
        for (int j = 0; j < ny; j++) {
            double lat = g.latDeg(j);
            int row = j * nx;
            if (cutoff.applies(lat)) {
                for (int k = row; k < row + nx; k++) {
                    if (g.isOcean(k)) masked++;
                    w[k] = Double.NaN;
                }
                continue;
            }
            double f = constants.coriolis(lat);
            double a = 1.0 / (rho0 * f);
            double b = constants.beta(lat) / (rho0 * f * f);
            for (int k = row; k < row + nx; k++) {
                w[k] = curl[k] * a + tauX[k] * b;
            }
        }
        return masked;
    }

    /** Wraps a pumping array (m s⁻¹) as a named field. */
    public static ScalarField pumpingField(LonLatGrid g, double[] w) {
        return new ScalarField(g, w, NAME, UNITS, LONG_NAME);
    }

    /** Wraps a stress-curl array (N m⁻³) as a named field. */
    public static ScalarField curlField(LonLatGrid g, double[] curl) {
        return new ScalarField(g, curl, CURL_NAME, CURL_UNITS, CURL_LONG_NAME);
    }
}
