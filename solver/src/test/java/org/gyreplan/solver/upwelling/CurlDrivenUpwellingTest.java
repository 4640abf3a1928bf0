package org.gyreplan.solver.upwelling;

import org.gyreplan.solver.PhysicalConstants;
import org.gyreplan.solver.coast.CoastPoint;
import org.gyreplan.solver.grid.LonLatGrid;
import org.gyreplan.solver.grid.ScalarField;
import org.junit.jupiter.api.Test;

import java.util.Arrays;

import static org.junit.jupiter.api.Assertions.*;

/**
 * Curl-driven upwelling in a coastal band: the band integral of an analytic pumping field against its analytic
 * integral, and mass balance against the coastal index (Rykaczewski and Checkley 2008, from memory; CHECKS.md
 * EP-05 and UI-06).
 */
class CurlDrivenUpwellingTest {
    private static final double R = PhysicalConstants.DEFAULT.earthRadius();

    /** A grid fine in latitude around 36°N, with pumping w(φ) given per row. */
    private static ScalarField pumping(java.util.function.DoubleUnaryOperator wOfLat, double dLat) {
        int ny = (int) Math.round(2.0 / dLat);
        LonLatGrid g = new LonLatGrid(5, ny, -20.2, 34.5 + dLat / 2, 0.1, dLat, R, null);
        double[] v = new double[g.size()];
        for (int j = 0; j < ny; j++) for (int i = 0; i < 5; i++) v[g.index(i, j)] = wOfLat.applyAsDouble(g.latDeg(j));
        return new ScalarField(g, v, "w_ekman", "m s-1", "Ekman pumping, positive upward");
    }

    @Test
    void bandIntegralOfExponentialPumpingEqualsTheAnalyticIntegral() {
        // Zonal coast at 36°N with the ocean to the south (offshore bearing 180°): the offshore geodesic is the
        // meridian, so s = R·(36° − φ) exactly. w = w0·exp(−s/λ); ∫₀ᴸ w ds = w0·λ·(1 − e^{−L/λ}) (analytic).
        double w0 = 1e-5, lambda = 30e3, L = 100e3;
        ScalarField w = pumping(lat -> w0 * Math.exp(-R * Math.toRadians(36 - lat) / lambda), 0.002);
        CoastPoint p = CoastPoint.of("zonal coast", -20.0, 36.0, 180.0);
        CurlDrivenUpwelling band = CurlDrivenUpwelling.ofBandKm(100);
        double analytic = w0 * lambda * (1 - Math.exp(-L / lambda));
        double[] got = band.bandIntegral(p, w);
        // Simpson (n = 20) error ~4e-6 and bilinear interpolation (0.002° rows) ~7e-6 relative: tolerance 1e-4
        assertEquals(analytic, got[0], analytic * 1e-4);
        assertEquals(1.0, got[1]);
        CurlDrivenUpwelling.Result r = band.at(p, w, 50.0);
        assertEquals(100 * analytic, r.curlM3PerSPer100m(), 100 * analytic * 1e-4);
        assertEquals(50.0 + 100 * analytic, r.totalM3PerSPer100m(), 100 * analytic * 1e-4);
        assertEquals(IndexFlag.OK, r.flag());
    }

    @Test
    void curlBandBalancesTheCoastalIndexForAStressDropOff() {
        // CHECKS EP-05: alongshore stress falling by 0.1 N/m² over 50 km at 36°N, curl 2e-6 N/m³ →
        // w = curl τ/(ρ₀ f) = 1.967 m/day (rel 1e-3, D). Integrated over the 50-km band this equals the coastal
        // index the offshore stress (0.1 N/m²) would drive at the coast, UI-06 at 36° = 113.81 (rel 1e-4, D): the
        // water upwelled by the curl is the water the offshore Ekman transport carries away.
        double f = PhysicalConstants.DEFAULT.coriolis(36);
        double w = 2e-6 / (1025 * f);
        assertEquals(1.967, w * 86400, 1.967 * 1e-3);
        ScalarField field = pumping(lat -> w, 0.01);
        CurlDrivenUpwelling band = CurlDrivenUpwelling.ofBandKm(50);
        CurlDrivenUpwelling.Result r = band.at(CoastPoint.of("c", -20.0, 36.0, 180.0), field, 0.0);
        assertEquals(113.81, r.curlM3PerSPer100m(), 113.81 * 1e-3);
        assertEquals(w, r.meanPumpingMPerS(), w * 1e-9);
    }

    @Test
    void partlyUndefinedBandUsesTheTrapezoidOverCoveredPartsAndIsFlagged() {
        // linear w: the trapezoid rule is exact on each covered sub-interval
        ScalarField w = pumping(lat -> 1e-5 * (36 - lat), 0.01);
        double[] v = w.values().clone();
        LonLatGrid g = w.grid();
        // remove rows south of 35.5°N (band beyond ~55 km offshore)
        for (int j = 0; j < g.ny(); j++) if (g.latDeg(j) < 35.5) for (int i = 0; i < g.nx(); i++) v[g.index(i, j)] = Double.NaN;
        ScalarField cut = new ScalarField(g, v, "w", "m s-1", null);
        CurlDrivenUpwelling band = new CurlDrivenUpwelling(100, 20, PhysicalConstants.DEFAULT);
        CurlDrivenUpwelling.Result r = band.at(CoastPoint.of("c", -20.0, 36.0, 180.0), cut, 10.0);
        assertEquals(IndexFlag.PARTIAL, r.flag());
        assertTrue(r.coveredFraction() > 0.4 && r.coveredFraction() < 0.7, "covered " + r.coveredFraction());
        // analytic ∫₀^{s1} k·s ds with k = 1e-5/(R·π/180) per metre, s1 = covered length
        double k = 1e-5 / (R * Math.toRadians(1));
        double s1 = r.coveredFraction() * 100e3;
        assertEquals(100 * k * s1 * s1 / 2, r.curlM3PerSPer100m(), 100 * k * s1 * s1 / 2 * 1e-3);
        assertThrows(IllegalArgumentException.class, () -> new CurlDrivenUpwelling(100, 7, PhysicalConstants.DEFAULT));
        double[] nan = new double[g.size()];
        Arrays.fill(nan, Double.NaN);
        CurlDrivenUpwelling.Result none = band.at(CoastPoint.of("c", -20.0, 36.0, 180.0),
                new ScalarField(g, nan, "w", "m s-1", null), 10.0);
        assertEquals(IndexFlag.NO_DATA, none.flag());
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> band.at(CoastPoint.of("c", -20.0, 36.0, 180.0), new ScalarField(g, nan, "w", "m/day", null), 0));
        assertTrue(e.getMessage().contains("m/day"));
    }
}
