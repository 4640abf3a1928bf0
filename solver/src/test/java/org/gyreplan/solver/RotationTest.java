package org.gyreplan.solver;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.*;

/**
 * f = 2Ω sin φ and β = 2Ω cos φ / R (Stewart, Introduction to Physical Oceanography, eqs. 7.10 and 11.7),
 * with Ω = 7.292115e-5 s⁻¹ (WGS 84 / EPSG:7030) and R = 6.371e6 m. Values are CHECKS.md ROT-* (derived
 * by plain arithmetic from those formulas), tolerance rel 1e-6.
 */
class RotationTest {
    private static final PhysicalConstants C = PhysicalConstants.DEFAULT;

    @ParameterizedTest(name = "ROT at {0}°")
    @CsvSource({
            "15, 3.774676e-5, 2.211157e-11, 46.238, 0.0005",
            "30, 7.292115e-5, 1.982470e-11, 23.934, 0.0005",
            "45, 1.031261e-4, 1.618680e-11, 16.924, 0.0005",
            "60, 1.263031e-4, 1.144579e-11, 13.819, 0.0005",
            "-25, -6.163562e-5, 2.074682e-11, 28.32, 0.005"})
    void coriolisBetaAndInertialPeriod(double lat, double f, double beta, double periodHours, double periodTol) {
        assertEquals(f, C.coriolis(lat), Math.abs(f) * 1e-6);
        assertEquals(beta, C.beta(lat), beta * 1e-6);
        // periods in CHECKS.md are rounded to the digits shown; the tolerance is that rounding
        assertEquals(periodHours, C.inertialPeriod(lat) / 3600.0, periodTol);
    }

    @Test
    void siderealNotSolarRotation() {
        // The solar-day rate 2π/86400 = 7.2722e-5 s⁻¹ is a classic mistake (CHECKS.md pitfall 1).
        double solar = 2 * Math.PI / 86400.0;
        assertEquals(7.292115e-5, C.omega(), 0.0);
        assertTrue(Math.abs(C.coriolis(30) - 2 * solar * 0.5) > 1e-7,
                "f(30°) must differ from the solar-day value");
        assertEquals(7.292115e-5, C.coriolis(30), 1e-12);
    }

    @Test
    void exactAtSpecialLatitudes() {
        assertEquals(0.0, C.coriolis(0.0), 0.0);
        assertEquals(0.0, C.beta(90.0), 0.0);
        assertEquals(0.0, C.beta(-90.0), 0.0);
        assertEquals(2 * C.omega(), C.coriolis(90.0), 0.0);
        assertEquals(1.0, DegreeTrig.sinDeg(90), 0.0);
        assertEquals(0.0, DegreeTrig.sinDeg(180), 0.0);
        assertEquals(0.5, DegreeTrig.sinDeg(30), 1e-16);
        assertEquals(-1.0, DegreeTrig.cosDeg(180), 0.0);
        assertTrue(Double.isNaN(DegreeTrig.sinDeg(Double.NaN)));
    }

    @Test
    void rejectsNonPhysicalConstants() {
        assertThrows(IllegalArgumentException.class, () -> C.withRho0(-1));
        assertThrows(IllegalArgumentException.class, () -> C.withOmega(Double.NaN));
    }
}
