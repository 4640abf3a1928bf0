package org.gyreplan.solver.upwelling;

import org.gyreplan.solver.PhysicalConstants;
import org.gyreplan.solver.atmos.GeostrophicWind;
import org.gyreplan.solver.atmos.GradientWind;
import org.gyreplan.solver.atmos.SurfaceWindFromGeostrophic;
import org.gyreplan.solver.operators.SphericalOperators;
import org.gyreplan.solver.stress.ConstantDrag;
import org.gyreplan.solver.stress.StressVector;
import org.gyreplan.solver.stress.WindStress;
import org.gyreplan.solver.stress.WindVector;
import org.gyreplan.solver.coast.CoastPoint;
import org.gyreplan.solver.grid.LonLatGrid;
import org.gyreplan.solver.grid.ScalarField;
import org.gyreplan.solver.grid.TimeAxis;
import org.gyreplan.solver.grid.VectorField;
import org.gyreplan.solver.progress.CancelToken;
import org.gyreplan.solver.progress.ProgressListener;
import org.gyreplan.solver.series.TimeSeries;

import java.util.List;
import java.util.Objects;
import java.util.Set;
import java.util.function.IntFunction;

/**
 * Coastal upwelling index from sea-level pressure, the classic way: geostrophic wind from the pressure gradient,
 * reduced and turned toward low pressure to a surface wind, a constant-drag stress, then the cross-shore Ekman
 * transport of {@link CoastalUpwellingIndex}.
 *
 * <pre>
 *   u_g = −(1/(ρₐ f)) ∂p/∂y,   v_g = (1/(ρₐ f)) ∂p/∂x                         geostrophic wind
 *   (optional) V = V_g · V_gr/V_g with the gradient-wind speed for isobar curvature radius r
 *   θ' = +θ (f &gt; 0) or −θ (f &lt; 0)                                          toward low pressure
 *   u = a (u_g cos θ' − v_g sin θ'),   v = a (u_g sin θ' + v_g cos θ')         surface wind
 *   τ = ρₐ C_D |W| (u, v)
 *   UI = 100 m · (τᵧ/(ρ₀ f), −τₓ/(ρ₀ f)) · n̂_offshore                        m³ s⁻¹ per 100 m
 * </pre>
 * <table>
 *   <caption>Symbols</caption>
 *   <tr><td>p</td><td>sea-level pressure</td><td>Pa</td></tr>
 *   <tr><td>ρₐ</td><td>air density (default 1.22)</td><td>kg m⁻³</td></tr>
 *   <tr><td>a, θ, C_D</td><td>reduction, turning, drag ({@link PressureWindMethod})</td><td>—, degrees, —</td></tr>
 *   <tr><td>r</td><td>isobar curvature radius, positive cyclonic</td><td>m</td></tr>
 * </table>
 * <p><b>Sign</b>: the index is positive offshore (upwelling). The turning is toward low pressure in both
 * hemispheres (counter-clockwise in the north, clockwise in the south).
 * <p><b>Validity</b>: geostrophy fails near the equator; within the equatorial cut-off the result is NaN, flagged.
 * The gradient-wind correction has no anticyclonic solution when V_g &gt; |f||r|/4 (flagged
 * {@link IndexFlag#GRADIENT_WIND_INVALID}). The constant drag and the fixed turning are an empirical
 * approximation; C_D = 0.0026 is meant for monthly-mean pressure, 0.0013 for synoptic (6-hourly) fields.
 * <p>The steps are those of {@link GeostrophicWind}, {@link GradientWind}, {@link SurfaceWindFromGeostrophic} and
 * {@link WindStress} with a {@link ConstantDrag}; this class chains them with the coast geometry.
 * <p><b>Field form</b>: ∇p from {@link SphericalOperators#gradient} (centred, one-sided next to missing values,
 * periodic in longitude on global grids); for the curvature correction the isobar's geodesic curvature is
 * κ = (H_xx p_y² − 2 H_xy p_x p_y + H_yy p_x²)/|∇p|³, r = 1/κ, with the covariant Hessian on the sphere
 * H_xx = ∂ₓ(p_x) − (tan φ/R) p_y, H_yy = ∂ᵧ(p_y), H_xy = ½[∂ᵧ(p_x) + ∂ₓ(p_y) + (tan φ/R) p_x], the derivatives of the
 * gradient components again by {@link SphericalOperators#gradient}; where κ is undefined the isobars are taken
 * as straight. The stress
 * field is then sampled at the points as configured in the {@link CoastalUpwellingIndex}.
 * <p><b>Source</b>: Bakun (1973), "Coastal upwelling indices, west coast of North America, 1946–71", NOAA Tech.
 * Rep. NMFS SSRF-671 (method and parameters from memory); geostrophic and gradient wind: Holton, An Introduction
 * to Dynamic Meteorology, ch. 3.
 */
public final class SeaLevelPressureIndex {
    private static final Set<String> PRESSURE_UNITS = Set.of("Pa", "pascal", "Pascal", "pascals");
    private final PressureWindMethod method;
    private final CoastalUpwellingIndex index;

    public SeaLevelPressureIndex(PressureWindMethod method, CoastalUpwellingIndex index) {
        this.method = Objects.requireNonNull(method, "method");
        this.index = Objects.requireNonNull(index, "index");
    }

    /** The classic 6-hourly parameter set with default constants and index options. */
    public static SeaLevelPressureIndex classic() {
        return new SeaLevelPressureIndex(PressureWindMethod.CLASSIC, CoastalUpwellingIndex.defaults());
    }

    public PressureWindMethod method() { return method; }
    public CoastalUpwellingIndex index() { return index; }
    private PhysicalConstants constants() { return index.constants(); }

    /**
     * The index from the pressure gradient at a point (straight isobars).
     *
     * @param dpdxPaPerM eastward pressure gradient ∂p/∂x, Pa m⁻¹
     * @param dpdyPaPerM northward pressure gradient ∂p/∂y, Pa m⁻¹
     * @param latDeg     latitude, degrees
     * @param offshoreBearingDeg offshore normal bearing, degrees clockwise from north
     * @return index, m³ s⁻¹ per 100 m (NaN within the equatorial cut-off)
     */
    public double fromGradient(double dpdxPaPerM, double dpdyPaPerM, double latDeg, double offshoreBearingDeg) {
        return fromGradient(CoastPoint.of("point", 0.0, latDeg, offshoreBearingDeg), dpdxPaPerM, dpdyPaPerM,
                Double.POSITIVE_INFINITY).indexM3PerSPer100m();
    }

    /**
     * All steps at a coast point from the pressure gradient (Pa m⁻¹) and the signed isobar curvature radius
     * (m, positive cyclonic; infinity for straight isobars, used only if the method asks for the correction).
     */
    public PressureIndexPoint fromGradient(CoastPoint p, double dpdxPaPerM, double dpdyPaPerM, double curvatureRadiusM) {
        return fromGradient(p, dpdxPaPerM, dpdyPaPerM, curvatureRadiusM, 0.0);
    }

    private PressureIndexPoint fromGradient(CoastPoint p, double px, double py, double r, double distanceKm) {
        double[] w = surfaceWind(px, py, p.latDeg(), r);
        if (w == null) {
            PointIndex pi = new PointIndex(p, Double.NaN, Double.NaN, Double.NaN, Double.NaN, Double.NaN, distanceKm,
                    index.withinCutoff(p.latDeg()) ? IndexFlag.EQUATORIAL_CUTOFF
                            : !Double.isFinite(px) || !Double.isFinite(py) ? IndexFlag.NO_DATA
                            : IndexFlag.GRADIENT_WIND_INVALID);
            return new PressureIndexPoint(Double.NaN, Double.NaN, Double.NaN, Double.NaN, pi);
        }
        double[] tau = stress(w[2], w[3]);
        PointIndex pi = index.fromStress(p, tau[0], tau[1]);
        if (distanceKm != 0) {
            pi = new PointIndex(pi.point(), pi.indexM3PerSPer100m(), pi.tauEastwardPa(), pi.tauNorthwardPa(),
                    pi.ekmanEastwardM2PerS(), pi.ekmanNorthwardM2PerS(), distanceKm, pi.flag());
        }
        return new PressureIndexPoint(w[0], w[1], w[2], w[3], pi);
    }

    /** {u_g, v_g, u, v} in m s⁻¹, or null where undefined (cut-off, missing gradient, invalid gradient wind). */
    private double[] surfaceWind(double px, double py, double latDeg, double r) {
        if (index.withinCutoff(latDeg) || !Double.isFinite(px) || !Double.isFinite(py)) return null;
        PhysicalConstants c = constants();
        WindVector g = GeostrophicWind.of(px, py, latDeg, c, index.cutoff());
        double ug = g.eastward(), vg = g.northward();
        if (method.gradientWindCorrection() && Double.isFinite(r) && r != 0) {
            double vgs = Math.hypot(ug, vg);
            GradientWind gw = r > 0 ? GradientWind.aroundLow(vgs, r, latDeg, c, index.cutoff())
                    : GradientWind.aroundHigh(vgs, -r, latDeg, c, index.cutoff());
            if (!gw.hasSolution()) return null;
            if (vgs > 0) { ug *= gw.speed() / vgs; vg *= gw.speed() / vgs; }
        }
        WindVector w = new SurfaceWindFromGeostrophic(method.reduction(), method.turningDeg()).apply(ug, vg, latDeg);
        return new double[] {ug, vg, w.eastward(), w.northward()};
    }

    private double[] stress(double u, double v) {
        StressVector t = WindStress.of(u, v, new ConstantDrag(method.dragCoefficient()), constants().rhoAir());
        return new double[] {t.eastwardPa(), t.northwardPa()};
    }

    /**
     * Signed radius of curvature of the isobar, m: positive when the isobar curves around lower pressure
     * (cyclonic), negative around higher pressure, infinite for straight isobars or when undefined.
     * <pre>  κ = (H_xx p_y² − 2 H_xy p_x p_y + H_yy p_x²) / |∇p|³,   r = 1/κ</pre>
     * with (p_x, p_y) the gradient and H the Hessian of the pressure (Pa m⁻²) in local east/north coordinates.
     */
    static double curvatureRadius(double px, double py, double pxx, double pyy, double pxy) {
        double g2 = px * px + py * py;
        if (!(g2 > 0) || !Double.isFinite(pxx) || !Double.isFinite(pyy) || !Double.isFinite(pxy)) {
            return Double.POSITIVE_INFINITY;
        }
        double k = (pxx * py * py - 2 * pxy * px * py + pyy * px * px) / Math.pow(g2, 1.5);
        return k == 0 ? Double.POSITIVE_INFINITY : 1.0 / k;
    }

    private static void checkPressure(ScalarField slp) {
        if (!PRESSURE_UNITS.contains(slp.units().trim())) {
            throw new IllegalArgumentException("sea-level pressure field '" + slp.name() + "' has units '"
                    + slp.units() + "'; expected Pa (convert hPa/mbar ×100 on reading)");
        }
    }

    /** Surface wind field (m s⁻¹) from a sea-level pressure field (Pa); NaN where undefined. */
    public VectorField surfaceWind(ScalarField slpPa) {
        return windOrStress(slpPa, false);
    }

    /** Surface stress field (Pa) from a sea-level pressure field (Pa); NaN where undefined. */
    public VectorField stress(ScalarField slpPa) {
        return windOrStress(slpPa, true);
    }

    private VectorField windOrStress(ScalarField slp, boolean asStress) {
        checkPressure(slp);
        LonLatGrid g = slp.grid();
        double[] p = slp.values();
        int n = g.size();
        double[] px = new double[n], py = new double[n];
        SphericalOperators.gradient(g, p, px, py);
        double[] pxx = null, pxy = null, pyx = null, pyy = null;
        if (method.gradientWindCorrection()) {
            pxx = new double[n]; pxy = new double[n]; pyx = new double[n]; pyy = new double[n];
            SphericalOperators.gradient(g, px, pxx, pxy);
            SphericalOperators.gradient(g, py, pyx, pyy);
        }
        double[] ue = new double[n], vn = new double[n];
        for (int j = 0; j < g.ny(); j++) {
            for (int i = 0; i < g.nx(); i++) {
                int k = g.index(i, j);
                double r = Double.POSITIVE_INFINITY;
                if (pxx != null) {
                    double t = Math.tan(Math.toRadians(g.latDeg(j))) / g.radius();
                    r = curvatureRadius(px[k], py[k], pxx[k] - t * py[k], pyy[k],
                            0.5 * (pxy[k] + pyx[k] + t * px[k]));
                }
                double[] w = Double.isFinite(p[k]) ? surfaceWind(px[k], py[k], g.latDeg(j), r) : null;
                if (w == null) { ue[k] = Double.NaN; vn[k] = Double.NaN; continue; }
                if (asStress) {
                    double[] t = stress(w[2], w[3]);
                    ue[k] = t[0]; vn[k] = t[1];
                } else {
                    ue[k] = w[2]; vn[k] = w[3];
                }
            }
        }
        String units = asStress ? "Pa" : "m s-1";
        String what = asStress ? "surface stress from sea-level pressure" : "surface wind from sea-level pressure";
        return new VectorField(
                new ScalarField(g, ue, asStress ? "tau_east" : "u_surface", units, "eastward " + what + " (toward)"),
                new ScalarField(g, vn, asStress ? "tau_north" : "v_surface", units, "northward " + what + " (toward)"));
    }

    /** The index at each point from one sea-level pressure field (Pa), via the stress field. */
    public List<PointIndex> atPoints(ScalarField slpPa, List<CoastPoint> points) {
        return index.atPoints(stress(slpPa), points);
    }

    /** Index series at the points from a series of sea-level pressure fields (Pa). */
    public List<TimeSeries> series(TimeAxis times, IntFunction<ScalarField> slpAt, List<CoastPoint> points,
                                   ProgressListener progress, CancelToken cancel) {
        return index.series(times, k -> stress(slpAt.apply(k)), points, progress, cancel);
    }
}
