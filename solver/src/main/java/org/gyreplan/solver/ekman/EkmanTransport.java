package org.gyreplan.solver.ekman;

import org.gyreplan.solver.PhysicalConstants;
import org.gyreplan.solver.grid.LonLatGrid;
import org.gyreplan.solver.grid.ScalarField;
import org.gyreplan.solver.grid.VectorField;

/**
 * Ekman volume transport per unit width, integrated over the Ekman layer.
 * <pre>
 *   Uₑ =  τᵧ / (ρ₀ f)
 *   Vₑ = −τₓ / (ρ₀ f)
 * </pre>
 * <table>
 *   <caption>Symbols</caption>
 *   <tr><td>Uₑ, Vₑ</td><td>eastward, northward transport per unit width</td><td>m² s⁻¹</td></tr>
 *   <tr><td>τₓ, τᵧ</td><td>surface stress, eastward and northward</td><td>Pa</td></tr>
 *   <tr><td>ρ₀</td><td>reference sea-water density</td><td>kg m⁻³</td></tr>
 *   <tr><td>f</td><td>Coriolis parameter 2Ω sin φ</td><td>s⁻¹</td></tr>
 * </table>
 * Sign convention: 90° to the right of the stress in the northern hemisphere (f &gt; 0), to the left in the southern.
 * Multiply by 100 m for m³ s⁻¹ per 100 m of coastline. Validity: steady state, outside the equatorial cut-off
 * (inside it the transport is {@code NaN}); independent of the eddy viscosity.
 * Source: Ekman (1905); Stewart, Introduction to Physical Oceanography, eq. 9.26.
 *
 * @param eastward  Uₑ, m² s⁻¹ ({@code NaN} inside the cut-off or on land)
 * @param northward Vₑ, m² s⁻¹
 */
public record EkmanTransport(double eastward, double northward) {

    /** Variable names and unit of the transport fields. */
    public static final String EASTWARD_NAME = "eastward_ekman_transport";
    public static final String NORTHWARD_NAME = "northward_ekman_transport";
    public static final String UNITS = "m2 s-1";

    /** Magnitude |τ|/(ρ₀|f|), m² s⁻¹. */
    public double magnitude() { return Math.hypot(eastward, northward); }

    /** Whether the transport is defined (outside the cut-off, finite stress). */
    public boolean isDefined() { return !Double.isNaN(eastward) && !Double.isNaN(northward); }

    /** Transport for stress (τₓ, τᵧ) in Pa at latitude {@code latDeg} with the default 5° cut-off. */
    public static EkmanTransport of(double tauX, double tauY, double latDeg, PhysicalConstants constants) {
        return of(tauX, tauY, latDeg, constants, EquatorialCutoff.DEFAULT);
    }

    /** Transport for stress (τₓ, τᵧ) in Pa at latitude {@code latDeg}; {@code NaN} inside {@code cutoff}. */
    public static EkmanTransport of(double tauX, double tauY, double latDeg, PhysicalConstants constants,
                                    EquatorialCutoff cutoff) {
        if (cutoff.applies(latDeg)) return new EkmanTransport(Double.NaN, Double.NaN);
        double rf = constants.rho0() * constants.coriolis(latDeg);
        return new EkmanTransport(tauY / rf, -tauX / rf);
    }

    /**
     * A transport field with the count of ocean cells masked by the cut-off.
     *
     * @param transport   (Uₑ, Vₑ), m² s⁻¹
     * @param cutoffCells ocean cells inside the equatorial cut-off (set to NaN)
     */
    public record Field(VectorField transport, int cutoffCells) {}

    /** Transport field from a stress field (Pa); land and cut-off cells are {@code NaN}. */
    public static Field field(VectorField stress, PhysicalConstants constants, EquatorialCutoff cutoff) {
        LonLatGrid g = stress.grid();
        double[] ue = new double[g.size()];
        double[] ve = new double[g.size()];
        int n = compute(g, stress.eastward().values(), stress.northward().values(), constants, cutoff, ue, ve);
        return new Field(field(g, ue, ve), n);
    }

    /**
     * The kernel on flat arrays: fills {@code ue}, {@code ve} (m² s⁻¹) from {@code tauX}, {@code tauY} (Pa).
     *
     * @return the number of ocean cells inside the cut-off
     */
    public static int compute(LonLatGrid g, double[] tauX, double[] tauY, PhysicalConstants constants,
                              EquatorialCutoff cutoff, double[] ue, double[] ve) {
        int nx = g.nx(), ny = g.ny();
        int masked = 0;
        for (int j = 0; j < ny; j++) {
            double lat = g.latDeg(j);
            boolean cut = cutoff.applies(lat);
            double inv = cut ? Double.NaN : 1.0 / (constants.rho0() * constants.coriolis(lat));
            for (int i = 0; i < nx; i++) {
                int k = j * nx + i;
                if (!g.isOcean(k)) { ue[k] = Double.NaN; ve[k] = Double.NaN; continue; }
                if (cut) masked++;
                ue[k] = tauY[k] * inv;
                ve[k] = -tauX[k] * inv;
            }
        }
        return masked;
    }

    /** Wraps transport arrays (m² s⁻¹) as a named vector field. */
    public static VectorField field(LonLatGrid g, double[] ue, double[] ve) {
        return new VectorField(
                new ScalarField(g, ue, EASTWARD_NAME, UNITS,
                        "eastward Ekman volume transport per unit width (right of the stress in the northern hemisphere)"),
                new ScalarField(g, ve, NORTHWARD_NAME, UNITS,
                        "northward Ekman volume transport per unit width (right of the stress in the northern hemisphere)"));
    }
}
