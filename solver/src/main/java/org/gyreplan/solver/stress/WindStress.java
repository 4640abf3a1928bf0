package org.gyreplan.solver.stress;

import org.gyreplan.solver.PhysicalConstants;
import org.gyreplan.solver.grid.LonLatGrid;
import org.gyreplan.solver.grid.ScalarField;
import org.gyreplan.solver.grid.VectorField;

import java.util.Locale;
import java.util.Set;

/**
 * Bulk wind stress at the sea surface.
 * <pre>
 *   τ = ρₐ C_D(|U|) |U| U          (τₓ = ρₐ C_D |U| u,  τᵧ = ρₐ C_D |U| v)
 * </pre>
 * <table>
 *   <caption>Symbols</caption>
 *   <tr><td>τ = (τₓ, τᵧ)</td><td>surface stress, eastward and northward</td><td>Pa (N m⁻²)</td></tr>
 *   <tr><td>U = (u, v)</td><td>wind at 10 m, eastward and northward</td><td>m s⁻¹</td></tr>
 *   <tr><td>ρₐ</td><td>air density</td><td>kg m⁻³</td></tr>
 *   <tr><td>C_D</td><td>neutral 10 m drag coefficient of the chosen {@link DragLaw}</td><td>1</td></tr>
 * </table>
 * Sign convention: the stress points along the wind (toward where the air moves). A calm gives zero stress.
 * Validity: neutral stability, the drag law's speed range (cells outside it are counted, not rejected);
 * the wind must be relative to the surface current where that matters (not corrected here).
 * Source: bulk aerodynamic formula, e.g. Stewart, Introduction to Physical Oceanography, eq. 4.2; Large &amp; Pond (1981).
 *
 * <p>Land ({@code NaN} wind or a land cell of the grid mask) stays {@code NaN}.
 */
public final class WindStress {
    private WindStress() {}

    /** CF standard name of the eastward stress component. */
    public static final String EASTWARD_NAME = "surface_downward_eastward_stress";
    /** CF standard name of the northward stress component. */
    public static final String NORTHWARD_NAME = "surface_downward_northward_stress";
    /** Unit of stress (UDUNITS). */
    public static final String UNITS = "Pa";

    private static final Set<String> WIND_UNITS = Set.of("m s-1", "m/s", "m s^-1", "m.s-1", "m s**-1", "m sec-1");

    /**
     * A stress field with the number of ocean cells whose wind speed was outside the drag law's validity range.
     *
     * @param stress             τ (Pa), named surface_downward_eastward_stress / surface_downward_northward_stress
     * @param outOfRangeCells    ocean cells with a finite wind outside [validMin, validMax] of the law
     * @param dragLaw            the law used
     */
    public record Result(VectorField stress, int outOfRangeCells, DragLaw dragLaw) {}

    /** Stress (Pa) of a wind (u, v) in m s⁻¹ with air density {@code rhoAir} (kg m⁻³). */
    public static StressVector of(double u, double v, DragLaw law, double rhoAir) {
        double speed = Math.sqrt(u * u + v * v);
        double k = rhoAir * law.dragCoefficient(speed) * speed;
        return new StressVector(k * u, k * v);
    }

    /** Stress (Pa) of {@code wind} using the air density of {@code constants}. */
    public static StressVector of(WindVector wind, DragLaw law, PhysicalConstants constants) {
        return of(wind.eastward(), wind.northward(), law, constants.rhoAir());
    }

    /**
     * Stress field (Pa) from a 10 m wind field (m s⁻¹).
     *
     * @throws IllegalArgumentException if the wind's units are not a spelling of m s⁻¹
     */
    public static Result field(VectorField wind10m, DragLaw law, double rhoAir) {
        requireWindUnits(wind10m);
        LonLatGrid grid = wind10m.grid();
        double[] tx = new double[grid.size()];
        double[] ty = new double[grid.size()];
        int out = compute(grid, wind10m.eastward().values(), wind10m.northward().values(), law, rhoAir, tx, ty);
        return new Result(stressField(grid, tx, ty), out, law);
    }

    /**
     * The stress kernel on flat arrays: fills {@code tauX}, {@code tauY} (Pa) from {@code u}, {@code v} (m s⁻¹);
     * {@code NaN} where the grid has land or a wind component is not finite.
     *
     * @return the number of ocean cells with finite wind outside the law's validity range
     */
    public static int compute(LonLatGrid grid, double[] u, double[] v, DragLaw law, double rhoAir,
                              double[] tauX, double[] tauY) {
        int n = grid.size();
        int out = 0;
        for (int k = 0; k < n; k++) {
            double uk = u[k], vk = v[k];
            if (!grid.isOcean(k) || !Double.isFinite(uk) || !Double.isFinite(vk)) {
                tauX[k] = Double.NaN;
                tauY[k] = Double.NaN;
                continue;
            }
            double speed = Math.sqrt(uk * uk + vk * vk);
            if (!law.inValidRange(speed)) out++;
            double f = rhoAir * law.dragCoefficient(speed) * speed;
            tauX[k] = f * uk;
            tauY[k] = f * vk;
        }
        return out;
    }

    /** Wraps stress arrays (Pa) as a vector field with the CF names. */
    public static VectorField stressField(LonLatGrid grid, double[] tauX, double[] tauY) {
        return new VectorField(
                new ScalarField(grid, tauX, EASTWARD_NAME, UNITS, "surface downward eastward stress (along the wind)"),
                new ScalarField(grid, tauY, NORTHWARD_NAME, UNITS, "surface downward northward stress (along the wind)"));
    }

    /**
     * Checks that a wind field is in m s⁻¹ (accepted spellings: m s-1, m/s, m s^-1, m.s-1, m s**-1, m sec-1).
     *
     * @throws IllegalArgumentException naming the field and the unit found
     */
    public static void requireWindUnits(VectorField wind) {
        String units = wind.units().trim().toLowerCase(Locale.ROOT);
        if (!WIND_UNITS.contains(units)) {
            throw new IllegalArgumentException("wind field '" + wind.eastward().name() + "': expected units m s-1, got '"
                    + wind.units() + "' (convert at the edge)");
        }
    }
}
