package org.gyreplan.solver.atmos;

import org.gyreplan.solver.PhysicalConstants;
import org.gyreplan.solver.ekman.EquatorialCutoff;
import org.gyreplan.solver.grid.LonLatGrid;
import org.gyreplan.solver.grid.ScalarField;
import org.gyreplan.solver.grid.VectorField;
import org.gyreplan.solver.operators.SphericalOperators;
import org.gyreplan.solver.stress.WindVector;

/**
 * Geostrophic wind from the horizontal pressure gradient.
 * <pre>
 *   u_g = −(1/(ρₐ f)) ∂p/∂y,     v_g = (1/(ρₐ f)) ∂p/∂x          (V_g = k × ∇p / (ρₐ f))
 *   |V_g| = |∇p| / (ρₐ |f|)
 * </pre>
 * <table>
 *   <caption>Symbols</caption>
 *   <tr><td>u_g, v_g</td><td>eastward, northward geostrophic wind</td><td>m s⁻¹</td></tr>
 *   <tr><td>∂p/∂x, ∂p/∂y</td><td>eastward and northward pressure gradient</td><td>Pa m⁻¹</td></tr>
 *   <tr><td>ρₐ</td><td>air density</td><td>kg m⁻³</td></tr>
 *   <tr><td>f</td><td>Coriolis parameter 2Ω sin φ</td><td>s⁻¹</td></tr>
 * </table>
 * Sign convention: the wind blows parallel to the isobars with low pressure to its left in the northern hemisphere
 * (right in the southern). Validity: large-scale, unaccelerated, frictionless flow above the boundary layer,
 * straight isobars (see {@link GradientWind} for curvature); undefined inside the equatorial cut-off ({@code NaN}).
 * On a grid the gradient comes from {@link SphericalOperators#gradient} (centred, one-sided next to land or edges).
 * Sources: Holton, An Introduction to Dynamic Meteorology, ch. 3; the vector form as given by common meteorology
 * texts.
 */
public final class GeostrophicWind {
    private GeostrophicWind() {}

    /** Variable names and unit of the geostrophic wind field. */
    public static final String EASTWARD_NAME = "geostrophic_eastward_wind";
    public static final String NORTHWARD_NAME = "geostrophic_northward_wind";
    public static final String UNITS = "m s-1";

    /** Geostrophic wind (m s⁻¹) from the pressure gradient (Pa m⁻¹) at {@code latDeg}; default 5° cut-off. */
    public static WindVector of(double dpdx, double dpdy, double latDeg, PhysicalConstants constants) {
        return of(dpdx, dpdy, latDeg, constants, EquatorialCutoff.DEFAULT);
    }

    /** Geostrophic wind (m s⁻¹); {@code NaN} components inside {@code cutoff}. */
    public static WindVector of(double dpdx, double dpdy, double latDeg, PhysicalConstants constants,
                                EquatorialCutoff cutoff) {
        if (cutoff.applies(latDeg)) return new WindVector(Double.NaN, Double.NaN);
        double rf = constants.rhoAir() * constants.coriolis(latDeg);
        return new WindVector(-dpdy / rf, dpdx / rf);
    }

    /**
     * A geostrophic wind field with the count of cells masked by the cut-off.
     *
     * @param wind        (u_g, v_g), m s⁻¹
     * @param cutoffCells ocean cells inside the equatorial cut-off (set to NaN)
     */
    public record Field(VectorField wind, int cutoffCells) {}

    /**
     * Geostrophic wind field from a sea-level pressure field in Pa.
     *
     * @throws IllegalArgumentException if the pressure field is not in Pa
     */
    public static Field field(ScalarField seaLevelPressure, PhysicalConstants constants, EquatorialCutoff cutoff) {
        if (!"Pa".equals(seaLevelPressure.units().trim())) {
            throw new IllegalArgumentException("sea-level pressure field '" + seaLevelPressure.name()
                    + "': expected units Pa, got '" + seaLevelPressure.units() + "' (convert at the edge)");
        }
        LonLatGrid g = seaLevelPressure.grid();
        int n = g.size(), nx = g.nx();
        double[] px = new double[n];
        double[] py = new double[n];
        SphericalOperators.gradient(g, seaLevelPressure.values(), px, py);
        double[] ug = new double[n];
        double[] vg = new double[n];
        int masked = 0;
        for (int j = 0; j < g.ny(); j++) {
            double lat = g.latDeg(j);
            boolean cut = cutoff.applies(lat);
            double inv = cut ? Double.NaN : 1.0 / (constants.rhoAir() * constants.coriolis(lat));
            for (int k = j * nx; k < (j + 1) * nx; k++) {
                if (cut && g.isOcean(k)) masked++;
                ug[k] = -py[k] * inv;
                vg[k] = px[k] * inv;
            }
        }
        return new Field(new VectorField(
                new ScalarField(g, ug, EASTWARD_NAME, UNITS, "eastward geostrophic wind from sea-level pressure"),
                new ScalarField(g, vg, NORTHWARD_NAME, UNITS, "northward geostrophic wind from sea-level pressure")),
                masked);
    }
}
