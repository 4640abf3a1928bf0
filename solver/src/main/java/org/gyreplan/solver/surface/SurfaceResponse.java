package org.gyreplan.solver.surface;

import org.gyreplan.solver.PhysicalConstants;
import org.gyreplan.solver.ekman.EkmanPumping;
import org.gyreplan.solver.ekman.EkmanTransport;
import org.gyreplan.solver.ekman.EquatorialCutoff;
import org.gyreplan.solver.grid.LonLatGrid;
import org.gyreplan.solver.grid.ScalarField;
import org.gyreplan.solver.grid.VectorField;
import org.gyreplan.solver.operators.SphericalOperators;
import org.gyreplan.solver.stress.DragLaw;
import org.gyreplan.solver.stress.WindStress;

import java.util.Objects;

/**
 * The wind-driven surface response of one time step.
 * <pre>
 *   τ  = ρₐ C_D(|U|) |U| U                                   (WindStress; skipped when a stress field is given)
 *   c  = curl_z τ                                            (SphericalOperators, on the sphere)
 *   Uₑ = τᵧ/(ρ₀ f),   Vₑ = −τₓ/(ρ₀ f)                        (EkmanTransport)
 *   wₑ = c/(ρ₀ f) + β τₓ/(ρ₀ f²)  = curl_z(τ/f)/ρ₀           (EkmanPumping, positive upward)
 * </pre>
 * <table>
 *   <caption>Symbols</caption>
 *   <tr><td>U</td><td>10 m wind</td><td>m s⁻¹</td></tr>
 *   <tr><td>τ</td><td>surface stress</td><td>Pa</td></tr>
 *   <tr><td>c</td><td>stress curl</td><td>N m⁻³</td></tr>
 *   <tr><td>Uₑ, Vₑ</td><td>Ekman transport per unit width</td><td>m² s⁻¹</td></tr>
 *   <tr><td>wₑ</td><td>Ekman pumping</td><td>m s⁻¹</td></tr>
 *   <tr><td>ρₐ, ρ₀, f, β</td><td>from {@link PhysicalConstants}</td><td>kg m⁻³, kg m⁻³, s⁻¹, m⁻¹ s⁻¹</td></tr>
 * </table>
 * Sign conventions: stress along the wind; transport right of the stress in the northern hemisphere; pumping
 * positive upward (upwelling); curl positive counter-clockwise seen from above. Validity: as for each step's class;
 * inside the equatorial cut-off transport and pumping are {@code NaN} and counted; wind speeds outside the drag law's
 * range are counted. Sources: see {@link WindStress}, {@link EkmanTransport}, {@link EkmanPumping}.
 *
 * <p>Performance: two passes over flat arrays (stress; then per row curl, transport and pumping), per-row factors,
 * the count of cut-off cells and the prepared curl operator ({@link SphericalOperators#on}) computed once per grid
 * object, no boxing. Output arrays are new per step, or reused with {@link #fromWind(VectorField, Step)}. An
 * instance may be reused for every time step and by several threads.
 */
public final class SurfaceResponse {
    private final DragLaw dragLaw;
    private final PhysicalConstants constants;
    private final EquatorialCutoff cutoff;
    private volatile RowFactors rows;

    /**
     * One time step's results.
     *
     * @param stress              τ, Pa (CF names {@code surface_downward_eastward_stress}/{@code _northward_stress})
     * @param stressCurl          curl_z τ, N m⁻³
     * @param ekmanTransport      (Uₑ, Vₑ), m² s⁻¹
     * @param ekmanPumping        wₑ, m s⁻¹, positive upward ({@code ekman_pumping_velocity})
     * @param cutoffCells         ocean cells inside the equatorial cut-off (transport and pumping NaN)
     * @param dragOutOfRangeCells ocean cells whose wind speed was outside the drag law's validity range
     *                            (0 when the step started from stress)
     */
    public record Step(VectorField stress, ScalarField stressCurl, VectorField ekmanTransport, ScalarField ekmanPumping,
                       int cutoffCells, int dragOutOfRangeCells) {}

    /**
     * @param dragLaw   drag law used for wind input (may be {@code null} if only {@link #fromStress} is used)
     * @param constants ρₐ, ρ₀, Ω, R
     * @param cutoff    equatorial cut-off
     */
    public SurfaceResponse(DragLaw dragLaw, PhysicalConstants constants, EquatorialCutoff cutoff) {
        this.dragLaw = dragLaw;
        this.constants = Objects.requireNonNull(constants, "constants");
        this.cutoff = Objects.requireNonNull(cutoff, "cutoff");
    }

    /** One-shot form: {@code SurfaceResponse.ofWind(wind, law, constants, cutoff)}. */
    public static Step ofWind(VectorField wind10m, DragLaw dragLaw, PhysicalConstants constants, EquatorialCutoff cutoff) {
        return new SurfaceResponse(dragLaw, constants, cutoff).fromWind(wind10m);
    }

    /** One-shot form from a stress field in Pa. */
    public static Step ofStress(VectorField stressPa, PhysicalConstants constants, EquatorialCutoff cutoff) {
        return new SurfaceResponse(null, constants, cutoff).fromStress(stressPa);
    }

    /** The response to a 10 m wind field (m s⁻¹); every call allocates its six output arrays. */
    public Step fromWind(VectorField wind10m) {
        return fromWind(wind10m, null);
    }

    /**
     * The response to a 10 m wind field (m s⁻¹), writing into the arrays of {@code reuse} when it is a previous
     * result on the same grid object (otherwise new arrays are allocated, as {@link #fromWind(VectorField)}).
     * The fields of {@code reuse} are overwritten and the returned step shares them, so keep nothing from the
     * previous step that is still needed; the wind arrays must not be among them.
     * Usage in a time loop: {@code Step s = null; for (...) { s = response.fromWind(wind, s); use(s); }}
     *
     * @param reuse a step returned earlier by this class, or {@code null}
     */
    public Step fromWind(VectorField wind10m, Step reuse) {
        if (dragLaw == null) throw new IllegalStateException("no drag law given: cannot turn wind into stress");
        LonLatGrid g = wind10m.grid();
        WindStress.requireWindUnits(wind10m);
        Step into = reusable(reuse, g);
        double[] tx = into != null ? into.stress().eastward().values() : new double[g.size()];
        double[] ty = into != null ? into.stress().northward().values() : new double[g.size()];
        int out = WindStress.compute(g, wind10m.eastward().values(), wind10m.northward().values(), dragLaw,
                constants.rhoAir(), tx, ty);
        return respond(g, tx, ty, out, into);
    }

    /** The response to a surface stress field (Pa). */
    public Step fromStress(VectorField stressPa) {
        return fromStress(stressPa, null);
    }

    /**
     * The response to a surface stress field (Pa), reusing the arrays of {@code reuse} as in
     * {@link #fromWind(VectorField, Step)}.
     */
    public Step fromStress(VectorField stressPa, Step reuse) {
        String units = stressPa.units().trim();
        if (!(units.equals("Pa") || units.equals("N m-2") || units.equals("N/m2") || units.equals("N m**-2"))) {
            throw new IllegalArgumentException("stress field '" + stressPa.eastward().name()
                    + "': expected units Pa (N m-2), got '" + stressPa.units() + "'");
        }
        LonLatGrid g = stressPa.grid();
        int n = g.size();
        Step into = reusable(reuse, g);
        double[] tx = into != null ? into.stress().eastward().values() : new double[n];
        double[] ty = into != null ? into.stress().northward().values() : new double[n];
        double[] sx = stressPa.eastward().values(), sy = stressPa.northward().values();
        for (int k = 0; k < n; k++) {
            double a = sx[k], b = sy[k];
            boolean ok = g.isOcean(k) && Double.isFinite(a) && Double.isFinite(b);
            tx[k] = ok ? a : Double.NaN;
            ty[k] = ok ? b : Double.NaN;
        }
        return respond(g, tx, ty, 0, into);
    }

    private static Step reusable(Step reuse, LonLatGrid g) {
        return reuse != null && reuse.stress().grid() == g && reuse.stressCurl().grid() == g
                && reuse.ekmanTransport().grid() == g && reuse.ekmanPumping().grid() == g ? reuse : null;
    }

    /** Curl, transport and pumping in one pass over the rows (each row's curl is used while still in cache). */
    private Step respond(LonLatGrid g, double[] tx, double[] ty, int dragOut, Step into) {
        int n = g.size(), nx = g.nx(), ny = g.ny();
        RowFactors r = rowFactors(g);
        double[] curl, ue, ve, w;
        if (into != null) {
            curl = into.stressCurl().values();
            ue = into.ekmanTransport().eastward().values();
            ve = into.ekmanTransport().northward().values();
            w = into.ekmanPumping().values();
        } else {
            curl = new double[n];
            ue = new double[n];
            ve = new double[n];
            w = new double[n];
        }
        SphericalOperators.OnGrid ops = r.ops;
        for (int j = 0; j < ny; j++) {
            ops.curlRow(tx, ty, curl, j);
            double a = r.invRho0F[j], b = r.betaOverRho0F2[j];
            int row = j * nx;
            for (int k = row; k < row + nx; k++) {
                double x = tx[k];
                ue[k] = ty[k] * a;
                ve[k] = -x * a;
                w[k] = curl[k] * a + x * b;
            }
        }
        if (into != null) {
            return new Step(into.stress(), into.stressCurl(), into.ekmanTransport(), into.ekmanPumping(),
                    r.cutoffOceanCells, dragOut);
        }
        return new Step(WindStress.stressField(g, tx, ty), EkmanPumping.curlField(g, curl),
                EkmanTransport.field(g, ue, ve), EkmanPumping.pumpingField(g, w), r.cutoffOceanCells, dragOut);
    }

    private RowFactors rowFactors(LonLatGrid g) {
        RowFactors r = rows;
        if (r == null || r.grid != g) {
            r = new RowFactors(g, constants, cutoff);
            rows = r;
        }
        return r;
    }

    /**
     * Per grid object (its mask included): 1/(ρ₀ f) and β/(ρ₀ f²) per row (NaN inside the cut-off), the number of
     * ocean cells inside the cut-off, and the prepared curl operator. Immutable once built.
     */
    private static final class RowFactors {
        final LonLatGrid grid;
        final double[] invRho0F;
        final double[] betaOverRho0F2;
        final boolean[] cut;
        final int cutoffOceanCells;
        final SphericalOperators.OnGrid ops;

        RowFactors(LonLatGrid g, PhysicalConstants c, EquatorialCutoff cutoff) {
            grid = g;
            int ny = g.ny();
            invRho0F = new double[ny];
            betaOverRho0F2 = new double[ny];
            cut = new boolean[ny];
            for (int j = 0; j < ny; j++) {
                double lat = g.latDeg(j);
                cut[j] = cutoff.applies(lat);
                if (cut[j]) {
                    invRho0F[j] = Double.NaN;
                    betaOverRho0F2[j] = Double.NaN;
                } else {
                    double f = c.coriolis(lat);
                    invRho0F[j] = 1.0 / (c.rho0() * f);
                    betaOverRho0F2[j] = c.beta(lat) / (c.rho0() * f * f);
                }
            }
            int masked = 0;
            for (int j = 0; j < ny; j++) {
                if (!cut[j]) continue;
                for (int k = j * g.nx(), end = k + g.nx(); k < end; k++) if (g.isOcean(k)) masked++;
            }
            cutoffOceanCells = masked;
            ops = SphericalOperators.on(g);
        }
    }
}
