package org.gyreplan.solver.upwelling;

import org.gyreplan.solver.PhysicalConstants;
import org.gyreplan.solver.coast.CoastPoint;
import org.gyreplan.solver.ekman.EkmanTransport;
import org.gyreplan.solver.ekman.EquatorialCutoff;
import org.gyreplan.solver.grid.TimeAxis;
import org.gyreplan.solver.grid.VectorField;
import org.gyreplan.solver.progress.CancelToken;
import org.gyreplan.solver.progress.ProgressListener;
import org.gyreplan.solver.series.TimeSeries;

import java.util.ArrayList;
import java.util.List;
import java.util.Objects;
import java.util.Set;
import java.util.concurrent.ConcurrentHashMap;
import java.util.function.IntFunction;

/**
 * Coastal upwelling index: the cross-shore component of the Ekman transport at a coast point, positive offshore.
 *
 * <pre>
 *   Qₓ = τᵧ / (ρ₀ f),   Qᵧ = −τₓ / (ρ₀ f)                 (Ekman transport per unit width, m² s⁻¹)
 *   UI = 100 m · (Qₓ sin θₙ + Qᵧ cos θₙ)                   (m³ s⁻¹ per 100 m of coastline)
 *   f  = 2Ω sin φ
 * </pre>
 * <table>
 *   <caption>Symbols</caption>
 *   <tr><td>τₓ, τᵧ</td><td>eastward, northward surface stress on the ocean</td><td>Pa</td></tr>
 *   <tr><td>ρ₀</td><td>sea-water density (default 1025)</td><td>kg m⁻³</td></tr>
 *   <tr><td>f</td><td>Coriolis parameter at the coast point's latitude φ</td><td>s⁻¹</td></tr>
 *   <tr><td>θₙ</td><td>offshore bearing of the coast point (unit normal into the ocean)</td><td>degrees from north</td></tr>
 *   <tr><td>UI</td><td>index</td><td>m³ s⁻¹ per 100 m of coastline</td></tr>
 * </table>
 * <p><b>Sign</b>: UI &gt; 0 is offshore transport (upwelling-favourable), UI &lt; 0 onshore (downwelling). The
 * transport lies to the right of the stress in the northern hemisphere and to the left in the southern one; this
 * follows from the sign of f, with no hemisphere switch. An equatorward alongshore wind on an eastern-boundary
 * coast gives UI &gt; 0 in both hemispheres.
 * <p><b>Validity</b>: steady Ekman balance, so the index is a daily or longer average; undefined near the equator:
 * within the cut-off ({@link EquatorialCutoff}, default 5°) it is NaN and flagged
 * {@link IndexFlag#EQUATORIAL_CUTOFF}. The latitude used for f is the coast point's, not the wind cell's.
 * <p><b>Sampling</b> of stress fields: {@link StressSampling#NEAREST_OCEAN} (default: the nearest ocean cell with finite
 * stress) or {@link StressSampling#BILINEAR}; the distance from the point to the cell used is reported.
 * <p>The transport itself is {@link EkmanTransport#of}; this class adds the coast geometry and the sampling.
 * <p><b>Source</b>: Ekman transport, Ekman (1905) as written by Stewart, Introduction to Physical Oceanography,
 * eq. 9.26; the index as offshore Ekman transport per 100 m of coastline, Bakun (1973), NOAA Tech. Rep. NMFS
 * SSRF-671 (definition and unit from memory).
 */
public final class CoastalUpwellingIndex {
    /** Length of coastline the index refers to, m. */
    public static final double COAST_LENGTH_M = 100.0;
    private static final Set<String> STRESS_UNITS = Set.of("Pa", "N m-2", "N/m2", "N m**-2", "N/m^2", "N.m-2", "N m^-2");

    private final PhysicalConstants constants;
    private final EquatorialCutoff cutoff;
    private final StressSampling sampling;
    private final double maxDataDistanceKm;
    /** Nearest-cell samplers by grid geometry and position (they do not depend on masks or values). */
    private final ConcurrentHashMap<SamplerKey, FieldSampler> samplers = new ConcurrentHashMap<>();
    private static final int MAX_CACHED_SAMPLERS = 4096;

    private record SamplerKey(int nx, int ny, double lon0, double lat0, double dLon, double dLat, double radius,
                              double lonDeg, double latDeg, StressSampling mode) { }

    /**
     * @param constants           ρ₀ and Ω are used
     * @param cutoff              equatorial cut-off: inside it the index is NaN, flagged
     * @param sampling            how stress fields are sampled at points
     * @param maxDataDistanceKm   points farther than this from the cell used get NaN, flagged
     *                            {@link IndexFlag#TOO_FAR_FROM_DATA} (km; infinity = no limit)
     */
    public CoastalUpwellingIndex(PhysicalConstants constants, EquatorialCutoff cutoff, StressSampling sampling,
                                 double maxDataDistanceKm) {
        this.constants = Objects.requireNonNull(constants, "constants");
        this.cutoff = Objects.requireNonNull(cutoff, "cutoff");
        this.sampling = Objects.requireNonNull(sampling, "sampling");
        if (!(maxDataDistanceKm > 0)) {
            throw new IllegalArgumentException("maximum data distance must be positive km, got " + maxDataDistanceKm);
        }
        this.maxDataDistanceKm = maxDataDistanceKm;
    }

    /** Default constants, 5° cut-off, nearest-ocean sampling, no distance limit. */
    public static CoastalUpwellingIndex defaults() {
        return new CoastalUpwellingIndex(PhysicalConstants.DEFAULT, EquatorialCutoff.DEFAULT,
                StressSampling.NEAREST_OCEAN, Double.POSITIVE_INFINITY);
    }

    public CoastalUpwellingIndex withConstants(PhysicalConstants c) {
        return new CoastalUpwellingIndex(c, cutoff, sampling, maxDataDistanceKm);
    }
    public CoastalUpwellingIndex withCutoff(EquatorialCutoff c) {
        return new CoastalUpwellingIndex(constants, c, sampling, maxDataDistanceKm);
    }
    public CoastalUpwellingIndex withSampling(StressSampling s) {
        return new CoastalUpwellingIndex(constants, cutoff, s, maxDataDistanceKm);
    }
    public CoastalUpwellingIndex withMaxDataDistanceKm(double km) {
        return new CoastalUpwellingIndex(constants, cutoff, sampling, km);
    }

    public PhysicalConstants constants() { return constants; }
    public EquatorialCutoff cutoff() { return cutoff; }
    public StressSampling sampling() { return sampling; }
    public double maxDataDistanceKm() { return maxDataDistanceKm; }

    /** Whether the latitude lies within the equatorial cut-off. */
    public boolean withinCutoff(double latDeg) { return cutoff.applies(latDeg); }

    /**
     * The index from a stress vector at a latitude and offshore bearing, m³ s⁻¹ per 100 m; NaN within the cut-off.
     *
     * @param tauEastwardPa      τₓ, Pa
     * @param tauNorthwardPa     τᵧ, Pa
     * @param latDeg             latitude of the coast point, degrees
     * @param offshoreBearingDeg bearing of the offshore normal, degrees clockwise from north
     */
    public double fromStress(double tauEastwardPa, double tauNorthwardPa, double latDeg, double offshoreBearingDeg) {
        return fromStress(CoastPoint.of("point", 0.0, latDeg, offshoreBearingDeg), tauEastwardPa, tauNorthwardPa)
                .indexM3PerSPer100m();
    }

    /** The index at a coast point from a stress vector given there (distance to data 0). */
    public PointIndex fromStress(CoastPoint p, double tauEastwardPa, double tauNorthwardPa) {
        return compute(p, tauEastwardPa, tauNorthwardPa, 0.0);
    }

    private PointIndex compute(CoastPoint p, double tx, double ty, double distanceKm) {
        if (withinCutoff(p.latDeg())) {
            return new PointIndex(p, Double.NaN, tx, ty, Double.NaN, Double.NaN, distanceKm, IndexFlag.EQUATORIAL_CUTOFF);
        }
        if (!Double.isFinite(tx) || !Double.isFinite(ty)) {
            return new PointIndex(p, Double.NaN, tx, ty, Double.NaN, Double.NaN, distanceKm, IndexFlag.NO_DATA);
        }
        if (distanceKm > maxDataDistanceKm) {
            return new PointIndex(p, Double.NaN, tx, ty, Double.NaN, Double.NaN, distanceKm, IndexFlag.TOO_FAR_FROM_DATA);
        }
        EkmanTransport q = EkmanTransport.of(tx, ty, p.latDeg(), constants, cutoff);
        double qx = q.eastward(), qy = q.northward();
        double ui = COAST_LENGTH_M * (qx * p.offshoreEastward() + qy * p.offshoreNorthward());
        return new PointIndex(p, ui, tx, ty, qx, qy, distanceKm, IndexFlag.OK);
    }

    private static void checkStressUnits(VectorField stress) {
        if (!STRESS_UNITS.contains(stress.units().trim())) {
            throw new IllegalArgumentException("stress field '" + stress.eastward().name() + "' has units '"
                    + stress.units() + "'; expected a surface stress in Pa (N m-2)");
        }
    }

    /** The index at each point from one stress field (Pa), sampled as configured. */
    public List<PointIndex> atPoints(VectorField stressPa, List<CoastPoint> points) {
        checkStressUnits(stressPa);
        List<PointIndex> out = new ArrayList<>(points.size());
        for (CoastPoint p : points) out.add(sampleAndCompute(sampler(stressPa.grid(), p), p, stressPa));
        return out;
    }

    private FieldSampler sampler(org.gyreplan.solver.grid.LonLatGrid g, CoastPoint p) {
        SamplerKey key = new SamplerKey(g.nx(), g.ny(), g.lon0Deg(), g.lat0Deg(), g.dLonDeg(), g.dLatDeg(), g.radius(),
                p.lonDeg(), p.latDeg(), sampling);
        if (samplers.size() > MAX_CACHED_SAMPLERS) samplers.clear();
        return samplers.computeIfAbsent(key, k -> new FieldSampler(g, p.lonDeg(), p.latDeg(), sampling));
    }

    private PointIndex sampleAndCompute(FieldSampler s, CoastPoint p, VectorField stress) {
        if (withinCutoff(p.latDeg())) return compute(p, Double.NaN, Double.NaN, Double.NaN);
        FieldSampler.Sample v = s.sample(stress.eastward(), stress.northward());
        return compute(p, v.a(), v.b(), v.distanceKm());
    }

    /**
     * Index time series at each point from a series of stress fields (Pa) on one grid geometry.
     *
     * @param times    time of each field
     * @param stressAt supplies the stress field of time step k (called once per step, in order)
     * @param points   coast points
     * @return one series per point (name = point name, unit {@code "m3 s-1 (100 m)-1"}), NaN where undefined
     */
    public List<TimeSeries> series(TimeAxis times, IntFunction<VectorField> stressAt, List<CoastPoint> points,
                                   ProgressListener progress, CancelToken cancel) {
        int nt = times.size();
        double[][] v = new double[points.size()][nt];
        FieldSampler[] samplers = null;
        VectorField first = null;
        for (int k = 0; k < nt; k++) {
            cancel.check();
            VectorField st = stressAt.apply(k);
            checkStressUnits(st);
            if (first == null) {
                first = st;
                samplers = new FieldSampler[points.size()];
                for (int q = 0; q < points.size(); q++) samplers[q] = sampler(st.grid(), points.get(q));
            } else if (!first.grid().sameGeometry(st.grid())) {
                throw new IllegalArgumentException("stress field at step " + k + " (" + times.get(k)
                        + ") lies on another grid than step 0");
            }
            for (int q = 0; q < points.size(); q++) {
                v[q][k] = sampleAndCompute(samplers[q], points.get(q), st).indexM3PerSPer100m();
            }
            progress.progress("coastal upwelling index", (k + 1.0) / nt, "");
        }
        long[] t = new long[nt];
        for (int k = 0; k < nt; k++) t[k] = times.get(k).getEpochSecond();
        List<TimeSeries> out = new ArrayList<>();
        for (int q = 0; q < points.size(); q++) out.add(new TimeSeries(points.get(q).name(), UNITS, t, v[q]));
        return out;
    }

    /** Unit string of index series (UDUNITS-style). */
    public static final String UNITS = "m3 s-1 (100 m)-1";
}
