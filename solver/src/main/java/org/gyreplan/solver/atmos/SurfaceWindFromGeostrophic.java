package org.gyreplan.solver.atmos;

import org.gyreplan.solver.DegreeTrig;
import org.gyreplan.solver.grid.LonLatGrid;
import org.gyreplan.solver.grid.ScalarField;
import org.gyreplan.solver.grid.VectorField;
import org.gyreplan.solver.stress.WindVector;

/**
 * Empirical surface (10 m) wind over the sea from the geostrophic wind: reduced in speed and turned toward low
 * pressure by friction in the boundary layer.
 * <pre>
 *   (u, v) = a · R(s θ) (u_g, v_g),    R(α) = [[cos α, −sin α], [sin α, cos α]],   s = sign(φ)
 * </pre>
 * <table>
 *   <caption>Symbols</caption>
 *   <tr><td>u, v</td><td>surface wind, eastward and northward</td><td>m s⁻¹</td></tr>
 *   <tr><td>u_g, v_g</td><td>geostrophic wind</td><td>m s⁻¹</td></tr>
 *   <tr><td>a</td><td>reduction factor, default 0.7</td><td>1</td></tr>
 *   <tr><td>θ</td><td>turning angle, default 15°</td><td>degrees</td></tr>
 *   <tr><td>φ</td><td>latitude</td><td>degrees</td></tr>
 * </table>
 * Sign convention: the wind is turned toward LOW pressure — counter-clockwise (α = +θ) in the northern hemisphere,
 * clockwise (α = −θ) in the southern. At the equator (s = 0) no turning is applied (the geostrophic wind is
 * undefined there anyway). Validity: open sea, neutral to moderately stable boundary layers; the factors vary with
 * stability, so both are configurable and reported.
 * Source: the 0.7 / 15° pair of Bakun (1973), NOAA Tech. Rep. NMFS SSRF-671, "Coastal upwelling indices, west
 * coast of North America, 1946–71" — <b>from memory</b>; a turning of about 15–20° over water is general
 * meteorology (common practice).
 *
 * @param reductionFactor a, dimensionless, in (0, 1.5]
 * @param turningAngleDeg θ, degrees, in [0, 90)
 */
public record SurfaceWindFromGeostrophic(double reductionFactor, double turningAngleDeg) {

    /** Reduction 0.7 and turning 15° (Bakun 1973, from memory). */
    public static final SurfaceWindFromGeostrophic DEFAULT = new SurfaceWindFromGeostrophic(0.7, 15.0);

    public SurfaceWindFromGeostrophic {
        if (!(reductionFactor > 0 && reductionFactor <= 1.5)) {
            throw new IllegalArgumentException("surface-wind reduction factor must be in (0, 1.5], got " + reductionFactor);
        }
        if (!(turningAngleDeg >= 0 && turningAngleDeg < 90)) {
            throw new IllegalArgumentException("surface-wind turning angle must be in [0, 90) degrees, got " + turningAngleDeg);
        }
    }

    /** Surface wind (m s⁻¹) from geostrophic components (m s⁻¹) at {@code latDeg}. */
    public WindVector apply(double ug, double vg, double latDeg) {
        double alpha = Math.signum(latDeg) * turningAngleDeg;
        double c = DegreeTrig.cosDeg(alpha), s = DegreeTrig.sinDeg(alpha);
        return new WindVector(reductionFactor * (c * ug - s * vg), reductionFactor * (s * ug + c * vg));
    }

    /** Surface wind (m s⁻¹) from a geostrophic wind vector at {@code latDeg}. */
    public WindVector apply(WindVector geostrophic, double latDeg) {
        return apply(geostrophic.eastward(), geostrophic.northward(), latDeg);
    }

    /** Surface wind field (CF names {@code eastward_wind}/{@code northward_wind}, m s⁻¹) from a geostrophic wind field. */
    public VectorField apply(VectorField geostrophic) {
        LonLatGrid g = geostrophic.grid();
        double[] ug = geostrophic.eastward().values(), vg = geostrophic.northward().values();
        double[] u = new double[g.size()], v = new double[g.size()];
        int nx = g.nx();
        for (int j = 0; j < g.ny(); j++) {
            double alpha = Math.signum(g.latDeg(j)) * turningAngleDeg;
            double c = reductionFactor * DegreeTrig.cosDeg(alpha), s = reductionFactor * DegreeTrig.sinDeg(alpha);
            for (int k = j * nx; k < (j + 1) * nx; k++) {
                u[k] = c * ug[k] - s * vg[k];
                v[k] = s * ug[k] + c * vg[k];
            }
        }
        String how = " (geostrophic wind × " + reductionFactor + ", turned " + turningAngleDeg + "° toward low pressure)";
        return new VectorField(new ScalarField(g, u, "eastward_wind", "m s-1", "eastward surface wind" + how),
                new ScalarField(g, v, "northward_wind", "m s-1", "northward surface wind" + how));
    }
}
