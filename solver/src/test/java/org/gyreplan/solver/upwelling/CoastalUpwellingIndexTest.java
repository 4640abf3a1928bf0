package org.gyreplan.solver.upwelling;

import org.gyreplan.solver.PhysicalConstants;
import org.gyreplan.solver.coast.CoastPoint;
import org.gyreplan.solver.grid.LonLatGrid;
import org.gyreplan.solver.grid.ScalarField;
import org.gyreplan.solver.grid.VectorField;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

import java.util.Arrays;
import java.util.List;
import java.util.Random;

import static org.junit.jupiter.api.Assertions.*;

/**
 * Coastal upwelling index from stress: UI = 100·(Qₑ·n̂), Qₑ = (τᵧ/(ρ₀f), −τₓ/(ρ₀f)) (Ekman transport: Stewart,
 * Introduction to Physical Oceanography, eq. 9.26; index definition and unit: Bakun 1973, from memory).
 * Numbers are CHECKS.md §4a UI-05/UI-06 (derived by plain arithmetic from those formulas with ρ₀ = 1025 kg m⁻³,
 * Ω = 7.292115e-5 s⁻¹), tolerance rel 1e-4 (values rounded to 5 significant digits).
 */
class CoastalUpwellingIndexTest {
    private static final CoastalUpwellingIndex UI = CoastalUpwellingIndex.defaults();

    @ParameterizedTest(name = "UI-05 at {0}°")
    @CsvSource({"21, 296.05", "27, 233.69", "30, 212.19", "33, 194.80", "36, 180.50", "39, 168.59",
            "42, 158.56", "45, 150.04", "48, 142.77"})
    void ui05DirectEquatorwardWindBothHemispheres(double lat, double expected) {
        // 10 m/s equatorward alongshore wind, C_D 1.3e-3, ρa 1.22: τ = 1.22·1.3e-3·10² = 0.1586 N/m² (CHECKS UI-05)
        double tau = 1.22 * 1.3e-3 * 10 * 10;
        // N–S coast with the ocean to the west (offshore bearing 270°): NH equatorward = southward
        assertEquals(expected, UI.fromStress(0, -tau, lat, 270), expected * 1e-4);
        // SH mirror: equatorward = northward, same coast geometry → same positive index
        assertEquals(expected, UI.fromStress(0, tau, -lat, 270), expected * 1e-4);
    }

    @ParameterizedTest(name = "UI-06 at {0}°")
    @CsvSource({"33, 122.82", "36, 113.81", "39, 106.30", "42, 99.97", "45, 94.60"})
    void ui06AlongshoreStress(double lat, double expected) {
        assertEquals(expected, UI.fromStress(0, -0.1, lat, 270), expected * 1e-4);
    }

    @Test
    void ekmanTransportMatchesEk02() {
        // CHECKS EK-02: τ = 0.1 N/m² at 45°N, ρ = 1025 → 0.94604 m²/s (= 94.604 m³/s per 100 m), rel 1e-6 (D).
        // Eastward stress → transport to the right (southward) in the NH.
        PointIndex p = UI.fromStress(CoastPoint.of("p", 0, 45, 180), 0.1, 0.0);
        assertEquals(-0.94604, p.ekmanNorthwardM2PerS(), 0.94604 * 1e-5);
        assertEquals(0.0, p.ekmanEastwardM2PerS(), 1e-15);
        assertEquals(94.604, p.indexM3PerSPer100m(), 94.604 * 1e-5);
    }

    @Test
    void rotatingTheCoastBy180DegreesFlipsTheIndex() {
        Random r = new Random(20261201L);
        for (int k = 0; k < 200; k++) {
            double tx = r.nextGaussian() * 0.1, ty = r.nextGaussian() * 0.1;
            double lat = (r.nextBoolean() ? 1 : -1) * (6 + 80 * r.nextDouble());
            double b = 360 * r.nextDouble();
            double a = UI.fromStress(tx, ty, lat, b), c = UI.fromStress(tx, ty, lat, b + 180);
            assertEquals(-a, c, 1e-12 * Math.max(1, Math.abs(a)));
        }
    }

    @Test
    void purelyOnshoreWindGivesNoIndex() {
        // Stress along the onshore normal drives Ekman transport parallel to the coast: zero cross-shore component.
        Random r = new Random(7L);
        for (int k = 0; k < 100; k++) {
            double b = 360 * r.nextDouble(), lat = 10 + 70 * r.nextDouble();
            double onshore = b + 180;
            double tx = 0.2 * Math.sin(Math.toRadians(onshore)), ty = 0.2 * Math.cos(Math.toRadians(onshore));
            assertEquals(0.0, UI.fromStress(tx, ty, lat, b), 1e-10);
            assertEquals(0.0, UI.fromStress(tx, ty, -lat, b), 1e-10);
        }
    }

    @Test
    void southernMirrorGivesTheSameIndex() {
        // Reflection y → −y: latitude, northward stress and the northward part of the normal change sign.
        Random r = new Random(11L);
        for (int k = 0; k < 200; k++) {
            double tx = r.nextGaussian() * 0.1, ty = r.nextGaussian() * 0.1;
            double lat = 6 + 80 * r.nextDouble(), b = 360 * r.nextDouble();
            double north = UI.fromStress(tx, ty, lat, b), south = UI.fromStress(tx, -ty, -lat, 180 - b);
            assertEquals(north, south, 1e-12 * Math.max(1, Math.abs(north)));
        }
    }

    @Test
    void equatorialCutoffGivesFlaggedNaN() {
        PointIndex p = UI.fromStress(CoastPoint.of("eq", 0, 3.0, 270), 0, -0.1);
        assertTrue(Double.isNaN(p.indexM3PerSPer100m()));
        assertEquals(IndexFlag.EQUATORIAL_CUTOFF, p.flag());
        assertTrue(Double.isNaN(UI.fromStress(0, -0.1, 0.0, 270)));
        assertTrue(Double.isNaN(UI.fromStress(0, -0.1, -4.999, 270)));
        // at the cut-off itself the index is defined and finite
        assertTrue(Double.isFinite(UI.fromStress(0, -0.1, 5.0, 270)));
        assertTrue(Double.isFinite(UI.withCutoff(org.gyreplan.solver.ekman.EquatorialCutoff.ofDegrees(2)).fromStress(0, -0.1, 3.0, 270)));
    }

    private static VectorField field(LonLatGrid g, double tx, double ty, boolean[] land) {
        double[] a = new double[g.size()], b = new double[g.size()];
        Arrays.fill(a, tx);
        Arrays.fill(b, ty);
        for (int k = 0; k < g.size(); k++) if (land[k]) { a[k] = Double.NaN; b[k] = Double.NaN; }
        return new VectorField(new ScalarField(g, a, "taux", "Pa", null), new ScalarField(g, b, "tauy", "Pa", null));
    }

    @Test
    void samplingReportsTheDistanceToTheWindCell() {
        // 1° grid, cells centred on half degrees; land east of 240.0°E (i ≥ 10 with lon0 = 230.5).
        LonLatGrid g = new LonLatGrid(20, 10, 230.5, 30.5, 1, 1, 6.371e6, null);
        boolean[] land = new boolean[g.size()];
        for (int j = 0; j < g.ny(); j++) for (int i = 10; i < 20; i++) land[g.index(i, j)] = true;
        VectorField st = field(g, 0, -0.1, land);
        CoastPoint p = CoastPoint.of("coast", 241.2, 35.5, 270);   // on land cell (i = 10.7), row j = 5 exactly
        PointIndex near = UI.atPoints(st, List.of(p)).get(0);
        assertEquals(IndexFlag.OK, near.flag());
        // nearest ocean cell centre is (239.5, 35.5): 1.7° of longitude along 35.5°N on the 6371-km sphere
        double expectKm = 2 * 6371 * Math.asin(Math.cos(Math.toRadians(35.5)) * Math.sin(Math.toRadians(1.7 / 2)));
        assertEquals(expectKm, near.dataDistanceKm(), 1e-9);
        assertEquals(113.81 * Math.sin(Math.toRadians(36)) / Math.sin(Math.toRadians(35.5)),
                near.indexM3PerSPer100m(), 0.02);
        // bilinear: the 2×2 stencil around 241.2 is all land → no data, flagged
        PointIndex bil = UI.withSampling(StressSampling.BILINEAR).atPoints(st, List.of(p)).get(0);
        assertEquals(IndexFlag.NO_DATA, bil.flag());
        assertTrue(Double.isNaN(bil.indexM3PerSPer100m()));
        // a distance limit below the nearest cell's distance flags the point
        PointIndex far = UI.withMaxDataDistanceKm(100).atPoints(st, List.of(p)).get(0);
        assertEquals(IndexFlag.TOO_FAR_FROM_DATA, far.flag());
        // bilinear next to the coast uses the finite cells only
        CoastPoint q = CoastPoint.of("q", 239.8, 35.5, 270);
        PointIndex b2 = UI.withSampling(StressSampling.BILINEAR).atPoints(st, List.of(q)).get(0);
        assertEquals(IndexFlag.OK, b2.flag());
        assertEquals(-0.1, b2.tauNorthwardPa(), 1e-15);
    }

    @Test
    void landCellsOfTheGridMaskAreNotSampledEvenWithFiniteValues() {
        // wind products often carry values over land; the grid mask decides what is ocean
        LonLatGrid g0 = new LonLatGrid(20, 10, 230.5, 30.5, 1, 1, 6.371e6, null);
        boolean[] ocean = new boolean[g0.size()];
        for (int j = 0; j < g0.ny(); j++) for (int i = 0; i < 10; i++) ocean[g0.index(i, j)] = true;
        LonLatGrid g = g0.withOcean(ocean);
        double[] tx = new double[g.size()], ty = new double[g.size()];
        for (int k = 0; k < g.size(); k++) ty[k] = g.isOcean(k) ? -0.1 : +0.3;   // land values would flip the sign
        VectorField st = new VectorField(new ScalarField(g, tx, "tx", "Pa", null), new ScalarField(g, ty, "ty", "Pa", null));
        CoastPoint p = CoastPoint.of("coast", 240.3, 35.5, 270);
        for (StressSampling s : StressSampling.values()) {
            PointIndex r = UI.withSampling(s).atPoints(st, List.of(p)).get(0);
            assertEquals(-0.1, r.tauNorthwardPa(), 1e-15, s.name());
            assertTrue(r.indexM3PerSPer100m() > 0, s.name());
        }
    }

    @Test
    void nearestOceanFindsFarCellsAndFollowsTheMaskOfEachField() {
        // 40×40 cells, the point in one corner; only the opposite corner is ocean (beyond the candidate list)
        LonLatGrid g0 = new LonLatGrid(40, 40, 0.5, 10.5, 1, 1, 6.371e6, null);
        boolean[] ocean = new boolean[g0.size()];
        ocean[g0.index(39, 39)] = true;
        CoastPoint p = CoastPoint.of("corner", 0.5, 10.5, 270);
        CoastalUpwellingIndex ui = CoastalUpwellingIndex.defaults();
        double[] z = new double[g0.size()], ty = new double[g0.size()];
        Arrays.fill(ty, -0.1);
        LonLatGrid g1 = g0.withOcean(ocean);
        VectorField far = new VectorField(new ScalarField(g1, z, "tx", "Pa", null), new ScalarField(g1, ty, "ty", "Pa", null));
        PointIndex r1 = ui.atPoints(far, List.of(p)).get(0);
        double expect = 2 * 6371 * Math.asin(Math.sqrt(Math.pow(Math.sin(Math.toRadians(39) / 2), 2)
                + Math.cos(Math.toRadians(10.5)) * Math.cos(Math.toRadians(49.5)) * Math.pow(Math.sin(Math.toRadians(39) / 2), 2)));
        assertEquals(expect, r1.dataDistanceKm(), 1e-9);
        // same geometry, another mask (the point's own cell is ocean): the cached sampler must not remember the mask
        boolean[] all = new boolean[g0.size()];
        Arrays.fill(all, true);
        LonLatGrid g2 = g0.withOcean(all);
        VectorField near = new VectorField(new ScalarField(g2, z, "tx", "Pa", null), new ScalarField(g2, ty, "ty", "Pa", null));
        assertEquals(0.0, ui.atPoints(near, List.of(p)).get(0).dataDistanceKm(), 1e-12);
        assertEquals(expect, ui.atPoints(far, List.of(p)).get(0).dataDistanceKm(), 1e-9);
    }

    @Test
    void rejectsStressInWrongUnits() {
        LonLatGrid g = new LonLatGrid(2, 2, 0.5, 30.5, 1, 1, 6.371e6, null);
        VectorField wind = new VectorField(new ScalarField(g, new double[4], "u", "m s-1", null),
                new ScalarField(g, new double[4], "v", "m s-1", null));
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> UI.atPoints(wind, List.of(CoastPoint.of("p", 1, 31, 270))));
        assertTrue(e.getMessage().contains("'u'") && e.getMessage().contains("Pa"), e.getMessage());
    }

    @Test
    void constantsAreThoseOfTheChecks() {
        assertEquals(1025.0, PhysicalConstants.DEFAULT.rho0());
        assertEquals(1.22, PhysicalConstants.DEFAULT.rhoAir());
    }
}
