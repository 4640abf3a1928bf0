package org.gyreplan.solver.plan.zones;

import org.gyreplan.solver.grid.LonLatGrid;
import org.gyreplan.solver.plan.PlanUnits;
import org.junit.jupiter.api.Test;
import org.locationtech.jts.geom.Polygon;

import java.time.Instant;
import java.time.LocalDate;
import java.time.ZoneOffset;
import java.util.List;
import java.util.function.DoubleBinaryOperator;

import static org.junit.jupiter.api.Assertions.*;

class UpwellingZonesTest {
    private static final double R = 6.371e6;

    private static Instant month(int year, int m) {
        return LocalDate.of(year, m, 15).atStartOfDay().toInstant(ZoneOffset.UTC);
    }

    /** Great-circle distance on the sphere (haversine), m. */
    private static double gc(double lon1, double lat1, double lon2, double lat2) {
        double p1 = Math.toRadians(lat1), p2 = Math.toRadians(lat2), dl = Math.toRadians(lon2 - lon1);
        double h = Math.pow(Math.sin((p2 - p1) / 2), 2) + Math.cos(p1) * Math.cos(p2) * Math.pow(Math.sin(dl / 2), 2);
        return 2 * R * Math.asin(Math.sqrt(h));
    }

    private static double[] field(LonLatGrid g, DoubleBinaryOperator f) {
        double[] v = new double[g.size()];
        for (int j = 0; j < g.ny(); j++) for (int i = 0; i < g.nx(); i++) v[g.index(i, j)] = f.applyAsDouble(g.lonDeg(i), g.latDeg(j));
        return v;
    }

    /**
     * Analytic check: a Gaussian pumping blob w = A exp(−d²/(2σ²)) (d = great-circle distance) exceeds T inside the
     * spherical cap of angular radius r₀/R, r₀ = σ√(2 ln(A/T)); the cap area is 2πR²(1 − cos(r₀/R)) (elementary
     * spherical geometry). The thresholded grid area differs only by cells cut by the circle, bounded by
     * perimeter × half the cell diagonal on each side; we assert the tighter half of that bound, P·d/2, and that
     * halving the cell size does not make the error grow beyond the coarse bound.
     */
    @Test
    void gaussianBlobAreaMatchesSphericalCap() {
        double a = 1e-5, sigma = 100e3, r0 = 150e3;
        double t = a * Math.exp(-r0 * r0 / (2 * sigma * sigma));
        double exact = 2 * Math.PI * R * R * (1 - Math.cos(r0 / R)) / 1e6;  // km²
        double perimeterKm = 2 * Math.PI * R * Math.sin(r0 / R) / 1e3;
        for (double spacing : new double[] {0.1, 0.05}) {
            LonLatGrid g = LonLatGrid.covering(5, 15, 25, 35, spacing, R);
            UpwellingStatistics s = UpwellingStatistics.on(g);
            double[] v = field(g, (lon, lat) -> { double d = gc(lon, lat, 10, 30); return a * Math.exp(-d * d / (2 * sigma * sigma)); });
            s.add(month(2020, 1), v).add(month(2020, 2), v);
            List<UpwellingZone> zones = UpwellingZones.find(s, ZoneThresholds.ofMetresPerSecond(t, 0.5));
            assertEquals(1, zones.size());
            UpwellingZone z = zones.get(0);
            double diagKm = Math.hypot(g.dx(0), g.dy()) / 1e3;
            double tol = perimeterKm * diagKm / 2;
            assertEquals(exact, z.areaKm2(), tol, "spacing " + spacing + " exact cap " + exact);
            assertEquals(10.0, z.centroidLonDeg(), spacing / 2);
            assertEquals(30.0, z.centroidLatDeg(), spacing / 2);
            assertTrue(z.polygon().isValid());
            assertInstanceOf(Polygon.class, z.polygon());
            assertEquals(0, ((Polygon) z.polygon()).getNumInteriorRing());
            assertEquals(a, z.peakMps(), a * 0.01, "peak near the blob centre (cell-centre offset ≤ half a cell)");
            assertEquals(List.of(1, 2), z.monthsActive());
        }
    }

    /**
     * Exact check: a zonal band whose edges fall on cell edges; its area is the spherical zone
     * R²Δλ(sin φ₂ − sin φ₁) (Archimedes' hat-box theorem), to floating-point precision.
     */
    @Test
    void bandAlignedWithCellsHasExactSphericalArea() {
        LonLatGrid g = LonLatGrid.covering(-20, -10, 20, 40, 0.25, R);
        UpwellingStatistics s = UpwellingStatistics.on(g);
        double[] v = field(g, (lon, lat) -> lat > 25 && lat < 31 ? PlanUnits.metresPerDayToMps(1.0) : PlanUnits.metresPerDayToMps(0.1));
        s.add(month(2021, 3), v);
        List<UpwellingZone> zones = UpwellingZones.find(s, ZoneThresholds.ofMetresPerDay(0.5, 0.9));
        assertEquals(1, zones.size());
        double exact = R * R * Math.toRadians(10) * (Math.sin(Math.toRadians(31)) - Math.sin(Math.toRadians(25))) / 1e6;
        assertEquals(exact, zones.get(0).areaKm2(), exact * 1e-9);
        assertEquals(exact, zones.get(0).areaKm2(), 1e-6 * exact);
        assertEquals(PlanUnits.metresPerDayToMps(1.0), zones.get(0).meanMps(), 1e-18);
        // the polygon is the band rectangle: its planar area in degrees² is 10 × 6
        assertEquals(60.0, zones.get(0).polygon().getArea(), 1e-9);
    }

    /** Persistence filter, months active and the seasonal peak, on a hand-built series. */
    @Test
    void persistenceAndSeasonalityFromSeries() {
        LonLatGrid g = LonLatGrid.covering(0, 10, 0 + 20, 30, 0.5, R);
        double t = 1e-6;
        UpwellingStatistics s = UpwellingStatistics.on(g);
        for (int year = 2000; year < 2003; year++) {
            for (int m = 1; m <= 12; m++) {
                final int mm = m;
                // zone A (west half, lat 22–26): seasonal, always upward: 5T, 6T, 5T in Jun–Aug, 0.2T otherwise
                // zone B (east half, lat 22–26): alternating ±, mean 1.5T, persistence 0.5
                double[] v = field(g, (lon, lat) -> {
                    if (lat < 22 || lat > 26) return -t;
                    if (lon < 4) return mm == 7 ? 6 * t : (mm == 6 || mm == 8) ? 5 * t : 0.2 * t;
                    if (lon > 6) return mm % 2 == 0 ? 4 * t : -t;
                    return -t;
                });
                s.add(month(year, m), v);
            }
        }
        // A: mean = (5+6+5+9·0.2)/12 T = 1.4833 T; persistence 1. B: mean 1.5 T, persistence 0.5.
        List<UpwellingZone> strict = UpwellingZones.find(s, ZoneThresholds.ofMetresPerSecond(t, 0.6));
        assertEquals(1, strict.size());
        UpwellingZone a = strict.get(0);
        assertEquals(17.8 / 12 * t, a.meanMps(), 1e-12 * t);
        assertEquals(1.0, a.meanPersistence(), 0.0);
        assertEquals(List.of(6, 7, 8), a.monthsActive());
        assertEquals(7, a.peakMonth());
        assertTrue(a.centroidLonDeg() < 4);
        List<UpwellingZone> loose = UpwellingZones.find(s, ZoneThresholds.ofMetresPerSecond(t, 0.4));
        assertEquals(2, loose.size());
        int k = g.cellAt(8, 24);
        assertEquals(0.5, s.persistence(k), 1e-15);
        assertEquals(1.5 * t, s.mean(k), 1e-15 * t);
        // sample std of {4T, −T} × 18: √(Σ(x−x̄)²/(n−1)) = 2.5T·√(36/35)
        assertEquals(2.5 * t * Math.sqrt(36.0 / 35.0), s.std(k), 1e-12 * t);
        assertEquals(2, s.peakMonth(k));
    }

    /** An annulus gives a polygon with one hole, valid, with the ring's area. */
    @Test
    void annulusHasHole() {
        LonLatGrid g = LonLatGrid.covering(0, 10, -5, 5, 0.1, R);
        UpwellingStatistics s = UpwellingStatistics.on(g);
        double[] v = field(g, (lon, lat) -> { double r = Math.hypot(lon - 5, lat); return r > 1 && r < 3 ? 1e-5 : 0; });
        s.add(month(2020, 5), v);
        List<UpwellingZone> zones = UpwellingZones.find(s, ZoneThresholds.ofMetresPerSecond(1e-6, 0.5));
        assertEquals(1, zones.size());
        Polygon p = (Polygon) zones.get(0).polygon();
        assertTrue(p.isValid());
        assertEquals(1, p.getNumInteriorRing());
        // planar degree area of the annulus π(3² − 1²) = 25.13 deg², within the staircase bound (perimeters × diag/2)
        assertEquals(Math.PI * 8, p.getArea(), 2 * Math.PI * 4 * Math.hypot(0.1, 0.1) / 2);
    }

    @Test
    void rejectsBadInput() {
        LonLatGrid g = LonLatGrid.covering(0, 1, 0, 1, 0.5, R);
        UpwellingStatistics s = UpwellingStatistics.on(g);
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> s.add(month(2020, 1), new double[3]));
        assertTrue(e.getMessage().contains("3 values"));
        assertThrows(IllegalArgumentException.class, () -> ZoneThresholds.ofMetresPerDay(1, 1.5));
    }
}
