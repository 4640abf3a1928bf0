package org.gyreplan.solver.ekman;

import org.gyreplan.solver.PhysicalConstants;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

import static org.junit.jupiter.api.Assertions.*;

/**
 * Ekman depth scales and empirical surface currents against CHECKS.md §3 (Stewart, Introduction to Physical
 * Oceanography, eqs. 9.14–9.16 and Table 9.3; Ralph &amp; Niiler coefficients as quoted in secondary texts).
 * The two "Ekman depth" definitions differ by π and are checked separately (CHECKS pitfall 2).
 */
class EkmanDepthTest {
    private static final PhysicalConstants C = PhysicalConstants.DEFAULT;

    @ParameterizedTest(name = "EK-05 A_z = {0}")
    @CsvSource({"0.01, 13.926, 43.750", "0.05, 31.140, 97.829", "0.1, 44.038, 138.350"})
    void ek05BothDefinitionsAt45N(double az, double eFolding, double depth) {
        // EK-05 (D from Stewart eq. 9.15), rel 1e-4
        assertEquals(eFolding, EkmanDepth.eFoldingScale(az, 45), eFolding * 1e-4);
        assertEquals(depth, EkmanDepth.theoretical(az, 45), depth * 1e-4);
        assertEquals(Math.PI, EkmanDepth.theoretical(az, 45) / EkmanDepth.eFoldingScale(az, 45), 1e-14);
    }

    @ParameterizedTest(name = "EK-12/13 U={0} at {1}°")
    @CsvSource({"5, 15, 75, 74.69", "10, 15, 150, 149.39", "20, 15, 300, 298.78",
            "5, 45, 45, 45.19", "10, 45, 90, 90.38", "20, 45, 180, 180.76"})
    void ek12And13StewartTable93(double u10, double lat, double table, double exact) {
        // Stewart Table 9.3 (rounded values) and the exact formula 7.6·U/√sin φ (2-decimal values: ±0.005 m or
        // rel 1e-4). The table's rounding is ~0.4 % at 15° (75 vs 74.69, 300 vs 298.78), so the table tolerance is
        // the larger of 1 m and 0.5 % of the entry (a flat ±1 m would reject the table's own 300 m entry).
        double d = EkmanDepth.empirical(u10, lat);
        assertEquals(table, d, Math.max(1.0, 0.005 * table));
        assertEquals(exact, d, Math.max(exact * 1e-4, 0.005));
        assertEquals(d, EkmanDepth.empirical(u10, -lat), 0.0, "hemisphere-symmetric");
    }

    @ParameterizedTest(name = "EK-14/15/16 at {0}°")
    @CsvSource({"15, 139.95, 0.2496, 0.1337", "35, 94.01, 0.1677, 0.0898", "45, 84.67, 0.1510, 0.0809"})
    void ek14To16RalphNiilerAndSurfaceCurrents(double lat, double rnDepth, double ekmanV0, double rnV0) {
        // EK-14 rel 1e-4; EK-15 rel 1e-4 or the 4-decimal rounding (5e-5), whichever is larger; EK-16 rel 1e-3
        assertEquals(rnDepth, EkmanDepth.ralphNiiler(10, lat), Math.max(rnDepth * 1e-4, 0.005));
        assertEquals(ekmanV0, EkmanSurfaceCurrent.empirical(10, lat), Math.max(ekmanV0 * 1e-4, 5e-5));
        assertEquals(rnV0, EkmanSurfaceCurrent.ralphNiiler(10, lat), rnV0 * 1e-3);
    }

    @Test
    void ek17ConsistencyOfEkmansCoefficient() {
        // EK-17: with ρ = 1027, ρₐ = 1.25, C_D = 2.6e-3, Ω = 7.292e-5 the theory gives 7.591 (rel 1e-3):
        // choose A_z so that the theoretical surface speed equals Ekman's 0.0127 U/√sin φ, then the theoretical depth
        // divided by U/√sin φ must be ≈ 7.6.
        PhysicalConstants c = C.withRho0(1027).withOmega(7.292e-5);
        double u10 = 10, lat = 45;
        double tau = 1.25 * 2.6e-3 * u10 * u10;
        double f = c.coriolis(lat);
        double v0 = EkmanSurfaceCurrent.empirical(u10, lat);
        double az = Math.pow(tau / (c.rho0() * v0), 2) / f;        // V₀ = τ/(ρ√(f A_z)) solved for A_z
        EkmanSpiral spiral = EkmanSpiral.of(0, tau, az, lat, c);
        assertEquals(v0, spiral.surfaceSpeed(), v0 * 1e-12);
        double coefficient = EkmanDepth.theoretical(az, lat, c, EquatorialCutoff.DEFAULT)
                * Math.sqrt(Math.sin(Math.toRadians(lat))) / u10;
        assertEquals(7.591, coefficient, 7.591 * 1e-3);
        assertEquals(EkmanDepth.EKMAN_COEFFICIENT, coefficient, 0.01 * 7.6 + 1e-9, "within 1 % of Stewart's 7.6");
    }

    @ParameterizedTest(name = "EK-18 at {0}°")
    @CsvSource({"15, 2.50", "45, 1.51", "90, 1.27"})
    void ek18SurfaceCurrentFractionOfWind(double lat, double percent) {
        // EK-18: 0.0127/√sin φ in % of U₁₀ (table rounded to 0.01 %: tolerance 0.005 % or rel 1e-3)
        assertEquals(percent, 100 * EkmanSurfaceCurrent.empirical(1.0, lat), Math.max(percent * 1e-3, 0.005));
    }

    @Test
    void undefinedInsideCutoffNeverInfinite() {
        for (double lat : new double[] {0, -0.0, 3, -4.99, Double.NaN}) {
            assertTrue(Double.isNaN(EkmanDepth.theoretical(0.05, lat)), "theoretical at " + lat);
            assertTrue(Double.isNaN(EkmanDepth.eFoldingScale(0.05, lat)));
            assertTrue(Double.isNaN(EkmanDepth.empirical(10, lat)));
            assertTrue(Double.isNaN(EkmanDepth.ralphNiiler(10, lat)));
            assertTrue(Double.isNaN(EkmanSurfaceCurrent.empirical(10, lat)));
        }
        assertTrue(Double.isFinite(EkmanDepth.theoretical(0.05, 5)));
        assertThrows(IllegalArgumentException.class, () -> EkmanDepth.theoretical(0, 45));
        assertThrows(IllegalArgumentException.class, () -> EkmanDepth.theoretical(-1, 45));
    }
}
