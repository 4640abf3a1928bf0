package org.gyreplan.solver.upwelling;

import net.sf.geographiclib.Geodesic;
import net.sf.geographiclib.GeodesicData;
import net.sf.geographiclib.GeodesicMask;
import org.gyreplan.solver.PhysicalConstants;
import org.gyreplan.solver.coast.CoastPoint;
import org.gyreplan.solver.ekman.EkmanPumping;
import org.gyreplan.solver.ekman.EquatorialCutoff;
import org.gyreplan.solver.grid.VectorField;
import org.gyreplan.solver.grid.ScalarField;

import java.util.ArrayList;
import java.util.List;
import java.util.Objects;
import java.util.Set;

/**
 * Curl-driven upwelling in a coastal band, beside the coastal (divergence) upwelling and their sum.
 *
 * <pre>
 *   W_curl  = 100 m · ∫₀ᴸ w_E(s) ds                    vertical volume transport through the band, per 100 m of coast
 *   W_coast = UI                                        offshore Ekman transport at the coast (coastal divergence)
 *   W_total = W_coast + W_curl                          all in m³ s⁻¹ per 100 m of coastline
 * </pre>
 * <table>
 *   <caption>Symbols</caption>
 *   <tr><td>w_E</td><td>Ekman pumping, positive upward: w_E = curl(τ/f)/ρ₀</td><td>m s⁻¹</td></tr>
 *   <tr><td>s</td><td>distance from the coast point along the offshore normal (a geodesic)</td><td>m</td></tr>
 *   <tr><td>L</td><td>band width (user-set)</td><td>km</td></tr>
 *   <tr><td>UI</td><td>coastal upwelling index ({@link CoastalUpwellingIndex})</td><td>m³ s⁻¹ per 100 m</td></tr>
 * </table>
 * <p><b>Quadrature</b>: the pumping field is sampled by bilinear interpolation (finite cells only, weights
 * renormalised) at n + 1 equally spaced points s = 0, L/n, …, L on the geodesic leaving the coast point along its
 * offshore bearing. If all samples are finite the composite Simpson rule is used (n even, default
 * {@value #DEFAULT_INTERVALS}); otherwise the composite trapezoid rule over the sub-intervals whose two ends are
 * finite, the result flagged {@link IndexFlag#PARTIAL} with the covered fraction (nothing is extrapolated).
 * <p><b>Sign</b>: positive = upward (upwelling) for both parts.
 * <p><b>Validity</b>: the band should be resolved by the pumping grid (several cells); pumping is undefined within
 * the equatorial cut-off (NaN samples).
 * <p><b>Source</b>: the split into coastal (alongshore-stress) and curl-driven (Ekman pumping) upwelling and their
 * sum: Rykaczewski and Checkley (2008), PNAS 105, 1965–1970 (from memory); Bordbar, Mohrholz and Schmidt (2023),
 * Earth Syst. Dynam. 14, 1065.
 */
public final class CurlDrivenUpwelling {
    /** Default number of quadrature intervals across the band. */
    public static final int DEFAULT_INTERVALS = 20;
    private static final Set<String> PUMPING_UNITS = Set.of("m s-1", "m/s", "m s**-1", "m s^-1", "m.s-1");

    private final double bandWidthKm;
    private final int intervals;
    private final Geodesic geod;

    /**
     * @param bandWidthKm L, width of the coastal band, km (&gt; 0)
     * @param intervals   number of quadrature intervals n (even, ≥ 2)
     * @param constants   Earth radius for the geodesic along the normal
     */
    public CurlDrivenUpwelling(double bandWidthKm, int intervals, PhysicalConstants constants) {
        if (!(bandWidthKm > 0) || Double.isInfinite(bandWidthKm)) {
            throw new IllegalArgumentException("band width must be a positive number of km, got " + bandWidthKm);
        }
        if (intervals < 2 || intervals % 2 != 0) {
            throw new IllegalArgumentException("number of quadrature intervals must be even and ≥ 2, got " + intervals);
        }
        this.bandWidthKm = bandWidthKm;
        this.intervals = intervals;
        this.geod = new Geodesic(Objects.requireNonNull(constants, "constants").earthRadius(), 0.0);
    }

    /** A band of the given width with the default quadrature and constants. */
    public static CurlDrivenUpwelling ofBandKm(double bandWidthKm) {
        return new CurlDrivenUpwelling(bandWidthKm, DEFAULT_INTERVALS, PhysicalConstants.DEFAULT);
    }

    public double bandWidthKm() { return bandWidthKm; }
    public int intervals() { return intervals; }

    /**
     * The result at one point.
     *
     * @param point                 coast point
     * @param bandWidthKm           L, km
     * @param curlM3PerSPer100m     curl-driven vertical transport through the band, m³ s⁻¹ per 100 m of coast
     * @param coastalM3PerSPer100m  coastal upwelling (the index), m³ s⁻¹ per 100 m
     * @param totalM3PerSPer100m    sum, m³ s⁻¹ per 100 m (NaN if either part is)
     * @param meanPumpingMPerS      mean pumping over the covered band, m s⁻¹
     * @param coveredFraction       fraction of the band with finite pumping, [0, 1]
     * @param flag                  OK, PARTIAL or NO_DATA
     */
    public record Result(CoastPoint point, double bandWidthKm, double curlM3PerSPer100m, double coastalM3PerSPer100m,
                         double totalM3PerSPer100m, double meanPumpingMPerS, double coveredFraction, IndexFlag flag) { }

    /** ∫₀ᴸ w_E ds in m² s⁻¹ along the offshore normal of the point, with the covered fraction: {integral, fraction}. */
    public double[] bandIntegral(CoastPoint p, ScalarField pumpingMPerS) {
        if (!PUMPING_UNITS.contains(pumpingMPerS.units().trim())) {
            throw new IllegalArgumentException("pumping field '" + pumpingMPerS.name() + "' has units '"
                    + pumpingMPerS.units() + "'; expected an Ekman pumping velocity in m s-1");
        }
        int n = intervals;
        double h = bandWidthKm * 1000.0 / n;
        double[] w = new double[n + 1];
        boolean all = true;
        for (int k = 0; k <= n; k++) {
            GeodesicData g = geod.Direct(p.latDeg(), p.lonDeg(), p.offshoreBearingDeg(), k * h,
                    GeodesicMask.LATITUDE | GeodesicMask.LONGITUDE | GeodesicMask.LONG_UNROLL);
            w[k] = pumpingMPerS.interpolate(g.lon2, g.lat2);
            if (!Double.isFinite(w[k])) all = false;
        }
        if (all) {
            double s = w[0] + w[n];
            for (int k = 1; k < n; k++) s += (k % 2 == 1 ? 4 : 2) * w[k];
            return new double[] {s * h / 3.0, 1.0};
        }
        double s = 0;
        int covered = 0;
        for (int k = 0; k < n; k++) {
            if (Double.isFinite(w[k]) && Double.isFinite(w[k + 1])) {
                s += 0.5 * h * (w[k] + w[k + 1]);
                covered++;
            }
        }
        return covered == 0 ? new double[] {Double.NaN, 0.0} : new double[] {s, covered / (double) n};
    }

    /** Curl-driven, coastal and total upwelling at a point from a pumping field (m s⁻¹) and the coastal index. */
    public Result at(CoastPoint p, ScalarField pumpingMPerS, double coastalIndexM3PerSPer100m) {
        double[] r = bandIntegral(p, pumpingMPerS);
        double curl = CoastalUpwellingIndex.COAST_LENGTH_M * r[0];
        double covKm = r[1] * bandWidthKm;
        double mean = r[1] > 0 ? r[0] / (covKm * 1000.0) : Double.NaN;
        IndexFlag flag = r[1] == 0 ? IndexFlag.NO_DATA : r[1] < 1 ? IndexFlag.PARTIAL : IndexFlag.OK;
        return new Result(p, bandWidthKm, curl, coastalIndexM3PerSPer100m, curl + coastalIndexM3PerSPer100m, mean,
                r[1], flag);
    }

    /** Results for a list of coastal index values (their points and indices) and one pumping field. */
    public List<Result> atPoints(List<PointIndex> coastal, ScalarField pumpingMPerS) {
        List<Result> out = new ArrayList<>(coastal.size());
        for (PointIndex pi : coastal) out.add(at(pi.point(), pumpingMPerS, pi.indexM3PerSPer100m()));
        return out;
    }

    /**
     * Results for a list of coastal index values from the stress field itself: the pumping is
     * {@link EkmanPumping#field} (w_E = curl(τ/f)/ρ₀, positive upward) on the stress grid.
     */
    public List<Result> fromStress(List<PointIndex> coastal, VectorField stressPa, PhysicalConstants constants,
                                   EquatorialCutoff cutoff) {
        return atPoints(coastal, EkmanPumping.field(stressPa, constants, cutoff).pumping());
    }
}
