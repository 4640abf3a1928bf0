package org.gyreplan.solver.upwelling;

import org.gyreplan.solver.PhysicalConstants;
import org.gyreplan.solver.coast.CoastPoint;
import org.gyreplan.solver.grid.LonLatGrid;
import org.gyreplan.solver.grid.ScalarField;
import org.gyreplan.solver.grid.VectorField;
import org.junit.jupiter.api.Test;

import java.util.List;

import static org.junit.jupiter.api.Assertions.*;

/**
 * The classic sea-level-pressure index (Bakun 1973, NOAA Tech. Rep. NMFS SSRF-671; method and parameters
 * 0.7 / 15° / ρₐ 1.22 / C_D 0.0013 or 0.0026 from memory). Check values CHECKS.md §4a UI-01…UI-04, derived by
 * arithmetic from the method as written there; tolerance rel 1e-4 (values to 5–6 significant digits).
 */
class SeaLevelPressureIndexTest {
    private static final double HPA_PER_100KM = 100.0 / 100_000.0;   // Pa per m
    private static final SeaLevelPressureIndex CLASSIC = SeaLevelPressureIndex.classic();

    @Test
    void ui01NorthernHemisphere() {
        // 36°N, ocean to the west, pressure falling toward land: ∂p/∂x = −1 hPa/100 km
        PressureIndexPoint r = CLASSIC.fromGradient(CoastPoint.of("UI-01", -122, 36, 270), -HPA_PER_100KM, 0,
                Double.POSITIVE_INFINITY);
        assertEquals(-9.56176, r.geostrophicNorthwardMPerS(), 9.56176 * 1e-5);
        assertEquals(1.73234, r.surfaceEastwardMPerS(), 1.73234 * 1e-5);
        assertEquals(-6.46517, r.surfaceNorthwardMPerS(), 6.46517 * 1e-5);
        assertEquals(0.01839, r.index().tauEastwardPa(), 0.01839 * 1e-3);   // rounded to 4 significant digits
        assertEquals(-0.06863, r.index().tauNorthwardPa(), 0.06863 * 1e-3);
        assertEquals(-0.78108, r.index().ekmanEastwardM2PerS(), 0.78108 * 1e-4);
        assertEquals(-0.20929, r.index().ekmanNorthwardM2PerS(), 0.20929 * 1e-4);
        assertEquals(78.108, r.indexM3PerSPer100m(), 78.108 * 1e-4);
    }

    @Test
    void ui02NoReductionNoTurning() {
        SeaLevelPressureIndex plain = new SeaLevelPressureIndex(
                PressureWindMethod.CLASSIC.withReduction(1.0).withTurningDeg(0.0), CoastalUpwellingIndex.defaults());
        assertEquals(165.026, plain.fromGradient(-HPA_PER_100KM, 0, 36, 270), 165.026 * 1e-4);
    }

    @Test
    void ui03MonthlyMeanDrag() {
        SeaLevelPressureIndex monthly = new SeaLevelPressureIndex(PressureWindMethod.CLASSIC_MONTHLY_MEAN,
                CoastalUpwellingIndex.defaults());
        assertEquals(156.215, monthly.fromGradient(-HPA_PER_100KM, 0, 36, 270), 156.215 * 1e-4);
    }

    @Test
    void ui04SouthernHemisphereTurnsClockwise() {
        PressureIndexPoint r = CLASSIC.fromGradient(CoastPoint.of("UI-04", 14, -25, 270), -HPA_PER_100KM, 0,
                Double.POSITIVE_INFINITY);
        assertEquals(13.29868, r.geostrophicNorthwardMPerS(), 13.29868 * 1e-5);
        assertEquals(2.40937, r.surfaceEastwardMPerS(), 2.40937 * 1e-5);
        assertEquals(8.99187, r.surfaceNorthwardMPerS(), 8.99187 * 1e-5);
        assertEquals(-2.10138, r.index().ekmanEastwardM2PerS(), 2.10138 * 1e-4);
        assertEquals(0.56306, r.index().ekmanNorthwardM2PerS(), 0.56306 * 1e-4);
        assertEquals(210.138, r.indexM3PerSPer100m(), 210.138 * 1e-4);
    }

    @Test
    void southernMirrorOfAPressureFieldGivesTheSameIndex() {
        // Reflection y → −y: latitude, ∂p/∂y and the northward part of the offshore normal change sign; the
        // hemisphere-aware turning must keep the index identical (property; UI-01 ↔ UI-04 are one such pair in form).
        java.util.Random r = new java.util.Random(5L);
        for (int k = 0; k < 200; k++) {
            double px = 2e-3 * r.nextGaussian(), py = 2e-3 * r.nextGaussian();
            double lat = 6 + 70 * r.nextDouble(), b = 360 * r.nextDouble();
            double north = CLASSIC.fromGradient(px, py, lat, b), south = CLASSIC.fromGradient(px, -py, -lat, 180 - b);
            assertEquals(north, south, 1e-10 * Math.max(1, Math.abs(north)));
            // and rotating the coast by 180° flips it
            assertEquals(-north, CLASSIC.fromGradient(px, py, lat, b + 180), 1e-10 * Math.max(1, Math.abs(north)));
        }
    }

    @Test
    void turningIsTowardLowPressure() {
        // CHECKS pitfall 5: the surface wind has a component down the pressure gradient in both hemispheres.
        for (double lat : new double[] {-50, -20, 20, 50}) {
            double px = 3e-4, py = -7e-4;
            PressureIndexPoint r = CLASSIC.fromGradient(CoastPoint.of("p", 0, lat, 90), px, py, Double.POSITIVE_INFINITY);
            double downGradient = -(r.surfaceEastwardMPerS() * px + r.surfaceNorthwardMPerS() * py);
            double speed = Math.hypot(r.surfaceEastwardMPerS(), r.surfaceNorthwardMPerS());
            double gradient = Math.hypot(px, py);
            // cross-isobar angle = 15° exactly
            assertEquals(Math.sin(Math.toRadians(15)), downGradient / (speed * gradient), 1e-12, "lat " + lat);
        }
    }

    @Test
    void gradientWindCorrectionMatchesGw01() {
        // CHECKS GW-01 (Holton ch. 3, D): 45°N, r = 500 km, V_g = 10 m/s → low 8.5742, high 13.5727 m/s, rel 1e-5.
        // Here with ρₐ = 1.225 so that the gradient gives V_g = 10 m/s exactly.
        PhysicalConstants c = PhysicalConstants.DEFAULT.withRhoAir(1.225);
        SeaLevelPressureIndex g = new SeaLevelPressureIndex(PressureWindMethod.CLASSIC.withGradientWindCorrection(true),
                CoastalUpwellingIndex.defaults().withConstants(c));
        double f = c.coriolis(45);
        double px = 10 * 1.225 * f;       // v_g = px/(ρₐ f) = 10 m/s northward
        PressureIndexPoint low = g.fromGradient(CoastPoint.of("p", 0, 45, 90), px, 0, 500e3);
        PressureIndexPoint high = g.fromGradient(CoastPoint.of("p", 0, 45, 90), px, 0, -500e3);
        assertEquals(8.5742, low.geostrophicNorthwardMPerS(), 8.5742 * 1e-5);
        assertEquals(13.5727, high.geostrophicNorthwardMPerS(), 13.5727 * 1e-5);
        // GW-04: 30°N, r = 500 km, V_g = 10 > |f| r/4 → no regular anticyclonic solution
        double px30 = 10 * 1.225 * c.coriolis(30);
        PressureIndexPoint bad = g.fromGradient(CoastPoint.of("p", 0, 30, 90), px30, 0, -500e3);
        assertEquals(IndexFlag.GRADIENT_WIND_INVALID, bad.index().flag());
        assertTrue(Double.isNaN(bad.indexM3PerSPer100m()));
        assertEquals(8.1695, g.fromGradient(CoastPoint.of("p", 0, 30, 90), px30, 0, 500e3)
                .geostrophicNorthwardMPerS(), 8.1695 * 1e-5);
    }

    @Test
    void fieldFormReproducesThePointFormOnALinearPressureField() {
        // p = p0 + G_x·x along each row, with x = R cos φ (λ − 240°): ∂p/∂x = G_x exactly for centred differences and ∂p/∂y = 0 on λ = 240°.
        LonLatGrid grid = new LonLatGrid(21, 21, 230, 26, 1, 1, 6.371e6, null);
        double gx = -HPA_PER_100KM;
        double[] p = new double[grid.size()];
        for (int j = 0; j < grid.ny(); j++) {
            for (int i = 0; i < grid.nx(); i++) {
                double x = grid.radius() * Math.cos(Math.toRadians(grid.latDeg(j))) * Math.toRadians(grid.lonDeg(i) - 240);
                p[grid.index(i, j)] = 101_300 + gx * x;
            }
        }
        ScalarField slp = new ScalarField(grid, p, "slp", "Pa", "sea-level pressure");
        CoastPoint pt = CoastPoint.of("UI-01", 240, 36, 270);   // exactly on the cell centre (i = 10, j = 10)
        List<PointIndex> r = CLASSIC.atPoints(slp, List.of(pt));
        assertEquals(78.108, r.get(0).indexM3PerSPer100m(), 78.108 * 1e-4);
        assertEquals(0.0, r.get(0).dataDistanceKm(), 1e-9);
        VectorField w = CLASSIC.surfaceWind(slp);
        assertEquals(1.73234, w.eastward().at(10, 10), 1.73234 * 1e-5);
        // hPa input is refused with a clear message
        ScalarField hpa = new ScalarField(grid, p, "slp", "hPa", null);
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> CLASSIC.stress(hpa));
        assertTrue(e.getMessage().contains("hPa"), e.getMessage());
    }

    @Test
    void curvatureOfCircularIsobarsIsTheirRadius() {
        // p = a·r²/2 around a centre (a low): isobars are circles of radius r, cyclonic (positive).
        double a = 1e-9, x = 3e5, y = -4e5;
        double r = SeaLevelPressureIndex.curvatureRadius(a * x, a * y, a, a, 0);
        assertEquals(5e5, r, 1e-6);
        assertEquals(-5e5, SeaLevelPressureIndex.curvatureRadius(-a * x, -a * y, -a, -a, 0), 1e-6);
    }

    @Test
    void fieldFormGradientWindAroundACircularLowAndHigh() {
        // p = p0 ± a ρ²/2 with ρ the great-circle distance from a centre C 500 km south-west of the test cell P (so both gradient components and the metric terms of the Hessian matter): the isobars
        // are geodesic circles of geodesic curvature κ = cot(ρ/R)/R, so the gradient-wind radius is R tan(ρ/R)
        // (spherical geometry); V_g = aρ/(ρₐ|f|). Expected speed = 0.7 × GradientWind (Holton ch. 3; CHECKS §5 formulas).
        PhysicalConstants c = PhysicalConstants.DEFAULT;
        double dl = 0.05, latP = 40.0, lonP = -30.0, rho0 = 500e3, R = c.earthRadius();
        LonLatGrid grid = new LonLatGrid(21, 21, lonP - 10 * dl, latP - 10 * dl, dl, dl, R, null);
        net.sf.geographiclib.GeodesicData centre = new net.sf.geographiclib.Geodesic(R, 0).Direct(latP, lonP, 225, rho0);
        double f = Math.abs(c.coriolis(latP));
        double a = 10.0 * c.rhoAir() * f / rho0;          // V_g = 10 m/s at P
        double rc = R * Math.tan(rho0 / R);
        for (int sign : new int[] {1, -1}) {
            double[] p = new double[grid.size()];
            for (int j = 0; j < grid.ny(); j++) {
                for (int i = 0; i < grid.nx(); i++) {
                    double rho = 1000 * org.gyreplan.solver.upwelling.FieldSamplerAccess.greatCircleKm(
                            centre.lon2, centre.lat2, grid.lonDeg(i), grid.latDeg(j), R);
                    p[grid.index(i, j)] = 101_000 + sign * a * rho * rho / 2;
                }
            }
            ScalarField slp = new ScalarField(grid, p, "slp", "Pa", null);
            SeaLevelPressureIndex g = new SeaLevelPressureIndex(PressureWindMethod.CLASSIC.withGradientWindCorrection(true),
                    CoastalUpwellingIndex.defaults());
            VectorField w = g.surfaceWind(slp);
            double speed = Math.hypot(w.eastward().at(10, 10), w.northward().at(10, 10));
            org.gyreplan.solver.atmos.GradientWind gw = sign > 0
                    ? org.gyreplan.solver.atmos.GradientWind.aroundLow(10.0, rc, latP, c)
                    : org.gyreplan.solver.atmos.GradientWind.aroundHigh(10.0, rc, latP, c);
            assertEquals(0.7 * gw.speed(), speed, 0.7 * gw.speed() * 1e-4, sign > 0 ? "low" : "high");
            // and without the correction: 0.7 × V_g
            double plain = Math.hypot(SeaLevelPressureIndex.classic().surfaceWind(slp).eastward().at(10, 10),
                    SeaLevelPressureIndex.classic().surfaceWind(slp).northward().at(10, 10));
            assertEquals(7.0, plain, 7.0 * 1e-4);
        }
    }
}
